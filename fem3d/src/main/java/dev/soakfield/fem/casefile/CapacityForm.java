package dev.soakfield.fem.casefile;

/** How the capacity (mass) matrix is formed ({@code time.capacity}). */
public enum CapacityForm {
  CONSISTENT("consistent"),
  LUMPED("lumped");

  private final String word;

  CapacityForm(String word) {
    this.word = word;
  }

  /** The spelling in a case file. */
  public String word() {
    return word;
  }
}
