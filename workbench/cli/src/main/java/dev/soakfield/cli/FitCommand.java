package dev.soakfield.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.app.fit.ArrheniusAnalysis;
import dev.soakfield.app.fit.FitReport;
import dev.soakfield.app.fit.PermeationAnalysis;
import dev.soakfield.app.fit.WeighingAnalysis;
import dev.soakfield.fem.fit.FitFailedException;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code soakfield fit DATA.csv}: diffusivity and saturation from weighing data, an Arrhenius law
 * from diffusivities at several temperatures, or the evaluations of a hydrogen permeation
 * transient.
 */
@Command(
    name = "fit",
    mixinStandardHelpOptions = true,
    description = {
      "Fits measured diffusion data with 95 %% confidence intervals.",
      "Weighing (default): CSV 'time,mass' (units optional, e.g. 'time [h],mass [mg]'); the first"
          + " row is the dry mass at the start of exposure unless --dry-mass is given. With"
          + " --desorption the first row is the mass when drying starts.",
      "--arrhenius: CSV 'temperature,diffusivity'. --permeation: CSV 'time,flux' or"
          + " 'time,current density' (exit side; J = i/F); the first row is the background at the"
          + " moment charging starts.",
      "Lines starting with # are comments. Values without units are SI."
    })
final class FitCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "DATA.csv", description = "The measurements.")
  Path data;

  @Option(
      names = "--thickness",
      paramLabel = "LENGTH",
      description = "Specimen or membrane thickness, e.g. 1mm (weighing and permeation).")
  String thickness;

  @Option(
      names = "--edges",
      paramLabel = "A,B",
      description = "Plate edge lengths for the Shen-Springer edge correction, e.g. 50mm,50mm.")
  String edges;

  @Option(names = "--dry-mass", paramLabel = "MASS", description = "Dry mass, e.g. 1.2g.")
  String dryMass;

  @Option(names = "--desorption", description = "The data record drying (mass loss).")
  boolean desorption;

  @Option(names = "--arrhenius", description = "Fit D0 and Q from temperature,diffusivity.")
  boolean arrhenius;

  @Option(names = "--permeation", description = "Evaluate a hydrogen permeation transient.")
  boolean permeation;

  @Option(names = "--json", description = "Print the estimates as JSON in SI units.")
  boolean json;

  @Option(names = "--plot", paramLabel = "FILE.png", description = "Write data and fit as PNG.")
  Path plot;

  @Override
  public Integer call() throws IOException {
    if (arrhenius && permeation) {
      throw new UserInputException(
          "--arrhenius and --permeation: found both, expected at most one kind of fit");
    }
    if ((arrhenius || permeation) && (desorption || dryMass != null || edges != null)) {
      throw new UserInputException(
          "--desorption, --dry-mass and --edges apply to weighing data only");
    }
    FitReport report;
    try {
      if (arrhenius) {
        report = ArrheniusAnalysis.fit(data);
      } else if (permeation) {
        report = PermeationAnalysis.fit(data, thickness());
      } else {
        report = WeighingAnalysis.fit(data, weighingOptions());
      }
    } catch (FitFailedException | IllegalArgumentException e) {
      throw new UserInputException(data + ": " + e.getMessage());
    }
    PrintWriter out = spec.commandLine().getOut();
    if (!json) {
      report.printText(out);
    }
    if (plot != null) {
      report.writePlot(plot);
    }
    if (json) {
      ObjectNode tree = report.json();
      ArrayNode cautions = tree.putArray("cautions");
      FitReport.CAUTIONS.forEach(cautions::add);
      out.println(
          new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(tree));
    } else {
      FitReport.CAUTIONS.forEach(c -> out.println("caution: " + c));
      if (plot != null) {
        out.println("plot written to " + plot);
      }
    }
    out.flush();
    return ExitCodes.OK;
  }

  private double thickness() {
    if (thickness == null) {
      throw new UserInputException("--thickness: missing, expected a length such as 1mm");
    }
    return OptionValues.positive("--thickness", thickness, "m");
  }

  private WeighingAnalysis.Options weighingOptions() {
    double l = thickness();
    Optional<WeighingAnalysis.Edges> plate = Optional.empty();
    if (edges != null) {
      String[] parts = edges.split(",", -1);
      if (parts.length != 2) {
        throw new UserInputException(
            "--edges: found '" + edges + "', expected two lengths such as 50mm,50mm");
      }
      plate =
          Optional.of(
              new WeighingAnalysis.Edges(
                  OptionValues.positive("--edges", parts[0], "m"),
                  OptionValues.positive("--edges", parts[1], "m")));
    }
    OptionalDouble dry =
        dryMass == null
            ? OptionalDouble.empty()
            : OptionalDouble.of(OptionValues.positive("--dry-mass", dryMass, "kg"));
    return new WeighingAnalysis.Options(l, plate, dry, desorption);
  }
}
