package dev.soakfield.fem.model;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.physics.ExposureHistory;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.physics.TimeFunction;
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
  // null when zero everywhere, the usual case: each would be 12 MB at 1.5M tetrahedra
  private final double[] firstOrderRate;
  private final double[] constantRate;
  private final List<FaceCondition> faces;
  private final double[] initialPhi;
  private final int[] tetMaterial;
  private final List<MaterialBehaviour> materials;
  private final TimeFunction temperature;
  private final SorptionLaw law;

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
    this(
        space,
        solubility,
        conductance,
        firstOrderRate,
        constantRate,
        faces,
        initialPhi,
        new int[space.mesh().tetCount()],
        List.of(MaterialBehaviour.constant("all")),
        TimeFunction.constant(ROOM_TEMPERATURE),
        SorptionLaw.PLAIN);
  }

  /**
   * A model whose coefficients follow the temperature history and whose materials may carry source
   * laws.
   *
   * @param solubility S per tetrahedron at the reference temperature {@code temperature.at(0)}
   * @param conductance D·S per tetrahedron at the reference temperature
   * @param tetMaterial index into {@code materials} per tetrahedron
   * @param materials how each material's coefficients change with temperature, and its laws
   * @param temperature the temperature history, K
   * @param law how φ relates to c and to the environment
   */
  public DiffusionModel(
      FeSpace space,
      double[] solubility,
      double[] conductance,
      double[] firstOrderRate,
      double[] constantRate,
      List<FaceCondition> faces,
      double[] initialPhi,
      int[] tetMaterial,
      List<MaterialBehaviour> materials,
      TimeFunction temperature,
      SorptionLaw law) {
    this.space = Objects.requireNonNull(space, "space");
    int tets = space.mesh().tetCount();
    this.solubility = check(solubility, tets, "solubility");
    this.conductance = check(conductance, 6 * tets, "conductance");
    this.firstOrderRate = nonZeroOrNull(check(firstOrderRate, tets, "firstOrderRate"));
    this.constantRate = nonZeroOrNull(check(constantRate, tets, "constantRate"));
    this.faces = List.copyOf(faces);
    this.initialPhi = check(initialPhi, space.dofCount(), "initialPhi");
    if (tetMaterial.length != tets) {
      throw new IllegalArgumentException(
          "tetMaterial has " + tetMaterial.length + " entries, expected " + tets);
    }
    this.materials = List.copyOf(materials);
    for (int m : tetMaterial) {
      if (m < 0 || m >= this.materials.size()) {
        throw new IllegalArgumentException("material index " + m + " out of range");
      }
    }
    this.tetMaterial = tetMaterial.clone();
    this.temperature = Objects.requireNonNull(temperature, "temperature");
    this.law = Objects.requireNonNull(law, "law");
  }

  /**
   * 20 °C, the temperature of a model that names none: {@link ExposureHistory#ROOM_TEMPERATURE}.
   */
  public static final double ROOM_TEMPERATURE = ExposureHistory.ROOM_TEMPERATURE;

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

  /** k per tetrahedron (shared; do not modify); zeros, made anew, when there is no such source. */
  public double[] firstOrderRate() {
    return firstOrderRate != null ? firstOrderRate : new double[space.mesh().tetCount()];
  }

  /** r per tetrahedron (shared; do not modify); zeros, made anew, when there is no such source. */
  public double[] constantRate() {
    return constantRate != null ? constantRate : new double[space.mesh().tetCount()];
  }

  private static double[] nonZeroOrNull(double[] a) {
    for (double v : a) {
      if (v != 0) {
        return a;
      }
    }
    return null;
  }

  public List<FaceCondition> faces() {
    return faces;
  }

  /** A copy of the initial potential. */
  public double[] initialPhi() {
    return initialPhi.clone();
  }

  /** Material index per tetrahedron (shared; do not modify). */
  public int[] tetMaterial() {
    return tetMaterial;
  }

  public List<MaterialBehaviour> materials() {
    return materials;
  }

  /** The temperature history, K. */
  public TimeFunction temperature() {
    return temperature;
  }

  /** The temperature at which the per-tetrahedron coefficients hold, K. */
  public double referenceTemperature() {
    return temperature.at(0);
  }

  public SorptionLaw law() {
    return law;
  }

  /** True when some coefficient changes during the run (temperature varies and matters). */
  public boolean coefficientsVary() {
    boolean matters = false;
    for (MaterialBehaviour m : materials) {
      matters |= m.dependsOnTemperature();
    }
    if (!matters) {
      return false;
    }
    double t0 = temperature.at(0);
    for (double b : temperature.breakpoints()) {
      if (temperature.at(b) != t0) {
        return true;
      }
    }
    return false;
  }

  /** True when some material carries a source law. */
  public boolean hasSourceLaws() {
    for (MaterialBehaviour m : materials) {
      if (!m.laws().isEmpty()) {
        return true;
      }
    }
    return false;
  }

  /** Per material (volume group), the solve's concentration per unit of the case's. */
  public double[] concentrationScales() {
    double[] f = new double[materials.size()];
    for (int m = 0; m < f.length; m++) {
      f[m] = materials.get(m).concentrationScale();
    }
    return f;
  }

  /**
   * The solubility that gives concentrations in the case's declared unit: {@code tetS} (the
   * solve's, amount per m³ per potential) over each material's concentration scale. Amounts use
   * {@code tetS} itself.
   */
  public double[] declaredSolubility(double[] tetS) {
    double[] out = new double[tetS.length];
    for (int t = 0; t < out.length; t++) {
      out[t] = tetS[t] / materials.get(tetMaterial[t]).concentrationScale();
    }
    return out;
  }

  /** S per tetrahedron at a temperature (a new array). */
  public double[] solubilityAt(double kelvin) {
    double tRef = referenceTemperature();
    double[] ratio = new double[materials.size()];
    for (int m = 0; m < ratio.length; m++) {
      ratio[m] = materials.get(m).solubilityRatio(kelvin, tRef);
    }
    double[] s = new double[solubility.length];
    for (int t = 0; t < s.length; t++) {
      s[t] = solubility[t] * ratio[tetMaterial[t]];
    }
    return s;
  }

  /** D·S per tetrahedron at a temperature (a new array, 6 numbers each). */
  public double[] conductanceAt(double kelvin) {
    double tRef = referenceTemperature();
    double[] ratio = new double[materials.size()];
    for (int m = 0; m < ratio.length; m++) {
      MaterialBehaviour b = materials.get(m);
      ratio[m] = b.solubilityRatio(kelvin, tRef) * b.diffusivityRatio(kelvin, tRef);
    }
    double[] k = new double[conductance.length];
    for (int t = 0; t < solubility.length; t++) {
      double r = ratio[tetMaterial[t]];
      for (int j = 0; j < 6; j++) {
        k[6 * t + j] = conductance[6 * t + j] * r;
      }
    }
    return k;
  }

  public boolean hasFirstOrderSource() {
    return firstOrderRate != null;
  }

  public boolean hasConstantSource() {
    return constantRate != null;
  }
}
