package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.physics.DiffusionModel;
import dev.soakfield.fem.physics.FaceCondition;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.solve.PcgSolver;
import dev.soakfield.fem.solve.PreconditionerKind;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One step of the theta scheme for M dφ/dt + L(t) φ = f(t), with L = K − K_src + Σ h_g(t) H_g:
 *
 * <pre>(M + θ·dt·L₁) φ₁ = (M − (1−θ)·dt·L₀) φ₀ + dt·(θ f₁ + (1−θ) f₀) + R</pre>
 *
 * where R, nonzero only on prescribed-concentration nodes, is the amount those nodes take in during
 * the step (the consistent reaction, so the balance closes). Prescribed nodes are eliminated
 * symmetrically (their columns move to the right-hand side), so the system stays symmetric positive
 * definite for conjugate gradients. Matrices are assembled once; the system matrix and its
 * preconditioner are rebuilt only when dt or a coefficient changes.
 */
@SuppressWarnings("ArrayRecordComponent") // private records carry precomputed arrays, never shared
public final class ThetaStepper {
  private final DiffusionModel model;
  private final CsrMatrix capacity;
  private final CsrMatrix stiffness;
  private final CsrMatrix sink; // first-order source: k S mass (added with a minus sign to L)
  private final double[] constantLoad;
  private final List<Exchange> exchanges = new ArrayList<>();
  private final List<Flux> fluxes = new ArrayList<>();
  private final List<Prescribed> prescribed = new ArrayList<>();
  private final boolean[] isPrescribed;
  private final int[] prescribedOwner; // face group index of each prescribed dof, else -1
  private final int faceGroupCount;
  private final double[] capacityRowSums; // M·1, for the amount 1ᵀMφ
  private final double[] sinkRowSums;
  private final PcgSolver solver;
  private final CsrMatrix system;
  private final CsrMatrix unreduced; // the same system before elimination, for the reactions
  private final int[] eliminated; // CSR positions in free rows whose column is prescribed
  // Held rows keep their own diagonal (x_i = φ_D scaled by it), so they do not dominate ‖b‖ and the
  // solver's relative tolerance stays meaningful for the free rows.
  private final double[] heldDiagonal;
  private double systemDt = Double.NaN;
  private double systemTheta = Double.NaN;
  private double[] systemH = new double[0];

  private record Exchange(
      FaceCondition condition,
      CsrMatrix mass,
      double[] massRowSums,
      double[] unitLoad,
      double area) {}

  private record Flux(FaceCondition condition, double[] unitLoad, double area) {}

  /** Prescribed dofs of one group and 1/S at each (c = S·φ, so φ = c / S). */
  private record Prescribed(FaceCondition condition, int[] dofs, double[] inverseS) {}

  /**
   * Assembles the capacity, stiffness, source and boundary matrices of the model once.
   *
   * @param lumped lumped (diagonal) capacity instead of consistent
   * @param solverTolerance relative residual ‖r‖ ≤ tol·‖b‖ of each linear solve
   */
  public ThetaStepper(
      DiffusionModel model, boolean lumped, double solverTolerance, int maxIterations) {
    this.model = model;
    SystemAssembler asm = new SystemAssembler(model.space());
    int n = model.space().dofCount();
    faceGroupCount = model.space().mesh().faceGroups().size();
    capacity = asm.newMatrix();
    asm.addCapacity(capacity, model.solubility(), lumped, 1.0);
    stiffness = asm.newMatrix();
    asm.addStiffness(stiffness, model.conductance(), 1.0);
    sink = asm.newMatrix();
    if (model.hasFirstOrderSource()) {
      double[] ks = new double[model.solubility().length];
      for (int t = 0; t < ks.length; t++) {
        ks[t] = model.firstOrderRate()[t] * model.solubility()[t];
      }
      asm.addCapacity(sink, ks, lumped, 1.0);
    }
    constantLoad = new double[n];
    if (model.hasConstantSource()) {
      asm.addVolumeLoad(constantLoad, model.constantRate(), 1.0);
    }
    isPrescribed = new boolean[n];
    prescribedOwner = new int[n];
    Arrays.fill(prescribedOwner, -1);
    for (FaceCondition fc : model.faces()) {
      int[] faces = fc.faces();
      double[] ones = new double[faces.length];
      Arrays.fill(ones, 1.0);
      switch (fc.kind()) {
        case CONCENTRATION -> {
          int[] dofs = asm.faceDofs(faces);
          prescribed.add(new Prescribed(fc, dofs, inverseSolubility(fc, dofs)));
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
          fluxes.add(new Flux(fc, load, sum(load)));
        }
        case EXCHANGE -> {
          CsrMatrix h = asm.newMatrix();
          asm.addFaceMass(h, faces, fc.faceSolubility(), 1.0);
          double[] load = new double[n];
          asm.addFaceLoad(load, faces, ones, 1.0);
          double[] rowSums = new double[n];
          h.multiply(filled(n, 1.0), rowSums);
          exchanges.add(new Exchange(fc, h, rowSums, load, sum(load)));
        }
        case SEALED -> {
          // nothing enters
        }
      }
    }
    capacityRowSums = new double[n];
    capacity.multiply(filled(n, 1.0), capacityRowSums);
    sinkRowSums = new double[n];
    sink.multiply(filled(n, 1.0), sinkRowSums);
    system = capacity.zeroCopy();
    unreduced = capacity.zeroCopy();
    eliminated = eliminatedPositions();
    heldDiagonal = new double[n];
    solver = new PcgSolver(solverTolerance, maxIterations, PreconditionerKind.AUTO);
  }

