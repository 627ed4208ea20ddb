package dev.soakfield.mesh;

/** Shape figures of the tetrahedra (computed from the corner nodes). */
public final class MeshQuality {
  /** Number of bins of {@link #volumeRatioHistogram()}. */
  public static final int BINS = 10;

  private final double minDihedralDeg;
  private final double maxDihedralDeg;
  private final double minVolumeRatio;
  private final int[] volumeRatioHistogram;

  /**
   * @param minDihedralDeg smallest dihedral angle over all tetrahedra, degrees
   * @param maxDihedralDeg largest dihedral angle over all tetrahedra, degrees
   * @param minVolumeRatio smallest volume ratio (1 for a regular tetrahedron, 0 for a flat one)
   * @param volumeRatioHistogram counts of tetrahedra whose volume ratio lies in [i/10, (i+1)/10),
   *     {@link #BINS} bins, the last one closed at 1
   */
  public MeshQuality(
      double minDihedralDeg,
      double maxDihedralDeg,
      double minVolumeRatio,
      int[] volumeRatioHistogram) {
    if (volumeRatioHistogram.length != BINS) {
      throw new IllegalArgumentException("volume ratio histogram needs " + BINS + " bins");
    }
    this.minDihedralDeg = minDihedralDeg;
    this.maxDihedralDeg = maxDihedralDeg;
    this.minVolumeRatio = minVolumeRatio;
    this.volumeRatioHistogram = volumeRatioHistogram.clone();
  }

  public double minDihedralDeg() {
    return minDihedralDeg;
  }

  public double maxDihedralDeg() {
    return maxDihedralDeg;
  }

  public double minVolumeRatio() {
    return minVolumeRatio;
  }

  /** A copy of the histogram counts. */
  public int[] volumeRatioHistogram() {
    return volumeRatioHistogram.clone();
  }
}
