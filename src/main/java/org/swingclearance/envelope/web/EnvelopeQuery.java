package org.swingclearance.envelope.web;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import java.util.UUID;

/**
 * What the envelope page was asked for: the patient's usual cycle time for the table (s), and the configuration
 * the charts and the what-if panel show (club, pattern, grip mark in cm from the knob, cycle time in s).
 */
public class EnvelopeQuery {

    @DecimalMin("0.6")
    @DecimalMax("8")
    private Double cycleTime;
    private UUID club;
    private UUID pattern;
    @DecimalMin("0")
    @DecimalMax("200")
    private Double grip;
    @DecimalMin("0.6")
    @DecimalMax("8")
    private Double tempo;

    public Double getCycleTime() { return cycleTime; }
    public void setCycleTime(Double cycleTime) { this.cycleTime = cycleTime; }
    public UUID getClub() { return club; }
    public void setClub(UUID club) { this.club = club; }
    public UUID getPattern() { return pattern; }
    public void setPattern(UUID pattern) { this.pattern = pattern; }
    public Double getGrip() { return grip; }
    public void setGrip(Double grip) { this.grip = grip; }
    public Double getTempo() { return tempo; }
    public void setTempo(Double tempo) { this.tempo = tempo; }
}
