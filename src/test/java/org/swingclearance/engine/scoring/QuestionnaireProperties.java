package org.swingclearance.engine.scoring;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/** Properties of the questionnaire scores over every valid response pattern. */
class QuestionnaireProperties {

    @Property
    void quickDashIsWithin0And100WhenScorable(@ForAll("quickDashResponses") List<Integer> responses) {
        Score score = QuickDash.score(responses);
        long answered = responses.stream().filter(r -> r != null).count();
        assertThat(score.scorable()).isEqualTo(answered >= 10);
        score.value().ifPresent(value -> assertThat(value).isBetween(0.0, 100.0));
    }

    @Property
    void oswestryIsWithin0And100WhenScorable(@ForAll("oswestrySections") List<Integer> sections) {
        Oswestry odi = Oswestry.score(sections);
        odi.score().value().ifPresent(value -> assertThat(value).isBetween(0.0, 100.0));
        assertThat(odi.band().isPresent()).isEqualTo(odi.score().scorable());
    }

    @Provide
    Arbitrary<List<Integer>> quickDashResponses() {
        return responses(1, 5, 11);
    }

    @Provide
    Arbitrary<List<Integer>> oswestrySections() {
        return responses(0, 5, 10);
    }

    private static Arbitrary<List<Integer>> responses(int min, int max, int items) {
        // jqwik's list arbitraries reject null elements, so unanswered items are drawn as −1 and mapped to null
        return Arbitraries.integers().between(min - 1, max).list().ofSize(items).map(drawn -> {
            List<Integer> withGaps = new ArrayList<>();
            drawn.forEach(value -> withGaps.add(value < min ? null : value));
            return withGaps;
        });
    }
}
