package org.swingclearance.training;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.springframework.stereotype.Component;
import org.swingclearance.engine.load.Adherence;
import org.swingclearance.engine.load.Alert;
import org.swingclearance.engine.load.Alerts;
import org.swingclearance.engine.load.ConfigurationMatch;
import org.swingclearance.engine.load.Convention;
import org.swingclearance.engine.load.DailyLoad;
import org.swingclearance.engine.load.DailyLoads;
import org.swingclearance.engine.load.EwmaDay;
import org.swingclearance.engine.load.EwmaPolicy;
import org.swingclearance.engine.load.LoadConventions;
import org.swingclearance.engine.load.LoadMonitor;
import org.swingclearance.engine.load.LoadReport;
import org.swingclearance.engine.load.MechanicalDose;
import org.swingclearance.engine.load.MonitoringPolicy;
import org.swingclearance.engine.load.Monotony;
import org.swingclearance.engine.load.PainDecision;
import org.swingclearance.engine.load.PainMonitoring;
import org.swingclearance.engine.load.PainPolicy;
import org.swingclearance.engine.load.PainRecord;
import org.swingclearance.engine.load.RatioStatus;
import org.swingclearance.engine.load.RollingRatio;
import org.swingclearance.engine.load.SdConvention;
import org.swingclearance.engine.load.SessionLoad;
import org.swingclearance.training.LoadView.ConventionLine;

/**
 * Hands the session logs to the load engine ({@code org.swingclearance.engine.load}) and turns its results into the
 * workspace's view and alert findings. No load formula lives here: session load, daily sums, EWMA, rolling ratios,
 * monotony, strain, dose, adherence, the pain rule and the alerts are the engine's. What this class decides is
 * which sessions and dates to hand over: the series runs from the first logged day to today, days without a logged
 * session are rest days (nothing in the workspace marks a day missing), and the step a session is judged against is
 * the lower of the step it was logged at and the step the plan schedules that day.
 */
@Component
class LoadAnalysis {

    /** EWMA N = 7 and 28 with a 28-day warm-up (Williams 2017; warm-up clinical.md §7.4 [C]). */
    static final EwmaPolicy EWMA = EwmaPolicy.DEFAULT;
    /** Sample SD for monotony (clinical.md §7.2 default [C]). */
    static final SdConvention SD = SdConvention.SAMPLE;

    /** The engine's monitoring policy with the clinic's practice-rule limits. */
    static MonitoringPolicy policy(AlertLimits limits) {
        PainPolicy pain = new PainPolicy(limits.painDuringLimit(), PainPolicy.DEFAULT.minDaysOnStep(),
                PainPolicy.DEFAULT.weeklyRiseTolerance());
        return new MonitoringPolicy(EWMA, SD, limits.ratioCaution(), pain);
    }

    /** Session load in AU (session RPE × minutes, Foster 2001). */
    double sessionLoad(SessionLogVersion v) {
        return engineLoad(v).load();
    }

    /** Swings × D of the session; null when the configuration's D is not known. */
    Double dose(SessionLogVersion v) {
        return v.getDemandRatio() == null ? null
                : MechanicalDose.of(List.of(new MechanicalDose.Block(v.done().swings(), v.getDemandRatio())));
    }

    /** The load view of an episode's sessions (in date order) up to {@code asOf}. */
    LoadView report(List<LoggedSession> sessions, TrainingPlan plan, LocalDate asOf, AlertLimits limits) {
        MonitoringPolicy policy = policy(limits);
        List<ConventionLine> conventions = conventions(policy);
        if (sessions.isEmpty()) {
            return LoadView.empty(asOf, conventions);
        }
        LocalDate last = sessions.get(sessions.size() - 1).date();
        LocalDate to = last.isAfter(asOf) ? last : asOf;
        DailyLoads loads = dailyLoads(sessions, to);
        LoadReport report = LoadMonitor.analyse(loads, policy);
        List<LoadDay> days = new ArrayList<>();
        for (int i = 0; i < loads.days().size(); i++) {
            DailyLoad day = loads.days().get(i);
            EwmaDay ewma = report.ewma().get(i);
            RollingRatio rolling = report.rolling().get(i);
            days.add(new LoadDay(day.date(), day.load().orElse(0), ewma.acute().orElse(0), ewma.chronic().orElse(0),
                    value(ewma.shownRatio()), shown(rolling, rolling.coupled()), shown(rolling, rolling.uncoupled()),
                    plannedDemand(plan, day.date())));
        }
        LoadDay latest = days.get(days.size() - 1);
        Optional<Monotony> week = report.lastWeek();
        double weeklyLoad = week.map(Monotony::weeklyLoad).orElseGet(() -> days.stream()
                .filter(d -> d.date().isAfter(to.minusDays(7))).mapToDouble(LoadDay::load).sum());
        double mechanicalDose = MechanicalDose.of(sessions.stream().map(LoggedSession::version)
                .filter(v -> v.getDemandRatio() != null)
                .map(v -> new MechanicalDose.Block(v.done().swings(), v.getDemandRatio())).toList());
        int withoutDose = (int) sessions.stream().filter(s -> s.version().getDemandRatio() == null).count();
        Adherence adherence = adherence(sessions, plan, to);
        return new LoadView(to, days, weeklyLoad, latest.acute(), latest.chronic(), latest.ratioEwma(),
                latest.ratioCoupled(), latest.ratioUncoupled(), week.flatMap(m -> boxed(m.monotony())).orElse(null),
                week.flatMap(m -> boxed(m.strain())).orElse(null), mechanicalDose, withoutDose, adherence.planned(),
                adherence.done(), adherence.asPlanned(), adherence.lighter(), adherence.heavier(),
                adherence.different(), conventions);
    }

