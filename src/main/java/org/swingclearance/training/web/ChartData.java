package org.swingclearance.training.web;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Component;
import org.swingclearance.training.LoadDay;
import org.swingclearance.training.SessionView;
import org.swingclearance.training.Workspace;

/**
 * The data block the training charts read (a {@code <script type="application/json">} that Thymeleaf's JavaScript
 * inlining serializes and escapes, never inline code): one array per series aligned with the days of the load
 * report, plus the chart labels from the message bundle. Pain and logged demand are the highest of the day's
 * sessions; the page's tables list every session.
 */
@Component
class ChartData {

    private static final String[] LABEL_KEYS = {"chart.dailyLoad", "chart.acute", "chart.chronic", "chart.ratioEwma",
        "chart.ratioCoupled", "chart.ratioUncoupled", "chart.caution", "chart.painDuring", "chart.painMorning",
        "chart.painLimit", "chart.plannedD", "chart.loggedD", "chart.loadAxis", "chart.ratioAxis", "chart.painAxis",
        "chart.demandAxis"};

    private final MessageSource messages;

    ChartData(MessageSource messages) {
        this.messages = messages;
    }

    /** The chart data of a training log page, serialized into the page by the template. */
    Map<String, Object> of(Workspace ws) {
        Map<String, Object> data = new LinkedHashMap<>();
        data.put("labels", labels());
        List<String> days = new ArrayList<>();
        List<Double> daily = new ArrayList<>();
        List<Double> acute = new ArrayList<>();
        List<Double> chronic = new ArrayList<>();
        List<Double> ratioEwma = new ArrayList<>();
        List<Double> ratioCoupled = new ArrayList<>();
        List<Double> ratioUncoupled = new ArrayList<>();
        List<Double> plannedD = new ArrayList<>();
        for (LoadDay day : ws.load().days()) {
            days.add(day.date().toString());
            daily.add(day.load());
            acute.add(day.acute());
            chronic.add(day.chronic());
            ratioEwma.add(day.ratioEwma());
            ratioCoupled.add(day.ratioCoupled());
            ratioUncoupled.add(day.ratioUncoupled());
            plannedD.add(day.plannedDemand());
        }
        data.put("days", days);
        data.put("daily", daily);
        data.put("acute", acute);
        data.put("chronic", chronic);
        data.put("ratioEwma", ratioEwma);
        data.put("ratioCoupled", ratioCoupled);
        data.put("ratioUncoupled", ratioUncoupled);
        data.put("caution", ws.limits().ratioCaution());
        data.put("painLimit", ws.limits().painDuringLimit());
        data.put("plannedD", plannedD);
        data.put("painDuring", perDay(ws, days, s -> (double) s.painDuring()));
        data.put("painMorning", perDay(ws, days, s -> s.painNextMorning() == null ? null : s.painNextMorning().doubleValue()));
        data.put("loggedD", perDay(ws, days, SessionView::demandRatio));
        return data;
    }

    /** The highest value of each day's sessions, aligned with {@code days}; null on days without a value. */
    private static List<Double> perDay(Workspace ws, List<String> days,
                                       java.util.function.Function<SessionView, Double> value) {
        Map<LocalDate, Double> highest = new HashMap<>();
        for (SessionView s : ws.sessions()) {
            Double v = value.apply(s);
            if (v != null) {
                highest.merge(s.date(), v, Math::max);
            }
        }
        List<Double> aligned = new ArrayList<>(days.size());
        days.forEach(d -> aligned.add(highest.get(LocalDate.parse(d))));
        return aligned;
    }

    private Map<String, String> labels() {
        Map<String, String> labels = new LinkedHashMap<>();
        for (String key : LABEL_KEYS) {
            labels.put(key.substring("chart.".length()),
                    messages.getMessage(key, null, LocaleContextHolder.getLocale()));
        }
        return labels;
    }
}
