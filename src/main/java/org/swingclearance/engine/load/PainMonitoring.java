package org.swingclearance.engine.load;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.function.ToDoubleFunction;

/**
 * The pain-monitoring rule after Silbernagel et al. 2007 (clinical.md §6.4): pain during a session at most the
 * limit, pain settled (back to baseline) by the next morning, and no rise of the weekly mean from one week to the
 * next. Exceeding any of them means the next session goes back a step; meeting all of them for the hold period
 * (§6.5, rule of thumb) allows the next step; otherwise hold. Evidence comes from Achilles tendinopathy: applying it
 * to club training is an extrapolation.
 */
public final class PainMonitoring {

    private PainMonitoring() {
    }

    /**
     * Assesses the pain record of the current step.
     *
     * @param today         the day of the assessment; never null (the engine reads no clock)
     * @param stepStartedOn the day the current step began, not after {@code today}; never null
     * @param baselinePain  the patient's usual pain at rest, 0–10, that "settled" returns to; null when unknown
     * @param sessions      pain of the logged sessions (any order), none after {@code today}; never null
     * @param policy        limits; never null
     */
    public static PainDecision assess(LocalDate today, LocalDate stepStartedOn, Integer baselinePain,
            List<PainRecord> sessions, PainPolicy policy) {
        Objects.requireNonNull(today, "today");
        Objects.requireNonNull(stepStartedOn, "stepStartedOn");
        Objects.requireNonNull(sessions, "sessions");
        Objects.requireNonNull(policy, "policy");
        if (stepStartedOn.isAfter(today)) {
            throw new IllegalArgumentException("the step starts " + stepStartedOn + ", after " + today);
        }
        if (baselinePain != null) {
            Checks.inRange(baselinePain, 0, 10, "baseline pain");
        }
        for (PainRecord session : sessions) {
            if (session.date().isAfter(today)) {
                throw new IllegalArgumentException("a session on " + session.date() + " is after " + today);
            }
        }
        List<PainReason> regress = new ArrayList<>();
        List<PainReason> hold = new ArrayList<>();
        List<PainReason> notes = new ArrayList<>();
        PainRecord latest = sessions.stream().max(Comparator.comparing(PainRecord::date)).orElse(null);
        if (latest == null) {
            hold.add(new PainReason(PainReason.Kind.NO_SESSION, "no session logged yet"));
        } else {
            latestSession(latest, baselinePain, policy, regress, hold);
            weeklyTrend(today, sessions, policy, regress, notes);
            if (regress.isEmpty() && hold.isEmpty()) {
                holdPeriod(today, stepStartedOn, baselinePain, sessions, policy, hold);
            }
        }
        List<PainReason> reasons = new ArrayList<>(regress);
        reasons.addAll(hold);
        PainDecision.Decision decision;
        if (!regress.isEmpty()) {
            decision = PainDecision.Decision.REGRESS;
        } else if (!hold.isEmpty()) {
            decision = PainDecision.Decision.HOLD;
        } else {
            decision = PainDecision.Decision.PROGRESS;
            reasons.add(new PainReason(PainReason.Kind.WITHIN_LIMITS, "pain within limits and settled for "
                    + policy.minDaysOnStep() + " days on this step, no weekly rise"));
        }
        reasons.addAll(notes);
        return new PainDecision(decision, reasons, PainDecision.SOURCES);
    }

    private static void latestSession(PainRecord latest, Integer baselinePain, PainPolicy policy,
            List<PainReason> regress, List<PainReason> hold) {
        if (latest.painDuring() > policy.painDuringLimit()) {
            regress.add(new PainReason(PainReason.Kind.PAIN_DURING_ABOVE_LIMIT, "pain during " + latest.painDuring()
                    + "/10 on " + latest.date() + " above the limit " + format(policy.painDuringLimit()) + "/10"));
        }
        if (latest.painNextMorning() == null) {
            hold.add(new PainReason(PainReason.Kind.NEXT_MORNING_NOT_RECORDED,
                    "next-morning pain after " + latest.date() + " not entered yet"));
        } else if (baselinePain == null) {
            hold.add(new PainReason(PainReason.Kind.NO_BASELINE,
                    "no baseline pain to judge whether next-morning pain settled"));
        } else if (latest.painNextMorning() > baselinePain) {
            regress.add(new PainReason(PainReason.Kind.NOT_SETTLED_NEXT_MORNING, "next-morning pain "
                    + latest.painNextMorning() + "/10 after " + latest.date() + " above the baseline " + baselinePain
                    + "/10"));
        }
    }

