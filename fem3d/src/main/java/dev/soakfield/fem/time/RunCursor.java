package dev.soakfield.fem.time;

/**
 * Where a transient run stands after an accepted step: everything the step controller needs to go
 * on exactly as if it had never stopped (a checkpoint holds it, with the listener's and the source
 * laws' state).
 *
 * @param t simulated time reached
 * @param dt the step the controller would try next
 * @param ladderBase the base of the step ladder
 * @param phi the potential at t
 * @param previous the potential one step before, or null where the error estimate restarts
 * @param previousDt the length of the last step
 * @param scale the error scale reached
 * @param steps accepted steps so far
 * @param rejected rejected steps so far
 * @param sinceRestart steps since the scheme last restarted (Crank–Nicolson start steps)
 * @param iterations linear iterations so far
 */
@SuppressWarnings("ArrayRecordComponent") // snapshots: copied in, never changed
public record RunCursor(
    double t,
    double dt,
    double ladderBase,
    double[] phi,
    double[] previous,
    double previousDt,
    double scale,
    int steps,
    int rejected,
    int sinceRestart,
    long iterations) {}
