/**
 * Calculations for integrations: the demand of one swing configuration and its envelope, computed by the pure
 * engine ({@code org.swingclearance.engine.mechanics}, {@code ..engine.envelope}) from plain SI values. No patient
 * record is read or written, so nothing is audited; every result carries the engine version and its assumptions.
 * HTTP API in the {@code web} sub-package; tested by {@code CalculationApiTests}.
 */
package org.swingclearance.calculation;
