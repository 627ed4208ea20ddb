package dev.soakfield.cli;

import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.load.MeshLoader;
import dev.soakfield.mesh.topo.AssemblyOptions;
import dev.soakfield.report.ReportWriter;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import picocli.CommandLine;

/**
 * Pictures of the final field for the run report, drawn by the off-screen renderer (the same as
 * {@code soakfield render}). Where no OpenGL is available the report goes without them and says why
 * on the error stream; the run's results are complete either way.
 */
final class FieldPictures {
  private FieldPictures() {}

  static void draw(Path results, PrintWriter err) {
    Path folder = results.resolve(ReportWriter.PICTURES);
    try {
      // a cut through the middle shows the inside, where a dried or held surface shows little
      TetMesh mesh =
          MeshLoader.load(results.resolve(RunPipeline.MESH_COPY), AssemblyOptions.defaults())
              .mesh();
      double lo = Double.POSITIVE_INFINITY;
      double hi = Double.NEGATIVE_INFINITY;
      for (int v = 0; v < mesh.nodeCount(); v++) {
        lo = Math.min(lo, mesh.coord(v, 2));
        hi = Math.max(hi, mesh.coord(v, 2));
      }
      String mid = String.format(java.util.Locale.ROOT, "z:%.9gm", 0.5 * (lo + hi));
      String[][] views = {
        {"c", "iso", "", "field-c-end.png"},
        {"c", "iso", mid, "field-c-end-section.png"}
      };
      Files.createDirectories(folder);
      for (String[] v : views) {
        StringWriter sink = new StringWriter();
        CommandLine cli = new CommandLine(new SoakfieldCli());
        cli.setOut(new PrintWriter(sink));
        cli.setErr(new PrintWriter(sink));
        java.util.List<String> args =
            new java.util.ArrayList<>(
                java.util.List.of(
                    "render",
                    results.toString(),
                    "--field",
                    v[0],
                    "--view",
                    v[1],
                    "--size",
                    "800x600",
                    "--out",
                    folder.resolve(v[3]).toString()));
        if (!v[2].isEmpty()) {
          args.add("--section");
          args.add(v[2]);
        }
        int code = cli.execute(args.toArray(new String[0]));
        if (code != ExitCodes.OK) {
          err.println("note: the report has no field picture: " + sink.toString().strip());
          err.flush();
          return;
        }
      }
    } catch (java.io.IOException | RuntimeException | LinkageError e) {
      err.println("note: the report has no field picture: " + e.getMessage());
      err.flush();
    }
  }
}
