package dev.soakfield.fem.time;

/** Counters of a finished transient run. */
public record RunTotals(int steps, int rejectedSteps, long linearIterations, double[] finalPhi) {}
