package org.swingclearance.identity;

import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.UUID;

/** A person who signs in: belongs to one clinic and holds one role. */
@Entity
@Table(name = "staff_account")
public class StaffAccount {

    @Id
    private UUID id;
    private UUID clinicId;
    private String email;
    private String displayName;
    @Enumerated(EnumType.STRING)
    private StaffRole role;
    private String passwordHash;
    private boolean enabled;
    @Enumerated(EnumType.STRING)
    private UnitSystem unitSystem;
    private Instant createdAt;
    @Version
    private long version;

    protected StaffAccount() {
    }

    public StaffAccount(UUID id, UUID clinicId, String email, String displayName, StaffRole role,
                        String passwordHash, Instant createdAt) {
        this.id = id;
        this.clinicId = clinicId;
        this.email = email.trim().toLowerCase(java.util.Locale.ROOT);
        this.displayName = displayName;
        this.role = role;
        this.passwordHash = passwordHash;
        this.enabled = true;
        this.unitSystem = UnitSystem.METRIC;
        this.createdAt = createdAt;
    }

    public void update(String displayName, StaffRole role, boolean enabled) {
        this.displayName = displayName;
        this.role = role;
        this.enabled = enabled;
    }

    public void changePasswordHash(String passwordHash) {
        this.passwordHash = passwordHash;
    }

    public void setUnitSystem(UnitSystem unitSystem) {
        this.unitSystem = unitSystem;
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public String getEmail() { return email; }
    public String getDisplayName() { return displayName; }
    public StaffRole getRole() { return role; }
    public String getPasswordHash() { return passwordHash; }
    public boolean isEnabled() { return enabled; }
    public UnitSystem getUnitSystem() { return unitSystem; }
    public Instant getCreatedAt() { return createdAt; }
    public long getVersion() { return version; }
}
