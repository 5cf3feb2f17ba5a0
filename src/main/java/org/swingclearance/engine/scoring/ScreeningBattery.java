package org.swingclearance.engine.scoring;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Citations;

/**
 * Derives every value of the screening battery from the raw inputs of one screening: the entry point the screening
 * feature calls to show derived values live and to snapshot them with the signed record.
 */
public final class ScreeningBattery {

    private ScreeningBattery() {
    }

    /** Derives with {@link ScoringPolicy#DEFAULT}. */
    public static DerivedValues derive(ScreeningInput input) {
        return derive(input, ScoringPolicy.DEFAULT);
    }

    /**
     * Derives every {@link ValueKey}.
     *
     * @param input  raw inputs; never null
     * @param policy missing-item limits, SPADI method and MCIDs; never null
     * @return a score for every key; never null
     */
    public static DerivedValues derive(ScreeningInput input, ScoringPolicy policy) {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(policy, "policy");
        Map<ValueKey, Score> scores = new EnumMap<>(ValueKey.class);
        pain(input, scores);
        RotationBasis basis = shoulderMobility(input, scores);
        shoulderStrength(input, scores);
        shoulderStability(input, scores);
        shoulderQuestionnaires(input, policy, scores);
        lumbopelvic(input, scores);
        Oswestry odi = input.seriesOf(Measure.ODI) == null
                ? new Oswestry(Score.notTested(Unit.PERCENT, Citations.FAIRBANK_2000,
                        "ODI not completed"), Optional.empty())
                : Oswestry.score(input.seriesOf(Measure.ODI), policy.odiMaxMissingSections());
        scores.put(ValueKey.ODI_SCORE, odi.score());
        scores.put(ValueKey.TSK11_SCORE, input.seriesOf(Measure.TSK_11) == null
                ? Score.notTested(Unit.POINTS, Citations.TSK11_SCORING,
                        "TSK-11 not completed")
                : Kinesiophobia.tsk11(input.seriesOf(Measure.TSK_11)));
        return new DerivedValues(input, scores, basis, odi.band(), policy);
    }

    private static void pain(ScreeningInput input, Map<ValueKey, Score> scores) {
        scores.put(ValueKey.PAIN_AT_REST, rating(input.number(Measure.PAIN_AT_REST), "pain at rest"));
        scores.put(ValueKey.PAIN_DURING_MOVEMENT,
                rating(input.number(Measure.PAIN_DURING_MOVEMENT), "pain during movement"));
        scores.put(ValueKey.PAIN_WORST_24H, rating(input.number(Measure.PAIN_WORST_24H), "worst pain in 24 h"));
    }

    private static Score rating(Double value, String what) {
        return value == null
                ? Score.notTested(Unit.POINTS, Citations.FARRAR_2001_OSTELO_2008,
                        what + " not rated")
                : Score.of(value, Unit.POINTS, Citations.FARRAR_2001_OSTELO_2008);
    }

    private static RotationBasis shoulderMobility(ScreeningInput input, Map<ValueKey, Score> scores) {
        Side involved = input.involvedSide();
        Double flexionInvolved = input.involved(Measure.SHOULDER_FLEXION_ACTIVE);
        Double flexionUninvolved = input.uninvolved(Measure.SHOULDER_FLEXION_ACTIVE);
        scores.put(ValueKey.FLEXION_ROM_INVOLVED, involved == null
                ? noInvolvedSide(Unit.DEGREE, Citations.AAOS_SHOULDER_ROM)
                : flexionInvolved == null
                        ? Score.notTested(Unit.DEGREE, Citations.AAOS_SHOULDER_ROM,
                                "active flexion of the involved side not measured")
                        : Score.of(flexionInvolved, Unit.DEGREE,
                                Citations.AAOS_SHOULDER_ROM));
        scores.put(ValueKey.FLEXION_ROM_LSI, sideComparison(involved,
                Symmetry.limbSymmetryIndex(flexionInvolved, flexionUninvolved)));
        scores.put(ValueKey.FLEXION_ROM_DEFICIT, sideComparison(involved,
                Symmetry.deficit(flexionInvolved, flexionUninvolved, Unit.DEGREE)));
        scores.put(ValueKey.ABDUCTION_ROM_LSI, sideComparison(involved, Symmetry.limbSymmetryIndex(
                input.involved(Measure.SHOULDER_ABDUCTION_ACTIVE), input.uninvolved(Measure.SHOULDER_ABDUCTION_ACTIVE))));

        boolean passive = bothSides(input, Measure.SHOULDER_IR_90_PASSIVE)
                && bothSides(input, Measure.SHOULDER_ER_90_PASSIVE);
        Measure ir = passive ? Measure.SHOULDER_IR_90_PASSIVE : Measure.SHOULDER_IR_90_ACTIVE;
        Measure er = passive ? Measure.SHOULDER_ER_90_PASSIVE : Measure.SHOULDER_ER_90_ACTIVE;
        RotationProfile rotation = RotationProfile.of(input.involved(ir), input.involved(er), input.uninvolved(ir),
                input.uninvolved(er));
        scores.put(ValueKey.GIRD, sideComparison(involved, rotation.gird()));
        scores.put(ValueKey.TRM_DEFICIT, sideComparison(involved, rotation.trmDeficit()));
        scores.put(ValueKey.GIRD_PERCENT_OF_TRM, sideComparison(involved, rotation.girdPercentOfUninvolvedTrm()));
        scores.put(ValueKey.ER_GAIN, sideComparison(involved, rotation.erGain()));
        return passive ? RotationBasis.PASSIVE : RotationBasis.ACTIVE;
    }

