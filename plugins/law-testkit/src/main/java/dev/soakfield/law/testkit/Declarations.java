package dev.soakfield.law.testkit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.ParameterBinder;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;

/** The declaration checks source and face laws share: the id, description and each parameter. */
final class Declarations {
  private Declarations() {}

  /**
   * Checks the law's id and description and each parameter's name, description, default and unit;
   * {@code more} adds a contract's own checks of a parameter.
   */
  static void check(
      String id,
      String description,
      List<LawParameter> parameters,
      ParameterBinder binder,
      Consumer<LawParameter> more) {
    assertTrue(id.matches("[a-z0-9]+(-[a-z0-9]+)*"), "id '" + id + "'");
    assertFalse(description.isBlank(), "description");
    Set<String> names = new HashSet<>();
    for (LawParameter d : parameters) {
      assertTrue(names.add(d.name()), "parameter '" + d.name() + "' declared twice");
      assertFalse(d.name().equals(ParameterBinder.LAW_KEY), "'law' is the key naming the law");
      assertTrue(d.name().matches("[a-z0-9]+(-[a-z0-9]+)*"), "parameter name '" + d.name() + "'");
      assertFalse(d.description().isBlank(), d.name() + ": description");
      more.accept(d);
      if (!d.isRequired()) {
        assertTrue(
            d.defaultValue() >= d.minimum() && d.defaultValue() <= d.maximum(),
            d.name() + ": default " + d.defaultValue() + " outside its range");
      }
      double probe = d.isRequired() ? d.minimum() : d.defaultValue();
      if (Double.isFinite(probe)) {
        try {
          assertEquals(probe, binder.inUnit(Double.toString(probe), d.unit()), d.name());
        } catch (IllegalArgumentException e) {
          fail(d.name() + ": unit '" + d.unit() + "' does not parse: " + e.getMessage());
        }
      }
    }
  }
}
