package org.swingclearance.patient;

import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.UUID;
import java.util.stream.Collectors;

/** A dated red-flag checklist for an episode; append-only (the database refuses UPDATE and DELETE). */
@Entity
@Table(name = "red_flag_check")
public class RedFlagCheck {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID episodeId;
    @Enumerated(EnumType.STRING)
    private RedFlagContext context;
    /** Comma-separated flag names; empty when the checklist was clear. */
    private String flags;
    private Instant checkedAt;
    private UUID checkedBy;

    protected RedFlagCheck() {
    }

    public RedFlagCheck(UUID id, UUID clinicId, UUID episodeId, RedFlagContext context, Set<RedFlag> flags,
                        Instant checkedAt, UUID checkedBy) {
        this.id = id;
        this.clinicId = clinicId;
        this.episodeId = episodeId;
        this.context = context;
        this.flags = flags.stream().sorted().map(Enum::name).collect(Collectors.joining(","));
        this.checkedAt = checkedAt;
        this.checkedBy = checkedBy;
    }

    public List<RedFlag> flags() {
        if (flags == null || flags.isBlank()) {
            return List.of();
        }
        Set<RedFlag> set = EnumSet.noneOf(RedFlag.class);
        Arrays.stream(flags.split(",")).map(RedFlag::valueOf).forEach(set::add);
        return List.copyOf(set);
    }

    public UUID getEpisodeId() { return episodeId; }
    public Instant getCheckedAt() { return checkedAt; }
    public RedFlagContext getContext() { return context; }
}
