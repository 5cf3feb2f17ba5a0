package org.swingclearance.rules;

import jakarta.persistence.CollectionTable;
import jakarta.persistence.Column;
import jakarta.persistence.ElementCollection;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.FetchType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.MapKeyColumn;
import jakarta.persistence.MapKeyEnumerated;
import jakarta.persistence.OrderColumn;
import jakarta.persistence.PostPersist;
import jakarta.persistence.Table;
import jakarta.persistence.Transient;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.hibernate.annotations.Immutable;
import org.springframework.data.domain.Persistable;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.scoring.Instrument;
import org.swingclearance.engine.scoring.Mcid;
import org.swingclearance.engine.scoring.ScoringPolicy;
import org.swingclearance.engine.scoring.Spadi;

/**
 * One stored version of a clinic's practice rules with its rules, plan defaults and MCIDs. Written once and never
 * changed (Hibernate treats it as immutable; the database refuses UPDATE and DELETE).
 */
@Entity
@Immutable
@Table(name = "practice_rule_set")
class RuleSetRecord implements Persistable<UUID> {

    @Id
    private UUID id;
    private UUID clinicId;
    private int version;
    private UUID createdBy;
    private Instant createdAt;
    private String changeNote;
    @Enumerated(EnumType.STRING)
    private LoadBand defaultBand;
    private double fractionHold;
    @Column(name = "fraction_band_1")
    private double fractionBand1;
    @Column(name = "fraction_band_2")
    private double fractionBand2;
    @Column(name = "fraction_band_3")
    private double fractionBand3;
    private double fractionOpen;
    private Double gripFraction;
    private boolean controlledStop;
    private double rangeMarginDeg;
    @Enumerated(EnumType.STRING)
    private LoadBand hipDrivenMinimumBand;
    private double stepLimit;
    private int painDuringLimit;
    private double acwrCaution;
    private int odiMaxMissingSections;
    private int spadiMaxMissingItems;
    @Enumerated(EnumType.STRING)
    private Spadi.TotalMethod spadiTotalMethod;

    @Immutable
    @ElementCollection(fetch = FetchType.EAGER)
    @CollectionTable(name = "practice_rule", joinColumns = @JoinColumn(name = "rule_set_id"))
    @OrderColumn(name = "position")
    private List<RuleRow> rules = new ArrayList<>();

    @Immutable
    @ElementCollection(fetch = FetchType.EAGER)
    @CollectionTable(name = "practice_rule_band_plan", joinColumns = @JoinColumn(name = "rule_set_id"))
    @MapKeyColumn(name = "band")
    @MapKeyEnumerated(EnumType.STRING)
    private Map<LoadBand, BandPlanRow> bandPlans = new EnumMap<>(LoadBand.class);

    @Immutable
    @ElementCollection(fetch = FetchType.EAGER)
    @CollectionTable(name = "practice_rule_mcid", joinColumns = @JoinColumn(name = "rule_set_id"))
    @MapKeyColumn(name = "instrument")
    @MapKeyEnumerated(EnumType.STRING)
    private Map<Instrument, McidRow> mcids = new EnumMap<>(Instrument.class);

    /** True until stored: a version is only ever inserted (never merged), so Spring Data must persist it. */
    @Transient
    private boolean unsaved;

    protected RuleSetRecord() {
    }

    /** A new version from complete settings. */
    RuleSetRecord(UUID id, UUID clinicId, int version, UUID createdBy, Instant createdAt, String changeNote,
                  RuleSetSettings s) {
        this.unsaved = true;
        this.id = id;
        this.clinicId = clinicId;
        this.version = version;
        this.createdBy = createdBy;
        this.createdAt = createdAt;
        this.changeNote = changeNote;
        this.defaultBand = s.defaultBand();
        this.fractionHold = s.bandFractions().get(LoadBand.HOLD);
        this.fractionBand1 = s.bandFractions().get(LoadBand.BAND_1);
        this.fractionBand2 = s.bandFractions().get(LoadBand.BAND_2);
        this.fractionBand3 = s.bandFractions().get(LoadBand.BAND_3);
        this.fractionOpen = s.bandFractions().get(LoadBand.OPEN);
        this.gripFraction = Double.isNaN(s.gripFraction()) ? null : s.gripFraction();
        this.controlledStop = s.controlledStop();
        this.rangeMarginDeg = s.rangeMarginDeg();
        this.hipDrivenMinimumBand = s.hipDrivenMinimumBand();
        this.stepLimit = s.stepLimit();
        this.painDuringLimit = s.painDuringLimit();
        this.acwrCaution = s.acwrCaution();
        this.odiMaxMissingSections = s.scoringPolicy().odiMaxMissingSections();
        this.spadiMaxMissingItems = s.scoringPolicy().spadiMaxMissingItems();
        this.spadiTotalMethod = s.scoringPolicy().spadiTotalMethod();
        s.rules().forEach(r -> rules.add(new RuleRow(r)));
        s.planDefaults().forEach((band, d) -> bandPlans.put(band, new BandPlanRow(d)));
        s.scoringPolicy().mcids().forEach((instrument, m) -> mcids.put(instrument, new McidRow(m)));
    }

    @Override
    public UUID getId() { return id; }

    @Override
    public boolean isNew() { return unsaved; }

    @PostPersist
    void stored() { unsaved = false; }

    UUID getClinicId() { return clinicId; }
    int getVersion() { return version; }

    CurrentRuleSet toView() {
        Map<LoadBand, Double> fractions = new EnumMap<>(LoadBand.class);
        fractions.put(LoadBand.HOLD, fractionHold);
        fractions.put(LoadBand.BAND_1, fractionBand1);
        fractions.put(LoadBand.BAND_2, fractionBand2);
        fractions.put(LoadBand.BAND_3, fractionBand3);
        fractions.put(LoadBand.OPEN, fractionOpen);
        Map<LoadBand, BandPlanDefaults> plans = new EnumMap<>(LoadBand.class);
        bandPlans.forEach((band, row) -> plans.put(band, row.toDefaults()));
        Map<Instrument, Mcid> mcidMap = new EnumMap<>(Instrument.class);
        mcids.forEach((instrument, row) -> mcidMap.put(instrument, row.toMcid(instrument)));
        RuleSetSettings settings = new RuleSetSettings(defaultBand, fractions,
                gripFraction == null ? Double.NaN : gripFraction, controlledStop, rangeMarginDeg,
                hipDrivenMinimumBand, stepLimit, painDuringLimit, acwrCaution, plans,
                new ScoringPolicy(odiMaxMissingSections, spadiMaxMissingItems, spadiTotalMethod, mcidMap),
                rules.stream().map(RuleRow::toRule).toList());
        return new CurrentRuleSet(id, clinicId, version, createdAt, createdBy, changeNote, settings);
    }
}
