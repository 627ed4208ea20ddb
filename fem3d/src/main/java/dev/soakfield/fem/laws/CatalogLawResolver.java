package dev.soakfield.fem.laws;

import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.SourceSpec;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.model.LawUse;
import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.SourceLaw;
import java.util.ArrayList;
import java.util.List;

/**
 * Resolves a case's {@code "source": {"law": ...}} against a {@link SourceLawCatalog}: an unknown
 * id or parameters that do not fit the declaration are the user's mistakes, reported at the
 * source's place in the case file; a provider that fails to create its law is the plugin's fault.
 */
final class CatalogLawResolver implements LawResolver {
  private final SourceLawCatalog catalog;

  CatalogLawResolver(SourceLawCatalog catalog) {
    this.catalog = catalog;
  }

  @Override
  public LawUse resolve(String caseName, String material, SourceSpec.LawSource source) {
    LawEntry entry =
        catalog
            .find(source.id())
            .orElseThrow(
                () ->
                    problem(
                        caseName,
                        source,
                        source.path() + ".law",
                        catalog.unknownLawMessage(source.id())));
    LawParameters values =
        parametersOrThrow(caseName, source, LawBinding.bind(entry.provider(), source.parameters()));
    SourceLaw law;
    try {
      law = GuardedLaw.create(entry, values, material).law();
    } catch (IllegalArgumentException e) {
      throw problem(
          caseName,
          source,
          source.path(),
          "law '" + source.id() + "' rejects these parameters: " + e.getMessage());
    }
    return new LawUse(entry.id(), entry.describe(), law, source.name(), source.reversible());
  }

  @Override
  public dev.soakfield.fem.model.FaceLawUse resolveFace(
      String caseName, String group, SourceSpec.LawSource source) {
    FaceLawEntry entry =
        catalog
            .findFace(source.id())
            .orElseThrow(
                () ->
                    problem(
                        caseName,
                        source,
                        source.path() + ".law",
                        catalog.unknownFaceLawMessage(source.id())));
    LawParameters values =
        parametersOrThrow(caseName, source, LawBinding.bind(entry.provider(), source.parameters()));
    try {
      return new dev.soakfield.fem.model.FaceLawUse(
          entry.id(), entry.describe(), entry.provider().create(values));
    } catch (IllegalArgumentException e) {
      throw problem(
          caseName,
          source,
          source.path(),
          "face law '" + source.id() + "' rejects these parameters: " + e.getMessage());
    }
  }

  /** The bound values, or every binding problem at the law entry's keys. */
  private static LawParameters parametersOrThrow(
      String caseName, SourceSpec.LawSource source, LawBinding.Result bound) {
    if (!bound.problems().isEmpty()) {
      List<CaseInputException.Problem> problems = new ArrayList<>();
      for (LawBinding.Problem p : bound.problems()) {
        problems.add(
            new CaseInputException.Problem(
                source.line(), source.column(), source.path() + "." + p.key(), p.message()));
      }
      throw new CaseInputException(caseName, problems);
    }
    return bound.parameters().orElseThrow();
  }

  private static CaseInputException problem(
      String caseName, SourceSpec.LawSource source, String path, String message) {
    return new CaseInputException(
        caseName,
        List.of(new CaseInputException.Problem(source.line(), source.column(), path, message)));
  }
}
