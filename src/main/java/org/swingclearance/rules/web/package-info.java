/** The practice-rules pages: the current version with its history, and the editor for managers and admins. */
package org.swingclearance.rules.web;
