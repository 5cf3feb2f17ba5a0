package org.swingclearance.web;

import java.util.Locale;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.stereotype.Component;

/**
 * Formats stored SI values for pages as {@code ${@units.kg(x)}}: always metric with its unit, followed by
 * the imperial equivalent when the signed-in user asked for it. Conversions are exact by definition
 * (1 lb = 0.45359237 kg, 1 in = 2.54 cm).
 */
@Component("units")
public class Units {

    public static final double KG_PER_LB = 0.45359237;
    public static final double CM_PER_IN = 2.54;

    public String metres(Double m) {
        if (m == null) {
            return "–";
        }
        String metric = String.format(Locale.ROOT, "%.2f m", m);
        if (!imperial()) {
            return metric;
        }
        double inches = m * 100 / CM_PER_IN;
        long feet = (long) Math.floor(inches / 12);
        return metric + String.format(Locale.ROOT, " (%d ft %.0f in)", feet, inches - feet * 12);
    }

    public String cm(Double cm) {
        if (cm == null) {
            return "–";
        }
        String metric = String.format(Locale.ROOT, "%.1f cm", cm);
        return imperial() ? metric + String.format(Locale.ROOT, " (%.1f in)", cm / CM_PER_IN) : metric;
    }

    public String kg(Double kg) {
        if (kg == null) {
            return "–";
        }
        String metric = String.format(Locale.ROOT, "%.1f kg", kg);
        return imperial() ? metric + String.format(Locale.ROOT, " (%.1f lb)", kg / KG_PER_LB) : metric;
    }

    /** A plain number with its unit and the given decimals, for units without an imperial display. */
    public String num(Double value, int decimals, String unit) {
        if (value == null) {
            return "–";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", value) + (unit == null || unit.isEmpty() ? "" : " " + unit);
    }

    public boolean imperial() {
        Authentication auth = SecurityContextHolder.getContext().getAuthentication();
        return auth != null && auth.getPrincipal() instanceof UnitPreference p && p.showsImperial();
    }
}
