package dev.soakfield.fem.post;

import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.mesh.TetMesh;

/**
 * Per volume group: the amount ∫ c dV and the largest nodal c (in the group's own material), and
 * the time the group's largest c first reached a threshold, interpolated within the step.
 */
public final class GroupMonitor {
  private final SystemAssembler assembler;
  private final double[] groupSolubility;
  private final double[] concentrationScale;
  private final int[][] groupNodes;
  private final double[][] groupLoads; // ∫ N_i over the group's tetrahedra, per node of groupNodes
  private final int[][] freeNodes;
  private final double threshold;
  private final double[] firstTime;
  private double[] previousMax;

  /**
   * Starts the monitor at the initial state.
   *
   * @param threshold threshold concentration, or NaN for none
   * @param prescribed nodes whose value a face sets: left out of the first arrival (they have the
   *     face's value from the start, which says nothing about the part), kept in the maxima
   */
  public GroupMonitor(
      SystemAssembler assembler,
      double[] solubilityPerTet,
      double threshold,
      double[] phi0,
      boolean[] prescribed) {
    this(
        assembler,
        solubilityPerTet,
        ones(assembler.space().mesh().volumeGroups().size()),
        threshold,
        phi0,
        prescribed);
  }

  /**
   * A monitor whose amounts are in the solve's unit and whose maxima are in the case's declared
   * unit.
   *
   * @param concentrationScale per group, the solve's concentration per declared unit (maxima are
   *     divided by it)
   */
  public GroupMonitor(
      SystemAssembler assembler,
      double[] solubilityPerTet,
      double[] concentrationScale,
      double threshold,
      double[] phi0,
      boolean[] prescribed) {
    this.assembler = assembler;
    this.concentrationScale = concentrationScale.clone();
    TetMesh mesh = assembler.space().mesh();
    int groups = mesh.volumeGroups().size();
    groupSolubility = new double[groups];
    boolean[][] member = new boolean[groups][mesh.nodeCount()];
    int per = mesh.nodesPerTet();
    for (int t = 0; t < mesh.tetCount(); t++) {
      int g = mesh.tetGroup(t);
      groupSolubility[g] = solubilityPerTet[t];
      for (int k = 0; k < per; k++) {
        member[g][mesh.tetNode(t, k)] = true;
      }
    }
    groupNodes = new int[groups][];
    freeNodes = new int[groups][];
    for (int g = 0; g < groups; g++) {
      int count = 0;
      for (boolean b : member[g]) {
        count += b ? 1 : 0;
      }
      int[] nodes = new int[count];
      int p = 0;
      for (int v = 0; v < member[g].length; v++) {
        if (member[g][v]) {
          nodes[p++] = v;
        }
      }
      groupNodes[g] = nodes;
      freeNodes[g] = java.util.Arrays.stream(nodes).filter(v -> !prescribed[v]).toArray();
    }
    groupLoads = groupLoads(assembler, groupNodes);
    this.threshold = threshold;
    firstTime = new double[groups];
    java.util.Arrays.fill(firstTime, -1);
    previousMax = maxima(phi0, freeNodes);
    for (int g = 0; g < groups; g++) {
      if (previousMax[g] >= threshold) {
        firstTime[g] = 0;
      }
    }
  }

  /**
   * Takes the solubility at a new temperature (per tetrahedron, same layout): amounts and maxima
   * from now on use it; first-arrival times already found stay.
   */
  public void updateSolubility(double[] perTet) {
    TetMesh mesh = assembler.space().mesh();
    for (int t = 0; t < mesh.tetCount(); t++) {
      groupSolubility[mesh.tetGroup(t)] = perTet[t];
    }
  }

  /** What the monitor has seen so far (first times, last maxima), for checkpoints. */
  public double[][] snapshot() {
    return new double[][] {firstTime.clone(), previousMax.clone()};
  }

  /** Continues from a {@link #snapshot()}. */
  public void restore(double[][] state) {
    System.arraycopy(state[0], 0, firstTime, 0, firstTime.length);
    previousMax = state[1].clone();
  }

  /**
   * ∫ c dV per volume group: S_g · Σ_i (∫_g N_i) φ_i, one dot product per group with loads found
   * once (a group is one material, so S is uniform in it at any temperature). Integrating element
   * by element every step cost as much as a third of the linear solves on a 1.6M-tet box.
   */
  public double[] amounts(double[] phi) {
    double[] out = new double[groupNodes.length];
    for (int g = 0; g < out.length; g++) {
      int[] nodes = groupNodes[g];
      double[] load = groupLoads[g];
      double s = 0;
      for (int k = 0; k < nodes.length; k++) {
        s += load[k] * phi[nodes[k]];
      }
      out[g] = groupSolubility[g] * s;
    }
    return out;
  }

  /** Per group, ∫ N_i over its tetrahedra for each of its nodes. */
  private static double[][] groupLoads(SystemAssembler assembler, int[][] groupNodes) {
    TetMesh mesh = assembler.space().mesh();
    double[][] loads = new double[groupNodes.length][];
    double[] indicator = new double[mesh.tetCount()];
    double[] load = new double[assembler.space().dofCount()];
    for (int g = 0; g < groupNodes.length; g++) {
      for (int t = 0; t < indicator.length; t++) {
        indicator[t] = mesh.tetGroup(t) == g ? 1 : 0;
      }
      java.util.Arrays.fill(load, 0.0);
      assembler.addVolumeLoad(load, indicator, 1.0);
      loads[g] = new double[groupNodes[g].length];
      for (int k = 0; k < groupNodes[g].length; k++) {
        loads[g][k] = load[groupNodes[g][k]];
      }
    }
    return loads;
  }

  /** Largest nodal c per volume group. */
  public double[] maxima(double[] phi) {
    return maxima(phi, groupNodes);
  }

  private double[] maxima(double[] phi, int[][] nodesOf) {
    double[] m = new double[nodesOf.length];
    for (int g = 0; g < m.length; g++) {
      double best = Double.NEGATIVE_INFINITY;
      for (int v : nodesOf[g]) {
        best = Math.max(best, phi[v]);
      }
      m[g] = groupSolubility[g] / concentrationScale[g] * best;
    }
    return m;
  }

  /** Largest nodal c per volume group over the nodes no face holds at its value. */
  public double[] freeMaxima(double[] phi) {
    return maxima(phi, freeNodes);
  }

  private static double[] ones(int n) {
    double[] a = new double[n];
    java.util.Arrays.fill(a, 1.0);
    return a;
  }

  /** Records the step ending at t; returns the maxima at t. */
  public double[] step(double t, double dt, double[] phi) {
    double[] free = maxima(phi, freeNodes);
    for (int g = 0; g < free.length; g++) {
      if (firstTime[g] < 0 && free[g] >= threshold) {
        firstTime[g] = ThresholdClock.crossing(t - dt, previousMax[g], t, free[g], threshold);
      }
    }
    previousMax = free;
    return maxima(phi);
  }

  /** Per group: when its largest c first reached the threshold, -1 where never (a copy). */
  public double[] firstTimes() {
    return firstTime.clone();
  }
}
