package dev.soakfield.mesh;

import dev.soakfield.mesh.msh.MshReader;

/**
 * Test fixture that breaks the import rule on purpose (see MeshImportRulesTest's negative control).
 */
public final class ModelReachingIntoAReader {
  private ModelReachingIntoAReader() {}

  public static Class<?> reader() {
    return MshReader.class;
  }
}
