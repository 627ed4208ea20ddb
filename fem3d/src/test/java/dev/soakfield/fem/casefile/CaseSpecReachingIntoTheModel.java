package dev.soakfield.fem.casefile;

import dev.soakfield.fem.model.DiffusionModel;

/** Test fixture that breaks the case-spec import rule on purpose (see FemImportRulesTest). */
public final class CaseSpecReachingIntoTheModel {
  private CaseSpecReachingIntoTheModel() {}

  /** Names the discretised model, which no case-file class may use. */
  public static String modelType() {
    return DiffusionModel.class.getName();
  }
}
