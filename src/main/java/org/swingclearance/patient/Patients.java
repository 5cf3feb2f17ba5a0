package org.swingclearance.patient;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;
import org.springframework.context.ApplicationEventPublisher;
import org.springframework.data.domain.Page;
import org.springframework.data.domain.PageRequest;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * The patient feature's application service: intake, episodes, consents, red flags and referrals. Every
 * method is scoped to the caller's clinic; a record of another clinic is answered "not found" and audited.
 */
@Service
public class Patients {

    private static final int PAGE_SIZE = 25;

    private final PatientRepository patients;
    private final EpisodeRepository episodes;
    private final ShareConsentRepository consents;
    private final RedFlagCheckRepository redFlagChecks;
    private final ReferralRepository referrals;
    private final AuditLog audit;
    private final ApplicationEventPublisher events;
    private final Clock clock;

    Patients(PatientRepository patients, EpisodeRepository episodes, ShareConsentRepository consents,
             RedFlagCheckRepository redFlagChecks, ReferralRepository referrals, AuditLog audit,
             ApplicationEventPublisher events, Clock clock) {
        this.events = events;
        this.patients = patients;
        this.episodes = episodes;
        this.consents = consents;
        this.redFlagChecks = redFlagChecks;
        this.referrals = referrals;
        this.audit = audit;
        this.clock = clock;
    }

    @Transactional
    public Page<PatientSummary> search(CurrentStaff staff, String query, int page) {
        String q = query == null ? "" : query.trim();
        Page<PatientSummary> result = patients.search(staff.clinicId(), q, PageRequest.of(Math.max(page, 0), PAGE_SIZE))
                .map(Patient::summary);
        audit.record(staff, "PATIENT_SEARCH", "Patient", null, null, "results=" + result.getNumberOfElements());
        return result;
    }

    @Transactional
    public UUID create(CurrentStaff staff, PatientDetails details) {
        requireUniqueCode(staff, details.code(), null);
        Patient patient = new Patient(UUID.randomUUID(), staff.clinicId(), details, clock.instant());
        patients.save(patient);
        audit.record(staff, "PATIENT_CREATE", "Patient", patient.getId(), patient.getId(), null);
        return patient.getId();
    }

    @Transactional
    public void update(CurrentStaff staff, UUID patientId, long expectedVersion, PatientDetails details) {
        Patient patient = load(staff, patientId, "PATIENT_UPDATE");
        if (patient.getVersion() != expectedVersion) {
            throw new ConflictException("patient");
        }
        requireUniqueCode(staff, details.code(), patient);
        patient.apply(details, clock.instant());
        patients.saveAndFlush(patient);
        audit.record(staff, "PATIENT_UPDATE", "Patient", patientId, patientId, null);
    }

    /** The patient page: audited as a read of the patient's record. */
    @Transactional
    public PatientPage page(CurrentStaff staff, UUID patientId) {
        Patient patient = load(staff, patientId, "PATIENT_READ");
        audit.record(staff, "PATIENT_READ", "Patient", patientId, patientId, null);
        List<EpisodeSummary> eps = episodes.findByClinicIdAndPatientIdOrderByCreatedAtDesc(staff.clinicId(), patientId)
                .stream().map(e -> summarise(staff.clinicId(), e)).toList();
        List<ConsentView> cons = consents.findByClinicIdAndPatientIdOrderByConsentedOnDesc(staff.clinicId(), patientId)
                .stream().map(ShareConsent::view).toList();
        List<ReferralView> refs = new ArrayList<>();
        for (EpisodeSummary e : eps) {
            referrals.findByClinicIdAndEpisodeIdOrderByRecordedAtDesc(staff.clinicId(), e.id()).forEach(r ->
                    refs.add(new ReferralView(r.getEpisodeId(), r.getReferredTo(), r.getNote(), r.getRecordedAt())));
        }
        return new PatientPage(patient.summary(), eps, cons, refs);
    }

    /**
     * Refuses (404, audited) unless the patient belongs to the caller's clinic; for forms that show the patient.
     * Showing the patient's code and name is a read of the record, so it is audited as one.
     */
    @Transactional
    public PatientSummary requireOwn(CurrentStaff staff, UUID patientId, String action) {
        PatientSummary summary = load(staff, patientId, action).summary();
        audit.record(staff, "PATIENT_READ", "Patient", patientId, patientId, "for=" + action);
        return summary;
    }

    /** A patient of the caller's clinic for another feature; does not audit (the caller audits its own read). */
    @Transactional(readOnly = true)
    public Optional<PatientSummary> find(CurrentStaff staff, UUID patientId) {
        return patients.findByIdAndClinicId(patientId, staff.clinicId()).map(Patient::summary);
    }

    /** An episode of the caller's clinic, with its red-flag state, for another feature. */
    @Transactional(readOnly = true)
    public Optional<EpisodeSummary> findEpisode(CurrentStaff staff, UUID episodeId) {
        return episodes.findByIdAndClinicId(episodeId, staff.clinicId()).map(e -> summarise(staff.clinicId(), e));
    }

    /** Episodes of a patient, newest first, for another feature. */
    @Transactional(readOnly = true)
    public List<EpisodeSummary> episodesOf(CurrentStaff staff, UUID patientId) {
        return episodes.findByClinicIdAndPatientIdOrderByCreatedAtDesc(staff.clinicId(), patientId).stream()
                .map(e -> summarise(staff.clinicId(), e)).toList();
    }

