package org.eigenzeit.ground.trajectory;

/**
 * The IAU 2000 frame bias between the GCRS and the J2000 mean equator and equinox (the CCSDS frame
 * EME2000): {@code x_EME2000 = B x_GCRS} with {@code B = R1(-eta0) R2(xi0) R3(dalpha0)}, dalpha0 =
 * -14.6 mas, xi0 = -16.6170 mas, eta0 = -6.8192 mas (IERS Conventions 2010, IERS Technical Note 36,
 * section 5.5.4; values from memory, the matrix is checked against SOFA's {@code iauBp00} in the
 * tests). R1, R2, R3 are the usual passive rotations about x, y, z.
 *
 * <p>The bias is a constant rotation of about 23 mas (1.1e-7 rad): about 0.7 m of position in LEO,
 * 2.9 m at GPS altitude, 4.7 m at GEO. Exact for the axes, valid at any epoch. Stateless.
 */
public final class FrameBias {
  private static final double MAS = Math.PI / (180.0 * 3600.0 * 1000.0);
  private static final double[][] B = bias();

  private FrameBias() {}

  private static double[][] bias() {
    final double da = -14.6 * MAS;
    final double xi = -16.6170 * MAS;
    final double eta = -6.8192 * MAS;
    return multiply(r1(-eta), multiply(r2(xi), r3(da)));
  }

  private static double[][] r1(double a) {
    return new double[][] {{1, 0, 0}, {0, Math.cos(a), Math.sin(a)}, {0, -Math.sin(a), Math.cos(a)}};
  }

  private static double[][] r2(double a) {
    return new double[][] {{Math.cos(a), 0, -Math.sin(a)}, {0, 1, 0}, {Math.sin(a), 0, Math.cos(a)}};
  }

  private static double[][] r3(double a) {
    return new double[][] {{Math.cos(a), Math.sin(a), 0}, {-Math.sin(a), Math.cos(a), 0}, {0, 0, 1}};
  }

  private static double[][] multiply(double[][] a, double[][] b) {
    final double[][] c = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        for (int k = 0; k < 3; k++) {
          c[i][j] += a[i][k] * b[k][j];
        }
      }
    }
    return c;
  }

  /**
   * The bias matrix B (GCRS to EME2000).
   *
   * @return a copy of B, row-major
   */
  public static double[][] matrix() {
    return new double[][] {B[0].clone(), B[1].clone(), B[2].clone()};
  }

  /**
   * Rotates a vector from EME2000 to the GCRS: {@code x_GCRS = B^T x_EME2000}.
   *
   * @param eme2000 the vector in EME2000
   * @param gcrsOut receives the vector in the GCRS (must not be {@code eme2000})
   */
  public static void eme2000ToGcrs(double[] eme2000, double[] gcrsOut) {
    for (int i = 0; i < 3; i++) {
      gcrsOut[i] = B[0][i] * eme2000[0] + B[1][i] * eme2000[1] + B[2][i] * eme2000[2];
    }
  }
}