  /**
   * 1/S per prescribed dof. A dof shared by faces next to materials of different solubility takes
   * the smaller S, the larger potential: the side that lets more in.
   */
  private double[] inverseSolubility(FaceCondition fc, int[] dofs) {
    var mesh = model.space().mesh();
    int[] faces = fc.faces();
    double[] faceS = fc.faceSolubility();
    double[] minS = new double[mesh.nodeCount()];
    Arrays.fill(minS, Double.POSITIVE_INFINITY);
    for (int i = 0; i < faces.length; i++) {
      for (int k = 0; k < mesh.nodesPerFace(); k++) {
        int v = mesh.faceNode(faces[i], k);
        minS[v] = Math.min(minS[v], faceS[i]);
      }
    }
    double[] inv = new double[dofs.length];
    for (int i = 0; i < dofs.length; i++) {
      inv[i] = 1.0 / minS[dofs[i]];
    }
    return inv;
  }

  private int[] eliminatedPositions() {
    int[] rs = system.rowStart();
    int[] cols = system.cols();
    int count = 0;
    for (int i = 0; i < system.size(); i++) {
      if (!isPrescribed[i]) {
        for (int k = rs[i]; k < rs[i + 1]; k++) {
          if (isPrescribed[cols[k]]) {
            count++;
          }
        }
      }
    }
    int[] pos = new int[count];
    int p = 0;
    for (int i = 0; i < system.size(); i++) {
      if (!isPrescribed[i]) {
        for (int k = rs[i]; k < rs[i + 1]; k++) {
          if (isPrescribed[cols[k]]) {
            pos[p++] = k;
          }
        }
      }
    }
    return pos;
  }

  private static double[] filled(int n, double v) {
    double[] a = new double[n];
    Arrays.fill(a, v);
    return a;
  }

  private static double sum(double[] a) {
    double s = 0;
    for (double v : a) {
      s += v;
    }
    return s;
  }

  private static double dot(double[] a, double[] b) {
    double s = 0;
    for (int i = 0; i < a.length; i++) {
      s += a[i] * b[i];
    }
    return s;
  }

  /** The amount 1ᵀ M φ for the capacity this stepper uses. */
  public double amount(double[] phi) {
    return dot(capacityRowSums, phi);
  }

  /**
   * Sets the prescribed potentials of time t into phi and returns, per face group, the amount that
   * raising them added: at the start of a run a held face takes in at once what fills the first
   * layer of elements, and the balance counts it as inflow.
   */
  public double[] raise(double[] phi, double t) {
    double[] before = phi.clone();
    applyPrescribed(phi, t);
    double[] added = new double[faceGroupCount];
    for (int i = 0; i < phi.length; i++) {
      if (isPrescribed[i] && phi[i] != before[i]) {
        added[prescribedOwner[i]] += capacityRowSums[i] * (phi[i] - before[i]);
      }
    }
    return added;
  }

