package dev.soakfield.fem.casefile;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads JSON with {@code //} and {@code /* *}{@code /} comments into a {@link CaseNode} tree that
 * keeps the line and column of every value. Syntax errors and duplicate keys become a {@link
 * CaseInputException} at the parser's line and column.
 */
final class CaseTreeReader {
  private static final JsonFactory FACTORY =
      JsonFactory.builder().enable(JsonReadFeature.ALLOW_JAVA_COMMENTS).build();

  private CaseTreeReader() {}

  /** The parser's message without its internal source description, which means nothing to users. */
  static String withoutParserSource(JsonProcessingException e) {
    return e.getOriginalMessage()
        .replaceAll(
            "\\(start marker at \\[Source: [^;\\]]*(\\([^)]*\\))?; line: (\\d+), column: (\\d+)\\]\\)",
            "(opened on line $2, column $3)");
  }

  static CaseNode read(Path file, String source) {
    try (InputStream in = Files.newInputStream(file);
        JsonParser parser = FACTORY.createParser(in)) {
      return readLocated(parser, source);
    } catch (NoSuchFileException e) {
      throw single(source, 0, 0, "found no such file, expected a readable case file");
    } catch (IOException e) {
      throw located(e, source);
    }
  }

  /** Reads case text held in memory (a case being edited), as {@link #read} reads a file. */
  static CaseNode readText(String text, String source) {
    try (JsonParser parser = FACTORY.createParser(text)) {
      return readLocated(parser, source);
    } catch (IOException e) {
      throw located(e, source);
    }
  }

  /**
   * Reads the document; a parser failure without a place of its own (a limit of the parser, such as
   * the nesting depth) is placed where the parser stopped.
   */
  private static CaseNode readLocated(JsonParser parser, String source) throws IOException {
    try {
      return readDocument(parser, source);
    } catch (StreamConstraintsException e) {
      JsonLocation at = parser.currentLocation();
      throw single(
          source,
          at.getLineNr(),
          at.getColumnNr(),
          e.getOriginalMessage().contains("nesting depth")
              ? "found objects or lists nested more than "
                  + FACTORY.streamReadConstraints().getMaxNestingDepth()
                  + " deep, expected a case file (objects and lists nested a few levels deep)"
              : "found a value beyond what a case file may hold ("
                  + e.getOriginalMessage().replaceAll(", from `[^`]*`", "")
                  + ")");
    }
  }

  /** A parser failure at its line and column; any other read failure for the whole file. */
  private static CaseInputException located(IOException failure, String source) {
    if (failure instanceof JsonProcessingException e) {
      JsonLocation at = e.getLocation();
      int line = at == null ? 0 : at.getLineNr();
      int column = at == null ? 0 : at.getColumnNr();
      return single(source, line, column, "malformed JSON: " + withoutParserSource(e));
    }
    return single(source, 0, 0, "found an unreadable file (" + failure.getMessage() + ")");
  }

  private static CaseNode readDocument(JsonParser parser, String source) throws IOException {
    JsonToken first = parser.nextToken();
    if (first == null) {
      throw single(source, 1, 1, "found an empty file, expected a JSON object");
    }
    CaseNode root = readValue(parser, source, "");
    if (parser.nextToken() != null) {
      JsonLocation at = parser.currentTokenLocation();
      throw single(
          source,
          at.getLineNr(),
          at.getColumnNr(),
          "malformed JSON: found more after the end of the top-level value, expected the end of the"
              + " file");
    }
    return root;
  }

  /** Reads the value whose first token is the parser's current token. */
  private static CaseNode readValue(JsonParser parser, String source, String path)
      throws IOException {
    JsonLocation at = parser.currentTokenLocation();
    int line = at.getLineNr();
    int column = at.getColumnNr();
    JsonToken token = parser.currentToken();
    return switch (token) {
      case START_OBJECT -> readObject(parser, source, path, line, column);
      case START_ARRAY -> readArray(parser, source, path, line, column);
      case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT ->
          new CaseNode.Num(parser.getDoubleValue(), parser.getText(), line, column);
      case VALUE_STRING -> new CaseNode.Text(parser.getText(), line, column);
      case VALUE_TRUE -> new CaseNode.Bool(true, line, column);
      case VALUE_FALSE -> new CaseNode.Bool(false, line, column);
      case VALUE_NULL -> new CaseNode.Null(line, column);
      default -> throw single(source, line, column, path, "malformed JSON: unexpected " + token);
    };
  }

  private static CaseNode.Arr readArray(
      JsonParser parser, String source, String path, int line, int column) throws IOException {
    List<CaseNode> items = new ArrayList<>();
    while (parser.nextToken() != JsonToken.END_ARRAY) {
      items.add(readValue(parser, source, CasePaths.item(path, items.size())));
    }
    return new CaseNode.Arr(items, line, column);
  }

  private static CaseNode.Obj readObject(
      JsonParser parser, String source, String path, int line, int column) throws IOException {
    Map<String, CaseNode.Member> members = new LinkedHashMap<>();
    while (parser.nextToken() == JsonToken.FIELD_NAME) {
      JsonLocation keyAt = parser.currentTokenLocation();
      String key = parser.currentName();
      if (members.containsKey(key)) {
        CaseNode.Member earlier = members.get(key);
        throw single(
            source,
            keyAt.getLineNr(),
            keyAt.getColumnNr(),
            CasePaths.child(path, key),
            "found this key a second time (first on line "
                + earlier.keyLine()
                + "), expected each key once");
      }
      parser.nextToken();
      CaseNode value = readValue(parser, source, CasePaths.child(path, key));
      members.put(key, new CaseNode.Member(key, keyAt.getLineNr(), keyAt.getColumnNr(), value));
    }
    return new CaseNode.Obj(members, line, column);
  }

  private static CaseInputException single(String source, int line, int column, String message) {
    return single(source, line, column, "", message);
  }

  private static CaseInputException single(
      String source, int line, int column, String path, String message) {
    return new CaseInputException(
        source, List.of(new CaseInputException.Problem(line, column, path, message)));
  }
}
