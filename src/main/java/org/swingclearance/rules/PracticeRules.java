package org.swingclearance.rules;

import java.time.Clock;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.TransactionDefinition;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffAccounts;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.NotFoundException;

/**
 * The practice-rules service (Contract R). A clinic's version 1 is the engine's defaults, seeded lazily the first
 * time its rules are needed (so clinics created later get them too, and no startup job has to visit every clinic);
 * a transaction-scoped advisory lock per clinic makes concurrent first uses seed exactly once. Every edit inserts
 * version n + 1 and is audited; versions are never changed.
 */
@Service
public class PracticeRules {

    /** First key of the advisory lock that serialises seeding (the second is the clinic). */
    private static final int SEED_LOCK = 7_319_001;

    private final RuleSetRepository ruleSets;
    private final StaffAccounts staffAccounts;
    private final AuditLog audit;
    private final JdbcTemplate jdbc;
    private final Clock clock;
    private final TransactionTemplate seeding;

    PracticeRules(RuleSetRepository ruleSets, StaffAccounts staffAccounts, AuditLog audit, JdbcTemplate jdbc,
                  Clock clock, PlatformTransactionManager transactions) {
        this.ruleSets = ruleSets;
        this.staffAccounts = staffAccounts;
        this.audit = audit;
        this.jdbc = jdbc;
        this.clock = clock;
        this.seeding = new TransactionTemplate(transactions);
        this.seeding.setPropagationBehavior(TransactionDefinition.PROPAGATION_REQUIRES_NEW);
    }

    /** The clinic's current rules, seeding the defaults as version 1 on first use. */
    @Transactional
    public CurrentRuleSet current(UUID clinicId) {
        return latest(clinicId).toView();
    }

    /** A stored version by id, within the clinic. */
    @Transactional(readOnly = true)
    public Optional<CurrentRuleSet> byId(UUID clinicId, UUID ruleSetId) {
        return ruleSets.findByIdAndClinicId(ruleSetId, clinicId).map(RuleSetRecord::toView);
    }

    /** A stored version by number, within the caller's clinic; 404 otherwise. */
    @Transactional
    public CurrentRuleSet version(CurrentStaff staff, int version) {
        latest(staff.clinicId());
        return ruleSets.findByClinicIdAndVersion(staff.clinicId(), version).map(RuleSetRecord::toView)
                .orElseThrow(() -> new NotFoundException("Rule set version"));
    }

    /** Every version of the caller's clinic, newest first. */
    @Transactional
    public List<RuleSetSummary> history(CurrentStaff staff) {
        latest(staff.clinicId());
        return ruleSets.findByClinicIdOrderByVersionDesc(staff.clinicId()).stream().map(r -> {
            CurrentRuleSet v = r.toView();
            String by = v.createdBy() == null ? null
                    : staffAccounts.find(staff, v.createdBy()).map(s -> s.displayName()).orElse(null);
            return new RuleSetSummary(v.version(), v.createdAt(), by, v.changeNote(), v.rules().size());
        }).toList();
    }

    /**
     * Saves an edit as the next version.
     *
     * @param basedOnVersion the version the editor started from; if another edit was saved since, nothing is
     *                       saved and {@link ConflictException} is thrown
     * @return the new version number
     */
    @Transactional
    public int edit(CurrentStaff editor, int basedOnVersion, RuleSetSettings settings, String changeNote) {
        if (!editor.is(StaffRole.MANAGER) && !editor.is(StaffRole.ADMIN)) {
            audit.recordDenied(editor, "RULES_EDIT", "PracticeRuleSet", null, "role may not edit practice rules");
            throw new org.springframework.security.access.AccessDeniedException("practice rules");
        }
        if (changeNote == null || changeNote.isBlank()) {
            throw new IllegalArgumentException("an edit needs a change note");
        }
        RuleSetRecord current = latest(editor.clinicId());
        if (current.getVersion() != basedOnVersion) {
            throw new ConflictException("practice rules");
        }
        int next = current.getVersion() + 1;
        RuleSetRecord record = new RuleSetRecord(UUID.randomUUID(), editor.clinicId(), next, editor.staffId(),
                clock.instant().truncatedTo(ChronoUnit.MICROS), changeNote.trim(), settings);
        ruleSets.saveAndFlush(record);
        audit.record(editor, "RULES_EDIT", "PracticeRuleSet", record.getId(), null,
                "version=" + next + " basedOn=" + basedOnVersion);
        return next;
    }

    private RuleSetRecord latest(UUID clinicId) {
        Optional<RuleSetRecord> existing = ruleSets.findFirstByClinicIdOrderByVersionDesc(clinicId);
        if (existing.isPresent()) {
            return existing.get();
        }
        // Seed in a transaction of its own, so callers in read-only transactions get defaults too; the advisory
        // lock serialises first uses of one clinic, and the second one finds the first one's row after it.
        seeding.executeWithoutResult(tx -> {
            jdbc.queryForObject("select 1 from (select pg_advisory_xact_lock(?, hashtext(?::text))) lock",
                    Integer.class, SEED_LOCK, clinicId.toString());
            if (ruleSets.findFirstByClinicIdOrderByVersionDesc(clinicId).isEmpty()) {
                ruleSets.saveAndFlush(new RuleSetRecord(UUID.randomUUID(), clinicId, 1, null,
                        clock.instant().truncatedTo(ChronoUnit.MICROS), null, DefaultSettings.create()));
            }
        });
        return ruleSets.findFirstByClinicIdOrderByVersionDesc(clinicId)
                .orElseThrow(() -> new IllegalStateException("practice rules were not seeded for " + clinicId));
    }
}
