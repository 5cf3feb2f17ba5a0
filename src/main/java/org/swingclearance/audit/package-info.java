/**
 * The tamper-evident audit trail: every read, change, sign-in and denial of patient data becomes one row in
 * its clinic's SHA-256 hash chain, written in the same transaction as the change it records. Also its
 * verification (pages and command line), the signed daily checkpoints, and the clinic manager's oversight:
 * the filtered log, a patient's access log, reports built on the trail, and audited exports (DEVELOPERS.md, "The audit trail").
 */
package org.swingclearance.audit;
