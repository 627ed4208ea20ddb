package dev.soakfield.mesh.topo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import dev.soakfield.mesh.FaceGroupKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.gen.StructuredMesher.Layer;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** A part taken out of a mesh: counts from the structured mesher's own layout (exact). */
class PartRemovalTest {
  @Test
  void takingOutTheLowerLayerLeavesTheUpperOneWithTheJointOnTheExterior() {
    // 2 x 2 cells in plan, a lower layer of 1 cell and an upper one of 2 (six tets a cell)
    TetMesh plate =
        StructuredMesher.layers(
            0.01,
            0.01,
            2,
            2,
            List.of(new Layer("insert", 0.001, 1), new Layer("skin", 0.002, 2)),
            1);
    TetMesh skin = PartRemoval.without(plate, Set.of("insert"));
    assertEquals(6 * 2 * 2 * 2, skin.tetCount());
    assertEquals(3 * 3 * 3, skin.nodeCount()); // the joint's nodes stay: the skin uses them
    int joint = skin.faceGroupIndex("insert-skin");
    assertEquals(FaceGroupKind.EXTERIOR, skin.faceGroups().get(joint).kind());
    int faces = 0;
    for (int f = 0; f < skin.faceCount(); f++) {
      faces += skin.faceGroup(f) == joint ? 1 : 0;
    }
    assertEquals(2 * 2 * 2, faces); // two triangles a cell of the joint
    // the part's own exterior faces go with it; the skin's stay
    int zmin = skin.faceGroupIndex("zmin");
    for (int f = 0; f < skin.faceCount(); f++) {
      assertEquals(false, skin.faceGroup(f) == zmin);
    }
    assertEquals(2, skin.volumeGroups().size());
    // nothing to take out: the same mesh
    assertSame(plate, PartRemoval.without(plate, Set.of("nothing")));
  }
}
