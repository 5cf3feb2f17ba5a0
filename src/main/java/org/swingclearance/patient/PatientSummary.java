package org.swingclearance.patient;

import java.time.LocalDate;
import java.time.Period;
import java.util.UUID;

/** A patient as other features and pages see it; never an entity. */
public record PatientSummary(UUID id, String code, String fullName, LocalDate dateOfBirth, Sex sex, double statureM,
                             double bodyMassKg, Hand dominantHand, String contact, long version) {

    /** The name if recorded, else the clinic code (clinics that work with codes only). */
    public String label() {
        return fullName == null ? code : fullName + " (" + code + ")";
    }

    public int ageOn(LocalDate day) {
        return Period.between(dateOfBirth, day).getYears();
    }
}
