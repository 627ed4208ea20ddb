package dev.soakfield.app.setup;

import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PickIndex;
import dev.soakfield.app.Scene;
import java.util.Optional;

/**
 * Where a click places a probe: the nearest of the part's surface under the cursor and, with a
 * section on, the cut face (so a probe can go inside the part).
 */
public final class ProbePlacement {
  private ProbePlacement() {}

  /** The point (x, y, z) under view pixel (px, py), or empty when the ray misses the part. */
  public static Optional<double[]> under(Scene scene, OrbitCamera camera, double px, double py) {
    double[] ray = camera.ray(px, py);
    double best = Double.POSITIVE_INFINITY;
    Optional<PickIndex.Hit> surface = scene.pick(camera, px, py);
    if (surface.isPresent()) {
      best = surface.get().distance();
    }
    float[] cut = scene.sectionMesh().positions;
    if (cut.length > 0) {
      double[] corners = new double[cut.length];
      for (int i = 0; i < cut.length; i++) {
        corners[i] = cut[i];
      }
      Optional<PickIndex.Hit> onCut =
          new PickIndex(corners).pick(ray[0], ray[1], ray[2], ray[3], ray[4], ray[5]);
      if (onCut.isPresent()) {
        best = Math.min(best, onCut.get().distance());
      }
    }
    if (best == Double.POSITIVE_INFINITY) {
      return Optional.empty();
    }
    return Optional.of(
        new double[] {ray[0] + best * ray[3], ray[1] + best * ray[4], ray[2] + best * ray[5]});
  }
}
