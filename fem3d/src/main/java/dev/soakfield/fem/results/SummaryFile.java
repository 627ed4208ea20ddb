package dev.soakfield.fem.results;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.MissingNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

/**
 * {@code summary.json}, what a run reports about itself, written once when it finishes; and the
 * folder's JSON files read back for reports, which must also describe a run that failed half way.
 */
public final class SummaryFile {
  private SummaryFile() {}

  /** Writes the summary (nested maps, lists, numbers and text, in their order) into the folder. */
  public static void write(Path folder, Map<String, Object> root) throws IOException {
    new ObjectMapper()
        .enable(SerializationFeature.INDENT_OUTPUT)
        .writeValue(folder.resolve(ResultFiles.SUMMARY).toFile(), root);
  }

  /** The folder's summary; a missing node when the run wrote none or it cannot be read. */
  public static JsonNode readOrMissing(Path folder) {
    return jsonOrMissing(folder.resolve(ResultFiles.SUMMARY));
  }

  /** The folder's copy of the case ({@code //} comments allowed); a missing node when absent. */
  public static JsonNode caseCopyOrMissing(Path folder) {
    return jsonOrMissing(folder.resolve(ResultFiles.CASE_COPY));
  }

  private static JsonNode jsonOrMissing(Path file) {
    if (!Files.isRegularFile(file)) {
      return MissingNode.getInstance();
    }
    try {
      ObjectMapper mapper = new ObjectMapper();
      mapper.enable(JsonParser.Feature.ALLOW_COMMENTS);
      return mapper.readTree(file.toFile());
    } catch (IOException e) {
      return MissingNode.getInstance();
    }
  }
}
