package org.swingclearance.screening.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.swingclearance.screening.MeasurementCatalog;
import org.swingclearance.screening.MeasurementField;

/** The form is built from the catalogue: every measurement and questionnaire item appears exactly once. */
class FormLayoutTests {

    @Test
    void everyCatalogueFieldAppearsOnTheFormExactlyOnce() {
        List<String> onForm = new ArrayList<>();
        for (FormLayout.Section section : FormLayout.SECTIONS) {
            section.rows().forEach(r -> Stream.of(r.leftKey(), r.rightKey(), r.singleKey())
                    .filter(k -> k != null).forEach(onForm::add));
            section.questionnaires().forEach(g -> g.items().forEach(i -> onForm.add(i.key())));
        }
        assertThat(onForm).doesNotHaveDuplicates();
        assertThat(onForm).containsExactlyInAnyOrderElementsOf(
                MeasurementCatalog.fields().stream().map(MeasurementField::key).toList());
    }
}
