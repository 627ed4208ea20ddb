package dev.soakfield.mesh;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What a mesh file holds before topology is built: nodes, tetrahedra and tagged triangles with
 * their group tags, as a reader found them. Node references are already dense indices (0 ..
 * nodeCount-1) in file order; the file's own node and element ids are kept for messages.
 *
 * <p>A mutable carrier between a reader and {@code dev.soakfield.mesh.topo.MeshAssembler}; its
 * fields are public by design, like a C struct, so readers can fill them in tight loops.
 */
public final class RawMesh {
  /** File name, used in every message about this mesh. */
  public String source = "mesh";

  /** Node coordinates x0, y0, z0, x1, ...; length 3 * nodeCount. */
  public double[] xyz = new double[0];

  /** The file's node id of each dense node index. */
  public long[] nodeIds = new long[0];

  /** 1 for 4-node tetrahedra and 3-node triangles, 2 for 10-node and 6-node. */
  public int order = 1;

  /** Tetrahedron connectivity, 4 or 10 dense node indices each (MSH node order). */
  public int[] tets = new int[0];

  /** Group tag of each tetrahedron: its physical tag, or its entity tag when the file has none. */
  public int[] tetTags = new int[0];

  /** The file's element id of each tetrahedron. */
  public long[] tetIds = new long[0];

  /** Triangle connectivity, 3 or 6 dense node indices each. */
  public int[] tris = new int[0];

  /** Group tag of each triangle: its physical tag, or its entity tag when the file has none. */
  public int[] triTags = new int[0];

  /** The file's element id of each triangle. */
  public long[] triIds = new long[0];

  /** Names of volume tags that the file names (physical names); the rest get made-up names. */
  public final Map<Integer, String> volumeNames = new LinkedHashMap<>();

  /** Names of surface tags that the file names (physical names); the rest get made-up names. */
  public final Map<Integer, String> surfaceNames = new LinkedHashMap<>();

  /** False when the tags are entity tags because the file declares no physical groups. */
  public boolean physicalTags = true;

  /** Point elements skipped. */
  public long skippedPoints;

  /** Line elements (2- and 3-node) skipped. */
  public long skippedLines;

  /** What the reader noticed that the user should hear about. */
  public final List<MeshFinding> findings = new ArrayList<>();

  public int nodeCount() {
    return xyz.length / 3;
  }

  public int tetCount() {
    return tetTags.length;
  }

  public int triCount() {
    return triTags.length;
  }
}
