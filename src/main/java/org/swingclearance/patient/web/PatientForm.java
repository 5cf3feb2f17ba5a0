package org.swingclearance.patient.web;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Past;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import java.time.LocalDate;
import org.springframework.format.annotation.DateTimeFormat;
import org.swingclearance.patient.Hand;
import org.swingclearance.patient.PatientDetails;
import org.swingclearance.patient.PatientSummary;
import org.swingclearance.patient.Sex;

/**
 * Intake and edit form of a patient. Stature is entered in centimetres and mass in kilograms (the forms'
 * units); the service stores metres. Ranges: stature 0.5–2.5 m, mass 10–300 kg (issue 2).
 */
public class PatientForm {

    @NotBlank
    @Size(max = 40)
    @Pattern(regexp = "[A-Za-z0-9._-]+", message = "{patient.code.pattern}")
    private String code;
    @Size(max = 200)
    private String fullName;
    @NotNull
    @Past
    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate dateOfBirth;
    @NotNull
    private Sex sex;
    @NotNull
    @DecimalMin("50")
    @DecimalMax("250")
    private Double statureCm;
    @NotNull
    @DecimalMin("10")
    @DecimalMax("300")
    private Double bodyMassKg;
    @NotNull
    private Hand dominantHand;
    @Size(max = 400)
    private String contact;
    private long version;

    static PatientForm from(PatientSummary p) {
        PatientForm f = new PatientForm();
        f.code = p.code();
        f.fullName = p.fullName();
        f.dateOfBirth = p.dateOfBirth();
        f.sex = p.sex();
        f.statureCm = Math.round(p.statureM() * 1000) / 10.0;
        f.bodyMassKg = p.bodyMassKg();
        f.dominantHand = p.dominantHand();
        f.contact = p.contact();
        f.version = p.version();
        return f;
    }

    PatientDetails toDetails() {
        return new PatientDetails(code, fullName, dateOfBirth, sex, statureCm / 100.0, bodyMassKg, dominantHand,
                contact);
    }

    public String getCode() { return code; }
    public void setCode(String code) { this.code = code; }
    public String getFullName() { return fullName; }
    public void setFullName(String fullName) { this.fullName = fullName; }
    public LocalDate getDateOfBirth() { return dateOfBirth; }
    public void setDateOfBirth(LocalDate dateOfBirth) { this.dateOfBirth = dateOfBirth; }
    public Sex getSex() { return sex; }
    public void setSex(Sex sex) { this.sex = sex; }
    public Double getStatureCm() { return statureCm; }
    public void setStatureCm(Double statureCm) { this.statureCm = statureCm; }
    public Double getBodyMassKg() { return bodyMassKg; }
    public void setBodyMassKg(Double bodyMassKg) { this.bodyMassKg = bodyMassKg; }
    public Hand getDominantHand() { return dominantHand; }
    public void setDominantHand(Hand dominantHand) { this.dominantHand = dominantHand; }
    public String getContact() { return contact; }
    public void setContact(String contact) { this.contact = contact; }
    public long getVersion() { return version; }
    public void setVersion(long version) { this.version = version; }
}
