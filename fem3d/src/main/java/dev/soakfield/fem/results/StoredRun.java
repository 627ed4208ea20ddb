package dev.soakfield.fem.results;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.vtk.PvdEntry;
import dev.soakfield.mesh.vtk.PvdReader;
import dev.soakfield.mesh.vtk.VtuGrid;
import dev.soakfield.mesh.vtk.VtuReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A finished result folder read back, the typed view that reports, export and the workbench share:
 * the mesh the run used (for the face groups, which the field files do not hold), the frames listed
 * in fields.pvd (read when first asked for, a few kept), the series ({@link Series}) and
 * summary.json. {@link ResultFolder} is the same folder while a run writes it.
 */
public final class StoredRun {
  private static final int FIELDS_KEPT = 8;

  private final Path folder;
  private final TetMesh mesh;
  private final List<PvdEntry> frames;
  private final Optional<Series> series;
  private final Optional<JsonNode> summary;
  private final Map<String, double[]> cache =
      new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<String, double[]> e) {
          return size() > FIELDS_KEPT;
        }
      };

  private StoredRun(
      Path folder,
      TetMesh mesh,
      List<PvdEntry> frames,
      Optional<Series> series,
      Optional<JsonNode> summary) {
    this.folder = folder;
    this.mesh = mesh;
    this.frames = frames;
    this.series = series;
    this.summary = summary;
  }

  /** True when {@code dir} looks like a result folder (it holds fields.pvd). */
  public static boolean isResultFolder(Path dir) {
    return Files.isRegularFile(dir.resolve(ResultFiles.FIELDS));
  }

  /**
   * Opens a result folder.
   *
   * @throws MeshInputException when fields.pvd, the mesh or a file they name is missing or does not
   *     fit the others (the message names the file)
   * @throws ResultFolderException when series.csv holds a bad cell (file, line and column)
   */
  public static StoredRun open(Path folder) {
    Optional<JsonNode> summary = readSummary(folder.resolve(ResultFiles.SUMMARY));
    Path meshFile = meshFile(folder, summary);
    return open(folder, summary, MeshAsRun.read(meshFile, summary), "the mesh " + meshFile);
  }

  /**
   * Opens a result folder whose run's mesh is already in memory: the run itself, making its report,
   * need not read back and check the mesh it has just worked on.
   *
   * @throws MeshInputException as {@link #open(Path)}, and when the frames do not fit {@code mesh}
   */
  public static StoredRun open(Path folder, TetMesh mesh) {
    return open(
        folder, readSummary(folder.resolve(ResultFiles.SUMMARY)), mesh, "the run's mesh in memory");
  }

  private static StoredRun open(
      Path folder, Optional<JsonNode> summary, TetMesh mesh, String meshName) {
    Path pvd = folder.resolve(ResultFiles.FIELDS);
    List<PvdEntry> frames = PvdReader.read(pvd);
    StoredRun r =
        new StoredRun(
            folder,
            mesh,
            frames,
            Files.isRegularFile(folder.resolve(ResultFiles.SERIES))
                ? Optional.of(Series.read(folder.resolve(ResultFiles.SERIES)))
                : Optional.empty(),
            summary);
    VtuReader.Outline first = VtuReader.outline(r.framePath(0));
    if (first.points() != mesh.nodeCount() || first.cells() != mesh.tetCount()) {
      throw new MeshInputException(
          r.framePath(0).toString(),
          "",
          first.points() + " points and " + first.cells() + " cells",
          "the "
              + mesh.nodeCount()
              + " nodes and "
              + mesh.tetCount()
              + " tetrahedra of "
              + meshName);
    }
    return r;
  }

  private static Path meshFile(Path folder, Optional<JsonNode> summary) {
    Path local = folder.resolve(ResultFiles.MESH_COPY);
    if (Files.isRegularFile(local)) {
      return local;
    }
    String named = summary.map(s -> s.path("mesh").path("file").asText("")).orElse("");
    if (named.isEmpty()) {
      throw new MeshInputException(
          folder.toString(),
          "",
          "neither mesh.msh nor a mesh.file entry in summary.json",
          "the mesh the run used (face groups are not in the field files)");
    }
    Path p = Path.of(named);
    if (!p.isAbsolute() && !Files.isRegularFile(p)) {
      p = folder.resolve(named);
    }
    if (!Files.isRegularFile(p)) {
      throw new MeshInputException(
          folder.resolve(ResultFiles.SUMMARY).toString(),
          "mesh.file",
          "'" + named + "', which does not exist",
          "the mesh the run used; copy it into the result folder as mesh.msh");
    }
    return p;
  }

  /** summary.json of a result folder, when there is one. */
  static Optional<JsonNode> readSummary(Path file) {
    if (!Files.isRegularFile(file)) {
      return Optional.empty();
    }
    try {
      return Optional.of(new ObjectMapper().readTree(file.toFile()));
    } catch (IOException e) {
      throw new MeshInputException(
          file.toString(), "", "unreadable JSON (" + e.getMessage() + ")", ResultFiles.SUMMARY);
    }
  }

  public Path folder() {
    return folder;
  }

  public TetMesh mesh() {
    return mesh;
  }

  public int frameCount() {
    return frames.size();
  }

  public double time(int frame) {
    return frames.get(frame).time();
  }

  /** The frame whose time is nearest {@code t}. */
  public int frameNear(double t) {
    int best = 0;
    for (int i = 1; i < frames.size(); i++) {
      if (Math.abs(frames.get(i).time() - t) < Math.abs(frames.get(best).time() - t)) {
        best = i;
      }
    }
    return best;
  }

  public Optional<Series> series() {
    return series;
  }

  /** The units the run's outputs are in (c and c*m^3 when its case declared none). */
  public ResultUnits units() {
    return summary.map(ResultUnits::of).orElse(ResultUnits.UNDECLARED);
  }

  /** The threshold of the run, if it had one. */
  public Optional<Double> threshold() {
    return summary
        .map(s -> s.path("threshold").path("value"))
        .filter(JsonNode::isNumber)
        .map(JsonNode::asDouble);
  }

  private Path framePath(int frame) {
    return folder.resolve(frames.get(frame).relativeFile());
  }

  /** The point fields the frames hold (those of the first frame), in file order. */
  public List<String> pointFieldNames() {
    return VtuReader.outline(framePath(0)).pointFields();
  }

  /** The cell (per-element) fields the frames hold (those of the first frame), in file order. */
  public List<String> cellFieldNames() {
    return VtuReader.outline(framePath(0)).cellFields();
  }

  /** The whole grid of one frame (its mesh and every field), read from its file. */
  public VtuGrid frame(int frame) {
    return VtuReader.read(framePath(frame));
  }

  /**
   * The nodal field of one frame, by its name in the frame files ("c", "phi", ...); only that array
   * is read from the file, and the last few read are kept.
   *
   * @throws MeshInputException when the frame's file lacks it
   */
  public synchronized double[] field(int frame, String fieldName) {
    return cache.computeIfAbsent(
        frame + "/" + fieldName, k -> VtuReader.pointField(framePath(frame), fieldName));
  }

  /**
   * The per-element field of one frame, one value per tetrahedron in mesh order; read and kept as
   * {@link #field}.
   *
   * @throws MeshInputException when the frame's file lacks it
   */
  public synchronized double[] cellField(int frame, String fieldName) {
    return cache.computeIfAbsent(
        frame + "/cell/" + fieldName, k -> VtuReader.cellField(framePath(frame), fieldName));
  }
}
