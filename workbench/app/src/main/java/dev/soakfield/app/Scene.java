package dev.soakfield.app;

import dev.soakfield.fem.post.Isosurface;
import dev.soakfield.fem.post.SectionCut;
import dev.soakfield.fem.post.TriangleSoup;
import dev.soakfield.fem.results.StoredRun;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The geometry the renderer draws, made from a {@link Study} and its {@link ViewSettings}: the
 * boundary surface of the shown parts with a value or a group colour at every corner, the section
 * and the isosurfaces, and the picking index. No GL here: arrays ready to be uploaded, rebuilt only
 * in the parts a change of settings touches.
 */
public final class Scene {
  /** Triangles as the renderer takes them: 9 floats a triangle for corners and normals. */
  public static final class Mesh {
    public final float[] positions;
    public final float[] normals;

    /** Colour of each corner (r, g, b), for groups and isosurfaces. */
    public final float[] colours;

    /** Value of each corner mapped to 0..1 of the colour range, or -1 where none. */
    public final float[] ramp;

    public Mesh(float[] positions, float[] normals, float[] colours, float[] ramp) {
      this.positions = positions;
      this.normals = normals;
      this.colours = colours;
      this.ramp = ramp;
    }

    public int triangleCount() {
      return positions.length / 9;
    }
  }

  private final Study study;
  private final ViewSettings settings;
  private BoundarySurface surface;
  private double[] surfaceCorners;
  private PickIndex picker; // built on the first pick: pictures drawn off screen never pick
  private float[] surfacePositions;
  private float[] surfaceNormals;
  private Mesh surfaceMesh;
  private Mesh sectionMesh = empty();
  private final List<Mesh> isoMeshes = new ArrayList<>();
  private double low;
  private double high = 1;
  private String partsKey = "";
  private String fieldKey = "";
  private String cutKey = "";
  private int version;

  public Scene(Study study, ViewSettings settings) {
    this.study = study;
    this.settings = settings;
    update();
  }

  private static Mesh empty() {
    return new Mesh(new float[0], new float[0], new float[0], new float[0]);
  }

  /** Brings the geometry up to date with the settings; returns true when anything changed. */
  public boolean update() {
    PartGeometry g = study.geometry();
    boolean[] shown = settings.shownParts(g.partNames().size());
    String pk = java.util.Arrays.toString(shown);
    boolean changed = false;
    if (!pk.equals(partsKey)) {
      surface = BoundarySurface.of(g, shown);
      surfaceCorners = PickIndex.corners(surface, g.xyz);
      picker = null;
      surfacePositions = toFloat(surfaceCorners);
      surfaceNormals = flatNormals(surfaceCorners);
      partsKey = pk;
      fieldKey = "";
      cutKey = "";
      changed = true;
    }
    Optional<double[]> values = fieldValues();
    String fk =
        settings.field()
            + "|"
            + settings.frame()
            + "|"
            + settings.autoRange()
            + "|"
            + settings.low()
            + "|"
            + settings.high()
            + "|"
            + values.isPresent()
            + "|"
            + java.util.Arrays.hashCode(settings.groupColours());
    if (!fk.equals(fieldKey)) {
      colourSurface(values);
      fieldKey = fk;
      cutKey = "";
      changed = true;
    }
    String ck = settings.section() + "|" + settings.isoLevels() + "|" + settings.isoOpacity();
    if (!ck.equals(cutKey)) {
      cut(values, shown);
      cutKey = ck;
      changed = true;
    }
    if (changed) {
      version++;
    }
    return changed;
  }

  /** Increases whenever the geometry or colours change. */
  public int version() {
    return version;
  }

