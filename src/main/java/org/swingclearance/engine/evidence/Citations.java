package org.swingclearance.engine.evidence;

import static org.swingclearance.engine.evidence.Confidence.HIGH;
import static org.swingclearance.engine.evidence.Confidence.LOW;
import static org.swingclearance.engine.evidence.Confidence.MEDIUM;
import static org.swingclearance.engine.evidence.Confidence.NOT_STATED;
import static org.swingclearance.engine.evidence.EvidenceTag.COMMON_PRACTICE;
import static org.swingclearance.engine.evidence.EvidenceTag.FROM_MEMORY;
import static org.swingclearance.engine.evidence.EvidenceTag.PHYSICAL_LAW;
import static org.swingclearance.engine.evidence.EvidenceTag.SECONDARY;
import static org.swingclearance.engine.evidence.EvidenceTag.VERIFIED;

/**
 * Every source the scoring, practice-rule and load-monitoring code cites, with the tag and confidence the clinical
 * reference (/work/shared/reference/clinical.md) gives it. Kept in one place so a changed label is changed once.
 */
public final class Citations {

    // §1 shoulder mobility
    public static final Citation AAOS_SHOULDER_ROM = new Citation(
            "AAOS values as compiled in Norkin & White, Measurement of Joint Motion, Appendix A Table A.1",
            SECONDARY, HIGH, "clinical.md §1.2");
    public static final Citation LIMB_SYMMETRY = new Citation(
            "Limb symmetry index = involved ÷ uninvolved × 100; 90 % and 10° borrowed from lower-limb return-to-sport practice",
            COMMON_PRACTICE, MEDIUM, "clinical.md §1.3");
    public static final Citation WILK_2011 = new Citation(
            "Wilk et al. 2011, Am J Sports Med 39:329–335", VERIFIED, HIGH, "clinical.md §1.4");
    public static final Citation WILK_2011_MANSKE_2013 = new Citation(
            "Wilk et al. 2011, Am J Sports Med 39:329–335; Manske, Wilk, Davies, Ellenbecker, Reinold 2013, IJSPT 8:537–553",
            VERIFIED, HIGH, "clinical.md §1.4");
    public static final Citation BURKHART_2003 = new Citation(
            "Burkhart, Morgan, Kibler 2003, Arthroscopy (IR loss > 10 % of contralateral total rotation)",
            FROM_MEMORY, MEDIUM, "clinical.md §1.4");

    // §2 shoulder stability and strength
    public static final Citation CKCUEST_PROTOCOL = new Citation(
            "Goldbeck & Davies 2000; Tucci et al. 2014, BMC Musculoskelet Disord 15:1 (mean of maximal trials)",
            VERIFIED, HIGH, "clinical.md §2.1");
    public static final Citation PONTILLO_2014 = new Citation(
            "Pontillo, Spinelli, Sennett 2014, Sports Health 6:497–503 (< 21 touches)", VERIFIED, MEDIUM,
            "clinical.md §2.1");
    public static final Citation CKCUEST_POWER = new Citation(
            "CKCUEST power score = mean × 0.68 × body mass ÷ 15 (Roush 2007 as described in a secondary summary)",
            SECONDARY, MEDIUM, "clinical.md §2.1");
    public static final Citation CKCUEST_NORMALISED = new Citation(
            "CKCUEST normalised score = mean touches ÷ height (units differ between papers)", SECONDARY, NOT_STATED,
            "clinical.md §2.1");
    public static final Citation RIEMANN_2010 = new Citation(
            "Riemann, Davies, Ludwig, Gardenhour 2010, J Shoulder Elbow Surg, doi 10.1016/j.jse.2010.05.021 "
                    + "(healthy HHD ER/IR 0.86–0.99)", VERIFIED, MEDIUM, "clinical.md §2.2");
    public static final Citation TORQUE = new Citation(
            "Torque = force × lever arm; N/kg = force ÷ mass; % body weight = force ÷ (mass × 9.80665 m/s²) × 100",
            PHYSICAL_LAW, HIGH, "clinical.md §2.3");
    public static final Citation POUND = new Citation(
            "1 lb = 0.45359237 kg (exact)", PHYSICAL_LAW, HIGH, "clinical.md implementation conventions, §2.4");
    public static final Citation MATHIOWETZ_1985 = new Citation(
            "Mathiowetz et al. 1985, Arch Phys Med Rehabil 66:69–74 (mean of 3 trials, lb)", VERIFIED, NOT_STATED,
            "clinical.md §2.4");
    public static final Citation EWGSOP2_GRIP = new Citation(
            "EWGSOP2 (Cruz-Jentoft 2019) low grip < 27 kg men, < 16 kg women", FROM_MEMORY, HIGH, "clinical.md §2.4");
    public static final Citation GORMAN_2012 = new Citation(
            "Gorman, Butler, Plisky, Kiesel 2012, J Strength Cond Res 26:3043 (composite method)", VERIFIED, NOT_STATED,
            "clinical.md §2.5");
    public static final Citation REACH_ASYMMETRY = new Citation(
            "Provisional: direction difference > 4 cm or composite LSI < 90 % (4 cm borrowed from Plisky et al. 2006, "
                    + "JOSPT 36:911–919, lower quarter)", COMMON_PRACTICE, LOW, "clinical.md §2.5");

