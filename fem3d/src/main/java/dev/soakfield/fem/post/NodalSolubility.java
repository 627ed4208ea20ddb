package dev.soakfield.fem.post;

import dev.soakfield.mesh.TetMesh;

/**
 * Solubility per node for showing c = S·φ at nodes: a node inside one material takes its S; a node
 * on an interface, where c jumps, takes the larger S (the side that holds more), the conservative
 * choice for threshold checks.
 */
public final class NodalSolubility {
  private NodalSolubility() {}

  public static double[] of(TetMesh mesh, double[] solubilityPerTet) {
    double[] s = new double[mesh.nodeCount()];
    int per = mesh.nodesPerTet();
    for (int t = 0; t < mesh.tetCount(); t++) {
      for (int k = 0; k < per; k++) {
        int v = mesh.tetNode(t, k);
        s[v] = Math.max(s[v], solubilityPerTet[t]);
      }
    }
    return s;
  }
}
