package org.swingclearance.plan;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Map;

/**
 * The SHA-256 of a version's content in a fixed text form (sources, settings, inputs and every step), stored when
 * the version is issued: the handout prints its first characters, so a printed plan can be matched to the record.
 */
final class PlanFingerprint {

    private PlanFingerprint() {
    }

    static String of(PlanVersion v) {
        return sha256(text(v));
    }

    private static String settingsText(PlanSettings s) {
        StringBuilder text = new StringBuilder().append(s.target()).append('|').append(s.continueProvisionally())
                .append('|').append(s.stepUnit()).append('|').append(s.stepLength()).append('|')
                .append(s.sessionsPerWeek()).append('|').append(s.startsOn());
        s.doses().entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> text.append('|').append(e.getKey()).append('=').append(e.getValue()));
        return text.toString();
    }

    private static String text(PlanVersion v) {
        StringBuilder text = new StringBuilder()
                .append("plan=").append(v.getPlanId()).append(";version=").append(v.getNumber())
                .append(";screening=").append(v.getSourceScreeningId()).append('/').append(v.getSourceScreeningVersion())
                .append(";rules=").append(v.getRulesVersion()).append(";engine=").append(v.getEngineVersion())
                .append(";band=").append(v.getBand()).append(";pattern=").append(v.getPatternId())
                .append(";settings=").append(settingsText(v.settings()))
                .append(";inputs=").append(v.getInputs()).append('\n');
        for (PlannedStep s : v.getSteps()) {
            text.append(String.format(Locale.ROOT, "%d|%s|%.4f|%.4f|%.4f|%d|%d|%d|%.9f|%s|%b|%b|%s\n", s.getNumber(),
                    s.getClubId(), s.getClubMassKg(), s.getGripMarkCm(), s.getCycleTimeS(), s.getSets(), s.getReps(),
                    s.getEffortCap(), s.getDemandRatio(), s.getBindingConstraint(), s.isProvisional(),
                    s.isGateBefore(), s.getStartsOn()));
        }
        return text.toString();
    }

    private static String sha256(String text) {
        try {
            byte[] hash = MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(hash);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java runtime", e);
        }
    }
}
