package org.swingclearance.plan;

/** Where a plan version stands: a draft the clinician adjusts, or issued (signed, read-only). */
public enum PlanStatus {
    DRAFT, ISSUED
}
