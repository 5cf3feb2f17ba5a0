package org.swingclearance.engine.scoring;

import java.util.Objects;
import java.util.OptionalDouble;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Citations;

/**
 * A minimal clinically important difference: an improvement counts when it reaches {@code points}, or, where the
 * source gives one, {@code percent} of the previous value (clinical.md §4). Stored as clinic policy.
 *
 * @param instrument the outcome measure; never null
 * @param points     absolute threshold in the instrument's unit, &gt; 0
 * @param percent    relative threshold in % of the previous value, &gt; 0; empty when the source gives none
 * @param citation   source; never null
 */
public record Mcid(Instrument instrument, double points, OptionalDouble percent, Citation citation) {

    /** QuickDASH, shoulder pain: 8.0 points (Mintken 2009); the default. */
    public static final Mcid QUICKDASH_SHOULDER = new Mcid(Instrument.QUICKDASH, 8.0, OptionalDouble.empty(),
            Citations.MINTKEN_2009);
    /** QuickDASH, general upper-limb disorders: 16 points (Franchignoni 2014 found 15.91). */
    public static final Mcid QUICKDASH_UPPER_LIMB = new Mcid(Instrument.QUICKDASH, 16.0, OptionalDouble.empty(),
            Citations.FRANCHIGNONI_2014);
    /** ODI: 10 points or 30 % (Ostelo 2008). */
    public static final Mcid ODI = new Mcid(Instrument.ODI, 10.0, OptionalDouble.of(30), Citations.OSTELO_2008);
    /** SPADI: 13 points, the upper end of 8–13 (Roy 2009), about the scoring sheet's MDC90. */
    public static final Mcid SPADI = new Mcid(Instrument.SPADI, 13.0, OptionalDouble.empty(), Citations.ROY_2009);
    /** Numeric pain rating: 2 points or 30 % (Farrar 2001; Ostelo 2008). */
    public static final Mcid NPRS = new Mcid(Instrument.NPRS, 2.0, OptionalDouble.of(30),
            Citations.FARRAR_2001_OSTELO_2008);
    /** TSK-11: about 4 points (from memory, low confidence). */
    public static final Mcid TSK_11 = new Mcid(Instrument.TSK_11, 4.0, OptionalDouble.empty(), Citations.TSK11_MCID);

    public Mcid {
        Objects.requireNonNull(instrument, "instrument");
        Objects.requireNonNull(percent, "percent");
        Objects.requireNonNull(citation, "citation");
        Inputs.positive(points, "MCID points");
        if (percent.isPresent()) {
            Inputs.positive(percent.getAsDouble(), "MCID percent");
        }
    }

    /** The default MCID of an instrument (QuickDASH: the shoulder value). */
    public static Mcid defaultFor(Instrument instrument) {
        return switch (Objects.requireNonNull(instrument, "instrument")) {
            case QUICKDASH -> QUICKDASH_SHOULDER;
            case ODI -> ODI;
            case SPADI -> SPADI;
            case NPRS -> NPRS;
            case TSK_11 -> TSK_11;
        };
    }
}
