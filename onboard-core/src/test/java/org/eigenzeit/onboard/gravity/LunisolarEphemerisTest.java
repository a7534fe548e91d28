package org.eigenzeit.onboard.gravity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import org.eigenzeit.onboard.math.MathMode;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/**
 * Low-precision Sun and Moon against IAU SOFA (jsofa): moon98 (Meeus' ELP-based series, about
 * 10 arcsec) and epv00 (VSOP2000-based Earth ephemeris, a few km). The DE405 comparison lives in
 * the ground module. Tolerances are the series' stated accuracy with margin.
 */
class LunisolarEphemerisTest {
  private static final double AU_M = 149_597_870_700.0;

  private static double angle(double[] a, double[] b) {
    final double dot = a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    final double na = Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
    final double nb = Math.sqrt(b[0] * b[0] + b[1] * b[1] + b[2] * b[2]);
    return Math.acos(Math.min(1.0, dot / (na * nb)));
  }

  private static double norm(double[] a) {
    return Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
  }

  @Test
  void moonWithinTenthOfDegreeAndThousandKm() {
    final LunisolarEphemeris eph = new LunisolarEphemeris(MathMode.FAST);
    final double[] worst = new double[2];
    qt().withExamples(500).withFixedSeed(8L).forAll(doubles().between(7300, 14600)).checkAssert(days -> {
      final double[] ours = new double[3];
      eph.moon(days / 36525.0, ours);
      final double[][] pv = JSOFA.jauMoon98(2451545.0, days);
      final double[] ref = {pv[0][0] * AU_M, pv[0][1] * AU_M, pv[0][2] * AU_M};
      final double a = angle(ours, ref);
      final double dr = Math.abs(norm(ours) - norm(ref));
      worst[0] = Math.max(worst[0], a);
      worst[1] = Math.max(worst[1], dr);
      assertTrue(a < Math.toRadians(0.1), "angle " + Math.toDegrees(a));
      assertTrue(dr < 1.0e6, "distance error " + dr);
    });
    System.out.printf("Moon series vs SOFA moon98 2020-2040: worst %.4f deg, %.0f km%n",
        Math.toDegrees(worst[0]), worst[1] / 1e3);
  }

  @Test
  void sunWithinFifteenThousandthsOfDegree() {
    final LunisolarEphemeris eph = new LunisolarEphemeris(MathMode.FAST);
    final double[] worst = new double[2];
    qt().withExamples(500).withFixedSeed(9L).forAll(doubles().between(7300, 14600)).checkAssert(days -> {
      final double[] ours = new double[3];
      eph.sun(days / 36525.0, ours);
      final double[][] pvh = new double[2][3];
      final double[][] pvb = new double[2][3];
      JSOFA.jauEpv00(2451545.0, days, pvh, pvb);
      final double[] ref = {-pvh[0][0] * AU_M, -pvh[0][1] * AU_M, -pvh[0][2] * AU_M};
      final double a = angle(ours, ref);
      final double rel = Math.abs(norm(ours) / norm(ref) - 1);
      worst[0] = Math.max(worst[0], a);
      worst[1] = Math.max(worst[1], rel);
      assertTrue(a < Math.toRadians(0.015), "angle " + Math.toDegrees(a));
      assertTrue(rel < 1e-4, "distance " + rel);
    });
    System.out.printf("Sun series vs SOFA epv00 2020-2040: worst %.5f deg, %.2e relative%n",
        Math.toDegrees(worst[0]), worst[1]);
  }

  @Test
  void tidalPotentialMatchesQuadrupoleAndItsDerivative() {
    // Common practice: the leading term is GM r^2/R^3 P2(cos psi); the rest is O(r/R) smaller.
    final double[] moon = {3.0e8, 2.0e8, 1.0e8};
    final double[] sat = {2.0e7, 1.3e7, 0.7e7};
    final double bigR = norm(moon);
    final double r = norm(sat);
    final double cos = (moon[0] * sat[0] + moon[1] * sat[1] + moon[2] * sat[2]) / (bigR * r);
    final double quad = TidalPotential.GM_MOON * r * r / (bigR * bigR * bigR) * 0.5 * (3 * cos * cos - 1);
    final double exact = TidalPotential.potential(TidalPotential.GM_MOON, moon, sat);
    assertEquals(quad, exact, 3 * r / bigR * Math.abs(quad));
    final double h = 1e-4;
    final double[] up = {sat[0] * (1 + h), sat[1] * (1 + h), sat[2] * (1 + h)};
    final double[] dn = {sat[0] * (1 - h), sat[1] * (1 - h), sat[2] * (1 - h)};
    final double fd = (TidalPotential.potential(TidalPotential.GM_MOON, moon, up)
        - TidalPotential.potential(TidalPotential.GM_MOON, moon, dn)) / (2 * h);
    assertEquals(fd, TidalPotential.radialDerivative(TidalPotential.GM_MOON, moon, sat), 1e-6 * Math.abs(fd));
  }

  @Test
  void tidalTermAtGpsAltitudeHasPublishedMagnitude() {
    // REFERENCE-VALUES (common practice): about 7e-16 (Moon) and 3e-16 (Sun) at GPS altitude.
    final double c2 = 299792458.0 * 299792458.0;
    final double r = 2.656175e7;
    final double moonPeak = TidalPotential.GM_MOON * r * r / Math.pow(3.844e8, 3) / c2;
    final double sunPeak = TidalPotential.GM_SUN * r * r / Math.pow(1.496e11, 3) / c2;
    assertEquals(7e-16, moonPeak, 1.5e-16);
    assertEquals(3e-16, sunPeak, 1e-16);
    final double[] moon = {3.844e8, 0, 0};
    final double[] sat = {r, 0, 0};
    assertEquals(TidalPotential.GM_MOON * r * r / Math.pow(3.844e8, 3),
        TidalPotential.potential(TidalPotential.GM_MOON, moon, sat), 0.1 * moonPeak * c2);
  }
}
