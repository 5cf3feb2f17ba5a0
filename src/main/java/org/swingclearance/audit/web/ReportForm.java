package org.swingclearance.audit.web;

import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import java.time.LocalDate;
import org.springframework.format.annotation.DateTimeFormat;
import org.swingclearance.audit.ReportParams;

/** A report's period (UTC days, both inclusive; the last twelve months when left empty) and draft age in days. */
public class ReportForm {

    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate from;
    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate to;
    @Min(1)
    @Max(3650)
    private Integer days;

    ReportParams toParams(LocalDate today) {
        LocalDate end = to == null ? today : to;
        LocalDate start = from == null ? end.withDayOfMonth(1).minusMonths(11) : from;
        return new ReportParams(start, end, days == null ? 14 : days, today);
    }

    public LocalDate getFrom() { return from; }
    public void setFrom(LocalDate from) { this.from = from; }
    public LocalDate getTo() { return to; }
    public void setTo(LocalDate to) { this.to = to; }
    public Integer getDays() { return days; }
    public void setDays(Integer days) { this.days = days; }
}
