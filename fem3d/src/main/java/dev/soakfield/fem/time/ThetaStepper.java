package dev.soakfield.fem.time;

import static dev.soakfield.fem.time.VectorSums.dot;
import static dev.soakfield.fem.time.VectorSums.sum;

import dev.soakfield.fem.assembly.CsrMatrix;
import dev.soakfield.fem.assembly.SystemAssembler;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.solve.SolverStalledException;
import java.util.Arrays;

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
 * consistent reaction, so the balance closes). The parts: {@link BoundarySets} (the face conditions
 * sorted once), {@link CoefficientCache} (matrices per temperature), {@link EliminatedSystem}
 * (prescribed nodes eliminated symmetrically, the solver) and {@link SourceNewton} (the Newton loop
 * for source laws); this class orchestrates a step and its balance.
 *
 * <p>The stepper holds the committed state of the source laws: {@link #commit} after each accepted
 * step.
 */
public final class ThetaStepper {
  private final DiffusionModel model;
  private final SystemAssembler asm;
  private final int n;
  private final StepBuffers buffers;
  private final BoundarySets boundary;
  private final double[] constantLoad;
  private final LawSources laws;
  private final FaceLawSources faceLaws;
  private final CoefficientCache coefficients;
  private final EliminatedSystem system;
  private final SourceNewton newton;
  private final ExchangeRows exchangeRows;
  private final boolean[] onExchangeFace;

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
    asm = new SystemAssembler(model.space());
    this.n = model.space().dofCount();
    buffers = new StepBuffers(n);
    constantLoad = new double[n];
    if (model.hasConstantSource()) {
      asm.addVolumeLoad(constantLoad, model.constantRate(), 1.0);
    }
    boundary = new BoundarySets(model, asm);
    system = new EliminatedSystem(model, asm, boundary, solverTolerance, maxIterations);
    laws = new LawSources(model, asm);
    faceLaws = new FaceLawSources(model, asm, boundary.isPrescribed);
    NodalSources nodal =
        faceLaws.isEmpty()
            ? laws
            : (phi, t1, dt, kelvin, q, dq) -> {
              laws.evaluate(phi, t1, dt, kelvin, q, dq);
              faceLaws.add(phi, t1, kelvin, q, dq);
            };
    newton = new SourceNewton(nodal, system, boundary.isPrescribed);
    coefficients = new CoefficientCache(model, asm, boundary, lumped);
    exchangeRows = new ExchangeRows(model, boundary, constantLoad);
    onExchangeFace = exchangeRows.nodeMask();
    coefficients.at(0.0);
    if (!laws.isEmpty()) {
      laws.initialize(model.initialPhi(), temperatureAt(0.0));
    }
  }

  /**
   * The assembler of the model's mesh, for integrals over the results: its pattern and scatter maps
   * take as long to build as the matrices, so the run's recorder shares it.
   */
  public SystemAssembler assembler() {
    return asm;
  }

  /**
   * How many solves are expected to share one step matrix (all the steps of a run with fixed steps,
   * one with adaptive steps): the automatic preconditioner choice weighs AMG's set-up against it.
   */
  public void expectSolvesPerMatrix(int solves) {
    system.expectSolvesPerMatrix(solves);
  }

  /** The temperature a step ending at t sees (left limit), K. */
  private double temperatureAt(double t) {
    return model.temperature().at(t);
  }

  /** The amount 1ᵀ M φ at the starting temperature, plus what the source laws hold. */
  public double amount(double[] phi) {
    return amount(phi, 0.0);
  }

  /** The mobile amount 1ᵀ M(T(t)) φ plus what the committed law states hold. */
  public double amount(double[] phi, double t) {
    double mobile = dot(coefficients.at(t).capacityRowSums, phi);
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

  /** Each source-law instance as "part:name" (empty without laws). */
  public java.util.List<String> trapInstances() {
    return laws.instanceLabels();
  }

  /** Whether each source-law instance's trapped amount counts as diffusible. */
  public boolean[] reversibleTraps() {
    return laws.reversible();
  }

  /** The amount each source-law instance holds in its committed states. */
  public double[] trappedPerInstance(double t) {
    return laws.trappedPerInstance(temperatureAt(t));
  }

  /** What one source-law instance holds per m³ at each node (0 outside its material). */
  public double[] trappedField(int instance, double t) {
    return laws.trappedField(instance, temperatureAt(t));
  }

  /** Which nodes a concentration or ambient face prescribes (a copy). */
  public boolean[] prescribedNodes() {
    return boundary.isPrescribed.clone();
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
    double[] rowSums = coefficients.at(t).capacityRowSums;
    double[] added = new double[boundary.faceGroupCount];
    for (int i = 0; i < phi.length; i++) {
      if (boundary.isPrescribed[i] && phi[i] != before[i]) {
        added[boundary.prescribedOwner[i]] += rowSums[i] * (phi[i] - before[i]);
      }
    }
    return added;
  }

  /** Sets the prescribed potentials of time t into phi. */
  public void applyPrescribed(double[] phi, double t) {
    CoefficientCache.Coefficients co = coefficients.at(t);
    for (int g = 0; g < boundary.prescribed.size(); g++) {
      BoundarySets.Prescribed p = boundary.prescribed.get(g);
      double c = p.condition().value().at(t);
      int[] dofs = p.dofs();
      double[] inv = co.inverseS.get(g);
      for (int i = 0; i < dofs.length; i++) {
        if (boundary.prescribedOwner[dofs[i]] == p.condition().group()) {
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
    return boundary.referencePotential();
  }

  /** Every time at which a boundary table or the temperature changes slope or jumps. */
  public double[] breakpoints() {
    return boundary.breakpoints();
  }

  /** L φ at time t into out (K φ − K_src φ + Σ h_g(t) H_g φ). */
  private void applyL(
      CoefficientCache.Coefficients co, double[] phi, double t, double[] out, double[] work) {
    co.stiffness.multiply(phi, out);
    if (model.hasFirstOrderSource()) {
      co.sink.multiply(phi, work);
      for (int i = 0; i < out.length; i++) {
        out[i] -= work[i];
      }
    }
    for (int g = 0; g < boundary.exchanges.size(); g++) {
      double h = boundary.exchanges.get(g).condition().coefficient().at(t);
      if (h != 0) {
        co.exchangeMass.get(g).multiply(phi, work);
        for (int i = 0; i < out.length; i++) {
          out[i] += h * work[i];
        }
      }
    }
  }

  /** f(t) into out: flux loads, exchange loads h·c_env (or h·S·φ_env), constant sources. */
  private void load(CoefficientCache.Coefficients co, double t, double[] out) {
    System.arraycopy(constantLoad, 0, out, 0, out.length);
    for (BoundarySets.Flux f : boundary.fluxes) {
      double q = f.condition().value().at(t);
      double[] u = f.unitLoad();
      for (int i = 0; i < out.length; i++) {
        out[i] += q * u[i];
      }
    }
    for (int g = 0; g < boundary.exchanges.size(); g++) {
      BoundarySets.Exchange e = boundary.exchanges.get(g);
      double hc = e.condition().coefficient().at(t) * e.condition().value().at(t);
      double[] u = e.condition().valueIsPotential() ? co.exchangeSLoad.get(g) : e.unitLoad();
      for (int i = 0; i < out.length; i++) {
        out[i] += hc * u[i];
      }
    }
  }

  /**
   * A copy of the matrix one step solves, M + θ·dt·L(t1) with prescribed rows and columns
   * eliminated (prescribed rows keep their diagonal): for users who cross-check a solve with
   * another tool.
   */
  public CsrMatrix systemMatrix(double dt, double theta, double t1) {
    system.prepare(coefficients.at(t1), dt, theta, t1);
    return system.copy();
  }

  /**
   * Advances phi0 at t0 by dt with weight theta (1 = backward Euler, 0.5 = Crank–Nicolson). The law
   * states of the result are pending until {@link #commit}.
   *
   * @throws SolverStalledException when a linear solve does not converge
   * @throws StepNotConvergedException when Newton's method does not converge (retry shorter)
   */
  public StepOutcome step(double[] phi0, double t0, double dt, double theta) {
    return step(phi0, t0, dt, theta, null, 0);
  }

  /**
   * As {@link #step(double[], double, double, double)}, with the state one accepted step before
   * {@code phi0} ({@code before}, that step {@code beforeDt} long; null for none): the solves then
   * start from the linear extrapolation through the two states instead of from φ₀. The solver stops
   * on a residual relative to the right-hand side, so a guess nearer the answer saves iterations
   * (about a third on a smooth transient) and leaves the tolerance met as before.
   */
  public StepOutcome step(
      double[] phi0, double t0, double dt, double theta, double[] before, double beforeDt) {
    double t1 = t0 + dt;
    // M₀ is the capacity the previous step ended with (left limit at t0): conservative when S jumps
    CoefficientCache.Coefficients c0 = coefficients.at(t0);
    // the step's work vectors are kept from step to step: at a million nodes each is a "humongous"
    // object to G1, and allocating ten of them a step started a concurrent collection every step
    double[] work = buffers.work;
    double[] rhs = buffers.rhs;
    c0.capacity.multiply(phi0, rhs);
    if (theta < 1.0) {
      double[] l0 = buffers.explicitPart();
      applyL(c0, phi0, t0, l0, work);
      double[] f0 = work; // free again once L₀φ₀ is formed
      load(c0, t0, f0);
      for (int i = 0; i < n; i++) {
        rhs[i] += -(1 - theta) * dt * l0[i] + (1 - theta) * dt * f0[i];
      }
    }
    CoefficientCache.Coefficients c1 = coefficients.at(t1);
    double[] f1 = work;
    load(c1, t1, f1);
    for (int i = 0; i < n; i++) {
      rhs[i] += theta * dt * f1[i];
    }
    // the solves only read the right-hand side: the inflow below reads it after them
    double[] fullRhs = rhs;

    double[] phi1 = phi0.clone();
    if (before != null && beforeDt > 0) {
      double r = dt / beforeDt;
      for (int i = 0; i < n; i++) {
        phi1[i] += r * (phi0[i] - before[i]);
      }
    }
    applyPrescribed(phi1, t1);
    long solveStart = System.nanoTime();
    system.prepare(c1, dt, theta, t1);
    double kelvin = temperatureAt(t1);
    double[] q = buffers.rates;
    Arrays.fill(q, 0.0);
    int iterations;
    int newtonIterations = 0;
    if (laws.isEmpty() && faceLaws.isEmpty()) {
      iterations = system.solve(rhs, phi1);
    } else {
      SourceNewton.Result r = newton.solve(fullRhs, phi1, t1, dt, kelvin, q);
      iterations = r.linearIterations();
      newtonIterations = r.iterations();
    }
    double solveSeconds = (System.nanoTime() - solveStart) * 1e-9;

    double[] inflow = new double[boundary.faceGroupCount];
    if (!boundary.prescribed.isEmpty()) {
      double[] r = buffers.work;
      system.multiplyUnreduced(phi1, r);
      for (int i = 0; i < n; i++) {
        if (boundary.isPrescribed[i] && !onExchangeFace[i]) {
          inflow[boundary.prescribedOwner[i]] += r[i] - fullRhs[i] - dt * q[i];
        }
      }
    }
    for (BoundarySets.Flux f : boundary.fluxes) {
      inflow[f.condition().group()] +=
          dt
              * f.area()
              * (theta * f.condition().value().at(t1) + (1 - theta) * f.condition().value().at(t0));
    }
    double faceAmount = faceLaws.isEmpty() ? 0.0 : faceLaws.addInflow(phi1, t1, dt, kelvin, inflow);
    exchangeRows.addInflow(inflow, c0, c1, new ExchangeRows.Step(t0, t1, dt, theta), phi0, phi1, q);
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
      source += dt * sum(q) - faceAmount + (trappedEnd - trappedStart);
      amountEnd += trappedEnd;
    }
    return new StepOutcome(
        phi1, inflow, source, amountEnd, iterations, solveSeconds, newtonIterations, states);
  }

  /**
   * The residual norms ‖R‖₂ of the Newton iterations of the last step with source laws (the first
   * is the starting guess's): the evidence of quadratic convergence.
   */
  public double[] lastNewtonResiduals() {
    return newton.lastResiduals();
  }

  /** Work vectors of one step, reused by the next; nothing in them outlives the step. */
  private static final class StepBuffers {
    final double[] work;
    final double[] rhs;
    final double[] rates;
    private double[] explicitPart; // L₀φ₀: only with θ < 1

    StepBuffers(int n) {
      work = new double[n];
      rhs = new double[n];
      rates = new double[n];
    }

    double[] explicitPart() {
      if (explicitPart == null) {
        explicitPart = new double[rhs.length];
      }
      return explicitPart;
    }
  }
}
