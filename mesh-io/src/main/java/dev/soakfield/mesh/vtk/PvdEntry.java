package dev.soakfield.mesh.vtk;

import java.util.Objects;

/**
 * One time step of a .pvd collection.
 *
 * @param time the step's time (finite), in the unit the run reports (seconds)
 * @param relativeFile the step's .vtu file, relative to the .pvd file, with '/' separators
 */
public record PvdEntry(double time, String relativeFile) {
  public PvdEntry {
    Objects.requireNonNull(relativeFile, "relativeFile");
    if (!Double.isFinite(time)) {
      throw new IllegalArgumentException(
          "collection time of '" + relativeFile + "': found " + time + ", expected a finite time");
    }
    if (relativeFile.isBlank() || !Xml.isPlainText(relativeFile)) {
      throw new IllegalArgumentException(
          "collection file: found '" + relativeFile + "', expected a non-blank relative path");
    }
  }
}
