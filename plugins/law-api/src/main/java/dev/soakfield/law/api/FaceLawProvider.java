package dev.soakfield.law.api;

import java.util.List;

/**
 * Declares one face law and creates its instances, beside {@link SourceLawProvider} and with the
 * same rules: a public no-argument constructor, no state, listed in {@code
 * META-INF/services/dev.soakfield.law.api.FaceLawProvider}. A case names it in a face group's
 * condition: {@code "faces": {"inner": {"kind": "law", "law": "<id>", parameter: value, ...}}}.
 */
public interface FaceLawProvider {
  /** The id a case file names in {@code "law": "<id>"}: lower case, digits, '-'. */
  String id();

  /** One sentence for listings: what the law models and who published it. */
  String description();

  /** The parameters the law accepts, in the order a listing shows them. */
  List<LawParameter> parameters();

  /**
   * A law for one face group.
   *
   * @param values every declared parameter, checked against its range and converted to its SI unit
   *     (defaults filled in)
   * @throws IllegalArgumentException when the values are inconsistent together
   */
  FaceLaw create(LawParameters values);
}
