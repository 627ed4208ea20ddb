package dev.soakfield.mesh.vtk;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.vtk.VtuWriter.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class VtuFrameWriterTest {
  @TempDir Path dir;

  private static double[] field(TetMesh mesh, double shift) {
    double[] c = new double[mesh.nodeCount()];
    for (int n = 0; n < c.length; n++) {
      // long binary expansions, so rounding to Float32 shows
      c[n] = Math.PI * mesh.coord(n, 0) - Math.exp(mesh.coord(n, 2)) / 7 + shift;
    }
    return c;
  }

  private static double[] asFloat32(double[] v) {
    double[] out = new double[v.length];
    for (int i = 0; i < v.length; i++) {
      out[i] = (float) v[i]; // round to nearest binary32 (Java Language Specification 5.1.3)
    }
    return out;
  }

  @ParameterizedTest
  @CsvSource({"false,false", "true,true"})
  void cellFieldsStandBeforeTheGroupAndReadBackInEveryFrame(boolean doubles, boolean zlib)
      throws Exception {
    TetMesh mesh = StructuredMesher.box(0.3, 0.2, 0.1, 3, 2, 2, 1);
    VtuFrameWriter w = new VtuFrameWriter(mesh, "group", new VtuEncoding(doubles, zlib));
    for (int frame = 0; frame < 2; frame++) {
      double[] e = new double[mesh.tetCount()];
      for (int t = 0; t < e.length; t++) {
        e[t] = Math.sqrt(t + 1.0) / (frame + 3);
      }
      Path file = dir.resolve("cells" + frame + ".vtu");
      w.write(
          file,
          List.of(new Field("c", 1, field(mesh, frame), "mol/m^3")),
          List.of(new Field("error_indicator", 1, e, "mol/m^3")));
      VtuGrid g = VtuReader.read(file);
      assertArrayEquals(doubles ? e : asFloat32(e), g.cellField("error_indicator"));
      double[] groups = g.cellField("group");
      for (int t = 0; t < mesh.tetCount(); t++) {
        assertEquals(mesh.tetGroup(t), groups[t], 0);
      }
      assertArrayEquals(mesh.copyCoordinates(), g.points()); // the copied mesh block still fits
      VtuTestReader t = VtuTestReader.read(file);
      assertArrayEquals(doubles ? e : asFloat32(e), t.get("CellData/error_indicator").values());
    }
    double[] wrong = new double[mesh.tetCount() - 1];
    assertThrows(
        IllegalArgumentException.class,
        () -> w.write(dir.resolve("x.vtu"), List.of(), List.of(new Field("e", 1, wrong))));
    double[] right = new double[mesh.tetCount()];
    assertThrows(
        IllegalArgumentException.class,
        () -> w.write(dir.resolve("y.vtu"), List.of(), List.of(new Field("group", 1, right))));
  }

  @ParameterizedTest
  @CsvSource({"false,false,1", "true,false,1", "false,true,1", "true,true,1", "false,true,2"})
  void framesReadBackByBothReadersWithTheMeshExact(boolean doubles, boolean zlib, int order)
      throws Exception {
    TetMesh mesh = StructuredMesher.box(0.3, 0.2, 0.1, 3, 2, 2, order);
    VtuFrameWriter w = new VtuFrameWriter(mesh, "group", new VtuEncoding(doubles, zlib));
    for (int frame = 0; frame < 3; frame++) {
      double[] c = field(mesh, frame);
      double[] v = new double[3 * mesh.nodeCount()];
      Arrays.fill(v, 1.0 / (frame + 3));
      Path file = dir.resolve("f" + frame + ".vtu");
      w.write(file, List.of(new Field("c", 1, c, "mol/m^3"), new Field("flux", 3, v)));
      double[] expected = doubles ? c : asFloat32(c);
      VtuGrid g = VtuReader.read(file);
      assertArrayEquals(mesh.copyCoordinates(), g.points(), "points stay Float64, bit for bit");
      assertArrayEquals(mesh.copyTets(), g.tetsInMshOrder());
      assertArrayEquals(expected, g.pointField("c"));
      assertArrayEquals(doubles ? v : asFloat32(v), g.pointField("flux"));
      assertEquals(3, g.components("flux"));
      double[] groups = g.cellField("group");
      for (int t = 0; t < mesh.tetCount(); t++) {
        assertEquals(mesh.tetGroup(t), groups[t], 0);
      }
      // the independent reader, written from the format description alone
      VtuTestReader t = VtuTestReader.read(file);
      assertEquals(zlib, t.zlib);
      assertEquals(doubles ? "Float64" : "Float32", t.get("PointData/c").type());
      assertArrayEquals(expected, t.get("PointData/c").values());
      assertEquals("Float64", t.get("Points/Points").type());
      assertArrayEquals(mesh.copyCoordinates(), t.get("Points/Points").values());
      assertEquals("Int32", t.get("Cells/connectivity").type());
      int[] types = Arrays.stream(t.get("Cells/types").values()).mapToInt(x -> (int) x).toArray();
      // VTK cell types: tetra 10, quadratic tetra 24 (VTK File Formats, cell types)
      assertTrue(Arrays.stream(types).allMatch(x -> x == (order == 1 ? 10 : 24)));
    }
  }

  @Test
  void laterFramesCarryTheFirstFramesMeshBytesUnchanged() throws Exception {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 4, 4, 4, 1);
    VtuFrameWriter w = new VtuFrameWriter(mesh, "group", VtuEncoding.DEFAULT);
    Path a = dir.resolve("a.vtu");
    Path b = dir.resolve("b.vtu");
    w.write(a, List.of(new Field("c", 1, field(mesh, 0))));
    w.write(b, List.of(new Field("c", 1, field(mesh, 1))));
    byte[] fa = Files.readAllBytes(a);
    byte[] fb = Files.readAllBytes(b);
    assertEquals(fa.length, fb.length, "Float32 fields of equal count: files of equal size");
    // everything after the field c (the mesh arrays and the closing tags) is the same bytes
    int meshChars = fa.length - meshStart(fa);
    assertTrue(meshChars > fa.length / 2, "the mesh is most of the file");
    assertArrayEquals(
        Arrays.copyOfRange(fa, fa.length - meshChars, fa.length),
        Arrays.copyOfRange(fb, fb.length - meshChars, fb.length));
    assertNotEquals(
        Arrays.toString(Arrays.copyOf(fa, fa.length - meshChars)),
        Arrays.toString(Arrays.copyOf(fb, fb.length - meshChars)),
        "negative control: the fields differ, so the comparison above could fail");
  }

  /** Where the appended data of the first mesh array (the group) starts: after the field c. */
  private static int meshStart(byte[] file) {
    String text = new String(file, StandardCharsets.ISO_8859_1);
    int at = text.indexOf("Name=\"group\"");
    int from = text.indexOf("offset=\"", at) + 8;
    long offset = Long.parseLong(text.substring(from, text.indexOf('"', from)));
    return text.indexOf('_', text.indexOf("<AppendedData")) + 1 + (int) offset;
  }

  @Test
  void aChangedFirstFrameIsNotCopiedFromButEncodedAgain() throws Exception {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 2, 2, 2, 1);
    VtuFrameWriter w = new VtuFrameWriter(mesh, "group", VtuEncoding.DEFAULT.withZlib(true));
    Path a = dir.resolve("a.vtu");
    w.write(a, List.of(new Field("c", 1, field(mesh, 0))));
    Files.writeString(a, "overwritten by someone else");
    Path b = dir.resolve("b.vtu");
    w.write(b, List.of(new Field("c", 1, field(mesh, 1))));
    assertArrayEquals(mesh.copyCoordinates(), VtuReader.read(b).points());
    // writing over the copy source itself encodes the mesh again, too
    w.write(b, List.of(new Field("c", 1, field(mesh, 2))));
    VtuGrid g = VtuReader.read(b);
    assertArrayEquals(mesh.copyTets(), g.tetsInMshOrder());
    assertArrayEquals(asFloat32(field(mesh, 2)), g.pointField("c"));
  }

  @Test
  void float32AndZlibShrinkTheFileByWhatTheFormatPredicts() throws Exception {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 6, 6, 6, 1);
    List<Field> fields = List.of(new Field("c", 1, field(mesh, 0)));
    Path f64 = dir.resolve("d.vtu");
    Path f32 = dir.resolve("s.vtu");
    Path zip = dir.resolve("z.vtu");
    new VtuFrameWriter(mesh, "group", VtuEncoding.DEFAULT.withDoubleFields(true))
        .write(f64, fields);
    new VtuFrameWriter(mesh, "group", VtuEncoding.DEFAULT).write(f32, fields);
    new VtuFrameWriter(mesh, "group", VtuEncoding.DEFAULT.withZlib(true)).write(zip, fields);
    // base64 (RFC 4648): 4 characters per 3 bytes, padded; 8 or 4 bytes per value. The offsets of
    // the later arrays have other digit counts in the two files: compare lengths of the data only.
    long n = mesh.nodeCount();
    long saved = 4 * ((8 * n + 2) / 3) - 4 * ((4 * n + 2) / 3);
    long xmlDiff = xmlLength(f64) - xmlLength(f32);
    assertEquals(saved, Files.size(f64) - Files.size(f32) - xmlDiff);
    // a structured mesh's connectivity repeats a pattern: zlib takes it to well under half
    assertTrue(Files.size(zip) < Files.size(f32) / 2, Files.size(zip) + " vs " + Files.size(f32));
  }

  private static long xmlLength(Path file) throws Exception {
    String text = Files.readString(file, StandardCharsets.ISO_8859_1);
    return text.indexOf('_', text.indexOf("<AppendedData"));
  }

  @Test
  void badFieldsAndNamesAreRefused() {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 1, 1, 1, 1);
    VtuFrameWriter w = new VtuFrameWriter(mesh, "group", VtuEncoding.DEFAULT);
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () -> w.write(dir.resolve("x.vtu"), List.of(new Field("c", 1, new double[2]))));
    assertTrue(e.getMessage().contains("found 2 values"), e.getMessage());
    assertThrows(
        IllegalArgumentException.class, () -> new VtuFrameWriter(mesh, " ", VtuEncoding.DEFAULT));
  }

  @Test
  void corruptCompressedDataNamesTheFileAndArray() throws Exception {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 2, 2, 2, 1);
    Path file = dir.resolve("z.vtu");
    new VtuFrameWriter(mesh, "group", VtuEncoding.DEFAULT.withZlib(true))
        .write(file, List.of(new Field("c", 1, field(mesh, 0))));
    VtuReader.read(file); // control: the file as written reads
    String text = Files.readString(file, StandardCharsets.US_ASCII);
    int data = text.indexOf('_', text.indexOf("<AppendedData")) + 1;
    // the header of c is 4 words = 32 bytes = 44 base64 characters; the zlib stream follows
    int at = data + 44 + 4;
    String broken =
        text.substring(0, at) + (text.charAt(at) == 'A' ? 'B' : 'A') + text.substring(at + 1);
    Files.writeString(file, broken, StandardCharsets.US_ASCII);
    MeshInputException ex = assertThrows(MeshInputException.class, () -> VtuReader.read(file));
    assertTrue(ex.getMessage().startsWith(file.toString()), ex.getMessage());
    assertTrue(ex.getMessage().contains("DataArray 'c'"), ex.getMessage());
    Files.writeString(
        file,
        text.replace("vtkZLibDataCompressor", "vtkLZ4DataCompressor"),
        StandardCharsets.US_ASCII);
    ex = assertThrows(MeshInputException.class, () -> VtuReader.read(file));
    assertTrue(ex.getMessage().contains("vtkLZ4DataCompressor"), ex.getMessage());
  }
}
