package dev.soakfield.cli;

import java.util.Arrays;
import picocli.CommandLine.Option;

/**
 * The round meshers raise cell counts that would make flat tetrahedra; {@code --cells-as-given}
 * keeps them, and the note says what was raised.
 */
final class RoundCells {
  @Option(
      names = "--cells-as-given",
      description =
          "Keep the cell counts exactly; by default the around and axial counts (and the radial"
              + " one of an ungraded wall) are raised where a cell would be more than 4 times"
              + " longer than thin, so that no tetrahedron has a dihedral angle under 10°.")
  boolean asGiven;

  private String note = "";

  void used(int[] given, int[] used) {
    note =
        Arrays.equals(given, used)
            ? ""
            : String.format(
                    "cells raised from %d,%d,%d to %d,%d,%d so that no cell is more than 4 times"
                        + " longer than thin (flat tetrahedra, dihedral angles under 10°, spoil the"
                        + " solve); --cells-as-given keeps the counts",
                    given[0], given[1], given[2], used[0], used[1], used[2])
                + (6.0 * used[0] * used[1] * used[2] > 2e6
                    ? "; the thinnest cell across the wall sets the others, so a gentler --grade"
                        + " ratio or fewer cells across makes a smaller mesh"
                    : "");
  }

  String note() {
    return note;
  }
}
