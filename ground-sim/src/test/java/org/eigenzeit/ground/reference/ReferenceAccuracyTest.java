package org.eigenzeit.ground.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The reference's own error, measured: Keplerian closed form, tolerance halving, two different
 * integrators, and the Jacobi integral.
 */
class ReferenceAccuracyTest {
  static final SplitTime EPOCH = SplitTime.of(846_000_000L, 0.0); // 2026-10-22 TT
  private static final double GM = CentralBody.EARTH.gmM3PerS2();
  private static final double C2 = CentralBody.C2;
  private static final double DAY = 86_400.0;

  /** Perigee state of an orbit with semi-major axis a, eccentricity e, inclination i. */
  static double[][] perigee(double a, double e, double inc) {
    final double rp = a * (1 - e);
    final double vp = Math.sqrt(GM * (1 + e) / rp);
    return new double[][] {{rp, 0, 0}, {0, vp * Math.cos(inc), vp * Math.sin(inc)}};
  }

  @Test
  void keplerianProperTimeMatchesClosedForm() {
    // Delta tau = -[(3GM/2a - W0) t + 2 sqrt(GM a) e sin E]/c^2 (issue requirement; Ashby 2003),
    // required to 0.01 ps per day.
    final double a = 2.656175e7;
    final double e = 0.01;
    final double[][] s = perigee(a, e, Math.toRadians(55));
    final ReferenceConfig cfg = ReferenceConfig.earth(2).withDegree(0).withThirdBodies(null);
    final ReferenceTrajectory tr = new ReferencePropagator(cfg).propagate(EPOCH, s[0], s[1], DAY);
    final double n = Math.sqrt(GM / (a * a * a));
    final double w0 = CentralBody.EARTH.referencePotentialM2PerS2();
    double worst = 0;
    for (double t = 0; t <= DAY; t += 600) {
      final double m = n * t;
      double ea = m;
      for (int k = 0; k < 30; k++) {
        ea -= (ea - e * Math.sin(ea) - m) / (1 - e * Math.cos(ea));
      }
      final double expected = -((1.5 * GM / a - w0) * t + 2 * Math.sqrt(GM * a) * e * Math.sin(ea)) / C2;
      worst = Math.max(worst, Math.abs(tr.properTimeOffsetS(t) - expected));
    }
    System.out.printf("Reference Keplerian proper time vs closed form (1 day): worst %.2e s%n", worst);
    System.out.printf("evidence: reference.kepler_proper_time_s = %.3e bound 6e-19%n", worst);
    // 10x the measured 6.1e-20 s (requirement EZ-REF-01: 1e-14 s); a 1e-4 error in any coefficient
    // of the rate would be about 1e-9 s here.
    assertTrue(worst < 6e-19, "worst " + worst);
  }

