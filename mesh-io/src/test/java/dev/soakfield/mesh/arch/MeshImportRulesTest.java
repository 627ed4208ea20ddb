package dev.soakfield.mesh.arch;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import dev.soakfield.mesh.ModelReachingIntoAReader;
import org.junit.jupiter.api.Test;

class MeshImportRulesTest {
  private static final JavaClasses PRODUCTION =
      new ClassFileImporter()
          .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
          .importPackages("dev.soakfield.mesh");

  @Test
  void meshIoImportsTheJdkAlone() {
    MeshImportRules.JDK_ONLY.check(PRODUCTION);
  }

  @Test
  void theModelImportsNoneOfItsSubpackages() {
    MeshImportRules.MODEL_KNOWS_NO_SUBPACKAGE.check(PRODUCTION);
  }

  @Test
  void packagesFormNoCycle() {
    MeshImportRules.NO_CYCLES.check(PRODUCTION);
  }

  /** Negative control: a model class that reads a file format must be caught. */
  @Test
  void aModelClassThatImportsAReaderIsCaught() {
    JavaClasses fixture = new ClassFileImporter().importClasses(ModelReachingIntoAReader.class);
    assertTrue(MeshImportRules.MODEL_KNOWS_NO_SUBPACKAGE.evaluate(fixture).hasViolation());
    assertFalse(MeshImportRules.JDK_ONLY.evaluate(fixture).hasViolation());
  }
}
