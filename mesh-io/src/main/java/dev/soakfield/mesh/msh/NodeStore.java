package dev.soakfield.mesh.msh;

/** The nodes of a file as they are read: tags, coordinates and where each tag stood. */
final class NodeStore {
  long[] tags = new long[0];
  double[] xyz = new double[0];

  /** Byte position of each node's tag, to name the place of a repeated tag. */
  int[] positions = new int[0];

  int count;
  private NodeIndex index;

  boolean isRead() {
    return index != null;
  }

  void allocate(int nodes) {
    tags = new long[nodes];
    xyz = new double[3 * nodes];
    positions = new int[nodes];
  }

  /** Builds the tag index once all nodes are in; a repeated tag is an input error. */
  void buildIndex(MshCursor c) {
    int[] duplicate = new int[1];
    index = NodeIndex.build(tags, count, duplicate);
    if (index == null) {
      int j = duplicate[0];
      int first = 0;
      while (tags[first] != tags[j]) {
        first++;
      }
      throw c.error(
          positions[j],
          "node tag " + tags[j] + " a second time (first as node " + (first + 1) + " of the file)",
          "each node tag once");
    }
  }

  NodeIndex index() {
    return index;
  }
}
