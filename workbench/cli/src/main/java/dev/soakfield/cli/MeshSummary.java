package dev.soakfield.cli;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.MeshQuality;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import dev.soakfield.mesh.topo.MeshGeometry;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The figures {@code info} reports about one imported mesh, as text or as a JSON tree. */
final class MeshSummary {
  private final String file;
  private final MeshImport imported;
  private final int[] tetsPerGroup;
  private final int[] facesPerGroup;
  private final double[] volumes;
  private final double[] areas;
  private final double[] box;

  private MeshSummary(String file, MeshImport imported) {
    this.file = file;
    this.imported = imported;
    TetMesh m = imported.mesh();
    tetsPerGroup = new int[m.volumeGroups().size()];
    for (int t = 0; t < m.tetCount(); t++) {
      tetsPerGroup[m.tetGroup(t)]++;
    }
    facesPerGroup = new int[m.faceGroups().size()];
    for (int f = 0; f < m.faceCount(); f++) {
      facesPerGroup[m.faceGroup(f)]++;
    }
    volumes = MeshGeometry.groupVolumes(m);
    areas = MeshGeometry.groupAreas(m);
    box = MeshGeometry.boundingBox(m);
  }

  static MeshSummary of(String file, MeshImport imported) {
    return new MeshSummary(file, imported);
  }

  /** Plain maps and lists, in a fixed key order, for Jackson to print. */
  Map<String, Object> toTree() {
    TetMesh m = imported.mesh();
    Map<String, Object> root = new LinkedHashMap<>();
    root.put("file", file);
    root.put("nodes", m.nodeCount());
    root.put("tets", m.tetCount());
    root.put("order", m.order());
    root.put("nodes_per_tet", m.nodesPerTet());
    root.put("faces", m.faceCount());
    List<Object> vgs = new ArrayList<>();
    for (int i = 0; i < m.volumeGroups().size(); i++) {
      VolumeGroup g = m.volumeGroups().get(i);
      Map<String, Object> e = new LinkedHashMap<>();
      e.put("name", g.name());
      e.put("tag", g.tag());
      e.put("tets", tetsPerGroup[i]);
      e.put("volume_m3", volumes[i]);
      vgs.add(e);
    }
    root.put("volume_groups", vgs);
    List<Object> fgs = new ArrayList<>();
    for (int i = 0; i < m.faceGroups().size(); i++) {
      FaceGroup g = m.faceGroups().get(i);
      Map<String, Object> e = new LinkedHashMap<>();
      e.put("name", g.name());
      e.put("tag", g.tag());
      e.put("kind", g.kind().name().toLowerCase(Locale.ROOT));
      e.put("faces", facesPerGroup[i]);
      e.put("area_m2", areas[i]);
      fgs.add(e);
    }
    root.put("face_groups", fgs);
    Map<String, Object> bb = new LinkedHashMap<>();
    bb.put("min_m", List.of(box[0], box[1], box[2]));
    bb.put("max_m", List.of(box[3], box[4], box[5]));
    root.put("bounding_box", bb);
    MeshQuality q = imported.report().quality();
    Map<String, Object> quality = new LinkedHashMap<>();
    quality.put("min_dihedral_deg", q.minDihedralDeg());
    quality.put("max_dihedral_deg", q.maxDihedralDeg());
    quality.put("min_volume_ratio", q.minVolumeRatio());
    quality.put("volume_ratio_histogram", q.volumeRatioHistogram());
    root.put("quality", quality);
    List<Object> findings = new ArrayList<>();
    for (MeshFinding f : imported.report().findings()) {
      Map<String, Object> e = new LinkedHashMap<>();
      e.put("severity", f.severity().name().toLowerCase(Locale.ROOT));
      e.put("code", f.code());
      e.put("message", f.message());
      findings.add(e);
    }
    root.put("findings", findings);
    return root;
  }

  void printText(PrintWriter out) {
    TetMesh m = imported.mesh();
    out.printf(Locale.ROOT, "mesh          %s%n", file);
    out.printf(Locale.ROOT, "nodes         %d%n", m.nodeCount());
    out.printf(
        Locale.ROOT,
        "tetrahedra    %d (%d-node, %s)%n",
        m.tetCount(),
        m.nodesPerTet(),
        m.order() == 1 ? "linear" : "quadratic");
    out.printf(
        Locale.ROOT,
        "bounding box  x %s .. %s, y %s .. %s, z %s .. %s m%n",
        num(box[0]),
        num(box[3]),
        num(box[1]),
        num(box[4]),
        num(box[2]),
        num(box[5]));
    out.println();
    out.printf(Locale.ROOT, "%-24s %6s %10s %14s%n", "volume group", "tag", "tets", "volume [m3]");
    for (int i = 0; i < m.volumeGroups().size(); i++) {
      VolumeGroup g = m.volumeGroups().get(i);
      out.printf(
          Locale.ROOT,
          "%-24s %6d %10d %14s%n",
          g.name(),
          g.tag(),
          tetsPerGroup[i],
          num(volumes[i]));
    }
    out.println();
    out.printf(
        Locale.ROOT,
        "%-24s %6s %-9s %10s %14s%n",
        "face group",
        "tag",
        "kind",
        "faces",
        "area [m2]");
    for (int i = 0; i < m.faceGroups().size(); i++) {
      FaceGroup g = m.faceGroups().get(i);
      out.printf(
          Locale.ROOT,
          "%-24s %6d %-9s %10d %14s%n",
          g.name(),
          g.tag(),
          g.kind().name().toLowerCase(Locale.ROOT),
          facesPerGroup[i],
          num(areas[i]));
    }
    MeshQuality q = imported.report().quality();
    out.println();
    out.printf(
        Locale.ROOT,
        "quality       dihedral angles %.2f .. %.2f deg, smallest volume ratio %.3f%n",
        q.minDihedralDeg(),
        q.maxDihedralDeg(),
        q.minVolumeRatio());
    out.print("volume ratio  ");
    int[] h = q.volumeRatioHistogram();
    for (int i = 0; i < h.length; i++) {
      out.printf(
          Locale.ROOT, "%s%.1f-%.1f: %d", i == 0 ? "" : ", ", i / 10.0, (i + 1) / 10.0, h[i]);
    }
    out.println();
    List<MeshFinding> findings = imported.report().findings();
    out.println();
    if (findings.isEmpty()) {
      out.println("findings      none");
    }
    for (MeshFinding f : findings) {
      out.printf(
          Locale.ROOT,
          "%-8s %s: %s%n",
          f.severity().name().toLowerCase(Locale.ROOT),
          f.code(),
          f.message());
    }
  }

  /** Six significant digits without trailing zeros: 0.012, 5.4e-07, 0. */
  static String num(double v) {
    if (v == 0) {
      return "0";
    }
    String s = String.format(Locale.ROOT, "%.6g", v);
    int e = s.indexOf('e');
    String mantissa = e < 0 ? s : s.substring(0, e);
    String exponent = e < 0 ? "" : s.substring(e);
    if (mantissa.contains(".")) {
      mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
    return mantissa + exponent;
  }
}
