package dev.soakfield.render.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import dev.soakfield.render.RendererSolvingItsOwnField;
import org.junit.jupiter.api.Test;

/** Rendering code never computes physics and never parses a command line (DESIGN.md). */
class GuiImportRulesTest {
  static final ArchRule DRAWS_WHAT_IT_IS_GIVEN =
      noClasses()
          .that()
          .resideInAnyPackage("dev.soakfield.render..", "dev.soakfield.ui..")
          .should()
          .dependOnClassesThat()
          .resideInAnyPackage(
              "dev.soakfield.fem.assembly..",
              "dev.soakfield.fem.solve..",
              "dev.soakfield.fem.time..",
              "dev.soakfield.fem.physics..",
              "dev.soakfield.fem.model..",
              "dev.soakfield.fem.run..",
              "picocli..",
              "dev.soakfield.cli..")
          .because(
              "the window shows fields that app and fem3d computed; physics knows no window and the"
                  + " window solves nothing");

  @Test
  void theWindowAndRendererSolveNothing() {
    JavaClasses production =
        new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("dev.soakfield.render", "dev.soakfield.ui");
    DRAWS_WHAT_IT_IS_GIVEN.check(production);
  }

  /** Negative control: a renderer that steps the solution itself is caught. */
  @Test
  void aRendererThatStepsTheSolutionIsCaught() {
    JavaClasses fixture = new ClassFileImporter().importClasses(RendererSolvingItsOwnField.class);
    assertTrue(DRAWS_WHAT_IT_IS_GIVEN.evaluate(fixture).hasViolation());
  }
}
