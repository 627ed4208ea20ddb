package dev.soakfield.render;

import static org.lwjgl.opengl.GL33C.*;

import dev.soakfield.app.ColourMap;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.Scene;
import dev.soakfield.app.ViewSettings;
import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.List;
import org.joml.Vector3d;
import org.lwjgl.system.MemoryUtil;

/**
 * Draws a {@link Scene} with OpenGL 3.3 core: the shaded surface (clipped at the section plane),
 * the section, mesh edges on request, semi-transparent isosurfaces and the annotations. Sets all
 * the GL state it relies on at the start of every frame, since the panels' pass changes blending
 * and scissoring.
 */
public final class SceneRenderer implements AutoCloseable {
  /** Background and ink of the picture. */
  public static final int BACKGROUND = 0xf4f4f2;

  public static final int INK = 0x1e1e1e;

  private static final String SURFACE_VS =
      """
      #version 330 core
      layout(location = 0) in vec3 aPos;
      layout(location = 1) in vec3 aNormal;
      layout(location = 2) in vec3 aColour;
      layout(location = 3) in float aRamp;
      uniform mat4 uViewProj;
      uniform vec4 uClip;
      uniform int uClipOn;
      out vec3 vNormal;
      out vec3 vColour;
      out float vRamp;
      void main() {
        gl_Position = uViewProj * vec4(aPos, 1.0);
        vNormal = aNormal;
        vColour = aColour;
        vRamp = aRamp;
        gl_ClipDistance[0] = uClipOn == 1 ? uClip.w - dot(uClip.xyz, aPos) : 1.0;
      }
      """;
  private static final String SURFACE_FS =
      """
      #version 330 core
      in vec3 vNormal;
      in vec3 vColour;
      in float vRamp;
      uniform sampler2D uMap;
      uniform vec3 uLight;
      uniform float uAlpha;
      uniform int uFlat;
      out vec4 frag;
      void main() {
        vec3 base = vRamp < -0.5 ? vColour : texture(uMap, vec2(vRamp, 0.5)).rgb;
        float d = abs(dot(normalize(vNormal), uLight));
        float k = uFlat == 1 ? 1.0 : 0.55 + 0.45 * d;
        frag = vec4(base * k, uAlpha);
      }
      """;
  private static final String OVERLAY_VS =
      """
      #version 330 core
      layout(location = 0) in vec2 aPos;
      layout(location = 1) in vec4 aColour;
      uniform vec2 uSize;
      out vec4 vColour;
      void main() {
        gl_Position = vec4(aPos.x / uSize.x * 2.0 - 1.0, 1.0 - aPos.y / uSize.y * 2.0, 0.0, 1.0);
        vColour = aColour;
      }
      """;
  private static final String OVERLAY_FS =
      """
      #version 330 core
      in vec4 vColour;
      out vec4 frag;
      void main() { frag = vColour; }
      """;

  private final ShaderProgram surfaceProgram;
  private final ShaderProgram overlayProgram;
  private final GpuMesh surface = new GpuMesh();
  private final GpuMesh movingSurface = new GpuMesh();
  private int uploadedMoving = -1;
  private int uploadedEdges = -1;
  private final GpuMesh section = new GpuMesh();
  private final GpuMesh edges = new GpuMesh();
  private final List<GpuMesh> isos = new ArrayList<>();
  private final int mapTexture;
  private final int overlayVao;
  private final int overlayVbo;
  private final Overlay overlay = new Overlay();
  private int uploaded = -1;
  private String unit = "amount/m^3";

