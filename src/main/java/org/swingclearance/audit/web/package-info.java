/** The clinic manager's audit pages: chain status and verification, the log, reports and exports. */
package org.swingclearance.audit.web;