    private static void shoulderStrength(ScreeningInput input, Map<ValueKey, Score> scores) {
        Side involved = input.involvedSide();
        Score flexionInvolved = torque(input, Measure.SHOULDER_FLEXION_FORCE, Measure.SHOULDER_FLEXION_LEVER_ARM,
                involved);
        scores.put(ValueKey.FLEXION_TORQUE_INVOLVED, sideComparison(involved, flexionInvolved));
        scores.put(ValueKey.FLEXION_TORQUE_LSI, torqueSymmetry(input, Measure.SHOULDER_FLEXION_FORCE,
                Measure.SHOULDER_FLEXION_LEVER_ARM));
        scores.put(ValueKey.ER_TORQUE_LSI, torqueSymmetry(input, Measure.SHOULDER_ER_FORCE,
                Measure.SHOULDER_ER_LEVER_ARM));
        scores.put(ValueKey.IR_TORQUE_LSI, torqueSymmetry(input, Measure.SHOULDER_IR_FORCE,
                Measure.SHOULDER_IR_LEVER_ARM));
        Double flexionForce = input.involved(Measure.SHOULDER_FLEXION_FORCE);
        Double mass = input.number(Measure.BODY_MASS);
        scores.put(ValueKey.FLEXION_FORCE_PER_KG_INVOLVED,
                sideComparison(involved, Strength.forcePerKilogram(flexionForce, mass)));
        scores.put(ValueKey.FLEXION_FORCE_PERCENT_BW_INVOLVED,
                sideComparison(involved, Strength.percentBodyWeight(flexionForce, mass)));
        scores.put(ValueKey.ER_IR_RATIO_INVOLVED, sideComparison(involved, Strength.externalInternalRatio(
                input.involved(Measure.SHOULDER_ER_FORCE), input.involved(Measure.SHOULDER_IR_FORCE))));
        scores.put(ValueKey.GRIP_LSI, sideComparison(involved,
                Symmetry.limbSymmetryIndex(input.involved(Measure.GRIP), input.uninvolved(Measure.GRIP))));
    }

    private static Score torque(ScreeningInput input, Measure force, Measure leverArm, Side side) {
        return Strength.torque(input.number(force, side), input.number(leverArm, side));
    }

    private static Score torqueSymmetry(ScreeningInput input, Measure force, Measure leverArm) {
        Side involved = input.involvedSide();
        if (involved == null) {
            return noInvolvedSide(Unit.PERCENT, Citations.LIMB_SYMMETRY);
        }
        Score involvedTorque = torque(input, force, leverArm, involved);
        Score uninvolvedTorque = torque(input, force, leverArm, involved.opposite());
        if (!involvedTorque.scorable() || !uninvolvedTorque.scorable()) {
            String gaps = (involvedTorque.scorable() ? "" : "involved side: "
                    + involvedTorque.notScorable().orElseThrow().rule())
                    + (involvedTorque.scorable() || uninvolvedTorque.scorable() ? "" : "; ")
                    + (uninvolvedTorque.scorable() ? "" : "uninvolved side: "
                            + uninvolvedTorque.notScorable().orElseThrow().rule());
            return Score.notTested(Unit.PERCENT, Citations.LIMB_SYMMETRY,
                    "torque symmetry needs the torque of both sides — " + gaps);
        }
        return Symmetry.limbSymmetryIndex(involvedTorque.orElseThrow(), uninvolvedTorque.orElseThrow());
    }

