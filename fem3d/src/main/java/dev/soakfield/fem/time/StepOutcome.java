package dev.soakfield.fem.time;

/**
 * What one accepted or tried step produced.
 *
 * @param phi the potential at the end of the step
 * @param faceInflow amount that entered through each face group during the step (by mesh face group
 *     index; 0 for sealed and interface groups)
 * @param sourceAmount amount produced by volume sources during the step (negative for sinks)
 * @param amount the total amount at the end of the step, 1ᵀ M φ
 * @param iterations linear solver iterations of the step
 * @param solveSeconds time spent in the linear solve (and any preconditioner set-up)
 */
@SuppressWarnings("ArrayRecordComponent") // handed from the stepper to listeners, read only
public record StepOutcome(
    double[] phi,
    double[] faceInflow,
    double sourceAmount,
    double amount,
    int iterations,
    double solveSeconds) {}
