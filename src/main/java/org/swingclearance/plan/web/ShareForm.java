package org.swingclearance.plan.web;

import jakarta.validation.constraints.NotNull;
import java.util.UUID;

/** Sharing an issued plan with a trainer account of the clinic. */
public class ShareForm {

    @NotNull
    private UUID trainerId;

    public UUID getTrainerId() { return trainerId; }
    public void setTrainerId(UUID trainerId) { this.trainerId = trainerId; }
}
