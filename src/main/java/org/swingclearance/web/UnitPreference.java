package org.swingclearance.web;

/** Implemented by the signed-in principal: whether numbers are shown with imperial equivalents too. */
public interface UnitPreference {

    boolean showsImperial();
}
