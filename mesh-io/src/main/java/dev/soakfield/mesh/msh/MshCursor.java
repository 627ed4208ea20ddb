package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.MeshInputException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/**
 * A read position in the bytes of one MSH file, with ASCII tokens and binary values. Line numbers
 * are not tracked while reading: an error counts the line breaks before its position, so the hot
 * path pays nothing for them. Errors in binary files name the byte offset instead.
 */
final class MshCursor {
  private static final int SHOWN_TOKEN = 40;

  final byte[] buf;
  final int end;
  final String source;
  int pos;

  /** Position of the last section header read, for messages about the whole section. */
  int headerAt;

  private boolean binaryFile;
  private ByteBuffer view;
  private int sizeT = 8;

  MshCursor(byte[] buf, int length, String source) {
    this.buf = buf;
    this.end = length;
    this.source = source;
  }

  /** Switches to binary values in {@code order}, with {@code sizeT}-byte unsigned sizes. */
  void binary(ByteOrder order, int sizeTBytes) {
    binaryFile = true;
    view = ByteBuffer.wrap(buf, 0, end).order(order);
    sizeT = sizeTBytes;
  }

  boolean isBinary() {
    return binaryFile;
  }

  ByteBuffer view() {
    return view;
  }

  int sizeT() {
    return sizeT;
  }

  int remaining() {
    return end - pos;
  }

  // ---- errors ------------------------------------------------------------------------------

  MeshInputException error(int at, String found, String expected) {
    return new MeshInputException(source, location(at), found, expected);
  }

  String location(int at) {
    if (binaryFile) {
      return "byte " + at;
    }
    int line = 1;
    int limit = Math.min(at, end);
    for (int i = 0; i < limit; i++) {
      if (buf[i] == '\n') {
        line++;
      }
    }
    return "line " + line;
  }

  /** The token at {@code at}, quoted and shortened, or "end of file". */
  String tokenAt(int at) {
    if (at >= end) {
      return "end of file";
    }
    int stop = at;
    while (stop < end && !isSpace(buf[stop]) && stop - at < SHOWN_TOKEN) {
      stop++;
    }
    StringBuilder sb = new StringBuilder("'");
    for (int i = at; i < stop; i++) {
      int c = buf[i] & 0xff;
      sb.append(c >= 0x20 && c < 0x7f ? (char) c : '?');
    }
    if (stop < end && !isSpace(buf[stop])) {
      sb.append("...");
    }
    return sb.append('\'').toString();
  }

  // ---- ASCII ---------------------------------------------------------------------------------

  static boolean isSpace(byte c) {
    return c == ' ' || c == '\n' || c == '\r' || c == '\t' || c == '\f';
  }

  void skipSpace() {
    int p = pos;
    while (p < end && isSpace(buf[p])) {
      p++;
    }
    pos = p;
  }

  private int tokenEnd(int from) {
    int p = from;
    while (p < end && !isSpace(buf[p])) {
      p++;
    }
    return p;
  }

  /** A signed integer token (up to 18 digits, enough for any tag or count a file can hold). */
  long nextLong(String what) {
    int p = pos;
    while (p < end && isSpace(buf[p])) {
      p++;
    }
    int start = p;
    boolean negative = false;
    if (p < end && (buf[p] == '-' || buf[p] == '+')) {
      negative = buf[p] == '-';
      p++;
    }
    int digitsFrom = p;
    long v = 0;
    while (p < end) {
      int d = buf[p] - '0';
      if (d < 0 || d > 9) {
        break;
      }
      v = v * 10 + d;
      p++;
    }
    int digits = p - digitsFrom;
    if (digits == 0 || digits > 18 || (p < end && !isSpace(buf[p]))) {
      throw error(
          start, tokenAt(start), digits > 18 ? what + " below 10^18" : what + " (an integer)");
    }
    pos = p;
    return negative ? -v : v;
  }

  /** An integer token that must fit a 32-bit int. */
  int nextInt(String what) {
    int start = pos;
    long v = nextLong(what);
    if (v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
      throw error(startOfToken(start), tokenAt(startOfToken(start)), what + " within 32 bits");
    }
    return (int) v;
  }

  /** A positive integer tag. */
  long nextTag(String what) {
    int start = pos;
    long v = nextLong(what);
    if (v <= 0) {
      throw error(startOfToken(start), tokenAt(startOfToken(start)), "a positive " + what);
    }
    return v;
  }

  /** A positive integer tag that fits a 32-bit int. */
  int nextIntTag(String what) {
    int start = pos;
    long v = nextLong(what);
    if (v <= 0 || v > Integer.MAX_VALUE) {
      int at = startOfToken(start);
      throw error(at, tokenAt(at), "a positive " + what + " within 32 bits");
    }
    return (int) v;
  }

  /**
   * A count of items that need at least {@code minBytesEach} bytes each in the rest of the file;
   * checking it before anything is allocated keeps a forged count from costing memory.
   */
  long nextCount(String what, long minBytesEach) {
    int start = pos;
    long v = nextLong(what);
    int at = startOfToken(start);
    checkCount(at, v, what, minBytesEach);
    return v;
  }

  void checkCount(int at, long count, String what, long minBytesEach) {
    if (count < 0) {
      throw error(at, binaryFile ? "the count " + count : tokenAt(at), "a non-negative " + what);
    }
    if (minBytesEach > 0 && count > (long) remaining() / minBytesEach) {
      throw error(
          at,
          what + " " + count + " with only " + remaining() + " bytes left in the file",
          "a count the rest of the file can hold (at least " + minBytesEach + " bytes each)");
    }
  }

