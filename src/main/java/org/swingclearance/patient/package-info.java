/**
 * Patients, their episodes (one return-to-training case each), consent to share a plan with a trainer, and
 * the red-flag checklist with its referral. Other features get {@link org.swingclearance.patient.PatientSummary}
 * and {@link org.swingclearance.patient.EpisodeSummary} from {@link org.swingclearance.patient.Patients}.
 */
package org.swingclearance.patient;
