package dev.soakfield.fem.time;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import dev.soakfield.fem.model.FaceOwners;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.solve.PcgSolver;
import dev.soakfield.fem.solve.PreconditionerKind;
import dev.soakfield.fem.solve.SolverStalledException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;

/**
 * One step of the theta scheme for the conservative balance d(M(T)φ)/dt + L(t) φ = f(t) + q(φ):
 *
 * <pre>(M₁ + θ·dt·L₁) φ₁ − dt·q(φ₁) = M₀ φ₀ − (1−θ)·dt·L₀ φ₀ + dt·(θ f₁ + (1−θ) f₀) + R</pre>
 *
 * with L = K − K_src + Σ h_g(t) H_g. M₀ is the capacity the previous step ended with, so the amount
 * is conserved when the solubility changes with temperature. q are the nodal sources of the
 * materials' source laws, integrated implicitly (their own state advanced over the step) and solved
 * for by Newton's method with a backtracking line search; without laws a step is one linear solve.
 * R, nonzero only on prescribed nodes, is the amount those nodes take in during the step (the
 * consistent reaction, so the balance closes). Held nodes are eliminated symmetrically, so the
 * system stays symmetric positive definite for conjugate gradients. Coefficient matrices depend on
 * time only through the temperature and are cached for the last two temperatures; the system matrix
 * and its preconditioner are rebuilt only when dt, theta, a transfer coefficient or the temperature
 * change.
 *
 * <p>The stepper holds the committed state of the source laws: {@link #commit} after each accepted
 * step.
 */
@SuppressWarnings("ArrayRecordComponent") // private records carry precomputed arrays, never shared
public final class ThetaStepper {
  private static final int NEWTON_MAX_ITERATIONS = 30;
  private static final double NEWTON_TOLERANCE = 1e-10;

  private final DiffusionModel model;
  private final SystemAssembler asm;
  private final boolean lumped;
  private final int n;
  private final int[] faceOwner;
  private final List<Exchange> exchanges = new ArrayList<>();
  private final List<Flux> fluxes = new ArrayList<>();
  private final List<Prescribed> prescribed = new ArrayList<>();
  private final boolean[] isPrescribed;
  private final int[] prescribedOwner; // face group index of each prescribed dof, else -1
  private final int faceGroupCount;
  private final double[] constantLoad;
  private final LawSources laws;
  private final PcgSolver solver;
  private final CsrMatrix system;
  private final CsrMatrix unreduced; // the same system before elimination, for the reactions
  private final CsrMatrix jacobian; // system plus the laws' derivative on the diagonal
  private final int[] eliminated; // CSR positions in free rows whose column is prescribed
  private final int[] diagonalPosition;
  // Held rows keep their own diagonal (x_i = φ_D scaled by it), so they do not dominate ‖b‖ and the
  // solver's relative tolerance stays meaningful for the free rows.
  private final double[] prescribedDiagonal;
  private final boolean coefficientsVary;
  private final Coefficients[] cache = new Coefficients[2];
  private long useCounter;
  private boolean solverHasSystem;
  private double systemDt = Double.NaN;
  private double systemTheta = Double.NaN;
  private double systemTemperature = Double.NaN;
  private double[] systemH = new double[0];
  private double[] newtonResiduals = new double[0];

  private record Exchange(FaceCondition condition, double[] unitLoad, double area) {}

  private record Flux(FaceCondition condition, double[] unitLoad, double area) {}

  /** Prescribed dofs of one group. */
  private record Prescribed(FaceCondition condition, int[] dofs) {}