  /** The next blank-separated token as text. */
  String nextToken() {
    skipSpace();
    int stop = tokenEnd(pos);
    String s = new String(buf, pos, stop - pos, StandardCharsets.ISO_8859_1);
    pos = stop;
    return s;
  }

  /** Start of the token that ends at the current position (for messages after a read). */
  int tokenStartBefore() {
    int p = pos;
    while (p > 0 && !isSpace(buf[p - 1])) {
      p--;
    }
    return p;
  }

  /** Position of the token that a read starting at {@code from} consumed. */
  int startOfToken(int from) {
    int p = from;
    while (p < end && isSpace(buf[p])) {
      p++;
    }
    return p;
  }

  double nextDouble(String what) {
    int p = pos;
    while (p < end && isSpace(buf[p])) {
      p++;
    }
    int stop = tokenEnd(p);
    double v;
    try {
      if (p == stop) {
        throw new NumberFormatException("empty");
      }
      v = DecimalParser.parse(buf, p, stop);
    } catch (NumberFormatException e) {
      throw error(p, tokenAt(p), what + " (a number)");
    }
    if (!Double.isFinite(v)) {
      throw error(p, tokenAt(p), what + " (a finite number)");
    }
    pos = stop;
    return v;
  }

  /** Only blanks up to the next line break (or the end of the file); consumes the break. */
  void endOfLine(String after) {
    int p = pos;
    while (p < end && (buf[p] == ' ' || buf[p] == '\t' || buf[p] == '\r')) {
      p++;
    }
    if (p < end && buf[p] != '\n') {
      throw error(p, tokenAt(p), "the end of the line after " + after);
    }
    pos = p < end ? p + 1 : p;
  }

  /** The rest of the current line, trimmed; consumes the line break. */
  String restOfLine() {
    int p = pos;
    while (p < end && buf[p] != '\n') {
      p++;
    }
    String s = new String(buf, pos, p - pos, StandardCharsets.UTF_8).trim();
    pos = p < end ? p + 1 : p;
    return s;
  }

  /** A double-quoted name on the current line. */
  String nextQuoted(String what) {
    skipBlanks();
    int p = pos;
    if (p >= end || buf[p] != '"') {
      throw error(p, tokenAt(p), what + " in double quotes");
    }
    int close = p + 1;
    while (close < end && buf[close] != '"' && buf[close] != '\n') {
      close++;
    }
    if (close >= end || buf[close] != '"') {
      throw error(p, tokenAt(p), what + " with a closing double quote on the same line");
    }
    pos = close + 1;
    return new String(buf, p + 1, close - p - 1, StandardCharsets.UTF_8);
  }

  private void skipBlanks() {
    while (pos < end && (buf[pos] == ' ' || buf[pos] == '\t' || buf[pos] == '\r')) {
      pos++;
    }
  }

  /**
   * The next section header: skips blank space, expects a line "$Name", returns "Name" and leaves
   * the position at the start of the next line (where binary data begin in a binary file).
   */
  String nextSectionName() {
    skipSpace();
    int at = pos;
    headerAt = at;
    if (at >= end) {
      return null;
    }
    if (buf[at] != '$') {
      throw error(at, tokenAt(at), "a section header such as $Nodes");
    }
    pos = at + 1;
    String name = restOfLine();
    if (name.isEmpty() || name.indexOf(' ') >= 0 || name.indexOf('\t') >= 0) {
      throw error(at, tokenAt(at), "a section header such as $Nodes");
    }
    return name;
  }

  /** Expects the line "$End" + section (after blank space); a wrong count usually shows here. */
  void expectEnd(String section) {
    skipSpace();
    int at = pos;
    String tag = "$End" + section;
    int stop = tokenEnd(at);
    if (!matches(at, stop, tag)) {
      throw error(at, tokenAt(at), tag + " (does the declared count match the data?)");
    }
    pos = stop;
  }

  private boolean matches(int from, int to, String text) {
    if (to - from != text.length()) {
      return false;
    }
    for (int i = 0; i < text.length(); i++) {
      if (buf[from + i] != text.charAt(i)) {
        return false;
      }
    }
    return true;
  }

  /** Skips a section this reader does not use, up to and including its end tag at a line start. */
  void skipSection(String section, int headerAt) {
    String tag = "$End" + section;
    int p = pos;
    while (p < end) {
      if ((p == 0 || buf[p - 1] == '\n') && buf[p] == '$') {
        int stop = tokenEnd(p);
        if (matches(p, stop, tag)) {
          pos = stop;
          return;
        }
      }
      p++;
    }
    throw error(headerAt, "$" + section + " without " + tag, tag + " at the start of a line");
  }

  // ---- binary --------------------------------------------------------------------------------

  /** Checks that {@code bytes} more bytes exist before a read of {@code what}. */
  void need(long bytes, String what) {
    if (bytes > remaining()) {
      throw error(
          pos, "end of file (" + remaining() + " bytes left)", what + " (" + bytes + " bytes)");
    }
  }

  int int32(String what) {
    need(4, what);
    int v = view.getInt(pos);
    pos += 4;
    return v;
  }

  double float64(String what) {
    need(8, what);
    double v = view.getDouble(pos);
    pos += 8;
    return v;
  }

  /** An unsigned size_t; values beyond 2^63 show as negative and fail the count checks. */
  long size(String what) {
    need(sizeT, what);
    long v = sizeT == 8 ? view.getLong(pos) : view.getInt(pos) & 0xffffffffL;
    pos += sizeT;
    return v;
  }

  long sizeCount(String what, long minBytesEach) {
    int at = pos;
    long v = size(what);
    checkCount(at, v, what, minBytesEach);
    return v;
  }
}
