package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/** The IAU 2000 frame bias against SOFA's iauBp00 (jsofa, an independent implementation). */
class FrameBiasTest {
  @Test
  void biasMatrixMatchesSofa() {
    final double[][] rb = new double[3][3];
    final double[][] rp = new double[3][3];
    final double[][] rbp = new double[3][3];
    JSOFA.jauBp00(2_451_545.0, 0.0, rb, rp, rbp);
    final double[][] b = FrameBias.matrix();
    double worst = 0;
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        worst = Math.max(worst, Math.abs(b[i][j] - rb[i][j]));
      }
    }
    System.out.printf("evidence: trajectory.frame_bias_vs_sofa = %.2e%n", worst);
    // The bias is about 1e-7 rad; SOFA derives xi0 from dpsibi sin(eps0) (5e-13 rad apart).
    assertEquals(0.0, worst, 5e-12);
    // The rotation EME2000 -> GCRS is B^T: B applied to the result returns the input.
    final double[] x = {26_560e3, -1_200e3, 3_000e3};
    final double[] g = new double[3];
    FrameBias.eme2000ToGcrs(x, g);
    for (int i = 0; i < 3; i++) {
      assertEquals(x[i], rb[i][0] * g[0] + rb[i][1] * g[1] + rb[i][2] * g[2], 1e-4);
    }
    // About 23 mas: 2.9 m at GPS radius (the documented size of the effect).
    final double moved = Math.sqrt(Math.pow(g[0] - x[0], 2) + Math.pow(g[1] - x[1], 2) + Math.pow(g[2] - x[2], 2));
    assertEquals(2.9, moved, 0.3);
  }
}
