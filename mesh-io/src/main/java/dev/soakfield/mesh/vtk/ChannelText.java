package dev.soakfield.mesh.vtk;

import dev.soakfield.mesh.MeshInputException;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * The appended base64 data of a .vtu file (the characters after its '_' marker) as characters read
 * from the file where they are asked for. Reading one array of a large file then costs that array
 * alone, and the data is never held twice as XML text. Base64 is ASCII, so a byte is a character.
 */
final class ChannelText implements CharSequence, AutoCloseable {
  private static final byte[] START = "<AppendedData".getBytes(StandardCharsets.US_ASCII);
  private static final byte[] END = "</AppendedData".getBytes(StandardCharsets.US_ASCII);
  private static final int CHUNK = 1 << 16;

  private final String source;
  private final FileChannel channel;
  private final long base;
  private final int length;
  private final ByteBuffer window = ByteBuffer.allocate(CHUNK);
  private long windowStart = -1;

  private ChannelText(String source, FileChannel channel, long base, int length) {
    this.source = source;
    this.channel = channel;
    this.base = base;
    this.length = length;
  }

  /**
   * The data of {@code file}'s AppendedData element.
   *
   * @throws MeshInputException when the file cannot be read, has no '_' marker, or more appended
   *     data than one array index can reach (2 GB)
   */
  static ChannelText appended(Path file) {
    String source = file.toString();
    FileChannel ch = null;
    try {
      ch = FileChannel.open(file, StandardOpenOption.READ);
      long tag = find(ch, START, 0, ch.size());
      long marker = tag < 0 ? -1 : markerAfter(ch, tag);
      if (marker < 0) {
        throw new MeshInputException(
            source, "AppendedData", "no '_' marker", "'_' before the appended data");
      }
      long tail = Math.max(marker, ch.size() - CHUNK);
      long end = lastIndexOf(ch, END, tail, ch.size());
      long size = (end < 0 ? ch.size() : end) - (marker + 1);
      if (size > Integer.MAX_VALUE - 16) {
        throw new MeshInputException(
            source, "AppendedData", size + " characters of data", "at most 2 GB of appended data");
      }
      ChannelText text = new ChannelText(source, ch, marker + 1, (int) size);
      ch = null; // the text owns it now
      return text;
    } catch (IOException e) {
      throw VtuReader.unreadable(source, e);
    } finally {
      closeQuietly(ch);
    }
  }

  private static void closeQuietly(FileChannel ch) {
    if (ch != null) {
      try {
        ch.close();
      } catch (IOException e) {
        // nothing was read from it that matters: the error that brought us here is thrown
      }
    }
  }

  /** Position of the '_' after the AppendedData start tag at {@code tag}, or -1. */
  private static long markerAfter(FileChannel ch, long tag) throws IOException {
    long close = find(ch, new byte[] {'>'}, tag, ch.size());
    if (close < 0) {
      return -1;
    }
    ByteBuffer b = ByteBuffer.allocate(CHUNK);
    for (long pos = close + 1; pos < ch.size(); pos += b.limit()) {
      b.clear();
      if (ch.read(b, pos) <= 0) {
        return -1;
      }
      b.flip();
      for (int i = 0; i < b.limit(); i++) {
        byte c = b.get(i);
        if (c == '_') {
          return pos + i;
        }
        if (!Character.isWhitespace(c)) {
          return -1;
        }
      }
    }
    return -1;
  }

  /** First position of {@code pattern} in [from, to), or -1; read in overlapping chunks. */
  private static long find(FileChannel ch, byte[] pattern, long from, long to) throws IOException {
    ByteBuffer b = ByteBuffer.allocate(CHUNK);
    for (long pos = from; pos < to; pos += CHUNK - pattern.length) {
      b.clear();
      b.limit((int) Math.min(CHUNK, to - pos));
      int n = ch.read(b, pos);
      if (n <= 0) {
        return -1;
      }
      for (int i = 0; i + pattern.length <= n; i++) {
        if (matches(b, i, pattern)) {
          return pos + i;
        }
      }
      if (n < pattern.length || pos + n >= to) {
        return -1;
      }
    }
    return -1;
  }

  private static long lastIndexOf(FileChannel ch, byte[] pattern, long from, long to)
      throws IOException {
    ByteBuffer b = ByteBuffer.allocate((int) (to - from));
    int n = ch.read(b, from);
    for (int i = n - pattern.length; i >= 0; i--) {
      if (matches(b, i, pattern)) {
        return from + i;
      }
    }
    return -1;
  }

  private static boolean matches(ByteBuffer b, int at, byte[] pattern) {
    for (int k = 0; k < pattern.length; k++) {
      if (b.get(at + k) != pattern[k]) {
        return false;
      }
    }
    return true;
  }

  @Override
  public int length() {
    return length;
  }

  @Override
  public char charAt(int index) {
    if (index < 0 || index >= length) {
      throw new IndexOutOfBoundsException(index);
    }
    long pos = base + index;
    if (windowStart < 0 || pos < windowStart || pos >= windowStart + window.limit()) {
      window.clear();
      window.limit((int) Math.min(CHUNK, base + length - pos));
      readFully(window, pos);
      windowStart = pos;
    }
    return (char) (window.get((int) (pos - windowStart)) & 0xff);
  }

  /** The characters [start, end) as a String, read from the file in one go. */
  @Override
  public CharSequence subSequence(int start, int end) {
    if (start < 0 || end > length || start > end) {
      throw new IndexOutOfBoundsException(start + ".." + end + " of " + length);
    }
    ByteBuffer b = ByteBuffer.allocate(end - start);
    readFully(b, base + start);
    return new String(b.array(), 0, b.limit(), StandardCharsets.ISO_8859_1);
  }

  private void readFully(ByteBuffer b, long pos) {
    try {
      long at = pos;
      while (b.hasRemaining()) {
        int n = channel.read(b, at);
        if (n < 0) {
          throw new MeshInputException(
              source, "AppendedData", "the file ending at byte " + at, "the data it announces");
        }
        at += n;
      }
      b.flip();
    } catch (IOException e) {
      throw VtuReader.unreadable(source, e);
    }
  }

  @Override
  public String toString() {
    return subSequence(0, length).toString();
  }

  @Override
  public void close() {
    closeQuietly(channel);
  }
}
