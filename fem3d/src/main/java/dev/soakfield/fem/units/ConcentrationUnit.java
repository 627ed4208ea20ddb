package dev.soakfield.fem.units;

import java.util.Optional;

/**
 * The unit a case states its concentrations in. Volumetric units are solved in as they are; mass
 * fractions and gas volume per mass are solved in an amount per m³ through each part's density (see
 * {@link Quantities#perPart}).
 */
public enum ConcentrationUnit {
  /** No unit declared: numbers are in whatever unit the case was written in. */
  UNDECLARED("c", "c*m^3", false),
  MOL_PER_M3("mol/m^3", "mol", false),
  KG_PER_M3("kg/m^3", "kg", false),
  /** Parts per million by mass. */
  WPPM("wppm", "kg", true),
  /** Percent by mass. */
  WT_PERCENT("wt%", "kg", true),
  /** Millilitres of the gas at standard conditions per 100 g of the part (hydrogen in steel). */
  ML_PER_100G("ml/100g", "mol", true);

  private final String label;
  private final String amount;
  private final boolean needsDensity;

  ConcentrationUnit(String label, String amount, boolean needsDensity) {
    this.label = label;
    this.amount = amount;
    this.needsDensity = needsDensity;
  }

  /** The unit as outputs write it. */
  public String label() {
    return label;
  }

  /** The unit of amounts (∫ c dV) the solve works in. */
  public String amountUnit() {
    return amount;
  }

  /** Whether converting to an amount per m³ needs each part's density. */
  public boolean needsDensity() {
    return needsDensity;
  }

  /** The unit a case file names, in the spellings users type; empty when unknown. */
  public static Optional<ConcentrationUnit> parse(String text) {
    String t = text.strip().toLowerCase(java.util.Locale.ROOT).replace(" ", "");
    return Optional.ofNullable(
        switch (t) {
          case "mol/m^3", "mol/m3", "mol/m³", "mol*m^-3" -> MOL_PER_M3;
          case "kg/m^3", "kg/m3", "kg/m³", "kg*m^-3" -> KG_PER_M3;
          case "wppm", "ppmw", "ppm" -> WPPM;
          case "wt%", "wt.%", "%" -> WT_PERCENT;
          case "ml/100g", "ml/(100g)", "cm^3/100g", "cm3/100g" -> ML_PER_100G;
          default -> null;
        });
  }

  /** The spellings {@link #parse} accepts, one per unit, for messages. */
  public static String spellings() {
    return "mol/m^3, kg/m^3, wppm, wt% or ml/100g";
  }
}
