package dev.soakfield.mesh.msh;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * A bounded fuzzing run in every build: mutated MSH files either read or give a MeshInputException,
 * nothing else (FUZZING.md describes the longer campaigns).
 */
class MshFuzzTest {
  @Test
  void mutatedFilesGiveAMeshOrAMeshInputException() throws IOException, InterruptedException {
    List<byte[]> corpus = MshFuzzer.loadCorpus();
    MshFuzzer.Result r = MshFuzzer.run(corpus, 7L, 15_000, 10_000, null);
    assertEquals(List.of(), r.failures());
    assertEquals(15_000, r.accepted() + r.rejected());
    // both outcomes occur: some mutations keep a file valid, most break it
    assertTrue(r.accepted() > 0 && r.rejected() > 0, r.toString());
  }

  @Test
  void corpusFilesAreValidAsTheyStand() throws IOException {
    for (byte[] file : MshFuzzer.loadCorpus()) {
      assertTrue(MshReader.read(file, "corpus.msh").tetCount() > 0);
    }
  }

  @Test
  void mutationsAreDeterministicForASeed() throws IOException {
    byte[] base = MshFuzzer.loadCorpus().get(0);
    SplittableRandom a = new SplittableRandom(42);
    SplittableRandom b = new SplittableRandom(42);
    for (int i = 0; i < 100; i++) {
      assertArrayEquals(MshFuzzer.mutate(base, a), MshFuzzer.mutate(base, b));
    }
  }
}
