package org.swingclearance.rules.web;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.swingclearance.engine.evidence.Confidence;
import org.swingclearance.engine.evidence.EvidenceTag;
import org.swingclearance.engine.rules.Comparison;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.Region;
import org.swingclearance.engine.rules.Rule;
import org.swingclearance.engine.scoring.Instrument;
import org.swingclearance.engine.scoring.Mcid;
import org.swingclearance.engine.scoring.Spadi;
import org.swingclearance.rules.BandPlanDefaults;
import org.swingclearance.rules.CurrentRuleSet;

/**
 * The practice-rules editor: every setting of a version and its rules, prefilled from the version being edited,
 * plus empty rows for new rules. Fractions and the step limit are entered in percent.
 */
public class RuleSetForm {

    /** Empty rule rows offered for new rules. */
    static final int NEW_RULE_ROWS = 3;

    private int basedOnVersion;
    @NotBlank
    @Size(max = 1000)
    private String changeNote;
    @NotNull
    private LoadBand defaultBand;
    @Valid
    private List<BandRow> bands = new ArrayList<>();
    @DecimalMin(value = "0", inclusive = false)
    @DecimalMax("100")
    private Double gripPercent;
    private boolean controlledStop;
    @NotNull
    @DecimalMin("0")
    @DecimalMax("90")
    private Double rangeMarginDeg;
    @NotNull
    private LoadBand hipDrivenMinimumBand;
    @NotNull
    @DecimalMin(value = "0", inclusive = false)
    @DecimalMax("100")
    private Double stepLimitPercent;
    @NotNull
    @Min(0)
    @Max(10)
    private Integer painDuringLimit;
    @NotNull
    @DecimalMin(value = "0", inclusive = false)
    @DecimalMax("5")
    private Double acwrCaution;
    @NotNull
    @Min(0)
    @Max(9)
    private Integer odiMaxMissingSections;
    @NotNull
    @Min(0)
    @Max(12)
    private Integer spadiMaxMissingItems;
    @NotNull
    private Spadi.TotalMethod spadiTotalMethod;
    @Valid
    private List<McidRow> mcids = new ArrayList<>();
    @Valid
    private List<RuleRow> rules = new ArrayList<>();

    static RuleSetForm of(CurrentRuleSet current) {
        RuleSetForm f = new RuleSetForm();
        f.basedOnVersion = current.version();
        f.defaultBand = current.defaultBand();
        for (LoadBand band : LoadBand.values()) {
            BandRow row = new BandRow();
            row.band = band;
            row.fractionPercent = round(current.fraction(band) * 100);
            BandPlanDefaults plan = current.planDefaults().get(band);
            if (plan != null) {
                row.sets = plan.sets();
                row.reps = plan.reps();
                row.effortCap = plan.effortCap();
            }
            f.bands.add(row);
        }
        f.gripPercent = Double.isNaN(current.gripFraction()) ? null : round(current.gripFraction() * 100);
        f.controlledStop = current.controlledStop();
        f.rangeMarginDeg = current.rangeMarginDeg();
        f.hipDrivenMinimumBand = LoadBand.valueOf(current.hipDrivenMinimumBand());
        f.stepLimitPercent = round(current.stepLimit() * 100);
        f.painDuringLimit = current.painDuringLimit();
        f.acwrCaution = current.acwrCaution();
        f.odiMaxMissingSections = current.scoringPolicy().odiMaxMissingSections();
        f.spadiMaxMissingItems = current.scoringPolicy().spadiMaxMissingItems();
        f.spadiTotalMethod = current.scoringPolicy().spadiTotalMethod();
        for (Instrument instrument : Instrument.values()) {
            Mcid mcid = current.scoringPolicy().mcid(instrument);
            McidRow row = new McidRow();
            row.instrument = instrument;
            row.points = mcid.points();
            row.percent = mcid.percent().isPresent() ? mcid.percent().getAsDouble() : null;
            row.source = mcid.citation().work();
            row.sourceSection = mcid.citation().section();
            row.evidenceTag = mcid.citation().tag();
            row.confidence = mcid.citation().confidence();
            f.mcids.add(row);
        }
        for (Rule rule : current.rules()) {
            f.rules.add(RuleRow.of(rule));
        }
        f.addBlankRules();
        return f;
    }

