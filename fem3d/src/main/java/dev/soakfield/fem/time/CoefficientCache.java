package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.model.DiffusionModel;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The coefficient matrices, which depend on time only through the temperature, assembled for the
 * last two temperatures: a step needs the capacity at its start and at its end.
 */
final class CoefficientCache {
  private final DiffusionModel model;
  private final SystemAssembler asm;
  private final BoundarySets boundary;
  private final boolean lumped;
  private final boolean coefficientsVary;
  private final int n;
  private final Coefficients[] cache = new Coefficients[2];
  private long useCounter;

  /** Everything that depends on the temperature, assembled for one temperature. */
  final class Coefficients {
    double temperature = Double.NaN;
    long lastUse;
    final CsrMatrix capacity = asm.newMatrix();
    final CsrMatrix stiffness = asm.newMatrix();
    // first-order source: k S mass; none without such a source (a matrix is 30 MB at 1.5M tets)
    final CsrMatrix sink = model.hasFirstOrderSource() ? asm.newMatrix() : null;
    final double[] capacityRowSums = new double[n];
    final double[] sinkRowSums = new double[n];
    final List<CsrMatrix> exchangeMass = new ArrayList<>();
    final List<double[]> exchangeSLoad = new ArrayList<>(); // ∫ S N over the faces
    final List<double[]> inverseS = new ArrayList<>(); // per prescribed group, per dof

    void assemble(double kelvin) {
      temperature = kelvin;
      double[] s = coefficientsVary ? model.solubilityAt(kelvin) : model.solubility();
      double[] k = coefficientsVary ? model.conductanceAt(kelvin) : model.conductance();
      capacity.setZero();
      asm.addCapacity(capacity, s, lumped, 1.0);
      stiffness.setZero();
      asm.addStiffness(stiffness, k, 1.0);
      double[] ones = new double[n];
      Arrays.fill(ones, 1.0);
      if (sink != null) {
        sink.setZero();
        double[] ks = new double[s.length];
        double[] rate = model.firstOrderRate();
        for (int t = 0; t < ks.length; t++) {
          ks[t] = rate[t] * s[t];
        }
        asm.addCapacity(sink, ks, lumped, 1.0);
        sink.multiply(ones, sinkRowSums);
      }
      capacity.multiply(ones, capacityRowSums);
      boolean first = exchangeMass.isEmpty();
      for (int g = 0; g < boundary.exchanges.size(); g++) {
        int[] faces = boundary.exchanges.get(g).condition().faces();
        double[] faceS = boundary.faceSolubility(faces, s);
        CsrMatrix h = first ? asm.newMatrix() : exchangeMass.get(g);
        h.setZero();
        asm.addFaceMass(h, faces, faceS, 1.0);
        double[] sLoad = new double[n];
        asm.addFaceLoad(sLoad, faces, faceS, 1.0);
        if (first) {
          exchangeMass.add(h);
          exchangeSLoad.add(sLoad);
        } else {
          exchangeSLoad.set(g, sLoad);
        }
      }
      inverseS.clear();
      for (BoundarySets.Prescribed p : boundary.prescribed) {
        inverseS.add(boundary.inverseSolubility(p, s));
      }
    }
  }

  CoefficientCache(
      DiffusionModel model, SystemAssembler asm, BoundarySets boundary, boolean lumped) {
    this.model = model;
    this.asm = asm;
    this.boundary = boundary;
    this.lumped = lumped;
    this.coefficientsVary = model.coefficientsVary();
    this.n = model.space().dofCount();
  }

  /**
   * The coefficient set for the temperature at time t, from the cache when it holds it; a miss
   * reassembles the least recently used set, never the one used last (a step holds two).
   */
  Coefficients at(double t) {
    double kelvin = coefficientsVary ? model.temperature().at(t) : model.referenceTemperature();
    useCounter++;
    Coefficients oldest = null;
    for (int k = 0; k < cache.length; k++) {
      Coefficients c = cache[k];
      if (c == null) {
        // a second set only when a second temperature comes: at one temperature it never does
        c = new Coefficients();
        cache[k] = c;
        oldest = c;
        break;
      }
      if (c.temperature == kelvin) {
        c.lastUse = useCounter;
        return c;
      }
      if (oldest == null || c.lastUse < oldest.lastUse) {
        oldest = c;
      }
    }
    oldest.assemble(kelvin);
    oldest.lastUse = useCounter;
    return oldest;
  }
}
