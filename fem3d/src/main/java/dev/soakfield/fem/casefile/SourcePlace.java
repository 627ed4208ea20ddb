package dev.soakfield.fem.casefile;

/**
 * Where a value stands in the case file, so that later checks (against the mesh, by the run) can
 * point at it.
 *
 * @param line 1-based line of the value's first character
 * @param column 1-based column
 */
public record SourcePlace(int line, int column) {}
