package dev.soakfield.mesh.vtk;

import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;

/** Lets a base64 wrapper close (to write its padding) without closing the file under it. */
final class KeepOpenStream extends FilterOutputStream {
  KeepOpenStream(OutputStream out) {
    super(out);
  }

  @Override
  public void write(byte[] b, int off, int len) throws IOException {
    out.write(b, off, len);
  }

  @Override
  public void close() throws IOException {
    flush();
  }
}
