/**
 * Practice rules and banding: a clinic's versioned {@link org.swingclearance.engine.rules.RuleSet} of threshold
 * rules, each naming the value it tests, the load band it caps per region and the source of its threshold;
 * {@link org.swingclearance.engine.rules.Banding} turns a screening's values into findings and a band per region;
 * {@link org.swingclearance.engine.rules.DefaultRules} is the seed set built from the clinical reference. Which band
 * a finding caps is always a product rule (no study maps screening results to club limits).
 */
package org.swingclearance.engine.rules;
