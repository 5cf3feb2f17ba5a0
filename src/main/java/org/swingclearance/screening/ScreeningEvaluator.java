package org.swingclearance.screening;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.swingclearance.engine.rules.Banding;
import org.swingclearance.engine.rules.BandingResult;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.MissingValue;
import org.swingclearance.engine.rules.Region;
import org.swingclearance.engine.rules.RegionBand;
import org.swingclearance.engine.scoring.DerivedValues;
import org.swingclearance.engine.scoring.Grip;
import org.swingclearance.engine.scoring.ImportantChange;
import org.swingclearance.engine.scoring.Measure;
import org.swingclearance.engine.scoring.Score;
import org.swingclearance.engine.scoring.ScreeningBattery;
import org.swingclearance.engine.scoring.ScreeningInput;
import org.swingclearance.engine.scoring.Strength;
import org.swingclearance.engine.scoring.ValueKey;
import org.swingclearance.patient.Hand;
import org.swingclearance.patient.Side;

/**
 * Turns recorded measurements into a {@link ScreeningSnapshot} by calling the engine: the battery's derived values
 * ({@link ScreeningBattery}), the findings and suggested bands under the clinic's rules ({@link Banding}), the gaps
 * that block signing, and the change since the previous signed screening. Holds no formula of its own: it only
 * maps the form's measurements to engine inputs and the engine's results to the stored snapshot.
 */
final class ScreeningEvaluator {

    /** Version of the scoring and banding this snapshot was computed with; bump when engine results change. */
    static final String ENGINE_VERSION = "swing-scoring 1.0.0";

    /** Extra per-side values the snapshot keeps for trends and for other features (Contract S). */
    enum SideValue {
        SHOULDER_FLEXION_TORQUE, SHOULDER_ER_TORQUE, SHOULDER_IR_TORQUE, GRIP_BEST;

        String key(Side side) {
            return name() + "_" + side.name();
        }
    }

    /** Basis of a suggestion besides the engine's: the region is outside the episode and was not fully assessed. */
    static final String NOT_ASSESSED = "NOT_ASSESSED";

    private ScreeningEvaluator() {
    }

    static ScreeningSnapshot evaluate(EvaluationContext ctx, Measurements m) {
        org.swingclearance.engine.scoring.Side involved = engineSide(ctx.episode().shoulderSide());
        ScreeningInput input = input(ctx, m, involved);
        DerivedValues derived = ScreeningBattery.derive(input, ctx.rules().scoringPolicy());
        boolean redFlags = !m.redFlags().isEmpty();
        BandingResult banding = Banding.evaluate(ctx.rules().ruleSet(), derived, redFlags);

        List<ScreeningSnapshot.Derived> values = new ArrayList<>();
        derived.scores().forEach((key, score) -> values.add(derivedEntry(key.name(), score)));
        for (Side side : Side.values()) {
            org.swingclearance.engine.scoring.Side s = engineSide(side);
            values.add(derivedEntry(SideValue.SHOULDER_FLEXION_TORQUE.key(side), Strength.torque(
                    input.number(Measure.SHOULDER_FLEXION_FORCE, s), input.number(Measure.SHOULDER_FLEXION_LEVER_ARM, s))));
            values.add(derivedEntry(SideValue.SHOULDER_ER_TORQUE.key(side), Strength.torque(
                    input.number(Measure.SHOULDER_ER_FORCE, s), input.number(Measure.SHOULDER_ER_LEVER_ARM, s))));
            values.add(derivedEntry(SideValue.SHOULDER_IR_TORQUE.key(side), Strength.torque(
                    input.number(Measure.SHOULDER_IR_FORCE, s), input.number(Measure.SHOULDER_IR_LEVER_ARM, s))));
            values.add(derivedEntry(SideValue.GRIP_BEST.key(side), grip(m, side)));
        }

        List<ScreeningSnapshot.Finding> findings = banding.findings().stream().map(f -> new ScreeningSnapshot.Finding(
                f.rule().code(), f.rule().key().name(), f.rule().comparison().name(), f.threshold(),
                f.rule().unit().name(), f.value(), f.rule().region().name(), f.cappedBand().name(),
                f.source().label(), f.source().tag().name())).toList();

        List<Region> inScope = regionsInScope(ctx);
        List<ScreeningSnapshot.Missing> missing = new ArrayList<>();
        for (Region region : inScope) {
            for (MissingValue gap : banding.blockingGaps(region)) {
                missing.add(new ScreeningSnapshot.Missing(gap.key().name(), gap.rule().code(), region.name(),
                        gap.measures().stream().map(Object::toString).toList()));
            }
        }

        ScreeningSnapshot.PreviousScreening previous = null;
        List<ScreeningSnapshot.Change> changes = List.of();
        if (ctx.previous() != null) {
            previous = new ScreeningSnapshot.PreviousScreening(ctx.previous().screeningId(),
                    ctx.previous().versionNo(), ctx.previous().signedAt().toString());
            changes = changes(derived, ctx.previous().snapshot());
        }

        return new ScreeningSnapshot(ENGINE_VERSION, ctx.rules().id(), ctx.rules().version(), engineInputs(ctx, input),
                values, findings, suggestion(banding, Region.SHOULDER, inScope),
                suggestion(banding, Region.LUMBOPELVIC, inScope), missing, previous, changes,
                m.redFlags().stream().map(Enum::name).sorted().toList(), redFlags);
    }

