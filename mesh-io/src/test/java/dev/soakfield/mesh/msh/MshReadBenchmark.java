package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.RawMesh;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Measures import time against a plain line-count scan of the same file (not a test: speed is never
 * asserted). Usage: {@code MshReadBenchmark [cubesPerEdge] [dir]}; 55 cubes per edge give 998,250
 * tetrahedra.
 */
final class MshReadBenchmark {
  private MshReadBenchmark() {}

  /** An n x n x n grid of unit-spaced cubes, six tetrahedra each, boundary faces left out. */
  static TetMesh grid(int n, double spacing) {
    int m = n + 1;
    double[] xyz = new double[3 * m * m * m];
    for (int k = 0; k < m; k++) {
      for (int j = 0; j < m; j++) {
        for (int i = 0; i < m; i++) {
          int p = i + m * (j + m * k);
          xyz[3 * p] = i * spacing;
          xyz[3 * p + 1] = j * spacing;
          xyz[3 * p + 2] = k * spacing;
        }
      }
    }
    int[] tets = new int[24 * n * n * n];
    int t = 0;
    for (int k = 0; k < n; k++) {
      for (int j = 0; j < n; j++) {
        for (int i = 0; i < n; i++) {
          for (int[] tet : CubeFixture.TETS) {
            for (int c : tet) {
              int b = c - 1;
              tets[t++] = (i + (b & 1)) + m * ((j + ((b >> 1) & 1)) + m * (k + ((b >> 2) & 1)));
            }
          }
        }
      }
    }
    return new TetMesh.Builder()
        .nodes(xyz)
        .tets(tets, new int[6 * n * n * n])
        .faces(new int[0], new int[0])
        .volumeGroups(List.of(new VolumeGroup("block", 1)))
        .faceGroups(List.<FaceGroup>of())
        .build();
  }

  static long lineCount(Path file) throws IOException {
    long lines = 0;
    try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.ISO_8859_1)) {
      while (r.readLine() != null) {
        lines++;
      }
    }
    return lines;
  }

  static long byteScan(Path file) throws IOException {
    long lines = 0;
    byte[] buf = new byte[1 << 16];
    try (InputStream in = Files.newInputStream(file)) {
      for (int n = in.read(buf); n >= 0; n = in.read(buf)) {
        for (int i = 0; i < n; i++) {
          if (buf[i] == '\n') {
            lines++;
          }
        }
      }
    }
    return lines;
  }

  public static void main(String[] args) throws IOException {
    int n = args.length > 0 ? Integer.parseInt(args[0]) : 55;
    Path dir = Path.of(args.length > 1 ? args[1] : System.getProperty("java.io.tmpdir"));
    for (double spacing : new double[] {0.5, 1.0 / n}) {
      TetMesh mesh = grid(n, spacing);
      for (boolean binary : new boolean[] {false, true}) {
        Path file = dir.resolve("bench-" + n + (binary ? "-bin" : "-ascii") + ".msh");
        MshWriter.write(file, mesh, binary);
        long bestLines = Long.MAX_VALUE;
        long bestBytes = Long.MAX_VALUE;
        long bestRead = Long.MAX_VALUE;
        long check = 0;
        for (int rep = 0; rep < 6; rep++) {
          long t0 = System.nanoTime();
          check += lineCount(file);
          long t1 = System.nanoTime();
          check += byteScan(file);
          long t2 = System.nanoTime();
          RawMesh raw = MshReader.read(file);
          long t3 = System.nanoTime();
          check += raw.tetCount();
          bestLines = Math.min(bestLines, t1 - t0);
          bestBytes = Math.min(bestBytes, t2 - t1);
          bestRead = Math.min(bestRead, t3 - t2);
        }
        System.out.printf(
            "%s spacing %s: %d tets, %.1f MB; readLine scan %.0f ms, byte scan %.0f ms,"
                + " import %.0f ms (%.2fx readLine, %.2fx byte scan) [%d]%n",
            binary ? "binary" : "ASCII ",
            spacing == 0.5 ? "0.5 (short decimals)" : "1/" + n + " (17-digit decimals)",
            mesh.tetCount(),
            Files.size(file) / 1e6,
            bestLines / 1e6,
            bestBytes / 1e6,
            bestRead / 1e6,
            (double) bestRead / bestLines,
            (double) bestRead / bestBytes,
            check);
        Files.delete(file);
      }
    }
  }
}
