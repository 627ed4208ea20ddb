package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.MeshInputException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

/**
 * A deterministic, seeded mutation fuzzer for {@link MshReader}. Each input is a corpus file with
 * one to four mutations (bit flips, inserted and deleted bytes, truncation, digit changes,
 * duplicated lines, numbers replaced by huge or edge values, binary words overwritten). The
 * property: the reader returns a mesh or throws {@link MeshInputException}; any other exception, an
 * error such as OutOfMemoryError, or a run longer than the timeout is a failure.
 *
 * <p>Run a campaign: {@code java -cp mesh-io/target/classes:mesh-io/target/test-classes
 * dev.soakfield.mesh.msh.MshFuzzer COUNT SEED [TIMEOUT_MS]}.
 */
final class MshFuzzer {
  static final String[] CORPUS = {
    "cube_v41_ascii.msh",
    "cube_v41_binary.msh",
    "cube_v22_ascii.msh",
    "cube_v22_binary.msh",
    "cube_p2_v41_ascii.msh",
    "cube_p2_v22_binary.msh",
    "two_volumes_v41_ascii.msh",
    "sparse_tags_v41_ascii.msh",
    "entity_quirks_v41_ascii.msh",
    "no_physical_v22_ascii.msh",
    "writer_p1_binary.msh",
    "writer_p2_ascii.msh"
  };

  private static final String[] EDGE_NUMBERS = {
    "0", "-1", "1", "2147483647", "2147483648", "-2147483649", "4294967296", "9223372036854775807",
    "18446744073709551615", "99999999999999999999999", "1e308", "1e-400", "nan", "-0", "3.0", "15"
  };

  private static final int[] EDGE_WORDS = {
    0, -1, 1, 2, Integer.MAX_VALUE, Integer.MIN_VALUE, 1 << 30
  };

  /** Outcome of a campaign. */
  record Result(int accepted, int rejected, List<String> failures) {}

  private MshFuzzer() {}

  static List<byte[]> loadCorpus() throws IOException {
    List<byte[]> corpus = new ArrayList<>();
    for (String name : CORPUS) {
      try (InputStream in = MshFuzzer.class.getResourceAsStream("/fuzz/msh-corpus/" + name)) {
        if (in == null) {
          throw new IOException("corpus file missing: " + name);
        }
        corpus.add(in.readAllBytes());
      }
    }
    return corpus;
  }

  /** Runs {@code count} mutated inputs from {@code seed}; failures are kept under {@code keep}. */
  static Result run(List<byte[]> corpus, long seed, int count, long timeoutMs, Path keep)
      throws IOException, InterruptedException {
    SplittableRandom rnd = new SplittableRandom(seed);
    ExecutorService worker = Executors.newSingleThreadExecutor(MshFuzzer::daemon);
    int accepted = 0;
    int rejected = 0;
    List<String> failures = new ArrayList<>();
    try {
      for (int i = 0; i < count; i++) {
        byte[] input = mutate(corpus.get(rnd.nextInt(corpus.size())), rnd);
        Future<?> f = worker.submit(() -> MshReader.read(input, "fuzz.msh"));
        String failure = null;
        try {
          f.get(timeoutMs, TimeUnit.MILLISECONDS);
          accepted++;
        } catch (ExecutionException e) {
          if (e.getCause() instanceof MeshInputException) {
            rejected++;
          } else {
            failure = "input " + i + ": " + e.getCause();
          }
        } catch (TimeoutException e) {
          f.cancel(true);
          worker.shutdownNow();
          worker = Executors.newSingleThreadExecutor(MshFuzzer::daemon);
          failure = "input " + i + ": no answer within " + timeoutMs + " ms";
        }
        if (failure != null) {
          failures.add(failure);
          if (keep != null) {
            Files.createDirectories(keep);
            Files.write(keep.resolve("seed" + seed + "-input" + i + ".msh"), input);
          }
        }
      }
    } finally {
      worker.shutdownNow();
    }
    return new Result(accepted, rejected, failures);
  }

  private static Thread daemon(Runnable r) {
    Thread t = new Thread(r, "msh-fuzz");
    t.setDaemon(true);
    return t;
  }

  static byte[] mutate(byte[] original, SplittableRandom rnd) {
    byte[] b = original;
    int rounds = 1 + rnd.nextInt(4);
    for (int r = 0; r < rounds; r++) {
      b = mutateOnce(b, rnd);
    }
    return b;
  }

