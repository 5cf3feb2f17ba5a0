/**
 * Screenings of an episode: the measurement battery, the engine's derived values and findings under the clinic's
 * practice rules, the suggested and decided load bands, signing and amendment. Signed versions are append-only
 * (a database trigger refuses any change). Other features read the latest signed result through
 * {@link org.swingclearance.screening.Screenings#latestSigned} as {@link org.swingclearance.screening.SignedScreeningFacts}.
 */
package org.swingclearance.screening;
