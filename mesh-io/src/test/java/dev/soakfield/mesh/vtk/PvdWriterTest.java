package dev.soakfield.mesh.vtk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class PvdWriterTest {
  @TempDir Path dir;

  @Test
  void timesAndFilesReadBackExactly() throws Exception {
    List<PvdEntry> entries =
        List.of(
            new PvdEntry(0, "fields/c_0000.vtu"),
            new PvdEntry(1.0 / 3, "fields/c_0001.vtu"),
            new PvdEntry(3600.000000000001, "fields/c_0002.vtu"),
            new PvdEntry(4.9e-324, "fields/a&b <1>.vtu"),
            new PvdEntry(1.7976931348623157e308, "fields/\"quoted\".vtu"));
    Path file = dir.resolve("run.pvd");
    PvdWriter.write(file, entries);
    Element root = VtuTestReader.parseXml(Files.readAllBytes(file)).getDocumentElement();
    // formats.md: <VTKFile type="Collection" version="0.1"><Collection><DataSet timestep part file>
    assertEquals("Collection", root.getAttribute("type"));
    assertEquals("0.1", root.getAttribute("version"));
    NodeList sets = root.getElementsByTagName("DataSet");
    assertEquals(entries.size(), sets.getLength());
    for (int i = 0; i < entries.size(); i++) {
      Element e = (Element) sets.item(i);
      assertEquals("Collection", ((Element) e.getParentNode()).getTagName());
      assertEquals(entries.get(i).time(), Double.parseDouble(e.getAttribute("timestep")), 0);
      assertEquals(entries.get(i).relativeFile(), e.getAttribute("file"));
      assertEquals("0", e.getAttribute("part"));
    }
  }

  @Test
  void nonFiniteTimesAreRefused() {
    var e = assertThrows(IllegalArgumentException.class, () -> new PvdEntry(Double.NaN, "a.vtu"));
    assertEquals("collection time of 'a.vtu': found NaN, expected a finite time", e.getMessage());
    assertThrows(IllegalArgumentException.class, () -> new PvdEntry(1, " "));
  }
}
