package dev.soakfield.fem.run;

import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.mesh.TetMesh;
import java.util.Locale;

/**
 * How much Java heap a run will need, from the mesh alone, so a run that cannot fit is refused
 * before it starts instead of failing hours in.
 *
 * <p>Linear: 400 bytes per tetrahedron. The smallest heap a whole run of the 64³-cell box of {@code
 * soakfield bench run} (1.57M tetrahedra, 100 fixed steps, frames, the report and its pictures)
 * completed in lies between 450 and 520 MiB: 300 to 347 bytes per tetrahedron. Quadratic: measured
 * here as the smallest heap a whole run completes in, on a 24³-cell box (82 944 tetrahedra, 10
 * fixed steps, results written): between 50 and 60 MB linear and between 400 and 450 MB quadratic,
 * a ratio of about 7.7 (eight times the nodes, four times the non-zeros per row, 10-node element
 * tables), hence about 5 200 bytes per quadratic tetrahedron, measured before the matrices and
 * tables were trimmed and so generous now. A quarter on top covers the collector's headroom.
 *
 * <p>A case adds its series, which the report reads whole: every column (probes, per-group and
 * per-face columns) for every step. Measured on the sample case (1 521 nodes, about 111 steps):
 * with 20 000 probes the smallest heap that completes is between 100 and 110 MB against under 48 MB
 * with two, about 4 kB per probe, which this splits into {@link #PROBE_BYTES} fixed (name, place,
 * the summary's entries) and {@link #SERIES_BYTES_PER_VALUE} per step (the value as read and as
 * written). 600 outputs ran in the same 48 MB as three: {@link #OUTPUT_BYTES} is a generous upper
 * figure for their summary entries.
 */
public record MemoryEstimate(long tets, int order, long bytes) {
  /** Heap per linear tetrahedron, end to end, from the smallest heap measured (bytes). */
  public static final long LINEAR_BYTES_PER_TET = 400;

  /** Measured peak heap per quadratic tetrahedron, end to end (bytes). */
  public static final long QUADRATIC_BYTES_PER_TET = 5200;

  /** The JVM, class metadata held in heap, the case and small tables. */
  static final long BASE_BYTES = 32L << 20;

  /** Heap the collector needs beyond the live data (common practice: a quarter). */
  static final double MARGIN = 1.25;

  /** Fixed heap per probe: its name, place and element, and its entries in summary.json (bytes). */
  static final long PROBE_BYTES = 2048;

  /** Heap per series value (one column, one step), as written and as read back (bytes). */
  static final long SERIES_BYTES_PER_VALUE = 16;

  /** Heap per output time: its entries in the summary (bytes). */
  static final long OUTPUT_BYTES = 1024;

  /** Series columns besides the probes: time, amounts, balance and so on (common practice). */
  static final int FIXED_COLUMNS = 8;

  /**
   * The estimate for the case's run: the mesh's share (see {@link #of(TetMesh, int)}) plus its
   * series (probes, volume and face groups, for the estimated steps) and outputs.
   */
  public static MemoryEstimate of(CaseSpec spec, TetMesh mesh) {
    long steps = RunTimeEstimate.of(spec, mesh).steps();
    long probes = spec.probes().size();
    long columns =
        FIXED_COLUMNS
            + probes
            + 3L * mesh.volumeGroups().size()
            + 2L * mesh.faceGroups().size()
            + spec.thresholds().size();
    long caseBytes =
        probes * PROBE_BYTES
            + columns * steps * SERIES_BYTES_PER_VALUE
            + spec.time().outputs().size() * OUTPUT_BYTES;
    MemoryEstimate meshOnly = of(mesh, mesh.order());
    return new MemoryEstimate(
        meshOnly.tets(), meshOnly.order(), meshOnly.bytes() + (long) (MARGIN * caseBytes));
  }

  /** The estimate for {@code mesh} run with elements of {@code order} (1 or 2). */
  public static MemoryEstimate of(TetMesh mesh, int order) {
    long tets = mesh.tetCount();
    long per = order == 2 ? QUADRATIC_BYTES_PER_TET : LINEAR_BYTES_PER_TET;
    long bytes = (long) (MARGIN * (BASE_BYTES + per * tets));
    return new MemoryEstimate(tets, order, bytes);
  }

  /**
   * Refuses when {@code maxHeap} is below the estimate.
   *
   * @throws HeapTooSmallException naming the estimate, the heap and how to raise it
   */
  public void requireHeap(long maxHeap) {
    if (maxHeap >= bytes) {
      return;
    }
    long suggestMb = (long) Math.ceil(bytes * 1.2 / (1 << 20));
    throw new HeapTooSmallException(
        String.format(
            Locale.ROOT,
            "the run needs about %s of Java heap (%d %s tetrahedra at ~%d bytes each, plus the"
                + " series and headroom), but the heap is limited to %s; raise it, e.g."
                + " JAVA_OPTS=-Xmx%dm ./soakfield run ..., or use a coarser mesh",
            megabytes(bytes),
            tets,
            order == 2 ? "quadratic" : "linear",
            order == 2 ? QUADRATIC_BYTES_PER_TET : LINEAR_BYTES_PER_TET,
            megabytes(maxHeap),
            suggestMb));
  }

  /** Bytes as MB or GB for people. */
  public static String megabytes(long bytes) {
    double mb = bytes / (double) (1 << 20);
    return mb >= 1024
        ? String.format(Locale.ROOT, "%.1f GB", mb / 1024)
        : String.format(Locale.ROOT, "%.0f MB", mb);
  }
}
