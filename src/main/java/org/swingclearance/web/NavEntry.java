package org.swingclearance.web;

import java.util.Set;

/**
 * One item of the main navigation. Each feature declares its own as a bean, so adding a feature never edits
 * the layout; the layout shows the items whose roles the signed-in user holds, ordered by {@code order}.
 */
public record NavEntry(String labelKey, String href, Set<String> roles, int order) {
}
