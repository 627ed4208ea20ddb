package dev.soakfield.sweep.spark;

/** A test fixture that breaks SparkImportRulesTest's rule on purpose. */
final class EngineReachingIntoTheCli {
  private EngineReachingIntoTheCli() {}

  static void start() {
    dev.soakfield.cli.SoakfieldCli.main(new String[0]);
  }
}
