package dev.soakfield.fem.sweep;

import dev.soakfield.fem.laws.SourceLawCatalog;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;

/**
 * Runs a sweep's cases on this machine, one case per worker thread (one worker per core unless told
 * otherwise), the mesh imported once for all of them. Each case may use the heap divided by the
 * worker count.
 */
public final class LocalSweepEngine implements SweepEngine {
  public static final String NAME = "local";

  /** The folder under the sweep's folder where running cases keep their run folders. */
  public static final String SCRATCH = ".scratch";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public void run(
      SweepJob job, List<PlannedCase> cases, EngineSettings settings, Consumer<CaseRow> sink)
      throws IOException {
    int workers = Math.max(1, Math.min(settings.workersOrCores(), cases.size()));
    Path scratch = settings.outDir().resolve(SCRATCH);
    CaseRunner runner =
        new CaseRunner(
            job,
            settings.meshFile(),
            scratch,
            SourceLawCatalog.load(settings.pluginFolders()).resolver(),
            Runtime.getRuntime().maxMemory() / workers);
    ExecutorService pool = Executors.newFixedThreadPool(workers, r -> daemon(r, "sweep-worker"));
    // rows are stored durably (one fsync each) on a thread of their own, as Spark's driver does:
    // a worker never waits for the disk, which otherwise bounds a sweep of small cases
    ExecutorService rowWriter = Executors.newSingleThreadExecutor(r -> daemon(r, "sweep-rows"));
    try {
      CompletableFuture<?>[] done = new CompletableFuture<?>[cases.size()];
      for (int i = 0; i < done.length; i++) {
        PlannedCase c = cases.get(i);
        done[i] =
            CompletableFuture.supplyAsync(() -> runner.run(c), pool)
                .thenAcceptAsync(sink, rowWriter);
      }
      CompletableFuture.allOf(done).get();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IOException("the sweep was interrupted", e);
    } catch (ExecutionException e) {
      Throwable cause = e.getCause();
      if (cause instanceof java.io.UncheckedIOException u) {
        throw u.getCause();
      }
      if (cause instanceof RuntimeException r) {
        throw r;
      }
      throw new IllegalStateException("a sweep worker failed", cause);
    } finally {
      pool.shutdownNow();
      rowWriter.shutdown();
    }
    CaseRunner.deleteTree(scratch);
  }

  private static Thread daemon(Runnable r, String name) {
    Thread t = new Thread(r, name);
    t.setDaemon(true);
    return t;
  }
}
