package dev.soakfield.fem.assembly;

import dev.soakfield.fem.element.TetKernel;
import dev.soakfield.fem.element.TriangleKernel;
import java.util.Arrays;
import java.util.Objects;

/**
 * Assembles the matrices and vectors of the diffusion problem on a {@link FeSpace}: stiffness,
 * capacity (consistent or lumped), exchange-face mass, face and volume loads, and integrals.
 *
 * <p>The CSR pattern, a greedy colouring of blocks of consecutive tetrahedra and the element-to-CSR
 * position maps are built once here. Tetrahedron terms are assembled colour by colour, the blocks
 * of each colour split over the threads; since no two blocks of a colour share a node, no locks are
 * needed and every entry receives its contributions in the same order whatever the number of
 * threads, so results are identical bit for bit. Instances are safe to use from one thread at a
 * time.
 */
public final class SystemAssembler {
  /** Below this many tetrahedra one thread does all the work. */
  private static final int PARALLEL_TETS = 20_000;

  private final FeSpace space;
  private final int threads;
  // the pattern alone: a matrix of it would hold a values array nobody reads (30 MB at 1.5M tets)
  private final int[] rowStart;
  private final int[] cols;
  private final TetColouring colouring;
  private final ScatterMap tetPos;
  private final ScatterMap facePos;

  /** Builds the CSR pattern, colouring and position maps once from the connectivity. */
  public SystemAssembler(FeSpace space) {
    this(
        space,
        Objects.requireNonNull(space, "space").mesh().tetCount() < PARALLEL_TETS
            ? 1
            : Runtime.getRuntime().availableProcessors(),
        ParallelRanges.MIN_RANGE,
        TetColouring.BLOCK);
  }

  /**
   * With a given number of threads, smallest part per thread (set-up loops) and tetrahedra per
   * colouring block (tests compare one thread against several on small meshes).
   */
  SystemAssembler(FeSpace space, int threads, int minPart, int blockSize) {
    this.space = Objects.requireNonNull(space, "space");
    if (threads < 1 || minPart < 1) {
      throw new IllegalArgumentException(
          "threads and minPart must be at least 1, got " + threads + " and " + minPart);
    }
    this.threads = threads;
    checkOrientation(space);
    CsrMatrix pattern = SparsityPattern.build(space, threads, minPart);
    this.rowStart = pattern.rowStart();
    this.cols = pattern.cols();
    this.colouring =
        TetColouring.of(space.tetNodes(), space.nodesPerTet(), space.dofCount(), blockSize);
    this.tetPos =
        ScatterMap.build(pattern, space.tetNodes(), space.nodesPerTet(), threads, minPart);
    this.facePos =
        ScatterMap.build(pattern, space.faceNodes(), space.nodesPerFace(), threads, minPart);
  }

  public FeSpace space() {
    return space;
  }

  /** A matrix with all values zero on the shared pattern. */
  public CsrMatrix newMatrix() {
    return new CsrMatrix(space.dofCount(), rowStart, cols);
  }

  /** Number of colours of the block colouring (for reports). */
  int colourCount() {
    return colouring.colourCount();
  }

  /**
   * target += scale * K, K_ij = Σ_tets ∫ ∇N_i · T_t ∇N_j dV with the symmetric tensor T_t of tet t
   * given as 6 numbers per tet (xx, yy, zz, xy, yz, zx). For isotropic D·S pass (v, v, v, 0, 0, 0).
   */
  public void addStiffness(CsrMatrix target, double[] tensorPerTet, double scale) {
    checkPattern(target);
    checkLength("tensorPerTet", tensorPerTet, 6L * space.mesh().tetCount());
    double[] values = target.values();
    forEachTet(
        (kernel, t, x, ke) -> {
          kernel.stiffness(x, tensorPerTet, 6 * t, ke);
          scatterMatrix(values, t, ke, scale);
        });
  }