    /**
     * The alerts a new or corrected session raises: the engine's pain rule over the sessions up to its day (others
     * of the same day left out, so this one is the latest), its configuration against the step the plan schedules
     * that day, and the acute:chronic ratio shown on that day.
     */
    List<AlertFinding> findingsForSession(LoggedSession session, List<LoggedSession> all, TrainingPlan plan,
                                          AlertLimits limits) {
        return findings(session, all, plan, limits, session.version().getId());
    }

    /** The alerts a next-morning rating raises: pain not settled, weekly pain rising. */
    List<AlertFinding> findingsForMorning(LoggedSession session, MorningPain morning, List<LoggedSession> all,
                                          TrainingPlan plan, AlertLimits limits) {
        return findings(session, all, plan, limits, morning.getId()).stream()
                .filter(f -> f.kind() == AlertKind.PAIN_NOT_SETTLED || f.kind() == AlertKind.PAIN_RISING_WEEKLY)
                .toList();
    }

    private List<AlertFinding> findings(LoggedSession session, List<LoggedSession> all, TrainingPlan plan,
                                        AlertLimits limits, java.util.UUID sourceId) {
        MonitoringPolicy policy = policy(limits);
        SessionLogVersion v = session.version();
        LocalDate day = v.getSessionDate();
        TrainingStep scheduled = plan.currentStepOn(day);
        int currentStep = Math.min(v.getStepNumber(), scheduled.number());
        LocalDate stepStart = plan.step(currentStep).map(TrainingStep::startsOn).filter(d -> !d.isAfter(day))
                .orElse(day);
        List<LoggedSession> upToDay = new ArrayList<>(all.stream().filter(s -> s.date().isBefore(day)).toList());
        upToDay.add(session);
        PainDecision pain = PainMonitoring.assess(day, stepStart, v.getPainBefore(),
                upToDay.stream().map(s -> new PainRecord(s.date(), s.version().getPainDuring(), s.painNextMorning()))
                        .toList(), policy.pain());
        ConfigurationMatch match = match(v.done(), v.getDemandRatio(), scheduled.configuration(),
                scheduled.demandRatio());
        OptionalDouble ratio = LoadMonitor.analyse(dailyLoads(upToDay, day), policy).latestEwma().shownRatio();
        List<AlertFinding> found = new ArrayList<>();
        for (Alert alert : Alerts.derive(currentStep, pain, match, ratio, policy)) {
            AlertKind kind = kind(alert.kind());
            Double observed = switch (kind) {
                case PAIN_DURING -> (double) v.getPainDuring();
                case PAIN_NOT_SETTLED -> session.painNextMorning() == null ? null : session.painNextMorning().doubleValue();
                case HEAVIER_THAN_STEP -> v.getDemandRatio();
                case LOAD_RATIO -> ratio.isPresent() ? ratio.getAsDouble() : null;
                case PAIN_RISING_WEEKLY -> null;
            };
            Double threshold = switch (kind) {
                case PAIN_DURING -> (double) limits.painDuringLimit();
                case PAIN_NOT_SETTLED -> (double) v.getPainBefore();
                case HEAVIER_THAN_STEP -> scheduled.demandRatio();
                case LOAD_RATIO -> limits.ratioCaution();
                case PAIN_RISING_WEEKLY -> null;
            };
            found.add(new AlertFinding(kind, sourceId, currentStep, alert.suggestedStep(), observed, threshold));
        }
        return found;
    }

    /**
     * How a configuration compares with a step: the engine compares demand ratios D when D is known; the product
     * also counts a heavier club, a longer lever or a faster cycle on any one dial as heavier, and without a known D
     * that dial check alone decides.
     */
    static ConfigurationMatch match(SwingConfiguration done, Double doneD, SwingConfiguration step, double stepD) {
        boolean same = done.sameAs(step);
        boolean heavierDial = !same && done.heavierOnAnyDialThan(step);
        if (doneD != null) {
            ConfigurationMatch byDemand = ConfigurationMatch.compare(same, doneD, stepD);
            return heavierDial ? ConfigurationMatch.HEAVIER : byDemand;
        }
        if (same) {
            return ConfigurationMatch.AS_PLANNED;
        }
        return heavierDial ? ConfigurationMatch.HEAVIER : ConfigurationMatch.DIFFERENT;
    }

