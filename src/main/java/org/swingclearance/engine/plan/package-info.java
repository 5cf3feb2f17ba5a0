/**
 * Graded-plan search (engine.md §7): the state graph of clubs × grip marks (2.5 cm grid) × cycle-time rungs, edges
 * that change exactly one dial by one step and raise the demand ratio by at most the practice rules' step limit, and
 * the shortest path (fewest steps, then the smallest largest rise, then the lowest total demand ratio) from the
 * easiest permitted state to the clinician's target or to the highest permitted state.
 *
 * <p>The search does not compute mechanics itself: it asks a {@link org.swingclearance.engine.plan.StateEvaluator}
 * for each state's {@link org.swingclearance.engine.plan.Evaluation}, so the mechanics engine (demand, constraints
 * C1–C5) plugs in through an adapter. Plain Java only; SI units inside.
 */
package org.swingclearance.engine.plan;
