package org.eigenzeit.onboard.gravity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import org.eigenzeit.onboard.status.Status;
import org.junit.jupiter.api.Test;

/**
 * The geopotential evaluator against an independent evaluation with the closed-form associated
 * Legendre functions of degree 2-4 (Abramowitz and Stegun 1964, section 8.6; Heiskanen and
 * Moritz 1967 eq. 1-73 for the full normalisation).
 */
class GeopotentialTest {
  /** 10x the measured worst difference to the closed forms, relative to GM/r. */
  private static final double LEGENDRE_BOUND = 1e-18;
  /** 10x the measured difference of the radial sum to a central difference (h = 1e-3 of r). */
  private static final double RADIAL_BOUND = 1e-5;
  private static final GravityField EGM96_4 = GravityField.egm96(4);

  /** Unnormalised P_nm(t) for n <= 4, u = sqrt(1 - t^2), Condon-Shortley phase omitted (geodesy). */
  private static double legendre(int n, int m, double t) {
    final double u = Math.sqrt(1 - t * t);
    switch (n * 10 + m) {
      case 20: return 0.5 * (3 * t * t - 1);
      case 21: return 3 * t * u;
      case 22: return 3 * u * u;
      case 30: return 0.5 * t * (5 * t * t - 3);
      case 31: return 1.5 * (5 * t * t - 1) * u;
      case 32: return 15 * t * u * u;
      case 33: return 15 * u * u * u;
      case 40: return (35 * Math.pow(t, 4) - 30 * t * t + 3) / 8;
      case 41: return 2.5 * (7 * t * t * t - 3 * t) * u;
      case 42: return 7.5 * (7 * t * t - 1) * u * u;
      case 43: return 105 * t * u * u * u;
      case 44: return 105 * Math.pow(u, 4);
      default: throw new IllegalArgumentException();
    }
  }

  private static double factorial(int k) {
    double f = 1;
    for (int i = 2; i <= k; i++) {
      f *= i;
    }
    return f;
  }

  private static double directPotential(double x, double y, double z) {
    final double r = Math.sqrt(x * x + y * y + z * z);
    final double t = z / r;
    final double lon = Math.atan2(y, x);
    double sum = 0;
    for (int n = 2; n <= 4; n++) {
      for (int m = 0; m <= n; m++) {
        final double norm = Math.sqrt((m == 0 ? 1 : 2) * (2 * n + 1) * factorial(n - m) / factorial(n + m));
        final double p = norm * legendre(n, m, t);
        sum += Math.pow(EGM96_4.radiusM() / r, n) * p
            * (EGM96_4.c(n, m) * Math.cos(m * lon) + EGM96_4.s(n, m) * Math.sin(m * lon));
      }
    }
    return EGM96_4.gmM3PerS2() / r * sum;
  }

  @Test
  void matchesClosedFormLegendreToDegreeFour() {
    final Geopotential g = new Geopotential(EGM96_4, 4);
    final double[] worst = new double[1];
    qt().withExamples(2000).withFixedSeed(3L)
        .forAll(doubles().between(6.6e6, 4.5e7), doubles().between(-1, 1), doubles().between(-Math.PI, Math.PI))
        .checkAssert((r, t, lon) -> {
          final double u = Math.sqrt(1 - t * t);
          final double x = r * u * Math.cos(lon);
          final double y = r * u * Math.sin(lon);
          final double z = r * t;
          g.evaluate(x, y, z);
          final double ref = directPotential(x, y, z);
          final double rel = Math.abs(g.potentialM2PerS2() - ref) / (EGM96_4.gmM3PerS2() / r);
          worst[0] = Math.max(worst[0], rel);
          assertTrue(rel < LEGENDRE_BOUND, "relative to GM/r: " + rel);
        });
    System.out.printf("geopotential degree 4 vs closed-form Legendre functions: worst %.2e of GM/r%n", worst[0]);
    System.out.printf("evidence: gravity.legendre_closed_form_rel = %.3e bound %.1e%n", worst[0], LEGENDRE_BOUND);
  }

  @Test
  void radialSumIsMinusRadialDerivative() {
    final GravityField f = GravityField.egm96(36);
    final Geopotential g = new Geopotential(f, 36);
    final double[] p = {4.1e6, -3.3e6, 4.4e6};
    final double h = 1.0e-3;
    g.evaluate(p[0] * (1 + h), p[1] * (1 + h), p[2] * (1 + h));
    final double up = g.potentialM2PerS2();
    g.evaluate(p[0] * (1 - h), p[1] * (1 - h), p[2] * (1 - h));
    final double down = g.potentialM2PerS2();
    g.evaluate(p[0], p[1], p[2]);
    final double rDotGrad = (up - down) / (2 * h);
    final double rel = Math.abs(-g.radialSumM2PerS2() / rDotGrad - 1);
    System.out.printf("evidence: gravity.radial_sum_vs_difference_rel = %.3e bound %.1e%n", rel, RADIAL_BOUND);
    assertTrue(rel < RADIAL_BOUND, "relative " + rel);
  }

