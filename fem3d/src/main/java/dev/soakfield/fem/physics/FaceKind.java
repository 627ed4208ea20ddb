package dev.soakfield.fem.physics;

/** What happens at a face group: the four partitions of the boundary. */
public enum FaceKind {
  /** Concentration prescribed (Dirichlet on the potential, through the adjacent solubility). */
  CONCENTRATION,
  /** Inward amount per area and time prescribed (Neumann). */
  FLUX,
  /** Inward flux h·(c_env − c), a surface transfer coefficient (Robin). */
  EXCHANGE,
  /** No flux. */
  SEALED
}
