package dev.soakfield.app.setup;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.casefile.CaseReader;
import java.nio.file.Path;

/**
 * Case text to and from the window's JSON tree. Reading keeps the file's key order and number
 * spelling; writing indents objects and keeps arrays on one line, so a time table reads as a row of
 * pairs. Comments cannot survive the tree: {@link #hasComments} lets the window say so first.
 */
public final class CaseText {
  private static final ObjectMapper MAPPER =
      JsonMapper.builder()
          .enable(JsonReadFeature.ALLOW_JAVA_COMMENTS)
          .enable(com.fasterxml.jackson.databind.DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
          .build();

  private CaseText() {}

  /**
   * The tree of case text; malformed text is refused with the case reader's located message.
   *
   * @param source the name messages give the text (the file's name)
   * @throws CaseInputException when the text is not one JSON object
   */
  public static ObjectNode parse(String text, Path caseFile, String source) {
    JsonNode node;
    try {
      node = MAPPER.readTree(text);
    } catch (JsonProcessingException e) {
      CaseReader.readText(text, caseFile, source); // throws the reader's located message
      throw new IllegalStateException("the case reader accepted what Jackson refused", e);
    }
    if (!(node instanceof ObjectNode obj)) {
      CaseReader.readText(text, caseFile, source);
      throw new IllegalStateException("the case reader accepted a case that is not an object");
    }
    return obj;
  }

  /** The tree as case text: two-space indents, arrays on one line, a final newline. */
  public static String write(ObjectNode tree) {
    DefaultPrettyPrinter printer =
        new DefaultPrettyPrinter()
            .withObjectIndenter(new DefaultIndenter("  ", "\n"))
            .withArrayIndenter(DefaultPrettyPrinter.FixedSpaceIndenter.instance);
    try {
      return MAPPER.writer(printer).writeValueAsString(tree) + "\n";
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("a JSON tree that cannot be written", e);
    }
  }

  /** Whether the text holds a {@code //} or {@code /*} comment outside strings. */
  public static boolean hasComments(String text) {
    boolean inString = false;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (inString) {
        if (c == '\\') {
          i++;
        } else if (c == '"') {
          inString = false;
        }
      } else if (c == '"') {
        inString = true;
      } else if (c == '/' && i + 1 < text.length()) {
        char n = text.charAt(i + 1);
        if (n == '/' || n == '*') {
          return true;
        }
      }
    }
    return false;
  }
}
