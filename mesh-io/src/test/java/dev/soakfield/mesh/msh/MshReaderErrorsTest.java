package dev.soakfield.mesh.msh;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.MeshInputException;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Each bad input gives one {@link MeshInputException} naming the file, the line (byte offset for
 * binary), what was found and what was expected. Line numbers are counted by hand in the test files
 * (cube_v22_ascii.msh: $Nodes on line 14, node k on line 15 + k, element k on line 26 + k).
 */
class MshReaderErrorsTest {
  private static String text(String name) throws IOException {
    return Files.readString(MshReaderTest.resource(name), StandardCharsets.US_ASCII);
  }

  private static byte[] bytes(String name) throws IOException {
    return Files.readAllBytes(MshReaderTest.resource(name));
  }

  private static String replaceOnce(String text, String from, String to) {
    int i = text.indexOf(from);
    assertTrue(i >= 0 && text.indexOf(from, i + 1) < 0, "test set-up: '" + from + "' once");
    return text.substring(0, i) + to + text.substring(i + from.length());
  }

  private static MeshInputException fail(String text) {
    return fail(text.getBytes(StandardCharsets.US_ASCII));
  }

  private static MeshInputException fail(byte[] bytes) {
    MeshInputException e =
        assertThrows(MeshInputException.class, () -> MshReader.read(bytes, "bad.msh"));
    assertEquals("bad.msh", e.source());
    assertTrue(e.getMessage().startsWith("bad.msh"), e.getMessage());
    return e;
  }

  private static void check(MeshInputException e, String location, String found, String expected) {
    assertEquals(location, e.location(), e.getMessage());
    assertTrue(e.found().contains(found), () -> "found: " + e.getMessage());
    assertTrue(e.expected().contains(expected), () -> "expected: " + e.getMessage());
  }

  @Test
  void onePhysicalTagWithTwoNamesIsRefused() throws IOException {
    String good = text("cube_p2_v41_ascii.msh");
    String bad =
        replaceOnce(
            replaceOnce(good, "$PhysicalNames\n2\n", "$PhysicalNames\n3\n"),
            "3 7 \"core\"\n",
            "3 7 \"core\"\n3 7 \"shell\"\n");
    MeshInputException e = fail(bad);
    check(e, "line 7", "named 'core' and again 'shell'", "one name per physical tag");
    // the same name twice says nothing new and is read as once (the control)
    String twice =
        replaceOnce(
            replaceOnce(good, "$PhysicalNames\n2\n", "$PhysicalNames\n3\n"),
            "3 7 \"core\"\n",
            "3 7 \"core\"\n3 7 \"core\"\n");
    MshReader.read(twice.getBytes(StandardCharsets.US_ASCII), "twice.msh");
  }

