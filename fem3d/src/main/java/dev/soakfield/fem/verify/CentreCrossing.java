package dev.soakfield.fem.verify;

import dev.soakfield.fem.assembly.PointLocator;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.post.SpaceErrorEstimate;
import dev.soakfield.fem.post.ThresholdClock;
import dev.soakfield.fem.post.ThresholdTimeError;
import dev.soakfield.fem.post.TimeErrorTrack;
import dev.soakfield.fem.time.StepListener;
import dev.soakfield.fem.time.StepOutcome;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;

/**
 * When the centre of a sphere first reaches a level: a sphere of radius 1 at c = 0, its surface
 * held at 1 from t = 0 (D = 1), run with fixed steps until the centre crosses, the crossing placed
 * by a straight line within its step (as a run's threshold is) and its error estimated as a run
 * estimates it ({@link ThresholdTimeError}: the centre element's space estimate, the step track's
 * time estimate, the interpolation term). The exact time is from Crank (1975) eq. 6.18 at r → 0:
 * c(0, t) = 1 + 2 Σ (−1)ⁿ exp(−n²π² D t / a²).
 */
final class CentreCrossing {
  private CentreCrossing() {}

  /**
   * The crossing time the run found and its estimated error; {@code ownElement} the space part had
   * it come from the centre's element alone (a negative control: too small).
   */
  record Outcome(double time, ThresholdTimeError estimate, double ownElement) {}

  /**
   * The sphere's model on a mesh of it (either order): all of the surface held at 1, c = 0 inside.
   */
  static DiffusionModel model(TetMesh mesh) {
    return UniformModels.model(
        mesh,
        new double[] {1},
        new double[] {1},
        new double[] {0},
        0,
        UniformModels.allHeld(mesh, 1));
  }

  /** Runs with fixed steps dt (backward Euler, or Crank–Nicolson after its damped start). */
  static Outcome run(TetMesh mesh, double level, double dt, boolean crank) {
    DiffusionModel m = model(mesh);
    PointLocator.Probe centre =
        new PointLocator(m.space())
            .locate(0, 0, 0)
            .orElseThrow(() -> new IllegalStateException("the sphere's mesh misses its centre"));
    double[] tetS = UniformModels.filled(mesh.tetCount(), 1);
    double end = 2 * exact(level);
    TimeSettings s = new TimeSettings(end, new double[] {end}, crank, Double.NaN, dt, dt, dt);
    TimeErrorTrack track = new TimeErrorTrack(1);
    double[] previous = new double[1];
    double[] found = {Double.NaN};
    ThresholdTimeError[] estimate = new ThresholdTimeError[1];
    double[] ownElement = new double[1];
    int[] steps = {0};
    TransientRun.run(
        new ThetaStepper(m, false, 1e-12, 5000),
        m.initialPhi(),
        s,
        new StepListener() {
          @Override
          public void started(StepOutcome o) {
            previous[0] = centre.value(o.phi());
            track.start(0, previous);
          }

          @Override
          public void accepted(double t, double h, StepOutcome o, boolean output) {
            double c = centre.value(o.phi());
            track.step(t, h, TimeSettings.thetaOfStep(crank, steps[0]++), new double[] {c});
            if (Double.isNaN(found[0]) && c >= level) {
              found[0] = ThresholdClock.crossing(t - h, previous[0], t, c, level);
              SpaceErrorEstimate space = SpaceErrorEstimate.of(mesh, o.phi(), tetS);
              double rate = (c - previous[0]) / h;
              estimate[0] =
                  ThresholdTimeError.of(
                      space.pointError(mesh, centre.tet()),
                      track.estimates()[0],
                      rate,
                      h,
                      track.secondDerivative(0));
              ownElement[0] = Math.abs(space.elementErrors()[centre.tet()] / rate);
            }
            previous[0] = c;
          }

          @Override
          public boolean stopRequested() {
            return !Double.isNaN(found[0]);
          }
        });
    if (estimate[0] == null) {
      throw new IllegalStateException("the centre did not reach " + level + " by t = " + end);
    }
    return new Outcome(found[0], estimate[0], ownElement[0]);
  }

  /** Crank (1975) eq. 6.18 at the centre (r → 0), a = D = 1. */
  static double centre(double t) {
    double s = 0;
    for (int n = 1; n < 200; n++) {
      s += (n % 2 == 0 ? 1 : -1) * Math.exp(-n * n * Math.PI * Math.PI * t);
    }
    return 1 + 2 * s;
  }

  /** The time the centre reaches level, by bisection on {@link #centre}. */
  static double exact(double level) {
    double lo = 1e-3;
    double hi = 2;
    for (int i = 0; i < 200; i++) {
      double mid = 0.5 * (lo + hi);
      if (centre(mid) < level) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    return 0.5 * (lo + hi);
  }
}
