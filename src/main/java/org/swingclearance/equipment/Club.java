package org.swingclearance.equipment;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.UUID;

/** A club of a clinic's inventory with its inertia and where the inertia came from; retired, never deleted. */
@Entity
@Table(name = "club")
public class Club {

    @Id
    private UUID id;
    private UUID clinicId;
    private String name;
    private double massKg;
    @Column(name = "length_m")
    private double lengthM;
    @Column(name = "balance_point_m")
    private double balancePointM;
    @Column(name = "handle_length_m")
    private double handleLengthM;
    @Column(name = "head_centre_m")
    private Double headCentreM;
    private String inertiaSource;
    @Column(name = "inertia_cm_kg_m2")
    private double inertiaCmKgM2;
    @Column(name = "pendulum_pivot_m")
    private Double pendulumPivotM;
    private Integer pendulumSwings;
    private Double pendulumSeconds;
    private Instant retiredAt;
    private UUID retiredBy;
    private Instant createdAt;
    private UUID createdBy;
    private Instant updatedAt;
    private UUID updatedBy;
    @Version
    private long version;

    protected Club() {
    }

    Club(UUID id, UUID clinicId, Instant now, UUID by) {
        this.id = id;
        this.clinicId = clinicId;
        this.createdAt = now;
        this.createdBy = by;
    }

    /** Takes checked measurements and the inertia worked out from them. */
    void apply(ClubDetails d, InertiaEstimate inertia, Instant now, UUID by) {
        this.name = d.name().trim();
        this.massKg = d.massKg();
        this.lengthM = d.lengthM();
        this.balancePointM = d.balancePointM();
        this.handleLengthM = d.handleLengthM();
        this.headCentreM = d.headCentreM();
        this.inertiaSource = inertia.source();
        this.inertiaCmKgM2 = inertia.aboutBalancePointKgM2();
        PendulumReading p = d.method() == InertiaMethod.PENDULUM ? d.pendulum() : null;
        this.pendulumPivotM = p == null ? null : p.pivotFromBalancePointM();
        this.pendulumSwings = p == null ? null : p.swings();
        this.pendulumSeconds = p == null ? null : p.seconds();
        this.updatedAt = now;
        this.updatedBy = by;
    }

    void retire(Instant now, UUID by) {
        this.retiredAt = now;
        this.retiredBy = by;
        this.updatedAt = now;
        this.updatedBy = by;
    }

    boolean isRetired() {
        return retiredAt != null;
    }

    ClubView view() {
        return new ClubView(id, name, massKg, lengthM, balancePointM, handleLengthM, headCentreM, inertiaCmKgM2,
                inertiaSource, retiredAt != null);
    }

    PendulumReading pendulum() {
        return pendulumSwings == null ? null : new PendulumReading(pendulumPivotM, pendulumSwings, pendulumSeconds);
    }

    /** How the inertia was found, for editing: a stored pendulum reading, else the head model, else the bound. */
    InertiaMethod method() {
        return switch (inertiaSource) {
            case "MEASURED" -> InertiaMethod.PENDULUM;
            case "MODELLED" -> InertiaMethod.HEAD_MODEL;
            default -> InertiaMethod.BOUND;
        };
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public long getVersion() { return version; }
    public Instant getUpdatedAt() { return updatedAt; }
    public Instant getRetiredAt() { return retiredAt; }
}
