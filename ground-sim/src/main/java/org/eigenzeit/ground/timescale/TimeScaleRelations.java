package org.eigenzeit.ground.timescale;

import org.eigenzeit.ground.ephemeris.JplEphemeris;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.time.TimeScales;

/**
 * The relations between the barycentric, geocentric and lunar coordinate times (TCB, TCG, TCL)
 * and the scaled times (TDB, TT, TL), computed numerically along the JPL DE405 Earth and Moon.
 *
 * <p>Definitions (u = TCB - T0, T0 = 1977-01-01T00:00:32.184 in each scale's labels):
 *
 * <pre>
 *   TDB = TCB - L_B u + TDB0, L_B = 1.550519768e-8, TDB0 = -6.55e-5 s  (IAU 2006 Resolution B3)
 *   TT  = TCG - L_G (TCG - T0), L_G = 6.969290134e-10               (IAU 2000 Resolution B1.9)
 *   TL  = TCL - L_L (TCL - T0)                        (Eigenzeit; L_L: LunarTimeDefinition)
 *   TCB - TCG at x = dE(t) + v_E . (x - x_E)/c^2,  dE = J_E + K_E
 *   TCB - TCL at x = dM(t) + v_M . (x - x_M)/c^2,  dM = J_M + K_M
 * </pre>
 *
 * The first form is IERS Conventions (2010) ch. 10 section 10.1 (IAU 2000 B1.5) for the Earth; IAU
 * 2024 Resolution II relates TCL to TCB by the same 4-D transformation about the Moon (Lu, Yang
 * and Xie 2025, arXiv 2506.19213; Turyshev et al. 2024, arXiv 2406.16147). J_E and J_M are the
 * integrals of {@link TimeEphemeris} (external potential plus v^2/2, with the c^-4 terms).
 *
 * <p><b>Constants K_E, K_M.</b> The integrals start at the ephemeris's first day (1999-12-24);
 * the IAU definitions integrate from T0 (1977), which the shipped DE405 does not reach. K_E is
 * therefore fixed by the property IAU 2006 B3 gave TDB0: TDB - TT at the geocentre has no
 * constant term. It is the constant of a least-squares fit of TDB - TT over the whole span with
 * the {@link Frequencies} sinusoids and no rate (L_B is defined so that TDB - TT has no
 * drift). K_M is fixed so that TL - TT at the selenocentre equals TL0 + R (TT - T0) plus terms
 * with no constant part (fit with a rate R). Terms with periods beyond the 40-year span cannot be
 * told from a constant: the Fairhead and Bretagnon (1990) series has 1.69 us at 1783 years,
 * 0.45 us at 239 years and 0.43 us at 84 years, so the constant of TDB - TT realised here can
 * differ from the FB convention by up to about 2.6 us; the check against IAU SOFA measures it
 * ({@code TimeScaleRelationsTest}, docs/time-scales.md). TL - TT's constant is a convention
 * anyway; its rate and periodic terms do not depend on it.
 *
 * <p>Validity: TDB 1999-12-24 to 2040-01-25 (the shipped DE405); outside, the methods throw.
 * Accuracy of the periodic and secular parts: set by DE405 and the neglected terms of
 * {@link TimeEphemeris} (below 1e-17 in rate); measured against IAU SOFA and the published
 * lunar relations in docs/time-scales.md.
 *
 * <p>Immutable; thread-safe.
 */
public final class TimeScaleRelations {
  private static final double C2 = CentralBody.C2;
  private static final double T0_S = -TimeScales.J2000_MINUS_T0_S;

  private final TimeEphemeris eph;
  private final LunarTimeDefinition lunar;
  private final double earthConstantS;
  private final double moonConstantS;
  private final double tlMinusTtRate;

