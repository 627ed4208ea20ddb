package dev.soakfield.render;

import static org.lwjgl.opengl.GL33C.*;

import dev.soakfield.app.Scene;

/** One {@link Scene.Mesh} in GL buffers: corners, normals, colours and ramp positions. */
final class GpuMesh implements AutoCloseable {
  private final int vao;
  private final int[] vbo = new int[4];
  private int corners;

  GpuMesh() {
    vao = glGenVertexArrays();
    glBindVertexArray(vao);
    int[] sizes = {3, 3, 3, 1};
    for (int a = 0; a < 4; a++) {
      vbo[a] = glGenBuffers();
      glBindBuffer(GL_ARRAY_BUFFER, vbo[a]);
      glVertexAttribPointer(a, sizes[a], GL_FLOAT, false, 0, 0L);
      glEnableVertexAttribArray(a);
    }
    glBindVertexArray(0);
  }

  void upload(Scene.Mesh m) {
    glBindBuffer(GL_ARRAY_BUFFER, vbo[0]);
    glBufferData(GL_ARRAY_BUFFER, m.positions, GL_STATIC_DRAW);
    glBindBuffer(GL_ARRAY_BUFFER, vbo[1]);
    glBufferData(GL_ARRAY_BUFFER, m.normals, GL_STATIC_DRAW);
    glBindBuffer(GL_ARRAY_BUFFER, vbo[2]);
    glBufferData(GL_ARRAY_BUFFER, m.colours, GL_STATIC_DRAW);
    glBindBuffer(GL_ARRAY_BUFFER, vbo[3]);
    glBufferData(GL_ARRAY_BUFFER, m.ramp, GL_STATIC_DRAW);
    corners = m.positions.length / 3;
  }

  void draw(int mode) {
    if (corners == 0) {
      return;
    }
    glBindVertexArray(vao);
    glDrawArrays(mode, 0, corners);
    glBindVertexArray(0);
  }

  int corners() {
    return corners;
  }

  @Override
  public void close() {
    glDeleteBuffers(vbo);
    glDeleteVertexArrays(vao);
  }
}
