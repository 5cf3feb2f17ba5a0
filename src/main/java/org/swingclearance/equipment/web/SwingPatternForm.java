package org.swingclearance.equipment.web;

import jakarta.validation.constraints.AssertTrue;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import org.swingclearance.equipment.SwingPatternDetails;

/**
 * A clinic's own swing pattern: a plain name, centre angle and half-arc in degrees from the hanging arm, hands,
 * reach factor (1 = straight arm), rhythmic or single arc, hip-driven, and the lumbopelvic band it needs.
 */
public class SwingPatternForm {

    @NotBlank
    @Size(max = 120)
    private String name;
    @NotNull
    @DecimalMin("-180")
    @DecimalMax("180")
    private Double centreDeg;
    @NotNull
    @DecimalMin(value = "0", inclusive = false)
    @DecimalMax("180")
    private Double halfArcDeg;
    @NotNull
    @Min(1)
    @Max(2)
    private Integer hands = 1;
    @NotNull
    @DecimalMin("0.3")
    @DecimalMax("1")
    private Double reach = 1.0;
    @NotBlank
    private String kind = "RHYTHMIC";
    private boolean hipDriven;
    private String minimumLumbopelvicBand;

    /** A hip-driven pattern must say which lumbopelvic band it needs. */
    @AssertTrue(message = "{pattern.error.hipDrivenNeedsBand}")
    public boolean isBandGivenForHipDriven() {
        return !hipDriven || (minimumLumbopelvicBand != null && !minimumLumbopelvicBand.isBlank());
    }

    SwingPatternDetails toDetails() {
        String band = minimumLumbopelvicBand == null || minimumLumbopelvicBand.isBlank() ? null : minimumLumbopelvicBand;
        return new SwingPatternDetails(name, centreDeg, halfArcDeg, hands, reach, kind, hipDriven, band);
    }

    public String getName() { return name; }
    public void setName(String name) { this.name = name; }
    public Double getCentreDeg() { return centreDeg; }
    public void setCentreDeg(Double centreDeg) { this.centreDeg = centreDeg; }
    public Double getHalfArcDeg() { return halfArcDeg; }
    public void setHalfArcDeg(Double halfArcDeg) { this.halfArcDeg = halfArcDeg; }
    public Integer getHands() { return hands; }
    public void setHands(Integer hands) { this.hands = hands; }
    public Double getReach() { return reach; }
    public void setReach(Double reach) { this.reach = reach; }
    public String getKind() { return kind; }
    public void setKind(String kind) { this.kind = kind; }
    public boolean isHipDriven() { return hipDriven; }
    public void setHipDriven(boolean hipDriven) { this.hipDriven = hipDriven; }
    public String getMinimumLumbopelvicBand() { return minimumLumbopelvicBand; }
    public void setMinimumLumbopelvicBand(String minimumLumbopelvicBand) { this.minimumLumbopelvicBand = minimumLumbopelvicBand; }
}
