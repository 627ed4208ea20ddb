package dev.soakfield.mesh.vtk;

/** How a .vtu file stores its data arrays. */
public enum VtuFormat {
  /** Numbers as text inside each DataArray: readable, large, slow. */
  ASCII,
  /** Each DataArray holds base64 text of its byte count and its little-endian bytes. */
  BINARY,
  /** All arrays base64-encoded one after another in an AppendedData element: valid XML. */
  APPENDED_BASE64,
  /**
   * All arrays as raw bytes in an AppendedData element: the smallest and fastest form, but the file
   * is not valid XML (VTK readers accept it, XML parsers do not).
   */
  APPENDED_RAW
}
