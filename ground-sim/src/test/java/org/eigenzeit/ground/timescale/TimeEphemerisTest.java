package org.eigenzeit.ground.timescale;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.ground.ephemeris.JplEphemeris;
import org.junit.jupiter.api.Test;

/**
 * The numerical time ephemeris: quadrature convergence, and the mean rates of TCB against TCG
 * and TCL against published values.
 */
class TimeEphemerisTest {
  /** IERS Conventions (2010) Table 1.1: L_C = 1.48082686741e-8 (Irwin and Fukushima 1999, TE405 on DE405). */
  static final double IERS_L_C = 1.48082686741e-8;
  /** Lu, Yang and Xie (2025, arXiv 2506.19213), as quoted in issue 17: dTCL/dTCB = 1 - 1.48253621667e-8 (DE440). */
  static final double LU_L_M = 1.48253621667e-8;

  @Test
  void quadratureHasConverged() {
    final TimeRelationsFixture f = TimeRelationsFixture.get();
    final TimeEphemeris fine = new TimeEphemeris(new SolarSystem(JplEphemeris.de405()), 20);
    double worst = 0;
    for (double t = f.eph.firstS(); t <= f.eph.lastS(); t += 97.3 * 86_400.0) {
      for (int c = 0; c < 2; c++) {
        worst = Math.max(worst, Math.abs(fine.integralS(c, t) - f.eph.integralS(c, t)));
      }
    }
    System.out.printf("evidence: timescale.quadrature_12_vs_20_points_s = %.3e%n", worst);
    assertTrue(worst < 1e-14, "quadrature " + worst);
  }

  @Test
  void meanRateOfTcbAgainstTcgMatchesIers() {
    final double rate = TimeRelationsFixture.get().earthMeanRate();
    final double d = rate - IERS_L_C;
    System.out.printf("evidence: timescale.l_c_minus_iers = %.3e%n", d);
    // Over 40 years the mean rate cannot be told from terms of longer period: the Fairhead and
    // Bretagnon series' 84-, 239- and 1783-year terms have rates up to 1.0e-15, 3.7e-16 and 1.9e-16.
    assertTrue(Math.abs(d) < 1.0e-15, "L_C " + d);
  }

  @Test
  void meanRateOfTcbAgainstTclMatchesLuYangXie() {
    final TimeRelationsFixture f = TimeRelationsFixture.get();
    final double d = f.moonMeanRate() - LU_L_M;
    final double dDelta = (f.moonMeanRate() - f.earthMeanRate()) - (LU_L_M - IERS_L_C);
    System.out.printf("evidence: timescale.l_m_minus_lu = %.3e%n", d);
    System.out.printf("evidence: timescale.l_m_minus_l_c_vs_lu_minus_iers = %.3e%n", dDelta);
    assertTrue(Math.abs(d) < 1.0e-15, "L_M " + d);
    // The Moon shares the Earth's long-period terms: the difference of the two rates is free of them.
    assertTrue(Math.abs(dDelta) < 5.0e-16, "L_M - L_C " + dDelta);
  }
}
