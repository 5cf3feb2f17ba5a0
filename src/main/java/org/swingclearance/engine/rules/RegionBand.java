package org.swingclearance.engine.rules;

import java.util.List;
import java.util.Objects;

/**
 * The suggested band of one region.
 *
 * @param region   never null
 * @param band     the suggested band; never null
 * @param basis    what decided it; never null
 * @param findings the region's fired rules, most restrictive cap first; never null
 */
public record RegionBand(Region region, LoadBand band, Basis basis, List<Finding> findings) {

    /** What decided a region's band. */
    public enum Basis {
        /** Red flags are present: Hold whatever the findings. */
        RED_FLAGS,
        /** A fired rule capped the band below the default. */
        FINDINGS,
        /** No fired rule restricts below the rule set's default band. */
        DEFAULT
    }

    public RegionBand {
        Objects.requireNonNull(region, "region");
        Objects.requireNonNull(band, "band");
        Objects.requireNonNull(basis, "basis");
        findings = List.copyOf(Objects.requireNonNull(findings, "findings"));
    }
}
