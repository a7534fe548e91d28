package org.eigenzeit.onboard.frames;

import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.math.Vec3;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Rotation between the GCRS (inertial) and the ITRS (Earth-fixed), CIO based, after IERS
 * Conventions (2010) chapter 5:
 *
 * <pre>
 *   [ITRS] = R3(ERA) . C(X, Y, s) . [GCRS]          (polar motion W taken as identity)
 *   ERA    = 2 pi (0.7790572732640 + 1.00273781191135448 Tu),  Tu = JD(UT1) - 2451545.0   (eq. 5.15)
 *   X, Y   = third row of N . P . B (the CIP in the GCRS), s = -XY/2 + 94 uas + 3808.65 uas t
 *   P      = R3(-z_A) R2(theta_A) R3(-zeta_A), IAU 2006 angles (Capitaine et al. 2003; eq. 5.40)
 *   N      = R1(-(eps_A + d_eps)) R3(-d_psi) R1(eps_A), the ten largest IAU 2000 luni-solar terms
 *   B      = frame bias (d_alpha0 = -14.6 mas, xi0 = -16.617 mas, eta0 = -6.819 mas; eq. 5.33)
 *   C      = R3(-(E + s)) R2(d) R3(E),  X = sin d cos E, Y = sin d sin E   (eq. 5.10)
 * </pre>
 *
 * <p>Accuracy: the truncated nutation leaves about 0.02 arcsec (1e-7 rad) of error in the pole;
 * polar motion (up to about 0.5 arcsec) is not modelled; both are measured against IAU SOFA
 * (jsofa {@code c2t06a}) in the tests. Effect on the clock rate: a pole error delta rotates the
 * Earth-fixed position by at most delta r, changing the J2 potential by at most
 * 3 GM J2 R^2 / r^3 * delta, i.e. below 2e-19 in y at 300 km altitude for delta = 3e-6 rad.
 * UT1 - TT is a configured constant (its daily drift of about 2 ms gives 1.5e-7 rad per day of
 * error in ERA, far below the budget). Validity: 1900 to 2100 (the precession polynomials).
 *
 * <p>Velocity: v_GCRS = M^T (v_ITRS + omega x r_ITRS) with omega = (0, 0, omega_E) in the ITRS
 * (rate of WGS 84); the neglected rates of precession-nutation are below 1e-11 rad/s.
 *
 * <p>Mutable, not thread-safe: one owner; {@link #update} fills preallocated matrices and the
 * transform methods write to caller-owned arrays. Nothing allocates after construction.
 */
public final class EarthOrientation {
  /** Arc seconds to radians. */
  public static final double ARCSEC_TO_RAD = Math.PI / (180.0 * 3600.0);
  private static final double TWO_PI = 2.0 * Math.PI;

  /**
   * Luni-solar nutation terms: multipliers of (l, l', F, D, Omega), then d_psi sin and t sin,
   * d_eps cos and t cos, in 0.1 microarcsec (IAU 2000A leading terms, Mathews et al. 2002, as
   * tabulated in IERS Conventions 2010 Table 5.3a/b).
   */
  private static final double[][] NUTATION = {
    {0, 0, 0, 0, 1, -172064161, -174666, 92052331, 9086},
    {0, 0, 2, -2, 2, -13170906, -1675, 5730336, -3015},
    {0, 0, 2, 0, 2, -2276413, -234, 978459, -485},
    {0, 0, 0, 0, 2, 2074554, 207, -897492, 470},
    {0, 1, 0, 0, 0, 1475877, -3633, 73871, -184},
    {0, 1, 2, -2, 2, -516821, 1226, 224386, -677},
    {1, 0, 0, 0, 0, 711159, 73, -6750, 0},
    {0, 0, 2, 0, 1, -387298, -367, 200728, 18},
    {1, 0, 2, 0, 2, -301461, -36, 129025, -63},
    {0, -1, 2, -2, 2, 215829, -494, -95929, 299},
  };
  private static final double NUTATION_UNIT_RAD = 1.0e-7 * ARCSEC_TO_RAD;

  private final MathMode math;
  private final double rotationRateRadPerS;
  private final double[] gcrsToItrs = new double[9];
  private final double[] npb = new double[9];
  private final double[] celestial = new double[9];
  private final double[] work = new double[9];
  private final double[] work2 = new double[9];
  private final double[] tmp = new double[3];
  private double eraRad;

  /**
   * Creates an orientation model.
   *
   * @param math math mode (fast or bit-reproducible)
   * @param rotationRateRadPerS Earth rotation rate for the velocity transform, rad/s
   */
  public EarthOrientation(MathMode math, double rotationRateRadPerS) {
    this.math = math;
    this.rotationRateRadPerS = rotationRateRadPerS;
    identity(gcrsToItrs);
    identity(celestial);
  }

  /**
   * Earth Rotation Angle, IERS Conventions (2010) eq. 5.15.
   *
   * @param ut1 instant in UT1
   * @return the angle in radians, in [0, 2 pi)
   */
  public static double earthRotationAngleRad(SplitTime ut1) {
    return eraRad(ut1.wholeSeconds(), ut1.fractionS());
  }

  private static double eraRad(long wholeSeconds, double fractionS) {
    final long days = Math.floorDiv(wholeSeconds, SplitTime.SECONDS_PER_DAY);
    final double dayFraction =
        ((double) (wholeSeconds - days * SplitTime.SECONDS_PER_DAY) + fractionS)
            / SplitTime.SECONDS_PER_DAY;
    final double tu = (double) days + dayFraction;
    double turns = (dayFraction + 0.7790572732640 + 0.00273781191135448 * tu) % 1.0;
    if (turns < 0) {
      turns += 1.0;
    }
    return TWO_PI * turns;
  }

  /**
   * Recomputes the GCRS-to-ITRS matrix for an instant: both the slowly varying celestial part
   * (precession-nutation, {@link #updateCelestial}) and the Earth rotation ({@link
   * #updateRotation}).
   *
   * @param tt the instant in TT
   * @param ut1MinusTtS UT1 - TT in seconds (about -69.2 s in 2026)
   */
  public void update(SplitTime tt, double ut1MinusTtS) {
    updateCelestial(tt.julianCenturies());
    updateRotation(tt, ut1MinusTtS);
  }

  /**
   * Recomputes the celestial-to-intermediate matrix C(X, Y, s). The CIP moves by at most 3e-8 rad
   * within an hour (IAU SOFA), so a caller may refresh it at a coarse cadence (the tracker: hourly)
   * and call {@link #updateRotation} every cycle.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0
   */
  public void updateCelestial(double centuriesTt) {
    final double t = centuriesTt;
    precessionNutationBias(t, npb);
    final double x = npb[6];
    final double y = npb[7];
    final double s = -0.5 * x * y + (94.0e-6 + 3808.65e-6 * t) * ARCSEC_TO_RAD;
    final double e = (x == 0.0 && y == 0.0) ? 0.0 : math.atan2(y, x);
    final double r2 = x * x + y * y;
    final double d = math.atan2(Math.sqrt(r2), Math.sqrt(1.0 - r2));
    // C = R3(-(E+s)) R2(d) R3(E)
    rot3(e, work);
    rot2(d, work2);
    Vec3.matMul(work2, work, npb);
    rot3(-(e + s), work);
    Vec3.matMul(work, npb, celestial);
  }

  /**
   * Recomputes the Earth Rotation Angle and the full matrix R3(ERA) C from the last celestial
   * matrix.
   *
   * @param tt the instant in TT
   * @param ut1MinusTtS UT1 - TT in seconds
   */
  public void updateRotation(SplitTime tt, double ut1MinusTtS) {
    eraRad = eraFromTt(tt, ut1MinusTtS);
    rot3(eraRad, work);
    Vec3.matMul(work, celestial, gcrsToItrs);
  }

  private static double eraFromTt(SplitTime tt, double ut1MinusTtS) {
    final double wholeShift = Math.floor(ut1MinusTtS);
    return eraRad(tt.wholeSeconds() + (long) wholeShift, tt.fractionS() + (ut1MinusTtS - wholeShift));
  }

  /** N P B for t Julian centuries of TT since J2000.0, written row-major to {@code out}. */
  private void precessionNutationBias(double t, double[] out) {
    final double as = ARCSEC_TO_RAD;
    final double zeta = (2.650545 + t * (2306.083227 + t * (0.2988499 + t * (0.01801828
        + t * (-0.000005971 + t * -0.0000003173))))) * as;
    final double z = (-2.650545 + t * (2306.077181 + t * (1.0927348 + t * (0.01826837
        + t * (-0.000028596 + t * -0.0000002904))))) * as;
    final double theta = t * (2004.191903 + t * (-0.4294934 + t * (-0.04182264
        + t * (-0.000007089 + t * -0.0000001274)))) * as;
    final double epsA = (84381.406 + t * (-46.836769 + t * (-0.0001831 + t * (0.00200340
        + t * (-0.000000576 + t * -0.0000000434))))) * as;
    // Delaunay arguments (IERS 2010 eq. 5.43, linear and quadratic parts)
    final double l = (134.96340251 * 3600.0 + t * (1717915923.2178 + t * 31.8792)) * as;
    final double lp = (357.52910918 * 3600.0 + t * (129596581.0481 + t * -0.5532)) * as;
    final double f = (93.27209062 * 3600.0 + t * (1739527262.8478 + t * -12.7512)) * as;
    final double dd = (297.85019547 * 3600.0 + t * (1602961601.2090 + t * -6.3706)) * as;
    final double om = (125.04455501 * 3600.0 + t * (-6962890.5431 + t * 7.4722)) * as;
    double dpsi = 0.0;
    double deps = 0.0;
    for (int i = 0; i < NUTATION.length; i++) {
      final double[] row = NUTATION[i];
      final double arg = row[0] * l + row[1] * lp + row[2] * f + row[3] * dd + row[4] * om;
      dpsi += (row[5] + row[6] * t) * math.sin(arg);
      deps += (row[7] + row[8] * t) * math.cos(arg);
    }
    dpsi *= NUTATION_UNIT_RAD;
    deps *= NUTATION_UNIT_RAD;
    // B: R1(-eta0) R2(xi0) R3(d_alpha0)
    rot3(-0.0146 * as, work);
    rot2(-0.016617 * as, work2);
    Vec3.matMul(work2, work, out);
    rot1(0.006819 * as, work);
    Vec3.matMul(work, out, work2);
    // P B
    rot3(-zeta, work);
    Vec3.matMul(work, work2, out);
    rot2(theta, work);
    Vec3.matMul(work, out, work2);
    rot3(-z, work);
    Vec3.matMul(work, work2, out);
    // N P B
    rot1(epsA, work);
    Vec3.matMul(work, out, work2);
    rot3(-dpsi, work);
    Vec3.matMul(work, work2, out);
    rot1(-(epsA + deps), work);
    Vec3.matMul(work, out, work2);
    System.arraycopy(work2, 0, out, 0, 9);
  }

  /**
   * Earth Rotation Angle of the last {@link #update}, rad.
   *
   * @return the angle
   */
  public double eraRad() {
    return eraRad;
  }

  /**
   * One element of the current GCRS-to-ITRS matrix.
   *
   * @param row 0..2
   * @param column 0..2
   * @return the element
   */
  public double matrixElement(int row, int column) {
    return gcrsToItrs[3 * row + column];
  }

  /**
   * Position GCRS to ITRS.
   *
   * @param gcrsM position in the GCRS, m
   * @param itrsOut receives the position in the ITRS, m (must not alias the input)
   */
  public void positionToItrs(double[] gcrsM, double[] itrsOut) {
    Vec3.mul(gcrsToItrs, gcrsM, itrsOut);
  }

  /**
   * Position ITRS to GCRS.
   *
   * @param itrsM position in the ITRS, m
   * @param gcrsOut receives the position in the GCRS, m (must not alias the input)
   */
  public void positionToGcrs(double[] itrsM, double[] gcrsOut) {
    Vec3.mulTransposed(gcrsToItrs, itrsM, gcrsOut);
  }

  /**
   * Velocity ITRS to GCRS: M^T (v + omega x r).
   *
   * @param itrsM position in the ITRS, m
   * @param itrsMPerS velocity in the ITRS, m/s
   * @param gcrsOut receives the inertial velocity in the GCRS, m/s (must not alias the inputs)
   */
  public void velocityToGcrs(double[] itrsM, double[] itrsMPerS, double[] gcrsOut) {
    tmp[0] = itrsMPerS[0] - rotationRateRadPerS * itrsM[1];
    tmp[1] = itrsMPerS[1] + rotationRateRadPerS * itrsM[0];
    tmp[2] = itrsMPerS[2];
    Vec3.mulTransposed(gcrsToItrs, tmp, gcrsOut);
  }

  /**
   * Velocity GCRS to ITRS: M v - omega x r_ITRS.
   *
   * @param itrsM position in the ITRS, m (already transformed)
   * @param gcrsMPerS inertial velocity in the GCRS, m/s
   * @param itrsOut receives the velocity relative to the ITRS, m/s (must not alias the inputs)
   */
  public void velocityToItrs(double[] itrsM, double[] gcrsMPerS, double[] itrsOut) {
    Vec3.mul(gcrsToItrs, gcrsMPerS, itrsOut);
    itrsOut[0] += rotationRateRadPerS * itrsM[1];
    itrsOut[1] -= rotationRateRadPerS * itrsM[0];
  }

  /**
   * The ITRS z axis (the rotation pole) expressed in the GCRS: the third row of the matrix, which
   * depends only on the celestial part (valid after {@link #updateCelestial}).
   *
   * @param out receives the unit vector
   */
  public void poleInGcrs(double[] out) {
    // The third row of R3(ERA) C equals the third row of C: the pole needs no Earth rotation.
    out[0] = celestial[6];
    out[1] = celestial[7];
    out[2] = celestial[8];
  }

  private void rot1(double angle, double[] m) {
    final double c = math.cos(angle);
    final double s = math.sin(angle);
    set(m, 1, 0, 0, 0, c, s, 0, -s, c);
  }

  private void rot2(double angle, double[] m) {
    final double c = math.cos(angle);
    final double s = math.sin(angle);
    set(m, c, 0, -s, 0, 1, 0, s, 0, c);
  }

  private void rot3(double angle, double[] m) {
    final double c = math.cos(angle);
    final double s = math.sin(angle);
    set(m, c, s, 0, -s, c, 0, 0, 0, 1);
  }

  private static void set(double[] m, double a, double b, double c, double d, double e, double f,
      double g, double h, double i) {
    m[0] = a;
    m[1] = b;
    m[2] = c;
    m[3] = d;
    m[4] = e;
    m[5] = f;
    m[6] = g;
    m[7] = h;
    m[8] = i;
  }

  private static void identity(double[] m) {
    set(m, 1, 0, 0, 0, 1, 0, 0, 0, 1);
  }
}