  @Test
  void degreeTwoZonalEqualsJ2ClosedForm() {
    final GravityField f = GravityField.builder(3.986004415e14, 6378136.3, 2).set(2, 0, -4.84165371736e-4, 0).build();
    final Geopotential g = new Geopotential(f, 2);
    final double x = 5.0e6;
    final double z = 4.0e6;
    g.evaluate(x, 0, z);
    final double r = Math.hypot(x, z);
    final double s = z / r;
    final double j2 = Math.sqrt(5) * 4.84165371736e-4;
    final double expected = -3.986004415e14 / r * j2 * Math.pow(6378136.3 / r, 2) * (1.5 * s * s - 0.5);
    assertEquals(expected, g.potentialM2PerS2(), 1e-12 * Math.abs(expected));
    g.evaluate(0, 0, 7.0e6); // on the pole: no NaN
    assertEquals(-3.986004415e14 / 7e6 * j2 * Math.pow(6378136.3 / 7e6, 2), g.potentialM2PerS2(), 1e-6);
  }

  @Test
  void fieldBuilderRefusesBadValues() {
    assertThrows(IllegalArgumentException.class, () -> GravityField.builder(3.9e14, 6.4e6, 1));
    assertThrows(IllegalArgumentException.class, () -> GravityField.builder(3.9e14, 6.4e6, 91));
    assertThrows(IllegalArgumentException.class, () -> GravityField.builder(Double.NaN, 6.4e6, 4));
    assertThrows(IllegalArgumentException.class, () -> GravityField.builder(-1, 6.4e6, 4));
    assertThrows(IllegalArgumentException.class, () -> GravityField.builder(Double.POSITIVE_INFINITY, 6.4e6, 4));
    assertThrows(IllegalArgumentException.class, () -> GravityField.builder(3.9e14, Double.POSITIVE_INFINITY, 4));
    assertThrows(IllegalArgumentException.class, () -> GravityField.builder(3.9e14, 0.0, 4));
    final GravityField.Builder b = GravityField.builder(3.9e14, 6.4e6, 4);
    assertThrows(IllegalArgumentException.class, () -> b.set(5, 0, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> b.set(1, 0, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> b.set(3, 4, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> b.set(3, -1, 0, 0));
    assertThrows(IllegalArgumentException.class, () -> b.set(3, 1, Double.POSITIVE_INFINITY, 0));
    assertThrows(IllegalArgumentException.class, () -> b.set(3, 1, 0, Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> b.set(3, 0, 1e-6, 1e-7), "S_n0 must be zero");
    assertThrows(IllegalArgumentException.class, () -> b.set(3, 0, 0.5, 0), "above the coefficient limit");
    final GravityField f = b.set(3, 0, 1e-6, 0).set(2, 2, 1e-6, -1e-6).build();
    assertEquals(4, f.degree());
    assertEquals(1e-6, f.c(3, 0), 0);
    assertEquals(-1e-6, f.s(2, 2), 0);
    for (int[] outside : new int[][] {{5, 0}, {1, 0}, {2, -1}, {2, 3}}) {
      assertEquals(0.0, f.c(outside[0], outside[1]), 0);
      assertEquals(0.0, f.s(outside[0], outside[1]), 0);
    }
    assertEquals(2, f.truncated(2).degree());
    assertEquals(0.0, f.truncated(2).c(3, 0), 0);
    assertEquals(f, f.truncated(9), "nothing to cut: the same field");
    assertThrows(IllegalArgumentException.class, () -> new Geopotential(f, 5));
    assertThrows(IllegalArgumentException.class, () -> new Geopotential(f, 1));
    assertThrows(IllegalArgumentException.class, () -> GravityField.egm96(37));
    assertThrows(IllegalArgumentException.class, () -> GravityField.egm96(1));
  }

  @Test
  void shippedEgm96MatchesPublishedLowDegreeValues() {
    // EGM96 (Lemoine et al. 1998, NASA/TP-1998-206861) C20 = -4.84165371736e-4,
    // C22 = 2.43914352398e-6, S22 = -1.40016683654e-6: values from memory (the shipped file's header
    // quotes the same numbers as its spot check; neither REFERENCE-VALUES nor the data README holds
    // EGM96 values).
    final GravityField f = GravityField.egm96(36);
    assertEquals(-4.84165371736e-4, f.c(2, 0), 0);
    assertEquals(2.43914352398e-6, f.c(2, 2), 0);
    assertEquals(-1.40016683654e-6, f.s(2, 2), 0);
    // Outside check of the shipped table: EGM2008 (Pavlis et al. 2012, as listed in the project's
    // REFERENCE-VALUES) to degree 4. The two models differ by a few 1e-10 in these coefficients
    // (measured worst 4.7e-10); a wrong column, sign or normalisation would differ by 1e-7 or more.
    final double[][] egm2008 = {
      {2, 0, -0.484165143790815e-3, 0}, {2, 1, -0.206615509074176e-9, 0.138441389137979e-8},
      {2, 2, 0.243938357328313e-5, -0.140027370385934e-5}, {3, 0, 0.957161207093473e-6, 0},
      {3, 1, 0.203046201047864e-5, 0.248200415856872e-6}, {3, 2, 0.904787894809528e-6, -0.619005475177618e-6},
      {3, 3, 0.721321757121568e-6, 0.141434926192941e-5}, {4, 0, 0.539965866638991e-6, 0},
      {4, 1, -0.536157389388867e-6, -0.473567346518086e-6}, {4, 2, 0.350501623962649e-6, 0.662480026275829e-6},
      {4, 3, 0.990856766672321e-6, -0.200956723567452e-6}, {4, 4, -0.188519633023033e-6, 0.308803882149194e-6},
    };
    double worst = 0;
    for (double[] row : egm2008) {
      worst = Math.max(worst, Math.abs(f.c((int) row[0], (int) row[1]) - row[2]));
      worst = Math.max(worst, Math.abs(f.s((int) row[0], (int) row[1]) - row[3]));
    }
    System.out.printf("evidence: gravity.egm96_vs_egm2008_low_degree = %.3e bound %.1e%n", worst, 1e-9);
    assertTrue(worst < 1e-9, "EGM96 vs EGM2008 to degree 4: " + worst);
    assertEquals(36, f.degree());
  }

  @Test
  void uplinkedFieldIsValidatedAndTakesEffectOnlyWhenActivated() {
    final GravityTable table = new GravityTable(4, 3.986004415e14, 6378136.3);
    final org.eigenzeit.onboard.table.UplinkTable uplink = new org.eigenzeit.onboard.table.UplinkTable(table);
    final Geopotential g = new Geopotential(table, 4);
    g.evaluate(5.0e6, 1.0e6, 4.0e6);
    assertEquals(0.0, g.potentialM2PerS2(), 0.0, "nothing active: no harmonics");
    final byte[] image = new byte[GravityTable.imageBytesFor(4)];
    assertEquals(Status.OK, GravityTable.encode(EGM96_4, image, 0));
    assertEquals(Status.OK, uplink.load(image, 0, image.length));
    g.evaluate(5.0e6, 1.0e6, 4.0e6);
    assertEquals(0.0, g.potentialM2PerS2(), 0.0, "validated but not activated: still nothing");
    assertEquals(Status.OK, uplink.activate());
    g.evaluate(5.0e6, 1.0e6, 4.0e6);
    final Geopotential direct = new Geopotential(EGM96_4, 4);
    direct.evaluate(5.0e6, 1.0e6, 4.0e6);
    assertEquals(direct.potentialM2PerS2(), g.potentialM2PerS2(), 0.0, "the image carries the field bit for bit");
    assertEquals(4, table.degree());
    final byte[] big = new byte[GravityTable.imageBytesFor(8)];
    assertEquals(Status.OK, GravityTable.encode(GravityField.egm96(8), big, 0));
    assertEquals(Status.CAPACITY_EXCEEDED, uplink.load(big, 0, big.length));
    final GravityField moon = GravityField.builder(4.9028e12, 1.738e6, 4).set(2, 0, -9.1e-5, 0).build();
    final byte[] other = new byte[GravityTable.imageBytesFor(4)];
    assertEquals(Status.OK, GravityTable.encode(moon, other, 0));
    assertEquals(Status.OUT_OF_RANGE, uplink.load(other, 0, other.length), "a field of another body");
    assertEquals(0, uplink.lastFailedItem(), "item 0: GM");
    final byte[] bad = image.clone();
    final int c31 = 8 + 16 + 16 * (GravityField.index(3, 1) - 3); // C31 of the payload
    java.util.Arrays.fill(bad, c31, c31 + 8, (byte) 0x7F); // a huge coefficient (NaN pattern 0x7F7F...)
    final java.util.zip.CRC32C crc = new java.util.zip.CRC32C();
    crc.update(bad, 0, bad.length - 4);
    final int v = (int) crc.getValue();
    for (int i = 0; i < 4; i++) {
      bad[bad.length - 4 + i] = (byte) (v >>> (24 - 8 * i));
    }
    assertEquals(Status.OUT_OF_RANGE, uplink.load(bad, 0, bad.length));
    assertEquals(GravityField.index(3, 1), uplink.lastFailedItem());
    g.evaluate(5.0e6, 1.0e6, 4.0e6);
    assertEquals(direct.potentialM2PerS2(), g.potentialM2PerS2(), 0.0, "refused uploads change nothing");
    assertThrows(IllegalArgumentException.class, () -> new GravityTable(1, 1, 1));
    assertThrows(IllegalArgumentException.class, () -> table.install(GravityField.egm96(8)));
  }
}
