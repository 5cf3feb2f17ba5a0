package org.swingclearance.rules;

import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.Set;
import java.util.stream.Collectors;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Confidence;
import org.swingclearance.engine.evidence.EvidenceTag;
import org.swingclearance.engine.rules.Comparison;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.Region;
import org.swingclearance.engine.rules.Rule;
import org.swingclearance.engine.scoring.Unit;
import org.swingclearance.engine.scoring.ValueKey;

/** One stored rule of a rule-set version (table practice_rule, ordered by position). */
@Embeddable
class RuleRow {

    private String code;
    @Enumerated(EnumType.STRING)
    private ValueKey measurement;
    @Enumerated(EnumType.STRING)
    private Comparison comparison;
    private double threshold;
    @Enumerated(EnumType.STRING)
    private Unit unit;
    @Enumerated(EnumType.STRING)
    private Region region;
    @Enumerated(EnumType.STRING)
    private LoadBand cappedBand;
    private String source;
    private String sourceSection;
    @Enumerated(EnumType.STRING)
    private EvidenceTag evidenceTag;
    @Enumerated(EnumType.STRING)
    private Confidence confidence;
    private boolean required;
    @Column(name = "also_needs")
    private String alsoNeeds;

    protected RuleRow() {
    }

    RuleRow(Rule rule) {
        this.code = rule.code();
        this.measurement = rule.key();
        this.comparison = rule.comparison();
        this.threshold = rule.threshold();
        this.unit = rule.unit();
        this.region = rule.region();
        this.cappedBand = rule.caps();
        this.source = rule.source().work();
        this.sourceSection = rule.source().section();
        this.evidenceTag = rule.source().tag();
        this.confidence = rule.source().confidence();
        this.required = rule.required();
        this.alsoNeeds = rule.alsoNeedsWhenFired().stream().map(Enum::name).sorted().collect(Collectors.joining(","));
    }

    Rule toRule() {
        Set<ValueKey> needs = alsoNeeds == null || alsoNeeds.isBlank() ? EnumSet.noneOf(ValueKey.class)
                : Arrays.stream(alsoNeeds.split(",")).map(ValueKey::valueOf)
                        .collect(Collectors.toCollection(() -> EnumSet.noneOf(ValueKey.class)));
        return new Rule(code, measurement, comparison, threshold, unit, region, cappedBand,
                new Citation(source, evidenceTag, confidence, sourceSection), required, needs);
    }
}
