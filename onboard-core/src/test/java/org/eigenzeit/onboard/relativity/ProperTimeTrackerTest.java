package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.tracker.ProperTimeTracker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The offset integrator against closed forms: the Keplerian proper time (IS-GPS-200 eccentricity
 * term plus the secular rate), Kouba's (2004) J2 periodic term, and a brute-force quadrature.
 */
class ProperTimeTrackerTest {
  private static final double GM = CentralBody.EARTH.gmM3PerS2();
  private static final double C2 = CentralBody.C2;

  static ModelConfig pointMass() {
    return ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(false).energyToleranceRel(2e-3).build();
  }

  /** Bound of the Keplerian check, s over a day: 7.5x the 2.0e-20 s measured. */
  private static final double KEPLER_BOUND_S = 1.5e-19;

  @Test
  void keplerianProperTimeMatchesClosedFormWithVaryingStepsAndGaps() {
    // Closed form (issue REQ and Ashby 2003): dtau = -[(3GM/2a - W0) t + 2 sqrt(GM a) e (sin E - sin E0)]/c^2.
    final KeplerOrbit orbit = new KeplerOrbit(GM, 2.656175e7, 0.01, Math.toRadians(55), 0.4, 1.0, 0.2);
    final ProperTimeTracker tracker = new ProperTimeTracker(pointMass());
    final OrbitSample s = new OrbitSample();
    final SplitTime t0 = RateModelTest.EPOCH;
    final SplitTime now = new SplitTime();
    final double[] r = new double[3];
    final double[] v = new double[3];
    final Random rnd = new Random(1);
    double t = 0;
    double worst = 0;
    final double w0 = CentralBody.EARTH.referencePotentialM2PerS2();
    final double e0 = orbit.eccentricAnomaly(0);
    while (t < 86_400) {
      orbit.state(t, r, v);
      now.setTo(t0);
      assertEquals(Status.OK, now.addSeconds(t));
      s.set(now, OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
      final int st = tracker.step(now, s);
      assertTrue(st == Status.OK || st == Status.LONG_STEP, Status.name(st));
      final double ea = orbit.eccentricAnomaly(t);
      final double expected = -((1.5 * GM / orbit.a - w0) * t
          + 2 * Math.sqrt(GM * orbit.a) * orbit.e * (Math.sin(ea) - Math.sin(e0))) / C2;
      worst = Math.max(worst, Math.abs(tracker.offsetS() - expected));
      t += rnd.nextDouble() < 0.05 ? 20 + 280 * rnd.nextDouble() : 1 + 9 * rnd.nextDouble();
    }
    System.out.printf("Keplerian proper time vs closed form over a day: worst %.2e s%n", worst);
    // Pinned at 7.5x the value measured (2.0e-20 s, docs/algorithms.md); the requirement is 1e-14 s/day.
    System.out.printf("evidence: model.kepler_proper_time_s = %.3e bound %.1e%n", worst, KEPLER_BOUND_S);
    assertTrue(worst < KEPLER_BOUND_S, "worst " + worst);
  }

  /** Truth along a J2-only orbit: fine RK4 states every second. */
  private static double[][] j2Truth(double a, double inc, int seconds) {
    final OrbitBridge prop = new OrbitBridge(GM, CentralBody.EARTH.referenceRadiusM(), CentralBody.EARTH.j2());
    final double[] pole = {0, 0, 1};
    prop.setPole(pole);
    final double v = Math.sqrt(GM / a);
    final double[] r = {a, 0, 0};
    final double[] vel = {0, v * Math.cos(inc), v * Math.sin(inc)};
    final double[][] states = new double[seconds + 1][6];
    for (int k = 0; k <= seconds; k++) {
      System.arraycopy(r, 0, states[k], 0, 3);
      System.arraycopy(vel, 0, states[k], 3, 3);
      prop.propagate(r, vel, 1.0, 0.5);
    }
    return states;
  }

  /** A J2 config whose Earth pole is the z axis: the Moon body with Earth constants would not do, so use inertial J2 with the tracker's own pole. */
  private static ProperTimeTracker feed(double[][] truth, int stride, ModelConfig cfg, double[] offsets) {
    final ProperTimeTracker tracker = new ProperTimeTracker(cfg);
    final OrbitSample s = new OrbitSample();
    final SplitTime now = new SplitTime();
    for (int k = 0; k < truth.length; k += stride) {
      // J2000: the pole of the GCRS-to-ITRS matrix is within 0.01 deg of z
      assertEquals(Status.OK, now.set(0, k));
      final double[] x = truth[k];
      s.set(now, OrbitSample.FRAME_INERTIAL, x[0], x[1], x[2], x[3], x[4], x[5], true);
      final int st = tracker.step(now, s);
      assertTrue(Status.isUsable(st), Status.name(st));
      if (offsets != null) {
        offsets[k / stride] = tracker.secularOffsetS();
      }
    }
    return tracker;
  }

  @Test
  void j2PeriodicTermMatchesKouba() {
    // Kouba (2004) eq. 13: dt_J2 = -(3/2) J2 (R^2/(a c^2)) sqrt(GM/a) sin^2 i sin 2u (~0.07 ns, GPS).
    final double a = 2.656175e7;
    final double inc = Math.toRadians(55);
    final double[][] truth = j2Truth(a, inc, 43_200);
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.J2).tides(false).build();
    final int stride = 30;
    final double[] sec = new double[truth.length / stride + 1];
    feed(truth, stride, cfg, sec);
    // Fit S(t) = c0 + c1 t + A sin 2u + B cos 2u, u = n t (circular start at the node).
    final double n = Math.sqrt(GM / (a * a * a));
    final int m = truth.length / stride + (truth.length % stride == 0 ? 0 : 1);
    final double[][] ata = new double[4][4];
    final double[] atb = new double[4];
    for (int k = 0; k < m; k++) {
      final double t = k * stride;
      final double[] row = {1, t / 1e4, Math.sin(2 * n * t), Math.cos(2 * n * t)};
      for (int i = 0; i < 4; i++) {
        atb[i] += row[i] * sec[k];
        for (int j = 0; j < 4; j++) {
          ata[i][j] += row[i] * row[j];
        }
      }
    }
    final double[] coef = solve(ata, atb);
    // Expected amplitude written out here from Kouba (2004), "Improved relativistic transformations in
    // GPS", GPS Solutions 8: -(3/2) J2 (R^2 / (a c^2)) sqrt(GM/a) sin^2 i (the sin 2u coefficient), not
    // the code's ClosedForms; the formula itself agrees with a Hipparchus DP853 integration to 2.1e-5
    // (ClosedFormsAgainstIntegrationTest, verification module).
    final double re = CentralBody.EARTH.referenceRadiusM();
    final double kouba = -1.5 * CentralBody.EARTH.j2() * re * re / (a * C2) * Math.sqrt(GM / a)
        * Math.sin(inc) * Math.sin(inc);
    System.out.printf("J2 periodic amplitude: integrated %.4e s, Kouba %.4e s (cos part %.1e)%n",
        coef[2], kouba, coef[3]);
    final double rel = Math.abs(coef[2] / kouba - 1);
    // Bound about 9x the 9.7e-5 measured (was 5 %).
    System.out.printf("evidence: model.kouba_j2_rel_error = %.3e bound %.1e%n", rel, 9e-4);
    assertTrue(rel < 9e-4, "tracker's J2 amplitude against Kouba: " + rel);
  }

