package dev.soakfield.render;

import dev.soakfield.fem.time.ThetaStepper;

/** Test fixture that breaks the renderer's import rule on purpose (see GuiImportRulesTest). */
public final class RendererSolvingItsOwnField {
  private RendererSolvingItsOwnField() {}

  /** Names the time stepper, which no rendering class may use. */
  public static String stepperType() {
    return ThetaStepper.class.getName();
  }
}