  /**
   * target += scale * M, M_ij = Σ_tets coef_t ∫ N_i N_j dV (consistent) or its lumped diagonal (row
   * sum for linear tetrahedra; diagonal scaling (HRZ) for quadratic ones, all positive).
   */
  public void addCapacity(CsrMatrix target, double[] coefPerTet, boolean lumped, double scale) {
    checkPattern(target);
    checkLength("coefPerTet", coefPerTet, space.mesh().tetCount());
    double[] values = target.values();
    if (lumped) {
      forEachTet(
          (kernel, t, x, ke) -> {
            kernel.lumpedMass(x, ke);
            tetPos.addDiagonal(values, t, ke, scale * coefPerTet[t]);
          });
    } else {
      forEachTet(
          (kernel, t, x, ke) -> {
            kernel.mass(x, ke);
            scatterMatrix(values, t, ke, scale * coefPerTet[t]);
          });
    }
  }

  /** target += scale * Σ over the given faces of coef_f ∫ N_i N_j dS (mesh face indices). */
  public void addFaceMass(CsrMatrix target, int[] faces, double[] coefPerFace, double scale) {
    checkPattern(target);
    checkFaces(faces);
    checkLength("coefPerFace", coefPerFace, faces.length);
    double[] values = target.values();
    int per = space.nodesPerFace();
    int nn = per * per;
    TriangleKernel kernel = TriangleKernel.forOrder(space.order());
    double[] x = new double[3 * per];
    double[] me = new double[nn];
    for (int k = 0; k < faces.length; k++) {
      int f = faces[k];
      FeSpace.gather(space.coordinates(), space.faceNodes(), f, per, x);
      kernel.mass(x, me);
      facePos.add(values, f, me, scale * coefPerFace[k]);
    }
  }

  /** rhs += scale * Σ over faces of value_f ∫ N_i dS. */
  public void addFaceLoad(double[] rhs, int[] faces, double[] valuePerFace, double scale) {
    checkLength("rhs", rhs, space.dofCount());
    checkFaces(faces);
    checkLength("valuePerFace", valuePerFace, faces.length);
    int per = space.nodesPerFace();
    int[] conn = space.faceNodes();
    TriangleKernel kernel = TriangleKernel.forOrder(space.order());
    double[] x = new double[3 * per];
    double[] fe = new double[per];
    for (int k = 0; k < faces.length; k++) {
      int f = faces[k];
      FeSpace.gather(space.coordinates(), conn, f, per, x);
      kernel.load(x, fe);
      double s = scale * valuePerFace[k];
      for (int i = 0; i < per; i++) {
        rhs[conn[f * per + i]] += s * fe[i];
      }
    }
  }

  /** rhs += scale * Σ over tets of value_t ∫ N_i dV. */
  public void addVolumeLoad(double[] rhs, double[] valuePerTet, double scale) {
    checkLength("rhs", rhs, space.dofCount());
    checkLength("valuePerTet", valuePerTet, space.mesh().tetCount());
    int per = space.nodesPerTet();
    int[] conn = space.tetNodes();
    forEachTet(
        (kernel, t, x, fe) -> {
          kernel.load(x, fe);
          double s = scale * valuePerTet[t];
          for (int i = 0; i < per; i++) {
            rhs[conn[t * per + i]] += s * fe[i];
          }
        });
  }

  /** ∫ w_t u dV over the tets of each volume group, u nodal: result[g]. */
  public double[] integratePerGroup(double[] u, double[] weightPerTet) {
    checkLength("u", u, space.dofCount());
    int tetCount = space.mesh().tetCount();
    checkLength("weightPerTet", weightPerTet, tetCount);
    double[] result = new double[space.mesh().volumeGroups().size()];
    int per = space.nodesPerTet();
    int[] conn = space.tetNodes();
    TetKernel kernel = TetKernel.forOrder(space.order());
    double[] x = new double[3 * per];
    double[] fe = new double[per];
    for (int t = 0; t < tetCount; t++) {
      FeSpace.gather(space.coordinates(), conn, t, per, x);
      kernel.load(x, fe);
      double s = 0;
      for (int i = 0; i < per; i++) {
        s += fe[i] * u[conn[t * per + i]];
      }
      result[space.mesh().tetGroup(t)] += weightPerTet[t] * s;
    }
    return result;
  }

