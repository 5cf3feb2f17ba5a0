package org.swingclearance.engine.mechanics;

/**
 * Where an estimated input of a result came from, so a clinician can audit every number.
 *
 * @param quantity plain name of the quantity, e.g. "shoulder-to-grip distance"; never null
 * @param source   plain sentence fragment naming the source, e.g. "estimated from stature (0.386 × stature,
 *                 Drillis &amp; Contini via Winter Fig. 4.1)"; never null
 */
public record Provenance(String quantity, String source) {

    public Provenance {
        Checks.present("quantity", quantity);
        Checks.present("source", source);
    }
}
