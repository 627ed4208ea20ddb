package dev.soakfield.mesh.topo;

import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.RawMesh;

/**
 * Checks a {@link RawMesh} before assembly. Arrays that do not fit together are a reader's defect
 * ({@link IllegalArgumentException}); contents a user's file can cause are a {@link
 * MeshInputException} naming the file and the element or node.
 */
final class RawInput {
  /** Tetrahedron faces and triangles are numbered together in an int. */
  private static final long MAX_ITEMS = Integer.MAX_VALUE - 8L;

  private RawInput() {}

  static void check(RawMesh raw) {
    if (raw.order != 1 && raw.order != 2) {
      throw new IllegalArgumentException("order must be 1 or 2, got " + raw.order);
    }
    int nodesPerTet = raw.order == 1 ? 4 : 10;
    int nodesPerTri = raw.order == 1 ? 3 : 6;
    if (raw.xyz.length % 3 != 0 || raw.nodeIds.length != raw.nodeCount()) {
      throw new IllegalArgumentException(
          raw.xyz.length + " coordinates do not fit " + raw.nodeIds.length + " node ids");
    }
    sizes("tetrahedron", raw.tets, raw.tetIds.length, raw.tetCount(), nodesPerTet);
    sizes("triangle", raw.tris, raw.triIds.length, raw.triCount(), nodesPerTri);
    ranges("tetrahedron", raw.tets, raw.nodeCount(), nodesPerTet);
    ranges("triangle", raw.tris, raw.nodeCount(), nodesPerTri);
    if (raw.tetCount() == 0) {
      throw new MeshInputException(
          raw.source,
          "",
          "no tetrahedra (" + raw.triCount() + " triangles)",
          "a volume mesh with 4- or 10-node tetrahedra");
    }
    if (4L * raw.tetCount() + raw.triCount() > MAX_ITEMS) {
      throw new MeshInputException(
          raw.source,
          "",
          raw.tetCount() + " tetrahedra and " + raw.triCount() + " triangles",
          "at most " + MAX_ITEMS + " tetrahedron faces and triangles together");
    }
    for (int i = 0; i < raw.xyz.length; i++) {
      if (!Double.isFinite(raw.xyz[i])) {
        throw new MeshInputException(
            raw.source,
            "node " + raw.nodeIds[i / 3],
            "coordinate " + raw.xyz[i],
            "a finite number");
      }
    }
    positiveTags(raw.source, raw.tetTags, raw.tetIds);
    positiveTags(raw.source, raw.triTags, raw.triIds);
  }

  private static void sizes(String what, int[] conn, int ids, int count, int per) {
    if (conn.length != (long) count * per || ids != count) {
      throw new IllegalArgumentException(
          what
              + " arrays do not fit: "
              + conn.length
              + " node references, "
              + ids
              + " ids, "
              + count
              + " tags, "
              + per
              + " nodes each");
    }
  }

  private static void ranges(String what, int[] conn, int nodeCount, int per) {
    for (int i = 0; i < conn.length; i++) {
      if (conn[i] < 0 || conn[i] >= nodeCount) {
        throw new IllegalArgumentException(
            what + " " + i / per + " refers to node index " + conn[i] + " of " + nodeCount);
      }
    }
  }

  private static void positiveTags(String source, int[] tags, long[] ids) {
    for (int i = 0; i < tags.length; i++) {
      if (tags[i] <= 0) {
        throw new MeshInputException(
            source, "element " + ids[i], "group tag " + tags[i], "a positive tag");
      }
    }
  }
}