    void addBlankRules() {
        for (int i = 0; i < NEW_RULE_ROWS; i++) {
            rules.add(new RuleRow());
        }
    }

    /** Band fractions as entered, by band (null where missing). */
    Map<LoadBand, Double> fractions() {
        Map<LoadBand, Double> fractions = new EnumMap<>(LoadBand.class);
        bands.forEach(b -> {
            if (b.band != null && b.fractionPercent != null) {
                fractions.put(b.band, b.fractionPercent / 100.0);
            }
        });
        return fractions;
    }

    private static double round(double v) {
        return Math.round(v * 1e6) / 1e6;
    }

    /** One band: its fraction and, except Hold, the plan-step defaults. */
    public static class BandRow {
        private LoadBand band;
        @NotNull
        @DecimalMin("0")
        @DecimalMax("100")
        private Double fractionPercent;
        @Min(1)
        @Max(20)
        private Integer sets;
        @Min(1)
        @Max(200)
        private Integer reps;
        @Min(0)
        @Max(10)
        private Integer effortCap;

        public LoadBand getBand() { return band; }
        public void setBand(LoadBand band) { this.band = band; }
        public Double getFractionPercent() { return fractionPercent; }
        public void setFractionPercent(Double v) { this.fractionPercent = v; }
        public Integer getSets() { return sets; }
        public void setSets(Integer sets) { this.sets = sets; }
        public Integer getReps() { return reps; }
        public void setReps(Integer reps) { this.reps = reps; }
        public Integer getEffortCap() { return effortCap; }
        public void setEffortCap(Integer effortCap) { this.effortCap = effortCap; }
    }

    /** The MCID of one instrument. */
    public static class McidRow {
        private Instrument instrument;
        @NotNull
        @DecimalMin(value = "0", inclusive = false)
        private Double points;
        @DecimalMin(value = "0", inclusive = false)
        private Double percent;
        @NotBlank
        @Size(max = 500)
        private String source;
        @NotBlank
        @Size(max = 100)
        private String sourceSection;
        @NotNull
        private EvidenceTag evidenceTag;
        @NotNull
        private Confidence confidence;

        public Instrument getInstrument() { return instrument; }
        public void setInstrument(Instrument instrument) { this.instrument = instrument; }
        public Double getPoints() { return points; }
        public void setPoints(Double points) { this.points = points; }
        public Double getPercent() { return percent; }
        public void setPercent(Double percent) { this.percent = percent; }
        public String getSource() { return source; }
        public void setSource(String source) { this.source = source; }
        public String getSourceSection() { return sourceSection; }
        public void setSourceSection(String s) { this.sourceSection = s; }
        public EvidenceTag getEvidenceTag() { return evidenceTag; }
        public void setEvidenceTag(EvidenceTag evidenceTag) { this.evidenceTag = evidenceTag; }
        public Confidence getConfidence() { return confidence; }
        public void setConfidence(Confidence confidence) { this.confidence = confidence; }
    }

    /** One rule; a row without a measurement is an unused new row; "remove" drops the rule from the new version. */
    public static class RuleRow {
        @Size(max = 80)
        private String code;
        private org.swingclearance.engine.scoring.ValueKey measurement;
        private Comparison comparison;
        private Double threshold;
        private Region region;
        private LoadBand cappedBand;
        @Size(max = 500)
        private String source;
        @Size(max = 100)
        private String sourceSection;
        private EvidenceTag evidenceTag;
        private Confidence confidence;
        private boolean required;
        @Size(max = 500)
        private String alsoNeeds;
        private boolean remove;

        static RuleRow of(Rule rule) {
            RuleRow row = new RuleRow();
            row.code = rule.code();
            row.measurement = rule.key();
            row.comparison = rule.comparison();
            row.threshold = rule.threshold();
            row.region = rule.region();
            row.cappedBand = rule.caps();
            row.source = rule.source().work();
            row.sourceSection = rule.source().section();
            row.evidenceTag = rule.source().tag();
            row.confidence = rule.source().confidence();
            row.required = rule.required();
            row.alsoNeeds = String.join(",", rule.alsoNeedsWhenFired().stream().map(Enum::name).sorted().toList());
            return row;
        }

        /** True for a row that holds no rule (an unused new row). */
        boolean blank() {
            return measurement == null && (code == null || code.isBlank()) && threshold == null;
        }

