package dev.soakfield.render;

import static org.lwjgl.opengl.GL33C.*;

/** A linked vertex + fragment program; a shader that fails reports its info log. */
final class ShaderProgram implements AutoCloseable {
  final int id;

  ShaderProgram(String name, String vertex, String fragment) {
    int vs = compile(name + " vertex shader", GL_VERTEX_SHADER, vertex);
    int fs = compile(name + " fragment shader", GL_FRAGMENT_SHADER, fragment);
    id = glCreateProgram();
    glAttachShader(id, vs);
    glAttachShader(id, fs);
    glLinkProgram(id);
    glDeleteShader(vs);
    glDeleteShader(fs);
    if (glGetProgrami(id, GL_LINK_STATUS) == GL_FALSE) {
      throw new IllegalStateException(name + " program did not link: " + glGetProgramInfoLog(id));
    }
  }

  private static int compile(String what, int type, String source) {
    int s = glCreateShader(type);
    glShaderSource(s, source);
    glCompileShader(s);
    if (glGetShaderi(s, GL_COMPILE_STATUS) == GL_FALSE) {
      throw new IllegalStateException(what + " did not compile: " + glGetShaderInfoLog(s));
    }
    return s;
  }

  int uniform(String name) {
    return glGetUniformLocation(id, name);
  }

  void use() {
    glUseProgram(id);
  }

  @Override
  public void close() {
    glDeleteProgram(id);
  }
}