  /** Sets the prescribed potentials of time t into phi. */
  public void applyPrescribed(double[] phi, double t) {
    for (Prescribed p : prescribed) {
      double c = p.condition().value().at(t);
      int[] dofs = p.dofs();
      for (int i = 0; i < dofs.length; i++) {
        if (prescribedOwner[dofs[i]] == p.condition().group()) {
          phi[dofs[i]] = c * p.inverseS()[i];
        }
      }
    }
  }

  /**
   * The largest potential the boundary data impose (held concentrations and exchange environments,
   * over their table points, divided by the solubility there): the natural scale of the field for
   * step-error control; 0 when only fluxes drive the problem.
   */
  public double referencePotential() {
    double ref = 0;
    for (FaceCondition fc : model.faces()) {
      if (fc.kind() != FaceKind.CONCENTRATION && fc.kind() != FaceKind.EXCHANGE) {
        continue;
      }
      double minS = Double.POSITIVE_INFINITY;
      for (double s : fc.faceSolubility()) {
        minS = Math.min(minS, s);
      }
      double[] times = fc.value().breakpoints();
      double peak = Math.abs(fc.value().at(0));
      for (double t : times) {
        peak = Math.max(peak, Math.abs(fc.value().at(t)));
      }
      ref = Math.max(ref, peak / minS);
    }
    return ref;
  }

  /** Every time at which a boundary table changes slope. */
  public double[] breakpoints() {
    List<Double> all = new ArrayList<>();
    for (FaceCondition fc : model.faces()) {
      for (double b : fc.value().breakpoints()) {
        all.add(b);
      }
      for (double b : fc.coefficient().breakpoints()) {
        all.add(b);
      }
    }
    return all.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
  }

  /** L φ at time t into out (K φ − K_src φ + Σ h_g(t) H_g φ). */
  private void applyL(double[] phi, double t, double[] out, double[] work) {
    stiffness.multiply(phi, out);
    if (model.hasFirstOrderSource()) {
      sink.multiply(phi, work);
      for (int i = 0; i < out.length; i++) {
        out[i] -= work[i];
      }
    }
    for (Exchange e : exchanges) {
      double h = e.condition().coefficient().at(t);
      if (h != 0) {
        e.mass().multiply(phi, work);
        for (int i = 0; i < out.length; i++) {
          out[i] += h * work[i];
        }
      }
    }
  }

  /** f(t) into out: flux loads, exchange loads h·c_env, constant sources. */
  private void load(double t, double[] out) {
    System.arraycopy(constantLoad, 0, out, 0, out.length);
    for (Flux f : fluxes) {
      double q = f.condition().value().at(t);
      double[] u = f.unitLoad();
      for (int i = 0; i < out.length; i++) {
        out[i] += q * u[i];
      }
    }
    for (Exchange e : exchanges) {
      double hc = e.condition().coefficient().at(t) * e.condition().value().at(t);
      double[] u = e.unitLoad();
      for (int i = 0; i < out.length; i++) {
        out[i] += hc * u[i];
      }
    }
  }

  private double[] exchangeCoefficients(double t) {
    double[] h = new double[exchanges.size()];
    for (int g = 0; g < h.length; g++) {
      h[g] = exchanges.get(g).condition().coefficient().at(t);
    }
    return h;
  }

  /** Builds M + θ dt L(t1) with prescribed rows and columns eliminated, when anything changed. */
  private void prepareSystem(double dt, double theta, double t1) {
    double[] h = exchangeCoefficients(t1);
    if (dt == systemDt && theta == systemTheta && Arrays.equals(h, systemH)) {
      return;
    }
    fullSystem(unreduced, dt, theta, h);
    double[] a = system.values();
    System.arraycopy(unreduced.values(), 0, a, 0, a.length);
    int[] rs = system.rowStart();
    int[] cols = system.cols();
    for (int i = 0; i < system.size(); i++) {
      if (isPrescribed[i]) {
        for (int k = rs[i]; k < rs[i + 1]; k++) {
          if (cols[k] == i) {
            heldDiagonal[i] = a[k];
          } else {
            a[k] = 0.0;
          }
        }
      }
    }
    for (int k : eliminated) {
      a[k] = 0.0;
    }
    solver.setMatrix(system);
    systemDt = dt;
    systemTheta = theta;
    systemH = h;
  }

