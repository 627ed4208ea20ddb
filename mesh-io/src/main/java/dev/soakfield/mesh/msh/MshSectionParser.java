package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.RawMesh;

/**
 * The section loop both MSH versions share: physical names, nodes before elements, each section
 * once, unknown sections skipped to their end tag. A version supplies how it reads nodes and
 * elements, any sections of its own, and how groups are resolved once every section is in.
 */
abstract class MshSectionParser {
  final MshCursor c;
  final RawMesh raw;
  final NodeStore nodes = new NodeStore();
  final ElementStore elements = new ElementStore();
  private boolean elementsRead;

  MshSectionParser(MshCursor c, RawMesh raw) {
    this.c = c;
    this.raw = raw;
  }

  abstract void readNodes();

  abstract void readElementsAscii();

  abstract void readElementsBinary();

  private void readElements() {
    if (c.isBinary()) {
      readElementsBinary();
    } else {
      readElementsAscii();
    }
  }

  /** Reads a section only this version knows; false when {@code name} is not one of them. */
  boolean readOwnSection(String name, int at) {
    return false;
  }

  /** Turns element tags into group tags once all sections are read. */
  abstract void resolveGroups();

  final void parse() {
    for (String name = c.nextSectionName(); name != null; name = c.nextSectionName()) {
      int at = c.headerAt;
      switch (name) {
        case "PhysicalNames" -> PhysicalNames.read(c, raw);
        case "Nodes" -> {
          if (nodes.isRead()) {
            throw c.error(at, "a second $Nodes section", "one $Nodes section");
          }
          readNodes();
          c.expectEnd("Nodes");
          nodes.buildIndex(c);
        }
        case "Elements" -> {
          if (!nodes.isRead()) {
            throw c.error(at, "$Elements before $Nodes", "$Nodes first");
          }
          if (elementsRead) {
            throw c.error(at, "a second $Elements section", "one $Elements section");
          }
          readElements();
          c.expectEnd("Elements");
          elementsRead = true;
        }
        case "MeshFormat" -> throw c.error(at, "a second $MeshFormat", "one $MeshFormat");
        default -> {
          if (!readOwnSection(name, at)) {
            c.skipSection(name, at);
          }
        }
      }
    }
    MshSections.requireNodesAndElements(c, nodes.isRead(), elementsRead);
    resolveGroups();
    MshSections.fill(raw, nodes, elements);
  }
}
