package org.swingclearance.engine.evidence;

import java.util.Objects;

/**
 * The source of one formula, threshold or convention, as the clinical reference labels it.
 *
 * @param work       the published work or the convention, e.g. "Mintken, Glynn, Cleland 2009, J Shoulder Elbow Surg
 *                   18:920–926"; never blank
 * @param tag        evidence tag; never null
 * @param confidence confidence; never null ({@link Confidence#NOT_STATED} when the reference gives none)
 * @param section    where the reference discusses it, e.g. "clinical.md §4.1"; never blank
 */
public record Citation(String work, EvidenceTag tag, Confidence confidence, String section) {

    public Citation {
        Objects.requireNonNull(tag, "tag");
        Objects.requireNonNull(confidence, "confidence");
        if (work == null || work.isBlank()) {
            throw new IllegalArgumentException("work must not be blank");
        }
        if (section == null || section.isBlank()) {
            throw new IllegalArgumentException("section must not be blank");
        }
    }

    /** One-line label for reports and snapshots, e.g. "Wilk et al. 2011, … [V,H] (clinical.md §1.4)". */
    public String label() {
        String brackets = confidence == Confidence.NOT_STATED ? tag.label() : tag.label() + "," + confidence.label();
        return work + " [" + brackets + "] (" + section + ")";
    }
}
