package dev.soakfield.fem.verify;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Errors on a sequence of meshes, each about half the size of the one before, and the orders they
 * show: log(e_coarse/e_fine)/log(h_coarse/h_fine), h = (volume/tetrahedra)^(1/3). The order of the
 * finest pair is checked against the expected one within a band, above and below; the coarser pairs
 * are reported beside it (they may still be on their way to the asymptotic order).
 */
final class ConvergenceStudy {
  /** One mesh's result. */
  record Level(double h, double l2, double h1) {}

  private final String name;
  private final String source;
  private final int degree;
  private final List<Level> levels = new ArrayList<>();

  /**
   * @param name what is studied ("sphere, quadratic")
   * @param source where the exact solution comes from
   * @param degree the elements' degree p: L² errors should fall as h^(p+1), H¹ errors as h^p
   */
  ConvergenceStudy(String name, String source, int degree) {
    this.name = name;
    this.source = source;
    this.degree = degree;
  }

  void add(double h, ErrorNorms.Errors e) {
    levels.add(new Level(h, e.l2(), e.h1()));
  }

  List<Level> levels() {
    return List.copyOf(levels);
  }

  /** The orders between successive levels: [pair][0] for L², [pair][1] for H¹. */
  double[][] orders() {
    double[][] o = new double[levels.size() - 1][2];
    for (int i = 0; i + 1 < levels.size(); i++) {
      Level a = levels.get(i);
      Level b = levels.get(i + 1);
      double ratio = Math.log(a.h() / b.h());
      o[i][0] = Math.log(a.l2() / b.l2()) / ratio;
      o[i][1] = Math.log(a.h1() / b.h1()) / ratio;
    }
    return o;
  }

  /**
   * The checks: L² and H¹ orders of the finest pair within the given bands of p+1 and p, each named
   * with the coarser pairs' orders.
   */
  List<Check> checks(double l2Band, double h1Band) {
    if (levels.size() < 3) {
      throw new IllegalStateException("a convergence study needs three levels or more");
    }
    double[][] o = orders();
    int last = o.length - 1;
    return List.of(
        Check.order(
            label("L2", o, 0),
            source + "; Brenner & Scott Thm 4.4.20: L2 error ~ h^(p+1)",
            degree + 1,
            o[last][0],
            l2Band),
        Check.order(
            label("H1", o, 1),
            source + "; Brenner & Scott Thm 4.4.20: H1 error ~ h^p",
            degree,
            o[last][1],
            h1Band));
  }

  private String label(String norm, double[][] o, int k) {
    StringBuilder coarser = new StringBuilder();
    for (int i = 0; i < o.length - 1; i++) {
      coarser.append(i == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.2f", o[i][k]));
    }
    return String.format(
        Locale.ROOT,
        "%s, %s order on %d meshes (coarser pairs %s)",
        name,
        norm,
        levels.size(),
        coarser);
  }
}