    private static void shoulderStability(ScreeningInput input, Map<ValueKey, Score> scores) {
        Ckcuest ckcuest = Ckcuest.of(input.seriesOf(Measure.CKCUEST_TRIALS), input.number(Measure.BODY_MASS),
                input.number(Measure.STATURE));
        scores.put(ValueKey.CKCUEST_MEAN, ckcuest.mean());
        scores.put(ValueKey.CKCUEST_POWER, ckcuest.powerScore());
        scores.put(ValueKey.CKCUEST_PER_METRE, ckcuest.touchesPerMetre());

        Side involved = input.involvedSide();
        Score involvedComposite = reachComposite(input, involved);
        Score uninvolvedComposite = reachComposite(input, involved == null ? null : involved.opposite());
        scores.put(ValueKey.UQ_REACH_COMPOSITE_INVOLVED, sideComparison(involved, involvedComposite));
        scores.put(ValueKey.UQ_REACH_COMPOSITE_LSI, sideComparison(involved, Symmetry.limbSymmetryIndex(
                involvedComposite.scorable() ? involvedComposite.orElseThrow() : null,
                uninvolvedComposite.scorable() ? uninvolvedComposite.orElseThrow() : null)));
        scores.put(ValueKey.UQ_REACH_MEDIAL_DIFFERENCE, reachDifference(input, Measure.UQ_REACH_MEDIAL));
        scores.put(ValueKey.UQ_REACH_INFEROLATERAL_DIFFERENCE,
                reachDifference(input, Measure.UQ_REACH_INFEROLATERAL));
        scores.put(ValueKey.UQ_REACH_SUPEROLATERAL_DIFFERENCE,
                reachDifference(input, Measure.UQ_REACH_SUPEROLATERAL));
    }

    private static Score reachComposite(ScreeningInput input, Side side) {
        return UpperQuarterReach.composite(input.number(Measure.UQ_REACH_MEDIAL, side),
                input.number(Measure.UQ_REACH_INFEROLATERAL, side), input.number(Measure.UQ_REACH_SUPEROLATERAL, side),
                input.number(Measure.UPPER_LIMB_LENGTH, side));
    }

    private static Score reachDifference(ScreeningInput input, Measure direction) {
        return UpperQuarterReach.sideDifference(input.number(direction, Side.LEFT),
                input.number(direction, Side.RIGHT));
    }

    private static void shoulderQuestionnaires(ScreeningInput input, ScoringPolicy policy,
            Map<ValueKey, Score> scores) {
        List<Integer> quickDash = input.seriesOf(Measure.QUICKDASH);
        scores.put(ValueKey.QUICKDASH_SCORE, quickDash == null ? notCompleted("QuickDASH")
                : QuickDash.score(quickDash));
        List<Integer> work = input.seriesOf(Measure.QUICKDASH_WORK);
        scores.put(ValueKey.QUICKDASH_WORK_SCORE, work == null ? notCompleted("the QuickDASH work module")
                : QuickDash.moduleScore(work));
        List<Integer> sport = input.seriesOf(Measure.QUICKDASH_SPORT);
        scores.put(ValueKey.QUICKDASH_SPORT_SCORE, sport == null ? notCompleted("the QuickDASH sport/music module")
                : QuickDash.moduleScore(sport));
        List<Integer> spadiItems = input.seriesOf(Measure.SPADI);
        if (spadiItems == null) {
            Score none = Score.notTested(Unit.PERCENT, Citations.SPADI_SCORING,
                    "SPADI not completed");
            scores.put(ValueKey.SPADI_PAIN, none);
            scores.put(ValueKey.SPADI_DISABILITY, none);
            scores.put(ValueKey.SPADI_TOTAL, none);
        } else {
            Spadi spadi = Spadi.score(spadiItems.subList(0, Spadi.PAIN_ITEMS),
                    spadiItems.subList(Spadi.PAIN_ITEMS, spadiItems.size()), policy.spadiMaxMissingItems(),
                    policy.spadiTotalMethod());
            scores.put(ValueKey.SPADI_PAIN, spadi.pain());
            scores.put(ValueKey.SPADI_DISABILITY, spadi.disability());
            scores.put(ValueKey.SPADI_TOTAL, spadi.total());
        }
    }