  private void fullSystem(CsrMatrix target, double dt, double theta, double[] h) {
    target.setZero();
    target.addScaled(1.0, capacity);
    target.addScaled(theta * dt, stiffness);
    if (model.hasFirstOrderSource()) {
      target.addScaled(-theta * dt, sink);
    }
    for (int g = 0; g < exchanges.size(); g++) {
      if (h[g] != 0) {
        target.addScaled(theta * dt * h[g], exchanges.get(g).mass());
      }
    }
  }

  /**
   * A copy of the matrix one step solves, M + θ·dt·L(t1) with held rows and columns eliminated
   * (held rows keep their diagonal): for users who cross-check a solve with another tool.
   */
  public CsrMatrix systemMatrix(double dt, double theta, double t1) {
    prepareSystem(dt, theta, t1);
    CsrMatrix copy = system.zeroCopy();
    copy.addScaled(1.0, system);
    return copy;
  }

  /**
   * Advances phi0 at t0 by dt with weight theta (1 = backward Euler, 0.5 = Crank–Nicolson).
   *
   * @throws dev.soakfield.fem.solve.SolverStalledException when the linear solve does not converge
   */
  public StepOutcome step(double[] phi0, double t0, double dt, double theta) {
    int n = phi0.length;
    double t1 = t0 + dt;
    double[] work = new double[n];
    double[] l0 = new double[n];
    double[] rhs = new double[n];
    capacity.multiply(phi0, rhs);
    if (theta < 1.0) {
      applyL(phi0, t0, l0, work);
      double[] f0 = new double[n];
      load(t0, f0);
      for (int i = 0; i < n; i++) {
        rhs[i] += -(1 - theta) * dt * l0[i] + (1 - theta) * dt * f0[i];
      }
    }
    double[] f1 = new double[n];
    load(t1, f1);
    for (int i = 0; i < n; i++) {
      rhs[i] += theta * dt * f1[i];
    }
    double[] fullRhs = rhs.clone();

    double[] phi1 = phi0.clone();
    applyPrescribed(phi1, t1);
    long solveStart = System.nanoTime();
    prepareSystem(dt, theta, t1);
    // symmetric elimination: move prescribed columns to the right-hand side
    double[] phiD = new double[n];
    for (int i = 0; i < n; i++) {
      if (isPrescribed[i]) {
        phiD[i] = phi1[i];
      }
    }
    double[] aDphiD = new double[n];
    if (!prescribed.isEmpty()) {
      unreduced.multiply(phiD, aDphiD);
    }
    for (int i = 0; i < n; i++) {
      rhs[i] = isPrescribed[i] ? heldDiagonal[i] * phi1[i] : rhs[i] - aDphiD[i];
    }
    int iterations = solver.solve(rhs, phi1).iterations();
    double solveSeconds = (System.nanoTime() - solveStart) * 1e-9;

    double[] inflow = new double[faceGroupCount];
    if (!prescribed.isEmpty()) {
      double[] r = new double[n];
      unreduced.multiply(phi1, r);
      for (int i = 0; i < n; i++) {
        if (isPrescribed[i]) {
          inflow[prescribedOwner[i]] += r[i] - fullRhs[i];
        }
      }
    }
    for (Flux f : fluxes) {
      inflow[f.condition().group()] +=
          dt
              * f.area()
              * (theta * f.condition().value().at(t1) + (1 - theta) * f.condition().value().at(t0));
    }
    for (Exchange e : exchanges) {
      FaceCondition c = e.condition();
      double in1 =
          c.coefficient().at(t1) * (c.value().at(t1) * e.area() - dot(e.massRowSums(), phi1));
      double in0 =
          theta < 1.0
              ? c.coefficient().at(t0) * (c.value().at(t0) * e.area() - dot(e.massRowSums(), phi0))
              : 0.0;
      inflow[c.group()] += dt * (theta * in1 + (1 - theta) * in0);
    }
    double source = dt * sum(constantLoad);
    if (model.hasFirstOrderSource()) {
      source += dt * (theta * dot(sinkRowSums, phi1) + (1 - theta) * dot(sinkRowSums, phi0));
    }
    return new StepOutcome(phi1, inflow, source, amount(phi1), iterations, solveSeconds);
  }
}
