package org.swingclearance.audit;

import java.util.List;

/** The manager's audit start page: chain status, latest checkpoints and the last twelve months of activity. */
public record Overview(ChainStatus status, List<CheckpointView> checkpoints, List<MonthlyActivity> activity) {
}
