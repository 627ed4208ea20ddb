package dev.soakfield.fem.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.assembly.CsrMatrix;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/** The building blocks of the AMG set-up, each against a dense computation. */
class AmgPartsTest {
  @Test
  void galerkinProductMatchesDenseTripleProduct() {
    CsrMatrix a = GridLaplacian.build(6, 0.3, true);
    double[] diagonal = a.diagonal();
    SparseRows filtered = StrengthFilter.filter(a, diagonal, 0.08);
    GreedyAggregation aggregation = GreedyAggregation.of(filtered);
    SparseRows p = SmoothedProlongator.build(filtered, aggregation);
    SparseRows pt = p.transpose();
    CsrMatrix coarse = GalerkinProduct.coarse(a, p, pt);
    RealMatrix pd = dense(p);
    RealMatrix ad = new Array2DRowRealMatrix(TestSystems.toDense(a));
    // Reference: Commons Math's dense Pᵀ·A·P.
    RealMatrix expected = pd.transpose().multiply(ad).multiply(pd);
    assertEquals(expected.getRowDimension(), coarse.size());
    double[][] got = TestSystems.toDense(coarse);
    for (int i = 0; i < coarse.size(); i++) {
      for (int j = 0; j < coarse.size(); j++) {
        assertEquals(expected.getEntry(i, j), got[i][j], 1e-12);
      }
      for (int k = coarse.rowStart()[i] + 1; k < coarse.rowStart()[i + 1]; k++) {
        assertTrue(coarse.cols()[k - 1] < coarse.cols()[k], "columns ascending");
      }
    }
  }

  @Test
  void prolongatorRowsOfInteriorNodesReproduceConstantsBeforeScaling() {
    // P = (I − ω D⁻¹ A_F) P_tent: A_F keeps A's row sums, so where A's row sum is zero (interior,
    // no shift) A_F·1 = 0 and P applied to the aggregate weights (1/‖column‖, i.e. P_tent's
    // coefficients of the constant vector) gives 1 exactly (common practice property of SA).
    CsrMatrix a = GridLaplacian.build(9, 0.0, false);
    SparseRows filtered = StrengthFilter.filter(a, a.diagonal(), 0.08);
    GreedyAggregation aggregation = GreedyAggregation.of(filtered);
    int[] sizes = new int[aggregation.count()];
    for (int g : aggregation.aggregateOf()) {
      sizes[g]++;
    }
    double[] coarseConstant = new double[aggregation.count()];
    for (int g = 0; g < sizes.length; g++) {
      coarseConstant[g] = Math.sqrt(sizes[g]);
    }
    SparseRows p = SmoothedProlongator.build(filtered, aggregation);
    double[] fine = new double[a.size()];
    p.multiply(coarseConstant, fine);
    for (double v : fine) {
      assertEquals(1.0, v, 1e-12);
    }
  }

  @Test
  void aggregationCoversEveryConnectedNodeOnceAndSkipsIsolatedOnes() {
    CsrMatrix a = GridLaplacian.build(8, 0.0, true);
    // Decouple node 0 by making its diagonal huge: its connections become weak.
    a.values()[a.indexOf(0, 0)] = 1e6;
    SparseRows filtered = StrengthFilter.filter(a, a.diagonal(), 0.08);
    GreedyAggregation aggregation = GreedyAggregation.of(filtered);
    int[] agg = aggregation.aggregateOf();
    assertEquals(-1, agg[0]);
    int[] sizes = new int[aggregation.count()];
    for (int i = 1; i < agg.length; i++) {
      assertTrue(agg[i] >= 0 && agg[i] < aggregation.count(), "node " + i);
      sizes[agg[i]]++;
    }
    for (int size : sizes) {
      assertTrue(size >= 1);
    }
  }

  @Test
  void spectralRadiusOfJacobiScaledLaplacianMatchesTheFormula() {
    // Exact: for the 7-point Dirichlet Laplacian on n³ points, D⁻¹A = A/6 has largest eigenvalue
    // (3·(2 + 2cos(π/(n+1))))/6 = 1 + cos(π/(n+1)) (eigenvalues of the 1D second difference).
    int n = 10;
    CsrMatrix a = GridLaplacian.build(n, 0.0, true);
    SparseRows rows =
        new SparseRows(a.size(), a.size(), a.rowStart(), a.cols(), a.values().clone());
    double rho = SmoothedProlongator.spectralRadius(rows, a.diagonal());
    double exact = 1 + Math.cos(Math.PI / (n + 1));
    assertTrue(rho <= exact * (1 + 1e-12), "a Ritz value is a lower bound");
    assertTrue(rho >= 0.97 * exact, "rho " + rho + " exact " + exact);
  }

  @Test
  void denseCholeskyMatchesCommonsMath() {
    CsrMatrix a = TestSystems.denseSpd(40, 3);
    double[] b = new double[40];
    for (int i = 0; i < 40; i++) {
      b[i] = i - 20.5;
    }
    double[] x = new double[40];
    DenseCholesky.factor(a).solve(b, x);
    double[] expected =
        new CholeskyDecomposition(new Array2DRowRealMatrix(TestSystems.toDense(a)))
            .getSolver()
            .solve(new ArrayRealVector(b))
            .toArray();
    assertTrue(TestSystems.distance(x, expected) <= 1e-12 * TestSystems.norm(expected));
    CsrMatrix indefinite = GridLaplacian.build(2, -5.0, true);
    assertThrows(IllegalArgumentException.class, () -> DenseCholesky.factor(indefinite));
  }

  private static RealMatrix dense(SparseRows s) {
    RealMatrix m = new Array2DRowRealMatrix(s.rows, s.columns);
    for (int i = 0; i < s.rows; i++) {
      for (int k = s.rowStart[i]; k < s.rowStart[i + 1]; k++) {
        m.setEntry(i, s.cols[k], s.values[k]);
      }
    }
    return m;
  }
}
