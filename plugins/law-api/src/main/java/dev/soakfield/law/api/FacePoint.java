package dev.soakfield.law.api;

/**
 * Where and when a face law is evaluated: one node of a face group at the end of a time step. The
 * solver reuses one instance; a law must not keep it beyond the call.
 */
public interface FacePoint {
  /** The mobile concentration c = S·φ just inside the face at the end of the step, amount/m³. */
  double concentration();

  /** Temperature at the end of the step, K. */
  double temperature();

  /** Time at the end of the step, s. */
  double time();

  /**
   * The gas outside the face: the hydrogen fugacity in Pa (the partial pressure for an ideal gas;
   * Abel–Noble at high pressure), from the face's own {@code "pressure"} or the case's exposure; 0
   * when the case gives neither.
   */
  double pressure();
}
