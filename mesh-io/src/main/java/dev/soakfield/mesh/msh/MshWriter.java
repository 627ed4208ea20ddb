package dev.soakfield.mesh.msh;

import dev.soakfield.mesh.FaceGroup;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.VolumeGroup;
import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Writes a {@link TetMesh} as an MSH 4.1 file, ASCII or binary (little-endian, 8-byte size_t). Each
 * volume group becomes a volume entity and each face group a surface entity, both tagged with the
 * group's own tag, which is also its physical tag. Elements keep their order: each maximal run of
 * consecutive elements of one group is one element block. Doubles are written in a form that reads
 * back bit for bit.
 */
public final class MshWriter {
  private static final int TET_DIM = 3;
  private static final int FACE_DIM = 2;

  private MshWriter() {}

  /** Writes {@code mesh} to {@code file} (replacing it; atomic replacement is the caller's job). */
  public static void write(Path file, TetMesh mesh, boolean binary) throws IOException {
    Objects.requireNonNull(file, "file");
    try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
      write(out, mesh, binary);
    }
  }

  /** Writes {@code mesh} to {@code out}, which stays open. */
  public static void write(OutputStream out, TetMesh mesh, boolean binary) throws IOException {
    Objects.requireNonNull(out, "out");
    Objects.requireNonNull(mesh, "mesh");
    checkGroups(mesh);
    new MshWriter.Job(new MshOutput(out), mesh, binary).run();
  }

  private static void checkGroups(TetMesh mesh) {
    Set<Integer> tags = new HashSet<>();
    for (VolumeGroup g : mesh.volumeGroups()) {
      checkName(g.name());
      if (!tags.add(g.tag())) {
        throw new IllegalArgumentException("two volume groups share tag " + g.tag());
      }
    }
    tags.clear();
    for (FaceGroup g : mesh.faceGroups()) {
      checkName(g.name());
      if (!tags.add(g.tag())) {
        throw new IllegalArgumentException("two face groups share tag " + g.tag());
      }
    }
  }

  private static void checkName(String name) {
    if (name.indexOf('"') >= 0 || name.indexOf('\n') >= 0 || name.indexOf('\r') >= 0) {
      throw new IllegalArgumentException(
          "group name '" + name + "' holds a double quote or a line break, which MSH cannot store");
    }
  }

  /** One write of one mesh. */
  private static final class Job {
    private final MshOutput o;
    private final TetMesh mesh;
    private final boolean binary;
    private final List<VolumeGroup> volumes;
    private final List<FaceGroup> faces;

    /** Entity that holds the node block: the first volume, else the first surface. */
    private final int nodeEntityDim;

    private final int nodeEntityTag;

    /** True when no group can hold the nodes and an extra volume entity without groups must. */
    private final boolean extraVolume;

    Job(MshOutput o, TetMesh mesh, boolean binary) {
      this.o = o;
      this.mesh = mesh;
      this.binary = binary;
      this.volumes = mesh.volumeGroups();
      this.faces = mesh.faceGroups();
      if (!volumes.isEmpty()) {
        nodeEntityDim = TET_DIM;
        nodeEntityTag = volumes.get(0).tag();
      } else if (!faces.isEmpty()) {
        nodeEntityDim = FACE_DIM;
        nodeEntityTag = faces.get(0).tag();
      } else {
        nodeEntityDim = TET_DIM;
        nodeEntityTag = 1;
      }
      extraVolume = volumes.isEmpty() && faces.isEmpty() && mesh.nodeCount() > 0;
    }

    void run() throws IOException {
      o.text("$MeshFormat\n4.1 ").num(binary ? 1 : 0).text(" 8\n");
      if (binary) {
        o.int32(1).ch('\n');
      }
      o.text("$EndMeshFormat\n");
      writePhysicalNames();
      writeEntities();
      writeNodes();
      writeElements();
      o.flush();
    }

    private void writePhysicalNames() throws IOException {
      o.text("$PhysicalNames\n").num(volumes.size() + faces.size()).ch('\n');
      for (VolumeGroup g : volumes) {
        o.num(TET_DIM).ch(' ').num(g.tag()).text(" \"").text(g.name()).text("\"\n");
      }
      for (FaceGroup g : faces) {
        o.num(FACE_DIM).ch(' ').num(g.tag()).text(" \"").text(g.name()).text("\"\n");
      }
      o.text("$EndPhysicalNames\n");
    }

    private void writeEntities() throws IOException {
      double[] volumeBoxes = boxes(true, volumes.size());
      double[] faceBoxes = boxes(false, faces.size());
      int volumeCount = volumes.size() + (extraVolume ? 1 : 0);
      o.text("$Entities\n");
      size(0).sep();
      size(0).sep();
      size(faces.size()).sep();
      size(volumeCount).end();
      for (int g = 0; g < faces.size(); g++) {
        entity(faces.get(g).tag(), faceBoxes, g, faces.get(g).tag());
      }
      for (int g = 0; g < volumes.size(); g++) {
        entity(volumes.get(g).tag(), volumeBoxes, g, volumes.get(g).tag());
      }
      if (extraVolume) {
        entity(1, new double[6], 0, 0);
      }
      endSection("$EndEntities\n");
    }

    /** One entity row: tag, box, one physical tag (none when {@code physical} is 0), no bounds. */
    private void entity(int tag, double[] boxes, int g, int physical) throws IOException {
      int32(tag);
      for (int k = 0; k < 6; k++) {
        sep();
        float64(boxes[6 * g + k]);
      }
      sep();
      size(physical > 0 ? 1 : 0);
      if (physical > 0) {
        sep();
        int32(physical);
      }
      sep();
      size(0).end();
    }

    /** Bounding boxes (min x, y, z, max x, y, z) of each group's nodes; zeros for empty groups. */
    private double[] boxes(boolean tets, int groups) {
      double[] box = new double[6 * groups];
      for (int g = 0; g < groups; g++) {
        for (int k = 0; k < 3; k++) {
          box[6 * g + k] = Double.POSITIVE_INFINITY;
          box[6 * g + 3 + k] = Double.NEGATIVE_INFINITY;
        }
      }
      int count = tets ? mesh.tetCount() : mesh.faceCount();
      int per = tets ? mesh.nodesPerTet() : mesh.nodesPerFace();
      for (int e = 0; e < count; e++) {
        int g = tets ? mesh.tetGroup(e) : mesh.faceGroup(e);
        for (int j = 0; j < per; j++) {
          int n = tets ? mesh.tetNode(e, j) : mesh.faceNode(e, j);
          for (int k = 0; k < 3; k++) {
            double x = mesh.coord(n, k);
            box[6 * g + k] = Math.min(box[6 * g + k], x);
            box[6 * g + 3 + k] = Math.max(box[6 * g + 3 + k], x);
          }
        }
      }
      for (int i = 0; i < box.length; i++) {
        if (Double.isInfinite(box[i])) {
          box[i] = 0;
        }
      }
      return box;
    }

    private void writeNodes() throws IOException {
      int n = mesh.nodeCount();
      o.text("$Nodes\n");
      size(n > 0 ? 1 : 0).sep();
      size(n).sep();
      size(n > 0 ? 1 : 0).sep();
      size(n).end();
      if (n > 0) {
        int32(nodeEntityDim).sep();
        int32(nodeEntityTag).sep();
        int32(0).sep();
        size(n).end();
        for (int i = 1; i <= n; i++) {
          size(i).end();
        }
        for (int i = 0; i < n; i++) {
          float64(mesh.coord(i, 0)).sep();
          float64(mesh.coord(i, 1)).sep();
          float64(mesh.coord(i, 2)).end();
        }
      }
      endSection("$EndNodes\n");
    }

    private void writeElements() throws IOException {
      int tets = mesh.tetCount();
      int faceCount = mesh.faceCount();
      long total = (long) tets + faceCount;
      int blocks = runs(true) + runs(false);
      o.text("$Elements\n");
      size(blocks).sep();
      size(total).sep();
      size(total > 0 ? 1 : 0).sep();
      size(total).end();
      long next = writeRuns(true, 1);
      writeRuns(false, next);
      endSection("$EndElements\n");
    }

    private int runs(boolean tets) {
      int count = tets ? mesh.tetCount() : mesh.faceCount();
      int runs = 0;
      for (int e = 0; e < count; e++) {
        if (e == 0 || group(tets, e) != group(tets, e - 1)) {
          runs++;
        }
      }
      return runs;
    }

    private int group(boolean tets, int e) {
      return tets ? mesh.tetGroup(e) : mesh.faceGroup(e);
    }

    /** Writes the blocks of tetrahedra or faces, numbering elements from {@code tag}. */
    private long writeRuns(boolean tets, long tag) throws IOException {
      int count = tets ? mesh.tetCount() : mesh.faceCount();
      int per = tets ? mesh.nodesPerTet() : mesh.nodesPerFace();
      int type =
          tets
              ? (mesh.order() == 1 ? ElementTypes.TET4 : ElementTypes.TET10)
              : (mesh.order() == 1 ? ElementTypes.TRI3 : ElementTypes.TRI6);
      long next = tag;
      int start = 0;
      while (start < count) {
        int g = group(tets, start);
        int stop = start + 1;
        while (stop < count && group(tets, stop) == g) {
          stop++;
        }
        int entityTag = tets ? volumes.get(g).tag() : faces.get(g).tag();
        int32(tets ? TET_DIM : FACE_DIM).sep();
        int32(entityTag).sep();
        int32(type).sep();
        size(stop - start).end();
        for (int e = start; e < stop; e++) {
          size(next++);
          for (int j = 0; j < per; j++) {
            sep();
            size(1L + (tets ? mesh.tetNode(e, j) : mesh.faceNode(e, j)));
          }
          end();
        }
        start = stop;
      }
      return next;
    }

    // ---- values in the file's encoding -------------------------------------------------------

    private Job size(long v) throws IOException {
      if (binary) {
        o.int64(v);
      } else {
        o.num(v);
      }
      return this;
    }

    private Job int32(int v) throws IOException {
      if (binary) {
        o.int32(v);
      } else {
        o.num(v);
      }
      return this;
    }

    private Job float64(double v) throws IOException {
      if (binary) {
        o.float64(v);
      } else {
        o.num(v);
      }
      return this;
    }

    /** A blank between ASCII values; nothing in binary. */
    private Job sep() throws IOException {
      if (!binary) {
        o.ch(' ');
      }
      return this;
    }

    /** A line break after an ASCII row; nothing in binary. */
    private Job end() throws IOException {
      if (!binary) {
        o.ch('\n');
      }
      return this;
    }

    private void endSection(String tag) throws IOException {
      if (binary) {
        o.ch('\n');
      }
      o.text(tag);
    }
  }
}
