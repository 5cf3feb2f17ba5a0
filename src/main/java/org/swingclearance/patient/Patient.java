package org.swingclearance.patient;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.time.LocalDate;
import java.util.UUID;

/** A person a clinic screens; identified in the clinic by a clinic-assigned code, the name is optional. */
@Entity
@Table(name = "patient")
public class Patient {

    @Id
    private UUID id;
    private UUID clinicId;
    private String code;
    private String fullName;
    private LocalDate dateOfBirth;
    @Enumerated(EnumType.STRING)
    private Sex sex;
    @Column(name = "stature_m")
    private double statureM;
    @Column(name = "body_mass_kg")
    private double bodyMassKg;
    @Enumerated(EnumType.STRING)
    private Hand dominantHand;
    private String contact;
    private Instant createdAt;
    private Instant updatedAt;
    @Version
    private long version;

    protected Patient() {
    }

    public Patient(UUID id, UUID clinicId, PatientDetails details, Instant now) {
        this.id = id;
        this.clinicId = clinicId;
        this.createdAt = now;
        apply(details, now);
    }

    public void apply(PatientDetails d, Instant now) {
        this.code = d.code().trim();
        this.fullName = d.fullName() == null || d.fullName().isBlank() ? null : d.fullName().trim();
        this.dateOfBirth = d.dateOfBirth();
        this.sex = d.sex();
        this.statureM = d.statureM();
        this.bodyMassKg = d.bodyMassKg();
        this.dominantHand = d.dominantHand();
        this.contact = d.contact() == null || d.contact().isBlank() ? null : d.contact().trim();
        this.updatedAt = now;
    }

    public PatientSummary summary() {
        return new PatientSummary(id, code, fullName, dateOfBirth, sex, statureM, bodyMassKg, dominantHand, contact,
                version);
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public String getCode() { return code; }
    public long getVersion() { return version; }
}
