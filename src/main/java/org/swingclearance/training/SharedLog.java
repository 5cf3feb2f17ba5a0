package org.swingclearance.training;

/** A plan shared with a trainer, with today's step and the trainer's advice (null when there is nothing to say). */
public record SharedLog(TrainingPlan plan, TrainingStep todaysStep, Advice advice) {
}
