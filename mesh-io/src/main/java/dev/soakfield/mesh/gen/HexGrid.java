package dev.soakfield.mesh.gen;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.VolumeGroup;
import java.util.List;

/**
 * A logically hexahedral grid handed from a shape builder to {@link KuhnSplit}: node coordinates,
 * eight corner nodes per cell, a volume group per cell, and a face group per cell side.
 *
 * <p>Corner {@code c} of a cell sits at local position (bit 0, bit 1, bit 2) of {@code c} along the
 * cell's local axes 0, 1, 2. Side {@code 2 * axis} is the side where that axis' bit is 0, side
 * {@code 2 * axis + 1} where it is 1. Neighbouring cells must run their local axes the same way
 * across each shared side (up to a reversal of an axis parallel to that side, which leaves the
 * side's diagonal unchanged); this keeps the Kuhn split conforming.
 */
final class HexGrid {
  /** Marks a cell side that emits no boundary or interface faces. */
  static final int NO_FACE = -1;

  final double[] xyz;
  final int[] corners;
  final int[] cellGroup;
  final int[] sideGroup;
  final List<VolumeGroup> volumeGroups;
  final List<FaceGroup> faceGroups;

  /**
   * @param xyz node coordinates, three per node
   * @param corners eight node indices per cell
   * @param cellGroup volume group index per cell
   * @param sideGroup six entries per cell: face group index of that side, or {@link #NO_FACE}
   */
  HexGrid(
      double[] xyz,
      int[] corners,
      int[] cellGroup,
      int[] sideGroup,
      List<VolumeGroup> volumeGroups,
      List<FaceGroup> faceGroups) {
    this.xyz = xyz;
    this.corners = corners;
    this.cellGroup = cellGroup;
    this.sideGroup = sideGroup;
    this.volumeGroups = List.copyOf(volumeGroups);
    this.faceGroups = List.copyOf(faceGroups);
  }

  int cellCount() {
    return cellGroup.length;
  }
}
