package org.swingclearance.envelope.web;

import jakarta.validation.Valid;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.ResponseBody;
import org.swingclearance.envelope.EnvelopePage;
import org.swingclearance.envelope.Envelopes;
import org.swingclearance.envelope.WhatIf;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * The envelope page of an episode (clinicians of its clinic): the table of every club × pattern, the charts and
 * the what-if panel, whose JSON endpoint sits under the same path; and the table as CSV with the caution on top.
 */
@Controller
@RequestMapping("/episodes/{episodeId}/envelope")
@PreAuthorize("hasRole('CLINICIAN')")
class EnvelopeController {

    static final String PAGE = "envelope/page";

    private final Envelopes envelopes;
    private final EnvelopeCsv csv;
    private final MessageSource messages;

    EnvelopeController(Envelopes envelopes, EnvelopeCsv csv, MessageSource messages) {
        this.envelopes = envelopes;
        this.csv = csv;
        this.messages = messages;
    }

    @GetMapping
    String page(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                @Valid @ModelAttribute("query") EnvelopeQuery query, BindingResult errors, Model model) {
        boolean badCycleTime = errors.hasFieldErrors("cycleTime");
        EnvelopePage page = envelopes.page(me.staff(), episodeId, badCycleTime ? null : query.getCycleTime());
        model.addAttribute("page", page);
        if (page.blocked()) {
            return PAGE;
        }
        WhatIf whatIf = envelopes.tryOn(page, query.getClub(), query.getPattern(),
                errors.hasFieldErrors("grip") ? null : query.getGrip(),
                errors.hasFieldErrors("tempo") ? null : query.getTempo());
        if (!badCycleTime) {
            query.setCycleTime(page.snapshot().cycleTimeS());
        }
        query.setClub(whatIf.clubId());
        query.setPattern(whatIf.patternId());
        query.setGrip(round(whatIf.gripMarkCm(), 1));
        query.setTempo(round(whatIf.cycleTimeS(), 2));
        model.addAttribute("whatIf", whatIf);
        model.addAttribute("chartData", chartData(episodeId, page, whatIf));
        return PAGE;
    }

    /** The what-if panel's endpoint: one configuration computed by the engine, as JSON. */
    @PostMapping(path = "/what-if", produces = MediaType.APPLICATION_JSON_VALUE)
    @ResponseBody
    WhatIf whatIf(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                  @RequestParam UUID club, @RequestParam UUID pattern, @RequestParam double gripCm,
                  @RequestParam double cycleTimeS) {
        return envelopes.whatIf(me.staff(), episodeId, club, pattern, gripCm, cycleTimeS);
    }

    /** The envelope table as CSV, the caution on its first line. */
    @GetMapping(path = "/export.csv")
    ResponseEntity<String> export(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                                  @RequestParam(required = false) Double cycleTime) {
        EnvelopePage page = envelopes.export(me.staff(), episodeId, cycleTime)
                .orElseThrow(() -> new NotFoundException("Envelope"));
        String filename = "envelope-" + page.patient().code().replaceAll("[^A-Za-z0-9._-]", "_") + ".csv";
        return ResponseEntity.ok()
                .contentType(new MediaType("text", "csv", java.nio.charset.StandardCharsets.UTF_8))
                .header(HttpHeaders.CONTENT_DISPOSITION, "attachment; filename=\"" + filename + "\"")
                .body(csv.write(page));
    }

    @ExceptionHandler(InvalidStateException.class)
    ResponseEntity<Map<String, String>> unavailable(InvalidStateException e) {
        return ResponseEntity.status(HttpStatus.CONFLICT).contentType(MediaType.APPLICATION_JSON)
                .body(Map.of("message", messages.getMessage(e.messageKey(), null, LocaleContextHolder.getLocale())));
    }

    /** What envelope.js needs: the endpoint, the clubs' handles, the labels, and the first what-if. */
    private Map<String, Object> chartData(UUID episodeId, EnvelopePage page, WhatIf whatIf) {
        Map<String, Object> data = new LinkedHashMap<>();
        data.put("whatIfUrl", "/episodes/" + episodeId + "/envelope/what-if");
        data.put("clubs", page.clubs().stream().map(c -> Map.of("id", c.id().toString(), "name", c.name(),
                "handleLengthCm", c.handleLengthM() * 100.0)).toList());
        data.put("labels", labels(List.of("envelope.chart.gripAxis", "envelope.chart.cycleAxis",
                "envelope.chart.demandAxis", "envelope.chart.demand", "envelope.chart.permittedLine",
                "envelope.chart.chosen", "envelope.whatIf.failed")));
        data.put("whatIf", whatIf);
        return data;
    }

    private Map<String, String> labels(List<String> keys) {
        Map<String, String> labels = new LinkedHashMap<>();
        keys.forEach(k -> labels.put(k.substring(k.lastIndexOf('.') + 1),
                messages.getMessage(k, null, LocaleContextHolder.getLocale())));
        return labels;
    }

    private static double round(double value, int decimals) {
        double scale = Math.pow(10, decimals);
        return Math.round(value * scale) / scale;
    }
}
