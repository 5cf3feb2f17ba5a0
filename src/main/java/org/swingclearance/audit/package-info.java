/**
 * The tamper-evident audit trail: every read, change, sign-in and denial of patient data becomes one row in
 * its clinic's SHA-256 hash chain, written in the same transaction as the change it records.
 */
package org.swingclearance.audit;
