package dev.soakfield.mesh.vtk;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.vtk.VtuWriter.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class VtuReaderTest {
  @TempDir Path dir;

  @ParameterizedTest
  @EnumSource(
      value = VtuFormat.class,
      names = {"ASCII", "BINARY", "APPENDED_BASE64"})
  void readsBackWhatTheWriterWroteBitForBit(VtuFormat format) {
    for (int order = 1; order <= 2; order++) {
      TetMesh mesh = StructuredMesher.box(0.3, 0.2, 0.1, 2, 2, 1, order);
      double[] c = new double[mesh.nodeCount()];
      double[] v = new double[3 * mesh.nodeCount()];
      for (int n = 0; n < c.length; n++) {
        // long binary expansions, so any rounding on the way shows
        c[n] = Math.PI * mesh.coord(n, 0) - Math.exp(mesh.coord(n, 2)) / 7;
        v[3 * n] = n / 3.0;
        v[3 * n + 2] = -1e-300 * n;
      }
      double[] rate = new double[mesh.tetCount()];
      for (int t = 0; t < rate.length; t++) {
        rate[t] = 1.0 / (t + 3);
      }
      Path file = dir.resolve("m" + order + format + ".vtu");
      try {
        VtuWriter.write(
            file,
            mesh,
            List.of(new Field("c", 1, c), new Field("flux", 3, v)),
            List.of(new Field("rate", 1, rate)),
            format);
      } catch (java.io.IOException e) {
        throw new java.io.UncheckedIOException(e);
      }
      VtuGrid g = VtuReader.read(file);
      assertEquals(mesh.nodeCount(), g.pointCount());
      assertEquals(mesh.tetCount(), g.cellCount());
      assertArrayEquals(mesh.copyCoordinates(), g.points());
      assertArrayEquals(mesh.copyTets(), g.tetsInMshOrder());
      assertEquals(mesh.nodesPerTet(), g.nodesPerTet());
      assertArrayEquals(c, g.pointField("c"));
      assertArrayEquals(v, g.pointField("flux"));
      assertEquals(3, g.components("flux"));
      assertArrayEquals(rate, g.cellField("rate"));
      // one field alone, and the sizes alone, read back the same without decoding the rest
      assertArrayEquals(c, VtuReader.pointField(file, "c"));
      assertArrayEquals(v, VtuReader.pointField(file, "flux"));
      VtuReader.Outline outline = VtuReader.outline(file);
      assertEquals(mesh.nodeCount(), outline.points());
      assertEquals(mesh.tetCount(), outline.cells());
      assertEquals(List.of("c", "flux"), outline.pointFields());
      double[] groups = g.cellField(VtuWriter.VOLUME_GROUP);
      for (int t = 0; t < mesh.tetCount(); t++) {
        assertEquals(mesh.tetGroup(t), groups[t], 0);
      }
    }
  }

  @Test
  void refusesRawAppendedDataNamingTheFile() throws Exception {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 1, 1, 1, 1);
    Path file = dir.resolve("raw.vtu");
    VtuWriter.write(file, mesh, List.of(), List.of(), VtuFormat.APPENDED_RAW);
    MeshInputException e = assertThrows(MeshInputException.class, () -> VtuReader.read(file));
    assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("raw"), e.getMessage());
  }

  @Test
  void wrongValueCountNamesTheArrayAndLine() throws Exception {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 1, 1, 1, 1);
    Path file = dir.resolve("a.vtu");
    double[] c = new double[mesh.nodeCount()];
    VtuWriter.write(file, mesh, List.of(new Field("c", 1, c)), List.of(), VtuFormat.ASCII);
    String text = Files.readString(file, StandardCharsets.UTF_8);
    // drop the first value of the field c: one value short
    int at = text.indexOf("Name=\"c\"");
    int start = text.indexOf("0.0", at);
    Files.writeString(file, text.substring(0, start) + text.substring(start + 3));
    MeshInputException e = assertThrows(MeshInputException.class, () -> VtuReader.read(file));
    assertTrue(e.getMessage().contains("DataArray 'c' (line"), e.getMessage());
    assertTrue(e.getMessage().contains("found " + (mesh.nodeCount() - 1) + " values"));
  }

  @Test
  void collectionReadsBackSortedByTime() throws Exception {
    Path pvd = dir.resolve("f.pvd");
    PvdWriter.write(
        pvd, List.of(new PvdEntry(3600.5, "fields/b.vtu"), new PvdEntry(0.1, "fields/a.vtu")));
    List<PvdEntry> e = PvdReader.read(pvd);
    assertEquals(
        List.of(new PvdEntry(0.1, "fields/a.vtu"), new PvdEntry(3600.5, "fields/b.vtu")), e);
    Path empty = dir.resolve("e.pvd");
    PvdWriter.write(empty, List.of());
    MeshInputException ex = assertThrows(MeshInputException.class, () -> PvdReader.read(empty));
    assertTrue(ex.getMessage().contains("no DataSet entry"), ex.getMessage());
  }

  @Test
  void namesTheFieldsThereAreWhenOneIsMissing() throws Exception {
    Path file = appendedBox("fields.vtu");
    MeshInputException e =
        assertThrows(MeshInputException.class, () -> VtuReader.pointField(file, "phi"));
    assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("[c]"), e.getMessage());
    assertTrue(e.getMessage().contains("'phi'"), e.getMessage());
  }

  @Test
  void appendedDataWithoutItsMarkerIsRefused() throws Exception {
    Path file = appendedBox("nomark.vtu");
    String text = Files.readString(file, StandardCharsets.ISO_8859_1);
    Files.writeString(
        file, text.replaceFirst("(<AppendedData[^>]*>\\s*)_", "$1"), StandardCharsets.ISO_8859_1);
    MeshInputException e =
        assertThrows(MeshInputException.class, () -> VtuReader.pointField(file, "c"));
    assertTrue(e.getMessage().contains("'_' marker"), e.getMessage());
  }

  @Test
  void aFrameCutShortSaysItsDataEndsEarly() throws Exception {
    Path file = appendedBox("short.vtu");
    byte[] all = Files.readAllBytes(file);
    // keep the XML part and the first field, drop the mesh arrays that follow it
    String text = new String(all, StandardCharsets.ISO_8859_1);
    int data = text.indexOf('_', text.indexOf("<AppendedData")) + 1;
    Files.write(file, java.util.Arrays.copyOf(all, data + 200));
    assertEquals(1.5, VtuReader.pointField(file, "c")[0], 0);
    MeshInputException e = assertThrows(MeshInputException.class, () -> VtuReader.read(file));
    assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
    assertTrue(e.getMessage().contains("DataArray 'Points'"), e.getMessage());
    assertTrue(e.getMessage().contains("characters left"), e.getMessage());
  }

  private Path appendedBox(String name) throws java.io.IOException {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 1, 1, 1, 1);
    double[] c = new double[mesh.nodeCount()];
    java.util.Arrays.fill(c, 1.5);
    Path file = dir.resolve(name);
    VtuWriter.write(
        file, mesh, List.of(new Field("c", 1, c)), List.of(), VtuFormat.APPENDED_BASE64);
    return file;
  }
}
