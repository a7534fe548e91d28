package org.eigenzeit.ground.reference;

import org.eigenzeit.onboard.gravity.GravityField;

/**
 * Geopotential and its gradient in the body-fixed frame by the Cunningham recursion of the
 * functions V_nm, W_nm (Cunningham 1970, Celestial Mechanics 2:207-216; in the form of
 * Montenbruck and Gill, "Satellite Orbits", Springer 2000, section 3.2.4-3.2.5, eqs. 3.27-3.33):
 *
 * <pre>
 *   V_mm = (2m-1) (x R/r^2 V_{m-1,m-1} - y R/r^2 W_{m-1,m-1}),  W_mm analogous
 *   V_nm = (2n-1)/(n-m) z R/r^2 V_{n-1,m} - (n+m-1)/(n-m) R^2/r^2 V_{n-2,m}
 *   U    = GM/R sum C_nm V_nm + S_nm W_nm       (unnormalised C, S)
 *   a    from eq. 3.33 with V, W to degree n+1.
 * </pre>
 *
 * An algorithm independent of the onboard core's (normalised Legendre columns), so that the two
 * check each other. Unnormalisation factor sqrt((2 - delta_m0)(2n+1)(n-m)!/(n+m)!) (Heiskanen
 * and Moritz 1967, eq. 1-73); exact in double to degree 36 and beyond. Not thread-safe (scratch).
 */
final class Cunningham {
  private final int degree;
  private final double gm;
  private final double radius;
  private final double[][] c;
  private final double[][] s;
  private final double[][] v;
  private final double[][] w;

  Cunningham(GravityField field, int degree) {
    this.degree = degree;
    this.gm = field.gmM3PerS2();
    this.radius = field.radiusM();
    c = new double[degree + 1][degree + 1];
    s = new double[degree + 1][degree + 1];
    for (int n = 2; n <= degree; n++) {
      for (int m = 0; m <= n; m++) {
        final double norm = Math.sqrt((m == 0 ? 1.0 : 2.0) * (2 * n + 1) * ratioOfFactorials(n - m, n + m));
        c[n][m] = field.c(n, m) * norm;
        s[n][m] = field.s(n, m) * norm;
      }
    }
    v = new double[degree + 3][degree + 3];
    w = new double[degree + 3][degree + 3];
  }

  /** (a)!/(b)! for a <= b, as a product to avoid overflow. */
  private static double ratioOfFactorials(int a, int b) {
    double r = 1.0;
    for (int k = a + 1; k <= b; k++) {
      r /= k;
    }
    return r;
  }

  private void recursion(double x, double y, double z, int nmax) {
    final double r2 = x * x + y * y + z * z;
    final double rr = radius / r2;
    final double x0 = x * rr;
    final double y0 = y * rr;
    final double z0 = z * rr;
    final double rho = radius * rr;
    v[0][0] = radius / Math.sqrt(r2);
    w[0][0] = 0.0;
    for (int m = 0; m <= nmax; m++) {
      if (m > 0) {
        v[m][m] = (2 * m - 1) * (x0 * v[m - 1][m - 1] - y0 * w[m - 1][m - 1]);
        w[m][m] = (2 * m - 1) * (x0 * w[m - 1][m - 1] + y0 * v[m - 1][m - 1]);
      }
      if (m + 1 <= nmax) {
        v[m + 1][m] = (2 * m + 1) * z0 * v[m][m];
        w[m + 1][m] = (2 * m + 1) * z0 * w[m][m];
      }
      for (int n = m + 2; n <= nmax; n++) {
        v[n][m] = ((2 * n - 1) * z0 * v[n - 1][m] - (n + m - 1) * rho * v[n - 2][m]) / (n - m);
        w[n][m] = ((2 * n - 1) * z0 * w[n - 1][m] - (n + m - 1) * rho * w[n - 2][m]) / (n - m);
      }
    }
  }

  /**
   * Harmonic potential (degree 2 and above) and acceleration of the full field (monopole
   * included) at a body-fixed position.
   *
   * @param pos body-fixed position, m
   * @param accOut receives the acceleration, m/s^2, body-fixed
   * @return the harmonic potential U_h (degree >= 2), m^2/s^2, positive convention
   */
  double evaluate(double[] pos, double[] accOut) {
    recursion(pos[0], pos[1], pos[2], degree + 1);
    double u = 0.0;
    for (int n = 2; n <= degree; n++) {
      for (int m = 0; m <= n; m++) {
        u += c[n][m] * v[n][m] + s[n][m] * w[n][m];
      }
    }
    double ax = -v[1][1];
    double ay = -w[1][1];
    double az = -v[1][0];
    for (int n = 2; n <= degree; n++) {
      for (int m = 0; m <= n; m++) {
        final double cnm = c[n][m];
        final double snm = s[n][m];
        if (m == 0) {
          ax -= cnm * v[n + 1][1];
          ay -= cnm * w[n + 1][1];
        } else {
          final double fac = (n - m + 1) * (n - m + 2);
          ax += 0.5 * ((-cnm * v[n + 1][m + 1] - snm * w[n + 1][m + 1])
              + fac * (cnm * v[n + 1][m - 1] + snm * w[n + 1][m - 1]));
          ay += 0.5 * ((-cnm * w[n + 1][m + 1] + snm * v[n + 1][m + 1])
              + fac * (-cnm * w[n + 1][m - 1] + snm * v[n + 1][m - 1]));
        }
        az += (n - m + 1) * (-cnm * v[n + 1][m] - snm * w[n + 1][m]);
      }
    }
    final double k = gm / (radius * radius);
    accOut[0] = k * ax;
    accOut[1] = k * ay;
    accOut[2] = k * az;
    return gm / radius * u;
  }
}
