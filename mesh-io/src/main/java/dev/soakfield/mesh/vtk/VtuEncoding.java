package dev.soakfield.mesh.vtk;

/**
 * How {@link VtuFrameWriter} stores the numbers of a frame.
 *
 * @param doubleFields fields as Float64 (16 significant digits) instead of Float32 (about 7, and
 *     magnitudes between 1.2e-38 and 3.4e38); points are Float64 either way
 * @param zlib each array compressed with zlib in blocks ({@code
 *     compressor="vtkZLibDataCompressor"})
 */
public record VtuEncoding(boolean doubleFields, boolean zlib) {
  /** Float32 fields, no compression: the layout of earlier versions with half the field bytes. */
  public static final VtuEncoding DEFAULT = new VtuEncoding(false, false);

  /** This encoding with fields as Float64 or Float32. */
  public VtuEncoding withDoubleFields(boolean doubles) {
    return new VtuEncoding(doubles, zlib);
  }

  /** This encoding with or without zlib compression. */
  public VtuEncoding withZlib(boolean compress) {
    return new VtuEncoding(doubleFields, compress);
  }
}
