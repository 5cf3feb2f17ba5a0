/** Pages of the plan feature: the clinician's plan page, sharing and invitations, the trainer's plan and handout. */
package org.swingclearance.plan.web;
