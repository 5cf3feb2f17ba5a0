package org.swingclearance.envelope;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Repository;
import tools.jackson.databind.json.JsonMapper;

/**
 * Stores and finds envelope snapshots (table envelope_snapshot, append-only). Inputs and outputs are JSON
 * documents; the SHA-256 digest of the inputs document identifies "the same inputs" for reuse. Every query is
 * scoped by clinic.
 */
@Repository
class EnvelopeSnapshots {

    private static final String COLUMNS = "id, episode_id, patient_id, screening_id, screening_version, cycle_time_s,"
            + " engine_version, rules_version, computed_at, inputs::text as inputs, outputs::text as outputs";

    private final JdbcTemplate jdbc;
    private final JsonMapper json;

    EnvelopeSnapshots(JdbcTemplate jdbc, JsonMapper json) {
        this.jdbc = jdbc;
        this.json = json;
    }

    /** The inputs as the JSON document stored and digested. */
    String document(EnvelopeInputs inputs) {
        return json.writeValueAsString(inputs);
    }

    static String digest(String document) {
        try {
            byte[] hash = MessageDigest.getInstance("SHA-256").digest(document.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(hash);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

    /** The newest snapshot of the episode computed from exactly these inputs. */
    Optional<EnvelopeSnapshotView> findByDigest(UUID clinicId, UUID episodeId, String digest) {
        return jdbc.query("select " + COLUMNS + " from envelope_snapshot where clinic_id = ? and episode_id = ?"
                        + " and inputs_digest = ? order by computed_at desc limit 1",
                this::map, clinicId, episodeId, digest).stream().findFirst();
    }

    /** The cycle time of the episode's newest snapshot of this screening version (the patient's usual tempo). */
    Optional<Double> lastCycleTime(UUID clinicId, UUID episodeId, UUID screeningId, int screeningVersion) {
        List<Double> times = jdbc.queryForList("select cycle_time_s from envelope_snapshot where clinic_id = ?"
                        + " and episode_id = ? and screening_id = ? and screening_version = ?"
                        + " order by computed_at desc limit 1", Double.class, clinicId, episodeId, screeningId,
                screeningVersion);
        return times.stream().findFirst();
    }

    EnvelopeSnapshotView insert(UUID clinicId, UUID episodeId, UUID patientId, EnvelopeInputs inputs,
                                String inputsDocument, EnvelopeOutputs outputs, Instant now, UUID computedBy) {
        UUID id = UUID.randomUUID();
        jdbc.update("""
                insert into envelope_snapshot (id, clinic_id, episode_id, patient_id, screening_id, screening_version,
                    cycle_time_s, inputs_digest, inputs, outputs, engine_version, rules_version, computed_at,
                    computed_by)
                values (?, ?, ?, ?, ?, ?, ?, ?, ?::jsonb, ?::jsonb, ?, ?, ?, ?)""",
                id, clinicId, episodeId, patientId, inputs.screeningId(), inputs.screeningVersion(),
                inputs.cycleTimeS(), digest(inputsDocument), inputsDocument, json.writeValueAsString(outputs),
                inputs.engineVersion(), inputs.rules().version(), Timestamp.from(now), computedBy);
        return new EnvelopeSnapshotView(id, episodeId, patientId, inputs.screeningId(), inputs.screeningVersion(),
                inputs.cycleTimeS(), inputs.engineVersion(), inputs.rules().version(), now, outputs.rows(),
                outputs.noteKeys(), outputs.modelStatements(), inputs);
    }

    private EnvelopeSnapshotView map(ResultSet rs, int row) throws SQLException {
        EnvelopeInputs inputs = json.readValue(rs.getString("inputs"), EnvelopeInputs.class);
        EnvelopeOutputs outputs = json.readValue(rs.getString("outputs"), EnvelopeOutputs.class);
        return new EnvelopeSnapshotView(rs.getObject("id", UUID.class), rs.getObject("episode_id", UUID.class),
                rs.getObject("patient_id", UUID.class), rs.getObject("screening_id", UUID.class),
                rs.getInt("screening_version"), rs.getDouble("cycle_time_s"), rs.getString("engine_version"),
                rs.getInt("rules_version"), rs.getTimestamp("computed_at").toInstant(), outputs.rows(),
                outputs.noteKeys(), outputs.modelStatements(), inputs);
    }
}
