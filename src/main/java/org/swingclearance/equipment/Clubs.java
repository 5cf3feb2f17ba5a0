package org.swingclearance.equipment;

import java.time.Clock;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * The club inventory's application service (Contract E). Every method is scoped to the caller's clinic; another
 * clinic's club is "not found" and the attempt is audited. Clubs are retired, never deleted. Role checks live on
 * the controllers; reads for other features ({@link #active}, {@link #find}) do not audit (clubs are equipment,
 * not patient data).
 */
@Service
public class Clubs {

    private final ClubRepository clubs;
    private final AuditLog audit;
    private final Clock clock;

    Clubs(ClubRepository clubs, AuditLog audit, Clock clock) {
        this.clubs = clubs;
        this.audit = audit;
        this.clock = clock;
    }

    /** Clubs in service, lightest first: the ones new plans and envelopes may use. */
    @Transactional(readOnly = true)
    public List<ClubView> active(CurrentStaff staff) {
        return clubs.findByClinicIdAndRetiredAtIsNullOrderByMassKgAscNameAsc(staff.clinicId()).stream()
                .map(Club::view).toList();
    }

    /** Retired clubs, most recently retired first (kept for the history of plans that used them). */
    @Transactional(readOnly = true)
    public List<ClubView> retired(CurrentStaff staff) {
        return clubs.findByClinicIdAndRetiredAtIsNotNullOrderByRetiredAtDesc(staff.clinicId()).stream()
                .map(Club::view).toList();
    }

    /** A club of the caller's clinic, retired or not; empty for another clinic's club. */
    @Transactional(readOnly = true)
    public Optional<ClubView> find(CurrentStaff staff, UUID clubId) {
        return clubs.findByIdAndClinicId(clubId, staff.clinicId()).map(Club::view);
    }

    /** The club's page: its measurements, how the inertia was found and its version for editing. */
    @Transactional(readOnly = true)
    public ClubPage page(CurrentStaff staff, UUID clubId) {
        Club club = load(staff, clubId, "CLUB_READ");
        ClubView v = club.view();
        InertiaEstimate inertia = ClubMeasurements.check(new ClubDetails(v.name(), v.massKg(), v.lengthM(),
                v.balancePointM(), v.handleLengthM(), v.headCentreM(), club.method(), club.pendulum()));
        return new ClubPage(v, club.method(), club.pendulum(), inertia, club.getVersion(), club.getUpdatedAt(),
                club.getRetiredAt());
    }

    /** Works out the inertia the measurements give, without saving: the pendulum guide's "compute" step. */
    public InertiaEstimate preview(ClubDetails details) {
        return ClubMeasurements.check(details);
    }

    @Transactional
    public UUID create(CurrentStaff staff, ClubDetails details) {
        InertiaEstimate inertia = ClubMeasurements.check(details);
        requireUniqueName(staff, details.name(), null);
        Club club = new Club(UUID.randomUUID(), staff.clinicId(), clock.instant(), staff.staffId());
        club.apply(details, inertia, clock.instant(), staff.staffId());
        clubs.save(club);
        audit.record(staff, "CLUB_CREATE", "Club", club.getId(), null, "inertiaSource=" + inertia.source());
        return club.getId();
    }

    @Transactional
    public void update(CurrentStaff staff, UUID clubId, long expectedVersion, ClubDetails details) {
        Club club = load(staff, clubId, "CLUB_UPDATE");
        if (club.getVersion() != expectedVersion) {
            throw new ConflictException("club");
        }
        if (club.isRetired()) {
            throw new InvalidStateException("club.error.retiredReadOnly");
        }
        InertiaEstimate inertia = ClubMeasurements.check(details);
        requireUniqueName(staff, details.name(), clubId);
        club.apply(details, inertia, clock.instant(), staff.staffId());
        clubs.saveAndFlush(club);
        audit.record(staff, "CLUB_UPDATE", "Club", clubId, null, "inertiaSource=" + inertia.source());
    }

    /** Takes a club out of service: hidden from new plans, kept for the history of plans that used it. */
    @Transactional
    public void retire(CurrentStaff staff, UUID clubId, long expectedVersion) {
        Club club = load(staff, clubId, "CLUB_RETIRE");
        if (club.getVersion() != expectedVersion) {
            throw new ConflictException("club");
        }
        if (club.isRetired()) {
            return;
        }
        club.retire(clock.instant(), staff.staffId());
        clubs.saveAndFlush(club);
        audit.record(staff, "CLUB_RETIRE", "Club", clubId, null, null);
    }

    /** Refuses (404, audited) unless the club belongs to the caller's clinic; for forms that fail validation. */
    @Transactional(readOnly = true)
    public void requireOwn(CurrentStaff staff, UUID clubId, String action) {
        load(staff, clubId, action);
    }

    private void requireUniqueName(CurrentStaff staff, String name, UUID self) {
        String trimmed = name.trim();
        boolean taken = self == null
                ? clubs.existsByClinicIdAndNameIgnoreCaseAndRetiredAtIsNull(staff.clinicId(), trimmed)
                : clubs.existsByClinicIdAndNameIgnoreCaseAndRetiredAtIsNullAndIdNot(staff.clinicId(), trimmed, self);
        if (taken) {
            throw new MeasurementRejected("name", "club.error.nameTaken");
        }
    }

    private Club load(CurrentStaff staff, UUID clubId, String action) {
        return clubs.findByIdAndClinicId(clubId, staff.clinicId()).orElseThrow(() -> {
            audit.recordDenied(staff, action, "Club", clubId, "not in caller's clinic or missing");
            return new NotFoundException("Club");
        });
    }
}
