package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.joml.Vector3d;
import org.junit.jupiter.api.Test;

/** Camera maths, boundary surface, picking and annotations, without a window. */
class ViewMathsTest {
  @Test
  void cameraFramesAreRightHandedAndAxisViewsLookAlongTheAxes() {
    OrbitCamera c = new OrbitCamera();
    c.viewport(800, 600);
    for (OrbitCamera.View v : OrbitCamera.View.values()) {
      c.look(v);
      Vector3d eye = c.towardsEye();
      Vector3d up = c.up();
      Vector3d right = c.right();
      // exact geometry: an orthonormal right-handed frame (right x up = towards the eye)
      assertEquals(1, eye.length(), 1e-12);
      assertEquals(0, eye.dot(up), 1e-12);
      assertEquals(0, right.dot(up), 1e-12);
      Vector3d r = right.cross(up, new Vector3d());
      assertEquals(0, r.distance(eye), 1e-12, v.label());
    }
    c.look(OrbitCamera.View.XMIN);
    assertEquals(0, c.towardsEye().distance(new Vector3d(-1, 0, 0)), 1e-12);
    assertEquals(0, c.up().distance(new Vector3d(0, 0, 1)), 1e-12);
    c.look(OrbitCamera.View.ZMAX);
    assertEquals(0, c.towardsEye().distance(new Vector3d(0, 0, 1)), 1e-12);
    assertThrows(IllegalArgumentException.class, () -> OrbitCamera.View.parse("front"));
  }

  @Test
  void pixelAndRayAreInverseAndTheGlMatrixAgrees() {
    OrbitCamera c = new OrbitCamera();
    c.viewport(640, 480);
    c.fit(new double[] {0, 0, 0, 0.02, 0.01, 0.005});
    c.orbit(17, -8);
    double[] p = {0.013, 0.002, 0.004};
    double[] px = c.toPixel(p[0], p[1], p[2]);
    double[] ray = c.ray(px[0], px[1]);
    // the point lies on the ray through its own pixel
    Vector3d o = new Vector3d(ray[0], ray[1], ray[2]);
    Vector3d d = new Vector3d(ray[3], ray[4], ray[5]);
    Vector3d q = new Vector3d(p).sub(o);
    double s = q.dot(d);
    assertTrue(s > 0);
    assertEquals(0, q.sub(new Vector3d(d).mul(s)).length(), 1e-12);
    // the GL matrix maps the point to the same pixel (NDC to window, y down)
    float[] m = c.viewProjection();
    double cx = m[0] * p[0] + m[4] * p[1] + m[8] * p[2] + m[12];
    double cy = m[1] * p[0] + m[5] * p[1] + m[9] * p[2] + m[13];
    double cz = m[2] * p[0] + m[6] * p[1] + m[10] * p[2] + m[14];
    assertEquals(px[0], (cx + 1) / 2 * 640, 1e-3);
    assertEquals(px[1], (1 - cy) / 2 * 480, 1e-3);
    assertTrue(cz > -1 && cz < 1, "inside the depth range");
  }

  @Test
  void fitShowsEveryCornerOfTheBox() {
    OrbitCamera c = new OrbitCamera();
    c.viewport(300, 700);
    double[] b = {-1, 2, 0, 3, 2.5, 7};
    c.fit(b);
    for (OrbitCamera.View v : OrbitCamera.View.values()) {
      c.look(v);
      for (int k = 0; k < 8; k++) {
        double[] px =
            c.toPixel(b[(k & 1) * 3], b[1 + ((k >> 1) & 1) * 3], b[2 + ((k >> 2) & 1) * 3]);
        assertTrue(px[0] >= 0 && px[0] <= 300 && px[1] >= 0 && px[1] <= 700, v.label());
      }
    }
  }

