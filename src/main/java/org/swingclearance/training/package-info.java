/**
 * The trainer workspace: session logs (append-only, corrections are new versions with a reason, next-morning pain
 * as a later append-only entry), load monitoring computed by {@code org.swingclearance.engine.load}, and alerts for
 * the clinician with a "go back to step N" message for the trainer. {@link org.swingclearance.training.SessionLogs}
 * is the one application service; it audits every read and change.
 */
package org.swingclearance.training;
