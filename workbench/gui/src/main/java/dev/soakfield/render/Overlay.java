package dev.soakfield.render;

import dev.soakfield.app.Annotations;
import dev.soakfield.app.ColourMap;
import dev.soakfield.app.FieldKind;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.RoundTicks;
import dev.soakfield.app.Scene;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Optional;
import org.joml.Vector3d;
import org.lwjgl.stb.STBEasyFont;
import org.lwjgl.system.MemoryUtil;

/**
 * The picture's annotations as 2D triangles in pixels (x right, y down) with a colour each: the
 * colour bar with its title, unit and limits, the axis triad, the length scale and the time. Text
 * comes from stb_easy_font's quads (ASCII), scaled up.
 */
final class Overlay {
  static final float TEXT_SCALE = 1.5f;

  /** Layout constants in pixels, so tests know where to look. */
  static final int BAR_WIDTH = 22;

  static final int BAR_MARGIN = 95;

  private float[] v = new float[6 * 4096];
  private int n;

  /** Floats written: x, y, r, g, b, a a vertex. */
  int floats() {
    return n;
  }

  float[] data() {
    return v;
  }

  void clear() {
    n = 0;
  }

  private void vertex(float x, float y, float r, float g, float b, float a) {
    if (n + 6 > v.length) {
      v = Arrays.copyOf(v, 2 * v.length);
    }
    v[n++] = x;
    v[n++] = y;
    v[n++] = r;
    v[n++] = g;
    v[n++] = b;
    v[n++] = a;
  }

  void rect(float x0, float y0, float x1, float y1, int rgb) {
    rect(x0, y0, x1, y1, rgb, rgb);
  }

  /** A rectangle whose colour runs from {@code top} (y0) to {@code bottom} (y1). */
  void rect(float x0, float y0, float x1, float y1, int top, int bottom) {
    float[] t = rgb(top);
    float[] b = rgb(bottom);
    vertex(x0, y0, t[0], t[1], t[2], 1);
    vertex(x1, y0, t[0], t[1], t[2], 1);
    vertex(x1, y1, b[0], b[1], b[2], 1);
    vertex(x0, y0, t[0], t[1], t[2], 1);
    vertex(x1, y1, b[0], b[1], b[2], 1);
    vertex(x0, y1, b[0], b[1], b[2], 1);
  }

  /** A line of {@code w} pixels' width as a thin quad. */
  void line(double x0, double y0, double x1, double y1, float w, int rgb) {
    double dx = x1 - x0;
    double dy = y1 - y0;
    double len = Math.hypot(dx, dy);
    if (len == 0) {
      return;
    }
    float nx = (float) (-dy / len * w / 2);
    float ny = (float) (dx / len * w / 2);
    float[] c = rgb(rgb);
    float ax = (float) x0;
    float ay = (float) y0;
    float bx = (float) x1;
    float by = (float) y1;
    vertex(ax + nx, ay + ny, c[0], c[1], c[2], 1);
    vertex(bx + nx, by + ny, c[0], c[1], c[2], 1);
    vertex(bx - nx, by - ny, c[0], c[1], c[2], 1);
    vertex(ax + nx, ay + ny, c[0], c[1], c[2], 1);
    vertex(bx - nx, by - ny, c[0], c[1], c[2], 1);
    vertex(ax - nx, ay - ny, c[0], c[1], c[2], 1);
  }

  static float textWidth(String s) {
    return STBEasyFont.stb_easy_font_width(s) * TEXT_SCALE;
  }

  /** Text with its top-left corner at (x, y). */
  void text(float x, float y, String s, int rgb) {
    ByteBuffer buf = MemoryUtil.memAlloc(Math.max(1024, s.length() * 300));
    ByteBuffer str = MemoryUtil.memAlloc(s.length() + 1);
    try {
      str.put(s.getBytes(StandardCharsets.US_ASCII)).put((byte) 0).flip();
      int quads = STBEasyFont.stb_easy_font_print(0, 0, str, null, buf);
      float[] c = rgb(rgb);
      for (int q = 0; q < quads; q++) {
        float[] px = new float[8];
        for (int k = 0; k < 4; k++) {
          int o = (4 * q + k) * 16;
          px[2 * k] = x + buf.getFloat(o) * TEXT_SCALE;
          px[2 * k + 1] = y + buf.getFloat(o + 4) * TEXT_SCALE;
        }
        int[] order = {0, 1, 2, 0, 2, 3};
        for (int k : order) {
          vertex(px[2 * k], px[2 * k + 1], c[0], c[1], c[2], 1);
        }
      }
    } finally {
      MemoryUtil.memFree(buf);
      MemoryUtil.memFree(str);
    }
  }

  private static float[] rgb(int rgb) {
    return new float[] {
      ((rgb >> 16) & 0xff) / 255f, ((rgb >> 8) & 0xff) / 255f, (rgb & 0xff) / 255f
    };
  }

