package org.swingclearance.screening.web;

import java.util.ArrayList;
import java.util.List;
import org.swingclearance.patient.Side;
import org.swingclearance.screening.Measurement;
import org.swingclearance.screening.MeasurementCatalog;
import org.swingclearance.screening.MeasurementField;
import org.swingclearance.screening.Questionnaire;
import org.swingclearance.screening.ScreeningSection;

/** The screening form's sections and rows, derived from the catalogue so the page never lists fields by hand. */
final class FormLayout {

    static final List<Section> SECTIONS = build();

    private FormLayout() {
    }

    /** One section: measurement rows, and for the questionnaire section the item groups. */
    record Section(ScreeningSection section, List<Row> rows, List<ItemGroup> questionnaires) {

        /** True when any row is taken per side (then the table has left and right columns). */
        public boolean anySided() {
            return rows.stream().anyMatch(Row::sided);
        }

        public String id() {
            return "section-" + section.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
        }
    }

    /** One measurement: either a left and a right field, or a single field. */
    record Row(Measurement measurement, String leftKey, String rightKey, String singleKey) {

        public boolean sided() {
            return singleKey == null;
        }

        public boolean yesNo() {
            return measurement.kind() == Measurement.Kind.YES_NO;
        }
    }

    /** A questionnaire's item fields. */
    record ItemGroup(Questionnaire questionnaire, List<Item> items) {
    }

    /** One item field; labelled "Item n" (Oswestry: "Section n"), never with item wording. */
    record Item(String key, int number) {
    }

    private static List<Section> build() {
        List<Section> sections = new ArrayList<>();
        for (ScreeningSection s : ScreeningSection.values()) {
            List<Row> rows = new ArrayList<>();
            for (Measurement m : MeasurementCatalog.measures(s)) {
                rows.add(m.sided()
                        ? new Row(m, MeasurementField.key(m, Side.LEFT), MeasurementField.key(m, Side.RIGHT), null)
                        : new Row(m, null, null, MeasurementField.key(m, null)));
            }
            List<ItemGroup> groups = new ArrayList<>();
            if (s == ScreeningSection.QUESTIONNAIRES) {
                for (Questionnaire q : Questionnaire.values()) {
                    List<Item> items = new ArrayList<>();
                    for (int i = 1; i <= q.items(); i++) {
                        items.add(new Item(q.itemKey(i), i));
                    }
                    groups.add(new ItemGroup(q, items));
                }
            }
            sections.add(new Section(s, List.copyOf(rows), List.copyOf(groups)));
        }
        return List.copyOf(sections);
    }
}
