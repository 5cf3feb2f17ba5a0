package org.swingclearance.calculation.web;

import java.util.ArrayList;
import java.util.List;
import org.swingclearance.engine.mechanics.Demand;
import org.swingclearance.engine.mechanics.InertiaSource;
import org.swingclearance.engine.mechanics.Provenance;

/** The demand of one configuration, per arm, in SI units, with the model's assumptions as plain sentences. */
public record DemandResponse(double shoulderToGripM, double momentArmM, double clubInertiaAboutBalancePointKgM2,
                             InertiaSource clubInertiaSource, double systemInertiaKgM2, double naturalPeriodS,
                             double peakAngularVelocityRadS, double peakShoulderTorqueNm, double holdTorqueNm,
                             double peakGripPullN, double peakWristMomentNm, double positiveWorkPerCycleJ,
                             List<String> assumptions, String engineVersion) {

    static DemandResponse of(Demand d) {
        return new DemandResponse(d.shoulderToGripM(), d.momentArmM(), d.clubInertiaAboutBalancePointKgM2(),
                d.clubInertiaSource(), d.systemInertiaKgM2(), d.naturalPeriodS(), d.peakAngularVelocityRadS(),
                d.peakShoulderTorqueNm(), d.holdTorqueNm(), d.peakGripPullN(), d.peakWristMomentNm(),
                d.positiveWorkPerCycleJ(), sentences(d, List.of()), d.engineVersion());
    }

    /** Provenance of each estimated input, then the model's assumptions, then any notes, as sentences. */
    static List<String> sentences(Demand d, List<String> notes) {
        List<String> sentences = new ArrayList<>();
        for (Provenance p : d.provenance()) {
            sentences.add(capitalised(p.quantity()) + ": " + p.source() + ".");
        }
        sentences.addAll(d.assumptions());
        sentences.addAll(notes);
        return List.copyOf(sentences);
    }

    private static String capitalised(String text) {
        return Character.toUpperCase(text.charAt(0)) + text.substring(1);
    }
}
