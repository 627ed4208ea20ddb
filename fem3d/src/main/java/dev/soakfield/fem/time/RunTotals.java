package dev.soakfield.fem.time;

/** Counters of a finished transient run. */
@SuppressWarnings("ArrayRecordComponent") // the final field, handed over once
public record RunTotals(int steps, int rejectedSteps, long linearIterations, double[] finalPhi) {}
