package dev.soakfield.app;

import java.util.Locale;
import org.joml.Matrix4d;
import org.joml.Vector3d;

/**
 * The view: an orthographic camera orbiting a target point with z up, as engineers look at parts
 * (lengths on screen do not depend on depth, so one length scale holds for the whole picture).
 * Angles are yaw about z (0 looks from +x) and pitch above the xy plane. Pixels count from the top
 * left corner, as window systems give them.
 */
public final class OrbitCamera {
  /** The standard views. */
  public enum View {
    ISO(-55, 30),
    XMIN(180, 0),
    XMAX(0, 0),
    YMIN(-90, 0),
    YMAX(90, 0),
    ZMIN(-90, -90),
    ZMAX(-90, 90);

    final double yawDeg;
    final double pitchDeg;

    View(double yawDeg, double pitchDeg) {
      this.yawDeg = yawDeg;
      this.pitchDeg = pitchDeg;
    }

    /** The view named on the command line: iso, xmin, ..., zmax. */
    public static View parse(String name) {
      for (View v : values()) {
        if (v.name().equalsIgnoreCase(name.strip())) {
          return v;
        }
      }
      throw new IllegalArgumentException(
          "view: found '" + name + "', expected iso, xmin, xmax, ymin, ymax, zmin or zmax");
    }

    public String label() {
      return name().toLowerCase(Locale.ROOT);
    }
  }

  private static final double MAX_PITCH = 90;

  private final Vector3d target = new Vector3d();
  private double yawDeg = View.ISO.yawDeg;
  private double pitchDeg = View.ISO.pitchDeg;
  private double halfHeight = 1;
  private double radius = 1;
  private int width = 800;
  private int height = 600;

  /** The unit vector from the target towards the eye of a standard view. */
  public static double[] towards(View v) {
    OrbitCamera c = new OrbitCamera();
    c.look(v);
    Vector3d e = c.towardsEye();
    return new double[] {e.x, e.y, e.z};
  }

  /** Takes another camera's view (target, angles, zoom), keeping this one's picture size. */
  public void copyFrom(OrbitCamera o) {
    target.set(o.target);
    yawDeg = o.yawDeg;
    pitchDeg = o.pitchDeg;
    halfHeight = o.halfHeight;
    radius = o.radius;
  }

  /** Sets the picture size in pixels. */
  public void viewport(int w, int h) {
    if (w <= 0 || h <= 0) {
      throw new IllegalArgumentException(
          "viewport: found " + w + " x " + h + ", expected positive");
    }
    width = w;
    height = h;
  }

  public int width() {
    return width;
  }

  public int height() {
    return height;
  }

  /** Centres the box xmin, ymin, zmin, xmax, ymax, zmax and zooms so that all of it shows. */
  public void fit(double[] bounds) {
    target.set(
        (bounds[0] + bounds[3]) / 2, (bounds[1] + bounds[4]) / 2, (bounds[2] + bounds[5]) / 2);
    double dx = bounds[3] - bounds[0];
    double dy = bounds[4] - bounds[1];
    double dz = bounds[5] - bounds[2];
    radius = Math.max(1e-30, 0.5 * Math.sqrt(dx * dx + dy * dy + dz * dz));
    double aspect = (double) width / height;
    halfHeight = 1.08 * radius * Math.max(1, 1 / aspect);
  }

  public void look(View v) {
    yawDeg = v.yawDeg;
    pitchDeg = v.pitchDeg;
  }

  /** Turns the view by the given angles; pitch stays within ±90°. */
  public void orbit(double dYawDeg, double dPitchDeg) {
    yawDeg = (yawDeg + dYawDeg) % 360;
    pitchDeg = Math.max(-MAX_PITCH, Math.min(MAX_PITCH, pitchDeg + dPitchDeg));
  }

  /** Moves the target by a drag of (dx, dy) pixels, so the part follows the cursor. */
  public void pan(double dxPixels, double dyPixels) {
    double perPixel = worldPerPixel();
    Vector3d right = right();
    Vector3d up = up();
    target.fma(-dxPixels * perPixel, right).fma(dyPixels * perPixel, up);
  }

  /** Zooms by {@code factor} (above 1 brings the part closer). */
  public void zoom(double factor) {
    if (!(factor > 0)) {
      throw new IllegalArgumentException("zoom factor: found " + factor + ", expected positive");
    }
    halfHeight /= factor;
  }

  /** Length in model units of one pixel. */
  public double worldPerPixel() {
    return 2 * halfHeight / height;
  }

  /** Unit vector from the target towards the eye. */
  public Vector3d towardsEye() {
    double y = Math.toRadians(yawDeg);
    double p = Math.toRadians(pitchDeg);
    return new Vector3d(Math.cos(p) * Math.cos(y), Math.cos(p) * Math.sin(y), Math.sin(p));
  }

  /** Screen up as a model direction: z tipped back by the pitch. */
  public Vector3d up() {
    double y = Math.toRadians(yawDeg);
    double p = Math.toRadians(pitchDeg);
    return new Vector3d(-Math.sin(p) * Math.cos(y), -Math.sin(p) * Math.sin(y), Math.cos(p));
  }

  /** Screen right as a model direction. */
  public Vector3d right() {
    return up().cross(towardsEye(), new Vector3d()).normalize();
  }

  public Vector3d target() {
    return new Vector3d(target);
  }

  private Vector3d eye() {
    return new Vector3d(target).fma(3 * radius, towardsEye());
  }

  /** The model-to-eye matrix. */
  public Matrix4d viewMatrix() {
    Vector3d eye = eye();
    Vector3d up = up();
    return new Matrix4d()
        .lookAt(eye.x, eye.y, eye.z, target.x, target.y, target.z, up.x, up.y, up.z);
  }

  /** The orthographic projection, with depth covering the part's bounding sphere. */
  public Matrix4d projectionMatrix() {
    double aspect = (double) width / height;
    return new Matrix4d()
        .ortho(
            -halfHeight * aspect,
            halfHeight * aspect,
            -halfHeight,
            halfHeight,
            0.5 * radius,
            5.5 * radius);
  }

  /** Projection times view, column-major floats for the GL. */
  public float[] viewProjection() {
    float[] m = new float[16];
    projectionMatrix().mul(viewMatrix()).get(m);
    return m;
  }

  /** The pixel (x from the left, y from the top, in fractional pixels) where a point shows. */
  public double[] toPixel(double x, double y, double z) {
    Vector3d d = new Vector3d(x, y, z).sub(target);
    double sx = d.dot(right()) / worldPerPixel();
    double sy = d.dot(up()) / worldPerPixel();
    return new double[] {width / 2.0 + sx, height / 2.0 - sy};
  }

  /**
   * The ray through the centre of pixel (px, py): origin (on the near side of the part) and unit
   * direction, 6 numbers.
   */
  public double[] ray(double px, double py) {
    double sx = (px - width / 2.0) * worldPerPixel();
    double sy = (height / 2.0 - py) * worldPerPixel();
    Vector3d o = eye().fma(sx, right()).fma(sy, up());
    Vector3d d = towardsEye().negate();
    return new double[] {o.x, o.y, o.z, d.x, d.y, d.z};
  }
}
