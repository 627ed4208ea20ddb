package dev.soakfield.mesh.vtk;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.stream.IntStream;
import java.util.zip.DataFormatException;
import java.util.zip.Deflater;
import java.util.zip.Inflater;

/**
 * The zlib form of a VTK binary array ({@code compressor="vtkZLibDataCompressor"}): the bytes cut
 * into blocks of {@link #BLOCK} bytes, each compressed on its own, after a header of UInt64 words
 * {@code [#blocks][block size][size of the last block if partial, else 0][compressed size of each
 * block]} (VTK File Formats, XML section, "compressed data"). Independent blocks let all cores
 * compress at once.
 */
final class ZlibBlocks {
  /**
   * Uncompressed block size: large enough for deflate's 32 KiB window, small enough to share out.
   */
  static final int BLOCK = 1 << 16;

  /** Level 1: the mesh arrays shrink several-fold at any level, and level 1 is the fastest. */
  private static final int LEVEL = Deflater.BEST_SPEED;

  private ZlibBlocks() {}

  /** A compressed array: its header and its blocks one after another. */
  @SuppressWarnings("ArrayRecordComponent") // package-private carrier, read once
  record Compressed(byte[] header, byte[] blocks) {}

  static Compressed compress(byte[] data) {
    int count = (data.length + BLOCK - 1) / BLOCK;
    byte[][] blocks =
        IntStream.range(0, count)
            .parallel()
            .mapToObj(b -> deflate(data, b * BLOCK, Math.min(BLOCK, data.length - b * BLOCK)))
            .toArray(byte[][]::new);
    ByteBuffer header = ByteBuffer.allocate(8 * (3 + count)).order(ByteOrder.LITTLE_ENDIAN);
    header.putLong(count).putLong(BLOCK).putLong(data.length % BLOCK);
    int total = 0;
    for (byte[] b : blocks) {
      header.putLong(b.length);
      total += b.length;
    }
    byte[] all = new byte[total];
    int at = 0;
    for (byte[] b : blocks) {
      System.arraycopy(b, 0, all, at, b.length);
      at += b.length;
    }
    return new Compressed(header.array(), all);
  }

  private static byte[] deflate(byte[] data, int from, int length) {
    Deflater d = new Deflater(LEVEL);
    try {
      d.setInput(data, from, length);
      d.finish();
      ByteArrayOutputStream out = new ByteArrayOutputStream(length / 2 + 64);
      byte[] buf = new byte[8192];
      while (!d.finished()) {
        int n = d.deflate(buf);
        out.write(buf, 0, n);
      }
      return out.toByteArray();
    } finally {
      d.end();
    }
  }

  /**
   * Inflates {@code blocks} (one after another, of the compressed sizes given) into {@code size}
   * bytes, each block {@code blockSize} long but the last.
   *
   * @throws DataFormatException when a block is not zlib data or inflates to another length
   */
  static byte[] inflate(byte[] blocks, long[] compressedSizes, int blockSize, int size)
      throws DataFormatException {
    byte[] out = new byte[size];
    int in = 0;
    Inflater inf = new Inflater();
    try {
      for (int b = 0; b < compressedSizes.length; b++) {
        int want = Math.min(blockSize, size - b * blockSize);
        inf.reset();
        inf.setInput(blocks, in, (int) compressedSizes[b]);
        int got = 0;
        while (got < want && !inf.finished()) {
          int n = inf.inflate(out, b * blockSize + got, want - got);
          if (n == 0 && (inf.needsInput() || inf.needsDictionary())) {
            break;
          }
          got += n;
        }
        if (got != want || !inf.finished()) {
          throw new DataFormatException(
              "block " + b + " inflates to other than its " + want + " bytes");
        }
        in += (int) compressedSizes[b];
      }
    } finally {
      inf.end();
    }
    return out;
  }
}