  @Test
  void rateMatchesTheIau2000MetricEvaluatedExactly() {
    // The reference's clock rate with the c^-4 terms, point mass, on an eccentric orbit, against
    // dtau/dTT - 1 from the IAU 2000 Resolution B1.3 metric without expansion (BigDecimal, 60
    // digits): sqrt(1 - 2U/c^2 + 2U^2/c^4 - (1 + 2U/c^2) v^2/c^2) / (1 - L_G) - 1, L_G defining
    // (IAU 2000 B1.9), c exact (SI). The expansion leaves O(c^-6), below 1e-27.
    final MathContext mc = new MathContext(60);
    final BigDecimal c2 = new BigDecimal(299_792_458L).pow(2);
    final BigDecimal lg = new BigDecimal("6.969290134e-10");
    final double[][] s = perigee(2.6e7, 0.6, Math.toRadians(63));
    final ReferenceConfig cfg = ReferenceConfig.earth(2).withDegree(0).withThirdBodies(null).withC4(true);
    final ReferenceTrajectory tr = new ReferencePropagator(cfg).propagate(EPOCH, s[0], s[1], 6 * 3600.0);
    final double[] r = new double[3];
    final double[] v = new double[3];
    double worst = 0;
    for (double t = 0; t <= 6 * 3600.0; t += 120) {
      tr.state(t, r, v);
      final RateBreakdown rb = tr.rate(t);
      final BigDecimal rn = new BigDecimal(r[0]).pow(2).add(new BigDecimal(r[1]).pow(2)).add(new BigDecimal(r[2]).pow(2))
          .sqrt(mc);
      final BigDecimal w = new BigDecimal(GM).divide(rn, mc).divide(c2, mc);
      final BigDecimal v2 = new BigDecimal(v[0]).pow(2).add(new BigDecimal(v[1]).pow(2)).add(new BigDecimal(v[2]).pow(2))
          .divide(c2, mc);
      final BigDecimal two = BigDecimal.valueOf(2);
      final BigDecimal radicand = BigDecimal.ONE.subtract(two.multiply(w), mc).add(two.multiply(w.pow(2, mc)), mc)
          .subtract(BigDecimal.ONE.add(two.multiply(w), mc).multiply(v2, mc), mc);
      final double exact = radicand.sqrt(mc).divide(BigDecimal.ONE.subtract(lg), mc).subtract(BigDecimal.ONE).doubleValue();
      worst = Math.max(worst, Math.abs(rb.total() - exact));
    }
    System.out.printf("reference rate (c^-4) vs exact IAU 2000 metric on an e = 0.6 orbit: worst %.2e%n", worst);
    System.out.printf("evidence: reference.metric_rate_error = %.3e bound %.1e%n", worst, METRIC_BOUND);
    assertTrue(worst < METRIC_BOUND, "worst " + worst);
  }

  /** 10x the measured worst difference of the reference rate to the exact metric. */
  private static final double METRIC_BOUND = 1e-24;

  private static double dayOffset(ReferenceConfig cfg, double[][] s) {
    return new ReferencePropagator(cfg).propagate(EPOCH, s[0], s[1], DAY).properTimeOffsetS(DAY);
  }

  @Test
  void convergenceAndTwoIntegratorsAgreeBelowTenthPicosecondPerDay() {
    final double[][] leo = perigee(6.93e6, 0.001, Math.toRadians(97.6));
    final ReferenceConfig base = ReferenceConfig.earth(20).withSurfaceForces(0.02, 0.022);
    final double d13 = dayOffset(base, leo);
    final double d14 = dayOffset(base.withIntegrator(ReferenceConfig.IntegratorKind.DORMAND_PRINCE_853, 5e-14), leo);
    final double gbs = dayOffset(base.withIntegrator(ReferenceConfig.IntegratorKind.GRAGG_BULIRSCH_STOER, 1e-13), leo);
    System.out.printf("LEO day, full forces: tol 1e-13 vs 5e-14: %.2e s; DP853 vs GBS: %.2e s%n",
        Math.abs(d13 - d14), Math.abs(d13 - gbs));
    System.out.printf("evidence: reference.tolerance_halving_s = %.3e bound 3.5e-14%n", Math.abs(d13 - d14));
    System.out.printf("evidence: reference.dp853_vs_gbs_s = %.3e bound 1e-13%n", Math.abs(d13 - gbs));
    assertTrue(Math.abs(d13 - d14) < 3.5e-14, "halving"); // within 10x the measured 3.6e-15 s
    assertTrue(Math.abs(d13 - gbs) < 1e-13, "two integrators");
  }

