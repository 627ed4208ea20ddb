package dev.soakfield.app;

import java.util.ArrayList;
import java.util.List;

/** The last few things the window has to tell (a picture saved, or why not), newest first. */
public final class Notes {
  private static final int KEEP = 3;
  private final List<String> messages = new ArrayList<>();

  public void add(String m) {
    messages.add(0, m);
    while (messages.size() > KEEP) {
      messages.remove(messages.size() - 1);
    }
  }

  public List<String> all() {
    return List.copyOf(messages);
  }
}
