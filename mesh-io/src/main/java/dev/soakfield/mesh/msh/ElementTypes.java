package dev.soakfield.mesh.msh;

/**
 * The MSH element type numbers this reader knows: their node counts, and which ones it keeps, skips
 * or rejects. Numbers and node counts follow the published MSH format description.
 */
final class ElementTypes {
  static final int TRI3 = 2;
  static final int TET4 = 4;
  static final int TRI6 = 9;
  static final int TET10 = 11;

  /** What the reader does with an element of some type. */
  enum Use {
    TET,
    TRIANGLE,
    SKIP_POINT,
    SKIP_LINE,
    REJECT
  }

  static final String SUPPORTED = "only 4- or 10-node tetrahedra and 3- or 6-node triangles";

  private ElementTypes() {}

  static Use use(int type) {
    return switch (type) {
      case TET4, TET10 -> Use.TET;
      case TRI3, TRI6 -> Use.TRIANGLE;
      case 15 -> Use.SKIP_POINT;
      case 1, 8, 26, 27, 28 -> Use.SKIP_LINE;
      default -> Use.REJECT;
    };
  }

  /** Nodes of an element of {@code type}, for types that are kept or skipped; 0 otherwise. */
  static int nodes(int type) {
    return switch (type) {
      case 15 -> 1;
      case 1 -> 2;
      case 8, TRI3 -> 3;
      case TET4, 26 -> 4;
      case 27 -> 5;
      case TRI6, 28 -> 6;
      case TET10 -> 10;
      default -> 0;
    };
  }

  /** Element order of a kept type: 1 or 2. */
  static int order(int type) {
    return type == TET10 || type == TRI6 ? 2 : 1;
  }

  /** "element type 5 (8-node hexahedron)" and the like, for messages. */
  static String describe(int type) {
    return "element type " + type + " (" + name(type) + ")";
  }

  static String name(int type) {
    return switch (type) {
      case 1 -> "2-node line";
      case 2 -> "3-node triangle";
      case 3 -> "4-node quadrangle";
      case 4 -> "4-node tetrahedron";
      case 5 -> "8-node hexahedron";
      case 6 -> "6-node prism";
      case 7 -> "5-node pyramid";
      case 8 -> "3-node line";
      case 9 -> "6-node triangle";
      case 10 -> "9-node quadrangle";
      case 11 -> "10-node tetrahedron";
      case 12 -> "27-node hexahedron";
      case 13 -> "18-node prism";
      case 14 -> "14-node pyramid";
      case 15 -> "point";
      case 16 -> "8-node quadrangle";
      case 17 -> "20-node hexahedron";
      case 18 -> "15-node prism";
      case 19 -> "13-node pyramid";
      case 20 -> "9-node triangle";
      case 21 -> "10-node triangle";
      case 26 -> "4-node line";
      case 27 -> "5-node line";
      case 28 -> "6-node line";
      case 29 -> "20-node tetrahedron";
      default -> "not a type this reader knows";
    };
  }
}
