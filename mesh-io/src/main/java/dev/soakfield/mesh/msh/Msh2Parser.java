package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.RawMesh;
import java.nio.ByteBuffer;
import java.util.Arrays;

/**
 * Reads the sections of an MSH 2.2 file (ASCII or binary) after $MeshFormat. Each element carries
 * its own tags: the first is its physical group, the second its elementary entity.
 */
final class Msh2Parser extends MshSectionParser {
  private int[] tetEntities = new int[0];
  private int[] triEntities = new int[0];
  private int firstTetWithoutPhysical = -1;
  private int firstWithoutAnyTag = -1;

  Msh2Parser(MshCursor c, RawMesh raw) {
    super(c, raw);
  }

  @Override
  void resolveGroups() {
    GroupResolver.resolve22(
        c, raw, elements, tetEntities, triEntities, firstTetWithoutPhysical, firstWithoutAnyTag);
  }

  @Override
  void readNodes() {
    boolean binary = c.isBinary();
    // ASCII `1 0 0 0` and a line break; binary int id and three doubles
    long count = c.nextCount("number of nodes", binary ? 28 : 8);
    c.endOfLine("the number of nodes");
    int n = (int) count;
    nodes.allocate(n);
    long[] tags = nodes.tags;
    double[] xyz = nodes.xyz;
    int[] positions = nodes.positions;
    if (!binary) {
      for (int i = 0; i < n; i++) {
        tags[i] = c.nextTag("node number");
        positions[i] = c.pos;
        xyz[3 * i] = c.nextDouble("x coordinate");
        xyz[3 * i + 1] = c.nextDouble("y coordinate");
        xyz[3 * i + 2] = c.nextDouble("z coordinate");
        c.endOfLine("a node");
      }
    } else {
      c.need(28L * n, "node records");
      ByteBuffer v = c.view();
      int p = c.pos;
      for (int i = 0; i < n; i++) {
        int tag = v.getInt(p);
        if (tag <= 0) {
          throw c.error(p, "node number " + tag, "a positive node number");
        }
        tags[i] = tag;
        positions[i] = p;
        p += 4;
        for (int k = 0; k < 3; k++, p += 8) {
          double x = v.getDouble(p);
          if (!Double.isFinite(x)) {
            throw c.error(p, "coordinate " + x, "a finite number");
          }
          xyz[3 * i + k] = x;
        }
      }
      c.pos = p;
    }
    nodes.count = n;
  }

  @Override
  void readElementsAscii() {
    // the smallest element row: `1 15 0 1` and a line break
    long count = c.nextCount("number of elements", 9);
    c.endOfLine("the number of elements");
    NodeIndex index = nodes.index();
    for (long e = 0; e < count; e++) {
      long id = c.nextTag("element number");
      int at = c.tokenStartBefore();
      int type = c.nextInt("element type");
      ElementTypes.Use use = ElementTypes.use(type);
      if (use == ElementTypes.Use.REJECT) {
        int typeAt = c.tokenStartBefore();
        throw c.error(typeAt, ElementTypes.describe(type), ElementTypes.SUPPORTED);
      }
      long tagCount = c.nextCount("number of tags", 2);
      int physical = 0;
      int entity = 0;
      for (long t = 0; t < tagCount; t++) {
        int v = c.nextInt("element tag");
        if (t == 0) {
          physical = v;
        } else if (t == 1) {
          entity = v;
        }
      }
      int k = ElementTypes.nodes(type);
      if (use == ElementTypes.Use.SKIP_POINT || use == ElementTypes.Use.SKIP_LINE) {
        for (int j = 0; j < k; j++) {
          c.nextLong("node number");
        }
        c.endOfLine("the nodes of an element");
        if (use == ElementTypes.Use.SKIP_POINT) {
          elements.skippedPoints++;
        } else {
          elements.skippedLines++;
        }
        continue;
      }
      int[] conn = add(use == ElementTypes.Use.TET, type, at, id, physical, entity);
      int base = (use == ElementTypes.Use.TET ? elements.tetCount - 1 : elements.triCount - 1) * k;
      for (int j = 0; j < k; j++) {
        long tag = c.nextLong("node number");
        int node = index.indexOf(tag);
        if (node < 0) {
          throw missingNode(c.tokenStartBefore(), id, tag);
        }
        conn[base + j] = node;
      }
      c.endOfLine("the nodes of an element");
    }
  }

