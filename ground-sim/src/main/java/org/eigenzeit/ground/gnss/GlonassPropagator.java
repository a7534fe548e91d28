package org.eigenzeit.ground.gnss;

/**
 * Propagation of a GLONASS broadcast state vector from its reference epoch t_b, by the
 * "simplified algorithm for re-calculation of ephemeris to current time" of the GLONASS ICD
 * (edition 5.1, 2008, Appendix A.3.1.2; from memory): the equations of motion in the rotating
 * PZ-90 frame with the central term, the second zonal harmonic, the centrifugal and Coriolis
 * terms and the broadcast luni-solar acceleration held constant,
 *
 * <pre>
 * dv/dt = -mu r/|r|^3 - (3/2) J2 mu a_e^2 / |r|^5 [x (1 - 5 z^2/r^2), y (1 - 5 z^2/r^2), z (3 - 5 z^2/r^2)]
 *         + w^2 [x, y, 0] + 2 w [v_y, -v_x, 0] + a_ls
 * </pre>
 *
 * integrated by the classical fourth-order Runge-Kutta method, as the ICD prescribes. Constants
 * of PZ-90.02: mu = 3.986004418e14 m^3/s^2, a_e = 6378136 m, J2 = 1.08262575e-3,
 * w = 7.292115e-5 rad/s. The ICD gives no step; 30 s is used (halving it moves the position by
 * less than a millimetre over 15 min, see the tests). Valid within the record's +-15 min; the
 * ICD's own accuracy statement for the algorithm is a few metres over that interval. Stateless.
 */
public final class GlonassPropagator {
  static final double MU = 3.986004418e14;
  static final double AE = 6_378_136.0;
  static final double J2 = 1.08262575e-3;
  static final double OMEGA = 7.292115e-5;
  /** Largest Runge-Kutta step, s. */
  public static final double STEP_S = 30.0;

  private GlonassPropagator() {}

  /**
   * Propagates a record's state.
   *
   * @param g the record
   * @param gpsS target instant, GPS seconds
   * @param stepS largest step, s
   * @param r receives the PZ-90 position, m
   * @param v receives the PZ-90 velocity, m/s
   */
  public static void propagate(GlonassRecord g, double gpsS, double stepS, double[] r, double[] v) {
    final double[] y = new double[6];
    System.arraycopy(g.positionM(), 0, y, 0, 3);
    System.arraycopy(g.velocityMPerS(), 0, y, 3, 3);
    final double[] acc = g.accelerationMPerS2();
    final double span = gpsS - g.tbGpsS();
    final int n = (int) Math.ceil(Math.abs(span) / stepS);
    final double h = n == 0 ? 0 : span / n;
    final double[] k1 = new double[6];
    final double[] k2 = new double[6];
    final double[] k3 = new double[6];
    final double[] k4 = new double[6];
    final double[] tmp = new double[6];
    for (int s = 0; s < n; s++) {
      derivative(y, acc, k1);
      axpy(y, h / 2, k1, tmp);
      derivative(tmp, acc, k2);
      axpy(y, h / 2, k2, tmp);
      derivative(tmp, acc, k3);
      axpy(y, h, k3, tmp);
      derivative(tmp, acc, k4);
      for (int i = 0; i < 6; i++) {
        y[i] += h / 6 * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
      }
    }
    System.arraycopy(y, 0, r, 0, 3);
    System.arraycopy(y, 3, v, 0, 3);
  }

  private static void axpy(double[] y, double a, double[] k, double[] out) {
    for (int i = 0; i < 6; i++) {
      out[i] = y[i] + a * k[i];
    }
  }

  static void derivative(double[] y, double[] acc, double[] out) {
    final double x = y[0];
    final double yy = y[1];
    final double z = y[2];
    final double r2 = x * x + yy * yy + z * z;
    final double r = Math.sqrt(r2);
    final double mur3 = MU / (r2 * r);
    final double j = 1.5 * J2 * MU * AE * AE / (r2 * r2 * r);
    final double z2r2 = 5 * z * z / r2;
    out[0] = y[3];
    out[1] = y[4];
    out[2] = y[5];
    out[3] = -mur3 * x - j * x * (1 - z2r2) + OMEGA * OMEGA * x + 2 * OMEGA * y[4] + acc[0];
    out[4] = -mur3 * yy - j * yy * (1 - z2r2) + OMEGA * OMEGA * yy - 2 * OMEGA * y[3] + acc[1];
    out[5] = -mur3 * z - j * z * (3 - z2r2) + acc[2];
  }
}
