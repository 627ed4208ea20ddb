package dev.soakfield.fem.laws;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.law.api.LawParameter;
import dev.soakfield.law.api.LawParameters;
import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.SourceLawProvider;
import dev.soakfield.law.api.StateView;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class GuardedLawTest {
  /** A law with one state variable that misbehaves above c = 1 the way {@code mode} says. */
  static final class Faulty implements SourceLaw {
    final String mode;

    Faulty(String mode) {
      this.mode = mode;
    }

    @Override
    public List<String> stateNames() {
      return List.of("held");
    }

    @Override
    public void initialState(double c, double t, double[] state) {
      state[0] = mode.equals("nan-state") ? Double.NaN : 0;
    }

    @Override
    public void rate(LawPoint at, StateView start, RateSink out) {
      if (at.concentration() > 1 && mode.equals("throw")) {
        throw new ArithmeticException("log of a negative number");
      }
      if (at.concentration() > 1 && mode.equals("silent")) {
        return;
      }
      double r = at.concentration() > 1 && mode.equals("nan") ? Double.NaN : -at.concentration();
      out.set(r, -1);
    }

    @Override
    public void advance(LawPoint at, StateView start, double[] end) {
      end[0] = mode.equals("infinite") ? Double.POSITIVE_INFINITY : start.get(0) + at.dt();
    }
  }

  static final class FaultyProvider implements SourceLawProvider {
    @Override
    public String id() {
      return "faulty";
    }

    @Override
    public String description() {
      return "Misbehaves on purpose.";
    }

    @Override
    public List<LawParameter> parameters() {
      return List.of();
    }

    @Override
    public SourceLaw create(LawParameters values) {
      return new Faulty("throw");
    }
  }

  record Point(double concentration, double temperature, double time, double dt)
      implements LawPoint {}

  private static final LawEntry ENTRY =
      new LawEntry(new FaultyProvider(), LawOrigin.jar(Path.of("/opt/plugins/faulty.jar")));

  private static GuardedLaw guarded(String mode) {
    return new GuardedLaw(ENTRY, "steel", new Faulty(mode));
  }

  private static void assertNames(SourceLawException ex, String what) {
    String m = ex.getMessage();
    assertTrue(m.contains("'faulty'"), m);
    assertTrue(m.contains("/opt/plugins/faulty.jar"), m);
    assertTrue(m.contains("material 'steel'"), m);
    assertTrue(m.contains(what), m);
    assertEquals("steel", ex.material());
  }

  @Test
  void aWellBehavedAnswerPassesThrough() {
    double[] got = new double[2];
    guarded("throw")
        .rate(
            new Point(0.5, 300, 10, 1),
            k -> 0,
            (r, d) -> {
              got[0] = r;
              got[1] = d;
            });
    assertEquals(-0.5, got[0]);
    assertEquals(-1, got[1]);
  }

  @Test
  void aThrowNamesLawJarMaterialTimeAndTheLawsFrame() {
    SourceLawException ex =
        assertThrows(
            SourceLawException.class,
            () -> guarded("throw").rate(new Point(2, 300, 3600, 60), k -> 0, (r, d) -> {}));
    assertNames(ex, "at simulated time 3600 s");
    assertTrue(ex.getMessage().contains("log of a negative number"), ex.getMessage());
    assertTrue(ex.getMessage().contains("Faulty.rate"), ex.getMessage());
    assertEquals(3600, ex.simulatedTime());
  }

  @Test
  void nanInfinityAndNoAnswerAreFaults() {
    SourceLawException nan =
        assertThrows(
            SourceLawException.class,
            () -> guarded("nan").rate(new Point(2, 300, 7.5, 0.5), k -> 0, (r, d) -> {}));
    assertNames(nan, "π = NaN");
    SourceLawException silent =
        assertThrows(
            SourceLawException.class,
            () -> guarded("silent").rate(new Point(2, 300, 7.5, 0.5), k -> 0, (r, d) -> {}));
    assertNames(silent, "never called RateSink.set");
    SourceLawException inf =
        assertThrows(
            SourceLawException.class,
            () -> guarded("infinite").advance(new Point(0, 300, 20, 1), k -> 0, new double[1]));
    assertNames(inf, "held = Infinity");
    SourceLawException init =
        assertThrows(
            SourceLawException.class,
            () -> guarded("nan-state").initialState(0, 300, 0, new double[1]));
    assertNames(init, "initialState");
  }

  @Test
  void createWrapsTheProvidersLaw() {
    GuardedLaw g =
        GuardedLaw.create(
            ENTRY,
            new LawParameters() {
              @Override
              public double get(String name) {
                throw new IllegalArgumentException(name);
              }
            },
            "steel");
    assertEquals(List.of("held"), g.stateNames());
    assertEquals(1, g.stateSize());
    assertThrows(
        SourceLawException.class, () -> g.rate(new Point(5, 300, 1, 1), k -> 0, (r, d) -> {}));
  }
}
