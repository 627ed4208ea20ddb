package dev.soakfield.mesh.msh;

import static dev.soakfield.mesh.msh.CubeFixture.CORNERS;
import static dev.soakfield.mesh.msh.CubeFixture.SIDES;
import static dev.soakfield.mesh.msh.CubeFixture.SIDE_NAMES;
import static dev.soakfield.mesh.msh.CubeFixture.TETS;

import java.io.IOException;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Makes the binary test files of src/test/resources/msh with {@link MshBytes}, following the format
 * description field by field. Run {@link #main} to write them again; a test checks that the
 * committed files equal what this class makes.
 */
final class BinaryFixtures {
  static final String CUBE_V22 = "cube_v22_binary.msh";
  static final String CUBE_V41 = "cube_v41_binary.msh";
  static final String CUBE_P2_V22 = "cube_p2_v22_binary.msh";

  private BinaryFixtures() {}

  public static void main(String[] args) throws IOException {
    Path dir = Path.of(args.length > 0 ? args[0] : "mesh-io/src/test/resources/msh");
    Files.write(dir.resolve(CUBE_V22), cubeV22());
    Files.write(dir.resolve(CUBE_V41), cubeV41());
    Files.write(dir.resolve(CUBE_P2_V22), cubeP2V22());
  }

  private static MshBytes header22(MshBytes b) {
    b.line("$MeshFormat").line("2.2 1 8").i32(1).line("").line("$EndMeshFormat");
    b.line("$PhysicalNames").line("7").line("3 1 \"body\"");
    for (int s = 0; s < 6; s++) {
      b.line("2 " + (11 + s) + " \"" + SIDE_NAMES[s] + "\"");
    }
    return b.line("$EndPhysicalNames");
  }

  /** The linear cube as MSH 2.2 binary, little-endian, with a point and two lines to skip. */
  static byte[] cubeV22() {
    MshBytes b = header22(new MshBytes(ByteOrder.LITTLE_ENDIAN, 8));
    b.line("$Nodes").line("8");
    for (int n = 0; n < 8; n++) {
      b.i32(n + 1).f64(CORNERS[n]);
    }
    b.line("").line("$EndNodes").line("$Elements").line("21");
    b.i32(15, 1, 2).i32(1, 0, 1, 1); // a point: type, count, tags; id, physical, entity, node
    b.i32(1, 2, 2).i32(2, 0, 1, 1, 2).i32(3, 0, 2, 2, 4);
    b.i32(4, 6, 2);
    for (int t = 0; t < 6; t++) {
      b.i32(4 + t, 1, 1).i32(TETS[t]);
    }
    b.i32(2, 12, 2);
    int id = 10;
    for (int s = 0; s < 6; s++) {
      for (int[] f : SIDES[s]) {
        b.i32(id++, 11 + s, s + 1).i32(f);
      }
    }
    return b.line("").line("$EndElements").bytes();
  }

  /** The quadratic cube (27 grid nodes) as MSH 2.2 binary, little-endian. */
  static byte[] cubeP2V22() {
    MshBytes b = header22(new MshBytes(ByteOrder.LITTLE_ENDIAN, 8));
    b.line("$Nodes").line("27");
    for (int n = 0; n < 27; n++) {
      int i = n % 3;
      int j = n / 3 % 3;
      int k = n / 9;
      b.i32(n + 1).f64(i * 0.5, j * 0.5, k * 0.5);
    }
    b.line("").line("$EndNodes").line("$Elements").line("18");
    b.i32(11, 6, 2);
    for (int t = 0; t < 6; t++) {
      b.i32(1 + t, 1, 1).i32(CubeFixture.tet10(TETS[t]));
    }
    int id = 7;
    for (int s = 0; s < 6; s++) {
      b.i32(9, 2, 2); // one group header per side: type 9, two elements, two tags
      for (int[] f : SIDES[s]) {
        b.i32(id++, 11 + s, s + 1).i32(CubeFixture.tri6(f));
      }
    }
    return b.line("").line("$EndElements").bytes();
  }

  /**
   * The linear cube as MSH 4.1 binary, big-endian, with the entities and node blocks of
   * cube_v41_ascii.msh (points, curves with bounding points, a parametric node block).
   */
  static byte[] cubeV41() {
    MshBytes b = new MshBytes(ByteOrder.BIG_ENDIAN, 8);
    b.line("$MeshFormat").line("4.1 1 8").i32(1).line("").line("$EndMeshFormat");
    b.line("$PhysicalNames").line("8").line("1 30 \"edge\"").line("3 1 \"body\"");
    for (int s = 0; s < 6; s++) {
      b.line("2 " + (11 + s) + " \"" + SIDE_NAMES[s] + "\"");
    }
    b.line("$EndPhysicalNames");
    b.line("$Entities").size(2, 3, 6, 1);
    b.i32(1).f64(0, 0, 0).size(0);
    b.i32(2).f64(1, 0, 0).size(0);
    b.i32(1).f64(0, 0, 0, 1, 0, 0).size(1).i32(30).size(2).i32(1, -2);
    b.i32(2).f64(0, 0, 0, 0, 1, 0).size(0).size(2).i32(1, -3);
    b.i32(3).f64(0, 0, 0, 0, 0, 1).size(0).size(2).i32(-1, 5);
    for (int s = 0; s < 6; s++) {
      b.i32(s + 1).f64(0, 0, 0, 1, 1, 1).size(1).i32(11 + s);
      if (s == 0) {
        b.size(4).i32(1, 2, -3, 4);
      } else {
        b.size(0);
      }
    }
    b.i32(1).f64(0, 0, 0, 1, 1, 1).size(1).i32(1).size(6).i32(1, 2, 3, 4, 5, -6);
    b.line("").line("$EndEntities");
    b.line("$Nodes").size(3, 8, 1, 8);
    b.i32(0, 1, 0).size(4).size(1, 2, 3, 4);
    for (int n = 0; n < 4; n++) {
      b.f64(CORNERS[n]);
    }
    b.i32(2, 5, 1).size(2).size(5, 6);
    b.f64(CORNERS[4]).f64(0.25, 0.75).f64(CORNERS[5]).f64(0.5, 0.5);
    b.i32(3, 1, 0).size(2).size(7, 8).f64(CORNERS[6]).f64(CORNERS[7]);
    b.line("").line("$EndNodes");
    b.line("$Elements").size(9, 22, 1, 22);
    b.i32(0, 1, 15).size(2).size(1, 1, 2, 8);
    b.i32(1, 1, 1).size(2).size(3, 1, 2, 4, 2, 4);
    b.i32(3, 1, 4).size(6);
    for (int t = 0; t < 6; t++) {
      b.size(5 + t);
      for (int n : TETS[t]) {
        b.size(n);
      }
    }
    long id = 11;
    for (int s = 0; s < 6; s++) {
      b.i32(2, s + 1, 2).size(2);
      for (int[] f : SIDES[s]) {
        b.size(id++);
        for (int n : f) {
          b.size(n);
        }
      }
    }
    return b.line("").line("$EndElements").bytes();
  }
}