  /** Everything that depends on the temperature, assembled for one temperature. */
  private final class Coefficients {
    double temperature = Double.NaN;
    long lastUse;
    final CsrMatrix capacity = asm.newMatrix();
    final CsrMatrix stiffness = asm.newMatrix();
    final CsrMatrix sink = asm.newMatrix(); // first-order source: k S mass
    final double[] capacityRowSums = new double[n];
    final double[] sinkRowSums = new double[n];
    final List<CsrMatrix> exchangeMass = new ArrayList<>();
    final List<double[]> exchangeRowSums = new ArrayList<>();
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
      sink.setZero();
      if (model.hasFirstOrderSource()) {
        double[] ks = new double[s.length];
        for (int t = 0; t < ks.length; t++) {
          ks[t] = model.firstOrderRate()[t] * s[t];
        }
        asm.addCapacity(sink, ks, lumped, 1.0);
      }
      double[] ones = filled(n, 1.0);
      capacity.multiply(ones, capacityRowSums);
      sink.multiply(ones, sinkRowSums);
      boolean first = exchangeMass.isEmpty();
      for (int g = 0; g < exchanges.size(); g++) {
        int[] faces = exchanges.get(g).condition().faces();
        double[] faceS = faceSolubility(faces, s);
        CsrMatrix h = first ? asm.newMatrix() : exchangeMass.get(g);
        h.setZero();
        asm.addFaceMass(h, faces, faceS, 1.0);
        double[] rows = new double[n];
        h.multiply(ones, rows);
        double[] sLoad = new double[n];
        asm.addFaceLoad(sLoad, faces, faceS, 1.0);
        if (first) {
          exchangeMass.add(h);
          exchangeRowSums.add(rows);
          exchangeSLoad.add(sLoad);
        } else {
          exchangeRowSums.set(g, rows);
          exchangeSLoad.set(g, sLoad);
        }
      }
      inverseS.clear();
      for (Prescribed p : prescribed) {
        inverseS.add(inverseSolubility(p, s));
      }
    }
  }

  /**
   * Assembles the boundary data of the model once and the coefficient matrices at the starting
   * temperature.
   *
   * @param lumped lumped (diagonal) capacity instead of consistent
   * @param solverTolerance relative residual ‖r‖ ≤ tol·‖b‖ of each linear solve
   */
  public ThetaStepper(
      DiffusionModel model, boolean lumped, double solverTolerance, int maxIterations) {
    this.model = model;
    this.lumped = lumped;
    this.asm = new SystemAssembler(model.space());
    this.n = model.space().dofCount();
    this.coefficientsVary = model.coefficientsVary();
    faceGroupCount = model.space().mesh().faceGroups().size();
    faceOwner = FaceOwners.of(model.space().mesh());
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
          fluxes.add(new Flux(fc, load, sum(load)));
        }
        case EXCHANGE -> {
          double[] load = new double[n];
          asm.addFaceLoad(load, faces, ones, 1.0);
          exchanges.add(new Exchange(fc, load, sum(load)));
        }
        case SEALED -> {
          // nothing enters
        }
      }
    }
    system = asm.newMatrix();
    unreduced = system.zeroCopy();
    jacobian = system.zeroCopy();
    eliminated = eliminatedPositions();
    diagonalPosition = new int[n];
    for (int i = 0; i < n; i++) {
      diagonalPosition[i] = system.indexOf(i, i);
    }
    prescribedDiagonal = new double[n];
    solver = new PcgSolver(solverTolerance, maxIterations, PreconditionerKind.AUTO);
    laws = new LawSources(model, asm);
    coefficients(0.0);
    if (!laws.isEmpty()) {
      laws.initialize(model.initialPhi(), temperatureAt(0.0));
    }
  }

  /** The temperature a step ending at t sees (left limit), K. */
  private double temperatureAt(double t) {
    return model.temperature().at(t);
  }

  /**
   * The coefficient set for the temperature at time t, from the cache when it holds it; a miss
   * reassembles the least recently used set, never the one used last (a step holds two).
   */
  private Coefficients coefficients(double t) {
    double kelvin = coefficientsVary ? temperatureAt(t) : model.referenceTemperature();
    useCounter++;
    Coefficients oldest = null;
    for (int k = 0; k < cache.length; k++) {
      Coefficients c = cache[k];
      if (c == null) {
        c = new Coefficients();
        cache[k] = c;
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

  private double[] faceSolubility(int[] faces, double[] tetS) {
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
  private double[] inverseSolubility(Prescribed p, double[] tetS) {
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

  /** The amount 1ᵀ M φ at the starting temperature, plus what the source laws hold. */
  public double amount(double[] phi) {
    return amount(phi, 0.0);
  }

  /** The mobile amount 1ᵀ M(T(t)) φ plus what the committed law states hold. */
  public double amount(double[] phi, double t) {
    double mobile = dot(coefficients(t).capacityRowSums, phi);
    return laws.isEmpty() ? mobile : mobile + laws.trappedNow(temperatureAt(t));
  }

  /** Amount trapped in the committed source-law states per volume group (zeros without laws). */
  public double[] trappedPerGroup(double t) {
    return laws.isEmpty()
        ? new double[model.space().mesh().volumeGroups().size()]
        : laws.trappedPerGroup(temperatureAt(t));
  }

  /** Trapped amount per m³ at each node from the committed law states (zeros without laws). */
  public double[] trappedField(double t) {
    return laws.isEmpty() ? new double[n] : laws.trappedField(temperatureAt(t));
  }

  /** True when some material carries a source law (the outputs then show the trapped amount). */
  public boolean hasSourceLaws() {
    return !laws.isEmpty();
  }

  /** The committed source-law states (copies), for checkpoints. */
  public double[][] lawStates() {
    return laws.committed();
  }

  /** Restores committed source-law states saved by {@link #lawStates()}. */
  public void restoreLawStates(double[][] states) {
    laws.commit(states);
  }

  /** Makes the law states a step computed the committed ones: call once per accepted step. */
  public void commit(StepOutcome accepted) {
    if (accepted.lawStates() != null) {
      laws.commit(accepted.lawStates());
    }
  }

  /**
   * Sets the prescribed potentials of time t into phi and returns, per face group, the amount that
   * raising them added: at the start of a run a prescribed face takes in at once what fills the
   * first layer of elements, and the balance counts it as inflow.
   */
  public double[] raise(double[] phi, double t) {
    double[] before = phi.clone();
    applyPrescribed(phi, t);
    double[] rowSums = coefficients(t).capacityRowSums;
    double[] added = new double[faceGroupCount];
    for (int i = 0; i < phi.length; i++) {
      if (isPrescribed[i] && phi[i] != before[i]) {
        added[prescribedOwner[i]] += rowSums[i] * (phi[i] - before[i]);
      }
    }
    return added;
  }

  /** Sets the prescribed potentials of time t into phi. */
  public void applyPrescribed(double[] phi, double t) {
    Coefficients co = coefficients(t);
    for (int g = 0; g < prescribed.size(); g++) {
      Prescribed p = prescribed.get(g);
      double c = p.condition().value().at(t);
      int[] dofs = p.dofs();
      double[] inv = co.inverseS.get(g);
      for (int i = 0; i < dofs.length; i++) {
        if (prescribedOwner[dofs[i]] == p.condition().group()) {
          phi[dofs[i]] = c * inv[i];
        }
      }
    }
  }

  /**
   * The largest potential the boundary data impose (prescribed values and exchange environments,
   * over their table points, as potentials): the natural scale of the field for step-error control;
   * 0 when only fluxes drive the problem.
   */
  public double referencePotential() {
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
  public double[] breakpoints() {
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

  /** L φ at time t into out (K φ − K_src φ + Σ h_g(t) H_g φ). */
  private void applyL(Coefficients co, double[] phi, double t, double[] out, double[] work) {
    co.stiffness.multiply(phi, out);
    if (model.hasFirstOrderSource()) {
      co.sink.multiply(phi, work);
      for (int i = 0; i < out.length; i++) {
        out[i] -= work[i];
      }
    }
    for (int g = 0; g < exchanges.size(); g++) {
      double h = exchanges.get(g).condition().coefficient().at(t);
      if (h != 0) {
        co.exchangeMass.get(g).multiply(phi, work);
        for (int i = 0; i < out.length; i++) {
          out[i] += h * work[i];
        }
      }
    }
  }

  /** f(t) into out: flux loads, exchange loads h·c_env (or h·S·φ_env), constant sources. */
  private void load(Coefficients co, double t, double[] out) {
    System.arraycopy(constantLoad, 0, out, 0, out.length);
    for (Flux f : fluxes) {
      double q = f.condition().value().at(t);
      double[] u = f.unitLoad();
      for (int i = 0; i < out.length; i++) {
        out[i] += q * u[i];
      }
    }
    for (int g = 0; g < exchanges.size(); g++) {
      Exchange e = exchanges.get(g);
      double hc = e.condition().coefficient().at(t) * e.condition().value().at(t);
      double[] u = e.condition().valueIsPotential() ? co.exchangeSLoad.get(g) : e.unitLoad();
      for (int i = 0; i < out.length; i++) {
        out[i] += hc * u[i];
      }
    }
  }

  /** The environment's inflow rate through exchange group g at time t for the field phi. */
  private double exchangeInflow(Coefficients co, int g, double t, double[] phi) {
    Exchange e = exchanges.get(g);
    FaceCondition c = e.condition();
    double env =
        c.valueIsPotential()
            ? c.value().at(t) * sum(co.exchangeSLoad.get(g))
            : c.value().at(t) * e.area();
    return c.coefficient().at(t) * (env - dot(co.exchangeRowSums.get(g), phi));
  }

  private double[] exchangeCoefficients(double t) {
    double[] h = new double[exchanges.size()];
    for (int g = 0; g < h.length; g++) {
      h[g] = exchanges.get(g).condition().coefficient().at(t);
    }
    return h;
  }

  /** Builds M + θ dt L(t1) with prescribed rows and columns eliminated, when anything changed. */
  private void prepareSystem(Coefficients co, double dt, double theta, double t1) {
    double[] h = exchangeCoefficients(t1);
    if (dt == systemDt
        && theta == systemTheta
        && co.temperature == systemTemperature
        && Arrays.equals(h, systemH)) {
      return;
    }
    fullSystem(co, unreduced, dt, theta, h);
    double[] a = system.values();
    System.arraycopy(unreduced.values(), 0, a, 0, a.length);
    int[] rs = system.rowStart();
    int[] cols = system.cols();
    for (int i = 0; i < system.size(); i++) {
      if (isPrescribed[i]) {
        for (int k = rs[i]; k < rs[i + 1]; k++) {
          if (cols[k] == i) {
            prescribedDiagonal[i] = a[k];
          } else {
            a[k] = 0.0;
          }
        }
      }
    }
    for (int k : eliminated) {
      a[k] = 0.0;
    }
    solverHasSystem = false;
    systemDt = dt;
    systemTheta = theta;
    systemTemperature = co.temperature;
    systemH = h;
  }

  private void fullSystem(Coefficients co, CsrMatrix target, double dt, double theta, double[] h) {
    target.setZero();
    target.addScaled(1.0, co.capacity);
    target.addScaled(theta * dt, co.stiffness);
    if (model.hasFirstOrderSource()) {
      target.addScaled(-theta * dt, co.sink);
    }
    for (int g = 0; g < exchanges.size(); g++) {
      if (h[g] != 0) {
        target.addScaled(theta * dt * h[g], co.exchangeMass.get(g));
      }
    }
  }

  /**
   * A copy of the matrix one step solves, M + θ·dt·L(t1) with prescribed rows and columns
   * eliminated (prescribed rows keep their diagonal): for users who cross-check a solve with
   * another tool.
   */
  public CsrMatrix systemMatrix(double dt, double theta, double t1) {
    prepareSystem(coefficients(t1), dt, theta, t1);
    CsrMatrix copy = system.zeroCopy();
    copy.addScaled(1.0, system);
    return copy;
  }

  /**
   * Advances phi0 at t0 by dt with weight theta (1 = backward Euler, 0.5 = Crank–Nicolson). The law
   * states of the result are pending until {@link #commit}.
   *
   * @throws SolverStalledException when a linear solve does not converge
   * @throws StepNotConvergedException when Newton's method does not converge (retry shorter)
   */
  public StepOutcome step(double[] phi0, double t0, double dt, double theta) {
    double t1 = t0 + dt;
    // M₀ is the capacity the previous step ended with (left limit at t0): conservative when S jumps
    Coefficients c0 = coefficients(t0);
    double[] work = new double[n];
    double[] rhs = new double[n];
    c0.capacity.multiply(phi0, rhs);
    if (theta < 1.0) {
      double[] l0 = new double[n];
      applyL(c0, phi0, t0, l0, work);
      double[] f0 = new double[n];
      load(c0, t0, f0);
      for (int i = 0; i < n; i++) {
        rhs[i] += -(1 - theta) * dt * l0[i] + (1 - theta) * dt * f0[i];
      }
    }
    Coefficients c1 = coefficients(t1);
    double[] f1 = new double[n];
    load(c1, t1, f1);
    for (int i = 0; i < n; i++) {
      rhs[i] += theta * dt * f1[i];
    }
    double[] fullRhs = rhs.clone();

    double[] phi1 = phi0.clone();
    applyPrescribed(phi1, t1);
    long solveStart = System.nanoTime();
    prepareSystem(c1, dt, theta, t1);
    double kelvin = temperatureAt(t1);
    double[] q = new double[n];
    int iterations;
    int newton = 0;
    if (laws.isEmpty()) {
      iterations = linearSolve(rhs, phi1);
    } else {
      NewtonResult r = newtonSolve(fullRhs, phi1, t1, dt, kelvin, q);
      iterations = r.linearIterations();
      newton = r.iterations();
    }
    double solveSeconds = (System.nanoTime() - solveStart) * 1e-9;

    double[] inflow = new double[faceGroupCount];
    if (!prescribed.isEmpty()) {
      double[] r = new double[n];
      unreduced.multiply(phi1, r);
      for (int i = 0; i < n; i++) {
        if (isPrescribed[i]) {
          inflow[prescribedOwner[i]] += r[i] - fullRhs[i] - dt * q[i];
        }
      }
    }
    for (Flux f : fluxes) {
      inflow[f.condition().group()] +=
          dt
              * f.area()
              * (theta * f.condition().value().at(t1) + (1 - theta) * f.condition().value().at(t0));
    }
    for (int g = 0; g < exchanges.size(); g++) {
      double in1 = exchangeInflow(c1, g, t1, phi1);
      double in0 = theta < 1.0 ? exchangeInflow(c0, g, t0, phi0) : 0.0;
      inflow[exchanges.get(g).condition().group()] += dt * (theta * in1 + (1 - theta) * in0);
    }
    double source = dt * sum(constantLoad);
    if (model.hasFirstOrderSource()) {
      source += dt * (theta * dot(c1.sinkRowSums, phi1) + (1 - theta) * dot(c0.sinkRowSums, phi0));
    }
    double amountEnd = dot(c1.capacityRowSums, phi1);
    double[][] states = null;
    if (!laws.isEmpty()) {
      states = laws.advance(phi1, t1, dt, kelvin);
      double trappedStart = laws.trappedNow(temperatureAt(t0));
      double trappedEnd = laws.trapped(states, kelvin);
      // net production: what the laws' sources gave the mobile field, less what their states took
      source += dt * sum(q) + (trappedEnd - trappedStart);
      amountEnd += trappedEnd;
    }
    return new StepOutcome(
        phi1, inflow, source, amountEnd, iterations, solveSeconds, newton, states);
  }

  /**
   * The residual norms ‖R‖₂ of the Newton iterations of the last step with source laws (the first
   * is the starting guess's): the evidence of quadratic convergence.
   */
  public double[] lastNewtonResiduals() {
    return newtonResiduals.clone();
  }

  /** One linear solve of the eliminated system for the right-hand side before elimination. */
  private int linearSolve(double[] fullRhs, double[] phi1) {
    double[] b = eliminatedRhs(fullRhs, phi1);
    if (!solverHasSystem) {
      solver.setMatrix(system);
      solverHasSystem = true;
    }
    return solver.solve(b, phi1).iterations();
  }

  /**
   * The right-hand side of the eliminated system: prescribed rows scaled, prescribed columns moved
   * over.
   */
  private double[] eliminatedRhs(double[] fullRhs, double[] phi1) {
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
    double[] b = new double[n];
    for (int i = 0; i < n; i++) {
      b[i] = isPrescribed[i] ? prescribedDiagonal[i] * phi1[i] : fullRhs[i] - aDphiD[i];
    }
    return b;
  }

  private record NewtonResult(int iterations, int linearIterations) {}

  /**
   * Newton's method on the free rows of R(φ) = A φ − b − dt·q(φ) with a backtracking line search; q
   * receives the converged nodal sources. Held values stay as phi1 holds them.
   */
  private NewtonResult newtonSolve(
      double[] fullRhs, double[] phi1, double t1, double dt, double kelvin, double[] q) {
    double[] dq = new double[n];
    double[] residual = new double[n];
    double[] trial = new double[n];
    double[] delta = new double[n];
    double scale = norm(fullRhs);
    int linear = 0;
    laws.evaluate(phi1, t1, dt, kelvin, q, dq);
    double norm = residual(phi1, fullRhs, q, dt, residual);
    double[] history = new double[NEWTON_MAX_ITERATIONS + 1];
    for (int it = 0; it < NEWTON_MAX_ITERATIONS; it++) {
      history[it] = norm;
      double qScale = dt * norm(q);
      if (norm <= NEWTON_TOLERANCE * Math.max(scale + qScale, Double.MIN_NORMAL)) {
        newtonResiduals = Arrays.copyOf(history, it + 1);
        return new NewtonResult(it, linear);
      }
      // Jacobian: the system with −dt·∂q/∂φ on the free diagonal; preconditioner rebuilt on the
      // first iteration, where the laws' derivative may dominate the capacity term
      double[] a = jacobian.values();
      System.arraycopy(system.values(), 0, a, 0, a.length);
      for (int i = 0; i < n; i++) {
        if (!isPrescribed[i]) {
          a[diagonalPosition[i]] -= dt * dq[i];
        }
      }
      solverHasSystem = false;
      if (it == 0) {
        solver.setMatrix(jacobian);
      } else {
        solver.replaceMatrix(jacobian);
      }
      for (int i = 0; i < n; i++) {
        residual[i] = -residual[i];
      }
      Arrays.fill(delta, 0.0);
      linear += solver.solve(residual, delta).iterations();
      double lambda = 1.0;
      double trialNorm;
      double[] trialQ = new double[n];
      double[] trialDq = new double[n];
      while (true) {
        for (int i = 0; i < n; i++) {
          trial[i] = phi1[i] + lambda * delta[i];
        }
        laws.evaluate(trial, t1, dt, kelvin, trialQ, trialDq);
        trialNorm = residual(trial, fullRhs, trialQ, dt, residual);
        if (trialNorm <= (1 - 1e-4 * lambda) * norm || lambda < 1.0 / 64) {
          break;
        }
        lambda /= 2;
      }
      System.arraycopy(trial, 0, phi1, 0, n);
      System.arraycopy(trialQ, 0, q, 0, n);
      System.arraycopy(trialDq, 0, dq, 0, n);
      norm = trialNorm;
    }
    newtonResiduals = history;
    throw new StepNotConvergedException(
        t1 - dt, dt, NEWTON_MAX_ITERATIONS, norm / Math.max(scale, Double.MIN_NORMAL));
  }

  /** R = A φ − b − dt·q on free rows (0 on prescribed rows) into out; returns ‖R‖₂. */
  private double residual(double[] phi, double[] fullRhs, double[] q, double dt, double[] out) {
    unreduced.multiply(phi, out);
    double s = 0;
    for (int i = 0; i < n; i++) {
      if (isPrescribed[i]) {
        out[i] = 0.0;
      } else {
        out[i] -= fullRhs[i] + dt * q[i];
        s += out[i] * out[i];
      }
    }
    return Math.sqrt(s);
  }

  private double norm(double[] v) {
    double s = 0;
    for (int i = 0; i < n; i++) {
      if (!isPrescribed[i]) {
        s += v[i] * v[i];
      }
    }
    return Math.sqrt(s);
  }
}