  @Test
  void boundarySurfaceEnclosesTheVolumeAndKeepsFaceGroups() {
    for (int order = 1; order <= 2; order++) {
      TetMesh m = StructuredMesher.box(0.3, 0.2, 0.1, 3, 2, 2, order);
      PartGeometry g = PartGeometry.of(m);
      BoundarySurface s = BoundarySurface.of(g, new boolean[] {true});
      int sub = order == 1 ? 1 : 4;
      // 2 triangles a cell face: 2 (3x2 + 3x2 + 2x2) = 32 cell faces
      assertEquals(sub * 2 * 32, s.triangleCount());
      double[] c = PickIndex.corners(s, g.coordinates());
      double area = 0;
      double volume = 0;
      double[] n = new double[3];
      for (int t = 0; t < s.triangleCount(); t++) {
        double a = triangle(c, t, n);
        area += a;
        double cx = (c[9 * t] + c[9 * t + 3] + c[9 * t + 6]) / 3;
        double cy = (c[9 * t + 1] + c[9 * t + 4] + c[9 * t + 7]) / 3;
        double cz = (c[9 * t + 2] + c[9 * t + 5] + c[9 * t + 8]) / 3;
        // divergence theorem: V = 1/3 of the surface integral of x.n (outward normals)
        volume += a * (cx * n[0] + cy * n[1] + cz * n[2]) / 3;
        String group = g.faceGroupNames().get(s.faceGroup(t));
        // exact geometry: the face group's plane
        double expected =
            switch (group) {
              case "xmin" -> cx;
              case "xmax" -> 0.3 - cx;
              case "ymin" -> cy;
              case "ymax" -> 0.2 - cy;
              case "zmin" -> cz;
              default -> 0.1 - cz;
            };
        assertEquals(0, expected, 1e-15, group);
      }
      assertEquals(2 * (0.3 * 0.2 + 0.3 * 0.1 + 0.2 * 0.1), area, 1e-14);
      assertEquals(0.3 * 0.2 * 0.1, volume, 1e-15);
    }
  }

  @Test
  void hidingAPartOpensItsInterface() {
    TetMesh m =
        StructuredMesher.layers(
            0.2,
            0.1,
            2,
            1,
            List.of(
                new StructuredMesher.Layer("lower", 0.1, 1),
                new StructuredMesher.Layer("upper", 0.05, 1)),
            1);
    PartGeometry g = PartGeometry.of(m);
    BoundarySurface s = BoundarySurface.of(g, new boolean[] {true, false});
    double area = 0;
    double[] c = PickIndex.corners(s, g.coordinates());
    int interfaceTriangles = 0;
    for (int t = 0; t < s.triangleCount(); t++) {
      area += triangle(c, t, new double[3]);
      assertEquals(0, s.part(t));
      if (g.faceGroupNames().get(s.faceGroup(t)).equals("lower-upper")) {
        interfaceTriangles++;
      }
    }
    // exact geometry: the lower layer alone is a 0.2 x 0.1 x 0.1 box
    assertEquals(2 * (0.2 * 0.1 + 0.2 * 0.1 + 0.1 * 0.1), area, 1e-14);
    assertEquals(4, interfaceTriangles); // 2 cells x 2 triangles on the opened joint
  }

  private static double triangle(double[] c, int t, double[] normal) {
    int o = 9 * t;
    double ax = c[o + 3] - c[o];
    double ay = c[o + 4] - c[o + 1];
    double az = c[o + 5] - c[o + 2];
    double bx = c[o + 6] - c[o];
    double by = c[o + 7] - c[o + 1];
    double bz = c[o + 8] - c[o + 2];
    double x = ay * bz - az * by;
    double y = az * bx - ax * bz;
    double z = ax * by - ay * bx;
    double len = Math.sqrt(x * x + y * y + z * z);
    normal[0] = x / len;
    normal[1] = y / len;
    normal[2] = z / len;
    return len / 2;
  }

