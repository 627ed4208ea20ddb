package dev.soakfield.mesh.msh;

import java.util.HashMap;
import java.util.Map;

/**
 * The physical tags of each surface and volume entity of an MSH 4.1 $Entities section, read in
 * ASCII or binary. Points and curves are read only to get past them; bounding boxes and bounding
 * entities are skipped.
 */
final class EntityTable {
  private static final String[] KIND = {"point", "curve", "surface", "volume"};

  private final Map<Integer, int[]> surfaces = new HashMap<>();
  private final Map<Integer, int[]> volumes = new HashMap<>();

  /** Physical tags of entity {@code tag} of dimension {@code dim} (2 or 3), or null if absent. */
  int[] physicalTags(int dim, int tag) {
    return dim == 3 ? volumes.get(tag) : dim == 2 ? surfaces.get(tag) : null;
  }

  static EntityTable read(MshCursor c) {
    EntityTable t = new EntityTable();
    if (c.isBinary()) {
      t.readBinary(c);
    } else {
      t.readAscii(c);
    }
    c.expectEnd("Entities");
    return t;
  }

  private void readAscii(MshCursor c) {
    long[] counts = new long[4];
    for (int d = 0; d < 4; d++) {
      // smallest point row `1 0 0 0 0`; other rows carry a box of six numbers and two counts
      counts[d] = c.nextCount("number of " + KIND[d] + " entities", d == 0 ? 10 : 18);
    }
    c.endOfLine("the entity counts");
    for (int d = 0; d < 4; d++) {
      for (long i = 0; i < counts[d]; i++) {
        int tag = c.nextIntTag(KIND[d] + " entity tag");
        int coords = d == 0 ? 3 : 6;
        for (int k = 0; k < coords; k++) {
          c.nextDouble("a bounding box coordinate");
        }
        int[] phys = new int[(int) c.nextCount("number of physical tags", 2)];
        for (int k = 0; k < phys.length; k++) {
          phys[k] = c.nextInt("physical tag");
        }
        if (d > 0) {
          long bounding = c.nextCount("number of bounding entities", 2);
          for (long k = 0; k < bounding; k++) {
            c.nextInt("bounding entity tag");
          }
        }
        c.endOfLine(KIND[d] + " entity " + tag);
        store(c, d, tag, phys);
      }
    }
  }

  private void readBinary(MshCursor c) {
    int s = c.sizeT();
    long[] counts = new long[4];
    for (int d = 0; d < 4; d++) {
      counts[d] = c.sizeCount("number of " + KIND[d] + " entities", d == 0 ? 28 + s : 52 + 2L * s);
    }
    for (int d = 0; d < 4; d++) {
      for (long i = 0; i < counts[d]; i++) {
        int at = c.pos;
        int tag = c.int32(KIND[d] + " entity tag");
        if (tag <= 0) {
          throw c.error(at, KIND[d] + " entity tag " + tag, "a positive entity tag");
        }
        c.need(d == 0 ? 24 : 48, "the bounding box of " + KIND[d] + " " + tag);
        c.pos += d == 0 ? 24 : 48;
        int[] phys = new int[(int) c.sizeCount("number of physical tags", 4)];
        for (int k = 0; k < phys.length; k++) {
          phys[k] = c.int32("physical tag");
        }
        if (d > 0) {
          long bounding = c.sizeCount("number of bounding entities", 4);
          c.pos += (int) (4 * bounding);
        }
        store(c, d, tag, phys);
      }
    }
  }

  private void store(MshCursor c, int dim, int tag, int[] phys) {
    for (int p : phys) {
      if (p <= 0) {
        throw c.error(
            c.pos, "physical tag " + p + " on " + KIND[dim] + " " + tag, "positive physical tags");
      }
    }
    Map<Integer, int[]> map = dim == 3 ? volumes : dim == 2 ? surfaces : null;
    if (map != null && map.putIfAbsent(tag, phys) != null) {
      throw c.error(c.pos, KIND[dim] + " entity " + tag + " twice", "each entity tag once");
    }
  }
}