    /** The regions the episode is about: only these must be complete to sign. */
    static List<Region> regionsInScope(EvaluationContext ctx) {
        List<Region> regions = new ArrayList<>();
        if (ctx.episode().region().includesShoulder()) {
            regions.add(Region.SHOULDER);
        }
        if (ctx.episode().region().includesLumbopelvic()) {
            regions.add(Region.LUMBOPELVIC);
        }
        return regions;
    }

    /**
     * The engine's suggestion; for a region outside the episode whose required values are missing, Hold instead:
     * an unassessed region permits nothing that needs it (product rule, common practice, no source).
     */
    private static ScreeningSnapshot.Suggestion suggestion(BandingResult banding, Region region, List<Region> inScope) {
        RegionBand band = banding.regions().get(region);
        List<String> codes = band.findings().stream().map(f -> f.rule().code()).toList();
        if (!inScope.contains(region) && band.basis() != RegionBand.Basis.RED_FLAGS
                && !banding.blockingGaps(region).isEmpty()) {
            return new ScreeningSnapshot.Suggestion(LoadBand.HOLD.name(), NOT_ASSESSED, codes);
        }
        return new ScreeningSnapshot.Suggestion(band.band().name(), band.basis().name(), codes);
    }

    private static ScreeningInput input(EvaluationContext ctx, Measurements m,
                                        org.swingclearance.engine.scoring.Side involved) {
        ScreeningInput.Builder b = ScreeningInput.builder(involved);
        for (Measurement measurement : Measurement.values()) {
            Measure engine = engineMeasure(measurement);
            if (engine == null) {
                continue;
            }
            if (measurement.sided()) {
                b.sides(engine, m.get(measurement, Side.LEFT), m.get(measurement, Side.RIGHT));
            } else if (measurement.kind() == Measurement.Kind.YES_NO) {
                Double v = m.get(measurement);
                b.answer(engine, v == null ? null : v == 1);
            } else {
                b.number(engine, m.get(measurement));
            }
        }
        for (Side side : Side.values()) {
            Score grip = grip(m, side);
            if (grip.scorable()) {
                b.number(Measure.GRIP, engineSide(side), grip.orElseThrow());
            }
        }
        List<Integer> trials = new ArrayList<>();
        for (Measurement t : List.of(Measurement.CKCUEST_TRIAL_1, Measurement.CKCUEST_TRIAL_2,
                Measurement.CKCUEST_TRIAL_3, Measurement.CKCUEST_TRIAL_4)) {
            Double v = m.get(t);
            if (v != null) {
                trials.add(v.intValue());
            }
        }
        if (!trials.isEmpty()) {
            b.series(Measure.CKCUEST_TRIALS, trials);
        }
        for (Questionnaire q : Questionnaire.values()) {
            if (m.answered(q)) {
                b.series(Measure.valueOf(q.name()), m.items(q));
            }
        }
        double mass = ctx.patient().bodyMassKg();
        double stature = ctx.patient().statureM();
        int age = ctx.patient().ageOn(ctx.on());
        // Patient facts outside the engine's range stay "not measured" rather than failing the whole screening.
        if (Measure.BODY_MASS.accepts(mass)) {
            b.number(Measure.BODY_MASS, mass);
        }
        if (Measure.STATURE.accepts(stature)) {
            b.number(Measure.STATURE, stature);
        }
        if (Measure.AGE.accepts(age)) {
            b.number(Measure.AGE, (double) age);
        }
        return b.build();
    }

