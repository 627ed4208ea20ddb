package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.RawMesh;

/** Reads a $PhysicalNames section (ASCII in every MSH file) into the raw mesh's name maps. */
final class PhysicalNames {
  private PhysicalNames() {}

  static void read(MshCursor c, RawMesh raw) {
    // smallest row: `2 1 ""` and a line break
    long count = c.nextCount("number of physical names", 7);
    c.endOfLine("the number of physical names");
    for (long i = 0; i < count; i++) {
      int dim = c.nextInt("the dimension of a physical group");
      if (dim < 0 || dim > 3) {
        int at = c.tokenStartBefore();
        throw c.error(at, c.tokenAt(at), "a physical group dimension 0, 1, 2 or 3");
      }
      int tag = c.nextIntTag("physical tag");
      int tagAt = c.tokenStartBefore();
      String name = c.nextQuoted("the name of a physical group");
      c.endOfLine("a physical name");
      if (name.isBlank()) {
        raw.findings.add(
            MeshFinding.warning(
                "msh-blank-physical-name",
                "physical group " + tag + " of dimension " + dim + " has a blank name; ignored"));
      } else if (dim == 3 || dim == 2) {
        // one tag, two names would leave the groups' meaning to the order of the lines
        String before = (dim == 3 ? raw.volumeNames : raw.surfaceNames).putIfAbsent(tag, name);
        if (before != null && !before.equals(name)) {
          throw c.error(
              tagAt,
              "physical tag "
                  + tag
                  + " of dimension "
                  + dim
                  + " named '"
                  + before
                  + "' and again '"
                  + name
                  + "'",
              "one name per physical tag");
        }
      }
    }
    c.expectEnd("PhysicalNames");
  }
}
