package dev.soakfield.fem.results;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;

/** {@code summary.json}: what a run reports about itself, written once when it finishes. */
public final class SummaryFile {
  private SummaryFile() {}

  /** Writes the summary (nested maps, lists, numbers and text, in their order) into the folder. */
  public static void write(Path folder, Map<String, Object> root) throws IOException {
    new ObjectMapper()
        .enable(SerializationFeature.INDENT_OUTPUT)
        .writeValue(folder.resolve(ResultFiles.SUMMARY).toFile(), root);
  }
}