  /** The colour bar's outline in pixels: x0, y0, x1, y1 (top is the high end). */
  static int[] barBox(int width, int height) {
    int x1 = width - BAR_MARGIN;
    int x0 = x1 - BAR_WIDTH;
    int y0 = Math.max(40, height / 6);
    int y1 = height - Math.max(50, height / 6);
    return new int[] {x0, y0, x1, y1};
  }

  /** Lays out every annotation of the scene as seen by the camera. */
  void layout(Scene scene, OrbitCamera cam, String unit, int ink) {
    clear();
    int w = cam.width();
    int h = cam.height();
    Optional<FieldKind> field = scene.settings().field();
    boolean results = scene.study().results().isPresent() && field.isPresent();
    if (results) {
      colourBar(scene, field.get(), unit, w, h, ink);
      var r = scene.study().results().get();
      int frame = Math.max(0, Math.min(scene.settings().frame(), r.frameCount() - 1));
      text(14, 12, "t = " + Annotations.time(r.time(frame)), ink);
    }
    triad(cam, h, ink);
    lengthScale(cam, w, h, ink);
  }

  private void colourBar(Scene scene, FieldKind field, String unit, int w, int h, int ink) {
    int[] b = barBox(w, h);
    // a backing in the picture's background, so labels stay readable over the part
    rect(b[0] - 12, b[1] - 34, Math.min(w, b[2] + 90), b[3] + 28, SceneRenderer.BACKGROUND);
    ColourMap map = ColourMap.ramp();
    int steps = 64;
    for (int i = 0; i < steps; i++) {
      float ya = b[1] + (b[3] - b[1]) * i / (float) steps;
      float yb = b[1] + (b[3] - b[1]) * (i + 1) / (float) steps;
      int top = map.colourOf(1 - i / (double) steps, 0, 1);
      int bottom = map.colourOf(1 - (i + 1) / (double) steps, 0, 1);
      rect(b[0], ya, b[2], yb, top, bottom);
    }
    line(b[0] - 1, b[1] - 1, b[2] + 1, b[1] - 1, 1.5f, ink);
    line(b[0] - 1, b[3] + 1, b[2] + 1, b[3] + 1, 1.5f, ink);
    line(b[0] - 1, b[1] - 1, b[0] - 1, b[3] + 1, 1.5f, ink);
    line(b[2] + 1, b[1] - 1, b[2] + 1, b[3] + 1, 1.5f, ink);
    double lo = scene.low();
    double hi = scene.high();
    for (double value : RoundTicks.within(lo, hi, 4)) {
      double f = hi > lo ? (value - lo) / (hi - lo) : 0;
      float y = (float) (b[3] - f * (b[3] - b[1]));
      line(b[2] + 1, y, b[2] + 6, y, 1.5f, ink);
      String label = field.isTime() ? Annotations.time(value) : Annotations.number(value);
      text(b[2] + 9, y - 5, label, ink);
    }
    String title = field.words + " [" + (field.isTime() ? "s" : unit) + "]";
    float tw = textWidth(title);
    text(Math.max(4, Math.min(b[0], w - tw - 6)), b[1] - 28, title, ink);
    if (field.isTime()) {
      text(b[0] - 20, b[3] + 10, "grey: never", ink);
    }
  }

  private void triad(OrbitCamera cam, int h, int ink) {
    double cx = 60;
    double cy = h - 60;
    double len = 45;
    Vector3d right = cam.right();
    Vector3d up = cam.up();
    String[] names = {"x", "y", "z"};
    int[] colours = {0xc0392b, 0x1e8449, 0x2e59c7};
    for (int a = 0; a < 3; a++) {
      double sx = a == 0 ? right.x : a == 1 ? right.y : right.z;
      double sy = a == 0 ? up.x : a == 1 ? up.y : up.z;
      double ex = cx + len * sx;
      double ey = cy - len * sy;
      line(cx, cy, ex, ey, 2.5f, colours[a]);
      if (Math.hypot(sx, sy) > 0.2) {
        text((float) (ex + 6 * sx - 4), (float) (ey - 6 * sy - 6), names[a], ink);
      }
    }
  }

  private void lengthScale(OrbitCamera cam, int w, int h, int ink) {
    double per = cam.worldPerPixel();
    double len = Annotations.roundLength(per * w / 5);
    float px = (float) (len / per);
    float x0 = w / 2f - px / 2;
    float y = h - 28;
    line(x0, y, x0 + px, y, 3, ink);
    line(x0, y - 6, x0, y + 6, 2, ink);
    line(x0 + px, y - 6, x0 + px, y + 6, 2, ink);
    String label = Annotations.length(len);
    text(w / 2f - textWidth(label) / 2, y - 22, label, ink);
  }
}
