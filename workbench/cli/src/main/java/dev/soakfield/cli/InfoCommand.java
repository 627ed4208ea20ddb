package dev.soakfield.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.soakfield.mesh.MeshImport;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code soakfield info FILE.msh [--json]}: what a mesh holds and what its import found. */
@Command(
    name = "info",
    mixinStandardHelpOptions = true,
    description = {
      "Reads a mesh and reports nodes, tetrahedra, volume groups, face groups, bounding box,"
          + " element quality and every finding of the import.",
      "Exit code 2 when the mesh has errors that make it unfit for analysis."
    })
final class InfoCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "FILE.msh", description = "MSH 2.2 or 4.1 mesh file.")
  Path file;

  @Option(names = "--json", description = "Print the report as JSON (for scripts).")
  boolean json;

  @Option(
      names = "--feature-angle",
      paramLabel = "DEG",
      defaultValue = "30",
      description =
          "Angle between neighbouring faces that splits an untagged exterior into face groups"
              + " (default ${DEFAULT-VALUE} degrees).")
  double featureAngle;

  @Override
  public Integer call() throws Exception {
    if (!(featureAngle > 0 && featureAngle < 180)) {
      throw new UserInputException(
          "--feature-angle: found "
              + featureAngle
              + ", expected an angle between 0 and 180 degrees");
    }
    MeshImport imported = MeshLoader.load(file, new AssemblyOptions(featureAngle));
    MeshSummary summary = MeshSummary.of(file.toString(), imported);
    PrintWriter out = spec.commandLine().getOut();
    if (json) {
      ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
      out.println(mapper.writeValueAsString(summary.toTree()));
    } else {
      summary.printText(out);
    }
    out.flush();
    return imported.report().hasErrors() ? ExitCodes.BAD_INPUT : ExitCodes.OK;
  }
}
