package dev.soakfield.app;

/** Stepping through the result frames on its own, at a chosen rate (the window's play button). */
public final class Playback {
  private boolean playing;
  private float framesPerSecond = 2;
  private double lastStep;

  public boolean playing() {
    return playing;
  }

  public void toggle() {
    playing = !playing;
  }

  public float framesPerSecond() {
    return framesPerSecond;
  }

  public void framesPerSecond(float f) {
    framesPerSecond = f;
  }

  /** At clock time {@code now} (s), moves to the next of {@code frames} frames when one is due. */
  public void advance(double now, ViewSettings settings, int frames) {
    if (playing && now - lastStep >= 1 / framesPerSecond) {
      lastStep = now;
      settings.frame((settings.frame() + 1) % frames);
    }
  }
}
