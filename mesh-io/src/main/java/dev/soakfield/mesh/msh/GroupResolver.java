package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.MeshFinding;
import dev.soakfield.mesh.RawMesh;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Gives each tetrahedron and triangle its group tag: its physical tag when the file has physical
 * groups, its entity tag otherwise (with a warning). Triangles outside every physical group of a
 * file that has them are dropped with a warning; such tetrahedra are an error, because a part of
 * the body without a material cannot be analysed.
 */
final class GroupResolver {
  private GroupResolver() {}

  static void resolve41(
      MshCursor c, RawMesh raw, ElementStore el, List<ElementBlock> blocks, EntityTable entities) {
    boolean physical = false;
    if (entities != null) {
      for (ElementBlock b : blocks) {
        int[] p = entities.physicalTags(b.entityDim(), b.entityTag());
        physical |= p != null && p.length > 0;
      }
    }
    raw.physicalTags = physical;
    Set<String> missing = new LinkedHashSet<>();
    Set<String> several = new LinkedHashSet<>();
    Set<String> untagged = new LinkedHashSet<>();
    for (ElementBlock b : blocks) {
      int[] tags = b.tets() ? el.tetTags : el.triTags;
      String entity = (b.entityDim() == 3 ? "volume " : "surface ") + b.entityTag();
      int tag;
      int[] p = physical ? entities.physicalTags(b.entityDim(), b.entityTag()) : null;
      if (!physical) {
        tag = b.entityTag();
      } else if (p == null) {
        tag = b.entityTag();
        missing.add(entity);
      } else if (p.length == 0) {
        if (b.tets()) {
          throw c.error(
              b.at(),
              "tetrahedra of " + entity + ", which belongs to no physical group",
              "every tetrahedron in a physical volume when the file defines physical groups");
        }
        tag = 0;
        untagged.add(entity);
      } else {
        tag = p[0];
        if (p.length > 1) {
          several.add(entity + " (tags " + Arrays.toString(p) + ", kept " + p[0] + ")");
        }
      }
      Arrays.fill(tags, b.first(), b.first() + b.count(), tag);
    }
    if (!physical && !blocks.isEmpty()) {
      raw.findings.add(noPhysicalGroups());
    }
    if (!missing.isEmpty()) {
      raw.findings.add(
          MeshFinding.warning(
              "msh-entity-not-listed",
              "element blocks name entities that $Entities does not list, so their groups are"
                  + " named by entity tag: "
                  + String.join(", ", missing)));
    }
    if (!several.isEmpty()) {
      raw.findings.add(
          MeshFinding.warning(
              "msh-several-physical-tags",
              "entities in more than one physical group; the first group is used: "
                  + String.join(", ", several)));
    }
    if (!untagged.isEmpty()) {
      int dropped = el.dropUntaggedTris();
      raw.findings.add(droppedTriangles(dropped, String.join(", ", untagged)));
    }
  }

  /**
   * MSH 2.2: {@code tetTags}/{@code triTags} hold the physical tags read, {@code tetEntities} and
   * {@code triEntities} the elementary ones; a tag of 0 or less means none.
   */
  static void resolve22(
      MshCursor c,
      RawMesh raw,
      ElementStore el,
      int[] tetEntities,
      int[] triEntities,
      int firstTetWithoutPhysical,
      int firstWithoutAnyTag) {
    boolean physical = false;
    for (int i = 0; i < el.tetCount && !physical; i++) {
      physical = el.tetTags[i] > 0;
    }
    for (int i = 0; i < el.triCount && !physical; i++) {
      physical = el.triTags[i] > 0;
    }
    raw.physicalTags = physical;
    if (!physical) {
      if (firstWithoutAnyTag >= 0) {
        throw c.error(
            firstWithoutAnyTag,
            "an element with neither a physical nor an elementary tag",
            "a physical or an elementary tag on every tetrahedron and triangle");
      }
      System.arraycopy(tetEntities, 0, el.tetTags, 0, el.tetCount);
      System.arraycopy(triEntities, 0, el.triTags, 0, el.triCount);
      if (el.tetCount + el.triCount > 0) {
        raw.findings.add(noPhysicalGroups());
      }
      return;
    }
    if (firstTetWithoutPhysical >= 0) {
      throw c.error(
          firstTetWithoutPhysical,
          "a tetrahedron with no physical tag",
          "every tetrahedron in a physical volume when the file defines physical groups");
    }
    for (int i = 0; i < el.triCount; i++) {
      el.triTags[i] = Math.max(0, el.triTags[i]);
    }
    int dropped = el.dropUntaggedTris();
    if (dropped > 0) {
      raw.findings.add(droppedTriangles(dropped, "elements with physical tag 0"));
    }
  }

  private static MeshFinding noPhysicalGroups() {
    return MeshFinding.warning(
        "msh-no-physical-groups",
        "the file defines no physical groups; groups are formed and named by entity tags");
  }

  private static MeshFinding droppedTriangles(int count, String where) {
    return MeshFinding.warning(
        "msh-triangles-without-group",
        count + " triangles belong to no physical group and were left out: " + where);
  }
}
