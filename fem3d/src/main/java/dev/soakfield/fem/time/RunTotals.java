package dev.soakfield.fem.time;

/**
 * Counters of a finished transient run.
 *
 * @param endTime the simulated time the run reached: the end time, or earlier when a stop condition
 *     ended it
 */
@SuppressWarnings("ArrayRecordComponent") // the final field, handed over once
public record RunTotals(
    int steps, int rejectedSteps, long linearIterations, double[] finalPhi, double endTime) {}
