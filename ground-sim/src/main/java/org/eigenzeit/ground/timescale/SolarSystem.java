package org.eigenzeit.ground.timescale;

import org.eigenzeit.ground.ephemeris.JplEphemeris;

/**
 * Barycentric positions and velocities of the bodies of a JPL DE ephemeris, and their
 * gravitational parameters, in SI units on ICRF axes.
 *
 * <p>Items of the DE405 layout used (Standish 1998, JPL IOM 312.F-98-048): 0 Mercury, 1 Venus,
 * 2 Earth-Moon barycentre (EMB), 3 Mars system, 4 Jupiter system, 5 Saturn system, 6 Uranus
 * system, 7 Neptune system, 8 Pluto system (all barycentric), 9 Moon (geocentric), 10 Sun
 * (barycentric). Earth = EMB - Moon/(1 + EMRAT), Moon = EMB + Moon EMRAT/(1 + EMRAT) (the JPL
 * convention, EMRAT = M_Earth/M_Moon from the header). GM values are the header's GM1, GM2, GMB,
 * GM4..GM9 and GMS in AU^3/day^2, GM_Earth = GMB EMRAT/(1 + EMRAT), GM_Moon = GMB/(1 + EMRAT).
 *
 * <p>Units: the ephemeris is in TDB-compatible units (its time argument T_eph is TDB to within
 * tens of microseconds; Standish 1998), so are the positions, velocities and GM values returned
 * here. Velocities come from the Chebyshev derivative ({@link JplEphemeris#evaluateWithRate}).
 *
 * <p>Immutable; thread-safe when callers use their own output arrays.
 */
final class SolarSystem {
  static final int MERCURY = 0;
  static final int VENUS = 1;
  static final int EARTH = 2;
  static final int MOON = 3;
  static final int MARS = 4;
  static final int JUPITER = 5;
  static final int SATURN = 6;
  static final int URANUS = 7;
  static final int NEPTUNE = 8;
  static final int PLUTO = 9;
  static final int SUN = 10;
  static final int COUNT = 11;

  private static final double DAY_S = 86_400.0;
  private static final double KM_TO_M = 1000.0;
  /** Ephemeris items of the bodies other than Earth and Moon, by body index (-1: derived). */
  private static final int[] ITEM = {0, 1, -1, -1, 3, 4, 5, 6, 7, 8, 10};
  private static final String[] GM_NAME = {"GM1", "GM2", null, null, "GM4", "GM5", "GM6", "GM7", "GM8", "GM9", "GMS"};

  private final JplEphemeris eph;
  private final double emrat;
  private final double[] gmM3PerS2 = new double[COUNT];

  SolarSystem(JplEphemeris eph) {
    this.eph = eph;
    this.emrat = eph.constant("EMRAT");
    final double auM = eph.constant("AU") * 1000.0;
    final double auDayToSi = auM * auM * auM / (DAY_S * DAY_S);
    for (int b = 0; b < COUNT; b++) {
      if (GM_NAME[b] != null) {
        gmM3PerS2[b] = eph.constant(GM_NAME[b]) * auDayToSi;
      }
    }
    final double gmb = eph.constant("GMB") * auDayToSi;
    gmM3PerS2[EARTH] = gmb * emrat / (1.0 + emrat);
    gmM3PerS2[MOON] = gmb / (1.0 + emrat);
  }

  /**
   * Gravitational parameter of a body.
   *
   * @param body body index
   * @return GM, m^3/s^2 (TDB-compatible)
   */
  double gm(int body) {
    return gmM3PerS2[body];
  }

  /** @return first TDB Julian date covered */
  double firstJd() {
    return eph.firstJd();
  }

  /** @return last TDB Julian date covered */
  double lastJd() {
    return eph.lastJd();
  }

  /**
   * Barycentric states of every body.
   *
   * @param jd1 TDB Julian date, large part
   * @param jd2 TDB Julian date, small part
   * @param posM receives [body][3] positions, m
   * @param velMPerS receives [body][3] velocities, m/s
   */
  void states(double jd1, double jd2, double[][] posM, double[][] velMPerS) {
    final double kmPerDayToMPerS = KM_TO_M / DAY_S;
    for (int b = 0; b < COUNT; b++) {
      if (ITEM[b] >= 0) {
        eph.evaluateWithRate(ITEM[b], jd1, jd2, posM[b], velMPerS[b]);
        scale(posM[b], velMPerS[b], kmPerDayToMPerS);
      }
    }
    final double[] emb = posM[EARTH];
    final double[] embV = velMPerS[EARTH];
    eph.evaluateWithRate(JplEphemeris.EMB, jd1, jd2, emb, embV);
    final double[] moon = posM[MOON];
    final double[] moonV = velMPerS[MOON];
    eph.evaluateWithRate(JplEphemeris.MOON, jd1, jd2, moon, moonV);
    scale(emb, embV, kmPerDayToMPerS);
    scale(moon, moonV, kmPerDayToMPerS);
    final double fe = 1.0 / (1.0 + emrat);
    final double fm = emrat / (1.0 + emrat);
    for (int i = 0; i < 3; i++) {
      final double geoMoon = moon[i];
      final double geoMoonV = moonV[i];
      moon[i] = emb[i] + geoMoon * fm;
      moonV[i] = embV[i] + geoMoonV * fm;
      emb[i] -= geoMoon * fe;
      embV[i] -= geoMoonV * fe;
    }
  }

  private static void scale(double[] p, double[] v, double kmPerDayToMPerS) {
    for (int i = 0; i < 3; i++) {
      p[i] *= KM_TO_M;
      v[i] *= kmPerDayToMPerS;
    }
  }

  /**
   * Lunar libration Euler angles (phi, theta, psi) of the 3-1-3 rotation from the ICRF to the
   * lunar principal-axis frame, and their rates.
   *
   * @param jd1 TDB Julian date, large part
   * @param jd2 TDB Julian date, small part
   * @param anglesRad receives phi, theta, psi, rad
   * @param ratesRadPerS receives their rates, rad/s
   */
  void librations(double jd1, double jd2, double[] anglesRad, double[] ratesRadPerS) {
    eph.evaluateWithRate(JplEphemeris.LIBRATION, jd1, jd2, anglesRad, ratesRadPerS);
    for (int i = 0; i < 3; i++) {
      ratesRadPerS[i] /= DAY_S;
    }
  }
}