  private TimeScaleRelations(TimeEphemeris eph, LunarTimeDefinition lunar) {
    this.eph = eph;
    this.lunar = lunar;
    final double[] t = nodeTimes(eph);
    final double[] omega = Frequencies.all();
    final double[] rawTdbTt = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      rawTdbTt[i] = tdbMinusTt(eph.integralS(TimeEphemeris.EARTH, t[i]), t[i]);
    }
    this.earthConstantS = -HarmonicFit.fit(t, rawTdbTt, 0.0, false, omega).constant() / (1.0 - TimeScales.L_G);
    final double[] rawTlTt = new double[t.length];
    final double[] pos = new double[3];
    for (int i = 0; i < t.length; i++) {
      rawTlTt[i] = tlMinusTtAtMoon(t[i], earthConstantS, 0.0, pos);
    }
    final HarmonicFit.Result moon = HarmonicFit.fit(t, rawTlTt, T0_S, true, omega);
    this.moonConstantS = (moon.constant() - lunar.tlMinusTtAtT0S()) / (1.0 - lunar.scaleRateL());
    this.tlMinusTtRate = moon.rate();
  }

  /** The DE405 time ephemeris, built once (about a second). */
  private static final class Holder {
    static final TimeEphemeris DE405 = new TimeEphemeris(new SolarSystem(JplEphemeris.de405()));

    private Holder() {}
  }

  /**
   * The relations along the shipped DE405 with Eigenzeit's default lunar definition.
   *
   * @return the relations
   */
  public static TimeScaleRelations de405() {
    return de405(LunarTimeDefinition.DEFAULT);
  }

  /**
   * The relations along the shipped DE405 with a given lunar definition.
   *
   * @param lunar L_L and TL0
   * @return the relations
   */
  public static TimeScaleRelations de405(LunarTimeDefinition lunar) {
    return new TimeScaleRelations(Holder.DE405, lunar);
  }

  static double[] nodeTimes(TimeEphemeris e) {
    final int n = (int) Math.round((e.lastS() - e.firstS()) / TimeEphemeris.STEP_S) + 1;
    final double[] t = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = e.firstS() + i * TimeEphemeris.STEP_S;
    }
    return t;
  }

  /** TCB - T0 for a TDB instant (IAU 2006 B3 inverted), s. */
  static double tcbSinceT0S(double tdbS) {
    return (tdbS - T0_S - TimeScales.TDB0_S) / (1.0 - TimeScales.L_B);
  }

  private static double tdbMinusTt(double dE, double tdbS) {
    return (1.0 - TimeScales.L_G) * dE - (TimeScales.L_B - TimeScales.L_G) * tcbSinceT0S(tdbS) + TimeScales.TDB0_S;
  }

  private double tlMinusTtAtMoon(double tdbS, double kE, double kM, double[] scratch) {
    final double u = tcbSinceT0S(tdbS);
    final double dE = eph.integralS(TimeEphemeris.EARTH, tdbS) + kE;
    final double dM = eph.integralS(TimeEphemeris.MOON, tdbS) + kM;
    final double pE = positionTermS(Centre.EARTH, tdbS, Centre.MOON, scratch);
    final double ll = lunar.scaleRateL();
    return u * (TimeScales.L_G - ll) - dM * (1.0 - ll) + (dE + pE) * (1.0 - TimeScales.L_G);
  }

  /** v_C . (x_at - x_C)/c^2 for an event at the centre of another body. */
  private double positionTermS(Centre of, double tdbS, Centre at, double[] scratch) {
    if (of == at) {
      return 0.0;
    }
    final TimeEphemeris.Scratch s = new TimeEphemeris.Scratch();
    eph.states(tdbS, s);
    final int b = index(of);
    final int x = index(at);
    for (int i = 0; i < 3; i++) {
      scratch[i] = s.pos[x][i] - s.pos[b][i];
    }
    return (s.vel[b][0] * scratch[0] + s.vel[b][1] * scratch[1] + s.vel[b][2] * scratch[2]) / C2;
  }

  private static int index(Centre c) {
    return c == Centre.EARTH ? SolarSystem.EARTH : SolarSystem.MOON;
  }

  /** @return the lunar definition (L_L, TL0) */
  public LunarTimeDefinition lunar() {
    return lunar;
  }

  /** @return first TDB instant covered, s since J2000.0 */
  public double firstTdbS() {
    return eph.firstS();
  }

  /** @return last TDB instant covered, s since J2000.0 */
  public double lastTdbS() {
    return eph.lastS();
  }

  /**
   * Tells whether the relations cover an instant.
   *
   * @param tdbS TDB seconds since J2000.0
   * @return true inside the span
   */
  public boolean covers(double tdbS) {
    return tdbS >= firstTdbS() && tdbS <= lastTdbS();
  }

  /**
   * TCB - TCG for an event at a body's centre.
   *
   * @param tdbS TDB of the event, s since J2000.0
   * @param at where the event is
   * @return TCB - TCG, s
   */
  public double tcbMinusTcgS(double tdbS, Centre at) {
    return eph.integralS(TimeEphemeris.EARTH, tdbS) + earthConstantS
        + positionTermS(Centre.EARTH, tdbS, at, new double[3]);
  }

  /**
   * TCB - TCL for an event at a body's centre.
   *
   * @param tdbS TDB of the event, s since J2000.0
   * @param at where the event is
   * @return TCB - TCL, s
   */
  public double tcbMinusTclS(double tdbS, Centre at) {
    return eph.integralS(TimeEphemeris.MOON, tdbS) + moonConstantS
        + positionTermS(Centre.MOON, tdbS, at, new double[3]);
  }

  /**
   * TDB - TT at the geocentre (the quantity of IAU SOFA {@code dtdb} with u = v = 0).
   *
   * @param tdbS TDB, s since J2000.0
   * @return TDB - TT, s
   */
  public double tdbMinusTtGeocentreS(double tdbS) {
    return tdbMinusTt(eph.integralS(TimeEphemeris.EARTH, tdbS) + earthConstantS, tdbS);
  }

  /**
   * TL - TT at the selenocentre.
   *
   * @param tdbS TDB, s since J2000.0
   * @return TL - TT, s
   */
  public double tlMinusTtSelenocentreS(double tdbS) {
    return tlMinusTtAtMoon(tdbS, earthConstantS, moonConstantS, new double[3]);
  }

  /**
   * The mean rate R of TL - TT at the selenocentre, as fitted over the span (see the class doc).
   *
   * @return d(TL - TT)/dTT, mean
   */
  public double tlMinusTtMeanRate() {
    return tlMinusTtRate;
  }

  /**
   * Rate of TCB against the local coordinate time at a body's centre, d(TCB - T_B)/dTCB.
   *
   * @param centre the body
   * @param tdbS TDB, s since J2000.0
   * @return g_B (see {@link TimeEphemeris})
   */
  public double coordinateRate(Centre centre, double tdbS) {
    return eph.rate(centre == Centre.EARTH ? TimeEphemeris.EARTH : TimeEphemeris.MOON, tdbS);
  }

  /**
   * Barycentric position and velocity of the Earth or the Moon (ICRF axes, TDB-compatible units).
   *
   * @param body the body
   * @param tdbS TDB, s since J2000.0
   * @param posM receives the position, m
   * @param velMPerS receives the velocity, m/s
   */
  public void barycentricState(Centre body, double tdbS, double[] posM, double[] velMPerS) {
    final TimeEphemeris.Scratch s = new TimeEphemeris.Scratch();
    eph.states(tdbS, s);
    System.arraycopy(s.pos[index(body)], 0, posM, 0, 3);
    System.arraycopy(s.vel[index(body)], 0, velMPerS, 0, 3);
  }

  /**
   * TCB - TCG and TCB - TCL for an event at an arbitrary barycentric position.
   *
   * @param tdbS TDB of the event, s since J2000.0
   * @param eventBcrsM barycentric position of the event, m
   * @param out receives {TCB - TCG, TCB - TCL}, s
   */
  public void coordinateOffsets(double tdbS, double[] eventBcrsM, double[] out) {
    final TimeEphemeris.Scratch s = new TimeEphemeris.Scratch();
    eph.states(tdbS, s);
    out[0] = eph.integralS(TimeEphemeris.EARTH, tdbS) + earthConstantS + dot(s, SolarSystem.EARTH, eventBcrsM);
    out[1] = eph.integralS(TimeEphemeris.MOON, tdbS) + moonConstantS + dot(s, SolarSystem.MOON, eventBcrsM);
  }

  private static double dot(TimeEphemeris.Scratch s, int b, double[] x) {
    return (s.vel[b][0] * (x[0] - s.pos[b][0]) + s.vel[b][1] * (x[1] - s.pos[b][1])
        + s.vel[b][2] * (x[2] - s.pos[b][2])) / C2;
  }

  /** For tests: the underlying time ephemeris. */
  TimeEphemeris ephemeris() {
    return eph;
  }

  /**
   * The DE405 lunar libration angles: the 3-1-3 Euler angles (phi, theta, psi) of the rotation from
   * the ICRF to the lunar principal-axis frame, and their rates.
   *
   * @param tdbS TDB, s since J2000.0
   * @param anglesRad receives phi, theta, psi, rad
   * @param ratesRadPerS receives their rates, rad/s
   */
  public void lunarLibrations(double tdbS, double[] anglesRad, double[] ratesRadPerS) {
    eph.librations(tdbS, anglesRad, ratesRadPerS);
  }
}