  private Optional<double[]> fieldValues() {
    Optional<FieldKind> f = settings.field();
    Optional<StoredRun> r = study.results();
    if (f.isEmpty() || r.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(FrameValues.nodal(r.get(), frame(r.get()), f.get(), study.geometry()));
  }

  private int frame(StoredRun r) {
    return Math.max(0, Math.min(settings.frame(), r.frameCount() - 1));
  }

  /**
   * The values the surface is coloured by: per tetrahedron for a per-element field (each triangle
   * flat in its tetrahedron's value, as that field is), else the nodal values.
   */
  private double[] surfaceValues(double[] nodal) {
    FieldKind f = settings.field().orElseThrow();
    if (!f.perElement) {
      return nodal;
    }
    StoredRun r = study.results().orElseThrow();
    return FrameValues.perElement(r, frame(r), f);
  }

  private void colourSurface(Optional<double[]> values) {
    int tris = surface.triangleCount();
    float[] colours = new float[9 * tris];
    float[] ramp = new float[3 * tris];
    if (values.isPresent()) {
      double[] v = surfaceValues(values.get());
      boolean perElement = settings.field().orElseThrow().perElement;
      if (settings.autoRange()) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double x : v) {
          if (settings.field().orElseThrow().isTime() && x < 0) {
            continue; // -1 means never: not part of the range
          }
          lo = Math.min(lo, x);
          hi = Math.max(hi, x);
        }
        if (!(hi >= lo)) {
          lo = 0;
          hi = 1;
        }
        if (hi - lo <= 1e-12 * Math.max(1, Math.abs(hi))) {
          hi = lo + Math.max(1e-12, Math.abs(lo) * 1e-6 + 1e-30);
        }
        low = lo;
        high = hi;
      } else {
        low = settings.low();
        high = settings.high();
      }
      boolean never = settings.field().orElseThrow().isTime();
      for (int t = 0; t < tris; t++) {
        for (int k = 0; k < 3; k++) {
          double x = v[perElement ? surface.tet(t) : surface.node(t, k)];
          ramp[3 * t + k] = never && x < 0 ? -1f : (float) clamp01((x - low) / (high - low));
          setColour(colours, 3 * t + k, 0x8c8c8c);
        }
      }
    } else {
      int[] own = settings.groupColours();
      for (int t = 0; t < tris; t++) {
        int g = surface.faceGroup(t);
        int rgb = g >= 0 && g < own.length ? own[g] : FaceGroupPalette.colourOf(g);
        for (int k = 0; k < 3; k++) {
          ramp[3 * t + k] = -1f;
          setColour(colours, 3 * t + k, rgb);
        }
      }
    }
    surfaceMesh = new Mesh(surfacePositions, surfaceNormals, colours, ramp);
  }

  private void cut(Optional<double[]> values, boolean[] shown) {
    isoMeshes.clear();
    sectionMesh = empty();
    if (settings.section().isEmpty() && (values.isEmpty() || settings.isoLevels().isEmpty())) {
      return; // nothing to cut: the time slider's usual case stays a recolouring
    }
    PartGeometry g = study.geometry();
    boolean[] include = new boolean[g.tetCount()];
    boolean all = true;
    for (int t = 0; t < include.length; t++) {
      int p = g.tetPart[t];
      include[t] = p >= shown.length || shown[p];
      all &= include[t];
    }
    boolean[] inc = all ? new boolean[0] : include;
    double[] carried = values.orElseGet(() -> new double[g.nodeCount()]);
    if (settings.section().isPresent()) {
      ViewSettings.Plane p = settings.section().get();
      TriangleSoup s =
          SectionCut.cut(
              g.xyz, g.tets, g.nodesPerTet, carried, p.nx(), p.ny(), p.nz(), p.offset(), inc);
      sectionMesh = soupMesh(s, values.isPresent(), 0xb9b9b9);
    }
    if (values.isPresent()) {
      for (double level : settings.isoLevels()) {
        TriangleSoup s = Isosurface.extract(g.xyz, g.tets, g.nodesPerTet, carried, level, inc);
        int rgb = ColourMap.ramp().colourOf(level, low, high);
        Mesh m = soupMesh(s, false, rgb);
        isoMeshes.add(m);
      }
    }
  }

  private Mesh soupMesh(TriangleSoup s, boolean mapped, int rgb) {
    double[] corners = s.corners();
    float[] colours = new float[3 * 3 * s.triangleCount()];
    float[] ramp = new float[3 * s.triangleCount()];
    double[] v = s.values();
    for (int i = 0; i < ramp.length; i++) {
      ramp[i] = mapped ? (float) clamp01((v[i] - low) / (high - low)) : -1f;
      setColour(colours, i, rgb);
    }
    return new Mesh(toFloat(corners), flatNormals(corners), colours, ramp);
  }

  private static double clamp01(double x) {
    return x < 0 ? 0 : x > 1 ? 1 : x;
  }

  private static void setColour(float[] out, int corner, int rgb) {
    out[3 * corner] = ((rgb >> 16) & 0xff) / 255f;
    out[3 * corner + 1] = ((rgb >> 8) & 0xff) / 255f;
    out[3 * corner + 2] = (rgb & 0xff) / 255f;
  }

  private static float[] toFloat(double[] d) {
    float[] f = new float[d.length];
    for (int i = 0; i < d.length; i++) {
      f[i] = (float) d[i];
    }
    return f;
  }

  /** The unit normal of each triangle, repeated at its three corners. */
  public static float[] flatNormals(double[] c) {
    float[] n = new float[c.length];
    for (int t = 0; t < c.length / 9; t++) {
      int o = 9 * t;
      double ax = c[o + 3] - c[o];
      double ay = c[o + 4] - c[o + 1];
      double az = c[o + 5] - c[o + 2];
      double bx = c[o + 6] - c[o];
      double by = c[o + 7] - c[o + 1];
      double bz = c[o + 8] - c[o + 2];
      double x = ay * bz - az * by;
      double y = az * bx - ax * bz;
      double z = ax * by - ay * bx;
      double len = Math.sqrt(x * x + y * y + z * z);
      if (len > 0) {
        x /= len;
        y /= len;
        z /= len;
      }
      for (int k = 0; k < 3; k++) {
        n[o + 3 * k] = (float) x;
        n[o + 3 * k + 1] = (float) y;
        n[o + 3 * k + 2] = (float) z;
      }
    }
    return n;
  }

  public Study study() {
    return study;
  }

  public ViewSettings settings() {
    return settings;
  }

  public BoundarySurface surface() {
    return surface;
  }

  public Mesh surfaceMesh() {
    return surfaceMesh;
  }

  /** Surfaces above this many triangles get a reduced copy for drawing while the view moves. */
  public static final int REDUCE_ABOVE = 20_000;

  private static final int REDUCED_CELLS = 40;
  private Mesh reduced;
  private int reducedVersion = -1;

  /**
   * The surface to draw while the view moves: a vertex-clustered copy for big surfaces, the surface
   * itself for small ones.
   */
  public Mesh movingSurfaceMesh() {
    if (surfaceMesh.triangleCount() <= REDUCE_ABOVE) {
      return surfaceMesh;
    }
    if (reducedVersion != version) {
      reduced = ReducedSurface.of(surfaceMesh, REDUCED_CELLS);
      reducedVersion = version;
    }
    return reduced;
  }

  public Mesh sectionMesh() {
    return sectionMesh;
  }

  public List<Mesh> isoMeshes() {
    return List.copyOf(isoMeshes);
  }

  /** Lower colour limit in use. */
  public double low() {
    return low;
  }

  /** Upper colour limit in use. */
  public double high() {
    return high;
  }

  /** The surface triangle under pixel (px, py) of the camera's picture, if any. */
  public Optional<PickIndex.Hit> pick(OrbitCamera camera, double px, double py) {
    double[] r = camera.ray(px, py);
    if (picker == null) {
      picker = new PickIndex(surfaceCorners);
    }
    Optional<PickIndex.Hit> hit = picker.pick(r[0], r[1], r[2], r[3], r[4], r[5]);
    if (hit.isPresent() && settings.section().isPresent()) {
      // the surface beyond the section plane is clipped away: nothing shows there
      ViewSettings.Plane p = settings.section().get();
      double s = hit.get().distance();
      double x = r[0] + s * r[3];
      double y = r[1] + s * r[4];
      double z = r[2] + s * r[5];
      if (p.nx() * x + p.ny() * y + p.nz() * z > p.offset()) {
        return Optional.empty();
      }
    }
    return hit;
  }

  /** Words for what is under the cursor: the face group and the part. */
  public String describe(PickIndex.Hit hit) {
    PartGeometry g = study.geometry();
    int t = hit.triangle();
    int fg = surface.faceGroup(t);
    String group = fg >= 0 ? "face group " + g.faceGroupNames().get(fg) : "inner face";
    return group + ", part " + g.partNames().get(surface.part(t));
  }
}