        public String getCode() { return code; }
        public void setCode(String code) { this.code = code; }
        public org.swingclearance.engine.scoring.ValueKey getMeasurement() { return measurement; }
        public void setMeasurement(org.swingclearance.engine.scoring.ValueKey m) { this.measurement = m; }
        public Comparison getComparison() { return comparison; }
        public void setComparison(Comparison comparison) { this.comparison = comparison; }
        public Double getThreshold() { return threshold; }
        public void setThreshold(Double threshold) { this.threshold = threshold; }
        public Region getRegion() { return region; }
        public void setRegion(Region region) { this.region = region; }
        public LoadBand getCappedBand() { return cappedBand; }
        public void setCappedBand(LoadBand cappedBand) { this.cappedBand = cappedBand; }
        public String getSource() { return source; }
        public void setSource(String source) { this.source = source; }
        public String getSourceSection() { return sourceSection; }
        public void setSourceSection(String s) { this.sourceSection = s; }
        public EvidenceTag getEvidenceTag() { return evidenceTag; }
        public void setEvidenceTag(EvidenceTag evidenceTag) { this.evidenceTag = evidenceTag; }
        public Confidence getConfidence() { return confidence; }
        public void setConfidence(Confidence confidence) { this.confidence = confidence; }
        public boolean isRequired() { return required; }
        public void setRequired(boolean required) { this.required = required; }
        public String getAlsoNeeds() { return alsoNeeds; }
        public void setAlsoNeeds(String alsoNeeds) { this.alsoNeeds = alsoNeeds; }
        public boolean isRemove() { return remove; }
        public void setRemove(boolean remove) { this.remove = remove; }
    }

    public int getBasedOnVersion() { return basedOnVersion; }
    public void setBasedOnVersion(int basedOnVersion) { this.basedOnVersion = basedOnVersion; }
    public String getChangeNote() { return changeNote; }
    public void setChangeNote(String changeNote) { this.changeNote = changeNote; }
    public LoadBand getDefaultBand() { return defaultBand; }
    public void setDefaultBand(LoadBand defaultBand) { this.defaultBand = defaultBand; }
    public List<BandRow> getBands() { return bands; }
    public void setBands(List<BandRow> bands) { this.bands = bands; }
    public Double getGripPercent() { return gripPercent; }
    public void setGripPercent(Double gripPercent) { this.gripPercent = gripPercent; }
    public boolean isControlledStop() { return controlledStop; }
    public void setControlledStop(boolean controlledStop) { this.controlledStop = controlledStop; }
    public Double getRangeMarginDeg() { return rangeMarginDeg; }
    public void setRangeMarginDeg(Double rangeMarginDeg) { this.rangeMarginDeg = rangeMarginDeg; }
    public LoadBand getHipDrivenMinimumBand() { return hipDrivenMinimumBand; }
    public void setHipDrivenMinimumBand(LoadBand b) { this.hipDrivenMinimumBand = b; }
    public Double getStepLimitPercent() { return stepLimitPercent; }
    public void setStepLimitPercent(Double stepLimitPercent) { this.stepLimitPercent = stepLimitPercent; }
    public Integer getPainDuringLimit() { return painDuringLimit; }
    public void setPainDuringLimit(Integer painDuringLimit) { this.painDuringLimit = painDuringLimit; }
    public Double getAcwrCaution() { return acwrCaution; }
    public void setAcwrCaution(Double acwrCaution) { this.acwrCaution = acwrCaution; }
    public Integer getOdiMaxMissingSections() { return odiMaxMissingSections; }
    public void setOdiMaxMissingSections(Integer v) { this.odiMaxMissingSections = v; }
    public Integer getSpadiMaxMissingItems() { return spadiMaxMissingItems; }
    public void setSpadiMaxMissingItems(Integer v) { this.spadiMaxMissingItems = v; }
    public Spadi.TotalMethod getSpadiTotalMethod() { return spadiTotalMethod; }
    public void setSpadiTotalMethod(Spadi.TotalMethod m) { this.spadiTotalMethod = m; }
    public List<McidRow> getMcids() { return mcids; }
    public void setMcids(List<McidRow> mcids) { this.mcids = mcids; }
    public List<RuleRow> getRules() { return rules; }
    public void setRules(List<RuleRow> rules) { this.rules = rules; }
}