  @Test
  void unknownVersion() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "2.2 0 8", "3.0 0 8");
    MeshInputException e = fail(bad);
    check(e, "line 2", "version 3.0", "2.2 or 4.1");
    assertEquals("bad.msh, line 2: found version 3.0, expected 2.2 or 4.1", e.getMessage());
  }

  @Test
  void lettersWhereANumberBelongs() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "\n3 0 1 0\n", "\n3 0 1x 0\n");
    check(fail(bad), "line 18", "'1x'", "y coordinate");
  }

  @Test
  void elementNamesANodeThatDoesNotExist() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "7 4 2 1 1 1 3 7 8", "7 4 2 1 1 1 3 99 8");
    check(fail(bad), "line 33", "node number 99 in element 7", "a node number listed in $Nodes");
  }

  @Test
  void nodeCountSmallerThanTheNodesGiven() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "$Nodes\n8\n", "$Nodes\n7\n");
    check(fail(bad), "line 23", "'8'", "$EndNodes");
  }

  @Test
  void nodeCountLargerThanTheNodesGiven() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "$Nodes\n8\n", "$Nodes\n9\n");
    check(fail(bad), "line 24", "'$EndNodes'", "node number");
  }

  @Test
  void hugeDeclaredCountIsRefusedBeforeAllocating() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "$Nodes\n8\n", "$Nodes\n900000000000\n");
    check(fail(bad), "line 15", "900000000000", "a count the rest of the file can hold");
  }

  @Test
  void negativeCount() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "$Elements\n21\n", "$Elements\n-21\n");
    check(fail(bad), "line 26", "'-21'", "a non-negative number of elements");
  }

  @Test
  void truncatedAsciiFile() throws IOException {
    String good = text("cube_v22_ascii.msh");
    String bad = good.substring(0, good.indexOf("5 0 0 1") + "5 0 0".length());
    // the count check sees first that 8 nodes cannot fit in the 38 bytes left
    check(fail(bad), "line 15", "number of nodes 8 with only 38 bytes left", "at least 8 bytes");
  }

  @Test
  void fileThatEndsInsideAnElement() throws IOException {
    String good = text("cube_v22_ascii.msh");
    String bad =
        good.substring(0, good.indexOf("21 2 3 16 6 0 7 5 8") + "21 2 3 16 6 0 7 5".length());
    check(fail(bad), "line 47", "end of file", "node number");
  }

  @Test
  void missingEndTag() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "$EndNodes\n", "");
    check(fail(bad), "line 24", "'$Elements'", "$EndNodes");
  }

  @Test
  void unsupportedElementTypeIsNamed() throws IOException {
    String bad =
        replaceOnce(text("cube_v22_ascii.msh"), "4 4 2 1 1 1 2 4 8", "4 5 2 1 1 1 2 4 8 3 5 6 7");
    MeshInputException e = fail(bad);
    check(e, "line 30", "element type 5 (8-node hexahedron)", ElementTypes.SUPPORTED);
    assertEquals(
        "only 4- or 10-node tetrahedra and 3- or 6-node triangles",
        e.expected()); // the brief's text
  }

  @Test
  void trianglesOfAnotherOrderThanTheTetrahedra() throws IOException {
    String bad =
        replaceOnce(text("cube_v22_ascii.msh"), "10 2 2 11 1 1 7 3", "10 9 2 11 1 1 7 3 2 4 5");
    check(
        fail(bad),
        "line 36",
        "element type 9 (6-node triangle) after element type 4 (4-node tetrahedron)",
        "one element order");
  }

  @Test
  void duplicateNodeTag() throws IOException {
    String bad = replaceOnce(text("cube_v22_ascii.msh"), "\n3 0 1 0\n", "\n2 0 1 0\n");
    check(fail(bad), "line 18", "node tag 2 a second time", "each node tag once");
  }

  @Test
  void emptyFileAndForeignFile() {
    check(fail(""), "line 1", "an empty file", "$MeshFormat");
    check(fail("solid part\nfacet normal 0 0 1\n"), "line 1", "'solid'", "$MeshFormat");
  }

  @Test
  void unknownSectionWithoutItsEndTag() throws IOException {
    String bad = text("cube_v22_ascii.msh") + "$NodeData\n1\n\"c\"\n";
    check(fail(bad), "line 49", "$NodeData without $EndNodeData", "$EndNodeData");
  }

  @Test
  void elementsBeforeNodes() throws IOException {
    String good = text("no_physical_v41_ascii.msh");
    String nodes = good.substring(good.indexOf("$Nodes"), good.indexOf("$Elements"));
    String bad = good.replace(nodes, "") + nodes;
    check(fail(bad), "line 9", "$Elements before $Nodes", "$Nodes first");
  }

  @Test
  void blockSizesThatDoNotAddUpToTheDeclaredTotal() throws IOException {
    String bad = replaceOnce(text("cube_v41_ascii.msh"), "9 22 1 22", "9 23 1 22");
    check(fail(bad), "line 85", "22 elements in the blocks", "23 as declared at line 52");
  }

  @Test
  void tetrahedraOutsideEveryPhysicalGroupWhenTheFileHasGroups() throws IOException {
    String bad =
        replaceOnce(
            text("entity_quirks_v41_ascii.msh"), "1 0 0 0 1 1 1 2 3 9 1 1", "1 0 0 0 1 1 1 0 1 1");
    check(fail(bad), "line 29", "tetrahedra of volume 1", "every tetrahedron in a physical volume");
  }

  @Test
  void byteOrderMarkerThatIsNotOne() throws IOException {
    byte[] bad = bytes(BinaryFixtures.CUBE_V22);
    int at = "$MeshFormat\n2.2 1 8\n".length();
    bad[at] = 2;
    check(fail(bad), "byte 20", "the bytes 02 00 00 00", "the int 1 in little- or big-endian");
  }

  @Test
  void truncatedBinaryFile() throws IOException {
    byte[] good = bytes(BinaryFixtures.CUBE_V41);
    MeshInputException e = fail(Arrays.copyOf(good, good.length - 100));
    assertTrue(e.location().startsWith("byte "), e.getMessage());
    // blocks of two triangles take 20 + 2 * 32 = 84 bytes; the count of the next to last block
    // (side z0) sits at 2400 - 14 ($EndElements line) - 84 - 64 - 8 = 2230, 62 bytes before the cut
    assertEquals(2400, good.length);
    check(e, "byte 2230", "number of elements in the block 2 with only 62 bytes left", "32 bytes");
  }

  @Test
  void hugeBinaryNodeCountIsRefusedBeforeAllocating() throws IOException {
    byte[] bad = bytes(BinaryFixtures.CUBE_V41);
    int at = indexOf(bad, "$Nodes\n") + 7 + 8; // second size_t of the header: numNodes
    ByteBuffer.wrap(bad).order(ByteOrder.BIG_ENDIAN).putLong(at, 1L << 40);
    check(fail(bad), "byte " + at, "1099511627776", "a count the rest of the file can hold");
  }

  @Test
  void unsupportedBinaryDataSize() throws IOException {
    byte[] bad = bytes(BinaryFixtures.CUBE_V22);
    bad["$MeshFormat\n2.2 1 ".length()] = '4';
    // the format line is ASCII, so the place is a line even in a binary file
    check(fail(bad), "line 2", "data size 4", "8 (the size of a double)");
  }

  @Test
  void missingFileIsAnInputError() {
    Path none = Path.of("no-such-dir", "none.msh");
    MeshInputException e = assertThrows(MeshInputException.class, () -> MshReader.read(none));
    assertTrue(e.getMessage().contains("none.msh"), e.getMessage());
    assertTrue(e.found().contains("read error"), e.getMessage());
  }

  private static int indexOf(byte[] data, String text) {
    byte[] t = text.getBytes(StandardCharsets.US_ASCII);
    outer:
    for (int i = 0; i + t.length <= data.length; i++) {
      for (int k = 0; k < t.length; k++) {
        if (data[i + k] != t[k]) {
          continue outer;
        }
      }
      return i;
    }
    throw new AssertionError("no " + text);
  }
}
