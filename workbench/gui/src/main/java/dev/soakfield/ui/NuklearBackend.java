package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;
import static org.lwjgl.opengl.GL33C.*;
import static org.lwjgl.stb.STBTruetype.*;
import static org.lwjgl.system.MemoryStack.stackPush;
import static org.lwjgl.system.MemoryUtil.*;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.FloatBuffer;
import java.nio.IntBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.lwjgl.nuklear.NkAllocator;
import org.lwjgl.nuklear.NkBuffer;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.nuklear.NkConvertConfig;
import org.lwjgl.nuklear.NkDrawCommand;
import org.lwjgl.nuklear.NkDrawNullTexture;
import org.lwjgl.nuklear.NkDrawVertexLayoutElement;
import org.lwjgl.nuklear.NkUserFont;
import org.lwjgl.nuklear.NkUserFontGlyph;
import org.lwjgl.stb.STBTTAlignedQuad;
import org.lwjgl.stb.STBTTFontinfo;
import org.lwjgl.stb.STBTTPackContext;
import org.lwjgl.stb.STBTTPackedchar;
import org.lwjgl.system.MemoryStack;

/**
 * The GL side of the panels: a Nuklear context with a TrueType font baked by stb_truetype into an
 * R8 texture (core profile has no alpha textures: a swizzle turns red into alpha), and the pass
 * that turns Nuklear's draw list into GL draws. The pass sets blending and scissoring and leaves
 * both off; the scene renderer sets its own state each frame.
 */
final class NuklearBackend implements AutoCloseable {
  private static final int VERTEX_BYTES = 20;
  private static final int MAX_VERTEX_BUFFER = 1024 * 1024;
  private static final int MAX_ELEMENT_BUFFER = 256 * 1024;
  private static final int ATLAS = 1024;
  static final float FONT_HEIGHT = 16;

  /** Where Debian (fonts-dejavu-core) and other systems keep a plain sans font. */
  private static final List<String> FONT_PATHS =
      List.of(
          "/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf",
          "/usr/share/fonts/TTF/DejaVuSans.ttf",
          "/usr/share/fonts/dejavu/DejaVuSans.ttf",
          "/usr/share/fonts/truetype/liberation/LiberationSans-Regular.ttf");

  private final NkAllocator allocator =
      NkAllocator.create()
          .alloc((handle, old, size) -> nmemAllocChecked(size))
          .mfree((handle, ptr) -> nmemFree(ptr));
  private final NkDrawVertexLayoutElement.Buffer layout =
      NkDrawVertexLayoutElement.create(4)
          .position(0)
          .attribute(NK_VERTEX_POSITION)
          .format(NK_FORMAT_FLOAT)
          .offset(0)
          .position(1)
          .attribute(NK_VERTEX_TEXCOORD)
          .format(NK_FORMAT_FLOAT)
          .offset(8)
          .position(2)
          .attribute(NK_VERTEX_COLOR)
          .format(NK_FORMAT_R8G8B8A8)
          .offset(16)
          .position(3)
          .attribute(NK_VERTEX_ATTRIBUTE_COUNT)
          .format(NK_FORMAT_COUNT)
          .offset(0)
          .flip();

  final NkContext ctx = NkContext.create();
  private final NkUserFont font = NkUserFont.create();
  private final NkBuffer commands = NkBuffer.create();
  private final NkDrawNullTexture nullTexture = NkDrawNullTexture.create();
  private final ByteBuffer ttf;
  private final STBTTFontinfo fontInfo = STBTTFontinfo.create();

  /**
   * The code points baked into the atlas, as (first, count) ranges: Latin-1 (units such as m², °C,
   * µm, ×, ·), dashes, quotes and the ellipsis, arrows, and ≤ ≥; others draw as '?'.
   */
  private static final int[][] RANGES = {{32, 224}, {0x2010, 24}, {0x2190, 4}, {0x2264, 2}};

  private final STBTTPackedchar.Buffer[] glyphs = new STBTTPackedchar.Buffer[RANGES.length];
  private final int program;
  private final int vao;
  private final int vbo;
  private final int ebo;
  private final int fontTexture;
  private final int whiteTexture;

