package org.swingclearance.engine.rules;

import static org.swingclearance.engine.rules.Comparison.EQ;
import static org.swingclearance.engine.rules.Comparison.GE;
import static org.swingclearance.engine.rules.Comparison.GT;
import static org.swingclearance.engine.rules.Comparison.LT;
import static org.swingclearance.engine.rules.LoadBand.BAND_1;
import static org.swingclearance.engine.rules.LoadBand.BAND_2;
import static org.swingclearance.engine.rules.LoadBand.BAND_3;
import static org.swingclearance.engine.rules.LoadBand.HOLD;
import static org.swingclearance.engine.rules.LoadBand.OPEN;
import static org.swingclearance.engine.rules.Region.LUMBOPELVIC;
import static org.swingclearance.engine.rules.Region.SHOULDER;

import java.util.List;
import org.swingclearance.engine.evidence.Citations;
import org.swingclearance.engine.scoring.ValueKey;

/**
 * The rule set every clinic starts with, built from the thresholds of the clinical reference, each rule carrying the
 * source and evidence tag the reference gives its threshold. The band each rule caps is a product choice, not
 * evidence ({@link Citations#BAND_CAP}): "informational" rules cap at {@link LoadBand#OPEN} and only list a finding.
 * The default band is {@link LoadBand#BAND_3}, so the top band is reached only by a clinician's override with a
 * reason (product choice, common practice, no source).
 */
public final class DefaultRules {

    /** Version label of this seed set. */
    public static final String VERSION = "default-1";
    /** Band of a region when no rule restricts it. */
    public static final LoadBand DEFAULT_BAND = BAND_3;

    private DefaultRules() {
    }

