package dev.soakfield.app;

import java.util.List;

/** The one isosurface the window offers: on or off, at a level of the field shown. */
public final class IsoControl {
  private boolean on;
  private float level;

  /** Off, at the middle of the colour limits {@code low} .. {@code high}. */
  public IsoControl(double low, double high) {
    level = (float) ((low + high) / 2);
  }

  public boolean on() {
    return on;
  }

  public float level() {
    return level;
  }

  /** Takes what the controls now show and passes a change on to {@code settings}. */
  public void apply(boolean nowOn, float nowLevel, ViewSettings settings) {
    if (nowOn != on || nowLevel != level) {
      on = nowOn;
      level = nowLevel;
      settings.isoLevels(on ? List.of((double) level) : List.of());
    }
  }
}
