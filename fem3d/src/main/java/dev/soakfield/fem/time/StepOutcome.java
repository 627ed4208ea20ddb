package dev.soakfield.fem.time;

/**
 * What one accepted or tried step produced.
 *
 * @param phi the potential at the end of the step
 * @param faceInflow amount that entered through each face group during the step (by mesh face group
 *     index; 0 for sealed and interface groups)
 * @param sourceAmount net amount produced by volume sources during the step (negative for sinks);
 *     what source laws move into or out of their trapped state is not production
 * @param amount the total amount at the end of the step: 1ᵀ M φ plus what source laws hold
 * @param iterations linear solver iterations of the step
 * @param solveSeconds time spent in the linear solve (and any preconditioner set-up)
 * @param newtonIterations Newton iterations of the step (0 without source laws)
 * @param lawStates the source laws' states at the end of the step, pending until the stepper
 *     commits them; null without source laws
 */
@SuppressWarnings("ArrayRecordComponent") // handed from the stepper to listeners, read only
public record StepOutcome(
    double[] phi,
    double[] faceInflow,
    double sourceAmount,
    double amount,
    int iterations,
    double solveSeconds,
    int newtonIterations,
    double[][] lawStates) {
  /** An outcome without source laws. */
  public StepOutcome(
      double[] phi,
      double[] faceInflow,
      double sourceAmount,
      double amount,
      int iterations,
      double solveSeconds) {
    this(phi, faceInflow, sourceAmount, amount, iterations, solveSeconds, 0, null);
  }
}
