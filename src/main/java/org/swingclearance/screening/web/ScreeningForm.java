package org.swingclearance.screening.web;

import java.util.EnumSet;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.screening.Decision;
import org.swingclearance.screening.MeasurementCatalog;
import org.swingclearance.screening.MeasurementField;
import org.swingclearance.screening.Measurements;

/**
 * The screening form as typed: every value as text by catalogue key (blank = not tested), the red-flag checklist,
 * the clinician's band decision, and the draft's lock version. {@link org.swingclearance.screening.MeasurementReading}
 * turns the text into checked numbers.
 */
public class ScreeningForm {

    private Map<String, String> values = new LinkedHashMap<>();
    private Set<RedFlag> redFlags = new HashSet<>();
    private long lockVersion;
    private String shoulderBand = "";
    private String shoulderOverrideReason;
    private String lumbopelvicBand = "";
    private String lumbopelvicOverrideReason;

    static ScreeningForm of(Measurements measurements, long lockVersion) {
        ScreeningForm form = new ScreeningForm();
        for (MeasurementField field : MeasurementCatalog.fields()) {
            Double value = measurements.values().get(field.key());
            form.values.put(field.key(), value == null ? "" : plain(value));
        }
        form.redFlags = new HashSet<>(measurements.redFlags());
        form.lockVersion = lockVersion;
        return form;
    }

    /** A value as a clinician would type it: no trailing ".0", never exponent notation. */
    private static String plain(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return String.valueOf((long) value);
        }
        return new java.math.BigDecimal(Double.toString(value)).stripTrailingZeros().toPlainString();
    }

    Set<RedFlag> redFlagSet() {
        return redFlags == null || redFlags.isEmpty() ? EnumSet.noneOf(RedFlag.class) : EnumSet.copyOf(redFlags);
    }

    Decision decision() {
        return new Decision(blankToNull(shoulderBand), blankToNull(shoulderOverrideReason),
                blankToNull(lumbopelvicBand), blankToNull(lumbopelvicOverrideReason));
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.trim();
    }

    /** The form path of a catalogue value, as used in binding errors: {@code values[KEY]}. */
    static String path(String key) {
        return "values[" + key + "]";
    }


    public Map<String, String> getValues() { return values; }
    public void setValues(Map<String, String> values) { this.values = values; }
    public Set<RedFlag> getRedFlags() { return redFlags; }
    public void setRedFlags(Set<RedFlag> redFlags) { this.redFlags = redFlags; }
    public long getLockVersion() { return lockVersion; }
    public void setLockVersion(long lockVersion) { this.lockVersion = lockVersion; }
    public String getShoulderBand() { return shoulderBand; }
    public void setShoulderBand(String shoulderBand) { this.shoulderBand = shoulderBand; }
    public String getShoulderOverrideReason() { return shoulderOverrideReason; }
    public void setShoulderOverrideReason(String r) { this.shoulderOverrideReason = r; }
    public String getLumbopelvicBand() { return lumbopelvicBand; }
    public void setLumbopelvicBand(String lumbopelvicBand) { this.lumbopelvicBand = lumbopelvicBand; }
    public String getLumbopelvicOverrideReason() { return lumbopelvicOverrideReason; }
    public void setLumbopelvicOverrideReason(String r) { this.lumbopelvicOverrideReason = r; }
}
