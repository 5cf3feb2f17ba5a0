package org.swingclearance.patient.web;

import jakarta.validation.constraints.Email;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PastOrPresent;
import jakarta.validation.constraints.Size;
import java.time.LocalDate;
import org.springframework.format.annotation.DateTimeFormat;

/** Recording the patient's consent to share their plan with a named trainer. */
public class ConsentForm {

    @NotBlank
    @Size(max = 200)
    private String trainerName;
    @Email
    @Size(max = 254)
    private String trainerEmail;
    @NotNull
    @PastOrPresent
    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate consentedOn;

    public String getTrainerName() { return trainerName; }
    public void setTrainerName(String trainerName) { this.trainerName = trainerName; }
    public String getTrainerEmail() { return trainerEmail; }
    public void setTrainerEmail(String trainerEmail) { this.trainerEmail = trainerEmail; }
    public LocalDate getConsentedOn() { return consentedOn; }
    public void setConsentedOn(LocalDate consentedOn) { this.consentedOn = consentedOn; }
}
