package dev.soakfield.mesh.vtk;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/** Writes a VTK collection (.pvd) file that lists .vtu files by time step. */
public final class PvdWriter {
  private PvdWriter() {}

  /**
   * Writes the entries in the given order. Times are written as Java's shortest round-trip text, so
   * they read back to the very same doubles.
   */
  public static void write(Path file, List<PvdEntry> entries) throws IOException {
    Objects.requireNonNull(file, "file");
    Objects.requireNonNull(entries, "entries");
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      w.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
      w.write("<VTKFile type=\"Collection\" version=\"0.1\" byte_order=\"LittleEndian\">\n");
      w.write("  <Collection>\n");
      for (PvdEntry e : entries) {
        Objects.requireNonNull(e, "entry");
        w.write("    <DataSet timestep=\"");
        w.write(Double.toString(e.time()));
        w.write("\" part=\"0\" file=\"");
        w.write(Xml.escape(e.relativeFile()));
        w.write("\"/>\n");
      }
      w.write("  </Collection>\n");
      w.write("</VTKFile>\n");
    }
  }
}
