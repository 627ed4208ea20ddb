package dev.soakfield.fem.laws;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.SourceLawProvider;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class LawBindingTest {
  /** Declarations only; these tests never create a law. */
  static final class Declared implements SourceLawProvider {
    @Override
    public String id() {
      return "declared";
    }

    @Override
    public String description() {
      return "Declarations for binding tests.";
    }

    @Override
    public List<LawParameter> parameters() {
      return List.of(
          LawParameter.required("trap-density", "amount/m^3", "sites", 0, Double.POSITIVE_INFINITY),
          LawParameter.optional("binding-energy", "J/mol", "depth", 0, 0, 2e5));
    }

    @Override
    public SourceLaw create(LawParameters values) {
      throw new UnsupportedOperationException("not needed");
    }
  }

  private static Map<String, Object> given(Object... kv) {
    Map<String, Object> m = new LinkedHashMap<>();
    for (int i = 0; i < kv.length; i += 2) {
      m.put((String) kv[i], kv[i + 1]);
    }
    return m;
  }

  @Test
  void valuesAreCheckedAndDefaultsFilledIn() {
    LawBinding.Result r =
        LawBinding.bind(new Declared(), given("law", "declared", "trap-density", "2.5e23"));
    assertTrue(r.problems().isEmpty(), r.problems().toString());
    LawParameters p = r.parameters().orElseThrow();
    assertEquals(2.5e23, p.get("trap-density"));
    assertEquals(0.0, p.get("binding-energy"));
    IllegalArgumentException ex =
        assertThrows(IllegalArgumentException.class, () -> p.get("lattice-density"));
    assertTrue(ex.getMessage().contains("'lattice-density'"), ex.getMessage());
  }

  @Test
  void aMissingRequiredKeyIsAProblem() {
    LawBinding.Result r = LawBinding.bind(new Declared(), given("binding-energy", 6e4));
    assertTrue(r.parameters().isEmpty());
    assertEquals(1, r.problems().size());
    LawBinding.Problem p = r.problems().get(0);
    assertEquals("trap-density", p.key());
    assertEquals("nothing", p.found());
    assertTrue(p.expected().contains("amount/m^3"), p.expected());
  }

  @Test
  void anUnknownKeyGetsTheClosestDeclaredName() {
    LawBinding.Result r =
        LawBinding.bind(new Declared(), given("trap-density", 1e22, "binding-enrgy", 6e4));
    assertEquals(1, r.problems().size());
    assertEquals("binding-enrgy", r.problems().get(0).key());
    assertTrue(
        r.problems().get(0).expected().contains("'binding-energy'"), r.problems().toString());
    LawBinding.Result far = LawBinding.bind(new Declared(), given("trap-density", 1e22, "xyz", 1));
    assertTrue(
        far.problems().get(0).expected().contains("one of trap-density, binding-energy"),
        far.problems().toString());
  }

  @Test
  void outOfRangeNonFiniteAndWrongTypesAreProblemsEach() {
    LawBinding.Result r =
        LawBinding.bind(new Declared(), given("trap-density", -1.0, "binding-energy", 3e5));
    assertEquals(2, r.problems().size(), r.problems().toString());
    assertEquals("-1 amount/m^3", r.problems().get(0).found());
    assertEquals("a finite value ≥ 0 amount/m^3", r.problems().get(0).expected());
    assertEquals("a finite value from 0 to 200000 J/mol", r.problems().get(1).expected());
    LawBinding.Result inf =
        LawBinding.bind(new Declared(), given("trap-density", Double.POSITIVE_INFINITY));
    assertEquals(1, inf.problems().size());
    LawBinding.Result bool = LawBinding.bind(new Declared(), given("trap-density", true));
    assertEquals("boolean", bool.problems().get(0).found());
    LawBinding.Result text = LawBinding.bind(new Declared(), given("trap-density", "many"));
    assertEquals("trap-density", text.problems().get(0).key());
    assertTrue(
        text.problems().get(0).message().startsWith("found 'many'"), text.problems().toString());
  }

  @Test
  void numbersAreFormattedShortly() {
    assertEquals("0", LawBinding.format(0));
    assertEquals("60000", LawBinding.format(6e4));
    assertEquals("1.5", LawBinding.format(1.5));
    assertEquals("2.5e-12", LawBinding.format(2.5e-12));
    assertEquals("5.1e+29", LawBinding.format(5.1e29));
    assertEquals("1234.57", LawBinding.format(1234.5678));
  }
}
