package dev.soakfield.cli;

import dev.soakfield.mesh.gen.CellCountsException;
import java.util.Arrays;
import java.util.function.Supplier;
import picocli.CommandLine.Option;

/**
 * The round meshers raise cell counts that would make flat tetrahedra; {@code --cells-as-given}
 * keeps them, and the note says what was raised.
 */
final class RoundCells {
  @Option(
      names = "--cells-as-given",
      description =
          "Keep the cell counts exactly; by default a count is raised where a cell's tetrahedra"
              + " would have a dihedral angle under 10° (a graded direction by cutting each of its"
              + " cells into equal ones).")
  boolean asGiven;

  private String note = "";

  /**
   * Asks the mesher for the counts it will use and keeps the note for them.
   *
   * @throws UserInputException when the mesher refuses to raise the counts that far
   */
  void settle(int[] given, Supplier<int[]> counts) {
    int[] used;
    try {
      used = counts.get();
    } catch (CellCountsException e) {
      throw new UserInputException(
          String.format(
              "--cells: found %s, whose tetrahedra would have dihedral angles under 10°, expected"
                  + " counts that keep them at 10° or more within %,.0f tetrahedra; raising them"
                  + " reached %s (%,.0f tetrahedra) without settling: the thinnest cell sets the"
                  + " size of the others, so a gentler --grade ratio or fewer cells across needs"
                  + " fewer; --cells-as-given keeps the counts (with flat tetrahedra)",
              CellCountsException.joined(e.given()),
              e.cap(),
              CellCountsException.joined(e.reached()),
              e.reachedTets()));
    }
    note =
        Arrays.equals(given, used)
            ? ""
            : String.format(
                "cells raised from %s to %s so that no tetrahedron has a dihedral angle under 10°"
                    + " (flat tetrahedra spoil the solve); --cells-as-given keeps the counts",
                CellCountsException.joined(given), CellCountsException.joined(used));
  }

  String note() {
    return note;
  }
}