  /** Creates the programs and buffers in the current context. */
  public SceneRenderer() {
    surfaceProgram = new ShaderProgram("surface", SURFACE_VS, SURFACE_FS);
    overlayProgram = new ShaderProgram("overlay", OVERLAY_VS, OVERLAY_FS);
    mapTexture = glGenTextures();
    glBindTexture(GL_TEXTURE_2D, mapTexture);
    ByteBuffer px = MemoryUtil.memAlloc(3 * ColourMap.SIZE);
    ColourMap map = ColourMap.ramp();
    for (int i = 0; i < ColourMap.SIZE; i++) {
      for (int k = 0; k < 3; k++) {
        px.put((byte) map.channel(i, k));
      }
    }
    px.flip();
    glPixelStorei(GL_UNPACK_ALIGNMENT, 1);
    glTexImage2D(GL_TEXTURE_2D, 0, GL_RGB8, ColourMap.SIZE, 1, 0, GL_RGB, GL_UNSIGNED_BYTE, px);
    MemoryUtil.memFree(px);
    glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MIN_FILTER, GL_LINEAR);
    glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_MAG_FILTER, GL_LINEAR);
    glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_WRAP_S, GL_CLAMP_TO_EDGE);
    glTexParameteri(GL_TEXTURE_2D, GL_TEXTURE_WRAP_T, GL_CLAMP_TO_EDGE);
    overlayVao = glGenVertexArrays();
    overlayVbo = glGenBuffers();
    glBindVertexArray(overlayVao);
    glBindBuffer(GL_ARRAY_BUFFER, overlayVbo);
    glVertexAttribPointer(0, 2, GL_FLOAT, false, 24, 0L);
    glEnableVertexAttribArray(0);
    glVertexAttribPointer(1, 4, GL_FLOAT, false, 24, 8L);
    glEnableVertexAttribArray(1);
    glBindVertexArray(0);
  }

  /** The unit of c and phi written on the colour bar. */
  public void unit(String u) {
    unit = u;
  }

  /** Brings the GL buffers up to date with the scene. */
  private void upload(Scene scene) {
    if (scene.version() == uploaded) {
      return;
    }
    surface.upload(scene.surfaceMesh());
    section.upload(scene.sectionMesh());
    for (GpuMesh m : isos) {
      m.close();
    }
    isos.clear();
    for (Scene.Mesh m : scene.isoMeshes()) {
      GpuMesh g = new GpuMesh();
      g.upload(m);
      isos.add(g);
    }
    uploaded = scene.version();
  }

  private static Scene.Mesh edgeLines(Scene.Mesh s) {
    int tris = s.triangleCount();
    float[] p = new float[tris * 18];
    for (int t = 0; t < tris; t++) {
      int[] pairs = {0, 1, 1, 2, 2, 0};
      for (int e = 0; e < 6; e++) {
        System.arraycopy(s.positions, 9 * t + 3 * pairs[e], p, 18 * t + 3 * e, 3);
      }
    }
    float[] zero = new float[p.length];
    float[] ramp = new float[p.length / 3];
    java.util.Arrays.fill(ramp, -1f);
    return new Scene.Mesh(p, zero, zero, ramp);
  }

  /** Draws one frame into the bound framebuffer of the camera's size. */
  public void draw(Scene scene, OrbitCamera cam) {
    draw(scene, cam, 0, 0);
  }

  /**
   * Draws one frame into the camera's rectangle of the bound framebuffer, whose lower left corner
   * is at (x0, y0) in GL window coordinates (y up).
   */
  public void draw(Scene scene, OrbitCamera cam, int x0, int y0) {
    draw(scene, cam, x0, y0, false);
  }

  /**
   * Draws one frame; while the view moves ({@code moving}), big surfaces are drawn reduced and the
   * mesh edges left out, so turning stays fluid.
   */
  public void draw(Scene scene, OrbitCamera cam, int x0, int y0, boolean moving) {
    upload(scene);
    boolean reduced = moving && scene.surfaceMesh().triangleCount() > Scene.REDUCE_ABOVE;
    if (reduced && uploadedMoving != scene.version()) {
      movingSurface.upload(scene.movingSurfaceMesh());
      uploadedMoving = scene.version();
    }
    int w = cam.width();
    int h = cam.height();
    glViewport(x0, y0, w, h);
    glEnable(GL_SCISSOR_TEST);
    glScissor(x0, y0, w, h);
    glDisable(GL_CULL_FACE);
    glDisable(GL_BLEND);
    glEnable(GL_DEPTH_TEST);
    glDepthFunc(GL_LEQUAL);
    glDepthMask(true);
    glClearColor(
        ((BACKGROUND >> 16) & 0xff) / 255f,
        ((BACKGROUND >> 8) & 0xff) / 255f,
        (BACKGROUND & 0xff) / 255f,
        1f);
    glClear(GL_COLOR_BUFFER_BIT | GL_DEPTH_BUFFER_BIT);
    glDisable(GL_SCISSOR_TEST);

    surfaceProgram.use();
    glActiveTexture(GL_TEXTURE0);
    glBindTexture(GL_TEXTURE_2D, mapTexture);
    glUniform1i(surfaceProgram.uniform("uMap"), 0);
    glUniformMatrix4fv(surfaceProgram.uniform("uViewProj"), false, cam.viewProjection());
    Vector3d light = cam.towardsEye();
    glUniform3f(
        surfaceProgram.uniform("uLight"), (float) light.x, (float) light.y, (float) light.z);
    glUniform1f(surfaceProgram.uniform("uAlpha"), 1f);
    glUniform1i(surfaceProgram.uniform("uFlat"), 0);
    ViewSettings settings = scene.settings();
    if (settings.section().isPresent()) {
      ViewSettings.Plane p = settings.section().get();
      glEnable(GL_CLIP_DISTANCE0);
      glUniform1i(surfaceProgram.uniform("uClipOn"), 1);
      glUniform4f(
          surfaceProgram.uniform("uClip"),
          (float) p.nx(),
          (float) p.ny(),
          (float) p.nz(),
          (float) p.offset());
    } else {
      glUniform1i(surfaceProgram.uniform("uClipOn"), 0);
    }
    glEnable(GL_POLYGON_OFFSET_FILL);
    glPolygonOffset(1f, 1f);
    (reduced ? movingSurface : surface).draw(GL_TRIANGLES);
    glUniform1i(surfaceProgram.uniform("uClipOn"), 0);
    section.draw(GL_TRIANGLES);
    glDisable(GL_POLYGON_OFFSET_FILL);
    if (settings.edges() && !reduced) {
      if (uploadedEdges != scene.version()) {
        // made only when asked for: twice the surface's corners, not needed for most frames
        edges.upload(edgeLines(scene.surfaceMesh()));
        uploadedEdges = scene.version();
      }
      if (settings.section().isPresent()) {
        glUniform1i(surfaceProgram.uniform("uClipOn"), 1);
      }
      glUniform1i(surfaceProgram.uniform("uFlat"), 1);
      edges.draw(GL_LINES);
      glUniform1i(surfaceProgram.uniform("uFlat"), 0);
      glUniform1i(surfaceProgram.uniform("uClipOn"), 0);
    }
    glDisable(GL_CLIP_DISTANCE0);
    if (!isos.isEmpty()) {
      glEnable(GL_BLEND);
      glBlendFuncSeparate(GL_SRC_ALPHA, GL_ONE_MINUS_SRC_ALPHA, GL_ONE, GL_ONE_MINUS_SRC_ALPHA);
      glDepthMask(false);
      glUniform1f(surfaceProgram.uniform("uAlpha"), settings.isoOpacity());
      if (settings.section().isPresent()) {
        // the isosurfaces keep to the side of the section that is shown
        glEnable(GL_CLIP_DISTANCE0);
        glUniform1i(surfaceProgram.uniform("uClipOn"), 1);
      }
      for (GpuMesh m : isos) {
        m.draw(GL_TRIANGLES);
      }
      glUniform1i(surfaceProgram.uniform("uClipOn"), 0);
      glDisable(GL_CLIP_DISTANCE0);
      glDepthMask(true);
      glDisable(GL_BLEND);
    }
    drawOverlay(scene, cam);
  }

  private void drawOverlay(Scene scene, OrbitCamera cam) {
    overlay.layout(scene, cam, unit, INK);
    glDisable(GL_DEPTH_TEST);
    overlayProgram.use();
    glUniform2f(overlayProgram.uniform("uSize"), cam.width(), cam.height());
    glBindVertexArray(overlayVao);
    glBindBuffer(GL_ARRAY_BUFFER, overlayVbo);
    float[] data = java.util.Arrays.copyOf(overlay.data(), overlay.floats());
    glBufferData(GL_ARRAY_BUFFER, data, GL_STREAM_DRAW);
    glDrawArrays(GL_TRIANGLES, 0, overlay.floats() / 6);
    glBindVertexArray(0);
    glEnable(GL_DEPTH_TEST);
  }

  @Override
  public void close() {
    surface.close();
    movingSurface.close();
    section.close();
    edges.close();
    for (GpuMesh m : isos) {
      m.close();
    }
    glDeleteTextures(mapTexture);
    glDeleteBuffers(overlayVbo);
    glDeleteVertexArrays(overlayVao);
    surfaceProgram.close();
    overlayProgram.close();
  }
}