  @Override
  void readElementsBinary() {
    // binary: at least an int id and one node int per element
    long count = c.nextCount("number of elements", 8);
    c.endOfLine("the number of elements");
    NodeIndex index = nodes.index();
    ByteBuffer v = c.view();
    long read = 0;
    while (read < count) {
      int at = c.pos;
      int type = c.int32("element type of a group header");
      ElementTypes.Use use = ElementTypes.use(type);
      if (use == ElementTypes.Use.REJECT) {
        throw c.error(at, ElementTypes.describe(type), ElementTypes.SUPPORTED);
      }
      int countAt = c.pos;
      long n = c.int32("element count of a group header");
      int tagsAt = c.pos;
      long tagCount = c.int32("tag count of a group header");
      if (n < 0 || n > count - read) {
        throw c.error(
            countAt,
            "a group of " + n + " elements with " + (count - read) + " of " + count + " left",
            "group sizes that add up to the declared number of elements");
      }
      if (tagCount < 0 || tagCount > c.remaining() / 4) {
        throw c.error(tagsAt, "tag count " + tagCount, "a non-negative count the file can hold");
      }
      int k = ElementTypes.nodes(type);
      long per = 4 * (1 + tagCount + k);
      c.checkCount(countAt, n, "number of elements in the group", per);
      read += n;
      if (use == ElementTypes.Use.SKIP_POINT || use == ElementTypes.Use.SKIP_LINE) {
        c.pos += (int) (n * per);
        if (use == ElementTypes.Use.SKIP_POINT) {
          elements.skippedPoints += n;
        } else {
          elements.skippedLines += n;
        }
        continue;
      }
      boolean tet = use == ElementTypes.Use.TET;
      for (long e = 0; e < n; e++) {
        int p = c.pos;
        int id = v.getInt(p);
        if (id <= 0) {
          throw c.error(p, "element number " + id, "a positive element number");
        }
        int physical = tagCount > 0 ? v.getInt(p + 4) : 0;
        int entity = tagCount > 1 ? v.getInt(p + 8) : 0;
        int[] conn = add(tet, type, p, id, physical, entity);
        int base = (tet ? elements.tetCount - 1 : elements.triCount - 1) * k;
        p += (int) (4 * (1 + tagCount));
        for (int j = 0; j < k; j++, p += 4) {
          long tag = v.getInt(p);
          int node = index.indexOf(tag);
          if (node < 0) {
            throw missingNode(p, id, tag);
          }
          conn[base + j] = node;
        }
        c.pos = p;
      }
    }
  }

  /** Appends one tetrahedron or triangle with its tags; returns the connectivity array. */
  private int[] add(boolean tet, int type, int at, long id, int physical, int entity) {
    elements.checkOrder(c, at, type);
    if (physical <= 0 && entity <= 0 && firstWithoutAnyTag < 0) {
      firstWithoutAnyTag = at;
    }
    if (tet) {
      if (physical <= 0 && firstTetWithoutPhysical < 0) {
        firstTetWithoutPhysical = at;
      }
      int i = elements.addTets(1);
      if (tetEntities.length < elements.tetIds.length) {
        tetEntities = Arrays.copyOf(tetEntities, elements.tetIds.length);
      }
      elements.tetIds[i] = id;
      elements.tetTags[i] = physical;
      tetEntities[i] = entity;
      return elements.tets;
    }
    int i = elements.addTris(1);
    if (triEntities.length < elements.triIds.length) {
      triEntities = Arrays.copyOf(triEntities, elements.triIds.length);
    }
    elements.triIds[i] = id;
    elements.triTags[i] = physical;
    triEntities[i] = entity;
    return elements.tris;
  }

  private RuntimeException missingNode(int at, long element, long tag) {
    return c.error(
        at, "node number " + tag + " in element " + element, "a node number listed in $Nodes");
  }
}