    /** The engine measure a form measurement feeds directly; null for the trials the evaluator summarises. */
    static Measure engineMeasure(Measurement measurement) {
        return switch (measurement) {
            case GRIP_TRIAL_1, GRIP_TRIAL_2, GRIP_TRIAL_3, CKCUEST_TRIAL_1, CKCUEST_TRIAL_2, CKCUEST_TRIAL_3,
                 CKCUEST_TRIAL_4 -> null;
            default -> Measure.valueOf(measurement.name());
        };
    }

    /** Grip strength of one hand: best of the trials done (clinic protocol "best of three"). */
    private static Score grip(Measurements m, Side side) {
        List<Double> trials = new ArrayList<>();
        trials.add(m.get(Measurement.GRIP_TRIAL_1, side));
        trials.add(m.get(Measurement.GRIP_TRIAL_2, side));
        trials.add(m.get(Measurement.GRIP_TRIAL_3, side));
        return Grip.summarise(trials, Grip.Protocol.BEST);
    }

    private static List<ScreeningSnapshot.Change> changes(DerivedValues derived, ScreeningSnapshot previous) {
        Map<ValueKey, Double> before = new EnumMap<>(ValueKey.class);
        previous.values().forEach((key, value) -> {
            for (ValueKey k : ValueKey.values()) {
                if (k.name().equals(key)) {
                    before.put(k, value);
                }
            }
        });
        List<ScreeningSnapshot.Change> result = new ArrayList<>();
        derived.changesSince(before).forEach((key, change) -> {
            Double current = derived.score(key).scorable() ? derived.score(key).orElseThrow() : null;
            if (before.get(key) == null && current == null) {
                return;
            }
            result.add(new ScreeningSnapshot.Change(key.name(), before.get(key), current, valueOf(change.improvement()),
                    valueOf(change.percentImprovement()), change.mcid().points(),
                    change.mcid().percent().isPresent() ? change.mcid().percent().getAsDouble() : null,
                    change.mcid().citation().label(), change.importantImprovement().isYes(),
                    change.importantWorsening().isYes()));
        });
        return result;
    }

    private static Double valueOf(Score score) {
        return score.scorable() ? score.orElseThrow() : null;
    }

    private static ScreeningSnapshot.Derived derivedEntry(String key, Score score) {
        return new ScreeningSnapshot.Derived(key, valueOf(score), score.unit().name(),
                score.notScorable().map(n -> n.rule()).orElse(null), score.citation().label());
    }

    private static ScreeningSnapshot.EngineInputs engineInputs(EvaluationContext ctx, ScreeningInput input) {
        Side involved = factsSide(ctx);
        String basis = ctx.episode().shoulderSide() != null ? "EPISODE_SHOULDER" : "DOMINANT_HAND";
        return new ScreeningSnapshot.EngineInputs(ctx.episode().region().name(),
                input.involvedSide() == null ? null : input.involvedSide().name(), involved.name(), basis,
                ctx.patient().bodyMassKg(), ctx.patient().statureM(), ctx.patient().ageOn(ctx.on()),
                ctx.patient().sex().name());
    }

    /**
     * The side whose values other features read as "involved" (Contract S): the episode's shoulder; for a
     * lumbopelvic-only episode the dominant hand (either hand: right, by convention).
     */
    static Side factsSide(EvaluationContext ctx) {
        if (ctx.episode().shoulderSide() != null) {
            return ctx.episode().shoulderSide();
        }
        return ctx.patient().dominantHand() == Hand.LEFT ? Side.LEFT : Side.RIGHT;
    }

    static org.swingclearance.engine.scoring.Side engineSide(Side side) {
        return side == null ? null : org.swingclearance.engine.scoring.Side.valueOf(side.name());
    }
}
