package dev.soakfield.app;

import java.util.Optional;

/**
 * What the pointer is over and what the last click hit: the face group and part named there and a
 * probe placed there with the field's curve through the frames.
 */
public final class ProbeSelection {
  private String hover = "";
  private Optional<String> picked = Optional.empty();
  private Optional<Probe> probe = Optional.empty();
  private Optional<double[]> curve = Optional.empty();

  public String hover() {
    return hover;
  }

  public void hover(String text) {
    hover = text;
  }

  /** A click at view pixel (x, y): names the face group under it and places a probe there. */
  public void click(Scene scene, OrbitCamera camera, double x, double y) {
    double[] ray = camera.ray(x, y);
    Optional<PickIndex.Hit> hit = scene.pick(camera, x, y);
    if (hit.isEmpty()) {
      picked = Optional.empty();
      probe = Optional.empty();
      curve = Optional.empty();
      return;
    }
    picked = Optional.of(scene.describe(hit.get()));
    Probe p = Probe.at(scene, ray, hit.get());
    probe = Optional.of(p);
    curve = scene.settings().field().flatMap(f -> p.curve(scene.study(), f));
  }

  /** The field shown changed to {@code f}: the probe's curve follows it. */
  public void fieldChanged(Study study, FieldKind f) {
    curve = probe.flatMap(p -> p.curve(study, f));
  }

  public Optional<String> picked() {
    return picked;
  }

  public Optional<Probe> probe() {
    return probe;
  }

  public Optional<double[]> curve() {
    return curve;
  }
}
