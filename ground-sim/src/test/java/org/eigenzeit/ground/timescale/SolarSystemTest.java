package org.eigenzeit.ground.timescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import org.eigenzeit.ground.ephemeris.JplEphemeris;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/**
 * The barycentric states built from DE405 against IAU SOFA {@code epv00} (jsofa), an independent
 * analytical model of the Earth whose notes document its errors against DE405, and the Chebyshev
 * derivative against a central difference of the positions.
 */
class SolarSystemTest {
  private static final SolarSystem SYSTEM = new SolarSystem(JplEphemeris.de405());
  private static final double AU_M = 149_597_870_691.0;
  private static final double DAY_S = 86_400.0;

  @Test
  void earthAgreesWithSofaEpv00() {
    final double[][] pos = new double[SolarSystem.COUNT][3];
    final double[][] vel = new double[SolarSystem.COUNT][3];
    final double[] worst = new double[4];
    final double[] sumSq = new double[4];
    qt().withExamples(500).withFixedSeed(20261219L).forAll(doubles().between(2_451_540.0, 2_466_150.0))
        .checkAssert(jd -> {
          final double jd1 = Math.floor(jd);
          SYSTEM.states(jd1, jd - jd1, pos, vel);
          final double[][] pvh = new double[2][3];
          final double[][] pvb = new double[2][3];
          JSOFA.jauEpv00(jd1, jd - jd1, pvh, pvb);
          double dp = 0;
          double dv = 0;
          double hp = 0;
          double hv = 0;
          for (int i = 0; i < 3; i++) {
            dp = Math.hypot(dp, pos[SolarSystem.EARTH][i] - pvb[0][i] * AU_M);
            dv = Math.hypot(dv, vel[SolarSystem.EARTH][i] - pvb[1][i] * AU_M / DAY_S);
            hp = Math.hypot(hp, pos[SolarSystem.EARTH][i] - pos[SolarSystem.SUN][i] - pvh[0][i] * AU_M);
            hv = Math.hypot(hv, vel[SolarSystem.EARTH][i] - vel[SolarSystem.SUN][i] - pvh[1][i] * AU_M / DAY_S);
          }
          worst[0] = Math.max(worst[0], dp);
          worst[1] = Math.max(worst[1], dv);
          worst[2] = Math.max(worst[2], hp);
          worst[3] = Math.max(worst[3], hv);
          sumSq[0] += dp * dp / 500;
          sumSq[1] += dv * dv / 500;
          sumSq[2] += hp * hp / 500;
          sumSq[3] += hv * hv / 500;
        });
    System.out.printf("evidence: timescale.earth_position_vs_epv00_m = %.4e%n", worst[0]);
    System.out.printf("evidence: timescale.earth_velocity_vs_epv00_m_per_s = %.4e%n", worst[1]);
    System.out.printf("evidence: timescale.earth_heliocentric_position_vs_epv00_m = %.4e%n", worst[2]);
    System.out.printf("evidence: timescale.earth_heliocentric_velocity_vs_epv00_m_per_s = %.4e%n", worst[3]);
    final String[] names = {"position", "velocity", "heliocentric_position", "heliocentric_velocity"};
    for (int k = 0; k < 4; k++) {
      System.out.printf("evidence: timescale.earth_%s_rms_vs_epv00 = %.4e%n", names[k], Math.sqrt(sumSq[k]));
    }
    // SOFA epv00's own comparison with DE405 over 1900-2100 (its notes, from memory): RMS / max
    // heliocentric 3.7 / 11.2 km and 1.4 / 5.0 mm/s, barycentric 4.6 / 13.4 km and 1.4 / 4.9 mm/s.
    // Measured here over 2000-2040: 3.3 / 11.2 km, 1.41 / 4.47 mm/s; 4.3 / 12.0 km, 1.41 / 4.58 mm/s.
    assertTrue(worst[0] <= 13.4e3 && worst[1] <= 4.9e-3, "barycentric max " + worst[0] + " " + worst[1]);
    assertTrue(worst[2] <= 11.25e3 && worst[3] <= 5.0e-3, "heliocentric max " + worst[2] + " " + worst[3]);
    assertTrue(Math.sqrt(sumSq[0]) <= 1.1 * 4.6e3 && Math.sqrt(sumSq[1]) <= 1.1 * 1.4e-3, "barycentric RMS");
    assertTrue(Math.sqrt(sumSq[2]) <= 1.1 * 3.7e3 && Math.sqrt(sumSq[3]) <= 1.1 * 1.4e-3, "heliocentric RMS");
  }

  @Test
  void velocitiesAreTheDerivativesOfThePositions() {
    final double[][] p1 = new double[SolarSystem.COUNT][3];
    final double[][] p2 = new double[SolarSystem.COUNT][3];
    final double[][] v = new double[SolarSystem.COUNT][3];
    final double[][] ignored = new double[SolarSystem.COUNT][3];
    double worst = 0;
    final double h = 60.0 / DAY_S;
    for (double jd = 2_455_000.3; jd < 2_466_000; jd += 777.7) {
      SYSTEM.states(jd, 0.0, p1, v);
      SYSTEM.states(jd, h, p2, ignored);
      SYSTEM.states(jd, -h, p1, ignored);
      for (int b = 0; b < SolarSystem.COUNT; b++) {
        for (int i = 0; i < 3; i++) {
          final double fd = (p2[b][i] - p1[b][i]) / 120.0;
          worst = Math.max(worst, Math.abs(fd - v[b][i]) / Math.max(1.0, Math.abs(v[b][i])));
        }
      }
    }
    System.out.printf("evidence: timescale.velocity_vs_central_difference_rel = %.3e%n", worst);
    assertTrue(worst < 1e-6, "relative " + worst);
  }

  @Test
  void gravitationalParametersFromTheHeader() {
    // DE405 header (Standish 1998): GMS = 2.959122082855911e-4 AU^3/d^2, i.e. 1.32712440e20 m^3/s^2
    // (IERS 2010 Table 1.1 gives GM_Sun = 1.32712442099e20 in TCB units; TDB units are 1 - L_B smaller).
    assertEquals(1.327124400e20, SYSTEM.gm(SolarSystem.SUN), 1e11);
    // GM_Earth 3.986004e14 and GM_Moon 4.9028e12 (EMRAT = 81.30056).
    assertEquals(3.986004e14, SYSTEM.gm(SolarSystem.EARTH), 1e9);
    assertEquals(4.9028e12, SYSTEM.gm(SolarSystem.MOON), 1e8);
  }
}
