package dev.soakfield.fem.element;

/**
 * Face matrices and vectors of one 3- or 6-node triangle in 3D, for exchange (Robin) and flux
 * (Neumann) faces. Coordinates come as x[3 i + axis]. Instances keep scratch: one per thread.
 */
public interface TriangleKernel {
  /** The kernel for 3-node (order 1) or 6-node (order 2) triangles. */
  static TriangleKernel forOrder(int order) {
    TetBasis.checkOrder(order);
    return order == 1 ? new LinearTriangleKernel() : new QuadraticTriangleKernel();
  }

  /** Nodes per face: 3 or 6. */
  int nodeCount();

  /** out[n i + j] = ∫ N_i N_j dS. */
  void mass(double[] x, double[] out);

  /** out[i] = ∫ N_i dS. */
  void load(double[] x, double[] out);

  /** The area of the face. */
  double area(double[] x);
}