    private static void weeklyTrend(LocalDate today, List<PainRecord> sessions, PainPolicy policy,
            List<PainReason> regress, List<PainReason> notes) {
        List<PainRecord> thisWeek = between(sessions, today.minusDays(6), today);
        List<PainRecord> lastWeek = between(sessions, today.minusDays(13), today.minusDays(7));
        if (lastWeek.isEmpty() || thisWeek.isEmpty()) {
            notes.add(new PainReason(PainReason.Kind.TREND_NOT_ASSESSABLE,
                    "no sessions in one of the two weeks ending " + today + " to compare"));
            return;
        }
        rise("pain during", mean(thisWeek, PainRecord::painDuring), mean(lastWeek, PainRecord::painDuring), policy,
                regress);
        List<PainRecord> thisWeekMornings = thisWeek.stream().filter(r -> r.painNextMorning() != null).toList();
        List<PainRecord> lastWeekMornings = lastWeek.stream().filter(r -> r.painNextMorning() != null).toList();
        if (!thisWeekMornings.isEmpty() && !lastWeekMornings.isEmpty()) {
            rise("next-morning pain", mean(thisWeekMornings, r -> r.painNextMorning()),
                    mean(lastWeekMornings, r -> r.painNextMorning()), policy, regress);
        }
    }

    private static void rise(String what, double thisWeek, double lastWeek, PainPolicy policy,
            List<PainReason> regress) {
        if (thisWeek > lastWeek + policy.weeklyRiseTolerance()) {
            regress.add(new PainReason(PainReason.Kind.WEEKLY_RISE, "weekly mean " + what + " rose from "
                    + format(lastWeek) + " to " + format(thisWeek) + "/10"));
        }
    }

    private static void holdPeriod(LocalDate today, LocalDate stepStartedOn, Integer baselinePain,
            List<PainRecord> sessions, PainPolicy policy, List<PainReason> hold) {
        long daysOnStep = ChronoUnit.DAYS.between(stepStartedOn, today);
        if (daysOnStep < policy.minDaysOnStep()) {
            hold.add(new PainReason(PainReason.Kind.STEP_HELD_TOO_SHORT, "on this step for " + daysOnStep
                    + " day(s) of the " + policy.minDaysOnStep() + " required"));
            return;
        }
        LocalDate periodStart = today.minusDays(policy.minDaysOnStep());
        if (periodStart.isBefore(stepStartedOn)) {
            periodStart = stepStartedOn;
        }
        for (PainRecord session : between(sessions, periodStart, today)) {
            boolean tooPainful = session.painDuring() > policy.painDuringLimit();
            boolean unsettled = session.painNextMorning() != null && session.painNextMorning() > baselinePain;
            if (tooPainful || unsettled) {
                hold.add(new PainReason(PainReason.Kind.RECENT_SYMPTOMS, "the session on " + session.date()
                        + " exceeded the limits; hold until " + policy.minDaysOnStep() + " days are symptom-stable"));
                return;
            }
        }
    }

    private static List<PainRecord> between(List<PainRecord> sessions, LocalDate from, LocalDate to) {
        return sessions.stream().filter(r -> !r.date().isBefore(from) && !r.date().isAfter(to)).toList();
    }

    private static double mean(List<PainRecord> records, ToDoubleFunction<PainRecord> pain) {
        OptionalDouble mean = records.stream().mapToDouble(pain).average();
        return mean.orElseThrow();
    }

    private static String format(double value) {
        return value == Math.rint(value) ? String.valueOf((long) value) : String.format(Locale.ROOT, "%.1f", value);
    }
}
