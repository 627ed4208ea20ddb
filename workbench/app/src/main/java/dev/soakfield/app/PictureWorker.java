package dev.soakfield.app;

import java.awt.image.BufferedImage;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Draws pictures on a thread of its own, which sets up the renderer (with software OpenGL a hidden
 * context and its compiled shaders take most of a second) as soon as it starts: started before a
 * run, the set-up overlaps the run instead of delaying its report. One thread owns the context, as
 * OpenGL requires; callers on any thread wait for their picture.
 */
public final class PictureWorker implements PictureMaker, AutoCloseable {
  private final ExecutorService thread =
      Executors.newSingleThreadExecutor(
          r -> {
            Thread t = new Thread(r, "pictures");
            t.setDaemon(true); // a run that ends without closing it must not keep the JVM alive
            return t;
          });
  private final Future<Batch> batch;

  PictureWorker(PictureMaker maker, int width, int height) {
    batch =
        thread.submit(
            () -> {
              Batch b = maker.batch();
              b.prepare(width, height);
              return b;
            });
  }

  /**
   * A worker setting up for pictures of {@code width} × {@code height}; empty in a build without a
   * renderer ({@link GraphicsServices#NO_WINDOW}).
   */
  public static Optional<PictureWorker> start(int width, int height) {
    return GraphicsServices.pictures().map(m -> new PictureWorker(m, width, height));
  }

  /**
   * Draws on the worker's thread and waits for the picture.
   *
   * @throws IllegalStateException when the renderer could not start (its reason as the message)
   */
  @Override
  public BufferedImage draw(Scene scene, OrbitCamera camera, int width, int height, String unit) {
    return await(thread.submit(() -> batch.get().draw(scene, camera, width, height, unit)));
  }

  private static <T> T await(Future<T> f) {
    try {
      return f.get();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while drawing a picture", e);
    } catch (ExecutionException e) {
      Throwable cause = e.getCause();
      if (cause instanceof ExecutionException inner) { // the set-up failed, not the drawing
        cause = inner.getCause();
      }
      if (cause instanceof RuntimeException r) {
        throw r;
      }
      if (cause instanceof Error err) {
        throw err;
      }
      throw new IllegalStateException(String.valueOf(cause.getMessage()), cause);
    }
  }

  /** Frees the renderer on its own thread and ends the thread. */
  @Override
  public void close() {
    thread.execute(
        () -> {
          if (batch.isDone() && !batch.isCancelled()) {
            try {
              batch.get().close();
            } catch (ExecutionException e) {
              // the renderer never started: nothing to free
            } catch (InterruptedException e) {
              Thread.currentThread().interrupt();
            }
          }
        });
    thread.shutdown();
  }
}
