package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.RawMesh;
import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the sections of an MSH 4.1 file (ASCII or binary) after $MeshFormat. Group tags come from
 * the entities that element blocks name, resolved once every section is in, so $Entities and
 * $PhysicalNames may stand anywhere; $Nodes must come before $Elements.
 */
final class Msh4Parser extends MshSectionParser {
  private final List<ElementBlock> blocks = new ArrayList<>();
  private EntityTable entities;

  Msh4Parser(MshCursor c, RawMesh raw) {
    super(c, raw);
  }

  @Override
  boolean readOwnSection(String name, int at) {
    if (!name.equals("Entities")) {
      return false;
    }
    if (entities != null) {
      throw c.error(at, "a second $Entities section", "one $Entities section");
    }
    entities = EntityTable.read(c);
    return true;
  }

  @Override
  void readNodes() {
    if (c.isBinary()) {
      readNodesBinary();
    } else {
      readNodesAscii();
    }
  }

  @Override
  void resolveGroups() {
    GroupResolver.resolve41(c, raw, elements, blocks, entities);
  }

  // ---- nodes -------------------------------------------------------------------------------

  private void readNodesAscii() {
    int headerAt = c.headerAt;
    // a node takes at least `1` and `0 0 0` on two lines: 8 bytes
    long blockCount = c.nextCount("number of node blocks", 8);
    long nodeCount = c.nextCount("number of nodes", 8);
    c.nextLong("smallest node tag");
    c.nextLong("largest node tag");
    c.endOfLine("the $Nodes header");
    nodes.allocate((int) nodeCount);
    long[] tags = nodes.tags;
    double[] xyz = nodes.xyz;
    int[] positions = nodes.positions;
    int read = 0;
    for (long b = 0; b < blockCount; b++) {
      int dim = c.nextInt("entity dimension");
      checkDimension(dim);
      c.nextInt("entity tag");
      int parametric = c.nextInt("parametric flag");
      checkParametric(parametric);
      long n = c.nextCount("number of nodes in the block", 8);
      c.endOfLine("a node block header");
      checkBlockCount(n, nodeCount - read, nodeCount, "nodes", headerAt);
      int first = read;
      int last = read + (int) n;
      for (int i = first; i < last; i++) {
        tags[i] = c.nextTag("node tag");
        positions[i] = c.pos;
        c.endOfLine("a node tag");
      }
      int extra = parametric == 1 ? dim : 0;
      for (int i = first; i < last; i++) {
        xyz[3 * i] = c.nextDouble("x coordinate");
        xyz[3 * i + 1] = c.nextDouble("y coordinate");
        xyz[3 * i + 2] = c.nextDouble("z coordinate");
        for (int k = 0; k < extra; k++) {
          c.nextDouble("parametric coordinate");
        }
        c.endOfLine("the coordinates of a node");
      }
      read = last;
    }
    checkTotal(read, nodeCount, "nodes", headerAt);
    nodes.count = read;
  }

  private void readNodesBinary() {
    int headerAt = c.headerAt;
    int s = c.sizeT();
    long blockCount = c.sizeCount("number of node blocks", 12 + s);
    long nodeCount = c.sizeCount("number of nodes", 24 + s);
    c.size("smallest node tag");
    c.size("largest node tag");
    nodes.allocate((int) nodeCount);
    long[] tags = nodes.tags;
    double[] xyz = nodes.xyz;
    int[] positions = nodes.positions;
    ByteBuffer v = c.view();
    int read = 0;
    for (long b = 0; b < blockCount; b++) {
      int dim = c.int32("entity dimension");
      checkDimension(dim);
      c.int32("entity tag");
      int parametric = c.int32("parametric flag");
      checkParametric(parametric);
      long n = c.sizeCount("number of nodes in the block", 24 + s);
      checkBlockCount(n, nodeCount - read, nodeCount, "nodes", headerAt);
      int first = read;
      int last = read + (int) n;
      c.need(n * s, "node tags");
      int p = c.pos;
      for (int i = first; i < last; i++, p += s) {
        long tag = s == 8 ? v.getLong(p) : v.getInt(p) & 0xffffffffL;
        if (tag <= 0) {
          throw c.error(p, "node tag " + Long.toUnsignedString(tag), "a positive node tag");
        }
        tags[i] = tag;
        positions[i] = p;
      }
      c.pos = p;
      int extra = parametric == 1 ? dim : 0;
      c.need(n * (24 + 8L * extra), "node coordinates");
      for (int i = first; i < last; i++) {
        for (int k = 0; k < 3; k++, p += 8) {
          double x = v.getDouble(p);
          if (!Double.isFinite(x)) {
            throw c.error(p, "coordinate " + x, "a finite number");
          }
          xyz[3 * i + k] = x;
        }
        p += 8 * extra;
      }
      c.pos = p;
      read = last;
    }
    checkTotal(read, nodeCount, "nodes", headerAt);
    nodes.count = read;
  }

