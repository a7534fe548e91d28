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
 * and Moritz 1967, eq. 1-73); exact in double to degree 36 and beyond. The recursion's factors
 * (2n-1)/(n-m) and (n+m-1)/(n-m) are tabulated at construction and V, W kept in packed arrays
 * (index n(n+1)/2 + m), so a call does no division besides 1/r. Not thread-safe (scratch).
 */
final class Cunningham {
  private final int degree;
  private final double gm;
  private final double radius;
  /** Unnormalised C_nm, S_nm at packed index n(n+1)/2 + m, n <= degree. */
  private final double[] c;
  private final double[] s;
  /** V_nm, W_nm at the same packed index, n <= degree + 1 (scratch). */
  private final double[] v;
  private final double[] w;
  /** Recursion factors (2n-1)/(n-m) and (n+m-1)/(n-m) for n >= m + 2 (no division per call). */
  private final double[] alpha;
  private final double[] beta;

  Cunningham(GravityField field, int degree) {
    this.degree = degree;
    this.gm = field.gmM3PerS2();
    this.radius = field.radiusM();
    c = new double[index(degree, degree) + 1];
    s = new double[c.length];
    for (int n = 2; n <= degree; n++) {
      for (int m = 0; m <= n; m++) {
        final double norm = Math.sqrt((m == 0 ? 1.0 : 2.0) * (2 * n + 1) * ratioOfFactorials(n - m, n + m));
        c[index(n, m)] = field.c(n, m) * norm;
        s[index(n, m)] = field.s(n, m) * norm;
      }
    }
    final int nmax = degree + 1;
    v = new double[index(nmax, nmax) + 1];
    w = new double[v.length];
    alpha = new double[v.length];
    beta = new double[v.length];
    for (int m = 0; m <= nmax; m++) {
      for (int n = m + 2; n <= nmax; n++) {
        alpha[index(n, m)] = (2.0 * n - 1.0) / (n - m);
        beta[index(n, m)] = (n + m - 1.0) / (n - m);
      }
    }
  }

  private static int index(int n, int m) {
    return n * (n + 1) / 2 + m;
  }

  /** (a)!/(b)! for a <= b, as a product to avoid overflow. */
  private static double ratioOfFactorials(int a, int b) {
    double r = 1.0;
    for (int k = a + 1; k <= b; k++) {
      r /= k;
    }
    return r;
  }

  /**
   * V_nm, W_nm for n, m <= nmax, row by row: every element of row n needs only rows n-1 and n-2,
   * so the elements of a row are independent (no chain of dependent multiplications along a
   * column) and contiguous in the packed arrays.
   */
  private void recursion(double x, double y, double z, int nmax) {
    final double r2 = x * x + y * y + z * z;
    final double rr = radius / r2;
    final double x0 = x * rr;
    final double y0 = y * rr;
    final double z0 = z * rr;
    final double rho = radius * rr;
    final double[] v = this.v;
    final double[] w = this.w;
    v[0] = radius / Math.sqrt(r2);
    w[0] = 0.0;
    v[1] = z0 * v[0];
    w[1] = z0 * w[0];
    v[2] = x0 * v[0] - y0 * w[0];
    w[2] = x0 * w[0] + y0 * v[0];
    for (int n = 2; n <= nmax; n++) {
      final int row = index(n, 0);
      final int p1 = row - n; // index(n-1, 0)
      final int p2 = p1 - n + 1; // index(n-2, 0)
      for (int m = 0; m <= n - 2; m++) {
        final int i = row + m;
        final double a = alpha[i] * z0;
        final double b = beta[i] * rho;
        v[i] = a * v[p1 + m] - b * v[p2 + m];
        w[i] = a * w[p1 + m] - b * w[p2 + m];
      }
      final int diag = p1 + n - 1; // index(n-1, n-1)
      final double f = (2 * n - 1) * z0;
      v[row + n - 1] = f * v[diag];
      w[row + n - 1] = f * w[diag];
      final double g = 2 * n - 1;
      v[row + n] = g * (x0 * v[diag] - y0 * w[diag]);
      w[row + n] = g * (x0 * w[diag] + y0 * v[diag]);
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
    final double[] v = this.v;
    final double[] w = this.w;
    double u = 0.0;
    double ax = -v[2];
    double ay = -w[2];
    double az = -v[1];
    for (int n = 2; n <= degree; n++) {
      final int row = index(n, 0);
      final int up = row + n + 1; // index(n+1, 0)
      final double c0 = c[row];
      final double s0 = s[row];
      u += c0 * v[row] + s0 * w[row];
      ax -= c0 * v[up + 1];
      ay -= c0 * w[up + 1];
      az += (n + 1) * (-c0 * v[up] - s0 * w[up]);
      for (int m = 1; m <= n; m++) {
        final double cnm = c[row + m];
        final double snm = s[row + m];
        u += cnm * v[row + m] + snm * w[row + m];
        final double fac = (n - m + 1) * (n - m + 2);
        final double vp = v[up + m + 1];
        final double wp = w[up + m + 1];
        final double vm = v[up + m - 1];
        final double wm = w[up + m - 1];
        ax += 0.5 * ((-cnm * vp - snm * wp) + fac * (cnm * vm + snm * wm));
        ay += 0.5 * ((-cnm * wp + snm * vp) + fac * (-cnm * wm + snm * vm));
        az += (n - m + 1) * (-cnm * v[up + m] - snm * w[up + m]);
      }
    }
    final double k = gm / (radius * radius);
    accOut[0] = k * ax;
    accOut[1] = k * ay;
    accOut[2] = k * az;
    return gm / radius * u;
  }
}
