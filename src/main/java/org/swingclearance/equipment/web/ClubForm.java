package org.swingclearance.equipment.web;

import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;
import java.math.BigDecimal;
import org.springframework.validation.Errors;
import org.swingclearance.equipment.ClubDetails;
import org.swingclearance.equipment.ClubPage;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.InertiaMethod;
import org.swingclearance.equipment.PendulumReading;

/**
 * Adding or editing a club. Mass in kg or lb, lengths in cm or in (the user's choice, converted exactly to SI);
 * the pendulum fields are needed only for the pendulum method, the head centre only for the head model. Whether
 * the measurements fit together is the service's check, which names the measurement to repeat.
 */
public class ClubForm {

    @NotBlank
    @Size(max = 120)
    private String name;
    @NotNull
    private MassUnit massUnit = MassUnit.KG;
    @NotNull
    private LengthUnit lengthUnit = LengthUnit.CM;
    @NotNull
    @Positive
    private BigDecimal mass;
    @NotNull
    @Positive
    private BigDecimal length;
    @NotNull
    @Positive
    private BigDecimal balancePoint;
    @NotNull
    @DecimalMin("0")
    private BigDecimal handleLength;
    @Positive
    private BigDecimal headCentre;
    @NotNull
    private InertiaMethod inertiaMethod = InertiaMethod.PENDULUM;
    @Positive
    private BigDecimal pendulumPivot;
    @Min(1)
    @Max(1000)
    private Integer pendulumSwings;
    @Positive
    private BigDecimal pendulumSeconds;
    private long version;

    /** The edit form of a stored club, in kg and cm. */
    static ClubForm from(ClubPage page) {
        ClubView c = page.club();
        ClubForm f = new ClubForm();
        f.name = c.name();
        f.mass = plain(BigDecimal.valueOf(c.massKg()));
        f.length = centimetres(c.lengthM());
        f.balancePoint = centimetres(c.balancePointM());
        f.handleLength = centimetres(c.handleLengthM());
        f.headCentre = c.headCentreM() == null ? null : centimetres(c.headCentreM());
        f.inertiaMethod = page.method();
        if (page.pendulum() != null) {
            f.pendulumPivot = centimetres(page.pendulum().pivotFromBalancePointM());
            f.pendulumSwings = page.pendulum().swings();
            f.pendulumSeconds = plain(BigDecimal.valueOf(page.pendulum().seconds()));
        }
        f.version = page.version();
        return f;
    }

    /** The fields the chosen inertia method needs, marked "Required." when empty. */
    void checkMethodFields(Errors errors) {
        if (inertiaMethod == InertiaMethod.PENDULUM) {
            requirePresent(errors, "pendulumPivot", pendulumPivot);
            requirePresent(errors, "pendulumSwings", pendulumSwings);
            requirePresent(errors, "pendulumSeconds", pendulumSeconds);
        } else if (inertiaMethod == InertiaMethod.HEAD_MODEL) {
            requirePresent(errors, "headCentre", headCentre);
        }
    }

    ClubDetails toDetails() {
        PendulumReading pendulum = inertiaMethod == InertiaMethod.PENDULUM
                ? new PendulumReading(lengthUnit.toMetres(pendulumPivot), pendulumSwings, pendulumSeconds.doubleValue())
                : null;
        return new ClubDetails(name, massUnit.toKg(mass), lengthUnit.toMetres(length),
                lengthUnit.toMetres(balancePoint), lengthUnit.toMetres(handleLength),
                lengthUnit.toMetresOrNull(headCentre), inertiaMethod, pendulum);
    }

    private static void requirePresent(Errors errors, String field, Object value) {
        if (value == null && !errors.hasFieldErrors(field)) {
            errors.rejectValue(field, "NotNull");
        }
    }

    private static BigDecimal centimetres(double metres) {
        return plain(BigDecimal.valueOf(metres).movePointRight(2));
    }

    private static BigDecimal plain(BigDecimal value) {
        BigDecimal stripped = value.stripTrailingZeros();
        return stripped.scale() < 0 ? stripped.setScale(0) : stripped;
    }

    public String getName() { return name; }
    public void setName(String name) { this.name = name; }
    public MassUnit getMassUnit() { return massUnit; }
    public void setMassUnit(MassUnit massUnit) { this.massUnit = massUnit; }
    public LengthUnit getLengthUnit() { return lengthUnit; }
    public void setLengthUnit(LengthUnit lengthUnit) { this.lengthUnit = lengthUnit; }
    public BigDecimal getMass() { return mass; }
    public void setMass(BigDecimal mass) { this.mass = mass; }
    public BigDecimal getLength() { return length; }
    public void setLength(BigDecimal length) { this.length = length; }
    public BigDecimal getBalancePoint() { return balancePoint; }
    public void setBalancePoint(BigDecimal balancePoint) { this.balancePoint = balancePoint; }
    public BigDecimal getHandleLength() { return handleLength; }
    public void setHandleLength(BigDecimal handleLength) { this.handleLength = handleLength; }
    public BigDecimal getHeadCentre() { return headCentre; }
    public void setHeadCentre(BigDecimal headCentre) { this.headCentre = headCentre; }
    public InertiaMethod getInertiaMethod() { return inertiaMethod; }
    public void setInertiaMethod(InertiaMethod inertiaMethod) { this.inertiaMethod = inertiaMethod; }
    public BigDecimal getPendulumPivot() { return pendulumPivot; }
    public void setPendulumPivot(BigDecimal pendulumPivot) { this.pendulumPivot = pendulumPivot; }
    public Integer getPendulumSwings() { return pendulumSwings; }
    public void setPendulumSwings(Integer pendulumSwings) { this.pendulumSwings = pendulumSwings; }
    public BigDecimal getPendulumSeconds() { return pendulumSeconds; }
    public void setPendulumSeconds(BigDecimal pendulumSeconds) { this.pendulumSeconds = pendulumSeconds; }
    public long getVersion() { return version; }
    public void setVersion(long version) { this.version = version; }
}
