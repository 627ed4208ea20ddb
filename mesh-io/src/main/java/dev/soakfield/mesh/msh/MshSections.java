package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.RawMesh;
import java.util.Arrays;

/** Steps shared by the 2.2 and 4.1 parsers: the required sections and the final hand-over. */
final class MshSections {
  private MshSections() {}

  static void requireNodesAndElements(MshCursor c, boolean nodes, boolean elements) {
    if (!nodes || !elements) {
      throw c.error(
          c.end,
          "end of file without " + (nodes ? "an $Elements" : "a $Nodes") + " section",
          "a $Nodes and an $Elements section");
    }
  }

  /** Copies what was read into the raw mesh, trimmed to size. */
  static void fill(RawMesh raw, NodeStore nodes, ElementStore elements) {
    raw.xyz =
        nodes.xyz.length == 3 * nodes.count ? nodes.xyz : Arrays.copyOf(nodes.xyz, 3 * nodes.count);
    raw.nodeIds =
        nodes.tags.length == nodes.count ? nodes.tags : Arrays.copyOf(nodes.tags, nodes.count);
    raw.order = elements.order == 0 ? 1 : elements.order;
    raw.tets = Arrays.copyOf(elements.tets, elements.tetCount * elements.nodesPerTet());
    raw.tetIds = Arrays.copyOf(elements.tetIds, elements.tetCount);
    raw.tetTags = Arrays.copyOf(elements.tetTags, elements.tetCount);
    raw.tris = Arrays.copyOf(elements.tris, elements.triCount * elements.nodesPerTri());
    raw.triIds = Arrays.copyOf(elements.triIds, elements.triCount);
    raw.triTags = Arrays.copyOf(elements.triTags, elements.triCount);
    raw.skippedPoints = elements.skippedPoints;
    raw.skippedLines = elements.skippedLines;
  }
}