    // §3 lumbopelvic
    public static final Citation MCGILL_RATIOS = new Citation(
            "McGill, Low Back Disorders 2002/2007 (ratio criteria via a secondary summary)", SECONDARY, MEDIUM,
            "clinical.md §3.1");
    public static final Citation MENS_2001 = new Citation(
            "Mens et al. 2001, Spine 26:1167–1171", VERIFIED, HIGH, "clinical.md §3.3");
    public static final Citation HICKS_2005_PIT = new Citation(
            "Hicks, Fritz, Delitto, McGill 2005, Arch Phys Med Rehabil 86:1753–1762 (prone instability test)",
            VERIFIED, HIGH, "clinical.md §3.4");
    public static final Citation HICKS_2005_PREDICTORS = new Citation(
            "Hicks et al. 2005 predictors: age < 40 y, average straight-leg raise > 91°, aberrant movement, positive "
                    + "prone instability test", VERIFIED, HIGH, "clinical.md §3.4");
    public static final Citation HICKS_2005_RULE_COUNT = new Citation(
            "Hicks et al. 2005 stabilisation prediction rule, positive with ≥ 3 of 4 predictors (LR+ 4.0 verified; "
                    + "the count recalled)", FROM_MEMORY, MEDIUM, "clinical.md §3.4");
    public static final Citation JENKINSON_1994_BASMI = new Citation(
            "Jenkinson et al. 1994, J Rheumatol 21:1694 (BASMI lumbar flexion, via ASAS)", SECONDARY, HIGH,
            "clinical.md §3.5");
    public static final Citation SCHOBER_TYPICAL = new Citation(
            "Modified Schober: typical healthy increase ≥ 5 cm", SECONDARY, MEDIUM, "clinical.md §3.5");
    public static final Citation BOHANNON_2006_STANCE = new Citation(
            "Bohannon 2006, Top Geriatr Rehabil 22:70–77 (unipedal stance, eyes open, ≥ 60 y)", VERIFIED, HIGH,
            "clinical.md §3.7");

    public static final Citation QUICKDASH_CUT_POINTS = new Citation(
            "QuickDASH cut-points 20/40/60 borrowed from the ODI bands: no QuickDASH severity bands are published",
            COMMON_PRACTICE, NOT_STATED, "clinical.md §4.1–4.2");

