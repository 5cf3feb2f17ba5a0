package org.swingclearance.plan.web;

import java.io.Serializable;

/** Why a plan request was refused, as a message key with arguments, shown once on the plan page. */
public record PlanNotice(String key, Object[] args) implements Serializable {
}
