package dev.soakfield.law.api;

/**
 * The flux through a face as a function of the concentration just inside it, the gas outside, the
 * temperature and time: surface kinetics (dissociation and recombination of hydrogen, a charging
 * current). The solver integrates it implicitly: it asks for the flux and its derivative at the
 * end-of-step concentration and iterates (Newton) until the balance holds. A face law keeps no
 * state.
 *
 * <p>Implementations may be called from several threads at once for different nodes and must not
 * keep per-node data in fields.
 */
public interface FaceLaw {
  /** The inward flux and ∂flux/∂c at the point. */
  void flux(FacePoint at, FluxSink out);
}
