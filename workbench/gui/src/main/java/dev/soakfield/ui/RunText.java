package dev.soakfield.ui;

import dev.soakfield.app.Annotations;
import dev.soakfield.app.setup.RunJob;
import java.util.Locale;

/** A run's progress and outcome in words for the panel and the status line. */
final class RunText {
  private RunText() {}

  static String progress(RunJob j) {
    RunJob.Progress p = j.progress();
    if (j.status() != RunJob.Status.RUNNING) {
      return j.message();
    }
    double left = p.secondsLeft();
    return String.format(
        Locale.ROOT,
        "running: t = %s of %s, %d steps, %d iterations%s",
        Annotations.time(p.time()),
        Annotations.time(p.end()),
        p.steps(),
        p.iterations(),
        Double.isNaN(left) ? "" : String.format(Locale.ROOT, ", about %.0f s left", left));
  }
}
