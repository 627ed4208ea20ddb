package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.ExposureHistory;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.fem.units.Quantities;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A case as read from its file: what to run, not yet checked against the mesh (see {@link
 * CaseChecks#againstMesh}). Immutable; maps keep the order of the file.
 *
 * @param caseFile the case file as given to {@link CaseReader#read}
 * @param mesh the mesh file, resolved against the case file's folder
 * @param elements element order to run with
 * @param materials by volume group name
 * @param faces boundary conditions by face group name (groups not named here are sealed)
 * @param initial initial concentration
 * @param time time control
 * @param probes points to record
 * @param threshold the concentration whose first arrival is reported, when given
 * @param places where each key path's value stands in the file
 * @param law how the potential relates to the concentration and the environment
 * @param temperature the constant temperature in K when the case gives one, else NaN
 * @param exposure the exposure history, when the case gives one
 * @param quantities the declared concentration unit and species
 * @param thresholds the levels whose first crossings the results report
 * @param breakthroughShare the share of the steady flux whose first arrival is a face group's
 *     breakthrough time ({@code "permeation": {"breakthrough_share": ...}}, default 0.1)
 */
public record CaseSpec(
    Path caseFile,
    Path mesh,
    ElementChoice elements,
    Map<String, MaterialSpec> materials,
    Map<String, FaceSpec> faces,
    InitialSpec initial,
    TimeSpec time,
    List<ProbeSpec> probes,
    OptionalDouble threshold,
    Map<String, SourcePlace> places,
    SorptionLaw law,
    double temperature,
    Optional<ExposureHistory> exposure,
    Quantities quantities,
    List<ThresholdSpec> thresholds,
    double breakthroughShare,
    OptionalDouble accuracy) {
  /** The breakthrough share when the case states none (common practice: 10 %). */
  public static final double DEFAULT_BREAKTHROUGH_SHARE = 0.1;

  public CaseSpec {
    Objects.requireNonNull(caseFile, "caseFile");
    Objects.requireNonNull(mesh, "mesh");
    Objects.requireNonNull(elements, "elements");
    materials = ordered(materials);
    faces = ordered(faces);
    Objects.requireNonNull(initial, "initial");
    Objects.requireNonNull(time, "time");
    probes = List.copyOf(probes);
    Objects.requireNonNull(threshold, "threshold");
    places = ordered(places);
    Objects.requireNonNull(law, "law");
    Objects.requireNonNull(exposure, "exposure");
    Objects.requireNonNull(quantities, "quantities");
    thresholds = List.copyOf(thresholds);
    Objects.requireNonNull(accuracy, "accuracy");
    if (!(breakthroughShare > 0 && breakthroughShare < 1)) {
      throw new IllegalArgumentException("breakthrough share in (0, 1), got " + breakthroughShare);
    }
  }

  /** A case with the default breakthrough share. */
  public CaseSpec(
      Path caseFile,
      Path mesh,
      ElementChoice elements,
      Map<String, MaterialSpec> materials,
      Map<String, FaceSpec> faces,
      InitialSpec initial,
      TimeSpec time,
      List<ProbeSpec> probes,
      OptionalDouble threshold,
      Map<String, SourcePlace> places,
      SorptionLaw law,
      double temperature,
      Optional<ExposureHistory> exposure,
      Quantities quantities,
      List<ThresholdSpec> thresholds) {
    this(
        caseFile,
        mesh,
        elements,
        materials,
        faces,
        initial,
        time,
        probes,
        threshold,
        places,
        law,
        temperature,
        exposure,
        quantities,
        thresholds,
        DEFAULT_BREAKTHROUGH_SHARE,
        OptionalDouble.empty());
  }

  /** The temperature over time: the exposure's, the constant one, or 20 °C. */
  public TimeFunction temperatureHistory() {
    if (exposure.isPresent()) {
      return exposure.get().temperatureFunction();
    }
    return TimeFunction.constant(
        Double.isNaN(temperature) ? ExposureHistory.ROOM_TEMPERATURE : temperature);
  }

  private static <V> Map<String, V> ordered(Map<String, V> map) {
    return Collections.unmodifiableMap(new LinkedHashMap<>(map));
  }

  /** The same case under another environment and time control (for bake searches). */
  public CaseSpec withEnvironment(Optional<ExposureHistory> newExposure, TimeSpec newTime) {
    return new CaseSpec(
        caseFile,
        mesh,
        elements,
        materials,
        faces,
        initial,
        newTime,
        probes,
        threshold,
        places,
        law,
        temperature,
        newExposure,
        quantities,
        thresholds,
        breakthroughShare,
        accuracy);
  }

  /** The same case starting from {@code newInitial} (a TDS ramp from an earlier run's state). */
  public CaseSpec withInitial(InitialSpec newInitial) {
    return new CaseSpec(
        caseFile,
        mesh,
        elements,
        materials,
        faces,
        newInitial,
        time,
        probes,
        threshold,
        places,
        law,
        temperature,
        exposure,
        quantities,
        thresholds,
        breakthroughShare,
        accuracy);
  }

  /** The same case with its mesh read from another file (a result folder's copy). */
  public CaseSpec withMesh(Path newMesh) {
    return new CaseSpec(
        caseFile,
        newMesh,
        elements,
        materials,
        faces,
        initial,
        time,
        probes,
        threshold,
        places,
        law,
        temperature,
        exposure,
        quantities,
        thresholds,
        breakthroughShare,
        accuracy);
  }

  /** Where the value at {@code path} stands, or line 0 when the file does not hold the path. */
  public SourcePlace placeOf(String path) {
    return places.getOrDefault(path, new SourcePlace(0, 0));
  }
}
