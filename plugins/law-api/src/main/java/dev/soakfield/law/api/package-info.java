/**
 * The stable surface for source-law plugins: everything a plugin author needs, and nothing else of
 * fem3d. A plugin implements {@link dev.soakfield.law.api.SourceLawProvider}, lists it in {@code
 * META-INF/services/dev.soakfield.law.api.SourceLawProvider} and is found by {@link
 * java.util.ServiceLoader}. The solver calls a {@link dev.soakfield.law.api.SourceLaw} at every
 * node of the materials that use it; the law sees read-only views ({@link
 * dev.soakfield.law.api.LawPoint}, {@link dev.soakfield.law.api.StateView}) and writes only its
 * answers ({@link dev.soakfield.law.api.RateSink}, the end-of-step state array it is handed).
 *
 * <p>Units: SI throughout, with concentrations in the case's own amount unit per m³ (the unit of c
 * = S·φ); temperatures in kelvin; times in seconds.
 *
 * <p>Plugin authors test their law by extending {@code dev.soakfield.law.testkit.SourceLawContract}
 * (artifact {@code law-testkit}); {@code plugins/example-law} in the repository is a complete
 * plugin project to copy. Plugins are loaded from the plugins folders the user names and {@code
 * ~/.soakfield/plugins}, never from anything a case file names.
 *
 * <p>Changes to this package are additions only: existing methods keep their meaning.
 */
package dev.soakfield.law.api;
