package org.swingclearance.engine.scoring;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;

/**
 * The clinic-editable choices of scoring (clinical.md: missing-item limits, SPADI total method, MCIDs). Stored with
 * the practice rules and recorded in every snapshot.
 *
 * @param odiMaxMissingSections most unanswered ODI sections still scored, 0–9 (default 1)
 * @param spadiMaxMissingItems  most unanswered SPADI items still scored, 0–12 (default 2)
 * @param spadiTotalMethod      how the SPADI total is formed; never null
 * @param mcids                 the MCID per instrument; must cover every {@link Instrument}
 */
public record ScoringPolicy(int odiMaxMissingSections, int spadiMaxMissingItems, Spadi.TotalMethod spadiTotalMethod,
        Map<Instrument, Mcid> mcids) {

    /** The defaults of clinical.md §4: ODI ≤ 1 missing, SPADI ≤ 2 missing, Σ/130, each instrument's default MCID. */
    public static final ScoringPolicy DEFAULT = new ScoringPolicy(Oswestry.DEFAULT_MAX_MISSING,
            Spadi.DEFAULT_MAX_MISSING, Spadi.TotalMethod.SUM_OF_ITEMS, defaultMcids());

    public ScoringPolicy {
        Inputs.inRange(odiMaxMissingSections, 0, Oswestry.SECTIONS - 1, "ODI missing-section limit");
        Inputs.inRange(spadiMaxMissingItems, 0, Spadi.PAIN_ITEMS + Spadi.DISABILITY_ITEMS - 1,
                "SPADI missing-item limit");
        Objects.requireNonNull(spadiTotalMethod, "spadiTotalMethod");
        Map<Instrument, Mcid> copy = new EnumMap<>(Instrument.class);
        copy.putAll(Objects.requireNonNull(mcids, "mcids"));
        for (Instrument instrument : Instrument.values()) {
            Mcid mcid = copy.get(instrument);
            if (mcid == null || mcid.instrument() != instrument) {
                throw new IllegalArgumentException("an MCID of " + instrument + " is required");
            }
        }
        mcids = Collections.unmodifiableMap(copy);
    }

    /** The MCID applied to an instrument; never null. */
    public Mcid mcid(Instrument instrument) {
        return mcids.get(instrument);
    }

    private static Map<Instrument, Mcid> defaultMcids() {
        Map<Instrument, Mcid> mcids = new EnumMap<>(Instrument.class);
        for (Instrument instrument : Instrument.values()) {
            mcids.put(instrument, Mcid.defaultFor(instrument));
        }
        return mcids;
    }
}
