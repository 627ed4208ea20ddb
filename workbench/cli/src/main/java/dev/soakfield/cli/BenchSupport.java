package dev.soakfield.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.Stream;

/** What the bench commands share: the median of repeated timings and their scratch folders. */
final class BenchSupport {
  private BenchSupport() {}

  /** The median of {@code v} (the mean of the middle two for an even count). */
  static double median(double[] v) {
    double[] c = v.clone();
    Arrays.sort(c);
    return c.length % 2 == 1 ? c[c.length / 2] : 0.5 * (c[c.length / 2 - 1] + c[c.length / 2]);
  }

  /** Deletes {@code root} and everything under it. */
  static void deleteTree(Path root) throws IOException {
    try (Stream<Path> s = Files.walk(root)) {
      for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }
}
