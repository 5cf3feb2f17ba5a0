package org.swingclearance.screening;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.PatientPage;
import org.swingclearance.patient.PatientPanel;
import org.swingclearance.patient.Side;

/** The patient page's screening section: history per episode, current bands, trends, start or continue a screening. */
@Component
class ScreeningPatientPanel implements PatientPanel {

    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm").withZone(ZoneOffset.UTC);

    private final Screenings screenings;

    ScreeningPatientPanel(Screenings screenings) {
        this.screenings = screenings;
    }

    @Override
    public int order() {
        return 20;
    }

    @Override
    public String template() {
        return "screening/patient-panel";
    }

    @Override
    public Object data(CurrentStaff staff, PatientPage page) {
        PatientScreenings history = screenings.forPatient(staff, page.patient().id());
        return new Data(history, trendTables(history.trend()));
    }

    /** What the panel fragment renders. */
    record Data(PatientScreenings history, List<TrendTable> trends) {
    }

    /** One trend chart and its accessible table: columns are signed screenings, rows are series. */
    record TrendTable(String id, String captionKey, List<String> columns, List<Series> rows) {
    }

    /** One series: its label (message key and side), and the value per column as text ("" = not tested). */
    record Series(String labelKey, String sideKey, List<String> values) {
    }

    private static List<TrendTable> trendTables(List<PatientScreenings.TrendPoint> points) {
        if (points.isEmpty()) {
            return List.of();
        }
        List<String> columns = points.stream().map(p -> DAY.format(p.signedAt())).toList();
        List<Series> rom = new ArrayList<>();
        for (Measurement m : List.of(Measurement.SHOULDER_FLEXION_ACTIVE, Measurement.SHOULDER_ABDUCTION_ACTIVE,
                Measurement.SHOULDER_ER_90_ACTIVE, Measurement.SHOULDER_IR_90_ACTIVE)) {
            for (Side side : Side.values()) {
                String key = MeasurementField.key(m, side);
                add(rom, "Measure." + m.name(), "Side." + side.name(), points, p -> p.measured().get(key));
            }
        }
        List<Series> torque = new ArrayList<>();
        for (ScreeningEvaluator.SideValue v : List.of(ScreeningEvaluator.SideValue.SHOULDER_FLEXION_TORQUE,
                ScreeningEvaluator.SideValue.SHOULDER_ER_TORQUE, ScreeningEvaluator.SideValue.SHOULDER_IR_TORQUE)) {
            for (Side side : Side.values()) {
                String key = v.key(side);
                add(torque, "SideValue." + key, null, points, p -> p.derived().get(key));
            }
        }
        List<Series> questionnaires = new ArrayList<>();
        for (String key : List.of("QUICKDASH_SCORE", "ODI_SCORE", "SPADI_TOTAL", "TSK11_SCORE")) {
            add(questionnaires, "ValueKey." + key, null, points, p -> p.derived().get(key));
        }
        List<TrendTable> tables = new ArrayList<>();
        if (!rom.isEmpty()) {
            tables.add(new TrendTable("trend-rom", "screening.trend.rom", columns, rom));
        }
        if (!torque.isEmpty()) {
            tables.add(new TrendTable("trend-torque", "screening.trend.torque", columns, torque));
        }
        if (!questionnaires.isEmpty()) {
            tables.add(new TrendTable("trend-questionnaires", "screening.trend.questionnaires", columns, questionnaires));
        }
        return tables;
    }

    /** Adds a series when at least one screening has a value for it. */
    private static void add(List<Series> rows, String labelKey, String sideKey, List<PatientScreenings.TrendPoint> points,
                            Function<PatientScreenings.TrendPoint, Double> value) {
        List<String> values = points.stream().map(value).map(v -> v == null ? "" : number(v)).toList();
        if (values.stream().anyMatch(v -> !v.isEmpty())) {
            rows.add(new Series(labelKey, sideKey, values));
        }
    }

    private static String number(double v) {
        return java.math.BigDecimal.valueOf(v).setScale(2, java.math.RoundingMode.HALF_UP).stripTrailingZeros()
                .toPlainString();
    }

}
