package dev.soakfield.fem.element;

/**
 * Element matrices and vectors of one tetrahedron. Coordinates come as x[3 i + axis] for node i in
 * MSH order; element matrices are n × n row-major. Instances keep scratch arrays: use one per
 * thread. Inputs are not checked (this is the inner kernel; the assembler checks once).
 */
public interface TetKernel {
  /** The kernel for 4-node (order 1) or 10-node (order 2) tetrahedra. */
  static TetKernel forOrder(int order) {
    TetBasis.checkOrder(order);
    return order == 1 ? new LinearTetKernel() : new QuadraticTetKernel();
  }

  /** Nodes per element: 4 or 10. */
  int nodeCount();

  /**
   * out[n i + j] = ∫ ∇N_i · T ∇N_j dV with the symmetric tensor T = tensor[off .. off + 5] stored
   * as (xx, yy, zz, xy, yz, zx).
   */
  void stiffness(double[] x, double[] tensor, int off, double[] out);

  /** out[n i + j] = ∫ N_i N_j dV (consistent mass for a unit coefficient). */
  void mass(double[] x, double[] out);

  /**
   * out[i] = the lumped mass: the row sum of the consistent mass for linear tetrahedra, the
   * diagonal-scaling (HRZ) lumping for quadratic ones. Both sum to the volume.
   */
  void lumpedMass(double[] x, double[] out);

  /** out[i] = ∫ N_i dV. */
  void load(double[] x, double[] out);

  /** The volume of the element. */
  double volume(double[] x);
}
