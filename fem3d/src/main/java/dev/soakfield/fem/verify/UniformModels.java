package dev.soakfield.fem.verify;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import dev.soakfield.fem.model.FaceGroupMembers;
import dev.soakfield.fem.model.FaceOwners;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/** Models for the verification cases: materials per volume group, conditions by face group. */
final class UniformModels {
  private UniformModels() {}

  /** A condition on a face group: its kind, its value and coefficient as functions of time. */
  record Condition(FaceKind kind, TimeFunction value, TimeFunction coefficient) {
    static Condition concentration(double c) {
      return concentration(TimeFunction.constant(c));
    }

    static Condition concentration(TimeFunction c) {
      return new Condition(FaceKind.CONCENTRATION, c, TimeFunction.constant(0));
    }

    static Condition flux(double q) {
      return new Condition(FaceKind.FLUX, TimeFunction.constant(q), TimeFunction.constant(0));
    }

    static Condition exchange(double h, double cEnv) {
      return exchange(h, TimeFunction.constant(cEnv));
    }

    static Condition exchange(double h, TimeFunction cEnv) {
      return new Condition(FaceKind.EXCHANGE, cEnv, TimeFunction.constant(h));
    }
  }

  /** Isotropic D and S per volume group (by index), a first-order rate per group, uniform c0. */
  static DiffusionModel model(
      TetMesh mesh,
      double[] dPerGroup,
      double[] sPerGroup,
      double[] ratePerGroup,
      double c0,
      Map<String, Condition> conditions) {
    int tets = mesh.tetCount();
    double[] sol = new double[tets];
    double[] tensor = new double[6 * tets];
    double[] rate = new double[tets];
    for (int t = 0; t < tets; t++) {
      int g = mesh.tetGroup(t);
      sol[t] = sPerGroup[g];
      rate[t] = ratePerGroup[g];
      for (int k = 0; k < 3; k++) {
        tensor[6 * t + k] = dPerGroup[g] * sPerGroup[g];
      }
    }
    int[] owner = FaceOwners.of(mesh);
    List<FaceCondition> faces = new ArrayList<>();
    for (var e : conditions.entrySet()) {
      int g = mesh.faceGroupIndex(e.getKey());
      if (g < 0) {
        throw new IllegalArgumentException("no face group " + e.getKey());
      }
      int[] members = FaceGroupMembers.of(mesh, g);
      double[] faceS = new double[members.length];
      for (int i = 0; i < members.length; i++) {
        faceS[i] = sol[owner[members[i]]];
      }
      Condition c = e.getValue();
      faces.add(
          new FaceCondition(g, e.getKey(), c.kind(), c.value(), c.coefficient(), members, faceS));
    }
    double[] phi0 = new double[mesh.nodeCount()];
    for (int t = 0; t < tets; t++) {
      for (int k = 0; k < mesh.nodesPerTet(); k++) {
        phi0[mesh.tetNode(t, k)] = c0 / sol[t];
      }
    }
    return new DiffusionModel(FeSpace.of(mesh), sol, tensor, rate, new double[tets], faces, phi0);
  }

  /** The same model with a constant source (amount per m³ per s) in each volume group. */
  static DiffusionModel withConstantSource(DiffusionModel m, double[] perGroup) {
    var mesh = m.space().mesh();
    double[] r = new double[mesh.tetCount()];
    for (int t = 0; t < r.length; t++) {
      r[t] = perGroup[mesh.tetGroup(t)];
    }
    return new DiffusionModel(
        m.space(),
        m.solubility(),
        m.conductance(),
        m.firstOrderRate(),
        r,
        m.faces(),
        m.initialPhi());
  }

  /** The same model with conductance D·S given per tetrahedron (6 numbers each). */
  static DiffusionModel withConductance(DiffusionModel m, double[] conductance) {
    return new DiffusionModel(
        m.space(),
        m.solubility(),
        conductance,
        m.firstOrderRate(),
        m.constantRate(),
        m.faces(),
        m.initialPhi());
  }

  /** The same model starting from the potential {@code phi0} (one value per node). */
  static DiffusionModel startingFrom(DiffusionModel m, double[] phi0) {
    return new DiffusionModel(
        m.space(),
        m.solubility(),
        m.conductance(),
        m.firstOrderRate(),
        m.constantRate(),
        m.faces(),
        phi0);
  }

  /** The exact field at every node of the mesh. */
  static double[] atNodes(TetMesh mesh, ExactField f) {
    double[] u = new double[mesh.nodeCount()];
    for (int v = 0; v < u.length; v++) {
      u[v] = f.value(mesh.coord(v, 0), mesh.coord(v, 1), mesh.coord(v, 2));
    }
    return u;
  }

  /** Every face group of the mesh held at c. */
  static Map<String, Condition> allHeld(TetMesh mesh, double c) {
    Map<String, Condition> m = new java.util.LinkedHashMap<>();
    for (var g : mesh.faceGroups()) {
      m.put(g.name(), Condition.concentration(c));
    }
    return m;
  }

  static double[] filled(int n, double v) {
    double[] a = new double[n];
    Arrays.fill(a, v);
    return a;
  }
}
