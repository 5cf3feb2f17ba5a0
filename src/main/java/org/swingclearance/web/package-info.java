/** What the features' web layers share: the clock, error pages, the caution, unit formatting, request ids. */
package org.swingclearance.web;