  @Test
  void jacobiIntegralOfJ2OnlyFieldInRotatingFrame() {
    // For a field rotating uniformly about z, C = v_rot^2/2 - omega^2 rho^2/2 - U is constant
    // (Jacobi integral; e.g. Montenbruck and Gill 2000, section 3.2). J2 only: the field is
    // axisymmetric, so the rotating-frame integral also holds with the Earth's small pole motion.
    final GravityField j2 = GravityField.builder(GM, 6_378_136.3, 2).set(2, 0, -4.84165371736e-4, 0).build();
    final ReferenceConfig cfg = ReferenceConfig.earth(2).withField(j2, 2).withThirdBodies(null);
    final double[][] s = perigee(7.2e6, 0.05, Math.toRadians(63));
    final ReferenceTrajectory tr = new ReferencePropagator(cfg).propagate(EPOCH, s[0], s[1], DAY / 4);
    final double omega = CentralBody.EARTH.rotationRateRadPerS();
    final double rad = 6_378_136.3;
    final double jj2 = Math.sqrt(5) * 4.84165371736e-4;
    double first = Double.NaN;
    double worst = 0;
    final double[] r = new double[3];
    final double[] v = new double[3];
    final org.eigenzeit.onboard.frames.EarthOrientation eo =
        new org.eigenzeit.onboard.frames.EarthOrientation(org.eigenzeit.onboard.math.MathMode.STRICT, omega);
    final double[] pole = new double[3];
    eo.update(EPOCH, -69.2);
    eo.poleInGcrs(pole);
    for (double t = 0; t <= DAY / 4; t += 60) {
      tr.state(t, r, v);
      final double rn = Math.sqrt(r[0] * r[0] + r[1] * r[1] + r[2] * r[2]);
      final double rp = (r[0] * pole[0] + r[1] * pole[1] + r[2] * pole[2]) / rn;
      final double u = GM / rn * (1 - jj2 * Math.pow(rad / rn, 2) * (1.5 * rp * rp - 0.5));
      // v_rot = v - omega x r ; C = |v_rot|^2/2 - omega^2 rho^2/2 - U = |v|^2/2 - omega.(r x v) - U
      final double hz = (r[0] * v[1] - r[1] * v[0]) * pole[2] + (r[1] * v[2] - r[2] * v[1]) * pole[0]
          + (r[2] * v[0] - r[0] * v[2]) * pole[1];
      final double jac = 0.5 * (v[0] * v[0] + v[1] * v[1] + v[2] * v[2]) - omega * hz - u;
      if (Double.isNaN(first)) {
        first = jac;
      }
      worst = Math.max(worst, Math.abs(jac / first - 1));
    }
    System.out.printf("Jacobi integral, Earth J2 only, 6 h: worst relative drift %.2e%n", worst);
    // The Earth's pole moves in the GCRS (precession-nutation), which this integral ignores:
    // conserved to 1e-10 here, measured 2.4e-11.
    assertTrue(worst < 1e-10, "drift " + worst);
  }

  @Test
  void jacobiIntegralWithFixedPoleIsConservedToIntegratorAccuracy() {
    // Lunar J2 with no third bodies: the pole stays on z, so the integral is exact.
    final ReferenceConfig cfg = ReferenceConfig.moon().withThirdBodies(null);
    final double gm = CentralBody.MOON.gmM3PerS2();
    final double a = 1.9e6;
    final double vp = Math.sqrt(gm * 1.1 / (a * 0.9));
    final double[] r0 = {a * 0.9, 0, 0};
    final double[] v0 = {0, vp * Math.cos(1.2), vp * Math.sin(1.2)};
    final ReferenceTrajectory tr = new ReferencePropagator(cfg).propagate(EPOCH, r0, v0, DAY / 2);
    final double omega = CentralBody.MOON.rotationRateRadPerS();
    final double rad = CentralBody.MOON.referenceRadiusM();
    final double j2 = CentralBody.MOON.j2();
    final double[] r = new double[3];
    final double[] v = new double[3];
    double first = Double.NaN;
    double worst = 0;
    for (double t = 0; t <= DAY / 2; t += 60) {
      tr.state(t, r, v);
      final double rn = Math.sqrt(r[0] * r[0] + r[1] * r[1] + r[2] * r[2]);
      final double s = r[2] / rn;
      final double u = gm / rn * (1 - j2 * Math.pow(rad / rn, 2) * (1.5 * s * s - 0.5));
      final double jac = 0.5 * (v[0] * v[0] + v[1] * v[1] + v[2] * v[2]) - omega * (r[0] * v[1] - r[1] * v[0]) - u;
      if (Double.isNaN(first)) {
        first = jac;
      }
      worst = Math.max(worst, Math.abs(jac / first - 1));
    }
    System.out.printf("Jacobi integral, lunar J2 with fixed pole, 12 h: worst relative drift %.2e%n", worst);
    assertTrue(worst < 2e-12, "drift " + worst); // measured 8.5e-13 at tolerance 1e-13
  }
}