  NuklearBackend() {
    ttf = loadFont();
    nk_init(ctx, allocator, null);
    nk_buffer_init(commands, allocator, 4 * 1024);
    program = makeProgram();
    vao = glGenVertexArrays();
    vbo = glGenBuffers();
    ebo = glGenBuffers();
    glBindVertexArray(vao);
    glBindBuffer(GL_ARRAY_BUFFER, vbo);
    glBindBuffer(GL_ELEMENT_ARRAY_BUFFER, ebo);
    glEnableVertexAttribArray(0);
    glEnableVertexAttribArray(1);
    glEnableVertexAttribArray(2);
    glVertexAttribPointer(0, 2, GL_FLOAT, false, VERTEX_BYTES, 0L);
    glVertexAttribPointer(1, 2, GL_FLOAT, false, VERTEX_BYTES, 8L);
    glVertexAttribPointer(2, 4, GL_UNSIGNED_BYTE, true, VERTEX_BYTES, 16L);
    glBindVertexArray(0);
    whiteTexture = glGenTextures();
    glBindTexture(GL_TEXTURE_2D, whiteTexture);
    try (MemoryStack stack = stackPush()) {
      glTexImage2D(GL_TEXTURE_2D, 0, GL_RGBA8, 1, 1, 0, GL_RGBA, GL_UNSIGNED_BYTE, stack.ints(-1));
    }
    glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MAG_FILTER, GL_NEAREST);
    glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MIN_FILTER, GL_NEAREST);
    nullTexture.texture().id(whiteTexture);
    nullTexture.uv().set(0.5f, 0.5f);
    fontTexture = bakeFont();
    nk_style_set_font(ctx, font);
    toggleLook(ctx);
  }

  /** A lit mark on a dark box: Nuklear's stock toggles draw "on" darker than "off". */
  static final int TOGGLE_ON = 0xe8c45a;

  /** The box of a check box or option that is off. */
  static final int TOGGLE_OFF = 0x5c5c5c;

  private static void toggleLook(NkContext ctx) {
    for (org.lwjgl.nuklear.NkStyleToggle t :
        new org.lwjgl.nuklear.NkStyleToggle[] {ctx.style().checkbox(), ctx.style().option()}) {
      setColour(t.normal(), TOGGLE_OFF);
      setColour(t.hover(), 0x6e6e6e);
      setColour(t.active(), 0x6e6e6e);
      setColour(t.cursor_normal(), TOGGLE_ON);
      setColour(t.cursor_hover(), 0xf2d27a);
    }
  }

  private static void setColour(org.lwjgl.nuklear.NkStyleItem item, int rgb) {
    item.type(NK_STYLE_ITEM_COLOR);
    item.data().color().set((byte) (rgb >> 16), (byte) (rgb >> 8), (byte) rgb, (byte) 255);
  }

  private static ByteBuffer loadFont() {
    for (String p : FONT_PATHS) {
      Path path = Path.of(p);
      if (Files.isRegularFile(path)) {
        try {
          byte[] bytes = Files.readAllBytes(path);
          ByteBuffer b = memAlloc(bytes.length);
          b.put(bytes).flip();
          return b;
        } catch (IOException e) {
          // try the next place
        }
      }
    }
    throw new IllegalStateException(
        "no TrueType font found for the panels (looked in "
            + FONT_PATHS
            + "); install fonts-dejavu-core");
  }

  private int bakeFont() {
    int tex = glGenTextures();
    float scale;
    float descent;
    try (MemoryStack stack = stackPush()) {
      if (!stbtt_InitFont(fontInfo, ttf)) {
        throw new IllegalStateException("the panel font could not be read");
      }
      scale = stbtt_ScaleForPixelHeight(fontInfo, FONT_HEIGHT);
      IntBuffer d = stack.mallocInt(1);
      stbtt_GetFontVMetrics(fontInfo, null, d, null);
      descent = d.get(0) * scale;
      ByteBuffer bitmap = memAlloc(ATLAS * ATLAS);
      STBTTPackContext pc = STBTTPackContext.malloc(stack);
      stbtt_PackBegin(pc, bitmap, ATLAS, ATLAS, 0, 1, NULL);
      stbtt_PackSetOversampling(pc, 2, 2);
      for (int r = 0; r < RANGES.length; r++) {
        glyphs[r] = STBTTPackedchar.create(RANGES[r][1]);
        stbtt_PackFontRange(pc, ttf, 0, FONT_HEIGHT, RANGES[r][0], glyphs[r]);
      }
      stbtt_PackEnd(pc);
      glBindTexture(GL_TEXTURE_2D, tex);
      glPixelStorei(GL_UNPACK_ALIGNMENT, 1);
      glTexImage2D(GL_TEXTURE_2D, 0, GL_R8, ATLAS, ATLAS, 0, GL_RED, GL_UNSIGNED_BYTE, bitmap);
      glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MAG_FILTER, GL_LINEAR);
      glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MIN_FILTER, GL_LINEAR);
      glTexParameteriv(
          GL_TEXTURE_2D, GL_TEXTURE_SWIZZLE_RGBA, stack.ints(GL_ONE, GL_ONE, GL_ONE, GL_RED));
      memFree(bitmap);
    }
    float s = scale;
    float desc = descent;
    font.width(
            (handle, h, text, len) -> {
              float width = 0;
              try (MemoryStack stack = stackPush()) {
                IntBuffer unicode = stack.mallocInt(1);
                IntBuffer advance = stack.mallocInt(1);
                int used = 0;
                while (used < len) {
                  int step = nnk_utf_decode(text + used, memAddress(unicode), len - used);
                  if (step == 0 || unicode.get(0) == NK_UTF_INVALID) {
                    break;
                  }
                  int cp = baked(unicode.get(0)) ? unicode.get(0) : '?';
                  stbtt_GetCodepointHMetrics(fontInfo, cp, advance, null);
                  width += advance.get(0) * s;
                  used += step;
                }
              }
              return width;
            })
        .height(FONT_HEIGHT)
        .query(
            (handle, fontHeight, glyph, codepoint, next) -> {
              try (MemoryStack stack = stackPush()) {
                FloatBuffer x = stack.floats(0f);
                FloatBuffer y = stack.floats(0f);
                STBTTAlignedQuad q = STBTTAlignedQuad.malloc(stack);
                IntBuffer advance = stack.mallocInt(1);
                int cp = baked(codepoint) ? codepoint : '?';
                int r = rangeOf(cp);
                stbtt_GetPackedQuad(glyphs[r], ATLAS, ATLAS, cp - RANGES[r][0], x, y, q, false);
                stbtt_GetCodepointHMetrics(fontInfo, cp, advance, null);
                NkUserFontGlyph g = NkUserFontGlyph.create(glyph);
                g.width(q.x1() - q.x0());
                g.height(q.y1() - q.y0());
                g.offset().set(q.x0(), q.y0() + (FONT_HEIGHT + desc));
                g.xadvance(advance.get(0) * s);
                g.uv(0).set(q.s0(), q.t0());
                g.uv(1).set(q.s1(), q.t1());
              }
            })
        .texture(t -> t.id(tex));
    return tex;
  }

  private static int rangeOf(int cp) {
    for (int r = 0; r < RANGES.length; r++) {
      if (cp >= RANGES[r][0] && cp < RANGES[r][0] + RANGES[r][1]) {
        return r;
      }
    }
    return -1;
  }

  private static boolean baked(int cp) {
    return cp != 127 && rangeOf(cp) >= 0;
  }

  private static int makeProgram() {
    String vs =
        """
        #version 330 core
        uniform mat4 uProj;
        layout(location = 0) in vec2 aPos;
        layout(location = 1) in vec2 aUv;
        layout(location = 2) in vec4 aColour;
        out vec2 vUv;
        out vec4 vColour;
        void main() {
          vUv = aUv;
          vColour = aColour;
          gl_Position = uProj * vec4(aPos, 0.0, 1.0);
        }
        """;
    String fs =
        """
        #version 330 core
        uniform sampler2D uTex;
        in vec2 vUv;
        in vec4 vColour;
        out vec4 frag;
        void main() { frag = vColour * texture(uTex, vUv); }
        """;
    int p = glCreateProgram();
    int[] shaders = {compile(GL_VERTEX_SHADER, vs), compile(GL_FRAGMENT_SHADER, fs)};
    for (int s : shaders) {
      glAttachShader(p, s);
    }
    glLinkProgram(p);
    for (int s : shaders) {
      glDeleteShader(s);
    }
    if (glGetProgrami(p, GL_LINK_STATUS) == GL_FALSE) {
      throw new IllegalStateException("panel program did not link: " + glGetProgramInfoLog(p));
    }
    return p;
  }

  private static int compile(int type, String src) {
    int s = glCreateShader(type);
    glShaderSource(s, src);
    glCompileShader(s);
    if (glGetShaderi(s, GL_COMPILE_STATUS) == GL_FALSE) {
      throw new IllegalStateException("panel shader did not compile: " + glGetShaderInfoLog(s));
    }
    return s;
  }

  /** Draws the panels laid out this frame over a picture of width × height, then clears them. */
  void render(int width, int height) {
    glEnable(GL_BLEND);
    glBlendEquation(GL_FUNC_ADD);
    glBlendFuncSeparate(GL_SRC_ALPHA, GL_ONE_MINUS_SRC_ALPHA, GL_ONE, GL_ONE_MINUS_SRC_ALPHA);
    glDisable(GL_CULL_FACE);
    glDisable(GL_DEPTH_TEST);
    glEnable(GL_SCISSOR_TEST);
    glActiveTexture(GL_TEXTURE0);
    glUseProgram(program);
    glViewport(0, 0, width, height);
    try (MemoryStack stack = stackPush()) {
      glUniform1i(glGetUniformLocation(program, "uTex"), 0);
      glUniformMatrix4fv(
          glGetUniformLocation(program, "uProj"),
          false,
          stack.floats(2f / width, 0, 0, 0, 0, -2f / height, 0, 0, 0, 0, -1f, 0, -1f, 1f, 0, 1f));
    }
    glBindVertexArray(vao);
    glBindBuffer(GL_ARRAY_BUFFER, vbo);
    glBindBuffer(GL_ELEMENT_ARRAY_BUFFER, ebo);
    glBufferData(GL_ARRAY_BUFFER, MAX_VERTEX_BUFFER, GL_STREAM_DRAW);
    glBufferData(GL_ELEMENT_ARRAY_BUFFER, MAX_ELEMENT_BUFFER, GL_STREAM_DRAW);
    ByteBuffer vertices =
        Objects.requireNonNull(
            glMapBuffer(GL_ARRAY_BUFFER, GL_WRITE_ONLY, MAX_VERTEX_BUFFER, null));
    ByteBuffer elements =
        Objects.requireNonNull(
            glMapBuffer(GL_ELEMENT_ARRAY_BUFFER, GL_WRITE_ONLY, MAX_ELEMENT_BUFFER, null));
    try (MemoryStack stack = stackPush()) {
      NkConvertConfig config =
          NkConvertConfig.calloc(stack)
              .vertex_layout(layout)
              .vertex_size(VERTEX_BYTES)
              .vertex_alignment(4)
              .tex_null(nullTexture)
              .circle_segment_count(22)
              .curve_segment_count(22)
              .arc_segment_count(22)
              .global_alpha(1f)
              .shape_AA(NK_ANTI_ALIASING_ON)
              .line_AA(NK_ANTI_ALIASING_ON);
      NkBuffer vbuf = NkBuffer.malloc(stack);
      NkBuffer ebuf = NkBuffer.malloc(stack);
      nk_buffer_init_fixed(vbuf, vertices);
      nk_buffer_init_fixed(ebuf, elements);
      nk_convert(ctx, commands, vbuf, ebuf, config);
    }
    glUnmapBuffer(GL_ELEMENT_ARRAY_BUFFER);
    glUnmapBuffer(GL_ARRAY_BUFFER);
    long offset = 0;
    for (NkDrawCommand cmd = nk__draw_begin(ctx, commands);
        cmd != null;
        cmd = nk__draw_next(cmd, commands, ctx)) {
      if (cmd.elem_count() == 0) {
        continue;
      }
      glBindTexture(GL_TEXTURE_2D, cmd.texture().id());
      glScissor(
          (int) cmd.clip_rect().x(),
          (int) (height - (cmd.clip_rect().y() + cmd.clip_rect().h())),
          (int) cmd.clip_rect().w(),
          (int) cmd.clip_rect().h());
      glDrawElements(GL_TRIANGLES, cmd.elem_count(), GL_UNSIGNED_SHORT, offset);
      offset += cmd.elem_count() * 2L;
    }
    nk_clear(ctx);
    nk_buffer_clear(commands);
    glBindVertexArray(0);
    glUseProgram(0);
    glDisable(GL_BLEND);
    glDisable(GL_SCISSOR_TEST);
  }

  @Override
  public void close() {
    nk_free(ctx);
    nk_buffer_free(commands);
    glDeleteProgram(program);
    glDeleteTextures(fontTexture);
    glDeleteTextures(whiteTexture);
    glDeleteBuffers(vbo);
    glDeleteBuffers(ebo);
    glDeleteVertexArrays(vao);
    Objects.requireNonNull(font.query()).free();
    Objects.requireNonNull(font.width()).free();
    Objects.requireNonNull(allocator.alloc()).free();
    Objects.requireNonNull(allocator.mfree()).free();
    memFree(ttf);
  }
}