    // §4 questionnaires
    public static final Citation QUICKDASH_SCORING = new Citation(
            "QuickDASH scoring, Institute for Work & Health: ((Σ/n) − 1) × 25, at least 10 of 11 answered",
            VERIFIED, HIGH, "clinical.md §4.1");
    public static final Citation MINTKEN_2009 = new Citation(
            "Mintken, Glynn, Cleland 2009, J Shoulder Elbow Surg 18:920–926 (QuickDASH MCID 8.0 in shoulder pain)",
            VERIFIED, HIGH, "clinical.md §4.1");
    public static final Citation FRANCHIGNONI_2014 = new Citation(
            "Franchignoni et al. 2014, JOSPT 44:30–39 (QuickDASH MCID 15.91, upper-limb disorders; default 16)",
            VERIFIED, HIGH, "clinical.md §4.1");
    public static final Citation FAIRBANK_2000 = new Citation(
            "Fairbank & Pynsent 2000, Spine 25:2940–2952 (ODI score and bands)", VERIFIED, HIGH, "clinical.md §4.2");
    public static final Citation ODI_MISSING_LIMIT = new Citation(
            "ODI scored only if at most 1 section is missing (no published limit)", COMMON_PRACTICE, LOW,
            "clinical.md §4.2");
    public static final Citation OSTELO_2008 = new Citation(
            "Ostelo et al. 2008, Spine 33:90–94 (ODI MCID 10 points or 30 %)", VERIFIED, HIGH, "clinical.md §4.2");
    public static final Citation SPADI_SCORING = new Citation(
            "SPADI scoring sheet attributed to Roach et al. 1991, Arthritis Care Res 4:143–149 (Σ ÷ 130; minus 10 per "
                    + "missing item)", SECONDARY, HIGH, "clinical.md §4.3");
    public static final Citation SPADI_MISSING_LIMIT = new Citation(
            "SPADI scored only if at most 2 items are missing in total (no published limit)", COMMON_PRACTICE, LOW,
            "clinical.md §4.3");
    public static final Citation ROY_2009 = new Citation(
            "Roy, MacDermid, Woodhouse 2009, Arthritis Rheum 61:623–632 (SPADI MCID 8–13; default the upper end, 13)",
            VERIFIED, HIGH, "clinical.md §4.3");
    public static final Citation FARRAR_2001_OSTELO_2008 = new Citation(
            "Farrar et al. 2001, Pain 94:149–158; Ostelo et al. 2008, Spine 33:90–94 (NPRS change ≥ 2 points or ≥ 30 %)",
            VERIFIED, HIGH, "clinical.md §4.4");
    public static final Citation TSK11_SCORING = new Citation(
            "TSK-11 (Woby et al. 2005; Tkachuk & Harris 2012, J Pain 13:970): Σ of 11 items scored 1–4, range 11–44",
            SECONDARY, HIGH, "clinical.md §4.5");
    public static final Citation TSK11_MCID = new Citation(
            "TSK-11 MCID ≈ 4 points", FROM_MEMORY, LOW, "clinical.md §4.5");
    public static final Citation TSK17_SCORING = new Citation(
            "TSK-17 (Vlaeyen 1995): items 4, 8, 12, 16 reverse-scored, range 17–68, > 37 high", SECONDARY, MEDIUM,
            "clinical.md §4.5");
    public static final Citation SIRSI_SCORING = new Citation(
            "SIRSI (Gerometta et al. 2018, KSSTA 26:203–211), scored as the ACL-RSI: Σ ÷ 120 × 100", FROM_MEMORY,
            MEDIUM, "clinical.md §4.5");
    public static final Citation MCID_WORSENING = new Citation(
            "Worsening counted as important when it reaches the same number of points as the improvement MCID "
                    + "(published MCIDs describe improvement)", COMMON_PRACTICE, NOT_STATED, "clinical.md §4");
    public static final Citation ALL_ITEMS_REQUIRED = new Citation(
            "No published missing-item rule: every item must be answered", COMMON_PRACTICE, NOT_STATED,
            "clinical.md §4.5");

    // §5 red flags
    public static final Citation SHOULDER_RED_FLAGS = new Citation(
            "BESS/BOA shoulder pathways (Rees et al. 2021, Shoulder Elbow 13:5–11), flag list as reproduced by NHS "
                    + "pathway pages", SECONDARY, HIGH, "clinical.md §5.1");
    public static final Citation FINUCANE_2020 = new Citation(
            "Finucane et al. 2020, JOSPT 50:350–372 (IFOMPT framework for serious spinal pathology)", VERIFIED, HIGH,
            "clinical.md §5.2");
    public static final Citation CONDITIONAL_URGENCY = new Citation(
            "Where the pathway's urgency depends on what is suspected, the more urgent class is used", COMMON_PRACTICE,
            NOT_STATED, "clinical.md §5");

