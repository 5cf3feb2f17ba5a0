package org.swingclearance.audit;

import java.util.List;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.CurrentStaff;

/** Writes ordinary audit events through the real AuditLog, each in its own transaction, and reads rows back. */
final class ChainFixture {

    private final AuditLog audit;
    private final TransactionTemplate tx;
    private final JdbcTemplate jdbc;

    ChainFixture(AuditLog audit, TransactionTemplate tx, JdbcTemplate jdbc) {
        this.audit = audit;
        this.tx = tx;
        this.jdbc = jdbc;
    }

    /** {@code count} patient reads by the staff member, as a clinician opening records would leave them. */
    void reads(CurrentStaff staff, UUID patientId, int count) {
        for (int i = 0; i < count; i++) {
            int n = i;
            tx.executeWithoutResult(s -> audit.record(staff, "PATIENT_READ", "Patient", patientId, patientId,
                    AuditDetail.of("n", n)));
        }
    }

    void record(CurrentStaff staff, String action, String objectType, Object objectId, UUID patientId, String detail) {
        tx.executeWithoutResult(s -> audit.record(staff, action, objectType, objectId, patientId, detail));
    }

    UUID eventAt(UUID chainId, long seq) {
        return jdbc.queryForObject("select event_id from audit_event where chain_id = ? and seq = ?", UUID.class,
                chainId, seq);
    }

    long head(UUID chainId) {
        return jdbc.queryForObject("select last_seq from audit_chain where chain_id = ?", Long.class, chainId);
    }

    List<String> actions(UUID clinicId) {
        return jdbc.queryForList("select action from audit_event where clinic_id = ? order by seq", String.class,
                clinicId);
    }

    long count(UUID clinicId) {
        return jdbc.queryForObject("select count(*) from audit_event where clinic_id = ?", Long.class, clinicId);
    }
}
