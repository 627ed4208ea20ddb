package dev.soakfield.render;

import dev.soakfield.app.FieldKind;
import dev.soakfield.app.OrbitCamera;
import dev.soakfield.app.PartGeometry;
import dev.soakfield.app.Scene;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.fem.post.Isosurface;
import dev.soakfield.fem.post.TriangleSoup;
import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.mesh.vtk.PvdEntry;
import dev.soakfield.mesh.vtk.PvdWriter;
import dev.soakfield.mesh.vtk.VtuFormat;
import dev.soakfield.mesh.vtk.VtuWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Stream;
import org.lwjgl.opengl.GL33C;

/**
 * Speed of the view on a generated box of 6·N³ tetrahedra with two result frames written to a
 * scratch folder: opening it to the first frame, frames while orbiting, isosurface extraction and a
 * time-slider step. Printed against the aims (50 ms a frame, 100 ms an isosurface) and against
 * references measured in the same run: a frame of a small box, and one plain pass over the
 * tetrahedra reading the field (the least any extraction must do).
 */
public final class RenderBench {
  private static final double FRAME_AIM_MS = 50;
  private static final double ISO_AIM_MS = 100;

  private RenderBench() {}

  /** Runs the measurements and prints them. */
  public static void run(PrintWriter out, int cells, int width, int height) throws IOException {
    Path scratch = Files.createTempDirectory("soakfield-render-bench");
    try {
      out.printf(
          Locale.ROOT,
          "building a box of %d tetrahedra and two result frames...%n",
          6L * cells * cells * cells);
      out.flush();
      Path folder = writeResults(scratch, cells);
      GlRuntime.start();
      out.println("rendering with GLFW on " + GlRuntime.start() + ", " + width + "x" + height);
      double smallFrame = smallFrameMs(width, height);
      long t0 = System.nanoTime();
      Study study = Study.open(folder);
      long t1 = System.nanoTime();
      ViewSettings settings = new ViewSettings();
      settings.field(Optional.of(FieldKind.CONCENTRATION));
      settings.frame(0);
      Scene scene = new Scene(study, settings);
      long t2 = System.nanoTime();
      OrbitCamera cam = new OrbitCamera();
      cam.viewport(width, height);
      cam.fit(study.geometry().bounds());
      try (OffscreenPicture pic = new OffscreenPicture(width, height)) {
        pic.render(scene, cam);
        long t3 = System.nanoTime();
        out.println(
            "OpenGL: "
                + GL33C.glGetString(GL33C.GL_RENDERER)
                + ", "
                + GL33C.glGetString(GL33C.GL_VERSION)
                + "; "
                + Runtime.getRuntime().availableProcessors()
                + " cores");
        out.printf(
            Locale.ROOT,
            "mesh: %d nodes, %d tetrahedra; surface: %d triangles%n",
            study.geometry().nodeCount(),
            study.geometry().tetCount(),
            scene.surface().triangleCount());
        out.printf(
            Locale.ROOT,
            "open to first frame: %.0f ms (read mesh and frame %.0f ms, surface and pick index %.0f ms, GL set-up and first draw %.0f ms)%n",
            ms(t3 - t0),
            ms(t1 - t0),
            ms(t2 - t1),
            ms(t3 - t2));
        int frames = 30;
        long o0 = System.nanoTime();
        for (int i = 0; i < frames; i++) {
          cam.orbit(3, 0.5);
          draw(pic, scene, cam);
        }
        double orbit = ms(System.nanoTime() - o0) / frames;
        out.printf(
            Locale.ROOT,
            "frame of the full surface: %.1f ms (aim %.0f ms: ratio %.2f; a 6k-tet box: %.1f ms, ratio %.1f)%n",
            orbit,
            FRAME_AIM_MS,
            orbit / FRAME_AIM_MS,
            smallFrame,
            orbit / smallFrame);
        pic.renderer().draw(scene, cam, 0, 0, true);
        long m0 = System.nanoTime();
        for (int i = 0; i < frames; i++) {
          cam.orbit(3, 0.5);
          pic.renderer().draw(scene, cam, 0, 0, true);
          GL33C.glFinish();
        }
        double moving = ms(System.nanoTime() - m0) / frames;
        out.printf(
            Locale.ROOT,
            "frame while orbiting (reduced surface, %d triangles): %.1f ms (aim %.0f ms: ratio %.2f)%n",
            scene.movingSurfaceMesh().triangleCount(),
            moving,
            FRAME_AIM_MS,
            moving / FRAME_AIM_MS);
        long s0 = System.nanoTime();
        settings.frame(1);
        scene.update();
        draw(pic, scene, cam);
        double slider = ms(System.nanoTime() - s0);
        long c0 = System.nanoTime();
        int steps = 6;
        for (int i = 0; i < steps; i++) {
          settings.frame(i % 2);
          scene.update();
          draw(pic, scene, cam);
        }
        double cached = ms(System.nanoTime() - c0) / steps;
        out.printf(
            Locale.ROOT,
            "time-slider step: %.0f ms reading a new frame from its file, %.1f ms for a frame already read (aim %.0f ms: ratio %.2f)%n",
            slider,
            cached,
            FRAME_AIM_MS,
            cached / FRAME_AIM_MS);
      }
      isosurfaces(out, study);
    } finally {
      try (Stream<Path> files = Files.walk(scratch)) {
        for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
          Files.deleteIfExists(p);
        }
      }
    }
    out.flush();
  }

  private static void isosurfaces(PrintWriter out, Study study) {
    PartGeometry g = study.geometry();
    double[] field = study.results().orElseThrow().field(1, FieldKind.CONCENTRATION.fileName);
    double[] xyz = g.coordinates();
    int[] tets = g.connectivity();
    boolean[] all = new boolean[0];
    int runs = 5;
    TriangleSoup soup = Isosurface.extract(xyz, tets, g.nodesPerTet(), field, 0.5, all);
    long i0 = System.nanoTime();
    for (int i = 0; i < runs; i++) {
      soup = Isosurface.extract(xyz, tets, g.nodesPerTet(), field, 0.2 + 0.1 * i, all);
    }
    double iso = ms(System.nanoTime() - i0) / runs;
    double scan = scanMs(tets, field);
    out.printf(
        Locale.ROOT,
        "isosurface on %d tetrahedra: %.1f ms, %d triangles (aim %.0f ms: ratio %.2f; one pass over the tetrahedra reading the field: %.1f ms, ratio %.1f)%n",
        g.tetCount(),
        iso,
        soup.triangleCount(),
        ISO_AIM_MS,
        iso / ISO_AIM_MS,
        scan,
        iso / scan);
  }

  /** The least an extraction must do: read the field at every node of every tetrahedron. */
  private static double scanMs(int[] tets, double[] field) {
    double best = Double.POSITIVE_INFINITY;
    double sink = 0;
    for (int r = 0; r < 5; r++) {
      long t0 = System.nanoTime();
      double s = 0;
      for (int i = 0; i < tets.length; i++) {
        s += field[tets[i]];
      }
      sink += s;
      best = Math.min(best, ms(System.nanoTime() - t0));
    }
    if (sink == Double.MIN_VALUE) {
      System.out.print("");
    }
    return best;
  }

  private static void draw(OffscreenPicture pic, Scene scene, OrbitCamera cam) {
    pic.renderer().draw(scene, cam);
    GL33C.glFinish();
  }

  private static double smallFrameMs(int width, int height) {
    TetMesh small = StructuredMesher.box(0.01, 0.01, 0.004, 10, 10, 10, 1);
    Study s = Study.ofMesh(Path.of("small box"), small);
    ViewSettings v = new ViewSettings();
    v.field(Optional.empty());
    Scene scene = new Scene(s, v);
    OrbitCamera cam = new OrbitCamera();
    cam.viewport(width, height);
    cam.fit(s.geometry().bounds());
    try (OffscreenPicture pic = new OffscreenPicture(width, height)) {
      pic.render(scene, cam);
      int frames = 30;
      long t0 = System.nanoTime();
      for (int i = 0; i < frames; i++) {
        cam.orbit(3, 0.5);
        draw(pic, scene, cam);
      }
      return ms(System.nanoTime() - t0) / frames;
    }
  }

  private static Path writeResults(Path dir, int cells) throws IOException {
    TetMesh mesh = StructuredMesher.box(0.02, 0.02, 0.02, cells, cells, cells, 1);
    Path folder = dir.resolve("results");
    Files.createDirectories(folder.resolve("fields"));
    MshWriter.write(folder.resolve(ResultFiles.MESH_COPY), mesh, true);
    List<PvdEntry> entries = new ArrayList<>();
    double[] times = {3600, 7200};
    for (int f = 0; f < 2; f++) {
      double depth = 0.004 * (f + 1);
      double[] c = new double[mesh.nodeCount()];
      for (int n = 0; n < c.length; n++) {
        // a front entering from x = 0: the shape only has to be smooth and vary in space
        c[n] = Math.exp(-mesh.coord(n, 0) / depth) * (1 + 0.1 * Math.sin(300 * mesh.coord(n, 1)));
      }
      String name = String.format(Locale.ROOT, "fields/c_%04d.vtu", f);
      VtuWriter.write(
          folder.resolve(name),
          mesh,
          List.of(new VtuWriter.Field("c", 1, c), new VtuWriter.Field("phi", 1, c)),
          List.of(),
          VtuFormat.APPENDED_BASE64,
          false);
      entries.add(new PvdEntry(times[f], name));
    }
    PvdWriter.write(folder.resolve(ResultFiles.FIELDS), entries);
    return folder;
  }

  private static double ms(long nanos) {
    return nanos / 1e6;
  }
}