    // §6–7 pain monitoring and training load
    public static final Citation SILBERNAGEL_2007 = new Citation(
            "Silbernagel et al. 2007, Am J Sports Med 35:897–906 (pain-monitoring model: during ≤ 5/10, settled by "
                    + "next morning, no week-on-week rise)", SECONDARY, MEDIUM, "clinical.md §6.4");
    public static final Citation HOLD_UNTIL_STABLE = new Citation(
            "Hold a new load until symptoms are stable for ≥ 1 week (rule of thumb)", COMMON_PRACTICE, NOT_STATED,
            "clinical.md §6.5");
    public static final Citation GABBETT_2016 = new Citation(
            "Gabbett 2016, Br J Sports Med 50:273–280 (ACWR ≥ 1.5 'danger'; contested, informational only)",
            FROM_MEMORY, HIGH, "clinical.md §6.5, §7.5");
    public static final Citation FOSTER_2001 = new Citation(
            "Foster et al. 2001, J Strength Cond Res 15:109–115 (session load = CR-10 RPE × minutes)", VERIFIED, HIGH,
            "clinical.md §7.1");
    public static final Citation FOSTER_1998 = new Citation(
            "Foster 1998, Med Sci Sports Exerc 30:1164–1168 (monotony = mean ÷ SD of daily loads; strain = weekly load "
                    + "× monotony)", SECONDARY, HIGH, "clinical.md §7.2");
    public static final Citation MONOTONY_SD_CONVENTION = new Citation(
            "Monotony SD convention: sample SD (n − 1) by default, population SD optional; none when SD = 0",
            COMMON_PRACTICE, NOT_STATED, "clinical.md §7.2");
    public static final Citation HULIN_2016 = new Citation(
            "Hulin et al. 2016, Br J Sports Med 50:231–236 (coupled rolling ACWR)", VERIFIED, HIGH, "clinical.md §7.3");
    public static final Citation UNCOUPLED_ACWR = new Citation(
            "Uncoupled rolling ACWR: chronic = mean of the three weeks before the acute week (Lolli et al. 2019, "
                    + "Br J Sports Med 53:921–922)", SECONDARY, HIGH, "clinical.md §7.3");
    public static final Citation WILLIAMS_2017 = new Citation(
            "Williams, West, Cross, Stokes 2017, Br J Sports Med 51:209–210 (EWMA, λ = 2/(N + 1))", VERIFIED, HIGH,
            "clinical.md §7.4");
    public static final Citation EWMA_CONVENTIONS = new Citation(
            "EWMA seed = first day's load; ratio suppressed for the first 28 days; missing days not counted as rest",
            COMMON_PRACTICE, NOT_STATED, "clinical.md §7.4");
    public static final Citation IMPELLIZZERI_2021 = new Citation(
            "Impellizzeri et al. 2021, Sports Med 51:581–592; Lolli et al. 2019, Br J Sports Med 53:921–922 (the "
                    + "ratio adds no prediction; mathematical coupling)", VERIFIED, HIGH, "clinical.md §7.5");
    public static final Citation CONFIGURATION_CHECK = new Citation(
            "A logged configuration with a higher demand ratio than its plan step is flagged (product rule)",
            COMMON_PRACTICE, NOT_STATED, "engine.md §7, §9");
    public static final Citation MECHANICAL_DOSE = new Citation(
            "Mechanical dose = Σ reps × demand-to-capacity ratio (product definition)", COMMON_PRACTICE, NOT_STATED,
            "engine.md §9");

    // practice rules
    public static final Citation BAND_CAP = new Citation(
            "Which load band a finding caps is a product rule: no published study maps screening results to club "
                    + "limits", COMMON_PRACTICE, NOT_STATED, "clinical.md Appendix A");

    private Citations() {
    }
}
