package org.swingclearance.equipment;

import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.UUID;

/**
 * A swing pattern: built in (no clinic, named by a message key, fixed) or a clinic's own (named in plain text,
 * retired rather than deleted). Angles in degrees from the hanging arm, forward/up positive.
 */
@Entity
@Table(name = "swing_pattern")
public class SwingPattern {

    @Id
    private UUID id;
    private UUID clinicId;
    private String nameKey;
    private String name;
    private double centreDeg;
    private double halfArcDeg;
    private short hands;
    private double reach;
    private String kind;
    private boolean hipDriven;
    private String minimumLumbopelvicBand;
    private int sortOrder;
    private Instant retiredAt;
    private Instant createdAt;
    private UUID createdBy;
    @Version
    private long version;

    protected SwingPattern() {
    }

    SwingPattern(UUID id, UUID clinicId, SwingPatternDetails d, Instant now, UUID by) {
        this.id = id;
        this.clinicId = clinicId;
        this.name = d.name().trim();
        this.centreDeg = d.centreDeg();
        this.halfArcDeg = d.halfArcDeg();
        this.hands = (short) d.hands();
        this.reach = d.reach();
        this.kind = d.kind();
        this.hipDriven = d.hipDriven();
        this.minimumLumbopelvicBand = d.minimumLumbopelvicBand();
        this.sortOrder = 1000;
        this.createdAt = now;
        this.createdBy = by;
    }

    void retire(Instant now) {
        this.retiredAt = now;
    }

    boolean isBuiltIn() {
        return clinicId == null;
    }

    boolean isRetired() {
        return retiredAt != null;
    }

    /** The view with its display name: the built-in's message resolved by the caller, else the clinic's name. */
    SwingPatternView view(String displayName) {
        return new SwingPatternView(id, displayName, centreDeg, halfArcDeg, hands, reach, kind, hipDriven,
                minimumLumbopelvicBand, clinicId == null);
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public String getNameKey() { return nameKey; }
    public String getName() { return name; }
    public long getVersion() { return version; }
    public int getSortOrder() { return sortOrder; }
}
