package org.eigenzeit.ground.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eigenzeit.onboard.body.CentralBody;
import org.junit.jupiter.api.Test;

/**
 * The budget analysis' orbit geometry against the two-body closed forms (common practice, e.g.
 * Vallado 2013, section 2.3): in the perifocal frame, at true anomaly nu, r = p / (1 + e cos nu)
 * along (cos nu, sin nu, 0) and v = sqrt(mu / p) (-sin nu, e + cos nu, 0), with p = a (1 - e^2);
 * the perigee radius is a (1 - e). The states are written here from those formulas, not made by
 * the code under test.
 */
class BudgetGeometryTest {
  private static OrbitSpec state(CentralBody body, double a, double e, double nuDeg, boolean tilted) {
    final double mu = body.gmM3PerS2();
    final double p = a * (1 - e * e);
    final double nu = Math.toRadians(nuDeg);
    final double r = p / (1 + e * Math.cos(nu));
    final double s = Math.sqrt(mu / p);
    final double[] pos = {r * Math.cos(nu), r * Math.sin(nu), 0};
    final double[] vel = {-s * Math.sin(nu), s * (e + Math.cos(nu)), 0};
    if (tilted) { // the orbit plane turned by 90 degrees about x: (x, y, z) -> (x, 0, y)
      return new OrbitSpec(body, new double[] {pos[0], 0, pos[1]}, new double[] {vel[0], 0, vel[1]});
    }
    return new OrbitSpec(body, pos, vel);
  }

  @Test
  void perigeeRadiusIsAOneMinusE() {
    for (double nu : new double[] {0, 37, 90, 180, 251}) {
      for (boolean tilted : new boolean[] {false, true}) {
        assertEquals(6.3e6, BudgetAnalysis.perigeeRadiusOf(state(CentralBody.EARTH, 7.0e6, 0.1, nu, tilted)), 1e-3,
            "nu " + nu);
        assertEquals(26_560e3 * 0.99, BudgetAnalysis.perigeeRadiusOf(state(CentralBody.EARTH, 26_560e3, 0.01, nu, tilted)),
            1e-2, "nu " + nu);
        assertEquals(1_838e3 * (1 - 0.04), BudgetAnalysis.perigeeRadiusOf(state(CentralBody.MOON, 1_838e3, 0.04, nu, tilted)),
            1e-3, "nu " + nu);
      }
    }
    assertEquals(7.0e6, BudgetAnalysis.perigeeRadiusOf(state(CentralBody.EARTH, 7.0e6, 0.0, 123, true)), 1e-3, "circular");
  }

  @Test
  void recommendedDegreeSwitchesAt3000KmAltitude() {
    final double re = CentralBody.EARTH.referenceRadiusM();
    assertEquals(36, BudgetAnalysis.recommendedDegree(CentralBody.EARTH, re + 2.9e6));
    assertEquals(8, BudgetAnalysis.recommendedDegree(CentralBody.EARTH, re + 3.0e6), "3000 km is above LEO");
    assertEquals(8, BudgetAnalysis.recommendedDegree(CentralBody.EARTH, 26_560e3));
    assertEquals(36, BudgetAnalysis.recommendedDegree(CentralBody.MOON, 1_838e3));
    assertEquals(8, BudgetAnalysis.recommendedDegree(CentralBody.MOON, CentralBody.MOON.referenceRadiusM() + 3.1e6));
  }
}