    private static Score notCompleted(String questionnaire) {
        return Score.notTested(Unit.POINTS, Citations.QUICKDASH_SCORING,
                questionnaire + " not completed");
    }

    private static void lumbopelvic(ScreeningInput input, Map<ValueKey, Score> scores) {
        ModifiedSchober schober = ModifiedSchober.of(input.number(Measure.SCHOBER_INCREASE));
        scores.put(ValueKey.SCHOBER_INCREASE, schober.increase());
        scores.put(ValueKey.BASMI_LUMBAR_FLEXION, schober.basmiThreePoint());
        scores.put(ValueKey.BASMI_LUMBAR_FLEXION_LINEAR, schober.basmiLinear());

        Double slrLeft = input.number(Measure.STRAIGHT_LEG_RAISE, Side.LEFT);
        Double slrRight = input.number(Measure.STRAIGHT_LEG_RAISE, Side.RIGHT);
        Score slrAverage = slrLeft == null || slrRight == null
                ? Score.notTested(Unit.DEGREE, Citations.HICKS_2005_PREDICTORS,
                        "average straight-leg raise needs both sides")
                : Score.of((slrLeft + slrRight) / 2, Unit.DEGREE, Citations.HICKS_2005_PREDICTORS);
        scores.put(ValueKey.STRAIGHT_LEG_RAISE_AVERAGE, slrAverage);

        TrunkEndurance trunk = TrunkEndurance.of(input.number(Measure.TRUNK_FLEXOR_HOLD),
                input.number(Measure.TRUNK_EXTENSOR_HOLD), input.number(Measure.SIDE_BRIDGE_HOLD, Side.RIGHT),
                input.number(Measure.SIDE_BRIDGE_HOLD, Side.LEFT));
        scores.put(ValueKey.TRUNK_FLEXOR_EXTENSOR_RATIO, trunk.flexorExtensor());
        scores.put(ValueKey.SIDE_BRIDGE_RIGHT_EXTENSOR_RATIO, trunk.rightSideBridgeExtensor());
        scores.put(ValueKey.SIDE_BRIDGE_LEFT_EXTENSOR_RATIO, trunk.leftSideBridgeExtensor());
        scores.put(ValueKey.SIDE_BRIDGE_RIGHT_LEFT_RATIO, trunk.rightLeftSideBridge());
        scores.put(ValueKey.SIDE_BRIDGE_IMBALANCE, trunk.sideBridgeImbalance());

        ActiveStraightLegRaise aslr = ActiveStraightLegRaise.of(whole(input.number(Measure.ASLR, Side.LEFT)),
                whole(input.number(Measure.ASLR, Side.RIGHT)));
        scores.put(ValueKey.ASLR_TOTAL, aslr.total());
        scores.put(ValueKey.ASLR_POSITIVE, aslr.positive());

        Score pit = ProneInstability.classify(input.answer(Measure.PIT_PAIN_POSITION_1),
                input.answer(Measure.PIT_EASED_POSITION_2));
        scores.put(ValueKey.PRONE_INSTABILITY_POSITIVE, pit);
        StabilisationPrediction rule = StabilisationPrediction.evaluate(input.number(Measure.AGE),
                slrAverage.scorable() ? slrAverage.orElseThrow() : null, input.answer(Measure.ABERRANT_LUMBAR_FLEXION),
                pit.scorable() ? pit.isYes() : null);
        scores.put(ValueKey.STABILISATION_PREDICTORS, rule.predictorsPresent());
        scores.put(ValueKey.STABILISATION_RULE_POSITIVE, rule.positive());
    }

    private static Integer whole(Double value) {
        return value == null ? null : (int) Math.round(value);
    }

    private static boolean bothSides(ScreeningInput input, Measure measure) {
        return input.number(measure, Side.LEFT) != null && input.number(measure, Side.RIGHT) != null;
    }

    /** Replaces a side comparison's result with "no involved side" when none was given. */
    private static Score sideComparison(Side involved, Score computed) {
        return involved == null ? noInvolvedSide(computed.unit(), computed.citation()) : computed;
    }

    private static Score noInvolvedSide(Unit unit, Citation citation) {
        return Score.notScorable(unit, citation, NotScorable.Reason.NO_INVOLVED_SIDE,
                "a side-to-side comparison needs the involved side, which was not given");
    }
}
