package dev.soakfield.mesh;

/** Where the triangles of a face group lie. */
public enum FaceGroupKind {
  /** On the outside of the mesh: each face belongs to exactly one tetrahedron. */
  EXTERIOR,
  /**
   * Inside the mesh: each face is shared by two tetrahedra (usually of different volume groups).
   */
  INTERFACE
}
