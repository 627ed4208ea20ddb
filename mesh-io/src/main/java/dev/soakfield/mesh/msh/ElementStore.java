package dev.soakfield.mesh.msh;

import java.util.Arrays;

/**
 * Tetrahedra and triangles as they are read: connectivity in dense node indices, the file's element
 * ids and group tags, in growable arrays. Also holds the one element order the file may use.
 */
final class ElementStore {
  int order;
  private int orderType;

  int[] tets = new int[0];
  long[] tetIds = new long[0];
  int[] tetTags = new int[0];
  int tetCount;

  int[] tris = new int[0];
  long[] triIds = new long[0];
  int[] triTags = new int[0];
  int triCount;

  long skippedPoints;
  long skippedLines;

  int nodesPerTet() {
    return order == 2 ? 10 : 4;
  }

  int nodesPerTri() {
    return order == 2 ? 6 : 3;
  }

  /** Fixes the element order on the first kept type; a later type of another order is an error. */
  void checkOrder(MshCursor c, int at, int type) {
    int o = ElementTypes.order(type);
    if (order == 0) {
      order = o;
      orderType = type;
    } else if (o != order) {
      throw c.error(
          at,
          ElementTypes.describe(type) + " after " + ElementTypes.describe(orderType),
          "one element order throughout: 4-node tetrahedra with 3-node triangles,"
              + " or 10-node tetrahedra with 6-node triangles");
    }
  }

  /** Room for {@code n} more tetrahedra; returns the index of the first. */
  int addTets(int n) {
    int needed = tetCount + n;
    if (needed > tetIds.length) {
      int cap = (int) Math.min(Integer.MAX_VALUE - 16, Math.max(needed, 2L * tetIds.length));
      tets = Arrays.copyOf(tets, cap * nodesPerTet());
      tetIds = Arrays.copyOf(tetIds, cap);
      tetTags = Arrays.copyOf(tetTags, cap);
    }
    int first = tetCount;
    tetCount = needed;
    return first;
  }

  /** Room for {@code n} more triangles; returns the index of the first. */
  int addTris(int n) {
    int needed = triCount + n;
    if (needed > triIds.length) {
      int cap = (int) Math.min(Integer.MAX_VALUE - 16, Math.max(needed, 2L * triIds.length));
      tris = Arrays.copyOf(tris, cap * nodesPerTri());
      triIds = Arrays.copyOf(triIds, cap);
      triTags = Arrays.copyOf(triTags, cap);
    }
    int first = triCount;
    triCount = needed;
    return first;
  }

  /** Removes the triangles whose tag is 0 (those without a group); returns how many went. */
  int dropUntaggedTris() {
    int per = nodesPerTri();
    int kept = 0;
    for (int i = 0; i < triCount; i++) {
      if (triTags[i] != 0) {
        if (kept != i) {
          System.arraycopy(tris, i * per, tris, kept * per, per);
          triIds[kept] = triIds[i];
          triTags[kept] = triTags[i];
        }
        kept++;
      }
    }
    int dropped = triCount - kept;
    triCount = kept;
    return dropped;
  }
}
