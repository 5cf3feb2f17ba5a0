package org.swingclearance.training;

import java.util.UUID;

/**
 * An alert the load engine's rules found for one log version or next-morning entry ({@code sourceId}): the step
 * the session was at, the step the trainer is told to go back to (or hold at), the value observed and its limit.
 */
record AlertFinding(AlertKind kind, UUID sourceId, int stepNumber, int regressToStep, Double observed,
                    Double threshold) {
}
