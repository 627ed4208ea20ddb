package dev.soakfield.fem.run;

import dev.soakfield.mesh.TetMesh;
import java.util.Locale;

/**
 * How much Java heap a run will need, from the mesh alone, so a run that cannot fit is refused
 * before it starts instead of failing hours in.
 *
 * <p>Linear: about 900 bytes per tetrahedron, the peak heap measured end to end by {@code soakfield
 * bench run}. Quadratic: measured here as the smallest heap a whole run completes in, on a 24³-cell
 * box (82 944 tetrahedra, 10 fixed steps, results written): between 50 and 60 MB linear and between
 * 400 and 450 MB quadratic, a ratio of about 7.7 (eight times the nodes, four times the non-zeros
 * per row, 10-node element tables), hence about 5 200 bytes per quadratic tetrahedron. A quarter on
 * top covers the collector's headroom; the estimate errs on the generous side for linear runs
 * (about twice the smallest heap that works).
 */
public record MemoryEstimate(long tets, int order, long bytes) {
  /** Measured peak heap per linear tetrahedron, end to end (bytes). */
  public static final long LINEAR_BYTES_PER_TET = 900;

  /** Measured peak heap per quadratic tetrahedron, end to end (bytes). */
  public static final long QUADRATIC_BYTES_PER_TET = 5200;

  /** The JVM, class metadata held in heap, the case and small tables. */
  static final long BASE_BYTES = 32L << 20;

  /** Heap the collector needs beyond the live data (common practice: a quarter). */
  static final double MARGIN = 1.25;

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
            "the run needs about %s of Java heap (%d %s tetrahedra at ~%d bytes each, plus"
                + " headroom), but the heap is limited to %s; raise it, e.g."
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
