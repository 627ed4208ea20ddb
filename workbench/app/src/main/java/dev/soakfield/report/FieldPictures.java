package dev.soakfield.report;

import dev.soakfield.app.FieldKind;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PictureWorker;
import dev.soakfield.app.Scene;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewPicture;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.mesh.TetMesh;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * Pictures of the field for the run report, at the last output and at the output where the field's
 * spread is widest (after a long soak the last one is often a single colour). Spread is the
 * standard deviation over the nodes: the range would pick the start of every step change, where
 * only the held faces' nodes differ from the rest, drawn by the picture service (the renderer of
 * {@code soakfield render}) into {@link ReportWriter#PICTURES}. Where there is no renderer (the
 * headless build) or no OpenGL the report goes without them; the run's results are complete either
 * way.
 */
public final class FieldPictures {
  private static final int WIDTH = 800;
  private static final int HEIGHT = 600;

  private FieldPictures() {}

  /** A worker setting up for the report's pictures; empty in a build without a renderer. */
  public static Optional<PictureWorker> start() {
    return PictureWorker.start(WIDTH, HEIGHT);
  }

  /**
   * Draws the pictures of the run in {@code results}, which worked on {@code mesh}, with a worker
   * started earlier (see {@link #start}) whose set-up has overlapped the run; empty when drawn,
   * else why the report has none.
   */
  public static Optional<String> draw(Path results, TetMesh mesh, PictureWorker worker) {
    try {
      StoredRun run = StoredRun.open(results, mesh);
      Study study = Study.ofRun(run);
      double[] b = study.geometry().bounds();
      // a cut through the middle shows the inside, where a dried or held surface shows little
      ViewSettings.Plane mid = ViewSettings.Plane.parse("z:" + 0.5 * (b[2] + b[5]));
      Path folder = results.resolve(ReportWriter.PICTURES);
      Files.createDirectories(folder);
      int last = run.frameCount() - 1;
      int widest = widestSpread(run);
      ViewSettings settings = new ViewSettings();
      settings.field(Optional.of(FieldKind.CONCENTRATION));
      Scene scene = null; // one scene for every picture: its surface is built once
      for (int frame : widest == last ? new int[] {last} : new int[] {widest, last}) {
        String name = frame == last ? "field-c-end" : "field-c-widest-spread";
        for (Optional<ViewSettings.Plane> section :
            List.of(Optional.<ViewSettings.Plane>empty(), Optional.of(mid))) {
          settings.frame(frame);
          settings.section(section);
          scene = scene == null ? new Scene(study, settings) : scene;
          ViewPicture.write(
              worker,
              study,
              scene,
              OrbitCamera.View.ISO,
              WIDTH,
              HEIGHT,
              run.units().concentration(),
              folder.resolve(name + (section.isEmpty() ? "" : "-section") + ".png"));
        }
      }
      return Optional.empty();
    } catch (IOException | RuntimeException | LinkageError e) {
      return Optional.of(String.valueOf(e.getMessage()));
    }
  }

  /** The frame whose concentration has the largest standard deviation over the nodes. */
  static int widestSpread(StoredRun results) {
    int best = results.frameCount() - 1;
    double widest = Double.NEGATIVE_INFINITY;
    for (int f = results.frameCount() - 1; f >= 0; f--) {
      double sd = standardDeviation(results.field(f, FieldKind.CONCENTRATION.fileName));
      if (sd > widest) { // on a tie the later frame stays
        widest = sd;
        best = f;
      }
    }
    return best;
  }

  private static double standardDeviation(double[] v) {
    double mean = 0;
    for (double x : v) {
      mean += x / v.length;
    }
    double sum = 0;
    for (double x : v) {
      sum += (x - mean) * (x - mean);
    }
    return Math.sqrt(sum / v.length);
  }
}
