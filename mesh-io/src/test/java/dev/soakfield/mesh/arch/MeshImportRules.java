package dev.soakfield.mesh.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.lang.ArchRule;

/** The import rules of mesh-io (DEVELOPERS.md, "Modules and the direction of imports"). */
final class MeshImportRules {
  private MeshImportRules() {}

  /** mesh-io is JDK only: a dependency that slips into its pom fails here by name. */
  static final ArchRule JDK_ONLY =
      classes()
          .that()
          .resideInAPackage("dev.soakfield.mesh..")
          .should()
          .onlyDependOnClassesThat()
          .resideInAnyPackage("java..", "javax.xml..", "dev.soakfield.mesh..")
          .because("mesh-io sits at the bottom of the flow and imports the JDK alone");

  /** The model (TetMesh, groups, findings) knows no file format, mesher or check. */
  static final ArchRule MODEL_KNOWS_NO_SUBPACKAGE =
      noClasses()
          .that()
          .resideInAPackage("dev.soakfield.mesh")
          .should()
          .dependOnClassesThat()
          .resideInAnyPackage(
              "dev.soakfield.mesh.gen..",
              "dev.soakfield.mesh.load..",
              "dev.soakfield.mesh.msh..",
              "dev.soakfield.mesh.topo..",
              "dev.soakfield.mesh.vtk..")
          .because("readers, writers and meshers build on the model, never the reverse");

  /** No two packages of mesh-io import each other, directly or around a loop. */
  static final ArchRule NO_CYCLES =
      slices().matching("dev.soakfield.mesh.(*)..").should().beFreeOfCycles();
}
