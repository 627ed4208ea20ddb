package dev.soakfield.mesh.vtk;

import dev.soakfield.mesh.MeshInputException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/** Reads a VTK collection (.pvd) file: its DataSet entries, sorted by time. */
public final class PvdReader {
  private PvdReader() {}

  /**
   * Reads the entries.
   *
   * @throws MeshInputException when the file is missing, malformed, has an entry without a time or
   *     file, or lists no step at all
   */
  public static List<PvdEntry> read(Path file) {
    String source = file.toString();
    if (!Files.isRegularFile(file)) {
      throw new MeshInputException(source, "", "no such file", "a .pvd collection file");
    }
    XMLInputFactory factory = XMLInputFactory.newFactory();
    factory.setProperty(XMLInputFactory.SUPPORT_DTD, false);
    factory.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
    List<PvdEntry> entries = new ArrayList<>();
    boolean collection = false;
    try (InputStream in = Files.newInputStream(file)) {
      XMLStreamReader x = factory.createXMLStreamReader(in);
      while (x.hasNext()) {
        if (x.next() != XMLStreamConstants.START_ELEMENT) {
          continue;
        }
        int line = x.getLocation().getLineNumber();
        if (x.getLocalName().equals("VTKFile")) {
          String type = x.getAttributeValue(null, "type");
          if (!"Collection".equals(type)) {
            throw new MeshInputException(
                source, "line " + line, "VTKFile type '" + type + "'", "type 'Collection'");
          }
          collection = true;
        } else if (x.getLocalName().equals("DataSet")) {
          String t = x.getAttributeValue(null, "timestep");
          String f = x.getAttributeValue(null, "file");
          if (t == null || f == null || f.isBlank()) {
            throw new MeshInputException(
                source, "line " + line, "a DataSet without timestep or file", "both attributes");
          }
          double time;
          try {
            time = Double.parseDouble(t.strip());
          } catch (NumberFormatException e) {
            time = Double.NaN;
          }
          if (!Double.isFinite(time)) {
            throw new MeshInputException(
                source, "line " + line, "timestep '" + t + "'", "a finite number");
          }
          entries.add(new PvdEntry(time, f));
        }
      }
      x.close();
    } catch (XMLStreamException e) {
      throw new MeshInputException(source, "", "malformed XML (" + e.getMessage() + ")", "XML");
    } catch (IOException e) {
      throw new MeshInputException(
          source, "", "an unreadable file (" + e.getMessage() + ")", "a readable file");
    }
    if (!collection || entries.isEmpty()) {
      throw new MeshInputException(
          source, "", collection ? "no DataSet entry" : "no VTKFile root", "a collection of steps");
    }
    entries.sort(Comparator.comparingDouble(PvdEntry::time));
    return List.copyOf(entries);
  }
}
