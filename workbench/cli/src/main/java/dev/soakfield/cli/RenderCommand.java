package dev.soakfield.cli;

import dev.soakfield.app.FieldKind;
import dev.soakfield.app.GraphicsServices;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PictureMaker;
import dev.soakfield.app.Scene;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewPicture;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.fem.results.StoredRun;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield render}: a picture of a result with no window, for reports and scripts. */
@Command(
    name = "render",
    mixinStandardHelpOptions = true,
    description = {
      "Draws a result (or a mesh) to a PNG with no window: off screen under a display, or with"
          + " OSMesa where there is none. The picture carries the colour bar (field, unit, limits),"
          + " the axis triad, a length scale and the time."
    })
final class RenderCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(
      index = "0",
      paramLabel = "RESULTS_DIR",
      description = "Result folder (or a .msh or case .json).")
  Path input;

  @Option(
      names = "--time",
      paramLabel = "T",
      description =
          "Time of the frame, seconds or with a unit (90min, 168h, 7d); the nearest frame is drawn (default: the last).")
  String time;

  @Option(
      names = "--field",
      defaultValue = "c",
      paramLabel = "NAME",
      description =
          "c, phi, first_exceed, error_indicator (the estimated error per element: where a finer"
              + " mesh would help), trapped:<part>:<name>, or groups for the face groups in their"
              + " colours (default: ${DEFAULT-VALUE}).")
  String field;

  @Option(
      names = "--view",
      defaultValue = "iso",
      paramLabel = "VIEW",
      description =
          "iso, xmin, xmax, ymin, ymax, zmin or zmax: the side looked at (default: ${DEFAULT-VALUE}).")
  String view;

  @Option(
      names = "--section",
      paramLabel = "AXIS:POS",
      description = "Cut along a plane, e.g. z:2mm; the part beyond it is taken away.")
  String section;

  @Option(
      names = "--iso",
      paramLabel = "LEVEL",
      split = ",",
      description = "Isosurface levels of the field (repeat or separate by commas).")
  List<Double> iso = new ArrayList<>();

  @Option(names = "--range", paramLabel = "LOW:HIGH", description = "Fixed colour limits.")
  String range;

  @Option(names = "--edges", description = "Draw the mesh edges.")
  boolean edges;

  @Option(
      names = "--unit",
      paramLabel = "TEXT",
      description =
          "Unit of c for the colour bar, e.g. kg/m3 (default: the unit the case declared).")
  String unit;

  @Option(
      names = "--size",
      defaultValue = "1024x768",
      paramLabel = "WxH",
      description = "Picture size in pixels (default: ${DEFAULT-VALUE}).")
  String size;

  @Option(names = "--out", required = true, paramLabel = "PIC.png", description = "The picture.")
  Path out;

  @Override
  public Integer call() throws IOException {
    PictureMaker pictures =
        GraphicsServices.pictures()
            .orElseThrow(() -> new UserInputException("render: " + GraphicsServices.NO_WINDOW));
    int[] wh = ViewOptions.size(size);
    Study study = Study.open(input);
    ViewSettings settings = settings(study);
    OrbitCamera.View side;
    try {
      side = OrbitCamera.View.parse(view);
    } catch (IllegalArgumentException e) {
      throw new UserInputException("--view: " + e.getMessage());
    }
    // the cut faces the viewer: the half of the part nearer the viewer is the one taken away
    settings.section(settings.section().map(p -> p.facing(OrbitCamera.towards(side))));
    String barUnit =
        unit != null
            ? unit
            : study.results().map(r -> r.units().concentration()).orElse("amount/m^3");
    Scene scene = ViewPicture.write(pictures, study, settings, side, wh[0], wh[1], barUnit, out);
    PrintWriter o = spec.commandLine().getOut();
    o.println("picture: " + out + " (" + wh[0] + "x" + wh[1] + ")");
    study
        .results()
        .ifPresent(
            r ->
                o.printf(
                    Locale.ROOT,
                    "frame %d of %d, t = %s s; colour limits %s .. %s%n",
                    settings.frame() + 1,
                    r.frameCount(),
                    r.time(settings.frame()),
                    scene.low(),
                    scene.high()));
    o.flush();
    return ExitCodes.OK;
  }

  private ViewSettings settings(Study study) {
    ViewSettings s = new ViewSettings();
    Optional<StoredRun> r = study.results();
    if (field.equalsIgnoreCase("groups") || r.isEmpty()) {
      s.field(Optional.empty());
    } else {
      try {
        s.field(Optional.of(FieldKind.parse(field)));
      } catch (IllegalArgumentException e) {
        throw new UserInputException("--field: " + e.getMessage() + " (or groups)");
      }
    }
    if (r.isPresent()) {
      s.frame(
          time == null ? r.get().frameCount() - 1 : r.get().frameNear(ViewOptions.seconds(time)));
    }
    if (section != null) {
      s.section(Optional.of(ViewOptions.plane(section)));
    }
    if (!iso.isEmpty()) {
      if (s.field().isEmpty()) {
        throw new UserInputException("--iso: isosurfaces need a field from a result folder");
      }
      for (double level : iso) {
        if (!Double.isFinite(level)) {
          throw new UserInputException(
              "--iso: found " + level + ", expected finite levels (concentrations), e.g. 0.5,1");
        }
      }
      s.isoLevels(iso);
    }
    if (range != null) {
      String[] p = range.split(":", -1);
      try {
        s.range(Double.parseDouble(p[0]), Double.parseDouble(p[p.length - 1]));
        if (p.length != 2) {
          throw new NumberFormatException();
        }
      } catch (IllegalArgumentException e) {
        throw new UserInputException(
            "--range: found '" + range + "', expected LOW:HIGH with LOW below HIGH, e.g. 0:2.5");
      }
    }
    s.edges(edges);
    return s;
  }
}
