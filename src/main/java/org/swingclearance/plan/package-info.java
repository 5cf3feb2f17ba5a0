/**
 * Graded plans (engine.md §7): generated from the latest signed screening and the clinic's clubs, adjusted by the
 * clinician, issued as signed read-only versions, shared with a trainer on the patient's consent (or through a
 * one-time invitation) and handed out as a PDF. {@link org.swingclearance.plan.Plans} is the feature's application
 * service and Contract P for the trainer workspace; the engine's plan search and mechanics are reached through an
 * adapter, never re-implemented here.
 */
package org.swingclearance.plan;