  @Test
  void pickingFindsTheNearestTriangleAsABruteForceSearchDoes() {
    TetMesh m = StructuredMesher.box(1, 1, 1, 6, 5, 4, 1);
    PartGeometry g = PartGeometry.of(m);
    BoundarySurface s = BoundarySurface.of(g, new boolean[] {true});
    double[] c = PickIndex.corners(s, g.coordinates());
    PickIndex index = new PickIndex(c);
    Random rnd = new Random(7);
    int hits = 0;
    for (int i = 0; i < 300; i++) {
      double[] o = {rnd.nextDouble() * 3 - 1, rnd.nextDouble() * 3 - 1, 2.5};
      double[] d = {rnd.nextGaussian() * 0.3, rnd.nextGaussian() * 0.3, -1};
      double len = Math.sqrt(d[0] * d[0] + d[1] * d[1] + d[2] * d[2]);
      for (int k = 0; k < 3; k++) {
        d[k] /= len;
      }
      Optional<PickIndex.Hit> h = index.pick(o[0], o[1], o[2], d[0], d[1], d[2]);
      double best = Double.POSITIVE_INFINITY;
      for (int t = 0; t < s.triangleCount(); t++) {
        double[] one = java.util.Arrays.copyOfRange(c, 9 * t, 9 * t + 9);
        Optional<PickIndex.Hit> b = new PickIndex(one).pick(o[0], o[1], o[2], d[0], d[1], d[2]);
        if (b.isPresent()) {
          best = Math.min(best, b.get().distance());
        }
      }
      assertEquals(Double.isFinite(best), h.isPresent());
      if (h.isPresent()) {
        hits++;
        assertEquals(best, h.get().distance(), 1e-12);
      }
    }
    assertTrue(hits > 30, "enough rays hit the box: " + hits);
    // a ray straight down onto the top names zmax, at the exact distance 2.5 - 1
    Optional<PickIndex.Hit> top = index.pick(0.31, 0.77, 2.5, 0, 0, -1);
    assertEquals("zmax", g.faceGroupNames().get(s.faceGroup(top.orElseThrow().triangle())));
    assertEquals(1.5, top.get().distance(), 1e-12);
  }

  @Test
  void reducedSurfaceKeepsTheShapeWithFewerTriangles() {
    TetMesh m = StructuredMesher.box(1, 1, 1, 20, 20, 20, 1);
    Study study = Study.ofMesh(java.nio.file.Path.of("box"), m);
    ViewSettings v = new ViewSettings();
    v.field(Optional.empty());
    Scene scene = new Scene(study, v);
    Scene.Mesh full = scene.surfaceMesh();
    // small surfaces are drawn whole even while moving
    assertTrue(scene.movingSurfaceMesh() == full);
    Scene.Mesh reduced = ReducedSurface.of(full, 10);
    assertTrue(reduced.triangleCount() < 0.4 * full.triangleCount(), reduced.triangleCount() + "");
    double area = 0;
    double[] c = new double[reduced.positions.length];
    for (int i = 0; i < c.length; i++) {
      c[i] = reduced.positions[i];
    }
    for (int t = 0; t < reduced.triangleCount(); t++) {
      area += triangle(c, t, new double[3]);
    }
    // exact geometry: the full box has area 6; cluster means pull only the cells along the edges
    // inward, by under half a cell (0.05), so the area stays above 6 (1 - 2 x 0.05)^2 = 4.86
    assertTrue(area > 4.86 && area <= 6 + 1e-9, "area " + area);
    for (double x : c) {
      assertTrue(x >= -1e-6 && x <= 1 + 1e-6);
    }
  }

  @Test
  void annotationsUseRoundNumbersAndReadableUnits() {
    assertEquals(0.005, Annotations.roundLength(0.0073), 1e-18);
    assertEquals(0.02, Annotations.roundLength(0.02), 1e-18);
    assertEquals(1e-4, Annotations.roundLength(1.9e-4), 1e-20);
    assertEquals("5 mm", Annotations.length(0.005));
    assertEquals("20 um", Annotations.length(2e-5));
    assertEquals("7 d", Annotations.time(604800));
    assertEquals("90 min", Annotations.time(5400));
    assertEquals("0.502", Annotations.number(0.50214));
    assertEquals("1.82e-4", Annotations.number(1.8161e-4));
    assertArrayEquals(
        new double[] {0, 0.5, 1},
        Resample.even(new double[] {0, 2}, new double[] {0, 1}, 3),
        1e-15);
    assertArrayEquals(
        new double[] {0, 2 + 2.0 / 3, 4},
        Resample.even(new double[] {0, 1, 4}, new double[] {0, 2, 4}, 3),
        1e-15); // at t = 2, between (1, 2) and (4, 4): 2 + (2 - 1) / 3 * 2
  }
}
