package org.eigenzeit.ground.ephemeris;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.frames.LunarPole;
import org.eigenzeit.onboard.gravity.LunisolarEphemeris;
import org.eigenzeit.onboard.math.MathMode;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/**
 * The DE405 reader against IAU SOFA (moon98, epv00) and the DE405 header constants; then the
 * onboard core's low-precision Sun, Moon and lunar pole measured against DE405 (the accuracy
 * statement of the core's documentation).
 */
class JplEphemerisTest {
  /** DE405 against moon98 (measured 9.2 arcsec: the stated accuracy of moon98, about 10 arcsec). */
  private static final double MOON_BOUND_ARCSEC = 15.0;
  /** 10x the measured worst DE405 against epv00 (0.0081 arcsec; both are km-level ephemerides). */
  private static final double SUN_BOUND_ARCSEC = 0.08;
  private static final JplEphemeris EPH = JplEphemeris.de405();
  private static final ThirdBodies DE = ThirdBodies.de405();
  private static final double AU_M = 149_597_870_691.0;

  private static double angleDeg(double[] a, double[] b) {
    final double dot = a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    return Math.toDegrees(Math.acos(Math.min(1, dot / (norm(a) * norm(b)))));
  }

  private static double norm(double[] a) {
    return Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
  }

  @Test
  void headerConstants() {
    // DE405 header (Standish 1998): AU = 149597870.691 km, EMRAT = 81.30056.
    assertEquals(149_597_870.691, EPH.constant("AU"), 1e-3);
    assertEquals(81.30056, EPH.constant("EMRAT"), 1e-5);
    assertTrue(EPH.covers(2461000.5));
    // The two shipped JPL blocks: ascp2000.405 starts at JD 2451536.5, ascp2020.405 ends at
    // JD 2466160.5 (their record headers; see PROVENANCE.md).
    assertEquals(2451536.5, EPH.firstJd(), 0.0);
    assertEquals(2466160.5, EPH.lastJd(), 0.0);
    assertTrue(EPH.covers(2455378.5)); // 2010-07-01, a real GNSS fixture day
    assertThrows(IllegalArgumentException.class, () -> EPH.constant("NOPE"));
    assertThrows(IllegalArgumentException.class, () -> EPH.evaluate(JplEphemeris.MOON, 2451530.0, 0, new double[3]));
    assertThrows(IllegalArgumentException.class, () -> EPH.evaluate(JplEphemeris.MOON, 2466161.0, 0, new double[3]));
  }

  /** A tiny header with one item of one coefficient, so that a record is two numbers plus one. */
  private static final String TINY_HEADER = "KSIZE= 6    NCOEFF=    3\nGROUP   1030\n 0.0 64.0 32.0\n"
      + "GROUP   1050\n 3 0 0 0 0 0 0 0 0 0 0 0 0\n 1 0 0 0 0 0 0 0 0 0 0 0 0\n 1 0 0 0 0 0 0 0 0 0 0 0 0\n";

  private static java.io.InputStream text(String s) {
    return new java.io.ByteArrayInputStream(s.getBytes(java.nio.charset.StandardCharsets.US_ASCII));
  }

  private static String loadError(String... blocks) {
    final java.util.List<String> names = new java.util.ArrayList<>();
    final java.util.List<java.io.InputStream> ins = new java.util.ArrayList<>();
    for (int i = 0; i < blocks.length; i++) {
      names.add("block" + i);
      ins.add(text(blocks[i]));
    }
    return assertThrows(IllegalArgumentException.class,
        () -> JplEphemeris.load("hdr", text(TINY_HEADER), names, ins)).getMessage();
  }

  @Test
  void malformedDataIsRefusedWithBlockAndLine() {
    final String rec0 = "     1     3\n  0.0D+00  0.32D+02  0.5D+00\n";
    final String rec1 = "     2     3\n  0.32D+02  0.64D+02  0.5D+00\n";
    // A well-formed pair of blocks that overlap by one identical record loads and is contiguous.
    final JplEphemeris ok = JplEphemeris.load("hdr", text(TINY_HEADER), java.util.List.of("a", "b"),
        java.util.List.of(text(rec0 + rec1), text(rec1)));
    assertEquals(0.0, ok.firstJd(), 0.0);
    assertEquals(64.0, ok.lastJd(), 0.0);
    assertTrue(loadError(rec0, "     2     3\n  0.32D+02  0.64D+02  0.7D+00\n", rec1).contains("differs"));
    assertTrue(loadError(rec0 + "     3     3\n  0.64D+02  0.96D+02  0.5D+00\n").contains("not contiguous"));
    assertTrue(loadError("     1     3\n  0.0D+00  NaN  0.5D+00\n").startsWith("block0:2:"));
    assertTrue(loadError("     1     3\n  0.0D+00  0x1p5  0.5D+00\n").startsWith("block0:2:"));
    assertTrue(loadError("     1     3\n  0.0D+00  0.1D+999  0.5D+00\n").startsWith("block0:2:"));
    assertTrue(loadError("     1     3\n  0.0D+00\n").contains("ends inside the record"));
    assertTrue(loadError("garbage line\n").startsWith("block0:1:"));
  }

