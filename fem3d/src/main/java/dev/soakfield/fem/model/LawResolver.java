package dev.soakfield.fem.model;

import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.SourceSpec;

/** Turns a case's {@code "source": {"law": ...}} into a law instance for one material. */
@FunctionalInterface
public interface LawResolver {
  /**
   * The law a material's source names.
   *
   * @param caseName the case file's name, for messages
   * @param material the material (volume group) the law acts in
   * @throws CaseInputException when the id is unknown or the parameters do not fit the law's
   *     declaration (each problem at the source's key path)
   */
  LawUse resolve(String caseName, String material, SourceSpec.LawSource source);

  /**
   * The face law a face group's condition names.
   *
   * @param group the face group
   * @throws CaseInputException when the id is unknown or the parameters do not fit
   */
  default FaceLawUse resolveFace(String caseName, String group, SourceSpec.LawSource law) {
    throw new CaseInputException(
        caseName,
        java.util.List.of(
            new CaseInputException.Problem(
                law.line(),
                law.column(),
                law.path(),
                "found face law '" + law.id() + "', expected no face laws here")));
  }

  /** A resolver for cases without laws: any law is an error. */
  static LawResolver none() {
    return (caseName, material, source) -> {
      throw new CaseInputException(
          caseName,
          java.util.List.of(
              new CaseInputException.Problem(
                  source.line(),
                  source.column(),
                  source.path(),
                  "found law '" + source.id() + "', expected no source laws here")));
    };
  }
}
