package dev.soakfield.app.fit;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

/** The outcome of one fit, written as text for people, as a PNG plot, or as JSON in SI units. */
public interface FitReport {
  /** Said with every fit, in text and in JSON. */
  List<String> CAUTIONS =
      List.of(
          "these estimates rest on the measured data given and assume Fickian diffusion in a"
              + " uniform specimen; look at the residuals for two-stage or non-Fickian behaviour.",
          "moisture-sensitivity classification, hydrogen-embrittlement acceptance and bake"
              + " schedules are governed by the applicable standards and licensed engineering"
              + " judgement, not by this fit.");

  /** The estimates and the table of points, for a terminal. */
  void printText(PrintWriter out);

  /** Data and fitted curve as a PNG. */
  void writePlot(Path png) throws IOException;

  /** The estimates in SI units (without the cautions). */
  ObjectNode json();
}