  @Test
  void moonAndSunAgreeWithSofa() {
    // SOFA moon98 is good to about 10 arcsec and 100 km; epv00 to a few km.
    double worstMoon = 0;
    double worstSun = 0;
    for (double days = 9500; days < 11300; days += 7.3) {
      final double t = days * 86400;
      final double[] moon = new double[3];
      DE.moonGeocentricM(t, moon);
      final double[][] pv = JSOFA.jauMoon98(2451545.0, days);
      final double[] ref = {pv[0][0] * AU_M, pv[0][1] * AU_M, pv[0][2] * AU_M};
      worstMoon = Math.max(worstMoon, angleDeg(moon, ref));
      assertEquals(norm(ref), norm(moon), 100e3);
      final double[] sun = new double[3];
      DE.sunGeocentricM(t, sun);
      final double[][] pvh = new double[2][3];
      final double[][] pvb = new double[2][3];
      JSOFA.jauEpv00(2451545.0, days, pvh, pvb);
      final double[] sref = {-pvh[0][0] * AU_M, -pvh[0][1] * AU_M, -pvh[0][2] * AU_M};
      worstSun = Math.max(worstSun, angleDeg(sun, sref));
      assertEquals(norm(sref), norm(sun), 50e3);
    }
    System.out.printf("DE405 reader vs SOFA 2026-2030: Moon %.2f arcsec (moon98), Sun %.4f arcsec (epv00)%n",
        worstMoon * 3600, worstSun * 3600);
    System.out.printf("evidence: ephemeris.de405_moon_vs_moon98_arcsec = %.3f bound %.1f%n", worstMoon * 3600, MOON_BOUND_ARCSEC);
    System.out.printf("evidence: ephemeris.de405_sun_vs_epv00_arcsec = %.4f bound %.2f%n", worstSun * 3600, SUN_BOUND_ARCSEC);
    assertTrue(worstMoon * 3600 < MOON_BOUND_ARCSEC, "moon " + worstMoon);
    assertTrue(worstSun * 3600 < SUN_BOUND_ARCSEC, "sun " + worstSun);
  }

  @Test
  void onboardSeriesAccuracyAgainstDe405() {
    final LunisolarEphemeris series = new LunisolarEphemeris(MathMode.FAST);
    final LunarPole iauPole = new LunarPole(MathMode.FAST);
    double moonAngle = 0;
    double moonDist = 0;
    double sunAngle = 0;
    double sunRel = 0;
    double poleAngle = 0;
    for (double days = 9130; days < 11320; days += 0.5) {
      final double t = days * 86400;
      final double[] a = new double[3];
      final double[] b = new double[3];
      series.moon(days / 36525, a);
      DE.moonGeocentricM(t, b);
      moonAngle = Math.max(moonAngle, angleDeg(a, b));
      moonDist = Math.max(moonDist, Math.abs(norm(a) - norm(b)));
      series.sun(days / 36525, a);
      DE.sunGeocentricM(t, b);
      sunAngle = Math.max(sunAngle, angleDeg(a, b));
      sunRel = Math.max(sunRel, Math.abs(norm(a) / norm(b) - 1));
      iauPole.pole(days, a);
      DE.lunarPole(t, b);
      poleAngle = Math.max(poleAngle, angleDeg(a, b));
    }
    System.out.printf("Onboard series vs DE405 2025-2030: Moon %.4f deg / %.0f km, Sun %.4f deg / %.1e, "
        + "lunar pole %.4f deg%n", moonAngle, moonDist / 1e3, sunAngle, sunRel, poleAngle);
    System.out.printf("evidence: ephemeris.series_moon_vs_de405_deg = %.4f bound 0.1%n", moonAngle);
    System.out.printf("evidence: ephemeris.series_sun_vs_de405_deg = %.4f bound 0.015%n", sunAngle);
    System.out.printf("evidence: ephemeris.lunar_pole_vs_de405_deg = %.4f bound 0.1%n", poleAngle);
    // Tidal-term consequence (see docs): about 3 dR/R + 2 angle: below 1.5 % for the Moon.
    assertTrue(moonAngle < 0.1 && moonDist < 600e3, "moon");
    assertTrue(sunAngle < 0.015 && sunRel < 1e-4, "sun");
    assertTrue(poleAngle < 0.1, "pole " + poleAngle);
  }
}
