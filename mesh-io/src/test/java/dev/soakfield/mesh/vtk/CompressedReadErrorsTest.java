package dev.soakfield.mesh.vtk;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.vtk.VtuWriter.Field;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A damaged zlib-compressed .vtu is refused with the file and the array named, never a trace. */
class CompressedReadErrorsTest {
  @TempDir Path dir;

  private String written() throws Exception {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 2, 2, 2, 1);
    Path file = dir.resolve("ok.vtu");
    new VtuFrameWriter(mesh, "group", VtuEncoding.DEFAULT.withZlib(true))
        .write(file, List.of(new Field("c", 1, new double[mesh.nodeCount()])));
    VtuReader.read(file); // control: undamaged, it reads
    return Files.readString(file, StandardCharsets.US_ASCII);
  }

  private MeshInputException refused(String text) throws Exception {
    Path file = dir.resolve("bad.vtu");
    Files.writeString(file, text, StandardCharsets.US_ASCII);
    MeshInputException e = assertThrows(MeshInputException.class, () -> VtuReader.read(file));
    assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("DataArray 'c'"), e.getMessage());
    return e;
  }

  private static int dataStart(String text) {
    return text.indexOf('_', text.indexOf("<AppendedData")) + 1;
  }

  @Test
  void anImpossibleHeaderIsNamed() throws Exception {
    String text = written();
    int at = dataStart(text);
    // header words [#blocks][block size][last size]: a last block longer than a block
    byte[] words =
        ByteBuffer.allocate(24)
            .order(ByteOrder.LITTLE_ENDIAN)
            .putLong(1)
            .putLong(8)
            .putLong(9)
            .array();
    String bad = Base64.getEncoder().encodeToString(words);
    MeshInputException e = refused(text.substring(0, at) + bad + text.substring(at + bad.length()));
    assertTrue(e.getMessage().contains("compression header"), e.getMessage());
  }

  @Test
  void dataCutShortIsNamed() throws Exception {
    String text = written();
    int at = dataStart(text);
    // keep the header of c (4 words = 44 base64 characters) and a few characters of its data
    MeshInputException e =
        refused(text.substring(0, at + 48) + "\n  </AppendedData>\n</VTKFile>\n");
    assertTrue(e.getMessage().contains("characters left"), e.getMessage());
  }

  @Test
  void badBase64IsNamed() throws Exception {
    String text = written();
    int at = dataStart(text);
    MeshInputException e = refused(text.substring(0, at + 1) + "*" + text.substring(at + 2));
    assertTrue(e.getMessage().contains("bad base64"), e.getMessage());
  }
}
