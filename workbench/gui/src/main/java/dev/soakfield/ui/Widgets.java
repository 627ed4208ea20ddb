package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.law.api.LawParameter;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.lwjgl.nuklear.NkColor;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.nuklear.NkRect;
import org.lwjgl.system.MemoryStack;
import org.lwjgl.system.MemoryUtil;

/**
 * The panels' editing widgets over Nuklear: text fields that hand over their text when the user
 * presses Enter or leaves the field, and buttons whose place on screen is remembered by name, so a
 * scripted session (and the help overlay) can find them as a user would.
 */
final class Widgets implements AutoCloseable {
  private static final int FIELD_BYTES = 512;

  /** A field's text buffer and the case value it was last filled from. */
  private static final class Field {
    final ByteBuffer text = MemoryUtil.memCalloc(FIELD_BYTES);
    String shown;
  }

  private final NkContext ctx;
  private final Map<String, Field> fields = new HashMap<>();
  private final Map<String, float[]> places = new HashMap<>();

  Widgets(NkContext ctx) {
    this.ctx = ctx;
  }

  NkContext ctx() {
    return ctx;
  }

  /** Notes where the next widget goes, under {@code name}. */
  void place(String name) {
    try (MemoryStack stack = MemoryStack.stackPush()) {
      NkRect r = NkRect.malloc(stack);
      nk_widget_bounds(ctx, r);
      places.put(name, new float[] {r.x(), r.y(), r.w(), r.h()});
    }
  }

  /** Where the widget named {@code name} was last drawn: x, y, width, height in window pixels. */
  Optional<float[]> where(String name) {
    return Optional.ofNullable(places.get(name)).map(float[]::clone);
  }

  /** A button, remembered under its label (or {@code name} when given). */
  boolean button(String label) {
    place(label);
    return nk_button_label(ctx, label);
  }

  boolean button(String name, String label) {
    place(name);
    return nk_button_label(ctx, label);
  }

  /** A button that does nothing and looks it, when {@code enabled} is false. */
  boolean button(String label, boolean enabled) {
    if (!enabled) {
      nk_widget_disable_begin(ctx);
    }
    boolean pressed = button(label) && enabled;
    if (!enabled) {
      nk_widget_disable_end(ctx);
    }
    return pressed;
  }

  /**
   * A one-line text field showing {@code current}; returns the edited text once the user commits it
   * (Enter, or leaving the field) and it differs, else empty.
   */
  Optional<String> field(String id, String current) {
    Field f = fields.computeIfAbsent(id, k -> new Field());
    place(id);
    if (!current.equals(f.shown) && !isActive(id)) {
      set(f.text, current);
      f.shown = current;
    }
    int flags =
        nk_edit_string_zero_terminated(
            ctx, NK_EDIT_FIELD | NK_EDIT_SIG_ENTER, f.text, FIELD_BYTES - 1, null);
    if ((flags & NK_EDIT_ACTIVE) != 0) {
      active = id;
    } else if (id.equals(active)) {
      active = null;
    }
    if ((flags & (NK_EDIT_COMMITED | NK_EDIT_DEACTIVATED)) != 0) {
      String typed = MemoryUtil.memUTF8(f.text, MemoryUtil.memLengthNT1(f.text));
      if (!typed.equals(current)) {
        f.shown = null; // show what the case holds after the edit
        return Optional.of(typed);
      }
    }
    return Optional.empty();
  }

  private String active;

  private boolean isActive(String id) {
    return id.equals(active);
  }

  private static void set(ByteBuffer b, String s) {
    byte[] bytes = s.getBytes(StandardCharsets.UTF_8);
    int n = Math.min(bytes.length, FIELD_BYTES - 1);
    b.clear();
    b.put(bytes, 0, n).put((byte) 0);
    b.clear();
  }

  /** A label in a colour (0xRRGGBB). */
  void label(String text, int rgb) {
    try (MemoryStack stack = MemoryStack.stackPush()) {
      NkColor c =
          NkColor.malloc(stack).set((byte) (rgb >> 16), (byte) (rgb >> 8), (byte) rgb, (byte) 255);
      nk_label_colored(ctx, text, NK_TEXT_LEFT, c);
    }
  }

  /** The check's messages about a field, in red below it (wrapped). */
  void problems(List<String> messages) {
    for (String m : messages) {
      nk_layout_row_dynamic(ctx, 34, 1);
      try (MemoryStack stack = MemoryStack.stackPush()) {
        NkColor red = NkColor.malloc(stack).set((byte) 0xff, (byte) 0x7a, (byte) 0x7a, (byte) 255);
        nk_label_colored_wrap(ctx, m, red);
      }
    }
  }

  /** A label, then a field on the same row; returns the committed text. */
  Optional<String> labelled(String label, String id, String current, float labelShare) {
    nk_layout_row_begin(ctx, NK_DYNAMIC, 22, 2);
    nk_layout_row_push(ctx, labelShare);
    nk_label(ctx, label, NK_TEXT_LEFT);
    nk_layout_row_push(ctx, 1 - labelShare);
    Optional<String> out = field(id, current);
    nk_layout_row_end(ctx);
    return out;
  }

  /** Whether any text field has the keyboard (shortcut letters then go to the field). */
  /**
   * A law parameter's heading (name, unit, required or its default, range) and its value field;
   * returns the text typed into it.
   */
  Optional<String> lawParameter(LawParameter p, String id, String current) {
    nk_layout_row_dynamic(ctx, 18, 1);
    nk_label(
        ctx,
        String.format(
            Locale.ROOT,
            "%s [%s] %s, %s…%s",
            p.name(),
            p.unit(),
            p.isRequired() ? "required" : "default " + p.defaultValue(),
            p.minimum(),
            p.maximum()),
        NK_TEXT_LEFT);
    return labelled("  value", id, current, 0.35f);
  }

  boolean typing() {
    return active != null;
  }

  @Override
  public void close() {
    for (Field f : fields.values()) {
      MemoryUtil.memFree(f.text);
    }
    fields.clear();
  }
}
