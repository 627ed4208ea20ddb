package dev.soakfield.fem.physics;

import dev.soakfield.fem.assembly.FeSpace;
import java.util.List;
import java.util.Objects;

/**
 * The discrete problem ∂(Sφ)/∂t = ∇·(D S ∇φ) + k·Sφ + r on a finite-element space: coefficients per
 * tetrahedron, conditions per face group, the initial potential per node. Built from a case by the
 * case binding; read by the time stepper. Arrays are owned by the model and never changed.
 */
public final class DiffusionModel {
  private final FeSpace space;
  private final double[] solubility;
  private final double[] conductance;
  private final double[] firstOrderRate;
  private final double[] constantRate;
  private final List<FaceCondition> faces;
  private final double[] initialPhi;

  /**
   * @param space the unknowns
   * @param solubility S per tetrahedron (c = S·φ)
   * @param conductance the tensor D·S per tetrahedron, 6 numbers each (xx, yy, zz, xy, yz, zx)
   * @param firstOrderRate k per tetrahedron, 1/s: source k·c (a sink when negative)
   * @param constantRate r per tetrahedron: source in amount per volume per second
   * @param faces conditions of the face groups that are not sealed (sealed ones may be listed too)
   * @param initialPhi the potential at t = 0 per node
   */
  public DiffusionModel(
      FeSpace space,
      double[] solubility,
      double[] conductance,
      double[] firstOrderRate,
      double[] constantRate,
      List<FaceCondition> faces,
      double[] initialPhi) {
    this.space = Objects.requireNonNull(space, "space");
    int tets = space.mesh().tetCount();
    this.solubility = check(solubility, tets, "solubility");
    this.conductance = check(conductance, 6 * tets, "conductance");
    this.firstOrderRate = check(firstOrderRate, tets, "firstOrderRate");
    this.constantRate = check(constantRate, tets, "constantRate");
    this.faces = List.copyOf(faces);
    this.initialPhi = check(initialPhi, space.dofCount(), "initialPhi");
  }

  private static double[] check(double[] a, int length, String what) {
    if (a.length != length) {
      throw new IllegalArgumentException(
          what + " has " + a.length + " entries, expected " + length);
    }
    return a.clone();
  }

  public FeSpace space() {
    return space;
  }

  /** S per tetrahedron (shared; do not modify). */
  public double[] solubility() {
    return solubility;
  }

  /** D·S per tetrahedron, 6 numbers each (shared; do not modify). */
  public double[] conductance() {
    return conductance;
  }

  public double[] firstOrderRate() {
    return firstOrderRate;
  }

  public double[] constantRate() {
    return constantRate;
  }

  public List<FaceCondition> faces() {
    return faces;
  }

  /** A copy of the initial potential. */
  public double[] initialPhi() {
    return initialPhi.clone();
  }

  public boolean hasFirstOrderSource() {
    for (double k : firstOrderRate) {
      if (k != 0) {
        return true;
      }
    }
    return false;
  }

  public boolean hasConstantSource() {
    for (double r : constantRate) {
      if (r != 0) {
        return true;
      }
    }
    return false;
  }
}
