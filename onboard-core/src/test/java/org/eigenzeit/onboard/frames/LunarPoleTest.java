package org.eigenzeit.onboard.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.eigenzeit.onboard.math.MathMode;
import org.junit.jupiter.api.Test;

/**
 * The lunar pole model against (a) Table 2 of Archinal et al. (2011), IAU WGCCRE 2009 report,
 * evaluated here from its coefficient table (coefficients from memory, as in the class; the
 * ground module's DE405 check measures the model against the lunar librations), and (b) Cassini's
 * third law: the lunar equator is inclined to the ecliptic by about 1.54 deg (common practice).
 */
class LunarPoleTest {
  private static final double DEG = Math.PI / 180.0;
  /** Rows: rate of E_k in deg/day, phase in deg, alpha sine coefficient, delta cosine coefficient. */
  private static final double[][] TERMS = {
    {-0.0529921, 125.045, -3.8787, 1.5419},
    {-0.1059842, 250.089, -0.1204, 0.0239},
    {13.0120009, 260.008, 0.0700, -0.0278},
    {13.3407154, 176.625, -0.0172, 0.0068},
    {0.9856003, 357.529, 0.0072, -0.0029},
    {26.4057084, 311.589, 0.0, 0.0009},
    {-0.1589763, 15.134, -0.0052, 0.0008},
    {12.9590088, 25.053, 0.0043, -0.0009},
  };

  private static double[] table(double d) {
    double alpha = 269.9949 + 0.0031 * d / 36525.0;
    double delta = 66.5392 + 0.0130 * d / 36525.0;
    for (double[] row : TERMS) {
      final double e = (row[1] + row[0] * d) * DEG;
      alpha += row[2] * Math.sin(e);
      delta += row[3] * Math.cos(e);
    }
    return new double[] {
      Math.cos(delta * DEG) * Math.cos(alpha * DEG), Math.cos(delta * DEG) * Math.sin(alpha * DEG), Math.sin(delta * DEG)
    };
  }

  @Test
  void matchesThePublishedSeriesTermByTerm() {
    final LunarPole pole = new LunarPole(MathMode.STRICT);
    final double[] got = new double[3];
    final Random rnd = new Random(7);
    double worst = 0;
    for (int k = 0; k < 2000; k++) {
      final double d = -20 * 365.25 + rnd.nextDouble() * 80 * 365.25; // 1980 to 2060
      pole.pole(d, got);
      final double[] want = table(d);
      for (int i = 0; i < 3; i++) {
        worst = Math.max(worst, Math.abs(got[i] - want[i]));
      }
    }
    // The smallest term, 0.0008 deg, is 1.4e-5 rad: the tolerance resolves every term.
    assertEquals(0.0, worst, 1e-12);
  }

  @Test
  void equatorStaysInclinedToTheEclipticByCassinisAngle() {
    final LunarPole pole = new LunarPole(MathMode.FAST);
    final double eps = 23.439281 * DEG; // obliquity at J2000 (IERS conventions)
    final double[] ecl = {0.0, -Math.sin(eps), Math.cos(eps)};
    final double[] p = new double[3];
    for (double d = -3650; d <= 3650; d += 3.7) {
      pole.pole(d, p);
      assertEquals(1.0, p[0] * p[0] + p[1] * p[1] + p[2] * p[2], 1e-14);
      final double angle = Math.acos(p[0] * ecl[0] + p[1] * ecl[1] + p[2] * ecl[2]) / DEG;
      assertEquals(1.54, angle, 0.05, "at day " + d); // physical libration and the monthly terms: a few 0.01 deg
    }
  }
}
