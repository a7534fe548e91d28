package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.body.CentralBody;

/**
 * Closed-form predictors of the relativistic clock terms, for use ahead of time (planning, the
 * pre-launch frequency offset) and as outside checks of the integrator.
 *
 * <ul>
 *   <li>{@link #gpsConstantF}: F = -2 sqrt(mu)/c^2 (IS-GPS-200, section 20.3.3.3.3.1);
 *   <li>{@link #eccentricityTermS}: dt_r = F e sqrt(A) sin E (same section), equal to
 *       -2 r.v/c^2 ({@link #eccentricityTermFromStateS}) for a Keplerian orbit;
 *   <li>{@link #j2PeriodicTermS}: dt_J2 = -(3/2) J2 (R^2/(a c^2)) sqrt(GM/a) sin^2 i sin 2u
 *       (Kouba 2004, GPS Solutions 8:170-180, eq. 13): the J2 part left after -2 r.v/c^2;
 *   <li>{@link #secularRate}: mean y of a near-circular orbit of mean radius a, to first order in
 *       J2: -(GM/a)[3/2 + (5/4) J2 (R/a)^2 (1 - (3/2) sin^2 i)]/c^2 + L. The point-mass part
 *       -(3GM/(2a) - W0)/c^2 is exact for any eccentricity with a the semi-major axis; the J2
 *       part is this project's first-order derivation (mean of v^2/2 + U with the centripetal
 *       balance v^2/r = -dU/dr), valid for e &lt; 0.01, and is checked against numerical
 *       integration in the tests;
 *   <li>{@link #preLaunchFrequencyOffset}: -secular rate, the fractional offset to build into the
 *       oscillator so that it keeps the ground scale's rate in orbit (for GPS: -4.4647e-10,
 *       10.23 MHz set to 10.22999999543 MHz, IS-GPS-200 section 3.3.1.1).
 * </ul>
 *
 * <p>Stateless; thread-safe; no allocation.
 */
public final class ClosedForms {
  private ClosedForms() {}

  /**
   * The IS-GPS-200 relativistic constant F = -2 sqrt(mu)/c^2.
   *
   * @param muM3PerS2 gravitational parameter (3.986005e14 in IS-GPS-200)
   * @return F in s/sqrt(m)
   */
  public static double gpsConstantF(double muM3PerS2) {
    return -2.0 * Math.sqrt(muM3PerS2) / CentralBody.C2;
  }

  /**
   * The IS-GPS-200 eccentricity term F e sqrt(A) sin E.
   *
   * @param f the constant F, s/sqrt(m)
   * @param e eccentricity
   * @param sqrtAM square root of the semi-major axis, sqrt(m)
   * @param eccentricAnomalyRad eccentric anomaly, rad
   * @return the clock correction term, s
   */
  public static double eccentricityTermS(double f, double e, double sqrtAM, double eccentricAnomalyRad) {
    return f * e * sqrtAM * Math.sin(eccentricAnomalyRad);
  }

  /**
   * The eccentricity term from an inertial state, -2 r.v/c^2.
   *
   * @param rM inertial position, m
   * @param vMPerS inertial velocity, m/s
   * @return the term, s
   */
  public static double eccentricityTermFromStateS(double[] rM, double[] vMPerS) {
    return -2.0 * (rM[0] * vMPerS[0] + rM[1] * vMPerS[1] + rM[2] * vMPerS[2]) / CentralBody.C2;
  }

  /**
   * Kouba's J2 periodic term.
   *
   * @param gmM3PerS2 GM
   * @param j2 unnormalised J2
   * @param radiusM reference radius of J2, m
   * @param aM semi-major axis, m
   * @param inclinationRad inclination, rad
   * @param argumentOfLatitudeRad argument of latitude u, rad
   * @return the term, s
   */
  public static double j2PeriodicTermS(double gmM3PerS2, double j2, double radiusM, double aM,
      double inclinationRad, double argumentOfLatitudeRad) {
    final double si = Math.sin(inclinationRad);
    return -1.5 * j2 * radiusM * radiusM / (aM * CentralBody.C2) * Math.sqrt(gmM3PerS2 / aM)
        * si * si * Math.sin(2.0 * argumentOfLatitudeRad);
  }

  /**
   * Mean fractional frequency of a clock on a near-circular orbit.
   *
   * @param body central body (GM, R, J2, L)
   * @param aM mean orbit radius (semi-major axis for the point-mass part), m
   * @param inclinationRad inclination, rad
   * @param withJ2 whether to add the first-order J2 part
   * @return the secular rate (dimensionless)
   */
  public static double secularRate(CentralBody body, double aM, double inclinationRad, boolean withJ2) {
    final double gmOverA = body.gmM3PerS2() / aM;
    double bracket = 1.5;
    if (withJ2) {
      final double ratio = body.referenceRadiusM() / aM;
      final double si = Math.sin(inclinationRad);
      bracket += 1.25 * body.j2() * ratio * ratio * (1.0 - 1.5 * si * si);
    }
    return body.scaleRateL() - gmOverA * bracket / CentralBody.C2;
  }

  /**
   * The fractional frequency offset to apply before launch: minus the secular rate.
   *
   * @param body central body
   * @param aM mean orbit radius, m
   * @param inclinationRad inclination, rad
   * @param withJ2 whether to include the J2 part
   * @return the offset (negative for orbits above about 3200 km over the Earth)
   */
  public static double preLaunchFrequencyOffset(CentralBody body, double aM, double inclinationRad,
      boolean withJ2) {
    return -secularRate(body, aM, inclinationRad, withJ2);
  }
}
