package dev.soakfield.report;

import dev.soakfield.app.FieldKind;
import dev.soakfield.app.GraphicsServices;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PictureMaker;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewPicture;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.fem.results.StoredRun;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Pictures of the final field for the run report, drawn by the picture service (the renderer of
 * {@code soakfield render}) into {@link ReportWriter#PICTURES}. Where there is no renderer (the
 * headless build) or no OpenGL the report goes without them; the run's results are complete either
 * way.
 */
public final class FieldPictures {
  private static final int WIDTH = 800;
  private static final int HEIGHT = 600;

  private FieldPictures() {}

  /** Draws the pictures of {@code results}; empty when drawn, else why the report has none. */
  public static Optional<String> draw(Path results) {
    Optional<PictureMaker> maker = GraphicsServices.pictures();
    if (maker.isEmpty()) {
      return Optional.of(GraphicsServices.NO_WINDOW);
    }
    try {
      Study study = Study.open(results);
      Optional<StoredRun> r = study.results();
      if (r.isEmpty()) {
        return Optional.of(results + " holds no field frames");
      }
      double[] b = study.geometry().bounds();
      // a cut through the middle shows the inside, where a dried or held surface shows little
      ViewSettings.Plane mid = ViewSettings.Plane.parse("z:" + 0.5 * (b[2] + b[5]));
      Path folder = results.resolve(ReportWriter.PICTURES);
      Files.createDirectories(folder);
      draw(maker.get(), study, r.get(), Optional.empty(), folder.resolve("field-c-end.png"));
      draw(
          maker.get(), study, r.get(), Optional.of(mid), folder.resolve("field-c-end-section.png"));
      return Optional.empty();
    } catch (IOException | RuntimeException | LinkageError e) {
      return Optional.of(String.valueOf(e.getMessage()));
    }
  }

  private static void draw(
      PictureMaker maker,
      Study study,
      StoredRun results,
      Optional<ViewSettings.Plane> section,
      Path file)
      throws IOException {
    ViewSettings settings = new ViewSettings();
    settings.field(Optional.of(FieldKind.CONCENTRATION));
    settings.frame(results.frameCount() - 1);
    settings.section(section);
    ViewPicture.write(
        maker, study, settings, OrbitCamera.View.ISO, WIDTH, HEIGHT, "amount/m^3", file);
  }
}
