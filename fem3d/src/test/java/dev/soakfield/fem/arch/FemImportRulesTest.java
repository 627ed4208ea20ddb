package dev.soakfield.fem.arch;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import dev.soakfield.fem.casefile.CaseSpecReachingIntoTheModel;
import dev.soakfield.fem.results.ResultFileReachingIntoTheRun;
import org.junit.jupiter.api.Test;

class FemImportRulesTest {
  private static final JavaClasses PRODUCTION =
      new ClassFileImporter()
          .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
          .importPackages("dev.soakfield.fem");

  @Test
  void caseSpecsAndPhysicsKnowNoDiscretisation() {
    FemImportRules.CASE_SPECS_KNOW_NO_DISCRETISATION.check(PRODUCTION);
  }

  @Test
  void physicsKnowsNoMesh() {
    FemImportRules.PHYSICS_KNOWS_NO_MESH.check(PRODUCTION);
  }

  @Test
  void resultFilesKnowNoSolver() {
    FemImportRules.RESULT_FILES_KNOW_NO_SOLVER.check(PRODUCTION);
  }

  @Test
  void packagesFormNoCycle() {
    FemImportRules.NO_CYCLES.check(PRODUCTION);
  }

  /** Negative controls: a case spec that builds the model, a result file that runs the solver. */
  @Test
  void classesReachingAgainstTheFlowAreCaught() {
    JavaClasses fixtures =
        new ClassFileImporter()
            .importClasses(CaseSpecReachingIntoTheModel.class, ResultFileReachingIntoTheRun.class);
    assertTrue(FemImportRules.CASE_SPECS_KNOW_NO_DISCRETISATION.evaluate(fixtures).hasViolation());
    assertTrue(FemImportRules.RESULT_FILES_KNOW_NO_SOLVER.evaluate(fixtures).hasViolation());
  }
}
