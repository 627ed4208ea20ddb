package dev.soakfield.mesh.msh;

/**
 * A run of kept elements that an MSH 4.1 block assigns to one entity.
 *
 * @param tets true for tetrahedra, false for triangles
 * @param entityDim dimension of the entity the block names
 * @param entityTag tag of that entity
 * @param first index of the block's first element among the tetrahedra (or triangles)
 * @param count number of elements
 * @param at byte position of the block header, for messages
 */
record ElementBlock(boolean tets, int entityDim, int entityTag, int first, int count, int at) {}
