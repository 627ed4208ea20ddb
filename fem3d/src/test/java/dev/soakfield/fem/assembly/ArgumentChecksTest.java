package dev.soakfield.fem.assembly;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import org.junit.jupiter.api.Test;

class ArgumentChecksTest {
  private final TetMesh mesh = StructuredMesher.box(1, 1, 1, 2, 2, 2, 1);
  private final SystemAssembler assembler = new SystemAssembler(FeSpace.of(mesh));

  @Test
  void spaceReportsTheMeshOrderAndDofs() {
    FeSpace space = assembler.space();
    assertEquals(1, space.order());
    assertEquals(27, space.dofCount()); // exact geometry: 3 x 3 x 3 grid points
    FeSpace quadratic = FeSpace.of(StructuredMesher.box(1, 1, 1, 2, 2, 2, 2));
    assertEquals(2, quadratic.order());
    assertEquals(125, quadratic.dofCount()); // exact geometry: 5 x 5 x 5 points
  }

  @Test
  void wrongLengthsAreRefusedWithTheNameAndTheSizes() {
    CsrMatrix k = assembler.newMatrix();
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class, () -> assembler.addStiffness(k, new double[5], 1.0));
    assertTrue(e.getMessage().contains("tensorPerTet"), e.getMessage());
    assertTrue(e.getMessage().contains(String.valueOf(6 * mesh.tetCount())), e.getMessage());
    assertThrows(
        IllegalArgumentException.class,
        () -> assembler.addVolumeLoad(new double[3], new double[mesh.tetCount()], 1.0));
  }

  @Test
  void faceIndicesOutOfRangeAreRefused() {
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () -> assembler.faceDofs(new int[] {0, mesh.faceCount()}));
    assertTrue(e.getMessage().contains("faces[1]"), e.getMessage());
  }

  @Test
  void aMatrixOfAnotherPatternIsRefused() {
    CsrMatrix other = new CsrMatrix(2, new int[] {0, 1, 2}, new int[] {0, 1});
    assertThrows(
        IllegalArgumentException.class,
        () -> assembler.addCapacity(other, new double[mesh.tetCount()], true, 1.0));
  }

  @Test
  void invertedTetrahedraAreRefused() {
    int[] tets = mesh.copyTets();
    int swap = tets[0];
    tets[0] = tets[1];
    tets[1] = swap;
    TetMesh inverted =
        new TetMesh.Builder()
            .nodes(mesh.copyCoordinates())
            .tets(tets, mesh.copyTetGroups())
            .faces(mesh.copyFaces(), mesh.copyFaceGroups())
            .volumeGroups(mesh.volumeGroups())
            .faceGroups(mesh.faceGroups())
            .build();
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class, () -> new SystemAssembler(FeSpace.of(inverted)));
    assertTrue(e.getMessage().contains("tetrahedron 0"), e.getMessage());
  }
}
