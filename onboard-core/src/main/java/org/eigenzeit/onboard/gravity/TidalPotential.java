package org.eigenzeit.onboard.gravity;

/**
 * Tidal potential of a third body at a satellite, relative to the central body's centre, in the
 * positive convention (IERS Conventions 2010 eq. 10.4: the external potential minus its value and
 * gradient at the geocentre), in closed form rather than as a truncated Legendre series:
 *
 * <pre>
 *   U_tid(r) = GM_b ( 1/|R - r| - 1/|R| - (R . r)/|R|^3 )
 *   r . grad U_tid = GM_b ( (R . r - r^2)/|R - r|^3 - (R . r)/|R|^3 )
 * </pre>
 *
 * with R the body's position and r the satellite's, both from the central body's centre. Exact
 * for point-mass third bodies; the rounding is below 1e-12 m^2/s^2 for the Sun and Moon at any
 * Earth-orbit radius (the largest cancelling terms are GM_b r / R^2).
 *
 * <p>Stateless; thread-safe. No allocation.
 */
public final class TidalPotential {
  /** GM of the Sun, m^3/s^2 (DE405 header GMS converted with AU = 149597870.691 km). */
  public static final double GM_SUN = 1.32712440017987e20;
  /** GM of the Moon, m^3/s^2 (Wieczorek 2015). */
  public static final double GM_MOON = 4.9028001e12;

  private TidalPotential() {}

  /**
   * Tidal potential.
   *
   * @param gmBody GM of the third body, m^3/s^2
   * @param bodyM third body position (length 3), m
   * @param satM satellite position (length 3), m, same frame and origin
   * @return U_tid, m^2/s^2
   */
  public static double potential(double gmBody, double[] bodyM, double[] satM) {
    final double dx = bodyM[0] - satM[0];
    final double dy = bodyM[1] - satM[1];
    final double dz = bodyM[2] - satM[2];
    final double d = Math.sqrt(dx * dx + dy * dy + dz * dz);
    final double bigR2 = bodyM[0] * bodyM[0] + bodyM[1] * bodyM[1] + bodyM[2] * bodyM[2];
    final double bigR = Math.sqrt(bigR2);
    final double rDotR = bodyM[0] * satM[0] + bodyM[1] * satM[1] + bodyM[2] * satM[2];
    return gmBody * (1.0 / d - 1.0 / bigR - rDotR / (bigR2 * bigR));
  }

  /**
   * Radial derivative term r . grad U_tid.
   *
   * @param gmBody GM of the third body, m^3/s^2
   * @param bodyM third body position, m
   * @param satM satellite position, m
   * @return r . grad U_tid, m^2/s^2
   */
  public static double radialDerivative(double gmBody, double[] bodyM, double[] satM) {
    final double dx = bodyM[0] - satM[0];
    final double dy = bodyM[1] - satM[1];
    final double dz = bodyM[2] - satM[2];
    final double d2 = dx * dx + dy * dy + dz * dz;
    final double d = Math.sqrt(d2);
    final double bigR2 = bodyM[0] * bodyM[0] + bodyM[1] * bodyM[1] + bodyM[2] * bodyM[2];
    final double bigR = Math.sqrt(bigR2);
    final double rDotR = bodyM[0] * satM[0] + bodyM[1] * satM[1] + bodyM[2] * satM[2];
    final double r2 = satM[0] * satM[0] + satM[1] * satM[1] + satM[2] * satM[2];
    return gmBody * ((rDotR - r2) / (d2 * d) - rDotR / (bigR2 * bigR));
  }
}