  @Test
  void secularRateWithJ2MatchesFirstOrderFormula() {
    final double a = 7.0e6;
    final double inc = Math.toRadians(50);
    final int orbits = (int) Math.round(3 * 2 * Math.PI / Math.sqrt(GM / (a * a * a)));
    final double[][] truth = j2Truth(a, inc, orbits);
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.J2).tides(false).build();
    final ProperTimeTracker tracker = feed(truth, 1, cfg, null);
    double meanR = 0;
    for (double[] x : truth) {
      meanR += Math.sqrt(x[0] * x[0] + x[1] * x[1] + x[2] * x[2]);
    }
    meanR /= truth.length;
    final double span = truth.length - 1;
    // The secular part (integral of g) over three whole orbits: the -2 r.v/c^2 part averages out.
    final double meanY = tracker.secularOffsetS() / span;
    final double formula = ClosedForms.secularRate(CentralBody.EARTH, meanR, inc, true);
    final double pointMass = ClosedForms.secularRate(CentralBody.EARTH, meanR, inc, false);
    System.out.printf("LEO J2 mean rate: integrated %.6e, formula %.6e, J2 part %.3e%n", meanY, formula, formula - pointMass);
    // The J2 part is ~8e-14 here; require the first-order formula to hold to 10 % of it. The residual
    // also contains the non-averaged periodic part of -2 r.v/c^2 over a non-integer number of orbits.
    assertEquals(formula, meanY, 0.1 * Math.abs(formula - pointMass)); // measured: 5 % of the J2 part
  }

  @Test
  void tenSecondStepsMatchOneSecondStepsOnLeoJ2Orbit() {
    final double a = 6.9e6;
    final double[][] truth = j2Truth(a, Math.toRadians(97), 6_000);
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.J2).tides(false).build();
    final ProperTimeTracker fine = feed(truth, 1, cfg, null);
    final ProperTimeTracker coarse = feed(truth, 10, cfg, null);
    final double diff = Math.abs(fine.offsetS() - coarse.offsetS());
    System.out.printf("LEO J2, 10 s vs 1 s steps over 6000 s: %.2e s%n", diff);
    // Third-order rule at 10 s steps in LEO: below 1e-15 s per 6000 s (0.015 ps per day).
    assertTrue(diff < 1e-15, "diff " + diff);
  }

  private static double[] solve(double[][] a, double[] b) {
    final int n = b.length;
    for (int p = 0; p < n; p++) {
      for (int i = p + 1; i < n; i++) {
        final double f = a[i][p] / a[p][p];
        b[i] -= f * b[p];
        for (int j = p; j < n; j++) {
          a[i][j] -= f * a[p][j];
        }
      }
    }
    final double[] x = new double[n];
    for (int i = n - 1; i >= 0; i--) {
      double s = b[i];
      for (int j = i + 1; j < n; j++) {
        s -= a[i][j] * x[j];
      }
      x[i] = s / a[i][i];
    }
    return x;
  }
}
