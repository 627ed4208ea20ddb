package dev.soakfield.sweep.spark;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import org.junit.jupiter.api.Test;

/**
 * The Spark engine is an engine and nothing more: it reaches the program through fem3d's sweep
 * package, never the command line, the view model or the reports (which only ride along in the
 * spark-submit jar).
 */
class SparkImportRulesTest {
  static final ArchRule ENGINE_ONLY =
      noClasses()
          .that()
          .resideInAPackage("dev.soakfield.sweep.spark..")
          .should()
          .dependOnClassesThat()
          .resideInAnyPackage(
              "dev.soakfield.cli..", "dev.soakfield.app..", "dev.soakfield.report..");

  @Test
  void theEngineImportsNoCommandLineViewModelOrReport() {
    ENGINE_ONLY.check(
        new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("dev.soakfield.sweep.spark"));
  }

  /** Negative control: a class of the engine's package that calls the command line. */
  @Test
  void aClassReachingIntoTheCommandLineIsCaught() {
    JavaClasses fixture = new ClassFileImporter().importClasses(EngineReachingIntoTheCli.class);
    assertTrue(ENGINE_ONLY.evaluate(fixture).hasViolation());
  }
}