    /** Active consents of a patient, for the plan feature's sharing check. */
    @Transactional(readOnly = true)
    public List<ConsentView> activeConsents(CurrentStaff staff, UUID patientId) {
        return consents.findByClinicIdAndPatientIdOrderByConsentedOnDesc(staff.clinicId(), patientId).stream()
                .filter(ShareConsent::isActive).map(ShareConsent::view).toList();
    }

    @Transactional
    public UUID openEpisode(CurrentStaff staff, UUID patientId, EpisodeDetails details) {
        load(staff, patientId, "EPISODE_CREATE");
        Instant now = clock.instant();
        Episode episode = new Episode(UUID.randomUUID(), staff.clinicId(), patientId, details.region(),
                details.shoulderSide(), details.injuryDate(), details.surgery(), details.goal(), now, staff.staffId());
        episodes.save(episode);
        redFlagChecks.save(new RedFlagCheck(UUID.randomUUID(), staff.clinicId(), episode.getId(), RedFlagContext.INTAKE,
                details.redFlags(), now, staff.staffId()));
        audit.record(staff, "EPISODE_CREATE", "Episode", episode.getId(), patientId,
                "redFlags=" + details.redFlags().size());
        return episode.getId();
    }

    /** Records a red-flag checklist for an episode (at a screening or on re-check). */
    @Transactional
    public void recordRedFlags(CurrentStaff staff, UUID episodeId, RedFlagContext context, Set<RedFlag> flags) {
        Episode episode = loadEpisode(staff, episodeId, "RED_FLAGS_RECORD");
        redFlagChecks.save(new RedFlagCheck(UUID.randomUUID(), staff.clinicId(), episodeId, context, flags,
                clock.instant(), staff.staffId()));
        audit.record(staff, "RED_FLAGS_RECORD", "Episode", episodeId, episode.getPatientId(), "redFlags=" + flags.size());
    }

    /** Records the referral after a red flag; releases the hold of the checklists recorded before it. */
    @Transactional
    public void recordReferral(CurrentStaff staff, UUID episodeId, String referredTo, String note) {
        Episode episode = loadEpisode(staff, episodeId, "REFERRAL_RECORD");
        if (summarise(staff.clinicId(), episode).openRedFlags().isEmpty()) {
            throw new InvalidStateException("referral.error.noOpenFlag");
        }
        referrals.save(new Referral(UUID.randomUUID(), staff.clinicId(), episodeId, referredTo, note, clock.instant(),
                staff.staffId()));
        audit.record(staff, "REFERRAL_RECORD", "Episode", episodeId, episode.getPatientId(), null);
    }

    @Transactional
    public UUID recordConsent(CurrentStaff staff, UUID patientId, String trainerName, String trainerEmail,
                              LocalDate consentedOn) {
        load(staff, patientId, "CONSENT_RECORD");
        ShareConsent consent = new ShareConsent(UUID.randomUUID(), staff.clinicId(), patientId, trainerName,
                trainerEmail, consentedOn, staff.staffId(), clock.instant());
        consents.save(consent);
        audit.record(staff, "CONSENT_RECORD", "ShareConsent", consent.getId(), patientId, null);
        return consent.getId();
    }

    @Transactional
    public void withdrawConsent(CurrentStaff staff, UUID patientId, UUID consentId, LocalDate on) {
        ShareConsent consent = consents.findByIdAndClinicId(consentId, staff.clinicId())
                .filter(c -> c.getPatientId().equals(patientId))
                .orElseThrow(() -> denied(staff, "CONSENT_WITHDRAW", "ShareConsent", consentId));
        consent.withdraw(on);
        audit.record(staff, "CONSENT_WITHDRAW", "ShareConsent", consentId, patientId, null);
        events.publishEvent(new ConsentWithdrawn(staff, patientId, consentId));
    }

    private EpisodeSummary summarise(UUID clinicId, Episode e) {
        List<RedFlag> open = redFlagChecks.findFirstByClinicIdAndEpisodeIdOrderByCheckedAtDesc(clinicId, e.getId())
                .map(check -> {
                    Optional<Referral> referral = referrals.findFirstByClinicIdAndEpisodeIdOrderByRecordedAtDesc(
                            clinicId, e.getId());
                    boolean referredSince = referral.isPresent()
                            && !referral.get().getRecordedAt().isBefore(check.getCheckedAt());
                    return referredSince ? List.<RedFlag>of() : check.flags();
                })
                .orElse(List.of());
        return new EpisodeSummary(e.getId(), e.getPatientId(), e.getRegion(), e.getShoulderSide(), e.getInjuryDate(),
                e.isSurgery(), e.getGoal(), e.getStatus(), open, !open.isEmpty());
    }

    private void requireUniqueCode(CurrentStaff staff, String code, Patient self) {
        boolean changed = self == null || !self.getCode().equalsIgnoreCase(code.trim());
        if (changed && patients.existsByClinicIdAndCodeIgnoreCase(staff.clinicId(), code.trim())) {
            throw new InvalidStateException("patient.error.codeTaken");
        }
    }

    private Patient load(CurrentStaff staff, UUID patientId, String action) {
        return patients.findByIdAndClinicId(patientId, staff.clinicId())
                .orElseThrow(() -> denied(staff, action, "Patient", patientId));
    }

    private Episode loadEpisode(CurrentStaff staff, UUID episodeId, String action) {
        return episodes.findByIdAndClinicId(episodeId, staff.clinicId())
                .orElseThrow(() -> denied(staff, action, "Episode", episodeId));
    }

    private NotFoundException denied(CurrentStaff staff, String action, String type, UUID id) {
        audit.recordDenied(staff, action, type, id, "not in caller's clinic or missing");
        return new NotFoundException(type);
    }
}
