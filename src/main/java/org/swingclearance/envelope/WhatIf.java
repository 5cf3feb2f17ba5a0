package org.swingclearance.envelope;

import java.util.List;
import java.util.UUID;

/**
 * One configuration the clinician tries on the envelope page (club, pattern, grip mark, cycle time): the verdict,
 * each constraint's ratio, the demand beside its allowance, and the demand ratio across grip marks and across
 * cycle times for the charts. Labels are filled in by the service in the reader's language.
 *
 * @param status COMPUTED, NO_CAPACITY or INVALID as for {@link EnvelopeRow#status()}
 */
public record WhatIf(UUID clubId, UUID patternId, double gripMarkCm, double cycleTimeS, double swingsPerMinute,
                     String status, boolean permitted, Double demandRatio, String binding, String bindingLabel,
                     String verdictLabel, Double shoulderTorqueRatio, Double holdTorqueRatio, Double gripPullRatio,
                     Double peakShoulderTorqueNm, Double holdTorqueNm, Double shoulderAllowanceNm,
                     Double peakGripPullN, Double gripAllowanceN, Double peakWristMomentNm, Double momentArmCm,
                     Double largestHalfArcDeg, double handleLengthCm, List<Point> gripSeries,
                     List<Point> cycleSeries) {

    public WhatIf {
        gripSeries = List.copyOf(gripSeries);
        cycleSeries = List.copyOf(cycleSeries);
    }

    /** One chart point: x (grip mark in cm, or cycle time in s) and the demand ratio there (null: not computable). */
    public record Point(double x, Double d) {
    }

    WhatIf labelled(String bindingText, String verdictText) {
        return new WhatIf(clubId, patternId, gripMarkCm, cycleTimeS, swingsPerMinute, status, permitted, demandRatio,
                binding, bindingText, verdictText, shoulderTorqueRatio, holdTorqueRatio, gripPullRatio,
                peakShoulderTorqueNm, holdTorqueNm, shoulderAllowanceNm, peakGripPullN, gripAllowanceN,
                peakWristMomentNm, momentArmCm, largestHalfArcDeg, handleLengthCm, gripSeries, cycleSeries);
    }
}
