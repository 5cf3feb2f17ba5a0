package org.swingclearance.rules;

import jakarta.persistence.Embeddable;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import java.util.OptionalDouble;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Confidence;
import org.swingclearance.engine.evidence.EvidenceTag;
import org.swingclearance.engine.scoring.Instrument;
import org.swingclearance.engine.scoring.Mcid;

/** Stored MCID of one instrument (table practice_rule_mcid). */
@Embeddable
class McidRow {

    private double points;
    private Double percent;
    private String source;
    private String sourceSection;
    @Enumerated(EnumType.STRING)
    private EvidenceTag evidenceTag;
    @Enumerated(EnumType.STRING)
    private Confidence confidence;

    protected McidRow() {
    }

    McidRow(Mcid mcid) {
        this.points = mcid.points();
        this.percent = mcid.percent().isPresent() ? mcid.percent().getAsDouble() : null;
        this.source = mcid.citation().work();
        this.sourceSection = mcid.citation().section();
        this.evidenceTag = mcid.citation().tag();
        this.confidence = mcid.citation().confidence();
    }

    Mcid toMcid(Instrument instrument) {
        return new Mcid(instrument, points, percent == null ? OptionalDouble.empty() : OptionalDouble.of(percent),
                new Citation(source, evidenceTag, confidence, sourceSection));
    }
}
