package org.swingclearance.patient;

import java.time.LocalDate;

/** What intake records about a patient (SI units: stature in metres, mass in kilograms). */
public record PatientDetails(String code, String fullName, LocalDate dateOfBirth, Sex sex, double statureM,
                             double bodyMassKg, Hand dominantHand, String contact) {
}
