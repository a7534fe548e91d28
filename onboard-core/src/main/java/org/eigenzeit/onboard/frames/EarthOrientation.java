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
  /** Steps of the nutation series in {@link #celestialStep} (two terms each). */
  private static final int NUTATION_STEPS = (NUTATION.length + 1) / 2;
  /** Number of {@link #celestialStep} steps that make one celestial matrix. */
  public static final int CELESTIAL_STEPS = 1 + NUTATION_STEPS + 11;

  private final MathMode math;
  private final double rotationRateRadPerS;
  private final double[] gcrsToItrs = new double[9];
  private final double[] celestial = new double[9];
  private final double[] work = new double[9];
  private final double[] tmp = new double[3];
  private double eraRad;
  // Staging of the celestial matrix (celestialStep): kept between steps, never read by the rotation.
  private final double[] stagedCelestial = new double[9];
  private final double[] stagedNpb = new double[9];
  private final double[] stagedA = new double[9];
  private final double[] stagedB = new double[9];
  private final double[] stagedRot = new double[9];
  private final double[] stagedRot2 = new double[9];
  private double zeta;
  private double zA;
  private double theta;
  private double epsA;
  private double argL;
  private double argLp;
  private double argF;
  private double argD;
  private double argOm;
  private double dpsi;
  private double deps;
  private double cipS;
  private double cipE;
  private double cipD;

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
   * and call {@link #updateRotation} every cycle. The same as every {@link #celestialStep} in
   * order followed by {@link #installCelestial}.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0
   */
  public void updateCelestial(double centuriesTt) {
    for (int step = 0; step < CELESTIAL_STEPS; step++) {
      celestialStep(centuriesTt, step);
    }
    installCelestial();
  }

  /**
   * One step of the celestial matrix's computation into a staging matrix, so that a caller can
   * spread it over several cycles (the tracker's orientation cache) while {@link #updateRotation}
   * keeps using the installed matrix. Steps 0 to {@link #CELESTIAL_STEPS} - 1 in order, all with
   * the same {@code centuriesTt}, then {@link #installCelestial}, give bit for bit what {@link
   * #updateCelestial} gives (it runs the same steps). Each step costs at most two sine/cosine pairs
   * or two arc tangents and about 60 floating-point operations. The staging storage is separate
   * from what {@link #updateRotation} uses; the steps keep their intermediate values in it.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0 (the same for every step of one matrix)
   * @param step 0 .. {@link #CELESTIAL_STEPS} - 1 (other values do nothing)
   */
  public void celestialStep(double centuriesTt, int step) {
    if (step == 0) {
      fundamentalArguments(centuriesTt);
    } else if (step <= NUTATION_STEPS) {
      nutationTerms(centuriesTt, 2 * (step - 1));
    } else {
      matrixStep(centuriesTt, step - NUTATION_STEPS - 1);
    }
  }

  /** Copies the staged celestial matrix (after the last {@link #celestialStep}) into use. */
  public void installCelestial() {
    System.arraycopy(stagedCelestial, 0, celestial, 0, 9);
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

  /** Step 0: the IAU 2006 precession angles and the Delaunay arguments (IERS 2010 eq. 5.43). */
  private void fundamentalArguments(double t) {
    final double as = ARCSEC_TO_RAD;
    zeta = (2.650545 + t * (2306.083227 + t * (0.2988499 + t * (0.01801828
        + t * (-0.000005971 + t * -0.0000003173))))) * as;
    zA = (-2.650545 + t * (2306.077181 + t * (1.0927348 + t * (0.01826837
        + t * (-0.000028596 + t * -0.0000002904))))) * as;
    theta = t * (2004.191903 + t * (-0.4294934 + t * (-0.04182264
        + t * (-0.000007089 + t * -0.0000001274)))) * as;
    epsA = (84381.406 + t * (-46.836769 + t * (-0.0001831 + t * (0.00200340
        + t * (-0.000000576 + t * -0.0000000434))))) * as;
    // Delaunay arguments (IERS 2010 eq. 5.43, linear and quadratic parts)
    argL = (134.96340251 * 3600.0 + t * (1717915923.2178 + t * 31.8792)) * as;
    argLp = (357.52910918 * 3600.0 + t * (129596581.0481 + t * -0.5532)) * as;
    argF = (93.27209062 * 3600.0 + t * (1739527262.8478 + t * -12.7512)) * as;
    argD = (297.85019547 * 3600.0 + t * (1602961601.2090 + t * -6.3706)) * as;
    argOm = (125.04455501 * 3600.0 + t * (-6962890.5431 + t * 7.4722)) * as;
    dpsi = 0.0;
    deps = 0.0;
  }

  /** Two terms of the nutation series from row {@code first} on, summed in row order. */
  private void nutationTerms(double t, int first) {
    final int end = Math.min(first + 2, NUTATION.length);
    for (int i = first; i < end; i++) {
      final double[] row = NUTATION[i];
      final double arg = row[0] * argL + row[1] * argLp + row[2] * argF + row[3] * argD + row[4] * argOm;
      dpsi += (row[5] + row[6] * t) * math.sin(arg);
      deps += (row[7] + row[8] * t) * math.cos(arg);
    }
  }

  /**
   * The matrix steps: B = R1(-eta0) R2(xi0) R3(d_alpha0), then P B, N P B (into {@code stagedNpb}),
   * then C = R3(-(E+s)) R2(d) R3(E) (into {@code stagedCelestial}).
   */
  private void matrixStep(double t, int k) {
    final double as = ARCSEC_TO_RAD;
    final double[] a = stagedA;
    final double[] b = stagedB;
    final double[] m = stagedRot;
    switch (k) {
      case 0: // B
        rot3(-0.0146 * as, m);
        rot2(-0.016617 * as, stagedRot2);
        Vec3.matMul(stagedRot2, m, a);
        break;
      case 1:
        rot1(0.006819 * as, m);
        Vec3.matMul(m, a, b);
        break;
      case 2: // P B
        rot3(-zeta, m);
        Vec3.matMul(m, b, a);
        break;
      case 3:
        rot2(theta, m);
        Vec3.matMul(m, a, b);
        break;
      case 4:
        rot3(-zA, m);
        Vec3.matMul(m, b, a);
        break;
      case 5: // N P B
        rot1(epsA, m);
        Vec3.matMul(m, a, b);
        break;
      case 6:
        dpsi *= NUTATION_UNIT_RAD;
        deps *= NUTATION_UNIT_RAD;
        rot3(-dpsi, m);
        Vec3.matMul(m, b, a);
        break;
      case 7:
        rot1(-(epsA + deps), m);
        Vec3.matMul(m, a, stagedNpb);
        break;
      case 8: // X, Y, s and the angles of C
        cipAngles(t);
        break;
      case 9: // C = R3(-(E+s)) R2(d) R3(E)
        rot3(cipE, m);
        rot2(cipD, stagedRot2);
        Vec3.matMul(stagedRot2, m, a);
        break;
      case 10:
        rot3(-(cipE + cipS), m);
        Vec3.matMul(m, a, stagedCelestial);
        break;
      default:
        break;
    }
  }

  /** Step 8: the CIP's X, Y from N P B, s to its leading terms, and the angles E, d of C (class doc). */
  private void cipAngles(double t) {
    final double x = stagedNpb[6];
    final double y = stagedNpb[7];
    cipS = -0.5 * x * y + (94.0e-6 + 3808.65e-6 * t) * ARCSEC_TO_RAD;
    cipE = (x == 0.0 && y == 0.0) ? 0.0 : math.atan2(y, x);
    final double r2 = x * x + y * y;
    cipD = math.atan2(Math.sqrt(r2), Math.sqrt(1.0 - r2));
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
