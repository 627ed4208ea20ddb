package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.physics.DiffusionModel;
import dev.soakfield.fem.physics.FaceCondition;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.mesh.TetMesh;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/** Small models for the verification tests: uniform material, conditions by face group name. */
final class SheetModels {
  private SheetModels() {}

  record Condition(FaceKind kind, double value, double coefficient) {}

  static DiffusionModel uniform(
      TetMesh mesh, double d, double s, double initialC, Map<String, Condition> conditions) {
    int tets = mesh.tetCount();
    double[] sol = new double[tets];
    Arrays.fill(sol, s);
    double[] tensor = new double[6 * tets];
    for (int t = 0; t < tets; t++) {
      tensor[6 * t] = d * s;
      tensor[6 * t + 1] = d * s;
      tensor[6 * t + 2] = d * s;
    }
    return model(mesh, sol, tensor, new double[tets], initialC / s, conditions);
  }

  static DiffusionModel model(
      TetMesh mesh,
      double[] solubility,
      double[] tensor,
      double[] firstOrder,
      double initialPhi,
      Map<String, Condition> conditions) {
    List<FaceCondition> faces = new ArrayList<>();
    for (var e : conditions.entrySet()) {
      int g = mesh.faceGroupIndex(e.getKey());
      if (g < 0) {
        throw new IllegalArgumentException("no face group " + e.getKey());
      }
      int[] members = facesOf(mesh, g);
      double[] adjacentS = new double[members.length];
      for (int i = 0; i < members.length; i++) {
        adjacentS[i] = solubility[adjacentTet(mesh, members[i])];
      }
      Condition c = e.getValue();
      faces.add(
          new FaceCondition(
              g,
              e.getKey(),
              c.kind(),
              TimeFunction.constant(c.value()),
              TimeFunction.constant(c.coefficient()),
              members,
              adjacentS));
    }
    double[] phi0 = new double[mesh.nodeCount()];
    Arrays.fill(phi0, initialPhi);
    return new DiffusionModel(
        FeSpace.of(mesh),
        solubility,
        tensor,
        firstOrder,
        new double[mesh.tetCount()],
        faces,
        phi0);
  }

  static int[] facesOf(TetMesh mesh, int group) {
    return java.util.stream.IntStream.range(0, mesh.faceCount())
        .filter(f -> mesh.faceGroup(f) == group)
        .toArray();
  }

  /** A tet that has all three corners of the face (test-sized meshes only: a linear scan). */
  static int adjacentTet(TetMesh mesh, int face) {
    for (int t = 0; t < mesh.tetCount(); t++) {
      int hits = 0;
      for (int k = 0; k < 4; k++) {
        int v = mesh.tetNode(t, k);
        if (v == mesh.faceNode(face, 0) || v == mesh.faceNode(face, 1) || v == mesh.faceNode(face, 2)) {
          hits++;
        }
      }
      if (hits == 3) {
        return t;
      }
    }
    throw new IllegalStateException("face " + face + " has no tet");
  }
}
