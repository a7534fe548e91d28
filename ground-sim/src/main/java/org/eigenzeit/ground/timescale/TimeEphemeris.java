package org.eigenzeit.ground.timescale;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.math.CompensatedSum;
import org.eigenzeit.onboard.time.TimeScales;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * A numerical time ephemeris: the integrals that relate the coordinate time of a local reference
 * system (GCRS for the Earth, LCRS for the Moon) to TCB, along a JPL DE ephemeris.
 *
 * <p>For a body B (the Earth or the Moon) with barycentric position x_B and velocity v_B, the
 * rate of TCB against the body's coordinate time at its centre is, to order c^-4 (IAU 2000
 * Resolution B1.5 for the Earth, as given in IERS Conventions 2010 ch. 10, section 10.1, the
 * TCB - TCG transformation; its equation numbers, 10.5 onwards, from memory; the same
 * transformation for the Moon per IAU 2024 Resolution II, "analogous to TCG", and Lu, Yang and
 * Xie 2025, arXiv 2506.19213, for its lunar form):
 *
 * <pre>
 *   d(TCB - T_B)/dTCB = g_B = [v_B^2/2 + w_B]/c^2
 *                           - [-v_B^4/8 - (3/2) v_B^2 w_B + w_B^2/2 + 4 v_B . w_B_vec]/c^4
 *   w_B     = sum over every other body b of GM_b / |x_B - x_b|        (external potential)
 *   w_B_vec = sum over every other body b of GM_b v_b / |x_B - x_b|    (external vector potential)
 *   TCB - T_B at the centre = J_B(t) + constant,  J_B(t) = integral of g_B dTCB
 * </pre>
 *
 * For an event at x off the body's centre the 4-D transformation adds v_B . (x - x_B)/c^2
 * ({@link TimeScaleRelations}). Bodies: Sun, Mercury, Venus, Earth, Moon and the Mars to Pluto
 * system barycentres of the ephemeris (point masses). Neglected: the asteroids (the largest,
 * Ceres, gives about 2e-18 in g), the bodies' oblateness (the Earth's J2 at the Moon about
 * 3e-18), the c^-2 corrections inside w and the c^-4 position terms (below 1e-18 in g and 5 ps
 * at the Moon's distance).
 *
 * <p>Numerics: the ephemeris argument is T_eph, taken as TDB (Standish 1998; |T_eph - TDB| is
 * tens of microseconds, which moves g by below 1e-20); dTCB = dTDB/(1 - L_B). J_B is integrated
 * from the first day boundary of the ephemeris with Gauss-Legendre quadrature (Hipparchus
 * {@link GaussIntegratorFactory}, {@value #GAUSS_POINTS} points per day), summed with
 * Neumaier compensation after subtracting a nominal rate; values between day nodes integrate
 * from the preceding node. Quadrature error: measured below 1e-15 s over the whole span
 * ({@code TimeEphemerisTest}).
 *
 * <p>Immutable after construction; thread-safe.
 */
final class TimeEphemeris {
  /** Index of the Earth's integral. */
  static final int EARTH = 0;
  /** Index of the Moon's integral. */
  static final int MOON = 1;
  /** Gauss-Legendre points per day (default). */
  static final int GAUSS_POINTS = 12;
  /** Nominal rate subtracted before summation (keeps the sum small; added back exactly). */
  static final double G_NOMINAL = 1.48e-8;
  /** Seconds of one node step (one TDB day). */
  static final double STEP_S = 86_400.0;

  private static final double C2 = CentralBody.C2;
  private static final double J2000_JD = 2_451_545.0;

  private final SolarSystem system;
  private final double firstNodeS;
  private final int nodeCount;
  private final double[][] nodeIntegralS;
  private final double[] unitPoints;
  private final double[] unitWeights;

  TimeEphemeris(SolarSystem system) {
    this(system, GAUSS_POINTS);
  }

  /**
   * Integrates along the ephemeris.
   *
   * @param system the bodies
   * @param gaussPoints Gauss-Legendre points per day
   */
  TimeEphemeris(SolarSystem system, int gaussPoints) {
    this.system = system;
    final double firstJd = Math.ceil(system.firstJd() - 0.5) + 0.5;
    final double lastJd = system.lastJd();
    this.firstNodeS = (firstJd - J2000_JD) * STEP_S;
    this.nodeCount = (int) Math.floor(lastJd - firstJd) + 1;
    final GaussIntegrator unit = new GaussIntegratorFactory().legendre(gaussPoints, -1.0, 1.0);
    this.unitPoints = new double[gaussPoints];
    this.unitWeights = new double[gaussPoints];
    for (int i = 0; i < gaussPoints; i++) {
      unitPoints[i] = unit.getPoint(i);
      unitWeights[i] = unit.getWeight(i);
    }
    this.nodeIntegralS = new double[2][nodeCount];
    final Scratch s = new Scratch();
    final CompensatedSum earth = new CompensatedSum();
    final CompensatedSum moon = new CompensatedSum();
    for (int k = 1; k < nodeCount; k++) {
      final double a = firstNodeS + (k - 1) * STEP_S;
      addPartial(a, a + STEP_S, s, earth, moon);
      nodeIntegralS[EARTH][k] = earth.value();
      nodeIntegralS[MOON][k] = moon.value();
    }
  }

  /** Work arrays for one evaluation of the bodies' states. */
  static final class Scratch {
    final double[][] pos = new double[SolarSystem.COUNT][3];
    final double[][] vel = new double[SolarSystem.COUNT][3];
    final double[] rates = new double[2];
  }

  /** Adds the Gauss-Legendre integral over [a, b] (TDB s) of g/(1 - L_B) - G_NOMINAL. */
  private void addPartial(double a, double b, Scratch s, CompensatedSum earth, CompensatedSum moon) {
    final double half = 0.5 * (b - a);
    final double mid = 0.5 * (a + b);
    for (int i = 0; i < unitPoints.length; i++) {
      rates(mid + half * unitPoints[i], s);
      final double w = half * unitWeights[i];
      earth.add(w * (s.rates[EARTH] / (1.0 - TimeScales.L_B) - G_NOMINAL));
      moon.add(w * (s.rates[MOON] / (1.0 - TimeScales.L_B) - G_NOMINAL));
    }
  }

  /**
   * g for the Earth and the Moon at one instant.
   *
   * @param tdbS TDB seconds since J2000.0
   * @param s scratch; receives the states and {@code s.rates}
   */
  void rates(double tdbS, Scratch s) {
    states(tdbS, s);
    s.rates[EARTH] = rate(SolarSystem.EARTH, s.pos, s.vel);
    s.rates[MOON] = rate(SolarSystem.MOON, s.pos, s.vel);
  }

  /**
   * Barycentric states of every body at a TDB instant.
   *
   * @param tdbS TDB seconds since J2000.0
   * @param s scratch receiving {@code pos} and {@code vel}
   */
  void states(double tdbS, Scratch s) {
    final double days = tdbS / STEP_S;
    final double whole = Math.floor(days);
    system.states(J2000_JD + whole, days - whole, s.pos, s.vel);
  }

  /** g_B (see the class doc) of one body. */
  private double rate(int body, double[][] x, double[][] v) {
    double w = 0.0;
    double wvx = 0.0;
    double wvy = 0.0;
    double wvz = 0.0;
    for (int b = 0; b < SolarSystem.COUNT; b++) {
      if (b == body) {
        continue;
      }
      final double dx = x[body][0] - x[b][0];
      final double dy = x[body][1] - x[b][1];
      final double dz = x[body][2] - x[b][2];
      final double k = system.gm(b) / Math.sqrt(dx * dx + dy * dy + dz * dz);
      w += k;
      wvx += k * v[b][0];
      wvy += k * v[b][1];
      wvz += k * v[b][2];
    }
    final double[] vb = v[body];
    final double v2 = vb[0] * vb[0] + vb[1] * vb[1] + vb[2] * vb[2];
    final double f2 = 0.5 * v2 + w;
    final double f4 = -0.125 * v2 * v2 - 1.5 * v2 * w + 0.5 * w * w + 4.0 * (vb[0] * wvx + vb[1] * wvy + vb[2] * wvz);
    return f2 / C2 - f4 / (C2 * C2);
  }

  /**
   * Lunar libration angles and rates (see {@link SolarSystem#librations}).
   *
   * @param tdbS TDB seconds since J2000.0
   * @param anglesRad receives phi, theta, psi
   * @param ratesRadPerS receives their rates
   */
  void librations(double tdbS, double[] anglesRad, double[] ratesRadPerS) {
    final double days = tdbS / STEP_S;
    final double whole = Math.floor(days);
    system.librations(J2000_JD + whole, days - whole, anglesRad, ratesRadPerS);
  }

  /** @return TDB seconds since J2000.0 of the first node (start of the integrals) */
  double firstS() {
    return firstNodeS;
  }

  /** @return TDB seconds since J2000.0 of the last node */
  double lastS() {
    return firstNodeS + (nodeCount - 1) * STEP_S;
  }

  /**
   * The integral J_B from the first node to t, in TCB seconds.
   *
   * @param centre {@link #EARTH} or {@link #MOON}
   * @param tdbS TDB seconds since J2000.0, within [{@link #firstS()}, {@link #lastS()}]
   * @return J_B(t), s
   */
  double integralS(int centre, double tdbS) {
    checkSpan(tdbS);
    final int k = (int) Math.min(nodeCount - 1, Math.floor((tdbS - firstNodeS) / STEP_S));
    final double node = firstNodeS + k * STEP_S;
    final CompensatedSum earth = new CompensatedSum();
    final CompensatedSum moon = new CompensatedSum();
    if (tdbS > node) {
      addPartial(node, tdbS, new Scratch(), earth, moon);
    }
    final double partial = centre == EARTH ? earth.value() : moon.value();
    return nodeIntegralS[centre][k] + partial + G_NOMINAL * (tdbS - firstNodeS);
  }

  /**
   * The rates g_B at an instant (the integrands of {@link #integralS}), per TCB second.
   *
   * @param centre {@link #EARTH} or {@link #MOON}
   * @param tdbS TDB seconds since J2000.0
   * @return g_B
   */
  double rate(int centre, double tdbS) {
    checkSpan(tdbS);
    final Scratch s = new Scratch();
    rates(tdbS, s);
    return s.rates[centre];
  }

  private void checkSpan(double tdbS) {
    if (!(tdbS >= firstS() && tdbS <= lastS())) {
      throw new IllegalArgumentException("TDB " + tdbS + " s since J2000 outside the time ephemeris span "
          + firstS() + " .. " + lastS() + " s");
    }
  }
}
