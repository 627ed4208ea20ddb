package dev.soakfield.fem.casefile;

import java.nio.file.Path;
import java.util.Objects;

/**
 * Reads a case file: JSON with {@code //} and {@code /* *}{@code /} comments. Every mistake is a
 * {@link CaseInputException} naming the file, line, column and key path; independent mistakes are
 * reported together.
 */
public final class CaseReader {
  private CaseReader() {}

  /**
   * Reads and checks a case file on its own (see {@link CaseChecks#againstMesh} for the checks that
   * need the mesh).
   *
   * @param caseFile the case file; the mesh path inside it is resolved against its folder
   * @throws CaseInputException when the file is missing, malformed or holds a wrong value
   */
  public static CaseSpec read(Path caseFile) {
    Objects.requireNonNull(caseFile, "caseFile");
    Path name = caseFile.getFileName();
    String source = name == null ? caseFile.toString() : name.toString();
    CaseNode root = CaseTreeReader.read(caseFile, source);
    return CaseBinder.bind(root, caseFile, source);
  }

  /**
   * Reads case text held in memory as if it were the file {@code caseFile} (whose folder resolves
   * the mesh path), with the same checks and messages as {@link #read}.
   *
   * @param sourceName the name problems are reported under
   * @throws CaseInputException when the text is malformed or holds a wrong value
   */
  public static CaseSpec readText(String text, Path caseFile, String sourceName) {
    Objects.requireNonNull(text, "text");
    Objects.requireNonNull(caseFile, "caseFile");
    return CaseBinder.bind(CaseTreeReader.readText(text, sourceName), caseFile, sourceName);
  }
}
