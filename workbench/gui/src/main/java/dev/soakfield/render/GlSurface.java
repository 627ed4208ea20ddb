package dev.soakfield.render;

import static org.lwjgl.glfw.GLFW.*;
import static org.lwjgl.opengl.GL33C.*;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.nio.ByteBuffer;
import org.lwjgl.system.MemoryUtil;

/**
 * A GL 3.3 core context with somewhere to draw: a visible window (drawing to its back buffer) or a
 * hidden one with a framebuffer object of the picture's size (drawing off screen). Pixels are read
 * before buffers are swapped, rows flipped to top-first.
 */
public final class GlSurface implements AutoCloseable {
  private final long window;
  private final boolean offscreen;
  private int width;
  private int height;
  private int fbo;
  private int colour;
  private int depth;

  private GlSurface(long window, boolean offscreen, int width, int height) {
    this.window = window;
    this.offscreen = offscreen;
    this.width = width;
    this.height = height;
  }

  /** A hidden context drawing into a framebuffer of {@code width} × {@code height}. */
  public static GlSurface offscreen(int width, int height) {
    GlRuntime.start();
    GlRuntime.contextHints(false);
    long w = glfwCreateWindow(Math.max(1, width), Math.max(1, height), "soakfield", 0, 0);
    if (w == 0) {
      throw new IllegalStateException("could not create an OpenGL 3.3 core context for rendering");
    }
    glfwMakeContextCurrent(w);
    GlRuntime.loadFunctions();
    GlSurface s = new GlSurface(w, true, width, height);
    s.makeFramebuffer();
    return s;
  }

  /**
   * A visible window.
   *
   * @throws IllegalStateException when there is no display
   */
  public static GlSurface window(int width, int height, String title) {
    GlRuntime.start();
    GlRuntime.whyNoWindow()
        .ifPresent(
            why -> {
              throw new IllegalStateException("no display: " + why);
            });
    GlRuntime.contextHints(true);
    glfwWindowHint(GLFW_SAMPLES, 4);
    long w = glfwCreateWindow(width, height, title, 0, 0);
    if (w == 0) {
      throw new IllegalStateException("could not open a window with an OpenGL 3.3 core context");
    }
    glfwMakeContextCurrent(w);
    glfwSwapInterval(1);
    GlRuntime.loadFunctions();
    return new GlSurface(w, false, width, height);
  }

  private void makeFramebuffer() {
    fbo = glGenFramebuffers();
    glBindFramebuffer(GL_FRAMEBUFFER, fbo);
    colour = glGenRenderbuffers();
    glBindRenderbuffer(GL_RENDERBUFFER, colour);
    glRenderbufferStorage(GL_RENDERBUFFER, GL_RGBA8, width, height);
    glFramebufferRenderbuffer(GL_FRAMEBUFFER, GL_COLOR_ATTACHMENT0, GL_RENDERBUFFER, colour);
    depth = glGenRenderbuffers();
    glBindRenderbuffer(GL_RENDERBUFFER, depth);
    glRenderbufferStorage(GL_RENDERBUFFER, GL_DEPTH_COMPONENT24, width, height);
    glFramebufferRenderbuffer(GL_FRAMEBUFFER, GL_DEPTH_ATTACHMENT, GL_RENDERBUFFER, depth);
    int status = glCheckFramebufferStatus(GL_FRAMEBUFFER);
    if (status != GL_FRAMEBUFFER_COMPLETE) {
      throw new IllegalStateException(
          "framebuffer incomplete: status 0x" + Integer.toHexString(status));
    }
  }

  /** Makes this context current and binds where it draws. */
  public void bind() {
    glfwMakeContextCurrent(window);
    if (offscreen) {
      glBindFramebuffer(GL_FRAMEBUFFER, fbo);
    } else {
      glBindFramebuffer(GL_FRAMEBUFFER, 0);
      try (var stack = org.lwjgl.system.MemoryStack.stackPush()) {
        var w = stack.mallocInt(1);
        var h = stack.mallocInt(1);
        glfwGetFramebufferSize(window, w, h);
        width = Math.max(1, w.get(0));
        height = Math.max(1, h.get(0));
      }
    }
    glViewport(0, 0, width, height);
  }

  public int width() {
    return width;
  }

  public int height() {
    return height;
  }

  public long window() {
    return window;
  }

  /** The picture drawn so far, top row first (read before swapping). */
  public BufferedImage read() {
    ByteBuffer px = MemoryUtil.memAlloc(4 * width * height);
    try {
      glPixelStorei(GL_PACK_ALIGNMENT, 1);
      if (!offscreen) {
        glReadBuffer(GL_BACK);
      }
      glReadPixels(0, 0, width, height, GL_RGBA, GL_UNSIGNED_BYTE, px);
      BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
      // straight into the image's own pixel array: setRGB goes through the colour model per pixel
      int[] rgb = ((DataBufferInt) img.getRaster().getDataBuffer()).getData();
      for (int y = 0; y < height; y++) {
        int row = (height - 1 - y) * width * 4;
        int out = y * width;
        for (int x = 0; x < width; x++) {
          int o = row + 4 * x;
          rgb[out + x] =
              ((px.get(o) & 0xff) << 16) | ((px.get(o + 1) & 0xff) << 8) | (px.get(o + 2) & 0xff);
        }
      }
      return img;
    } finally {
      MemoryUtil.memFree(px);
    }
  }

  public void swap() {
    if (!offscreen) {
      glfwSwapBuffers(window);
    }
  }

  @Override
  public void close() {
    glfwMakeContextCurrent(window);
    if (offscreen) {
      glDeleteFramebuffers(fbo);
      glDeleteRenderbuffers(colour);
      glDeleteRenderbuffers(depth);
    }
    glfwMakeContextCurrent(0);
    glfwDestroyWindow(window);
  }
}
