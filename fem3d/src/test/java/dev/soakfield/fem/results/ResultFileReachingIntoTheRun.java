package dev.soakfield.fem.results;

import dev.soakfield.fem.run.RunPipeline;

/** Test fixture that breaks the result-folder import rule on purpose (see FemImportRulesTest). */
public final class ResultFileReachingIntoTheRun {
  private ResultFileReachingIntoTheRun() {}

  /** Names the run pipeline, which no result-folder class may use. */
  public static String pipelineType() {
    return RunPipeline.class.getName();
  }
}