  // ---- elements ------------------------------------------------------------------------------

  @Override
  void readElementsAscii() {
    int headerAt = c.headerAt;
    long blockCount = c.nextCount("number of element blocks", 8);
    // the smallest element is a point: `1 1` and a line break
    long elementCount = c.nextCount("number of elements", 4);
    c.nextLong("smallest element tag");
    c.nextLong("largest element tag");
    c.endOfLine("the $Elements header");
    NodeIndex index = nodes.index();
    long read = 0;
    for (long b = 0; b < blockCount; b++) {
      int at = c.startOfToken(c.pos);
      int dim = c.nextInt("entity dimension");
      checkDimension(dim);
      int entity = c.nextIntTag("entity tag");
      int type = c.nextInt("element type");
      ElementTypes.Use use = ElementTypes.use(type);
      if (use == ElementTypes.Use.REJECT) {
        throw c.error(at, ElementTypes.describe(type), ElementTypes.SUPPORTED);
      }
      int k = ElementTypes.nodes(type);
      long n = c.nextCount("number of elements in the block", 2L * (k + 1));
      c.endOfLine("an element block header");
      checkBlockCount(n, elementCount - read, elementCount, "elements", headerAt);
      read += n;
      if (use == ElementTypes.Use.SKIP_POINT || use == ElementTypes.Use.SKIP_LINE) {
        for (long e = 0; e < n; e++) {
          for (int j = 0; j <= k; j++) {
            c.nextLong(j == 0 ? "element tag" : "node tag");
          }
          c.endOfLine("the node tags of an element");
        }
        if (use == ElementTypes.Use.SKIP_POINT) {
          elements.skippedPoints += n;
        } else {
          elements.skippedLines += n;
        }
        continue;
      }
      boolean tet = use == ElementTypes.Use.TET;
      checkBlockDimension(at, type, dim, tet ? 3 : 2);
      elements.checkOrder(c, at, type);
      int first = tet ? elements.addTets((int) n) : elements.addTris((int) n);
      int[] conn = tet ? elements.tets : elements.tris;
      long[] ids = tet ? elements.tetIds : elements.triIds;
      int last = first + (int) n;
      for (int e = first; e < last; e++) {
        ids[e] = c.nextTag("element tag");
        int base = e * k;
        for (int j = 0; j < k; j++) {
          long tag = c.nextLong("node tag");
          int node = index.indexOf(tag);
          if (node < 0) {
            throw missingNode(c.tokenStartBefore(), ids[e], tag);
          }
          conn[base + j] = node;
        }
        c.endOfLine("the node tags of an element");
      }
      blocks.add(new ElementBlock(tet, dim, entity, first, (int) n, at));
    }
    checkTotal(read, elementCount, "elements", headerAt);
  }

