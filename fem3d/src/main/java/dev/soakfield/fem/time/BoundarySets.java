package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import dev.soakfield.fem.model.FaceOwners;
import dev.soakfield.fem.physics.FaceKind;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;

/**
 * The model's face conditions sorted for the stepper, assembled once: the exchange and flux groups
 * with their unit loads and areas, and the prescribed groups with their dofs (a dof on two
 * prescribed groups belongs to the first).
 */
@SuppressWarnings("ArrayRecordComponent") // records carry precomputed arrays, never shared
final class BoundarySets {
  /** An exchange group: its unit load ∫N over the faces, its area and the dofs on its faces. */
  record Exchange(FaceCondition condition, double[] unitLoad, double area, int[] dofs) {}

  record Flux(FaceCondition condition, double[] unitLoad, double area) {}

  /** Prescribed dofs of one group. */
  record Prescribed(FaceCondition condition, int[] dofs) {}

  final List<Exchange> exchanges = new ArrayList<>();
  final List<Flux> fluxes = new ArrayList<>();
  final List<Prescribed> prescribed = new ArrayList<>();
  final boolean[] isPrescribed;
  final int[] prescribedOwner; // face group index of each prescribed dof, else -1
  final int faceGroupCount;
  private final DiffusionModel model;
  private final int[] faceOwner;

  BoundarySets(DiffusionModel model, SystemAssembler asm) {
    this.model = model;
    int n = model.space().dofCount();
    faceGroupCount = model.space().mesh().faceGroups().size();
    faceOwner = FaceOwners.of(model.space().mesh());
    isPrescribed = new boolean[n];
    prescribedOwner = new int[n];
    Arrays.fill(prescribedOwner, -1);
    for (FaceCondition fc : model.faces()) {
      int[] faces = fc.faces();
      double[] ones = new double[faces.length];
      Arrays.fill(ones, 1.0);
      switch (fc.kind()) {
        case CONCENTRATION, AMBIENT -> {
          int[] dofs = asm.faceDofs(faces);
          prescribed.add(new Prescribed(fc, dofs));
          for (int d : dofs) {
            if (!isPrescribed[d]) {
              isPrescribed[d] = true;
              prescribedOwner[d] = fc.group();
            }
          }
        }
        case FLUX -> {
          double[] load = new double[n];
          asm.addFaceLoad(load, faces, ones, 1.0);
          fluxes.add(new Flux(fc, load, VectorSums.sum(load)));
        }
        case EXCHANGE -> {
          double[] load = new double[n];
          asm.addFaceLoad(load, faces, ones, 1.0);
          exchanges.add(new Exchange(fc, load, VectorSums.sum(load), asm.faceDofs(faces)));
        }
        case SEALED -> {
          // nothing enters
        }
        case LAW -> {
          // nonlinear: the face laws' own nodal sources (FaceLawSources)
        }
      }
    }
  }

  /** The solubility of the material next to each of these faces. */
  double[] faceSolubility(int[] faces, double[] tetS) {
    double[] out = new double[faces.length];
    for (int i = 0; i < faces.length; i++) {
      out[i] = tetS[faceOwner[faces[i]]];
    }
    return out;
  }

  /**
   * 1/S per prescribed dof (1 for an ambient potential). A dof shared by faces next to materials of
   * different solubility takes the smaller S, the larger potential: the side that lets more in.
   */
  double[] inverseSolubility(Prescribed p, double[] tetS) {
    int[] dofs = p.dofs();
    double[] inv = new double[dofs.length];
    if (p.condition().valueIsPotential()) {
      Arrays.fill(inv, 1.0);
      return inv;
    }
    var mesh = model.space().mesh();
    int[] faces = p.condition().faces();
    double[] minS = new double[mesh.nodeCount()];
    Arrays.fill(minS, Double.POSITIVE_INFINITY);
    for (int face : faces) {
      double s = tetS[faceOwner[face]];
      for (int k = 0; k < mesh.nodesPerFace(); k++) {
        int v = mesh.faceNode(face, k);
        minS[v] = Math.min(minS[v], s);
      }
    }
    for (int i = 0; i < dofs.length; i++) {
      inv[i] = 1.0 / minS[dofs[i]];
    }
    return inv;
  }

  /**
   * The largest potential the boundary data impose (prescribed values and exchange environments,
   * over their table points, as potentials); 0 when only fluxes drive the problem.
   */
  double referencePotential() {
    double ref = 0;
    double[] s = model.solubility();
    for (FaceCondition fc : model.faces()) {
      FaceKind k = fc.kind();
      if (k != FaceKind.CONCENTRATION && k != FaceKind.EXCHANGE && k != FaceKind.AMBIENT) {
        continue;
      }
      double minS = 1.0;
      if (!fc.valueIsPotential()) {
        minS = Double.POSITIVE_INFINITY;
        for (double v : faceSolubility(fc.faces(), s)) {
          minS = Math.min(minS, v);
        }
      }
      double peak = Math.abs(fc.value().at(0));
      for (double t : fc.value().breakpoints()) {
        peak = Math.max(peak, Math.abs(fc.value().at(t)));
      }
      ref = Math.max(ref, peak / minS);
    }
    return ref;
  }

  /** Every time at which a boundary table or the temperature changes slope or jumps. */
  double[] breakpoints() {
    TreeSet<Double> all = new TreeSet<>();
    for (FaceCondition fc : model.faces()) {
      for (double b : fc.value().breakpoints()) {
        all.add(b);
      }
      for (double b : fc.coefficient().breakpoints()) {
        all.add(b);
      }
    }
    for (double b : model.temperature().breakpoints()) {
      all.add(b);
    }
    return all.stream().mapToDouble(Double::doubleValue).toArray();
  }

  /** The transfer coefficient of each exchange group at time t. */
  double[] exchangeCoefficients(double t) {
    double[] h = new double[exchanges.size()];
    for (int g = 0; g < h.length; g++) {
      h[g] = exchanges.get(g).condition().coefficient().at(t);
    }
    return h;
  }
}
