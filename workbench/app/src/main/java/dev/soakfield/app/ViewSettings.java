package dev.soakfield.app;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * What the view shows and how: the field and frame, the colour limits, edges, hidden parts, the
 * section plane and the isosurface levels. Plain state: the panels change it, the renderer reads
 * it.
 */
public final class ViewSettings {
  /** A section plane n·x = offset (n need not be unit length). */
  public record Plane(double nx, double ny, double nz, double offset) {
    public Plane {
      double len = Math.sqrt(nx * nx + ny * ny + nz * nz);
      if (!(len > 0) || !Double.isFinite(offset)) {
        throw new IllegalArgumentException(
            "section plane: found normal ("
                + nx
                + ", "
                + ny
                + ", "
                + nz
                + ") and offset "
                + offset
                + ", expected a non-zero normal and a finite offset");
      }
    }

    /**
     * The same plane oriented so that its cut faces a viewer looking along {@code -towardsEye}: the
     * part on the side of {@code n} is taken away, so {@code n} must point towards the eye.
     */
    public Plane facing(double[] towardsEye) {
      double d = nx * towardsEye[0] + ny * towardsEye[1] + nz * towardsEye[2];
      return d >= 0 ? this : new Plane(-nx, -ny, -nz, -offset);
    }

    /**
     * The plane of a command-line text AXIS:POS, e.g. {@code x:0.004} (x = 0.004 m).
     *
     * @throws IllegalArgumentException naming the text and what was expected
     */
    public static Plane parse(String text) {
      String[] p = text.strip().split(":", -1);
      if (p.length == 2) {
        try {
          double pos = Double.parseDouble(p[1].strip());
          String axis = p[0].strip().toLowerCase(java.util.Locale.ROOT);
          if (axis.equals("x")) {
            return new Plane(1, 0, 0, pos);
          } else if (axis.equals("y")) {
            return new Plane(0, 1, 0, pos);
          } else if (axis.equals("z")) {
            return new Plane(0, 0, 1, pos);
          }
        } catch (NumberFormatException e) {
          // fall through to the message below
        }
      }
      throw new IllegalArgumentException(
          "section: found '" + text + "', expected AXIS:POS with AXIS x, y or z (e.g. z:0.002)");
    }
  }

  private Optional<FieldKind> field = Optional.of(FieldKind.CONCENTRATION);
  private int frame;
  private boolean autoRange = true;
  private double low;
  private double high = 1;
  private boolean edges;
  private boolean[] hiddenParts = new boolean[0];
  private Optional<Plane> section = Optional.empty();
  private final List<Double> isoLevels = new ArrayList<>();
  private float isoOpacity = 0.45f;
  private int generation;
  private int[] groupColours = new int[0];

  /** Counts changes, so the scene knows when to rebuild. */
  public int generation() {
    return generation;
  }

  private void changed() {
    generation++;
  }

  /**
   * Colours (0xRRGGBB) by face group that replace the palette's while no field is shown (the set-up
   * view colours groups by their kind); empty for the palette.
   */
  public int[] groupColours() {
    return groupColours.clone();
  }

  public void groupColours(int[] colours) {
    if (!java.util.Arrays.equals(colours, groupColours)) {
      groupColours = colours.clone();
      changed();
    }
  }

  public Optional<FieldKind> field() {
    return field;
  }

  /** Shows a field, or the face groups in their colours when empty. */
  public void field(Optional<FieldKind> f) {
    field = f;
    changed();
  }

  public int frame() {
    return frame;
  }

  public void frame(int f) {
    frame = f;
    changed();
  }

  public boolean autoRange() {
    return autoRange;
  }

  public double low() {
    return low;
  }

  public double high() {
    return high;
  }

  /** Fixed colour limits. */
  public void range(double lo, double hi) {
    if (!(hi > lo) || !Double.isFinite(lo) || !Double.isFinite(hi)) {
      throw new IllegalArgumentException(
          "colour limits: found " + lo + " .. " + hi + ", expected finite numbers, low below high");
    }
    autoRange = false;
    low = lo;
    high = hi;
    changed();
  }

  /** Limits from the field shown (the whole mesh, this frame). */
  public void automaticRange() {
    autoRange = true;
    changed();
  }

  public boolean edges() {
    return edges;
  }

  public void edges(boolean on) {
    edges = on;
    changed();
  }

  public boolean partHidden(int part) {
    return part < hiddenParts.length && hiddenParts[part];
  }

  public void hidePart(int part, boolean hidden) {
    if (part >= hiddenParts.length) {
      hiddenParts = Arrays.copyOf(hiddenParts, part + 1);
    }
    hiddenParts[part] = hidden;
    changed();
  }

  /** One flag a part for {@link BoundarySurface#of}: true where shown. */
  public boolean[] shownParts(int parts) {
    boolean[] shown = new boolean[parts];
    for (int p = 0; p < parts; p++) {
      shown[p] = !partHidden(p);
    }
    return shown;
  }

  public Optional<Plane> section() {
    return section;
  }

  public void section(Optional<Plane> plane) {
    section = plane;
    changed();
  }

  public List<Double> isoLevels() {
    return List.copyOf(isoLevels);
  }

  public void isoLevels(List<Double> levels) {
    isoLevels.clear();
    isoLevels.addAll(levels);
    changed();
  }

  public float isoOpacity() {
    return isoOpacity;
  }

  public void isoOpacity(float a) {
    isoOpacity = Math.max(0.05f, Math.min(1f, a));
    changed();
  }
}
