package dev.soakfield.cli;

import dev.soakfield.app.fit.FitInputException;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.laws.PluginLoadException;
import dev.soakfield.fem.laws.SourceLawException;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.run.HeapTooSmallException;
import dev.soakfield.fem.solve.SolverStalledException;
import dev.soakfield.fem.time.RunFailedException;
import dev.soakfield.mesh.MeshInputException;
import java.io.PrintWriter;
import picocli.CommandLine;

/**
 * The exit codes of every command, and the one place that turns exceptions into them: a user's
 * mistake prints its message (no stack trace) and exits 2; a defect prints the trace and exits 1.
 */
public final class ExitCodes {
  public static final int OK = 0;
  public static final int INTERNAL_ERROR = 1;
  public static final int BAD_INPUT = 2;
  public static final int NUMERICAL_FAILURE = 3;

  private ExitCodes() {}

  /** Runs {@code command} with {@code args} and returns the exit code. */
  public static int execute(Object command, String[] args) {
    try {
      return configure(new CommandLine(command)).execute(args);
    } catch (OutOfMemoryError e) {
      // what was written so far stays (a run's results are durable before its report); the user
      // needs the heap and how to raise it, not a trace
      System.err.printf(
          java.util.Locale.ROOT,
          "soakfield: the Java heap ran out (limit %d MB); raise it, e.g. JAVA_OPTS=-Xmx%dm"
              + " ./soakfield ..., or use a coarser mesh, fewer probes or fewer outputs; a run"
              + " stopped after its results can be finished with --resume%n",
          Runtime.getRuntime().maxMemory() >> 20,
          2 * (Runtime.getRuntime().maxMemory() >> 20));
      return BAD_INPUT;
    }
  }

  /** Applies the project's exit codes and error handling to {@code cl}. */
  public static CommandLine configure(CommandLine cl) {
    cl.setExitCodeExceptionMapper(ExitCodes::codeFor);
    cl.registerConverter(java.nio.file.Path.class, FileNames::path);
    cl.setParameterExceptionHandler(
        (ex, args) -> {
          PrintWriter err = ex.getCommandLine().getErr();
          err.println("soakfield: " + ex.getMessage());
          err.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
          return BAD_INPUT;
        });
    cl.setExecutionExceptionHandler(
        (ex, cmd, parseResult) -> {
          PrintWriter err = cmd.getErr();
          int code = codeFor(ex);
          if (code == INTERNAL_ERROR) {
            err.println("soakfield: internal error, please report it with the trace below.");
            ex.printStackTrace(err);
          } else {
            err.println("soakfield: " + message(ex));
          }
          err.flush();
          return code;
        });
    return cl;
  }

  static int codeFor(Throwable ex) {
    if (ex instanceof MeshInputException
        || ex instanceof UserInputException
        || ex instanceof FitInputException
        || ex instanceof CaseInputException
        || ex instanceof dev.soakfield.fem.sweep.SweepInputException
        || ex instanceof PluginLoadException
        || ex instanceof ResultFolderException
        || ex instanceof HeapTooSmallException) {
      return BAD_INPUT;
    }
    if (ex instanceof RunFailedException
        || ex instanceof SolverStalledException
        || ex instanceof SourceLawException
        || ex instanceof dev.soakfield.fem.sweep.SweepEngineException) {
      return NUMERICAL_FAILURE;
    }
    if (ex instanceof java.io.IOException
        || ex instanceof java.io.UncheckedIOException
        || ex instanceof java.nio.file.InvalidPathException) {
      return BAD_INPUT; // a missing, read-only or full place on disk, a name the locale cannot hold
    }
    return INTERNAL_ERROR;
  }

  /** What the user reads: for a file system failure, the file and the reason in words. */
  static String message(Throwable ex) {
    Throwable io = ex instanceof java.io.UncheckedIOException u ? u.getCause() : ex;
    if (io instanceof java.nio.file.FileSystemException f) {
      String reason =
          f instanceof java.nio.file.NoSuchFileException
              ? "no such file or folder"
              : f instanceof java.nio.file.AccessDeniedException
                  ? "permission denied"
                  : f instanceof java.nio.file.FileAlreadyExistsException
                      ? "a file of that name is in the way (a folder was expected)"
                      : f instanceof java.nio.file.NotDirectoryException
                          ? "not a folder"
                          : f.getReason() != null ? f.getReason() : "the file system refused";
      return "could not use " + f.getFile() + ": " + reason;
    }
    if (io instanceof java.io.IOException) {
      return "a file could not be read or written: " + io.getMessage();
    }
    if (io instanceof java.nio.file.InvalidPathException p) {
      return FileNames.explain(p.getInput());
    }
    return String.valueOf(ex.getMessage());
  }
}
