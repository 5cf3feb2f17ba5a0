package org.swingclearance.equipment;

import java.time.Clock;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * The swing pattern library's application service (Contract E): the built-in patterns every clinic shares, plus
 * the clinic's own, which it adds and retires. Another clinic's pattern is "not found" (audited).
 */
@Service
public class SwingPatterns {

    /** Band names a pattern may require of the lumbopelvic screening (Hold would exclude every swing). */
    public static final List<String> BANDS = List.of("BAND_1", "BAND_2", "BAND_3", "OPEN");
    public static final List<String> KINDS = List.of("RHYTHMIC", "SINGLE_ARC");

    private final SwingPatternRepository patterns;
    private final MessageSource messages;
    private final AuditLog audit;
    private final Clock clock;

    SwingPatterns(SwingPatternRepository patterns, MessageSource messages, AuditLog audit, Clock clock) {
        this.patterns = patterns;
        this.messages = messages;
        this.audit = audit;
        this.clock = clock;
    }

    /** Every pattern the clinic can use: the built-ins first, then its own that are not retired. */
    @Transactional(readOnly = true)
    public List<SwingPatternView> all(CurrentStaff staff) {
        return patterns.usable(staff.clinicId()).stream().map(this::view).toList();
    }

    /** The clinic's retired patterns, most recent first. */
    @Transactional(readOnly = true)
    public List<SwingPatternView> retired(CurrentStaff staff) {
        return patterns.findByClinicIdAndRetiredAtIsNotNullOrderByRetiredAtDesc(staff.clinicId()).stream()
                .map(this::view).toList();
    }

    /** A built-in or one of the caller's clinic's patterns (retired included); empty otherwise. */
    @Transactional(readOnly = true)
    public Optional<SwingPatternView> find(CurrentStaff staff, UUID patternId) {
        return patterns.visible(patternId, staff.clinicId()).map(this::view);
    }

    @Transactional
    public UUID create(CurrentStaff staff, SwingPatternDetails details) {
        if (!KINDS.contains(details.kind())) {
            throw new InvalidStateException("pattern.error.kind");
        }
        if (details.minimumLumbopelvicBand() != null && !BANDS.contains(details.minimumLumbopelvicBand())) {
            throw new InvalidStateException("pattern.error.band");
        }
        if (details.hipDriven() && details.minimumLumbopelvicBand() == null) {
            throw new InvalidStateException("pattern.error.hipDrivenNeedsBand");
        }
        if (patterns.existsByClinicIdAndNameIgnoreCaseAndRetiredAtIsNull(staff.clinicId(), details.name().trim())) {
            throw new InvalidStateException("pattern.error.nameTaken");
        }
        SwingPattern pattern = new SwingPattern(UUID.randomUUID(), staff.clinicId(), details, clock.instant(),
                staff.staffId());
        patterns.save(pattern);
        audit.record(staff, "PATTERN_CREATE", "SwingPattern", pattern.getId(), null, null);
        return pattern.getId();
    }

    /** Retires one of the clinic's own patterns; the built-in library cannot be retired. */
    @Transactional
    public void retire(CurrentStaff staff, UUID patternId, long expectedVersion) {
        SwingPattern pattern = patterns.visible(patternId, staff.clinicId())
                .filter(p -> !p.isBuiltIn())
                .orElseThrow(() -> {
                    audit.recordDenied(staff, "PATTERN_RETIRE", "SwingPattern", patternId,
                            "built-in, another clinic's or missing");
                    return new NotFoundException("SwingPattern");
                });
        if (pattern.getVersion() != expectedVersion) {
            throw new ConflictException("swing pattern");
        }
        if (pattern.isRetired()) {
            return;
        }
        pattern.retire(clock.instant());
        patterns.saveAndFlush(pattern);
        audit.record(staff, "PATTERN_RETIRE", "SwingPattern", patternId, null, null);
    }

    /** The library page: built-ins, the clinic's own in use (with versions for retiring) and its retired ones. */
    @Transactional(readOnly = true)
    public PatternLibrary library(CurrentStaff staff) {
        List<SwingPattern> usable = patterns.usable(staff.clinicId());
        return new PatternLibrary(
                usable.stream().filter(SwingPattern::isBuiltIn).map(this::view).toList(),
                usable.stream().filter(p -> !p.isBuiltIn())
                        .map(p -> new PatternLibrary.Own(view(p), p.getVersion())).toList(),
                retired(staff));
    }

    private SwingPatternView view(SwingPattern p) {
        String name = p.getNameKey() == null ? p.getName()
                : messages.getMessage(p.getNameKey(), null, p.getNameKey(), LocaleContextHolder.getLocale());
        return p.view(name);
    }
}
