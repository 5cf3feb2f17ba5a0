package org.swingclearance.identity;

/**
 * A section of a role's home page, contributed by a feature as a bean: the template fragment
 * {@code <template> :: panel(data)} is rendered with what {@link #data} returns.
 */
public interface HomePanel {

    boolean shows(CurrentStaff staff);

    int order();

    String template();

    Object data(CurrentStaff staff);
}
