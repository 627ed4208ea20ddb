package dev.soakfield.fem.laws;

import dev.soakfield.fem.units.SiValue;
import dev.soakfield.fem.units.UnitException;
import dev.soakfield.law.api.ParameterBinder;
import dev.soakfield.law.api.SourceLawProvider;
import java.util.Map;

/** The law API's parameter binder: {@link LawBinding} and {@link SiValue}, as a run uses them. */
public final class CaseParameterBinder implements ParameterBinder {
  @Override
  public Binding bind(SourceLawProvider provider, Map<String, Object> given) {
    LawBinding.Result r = LawBinding.bind(provider, given);
    return new Binding(
        r.parameters(), r.problems().stream().map(p -> p.key() + ": " + p.message()).toList());
  }

  @Override
  public Binding bind(dev.soakfield.law.api.FaceLawProvider provider, Map<String, Object> given) {
    LawBinding.Result r = LawBinding.bind(provider, given);
    return new Binding(
        r.parameters(), r.problems().stream().map(p -> p.key() + ": " + p.message()).toList());
  }

  @Override
  public double inUnit(String text, String unit) {
    try {
      return SiValue.parse(text, unit);
    } catch (UnitException e) {
      throw new IllegalArgumentException(e.getMessage(), e);
    }
  }
}
