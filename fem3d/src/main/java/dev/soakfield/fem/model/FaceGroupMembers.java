package dev.soakfield.fem.model;

import dev.soakfield.mesh.TetMesh;

/** The faces of one face group, in mesh order. */
public final class FaceGroupMembers {
  private FaceGroupMembers() {}

  public static int[] of(TetMesh mesh, int group) {
    int count = 0;
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == group) {
        count++;
      }
    }
    int[] out = new int[count];
    int p = 0;
    for (int f = 0; f < mesh.faceCount(); f++) {
      if (mesh.faceGroup(f) == group) {
        out[p++] = f;
      }
    }
    return out;
  }
}
