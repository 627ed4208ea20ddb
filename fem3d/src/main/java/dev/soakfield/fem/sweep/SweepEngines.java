package dev.soakfield.fem.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.ServiceLoader;

/** The sweep engines on the class path, by name. */
public final class SweepEngines {
  private SweepEngines() {}

  /** Every engine found, in class-path order. */
  public static List<SweepEngine> all() {
    List<SweepEngine> found = new ArrayList<>();
    ServiceLoader.load(SweepEngine.class, SweepEngine.class.getClassLoader()).forEach(found::add);
    return found;
  }

  /**
   * The engine called {@code name}.
   *
   * @throws SweepInputException naming the engines there are, and how the Spark engine is added
   */
  public static SweepEngine named(String name) {
    List<String> names = new ArrayList<>();
    for (SweepEngine e : all()) {
      if (e.name().equals(name)) {
        return e;
      }
      names.add(e.name());
    }
    String hint =
        name.equals("spark")
            ? "; the Spark engine is an optional module: run the sweep through the ./soakfield"
                + " launcher, which builds it and puts Spark on the class path, or with"
                + " spark-submit and the jar of plugins/sweep-spark"
            : "";
    throw new SweepInputException(
        "--engine: found '" + name + "', expected one of " + String.join(", ", names) + hint);
  }
}
