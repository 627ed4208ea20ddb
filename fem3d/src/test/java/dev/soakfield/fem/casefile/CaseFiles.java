package dev.soakfield.fem.casefile;

import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Path;

/** The case files under src/test/resources/casefile. */
final class CaseFiles {
  private CaseFiles() {}

  static Path resource(String name) {
    URL url = CaseFiles.class.getResource("/casefile/" + name);
    if (url == null) {
      throw new IllegalStateException("test resource casefile/" + name + " is missing");
    }
    try {
      return Path.of(url.toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }
}
