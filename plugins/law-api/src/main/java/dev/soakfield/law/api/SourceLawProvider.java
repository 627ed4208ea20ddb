package dev.soakfield.law.api;

import java.util.List;

/**
 * Declares one source law and creates its instances. Implementations need a public no-argument
 * constructor (for {@link java.util.ServiceLoader}) and must be stateless.
 */
public interface SourceLawProvider {
  /** The id a case file names in {@code "source": {"law": "<id>"}}: lower case, digits, '-'. */
  String id();

  /** One sentence for listings: what the law models and who published it. */
  String description();

  /** The parameters the law accepts, in the order a listing shows them. */
  List<LawParameter> parameters();

  /**
   * A law for one material.
   *
   * @param values every declared parameter, already checked against its range and converted to its
   *     SI unit (defaults filled in)
   * @throws IllegalArgumentException when the values are inconsistent together (the message says
   *     which and why; the case binding reports it at the material's key path)
   */
  SourceLaw create(LawParameters values);
}
