/** Sign-in page, role home pages and the clinic administrator's staff pages. */
package org.swingclearance.identity.web;