    /**
     * Adherence to the current plan from its start: sessions the plan asks for (sessions per week × weeks elapsed,
     * counted in whole sessions) against the sessions logged since, each compared with the step it was logged at.
     */
    private static Adherence adherence(List<LoggedSession> sessions, TrainingPlan plan, LocalDate to) {
        if (plan == null) {
            return Adherence.of(0, List.of());
        }
        List<ConfigurationMatch> matches = sessions.stream().map(LoggedSession::version)
                .filter(v -> !v.getSessionDate().isBefore(plan.startsOn()))
                .map(v -> v.isAsPlanned() ? ConfigurationMatch.AS_PLANNED
                        : match(v.done(), v.getDemandRatio(), v.planned(), v.getPlannedDemandRatio()))
                .toList();
        return Adherence.of(plannedSessions(plan, to), matches);
    }

    /** Whole sessions the plan asks for from its first day to {@code to}, both included. */
    static int plannedSessions(TrainingPlan plan, LocalDate to) {
        long days = ChronoUnit.DAYS.between(plan.startsOn(), to) + 1;
        return days <= 0 ? 0 : (int) (days * plan.sessionsPerWeek() / 7);
    }

    private static DailyLoads dailyLoads(List<LoggedSession> sessions, LocalDate to) {
        LocalDate from = sessions.stream().map(LoggedSession::date).min(LocalDate::compareTo).orElse(to);
        return DailyLoads.of(from, to, sessions.stream().map(s -> engineLoad(s.version())).toList(), Set.of());
    }

    private static SessionLoad engineLoad(SessionLogVersion v) {
        return new SessionLoad(v.getSessionDate(), v.getRpe(), v.getDurationMin());
    }

    private static Double plannedDemand(TrainingPlan plan, LocalDate day) {
        return plan == null || day.isBefore(plan.startsOn()) ? null : plan.currentStepOn(day).demandRatio();
    }

    private static Double shown(RollingRatio rolling, OptionalDouble ratio) {
        return rolling.status() == RatioStatus.SHOWN ? value(ratio) : null;
    }

    private static Double value(OptionalDouble value) {
        return value.isPresent() ? value.getAsDouble() : null;
    }

    private static Optional<Double> boxed(OptionalDouble value) {
        return value.isPresent() ? Optional.of(value.getAsDouble()) : Optional.empty();
    }

    private static AlertKind kind(Alert.Kind kind) {
        return switch (kind) {
            case PAIN_DURING_ABOVE_LIMIT -> AlertKind.PAIN_DURING;
            case PAIN_NOT_SETTLED -> AlertKind.PAIN_NOT_SETTLED;
            case PAIN_RISING_WEEKLY -> AlertKind.PAIN_RISING_WEEKLY;
            case CONFIGURATION_HEAVIER -> AlertKind.HEAVIER_THAN_STEP;
            case ACWR_ABOVE_CAUTION -> AlertKind.LOAD_RATIO;
        };
    }

    /**
     * The engine's conventions as messages of the training bundle ({@code convention.<code>}) with the policy's
     * values, then the workspace's own: no missing days, how the dose, adherence and "heavier" are counted.
     */
    static List<ConventionLine> conventions(MonitoringPolicy policy) {
        List<ConventionLine> lines = new ArrayList<>();
        for (Convention c : LoadConventions.describe(policy)) {
            lines.add(new ConventionLine("convention." + c.code(), args(c.code(), policy), c.citation().label()));
        }
        lines.add(new ConventionLine("convention.training.noMissingDays", new Object[0], null));
        lines.add(new ConventionLine("convention.training.dose", new Object[0], null));
        lines.add(new ConventionLine("convention.training.adherence", new Object[0], null));
        lines.add(new ConventionLine("convention.training.heavier", new Object[0], null));
        return lines;
    }

    private static Object[] args(String code, MonitoringPolicy policy) {
        EwmaPolicy ewma = policy.ewma();
        return switch (code) {
            case "load.ewma" -> new Object[] {ewma.acuteDays(), fixed(ewma.acuteLambda(), 4), ewma.chronicDays(),
                fixed(ewma.chronicLambda(), 4)};
            case "load.ewma-warm-up" -> new Object[] {ewma.warmUpDays()};
            case "load.acwr-caution" -> new Object[] {fixed(policy.acwrCaution(), 2)};
            case "load.pain" -> new Object[] {fixed(policy.pain().painDuringLimit(), 0), policy.pain().minDaysOnStep()};
            default -> new Object[0];
        };
    }

    private static String fixed(double value, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
