package dev.soakfield.fem.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.lang.ArchRule;

/** The direction of imports inside fem3d (DEVELOPERS.md, "The solver pipeline"). */
final class FemImportRules {
  private FemImportRules() {}

  private static final String[] DISCRETISED_OR_LATER = {
    "dev.soakfield.fem.assembly..",
    "dev.soakfield.fem.solve..",
    "dev.soakfield.fem.model..",
    "dev.soakfield.fem.time..",
    "dev.soakfield.fem.post..",
    "dev.soakfield.fem.results..",
    "dev.soakfield.fem.run..",
    "dev.soakfield.fem.bake..",
    "dev.soakfield.fem.sweep..",
    "dev.soakfield.fem.tds..",
    "dev.soakfield.fem.bench..",
    "dev.soakfield.fem.laws..",
    "dev.soakfield.fem.verify.."
  };

  /** Reading and checking a case needs no mesh discretisation, solver or run. */
  static final ArchRule CASE_SPECS_KNOW_NO_DISCRETISATION =
      noClasses()
          .that()
          .resideInAnyPackage("dev.soakfield.fem.casefile..", "dev.soakfield.fem.physics..")
          .should()
          .dependOnClassesThat()
          .resideInAnyPackage(DISCRETISED_OR_LATER)
          .because("the model builder (fem.model) sits between the case and the model");

  /** Physics laws (Arrhenius, IF97, fugacity, exposure) know no mesh either. */
  static final ArchRule PHYSICS_KNOWS_NO_MESH =
      noClasses()
          .that()
          .resideInAPackage("dev.soakfield.fem.physics..")
          .should()
          .dependOnClassesThat()
          .resideInAnyPackage("dev.soakfield.mesh..", "dev.soakfield.fem.casefile..");

  /** The result folder's format knows nothing of how the results were computed. */
  static final ArchRule RESULT_FILES_KNOW_NO_SOLVER =
      noClasses()
          .that()
          .resideInAPackage("dev.soakfield.fem.results..")
          .should()
          .dependOnClassesThat()
          .resideInAnyPackage(
              "dev.soakfield.fem.assembly..",
              "dev.soakfield.fem.solve..",
              "dev.soakfield.fem.model..",
              "dev.soakfield.fem.time..",
              "dev.soakfield.fem.run..",
              "dev.soakfield.fem.casefile..")
          .because("reports, export, the window and sweeps read results without a solver");

  /** No two packages of fem3d import each other, directly or around a loop. */
  static final ArchRule NO_CYCLES =
      slices().matching("dev.soakfield.fem.(*)..").should().beFreeOfCycles();
}
