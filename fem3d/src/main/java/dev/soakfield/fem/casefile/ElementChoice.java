package dev.soakfield.fem.casefile;

/** The element order a case asks for ({@code "elements"}). */
public enum ElementChoice {
  /** Use the order the mesh file holds (the default). */
  AS_MESHED("as meshed"),
  /** 4-node tetrahedra; mid-edge nodes of a quadratic mesh are ignored. */
  LINEAR("linear"),
  /** 10-node tetrahedra; a linear mesh gets mid-edge nodes. */
  QUADRATIC("quadratic");

  private final String word;

  ElementChoice(String word) {
    this.word = word;
  }

  /** The spelling in a case file. */
  public String word() {
    return word;
  }

  /** The element order (1 or 2) to run with, given the order of the mesh as read. */
  public int orderFor(int meshOrder) {
    if (meshOrder != 1 && meshOrder != 2) {
      throw new IllegalArgumentException("mesh order must be 1 or 2, got " + meshOrder);
    }
    return switch (this) {
      case AS_MESHED -> meshOrder;
      case LINEAR -> 1;
      case QUADRATIC -> 2;
    };
  }
}
