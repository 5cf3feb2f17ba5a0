/** Patient list, search, intake and edit forms, the patient page, episodes, consents, red flags and referrals. */
package org.swingclearance.patient.web;
