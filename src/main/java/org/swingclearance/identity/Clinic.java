package org.swingclearance.identity;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.UUID;

/** A tenant: its staff, patients, clubs, rules and audit chain are separate from every other clinic. */
@Entity
@Table(name = "clinic")
public class Clinic {

    @Id
    private UUID id;
    private String name;
    private String contactPhone;
    private String contactEmail;
    private String address;
    private int retentionYears;
    private Instant createdAt;
    @Version
    private long version;

    protected Clinic() {
    }

    public Clinic(UUID id, String name, Instant createdAt) {
        this.id = id;
        this.name = name;
        this.createdAt = createdAt;
        this.retentionYears = 10;
    }

    public void setContact(String phone, String email, String address) {
        this.contactPhone = phone;
        this.contactEmail = email;
        this.address = address;
    }

    public void setRetentionYears(int years) {
        this.retentionYears = years;
    }

    public UUID getId() { return id; }
    public String getName() { return name; }
    public String getContactPhone() { return contactPhone; }
    public String getContactEmail() { return contactEmail; }
    public String getAddress() { return address; }
    public int getRetentionYears() { return retentionYears; }
    public Instant getCreatedAt() { return createdAt; }
    public long getVersion() { return version; }
}