    /** The default rule set; a new instance each call. */
    public static RuleSet ruleSet() {
        return new RuleSet(VERSION, DEFAULT_BAND, List.of(
                // shoulder
                Rule.of("shoulder.pain-during-gt-5", ValueKey.PAIN_DURING_MOVEMENT, GT, 5, SHOULDER, BAND_1,
                        Citations.SILBERNAGEL_2007).asRequired(),
                Rule.of("shoulder.quickdash-gt-60", ValueKey.QUICKDASH_SCORE, GT, 60, SHOULDER, HOLD,
                        Citations.QUICKDASH_CUT_POINTS).asRequired(),
                Rule.of("shoulder.quickdash-gt-40", ValueKey.QUICKDASH_SCORE, GT, 40, SHOULDER, BAND_1,
                        Citations.QUICKDASH_CUT_POINTS).asRequired(),
                Rule.of("shoulder.quickdash-gt-20", ValueKey.QUICKDASH_SCORE, GT, 20, SHOULDER, BAND_2,
                        Citations.QUICKDASH_CUT_POINTS).asRequired(),
                Rule.of("shoulder.gird-ge-20", ValueKey.GIRD, GE, 20, SHOULDER, BAND_2, Citations.WILK_2011)
                        .needingWhenFired(ValueKey.TRM_DEFICIT),
                Rule.of("shoulder.trm-deficit-gt-5", ValueKey.TRM_DEFICIT, GT, 5, SHOULDER, BAND_2,
                        Citations.WILK_2011_MANSKE_2013),
                Rule.of("shoulder.gird-pct-trm-gt-10", ValueKey.GIRD_PERCENT_OF_TRM, GT, 10, SHOULDER, OPEN,
                        Citations.BURKHART_2003),
                Rule.of("shoulder.ckcuest-lt-21", ValueKey.CKCUEST_MEAN, LT, 21, SHOULDER, BAND_2,
                        Citations.PONTILLO_2014),
                Rule.of("shoulder.er-ir-lt-0.86", ValueKey.ER_IR_RATIO_INVOLVED, LT, 0.86, SHOULDER, OPEN,
                        Citations.RIEMANN_2010),
                Rule.of("shoulder.er-ir-gt-0.99", ValueKey.ER_IR_RATIO_INVOLVED, GT, 0.99, SHOULDER, OPEN,
                        Citations.RIEMANN_2010),
                Rule.of("shoulder.flexion-rom-lsi-lt-90", ValueKey.FLEXION_ROM_LSI, LT, 90, SHOULDER, BAND_2,
                        Citations.LIMB_SYMMETRY),
                Rule.of("shoulder.flexion-rom-deficit-gt-10", ValueKey.FLEXION_ROM_DEFICIT, GT, 10, SHOULDER, BAND_2,
                        Citations.LIMB_SYMMETRY),
                Rule.of("shoulder.abduction-rom-lsi-lt-90", ValueKey.ABDUCTION_ROM_LSI, LT, 90, SHOULDER, BAND_2,
                        Citations.LIMB_SYMMETRY),
                Rule.of("shoulder.flexion-torque-lsi-lt-90", ValueKey.FLEXION_TORQUE_LSI, LT, 90, SHOULDER, BAND_2,
                        Citations.LIMB_SYMMETRY),
                Rule.of("shoulder.er-torque-lsi-lt-90", ValueKey.ER_TORQUE_LSI, LT, 90, SHOULDER, BAND_2,
                        Citations.LIMB_SYMMETRY),
                Rule.of("shoulder.ir-torque-lsi-lt-90", ValueKey.IR_TORQUE_LSI, LT, 90, SHOULDER, BAND_2,
                        Citations.LIMB_SYMMETRY),
                Rule.of("shoulder.grip-lsi-lt-90", ValueKey.GRIP_LSI, LT, 90, SHOULDER, BAND_2,
                        Citations.LIMB_SYMMETRY),
                Rule.of("shoulder.reach-medial-diff-gt-4", ValueKey.UQ_REACH_MEDIAL_DIFFERENCE, GT, 4, SHOULDER,
                        BAND_3, Citations.REACH_ASYMMETRY),
                Rule.of("shoulder.reach-inferolateral-diff-gt-4", ValueKey.UQ_REACH_INFEROLATERAL_DIFFERENCE, GT, 4,
                        SHOULDER, BAND_3, Citations.REACH_ASYMMETRY),
                Rule.of("shoulder.reach-superolateral-diff-gt-4", ValueKey.UQ_REACH_SUPEROLATERAL_DIFFERENCE, GT, 4,
                        SHOULDER, BAND_3, Citations.REACH_ASYMMETRY),
                Rule.of("shoulder.reach-composite-lsi-lt-90", ValueKey.UQ_REACH_COMPOSITE_LSI, LT, 90, SHOULDER,
                        BAND_3, Citations.REACH_ASYMMETRY),
                // lumbopelvic
                Rule.of("lumbopelvic.pain-during-gt-5", ValueKey.PAIN_DURING_MOVEMENT, GT, 5, LUMBOPELVIC, BAND_1,
                        Citations.SILBERNAGEL_2007).asRequired(),
                Rule.of("lumbopelvic.odi-gt-60", ValueKey.ODI_SCORE, GT, 60, LUMBOPELVIC, HOLD,
                        Citations.FAIRBANK_2000).asRequired(),
                Rule.of("lumbopelvic.odi-gt-40", ValueKey.ODI_SCORE, GT, 40, LUMBOPELVIC, BAND_1,
                        Citations.FAIRBANK_2000).asRequired(),
                Rule.of("lumbopelvic.odi-gt-20", ValueKey.ODI_SCORE, GT, 20, LUMBOPELVIC, BAND_2,
                        Citations.FAIRBANK_2000).asRequired(),
                Rule.of("lumbopelvic.flexor-extensor-gt-1", ValueKey.TRUNK_FLEXOR_EXTENSOR_RATIO, GT, 1.0,
                        LUMBOPELVIC, BAND_3, Citations.MCGILL_RATIOS),
                Rule.of("lumbopelvic.right-side-bridge-extensor-gt-0.75", ValueKey.SIDE_BRIDGE_RIGHT_EXTENSOR_RATIO,
                        GT, 0.75, LUMBOPELVIC, BAND_3, Citations.MCGILL_RATIOS),
                Rule.of("lumbopelvic.left-side-bridge-extensor-gt-0.75", ValueKey.SIDE_BRIDGE_LEFT_EXTENSOR_RATIO,
                        GT, 0.75, LUMBOPELVIC, BAND_3, Citations.MCGILL_RATIOS),
                Rule.of("lumbopelvic.side-bridge-imbalance-gt-0.05", ValueKey.SIDE_BRIDGE_IMBALANCE, GT, 0.05,
                        LUMBOPELVIC, BAND_3, Citations.MCGILL_RATIOS),
                Rule.of("lumbopelvic.aslr-ge-1", ValueKey.ASLR_TOTAL, GE, 1, LUMBOPELVIC, BAND_2,
                        Citations.MENS_2001),
                Rule.of("lumbopelvic.prone-instability-positive", ValueKey.PRONE_INSTABILITY_POSITIVE, EQ, 1,
                        LUMBOPELVIC, OPEN, Citations.HICKS_2005_PIT),
                Rule.of("lumbopelvic.stabilisation-rule-positive", ValueKey.STABILISATION_RULE_POSITIVE, EQ, 1,
                        LUMBOPELVIC, BAND_2, Citations.HICKS_2005_RULE_COUNT),
                Rule.of("lumbopelvic.schober-lt-5", ValueKey.SCHOBER_INCREASE, LT, 5, LUMBOPELVIC, BAND_3,
                        Citations.SCHOBER_TYPICAL),
                Rule.of("lumbopelvic.basmi-lumbar-ge-2", ValueKey.BASMI_LUMBAR_FLEXION, GE, 2, LUMBOPELVIC, BAND_2,
                        Citations.JENKINSON_1994_BASMI)));
    }
}