  @Override
  void readElementsBinary() {
    int headerAt = c.headerAt;
    int s = c.sizeT();
    long blockCount = c.sizeCount("number of element blocks", 12 + s);
    long elementCount = c.sizeCount("number of elements", 2L * s);
    c.size("smallest element tag");
    c.size("largest element tag");
    NodeIndex index = nodes.index();
    ByteBuffer v = c.view();
    long read = 0;
    for (long b = 0; b < blockCount; b++) {
      int at = c.pos;
      int dim = c.int32("entity dimension");
      checkDimension(dim);
      int entity = c.int32("entity tag");
      if (entity <= 0) {
        throw c.error(at + 4, "entity tag " + entity, "a positive entity tag");
      }
      int type = c.int32("element type");
      ElementTypes.Use use = ElementTypes.use(type);
      if (use == ElementTypes.Use.REJECT) {
        throw c.error(at + 8, ElementTypes.describe(type), ElementTypes.SUPPORTED);
      }
      int k = ElementTypes.nodes(type);
      long n = c.sizeCount("number of elements in the block", (long) s * (k + 1));
      checkBlockCount(n, elementCount - read, elementCount, "elements", headerAt);
      read += n;
      if (use == ElementTypes.Use.SKIP_POINT || use == ElementTypes.Use.SKIP_LINE) {
        c.pos += (int) (n * s * (k + 1));
        if (use == ElementTypes.Use.SKIP_POINT) {
          elements.skippedPoints += n;
        } else {
          elements.skippedLines += n;
        }
        continue;
      }
      boolean tet = use == ElementTypes.Use.TET;
      checkBlockDimension(at, type, dim, tet ? 3 : 2);
      elements.checkOrder(c, at, type);
      int first = tet ? elements.addTets((int) n) : elements.addTris((int) n);
      int[] conn = tet ? elements.tets : elements.tris;
      long[] ids = tet ? elements.tetIds : elements.triIds;
      int last = first + (int) n;
      int p = c.pos;
      for (int e = first; e < last; e++) {
        long id = s == 8 ? v.getLong(p) : v.getInt(p) & 0xffffffffL;
        if (id <= 0) {
          throw c.error(p, "element tag " + Long.toUnsignedString(id), "a positive element tag");
        }
        ids[e] = id;
        p += s;
        int base = e * k;
        for (int j = 0; j < k; j++, p += s) {
          long tag = s == 8 ? v.getLong(p) : v.getInt(p) & 0xffffffffL;
          int node = index.indexOf(tag);
          if (node < 0) {
            throw missingNode(p, id, tag);
          }
          conn[base + j] = node;
        }
      }
      c.pos = p;
      blocks.add(new ElementBlock(tet, dim, entity, first, (int) n, at));
    }
    checkTotal(read, elementCount, "elements", headerAt);
  }

  // ---- checks ------------------------------------------------------------------------------

  private RuntimeException missingNode(int at, long element, long tag) {
    return c.error(
        at,
        "node tag " + Long.toUnsignedString(tag) + " in element " + element,
        "a node tag listed in $Nodes");
  }

  private void checkDimension(int dim) {
    if (dim < 0 || dim > 3) {
      int at = c.isBinary() ? c.pos - 4 : c.tokenStartBefore();
      throw c.error(at, "entity dimension " + dim, "0, 1, 2 or 3");
    }
  }

  private void checkParametric(int flag) {
    if (flag != 0 && flag != 1) {
      int at = c.isBinary() ? c.pos - 4 : c.tokenStartBefore();
      throw c.error(at, "parametric flag " + flag, "0 or 1");
    }
  }

  private void checkBlockDimension(int at, int type, int dim, int wanted) {
    if (dim != wanted) {
      throw c.error(
          at,
          ElementTypes.describe(type) + " in an entity of dimension " + dim,
          "dimension " + wanted + " for this element type");
    }
  }

  private void checkBlockCount(long n, long left, long declared, String what, int headerAt) {
    if (n > left) {
      int at = c.isBinary() ? c.pos - c.sizeT() : c.tokenStartBefore();
      throw c.error(
          at,
          "a block of " + n + " " + what + " with " + left + " of the " + declared + " left",
          "block sizes that add up to the count declared at " + c.location(headerAt));
    }
  }

  private void checkTotal(long read, long declared, String what, int headerAt) {
    if (read != declared) {
      throw c.error(
          c.pos,
          read + " " + what + " in the blocks",
          declared + " as declared at " + c.location(headerAt));
    }
  }
}
