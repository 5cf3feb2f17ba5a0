/**
 * Training-load monitoring as pure functions of logged sessions and dates: session load (session RPE × minutes),
 * daily loads with rest and missing days kept apart, EWMA and rolling acute:chronic ratios, monotony and strain,
 * mechanical dose, adherence, the pain-monitoring rule and the alerts derived from them. Dates are inputs; nothing
 * here reads a clock. The acute:chronic ratio is a monitoring signal whose predictive value is disputed, never a
 * clearance ({@link org.swingclearance.engine.load.LoadConventions}).
 */
package org.swingclearance.engine.load;
