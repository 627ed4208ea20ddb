package dev.soakfield.fem.laws;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;

/**
 * Where a source law's provider was found: on the application's class path (the built-in laws) or
 * in a jar of a plugins folder.
 */
public final class LawOrigin {
  private static final LawOrigin CLASS_PATH = new LawOrigin(Optional.empty());
  private final Optional<Path> jar;

  private LawOrigin(Optional<Path> jar) {
    this.jar = jar;
  }

  /** A provider on the application's class path. */
  public static LawOrigin classPath() {
    return CLASS_PATH;
  }

  /** A provider in {@code jar} of a plugins folder. */
  public static LawOrigin jar(Path jar) {
    return new LawOrigin(Optional.of(jar.toAbsolutePath().normalize()));
  }

  /** The jar, empty for the class path. */
  public Optional<Path> jarPath() {
    return jar;
  }

  /** "class path" or the jar's absolute path, for messages and listings. */
  public String describe() {
    return jar.map(Path::toString).orElse("class path");
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof LawOrigin other && jar.equals(other.jar);
  }

  @Override
  public int hashCode() {
    return Objects.hash(jar);
  }

  @Override
  public String toString() {
    return describe();
  }
}
