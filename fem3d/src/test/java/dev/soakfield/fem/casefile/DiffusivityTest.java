package dev.soakfield.fem.casefile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DiffusivityTest {
  @Test
  void rotationAboutZByThirtyDegreesMatchesTheHandComputedTensor() {
    // exact geometry: R = [[c, -s, 0], [s, c, 0], [0, 0, 1]] with c = cos 30° = √3/2, s = 1/2;
    // R·diag(1, 2, 3)·Rᵀ = [[c² + 2s², -cs, 0], [-cs, s² + 2c², 0], [0, 0, 3]]
    //                    = [[1.25, -√3/4, 0], [-√3/4, 1.75, 0], [0, 0, 3]]
    double c = Math.sqrt(3) / 2;
    double s = 0.5;
    Diffusivity d =
        Diffusivity.orthotropic(
            new double[] {1, 2, 3}, new double[][] {{c, s, 0}, {-s, c, 0}, {0, 0, 1}});
    assertArrayEquals(new double[] {1.25, 1.75, 3, -Math.sqrt(3) / 4, 0, 0}, d.tensor(), 1e-15);
    assertFalse(d.isIsotropic());
  }

  @Test
  void axesAreNormalizedBeforeUse() {
    // exact geometry: axes (1,1,0)/√2, (-1,1,0)/√2, z: xx = yy = (d1 + d2)/2, xy = (d1 - d2)/2
    Diffusivity d =
        Diffusivity.orthotropic(
            new double[] {4e-12, 2e-12, 5e-12},
            new double[][] {{3, 3, 0}, {-0.5, 0.5, 0}, {0, 0, 7}});
    assertArrayEquals(new double[] {3e-12, 3e-12, 5e-12, 1e-12, 0, 0}, d.tensor(), 1e-27);
  }

  @Test
  void generalRotationKeepsTraceAndPrincipalDirections() {
    // exact geometry: a rotation keeps the trace (sum of principal values) and D·aₖ = dₖ·aₖ
    double[][] axes = {{2, 1, 2}, {1, 2, -2}, {-2, 2, 1}}; // orthogonal rows of length 3
    double[] principal = {1, 5, 9};
    Diffusivity d = Diffusivity.orthotropic(principal, axes);
    double[] t = d.tensor();
    assertEquals(15, t[0] + t[1] + t[2], 1e-13);
    double[][] m = {{t[0], t[3], t[5]}, {t[3], t[1], t[4]}, {t[5], t[4], t[2]}};
    for (int k = 0; k < 3; k++) {
      for (int i = 0; i < 3; i++) {
        double mi = m[i][0] * axes[k][0] + m[i][1] * axes[k][1] + m[i][2] * axes[k][2];
        assertEquals(principal[k] * axes[k][i], mi, 1e-13);
      }
    }
  }

  @Test
  void isotropicIsDTimesIdentity() {
    Diffusivity d = Diffusivity.isotropic(2.5e-12);
    assertArrayEquals(new double[] {2.5e-12, 2.5e-12, 2.5e-12, 0, 0, 0}, d.tensor());
    assertTrue(d.isIsotropic());
  }

  @Test
  void rejectsAxesBeyondTheTolerance() {
    double tilt = 1e-6; // dot product of the normalized axes ≈ 1e-6 > 1e-9
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () ->
                Diffusivity.orthotropic(
                    new double[] {1, 1, 1}, new double[][] {{1, 0, 0}, {tilt, 1, 0}, {0, 0, 1}}));
    assertTrue(
        e.getMessage().startsWith("axes 1 and 2 have a dot product of 9.99"), e.getMessage());
    assertThrows(
        IllegalArgumentException.class,
        () ->
            Diffusivity.orthotropic(
                new double[] {1, 1, 1}, new double[][] {{0, 0, 0}, {0, 1, 0}, {0, 0, 1}}));
    assertThrows(
        IllegalArgumentException.class,
        () ->
            Diffusivity.orthotropic(
                new double[] {1, -1, 1}, new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}}));
  }
}
