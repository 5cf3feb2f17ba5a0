package org.swingclearance.equipment;

/** A clinic's own swing pattern as entered: degrees, hands 1 or 2, reach factor 0.3–1, kind, band it needs. */
public record SwingPatternDetails(String name, double centreDeg, double halfArcDeg, int hands, double reach,
                                  String kind, boolean hipDriven, String minimumLumbopelvicBand) {
}