  /**
   * The sorted, unique dofs on the given faces (corner and mid-edge nodes), for Dirichlet faces.
   */
  public int[] faceDofs(int[] faces) {
    checkFaces(faces);
    int per = space.nodesPerFace();
    int[] conn = space.faceNodes();
    int[] all = new int[faces.length * per];
    for (int k = 0; k < faces.length; k++) {
      System.arraycopy(conn, faces[k] * per, all, k * per, per);
    }
    Arrays.sort(all);
    int unique = 0;
    for (int k = 0; k < all.length; k++) {
      if (k == 0 || all[k] != all[k - 1]) {
        all[unique++] = all[k];
      }
    }
    return Arrays.copyOf(all, unique);
  }

  /** One element's work; x holds its node coordinates, scratch n × n doubles. */
  private interface TetBody {
    void apply(TetKernel kernel, int tet, double[] x, double[] scratch);
  }

  private void forEachTet(TetBody body) {
    int per = space.nodesPerTet();
    double[] xyz = space.coordinates();
    int[] conn = space.tetNodes();
    for (int c = 0; c < colouring.colourCount(); c++) {
      ParallelRanges.run(
          colouring.colourStart(c),
          colouring.colourStart(c + 1),
          threads,
          1,
          (from, to) -> {
            TetKernel kernel = TetKernel.forOrder(space.order());
            double[] x = new double[3 * per];
            double[] scratch = new double[per * per];
            for (int k = from; k < to; k++) {
              int b = colouring.block(k);
              for (int t = colouring.firstTet(b); t < colouring.endTet(b); t++) {
                FeSpace.gather(xyz, conn, t, per, x);
                body.apply(kernel, t, x, scratch);
              }
            }
          });
    }
  }

  private void scatterMatrix(double[] values, int t, double[] ke, double scale) {
    tetPos.add(values, t, ke, scale);
  }

  private void checkPattern(CsrMatrix target) {
    Objects.requireNonNull(target, "target");
    if (target.cols() != cols
        && !(Arrays.equals(target.rowStart(), rowStart) && Arrays.equals(target.cols(), cols))) {
      throw new IllegalArgumentException(
          "target matrix does not have this assembler's pattern (make it with newMatrix())");
    }
  }

  private void checkFaces(int[] faces) {
    Objects.requireNonNull(faces, "faces");
    int count = space.mesh().faceCount();
    for (int k = 0; k < faces.length; k++) {
      if (faces[k] < 0 || faces[k] >= count) {
        throw new IllegalArgumentException(
            "faces[" + k + "] = " + faces[k] + " is not a face index (0.." + (count - 1) + ")");
      }
    }
  }

  private static void checkLength(String name, double[] a, long expected) {
    Objects.requireNonNull(a, name);
    if (a.length != expected) {
      throw new IllegalArgumentException(
          name + " has " + a.length + " entries, expected " + expected);
    }
  }

  /** Inverted or flat tetrahedra would give infinite gradients: refuse them with their index. */
  private static void checkOrientation(FeSpace space) {
    int per = space.nodesPerTet();
    double[] x = new double[12];
    double[] xyz = space.coordinates();
    int[] conn = space.tetNodes();
    int tetCount = space.mesh().tetCount();
    TetKernel corners = TetKernel.forOrder(1); // the straight tet through the four corners
    for (int t = 0; t < tetCount; t++) {
      for (int k = 0; k < 4; k++) {
        int p = 3 * conn[t * per + k];
        x[3 * k] = xyz[p];
        x[3 * k + 1] = xyz[p + 1];
        x[3 * k + 2] = xyz[p + 2];
      }
      double v = corners.volume(x);
      if (!(v > 0)) {
        throw new IllegalArgumentException(
            "tetrahedron " + t + " has corner volume " + v + " (expected positive orientation)");
      }
    }
  }
}
