package dev.soakfield.app;

import java.util.Optional;

/**
 * Everything the workbench window shows and remembers, with no GL: the study, what is shown ({@link
 * ViewSettings}) and its {@link Scene}, the camera, the section and isosurface controls, playback,
 * the probe and the notes. The window's panels and gestures read and change this.
 */
public final class WorkbenchModel {
  private final Study study;
  private final ViewSettings settings = new ViewSettings();
  private final Scene scene;
  private final OrbitCamera camera = new OrbitCamera();
  private final SectionControl section;
  private final IsoControl iso;
  private final Playback playback = new Playback();
  private final ProbeSelection probe = new ProbeSelection();
  private final Notes notes = new Notes();

  /** Opens on the last frame coloured by concentration, or on the face groups with no results. */
  public WorkbenchModel(Study study) {
    this.study = study;
    if (study.results().isEmpty()) {
      settings.field(Optional.empty());
    } else {
      settings.frame(study.results().get().frameCount() - 1);
    }
    scene = new Scene(study, settings);
    section = new SectionControl(study.geometry().bounds());
    iso = new IsoControl(scene.low(), scene.high());
  }

  public Study study() {
    return study;
  }

  public ViewSettings settings() {
    return settings;
  }

  public Scene scene() {
    return scene;
  }

  public OrbitCamera camera() {
    return camera;
  }

  public SectionControl section() {
    return section;
  }

  public IsoControl iso() {
    return iso;
  }

  public Playback playback() {
    return playback;
  }

  public ProbeSelection probe() {
    return probe;
  }

  public Notes notes() {
    return notes;
  }
}
