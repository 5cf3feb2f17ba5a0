package org.swingclearance.patient.web;

import jakarta.validation.constraints.AssertTrue;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PastOrPresent;
import jakarta.validation.constraints.Size;
import java.time.LocalDate;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.Set;
import org.springframework.format.annotation.DateTimeFormat;
import org.swingclearance.patient.EpisodeDetails;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.patient.Region;
import org.swingclearance.patient.Side;

/** Opening an episode: region, side, injury or surgery date, goal, and the intake red-flag checklist. */
public class EpisodeForm {

    @NotNull
    private Region region;
    private Side shoulderSide;
    @NotNull
    @PastOrPresent
    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate injuryDate;
    private boolean surgery;
    @NotBlank
    @Size(max = 1000)
    private String goal;
    private Set<RedFlag> redFlags = new HashSet<>();

    /** A shoulder episode must say which shoulder. */
    @AssertTrue(message = "{episode.shoulderSide.required}")
    public boolean isSideGivenForShoulder() {
        return region == null || !region.includesShoulder() || shoulderSide != null;
    }

    EpisodeDetails toDetails() {
        Set<RedFlag> flags = redFlags == null || redFlags.isEmpty() ? EnumSet.noneOf(RedFlag.class) : EnumSet.copyOf(redFlags);
        return new EpisodeDetails(region, shoulderSide, injuryDate, surgery, goal, flags);
    }

    public Region getRegion() { return region; }
    public void setRegion(Region region) { this.region = region; }
    public Side getShoulderSide() { return shoulderSide; }
    public void setShoulderSide(Side shoulderSide) { this.shoulderSide = shoulderSide; }
    public LocalDate getInjuryDate() { return injuryDate; }
    public void setInjuryDate(LocalDate injuryDate) { this.injuryDate = injuryDate; }
    public boolean isSurgery() { return surgery; }
    public void setSurgery(boolean surgery) { this.surgery = surgery; }
    public String getGoal() { return goal; }
    public void setGoal(String goal) { this.goal = goal; }
    public Set<RedFlag> getRedFlags() { return redFlags; }
    public void setRedFlags(Set<RedFlag> redFlags) { this.redFlags = redFlags; }
}
