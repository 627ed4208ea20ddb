package dev.soakfield.cli;

import dev.soakfield.fem.laws.LawBinding;
import dev.soakfield.fem.laws.LawEntry;
import dev.soakfield.fem.laws.PluginFolders;
import dev.soakfield.fem.laws.SourceLawCatalog;
import dev.soakfield.law.api.LawParameter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code soakfield plugins [--plugins DIR]...}: every source law found, its origin and parameters.
 */
@Command(
    name = "plugins",
    mixinStandardHelpOptions = true,
    description = {
      "Lists every source law a case can name: the built-in ones and those in the jars of the"
          + " plugins folders (~/.soakfield/plugins when it exists, and each --plugins DIR), with"
          + " where each came from and its parameters (unit, default, valid range).",
      "Plugins are code with full trust: install only jars you built or trust."
    })
final class PluginsCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(
      names = "--plugins",
      paramLabel = "DIR",
      description = "A folder of plugin jars, searched after the default folder; repeatable.")
  List<Path> plugins = new ArrayList<>();

  @Override
  public Integer call() {
    List<Path> folders = PluginFolders.withDefault(plugins);
    SourceLawCatalog catalog = SourceLawCatalog.load(folders);
    print(spec.commandLine().getOut(), catalog);
    return ExitCodes.OK;
  }

  static void print(PrintWriter out, SourceLawCatalog catalog) {
    out.println(
        "plugins folders searched: "
            + (catalog.folders().isEmpty()
                ? "none (the default " + PluginFolders.defaultFolder() + " does not exist)"
                : join(catalog.folders())));
    out.println(catalog.entries().size() + " source laws");
    for (LawEntry e : catalog.entries()) {
      out.println();
      out.println(e.id() + ": " + e.provider().description());
      out.println(
          "  from " + e.origin().describe() + " (" + e.provider().getClass().getName() + ")");
      List<LawParameter> parameters = e.provider().parameters();
      if (parameters.isEmpty()) {
        out.println("  no parameters");
        continue;
      }
      List<String[]> rows = new ArrayList<>();
      rows.add(new String[] {"parameter", "unit", "default", "valid range", "meaning"});
      for (LawParameter p : parameters) {
        rows.add(
            new String[] {
              p.name(),
              p.unit(),
              p.isRequired() ? "required" : LawBinding.format(p.defaultValue()),
              range(p),
              p.description()
            });
      }
      printTable(out, rows);
    }
    out.println();
    out.println(catalog.faceEntries().size() + " face laws (\"kind\": \"law\" on a face group)");
    for (dev.soakfield.fem.laws.FaceLawEntry e : catalog.faceEntries()) {
      out.println();
      out.println(e.id() + ": " + e.provider().description());
      out.println(
          "  from " + e.origin().describe() + " (" + e.provider().getClass().getName() + ")");
      List<String[]> rows = new ArrayList<>();
      rows.add(new String[] {"parameter", "unit", "default", "valid range", "meaning"});
      for (LawParameter p : e.provider().parameters()) {
        rows.add(
            new String[] {
              p.name(),
              p.unit(),
              p.isRequired() ? "required" : LawBinding.format(p.defaultValue()),
              range(p),
              p.description()
            });
      }
      printTable(out, rows);
    }
    for (Path jar : catalog.jarsWithoutLaws()) {
      out.println();
      out.println(
          "note: " + jar + " declares no source law (a library, or its service file is missing)");
    }
    out.println();
    out.println(
        "caution: plugins are code that runs with your rights; load only jars you trust."
            + " A case names a law by its id, never a jar or a class.");
    out.flush();
  }

  private static String range(LawParameter p) {
    boolean low = p.minimum() > -Double.MAX_VALUE;
    boolean high = p.maximum() < Double.MAX_VALUE;
    if (low && high) {
      return LawBinding.format(p.minimum()) + " to " + LawBinding.format(p.maximum());
    }
    if (low) {
      // a tiny positive minimum stands for "greater than 0" (bounds are inclusive)
      return p.minimum() > 0 && p.minimum() < 1e-200
          ? "> 0"
          : "≥ " + LawBinding.format(p.minimum());
    }
    return high ? "≤ " + LawBinding.format(p.maximum()) : "any";
  }

  private static void printTable(PrintWriter out, List<String[]> rows) {
    int columns = rows.get(0).length;
    int[] width = new int[columns];
    for (String[] r : rows) {
      for (int i = 0; i < columns; i++) {
        width[i] = Math.max(width[i], r[i].length());
      }
    }
    for (String[] r : rows) {
      StringBuilder line = new StringBuilder("   ");
      for (int i = 0; i < columns; i++) {
        line.append(' ');
        line.append(
            i == columns - 1 ? r[i] : String.format(Locale.ROOT, "%-" + width[i] + "s ", r[i]));
      }
      out.println(line.toString().stripTrailing());
    }
  }

  private static String join(List<Path> paths) {
    List<String> s = new ArrayList<>();
    for (Path p : paths) {
      s.add(p.toString());
    }
    return String.join(", ", s);
  }
}
