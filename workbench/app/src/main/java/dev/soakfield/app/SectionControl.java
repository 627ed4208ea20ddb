package dev.soakfield.app;

import java.util.Optional;
import org.joml.Vector3d;

/**
 * The section plane as the window offers it: on or off, across x, y, z or the line of sight, at a
 * position within the part's extent along the plane's normal.
 */
public final class SectionControl {
  /** The axis index that means "across the line of sight". */
  public static final int VIEW = 3;

  private final double[] bounds;
  private boolean on;
  private int axis = 2;
  private double[] viewNormal = {0, 0, 1};
  private float position;

  /** A plane across z through the middle of {@code bounds} (xmin, ymin, zmin, xmax, ymax, zmax). */
  public SectionControl(double[] bounds) {
    this.bounds = bounds.clone();
    position = (float) ((bounds[axis] + bounds[3 + axis]) / 2);
  }

  public boolean on() {
    return on;
  }

  public int axis() {
    return axis;
  }

  public float position() {
    return position;
  }

  /**
   * The plane's normal for {@code newAxis}; choosing "view" takes the camera's line of sight now.
   */
  public double[] normal(int newAxis, OrbitCamera camera) {
    if (newAxis == VIEW && axis != VIEW) {
      Vector3d e = camera.towardsEye();
      viewNormal = new double[] {e.x, e.y, e.z};
    }
    return newAxis == VIEW
        ? viewNormal
        : new double[] {newAxis == 0 ? 1 : 0, newAxis == 1 ? 1 : 0, newAxis == 2 ? 1 : 0};
  }

  /**
   * Where the slider starts for {@code newAxis}: the middle of {@code range} when the axis changed.
   */
  public float start(int newAxis, double[] range) {
    return newAxis != axis ? (float) ((range[0] + range[1]) / 2) : position;
  }

  /** Smallest and largest n·x over the corners of the part's bounding box. */
  public double[] extent(double[] n) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < 8; k++) {
      double d =
          n[0] * bounds[(k & 1) * 3]
              + n[1] * bounds[1 + ((k >> 1) & 1) * 3]
              + n[2] * bounds[2 + ((k >> 2) & 1) * 3];
      lo = Math.min(lo, d);
      hi = Math.max(hi, d);
    }
    return new double[] {lo, hi};
  }

  /** Takes what the controls now show and passes a changed plane on to {@code settings}. */
  public void apply(
      boolean nowOn, int nowAxis, float nowPosition, double[] n, ViewSettings settings) {
    if (nowOn != on
        || nowAxis != axis
        || nowPosition != position
        || nowOn != settings.section().isPresent()) {
      on = nowOn;
      axis = nowAxis;
      position = nowPosition;
      settings.section(
          on ? Optional.of(new ViewSettings.Plane(n[0], n[1], n[2], position)) : Optional.empty());
    }
  }
}