  private static byte[] mutateOnce(byte[] b, SplittableRandom rnd) {
    if (b.length == 0) {
      return new byte[] {(byte) rnd.nextInt(256)};
    }
    int at = rnd.nextInt(b.length);
    switch (rnd.nextInt(9)) {
      case 0 -> {
        byte[] c = b.clone();
        c[at] ^= (byte) (1 << rnd.nextInt(8));
        return c;
      }
      case 1 -> {
        byte[] ins = new byte[1 + rnd.nextInt(8)];
        for (int i = 0; i < ins.length; i++) {
          ins[i] =
              (byte)
                  (rnd.nextBoolean()
                      ? rnd.nextInt(256)
                      : " \n0123456789-.$e\"".charAt(rnd.nextInt(17)));
        }
        return splice(b, at, 0, ins);
      }
      case 2 -> {
        return splice(b, at, Math.min(b.length - at, 1 + rnd.nextInt(16)), new byte[0]);
      }
      case 3 -> {
        return Arrays.copyOf(b, at);
      }
      case 4 -> {
        byte[] c = b.clone();
        for (int k = 0; k < 64; k++) {
          int i = rnd.nextInt(c.length);
          if (c[i] >= '0' && c[i] <= '9') {
            if (rnd.nextBoolean() && i + 1 < c.length && c[i + 1] >= '0' && c[i + 1] <= '9') {
              byte t = c[i];
              c[i] = c[i + 1];
              c[i + 1] = t;
            } else {
              c[i] = (byte) ('0' + rnd.nextInt(10));
            }
            break;
          }
        }
        return c;
      }
      case 5 -> {
        int start = lineStart(b, at);
        int end = lineEnd(b, at);
        byte[] line = Arrays.copyOfRange(b, start, end);
        return splice(b, end, 0, line);
      }
      case 6 -> {
        int start = at;
        while (start < b.length && (b[start] < '0' || b[start] > '9')) {
          start++;
        }
        int end = start;
        while (end < b.length && ((b[end] >= '0' && b[end] <= '9') || b[end] == '.')) {
          end++;
        }
        String n = EDGE_NUMBERS[rnd.nextInt(EDGE_NUMBERS.length)];
        return splice(b, start, end - start, n.getBytes(StandardCharsets.US_ASCII));
      }
      case 7 -> {
        byte[] c = b.clone();
        int w = EDGE_WORDS[rnd.nextInt(EDGE_WORDS.length)];
        boolean big = rnd.nextBoolean();
        for (int k = 0; k < 4 && at + k < c.length; k++) {
          c[at + k] = (byte) (big ? w >>> (24 - 8 * k) : w >>> (8 * k));
        }
        return c;
      }
      default -> {
        int start = lineStart(b, at);
        int end = lineEnd(b, at);
        return splice(b, start, end - start, new byte[0]);
      }
    }
  }

  private static int lineStart(byte[] b, int at) {
    int i = at;
    while (i > 0 && b[i - 1] != '\n') {
      i--;
    }
    return i;
  }

  private static int lineEnd(byte[] b, int at) {
    int i = at;
    while (i < b.length && b[i] != '\n') {
      i++;
    }
    return Math.min(b.length, i + 1);
  }

  private static byte[] splice(byte[] b, int at, int remove, byte[] insert) {
    byte[] c = new byte[b.length - remove + insert.length];
    System.arraycopy(b, 0, c, 0, at);
    System.arraycopy(insert, 0, c, at, insert.length);
    System.arraycopy(b, at + remove, c, at + insert.length, b.length - at - remove);
    return c;
  }

  public static void main(String[] args) throws IOException, InterruptedException {
    int count = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
    long seed = args.length > 1 ? Long.parseLong(args[1]) : 1L;
    long timeoutMs = args.length > 2 ? Long.parseLong(args[2]) : 5_000L;
    long start = System.nanoTime();
    Result r = run(loadCorpus(), seed, count, timeoutMs, Path.of("target", "fuzz-failures"));
    double seconds = (System.nanoTime() - start) / 1e9;
    System.out.printf(
        "seed %d: %d inputs, %d read, %d refused with MeshInputException, %d failures, %.1f s%n",
        seed, count, r.accepted(), r.rejected(), r.failures().size(), seconds);
    r.failures().stream().limit(50).forEach(System.out::println);
  }
}
