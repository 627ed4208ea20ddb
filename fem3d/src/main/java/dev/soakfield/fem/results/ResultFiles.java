package dev.soakfield.fem.results;

/**
 * The names of the files in a result folder, in one place: this package writes and reads them; code
 * elsewhere asks {@link StoredRun}, {@link Series} or {@link ResultFolder} rather than opening them
 * itself.
 */
public final class ResultFiles {
  private ResultFiles() {}

  /** One row of numbers per accepted step ({@link SeriesWriter}, {@link Series}). */
  public static final String SERIES = "series.csv";

  /** What the run reports about itself: balance, solver, thresholds, warnings. */
  public static final String SUMMARY = "summary.json";

  /** The run's status and the files it wrote ({@link RunManifest}). */
  public static final String MANIFEST = "manifest.json";

  /** The list of field frames, each a VTU file under {@code fields/}. */
  public static final String FIELDS = "fields.pvd";

  /** The state a later run can start from ({@link StateFile}). */
  public static final String FINAL_STATE = StateFile.NAME;

  /** The state of a run that can be resumed ({@link StateBundle}). */
  public static final String CHECKPOINT = "checkpoint.bin";

  /** The mesh the run used, copied so the folder stands alone. */
  public static final String MESH_COPY = "mesh.msh";

  /** The case the run used, copied so the folder stands alone. */
  public static final String CASE_COPY = "case.json";
}
