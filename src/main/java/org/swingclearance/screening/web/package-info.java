/** Screening pages: the sectioned form, the live findings preview, decision and signing, amendment. */
package org.swingclearance.screening.web;
