package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.soakfield.mesh.gen.StructuredMesher;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.Test;

/**
 * An OpenGL context belongs to the thread that made it current: the worker must set up, draw and
 * free on one thread of its own, whichever thread asks for a picture.
 */
class PictureWorkerTest {
  private final List<String> calls = new CopyOnWriteArrayList<>();

  /** A maker that records which thread does what, failing its set-up when told to. */
  private PictureMaker recording(boolean failSetUp) {
    return new PictureMaker() {
      @Override
      public BufferedImage draw(Scene s, OrbitCamera c, int width, int height, String unit) {
        throw new AssertionError("the worker draws through a batch");
      }

      @Override
      public Batch batch() {
        return new Batch() {
          @Override
          public void prepare(int width, int height) {
            calls.add(
                "prepare " + width + "x" + height + " on " + Thread.currentThread().getName());
            if (failSetUp) {
              throw new IllegalStateException("could not create an OpenGL 3.3 core context");
            }
          }

          @Override
          public BufferedImage draw(Scene s, OrbitCamera c, int width, int height, String unit) {
            calls.add("draw " + unit + " on " + Thread.currentThread().getName());
            return new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
          }

          @Override
          public void close() {
            calls.add("close on " + Thread.currentThread().getName());
          }
        };
      }
    };
  }

  private static Scene scene() {
    Study study = Study.ofMesh(Path.of("box"), StructuredMesher.box(1, 1, 1, 1, 1, 1, 1));
    return new Scene(study, new ViewSettings());
  }

  @Test
  void setsUpDrawsAndFreesOnItsOwnThread() throws Exception {
    Scene scene = scene();
    PictureWorker w = new PictureWorker(recording(false), 8, 6);
    BufferedImage img = w.draw(scene, new OrbitCamera(), 8, 6, "kg/m^3");
    assertEquals(8, img.getWidth());
    w.close();
    for (int i = 0; i < 100 && calls.size() < 3; i++) { // close frees after the caller goes on
      Thread.sleep(20);
    }
    assertEquals(
        List.of("prepare 8x6 on pictures", "draw kg/m^3 on pictures", "close on pictures"), calls);
  }

  @Test
  void aSetUpThatFailsIsReportedWithItsReasonAtTheFirstPicture() {
    Scene scene = scene();
    try (PictureWorker w = new PictureWorker(recording(true), 8, 6)) {
      IllegalStateException e =
          assertThrows(
              IllegalStateException.class, () -> w.draw(scene, new OrbitCamera(), 8, 6, "kg/m^3"));
      assertEquals("could not create an OpenGL 3.3 core context", e.getMessage());
      assertSame(IllegalStateException.class, e.getClass());
    }
  }
}
