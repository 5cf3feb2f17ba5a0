/** The envelope page, its charts' what-if endpoint and its CSV export. */
package org.swingclearance.envelope.web;
