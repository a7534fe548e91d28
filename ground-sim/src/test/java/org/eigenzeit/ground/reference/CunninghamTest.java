package org.eigenzeit.ground.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.gravity.Geopotential;
import org.junit.jupiter.api.Test;

/**
 * The reference's Cunningham recursion against the onboard core's normalised-Legendre evaluator
 * (two independent algorithms, Cunningham 1970 and Holmes and Featherstone 2002) and its
 * acceleration against the numerical gradient of its own potential.
 */
class CunninghamTest {
  private static final GravityField EGM96 = GravityField.egm96(36);

  @Test
  void potentialAgreesWithOnboardAlgorithmToDegree36() {
    final Cunningham cun = new Cunningham(EGM96, 36);
    final Geopotential leg = new Geopotential(EGM96, 36);
    final Random rnd = new Random(36);
    double worst = 0;
    for (int i = 0; i < 2000; i++) {
      final double r = 6.6e6 + rnd.nextDouble() * 4e7;
      final double z = (2 * rnd.nextDouble() - 1) * r;
      final double lon = rnd.nextDouble() * 2 * Math.PI;
      final double rho = Math.sqrt(r * r - z * z);
      final double[] p = {rho * Math.cos(lon), rho * Math.sin(lon), z};
      final double uc = cun.evaluate(p, new double[3]);
      leg.evaluate(p[0], p[1], p[2]);
      final double gmr = EGM96.gmM3PerS2() / r;
      worst = Math.max(worst, Math.abs(uc - leg.potentialM2PerS2()) / gmr);
    }
    System.out.printf("Cunningham vs normalised Legendre, degree 36: worst %.2e of GM/r%n", worst);
    System.out.printf("evidence: reference.cunningham_vs_legendre_rel = %.3e%n", worst);
    assertEquals(0.0, worst, 1e-15);
  }

  @Test
  void accelerationIsTheGradientOfThePotential() {
    final Cunningham cun = new Cunningham(EGM96, 36);
    final double[] p = {-2.1e6, 5.7e6, 3.3e6};
    final double[] acc = new double[3];
    cun.evaluate(p, acc);
    final double h = 5.0;
    final double gm = EGM96.gmM3PerS2();
    for (int k = 0; k < 3; k++) {
      final double[] up = p.clone();
      final double[] dn = p.clone();
      up[k] += h;
      dn[k] -= h;
      final double rUp = Math.sqrt(up[0] * up[0] + up[1] * up[1] + up[2] * up[2]);
      final double rDn = Math.sqrt(dn[0] * dn[0] + dn[1] * dn[1] + dn[2] * dn[2]);
      final double uUp = cun.evaluate(up, new double[3]) + gm / rUp;
      final double uDn = cun.evaluate(dn, new double[3]) + gm / rDn;
      assertEquals((uUp - uDn) / (2 * h), acc[k], 1e-8); // rounding of U (6e7) over 10 m
    }
  }

  @Test
  void exponentialAtmosphereTable() {
    // Vallado (2013) Table 8-4: 3.725e-12 kg/m^3 at 400 km; bands join within a few percent.
    assertEquals(3.725e-12, ExponentialAtmosphere.density(400e3), 1e-16);
    final double[][] t = ExponentialAtmosphere.TABLE;
    for (int i = 1; i < t.length; i++) {
      final double fromBelow = t[i - 1][1] * Math.exp(-(t[i][0] - t[i - 1][0]) / t[i - 1][2]);
      assertEquals(1.0, fromBelow / t[i][1], 0.12, "band at " + t[i][0] + " km");
    }
  }
}
