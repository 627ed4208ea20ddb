package dev.soakfield.mesh;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import dev.soakfield.mesh.gen.StructuredMesher;
import org.junit.jupiter.api.Test;

/** The shared view hands out the mesh's own arrays (no copy), holding what the copies hold. */
class SharedArraysTest {
  @Test
  void sharedArraysAreTheMeshsOwnAndHoldWhatItsCopiesHold() {
    TetMesh mesh = StructuredMesher.box(1, 2, 3, 2, 1, 1, 2);
    TetMesh.Shared a = mesh.shared();
    TetMesh.Shared b = mesh.shared();
    assertSame(a.tets(), b.tets());
    assertSame(a.xyz(), b.xyz());
    assertNotSame(mesh.copyTets(), a.tets());
    assertArrayEquals(mesh.copyCoordinates(), a.xyz());
    assertArrayEquals(mesh.copyTets(), a.tets());
    assertArrayEquals(mesh.copyTetGroups(), a.tetGroups());
    assertArrayEquals(mesh.copyFaces(), a.faces());
    assertArrayEquals(mesh.copyFaceGroups(), a.faceGroups());
  }
}
