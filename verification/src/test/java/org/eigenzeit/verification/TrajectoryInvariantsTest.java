package org.eigenzeit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ClosedForms;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/**
 * Invariants of the accumulated correction along whole trajectories (the rate-level invariants
 * are in {@link InvarianceAndSensitivityProperties}). Outside facts (Ashby 2003, IS-GPS-200
 * section 20.3.3.3.3.1, textbook relativity): on a circular orbit r.v = 0, so the periodic term
 * -2 r.v/c^2 vanishes and the offset grows at the constant rate of the closed form; the periodic
 * term is odd and the rate even under time reversal v -> -v; the proper time of a clock does not
 * depend on the frame its orbit is expressed in.
 */
class TrajectoryInvariantsTest {
  /**
   * 10x the measured worst Earth-fixed against inertial offset difference over the day (5.9e-15 s):
   * the core's frame model differs from SOFA by up to 0.03 arcsec (truncated nutation), which at
   * 7000 km moves the harmonic potential by about 3 GM J2 R^2/r^3 delta = 0.02 m^2/s^2, 2e-19 in y.
   */
  private static final double FRAME_BOUND_S = 6e-14;
  private static final long T0 = 845_000_000L; // 2026-10 in seconds of TT since J2000
  private static final double DAY = 86_400.0;
  private static final double UT1_MINUS_TT = -69.2;

  /** A circle of radius a, inclination inc, at time t: fills r and v (inertial). */
  private static void circle(CentralBody body, double a, double inc, double t, double[] r, double[] v) {
    final double n = Math.sqrt(body.gmM3PerS2() / (a * a * a));
    final double u = n * t;
    final double c = Math.cos(u);
    final double s = Math.sin(u);
    r[0] = a * c;
    r[1] = a * s * Math.cos(inc);
    r[2] = a * s * Math.sin(inc);
    v[0] = -a * n * s;
    v[1] = a * n * c * Math.cos(inc);
    v[2] = a * n * c * Math.sin(inc);
  }

  private static ProperTimeTracker tracker(ModelLevel level, boolean tides) {
    return new ProperTimeTracker(ModelConfig.builder().body(CentralBody.EARTH).level(level).degree(8).tides(tides)
        .ut1MinusTtS(UT1_MINUS_TT).energyToleranceRel(2e-3).build());
  }

  private static void feed(ProperTimeTracker tk, double t, int frame, double[] r, double[] v, OrbitSample s) {
    final SplitTime epoch = SplitTime.of(T0 + (long) t, 0.0);
    s.set(epoch, frame, r[0], r[1], r[2], v[0], v[1], v[2], true);
    final int verdict = tk.step(epoch, s);
    assertTrue(Status.isUsable(verdict), () -> "sample refused at t=" + t + ": " + Status.name(verdict));
  }

  @Test
  void circularEquatorialOrbitWithoutHarmonicsHasNoPeriodicTerm() {
    double worstPeriodic = 0;
    double worstSecular = 0;
    final double[] r = new double[3];
    final double[] v = new double[3];
    final OrbitSample s = new OrbitSample();
    for (double aKm : new double[] {6878.137, 26_561.75, 42_164.17}) {
      final ProperTimeTracker tk = tracker(ModelLevel.POINT_MASS, false);
      final double a = aKm * 1e3;
      for (double t = 0; t <= DAY; t += 10) {
        circle(CentralBody.EARTH, a, 0.0, t, r, v);
        feed(tk, t, OrbitSample.FRAME_INERTIAL, r, v, s);
        worstPeriodic = Math.max(worstPeriodic, Math.abs(tk.periodicOffsetS()));
      }
      // Closed form derived here, not the code's ClosedForms: on a Kepler circle U = GM/a, v^2 = GM/a,
      // so dtau/dTT - 1 = L_G - (U + v^2/2)/c^2 = L_G - 3GM/(2a c^2) (Ashby 2003, Living Rev. Relativ. 6,
      // sec. 5); L_G = 6.969290134e-10, the defining constant (IAU 2000 Resolution B1.9; W0 = L_G c^2),
      // c = 299 792 458 m/s (SI).
      final double c2 = 299_792_458.0 * 299_792_458.0;
      final double expected = (6.969290134e-10 - 1.5 * CentralBody.EARTH.gmM3PerS2() / (a * c2)) * DAY;
      worstSecular = Math.max(worstSecular, Math.abs(tk.secularOffsetS() - expected));
    }
    System.out.printf("circular equatorial, point mass, 1 day: worst periodic term %.2e s, secular vs closed form %.2e s%n",
        worstPeriodic, worstSecular);
    System.out.printf("evidence: invariants.circular.periodic_s = %.3e bound 5.1e-21%n", worstPeriodic);
    System.out.printf("evidence: invariants.circular.secular_vs_closed_form_s = %.3e bound 1.7e-19%n", worstSecular);
    // A 1e-3 eccentricity at GPS altitude would give a periodic term of about 2.3e-9 s. Bounds: 10x
    // the measured 5.1e-22 s and 1.7e-20 s (requirement EZ-INV-01: 1e-18 s).
    assertTrue(worstPeriodic < 5.1e-21, "periodic term on a circle: " + worstPeriodic);
    assertTrue(worstSecular < 1.7e-19, "secular offset against the closed form: " + worstSecular);
  }

  @Test
  void periodicTermIsOddAndRateEvenUnderTimeReversal() {
    // Prograde and retrograde equatorial circles are each other's time reversal (r kept, v -> -v):
    // with point mass and J2 (axially symmetric) the accumulated offsets must agree.
    final double[] r = new double[3];
    final double[] v = new double[3];
    final double[] vBack = new double[3];
    final OrbitSample s = new OrbitSample();
    final ProperTimeTracker fwd = tracker(ModelLevel.J2, false);
    final ProperTimeTracker back = tracker(ModelLevel.J2, false);
    for (double t = 0; t <= DAY; t += 10) {
      circle(CentralBody.EARTH, 7.1e6, 0.0, t, r, v);
      feed(fwd, t, OrbitSample.FRAME_INERTIAL, r, v, s);
      // the reversed motion passes the same point at -t; here: mirrored circle, same radius
      circle(CentralBody.EARTH, 7.1e6, Math.PI, t, r, vBack);
      feed(back, t, OrbitSample.FRAME_INERTIAL, r, vBack, s);
    }
    final double offsetDiff = Math.abs(fwd.offsetS() - back.offsetS());
    double worstOdd = 0;
    final SplittableRandom rnd = new SplittableRandom(4242);
    for (int k = 0; k < 10_000; k++) {
      final double[] rr = {rnd.nextDouble(-4e7, 4e7), rnd.nextDouble(-4e7, 4e7), rnd.nextDouble(-4e7, 4e7)};
      final double[] vv = {rnd.nextDouble(-8e3, 8e3), rnd.nextDouble(-8e3, 8e3), rnd.nextDouble(-8e3, 8e3)};
      final double[] vr = {-vv[0], -vv[1], -vv[2]};
      final double p = ClosedForms.eccentricityTermFromStateS(rr, vv);
      worstOdd = Math.max(worstOdd, Math.abs(p + ClosedForms.eccentricityTermFromStateS(rr, vr)));
      assertTrue(Math.abs(p) > 0 || rr[0] * vv[0] + rr[1] * vv[1] + rr[2] * vv[2] == 0);
    }
    System.out.printf("time reversal: prograde vs retrograde J2 offset after 1 day %.2e s; periodic term odd within %.1e s%n",
        offsetDiff, worstOdd);
    System.out.printf("evidence: invariants.time_reversal_s = %.3e bound 9.2e-17%n", offsetDiff);
    // 10x the measured 9.2e-18 s (requirement EZ-INV-02: 1e-15 s).
    assertTrue(offsetDiff < 9.2e-17, "prograde and retrograde offsets differ by " + offsetDiff);
    assertEquals(0.0, worstOdd, 0.0);
  }

  /** Earth rotation rate from the ERA's rate, 2 pi 1.00273781191135448 / 86400 rad/s (IERS 2010 eq. 5.15). */
  private static final double OMEGA_ERA = 2 * Math.PI * 1.00273781191135448 / DAY;

  /**
   * GCRS to ITRS with IAU SOFA (jsofa c2t06a, IAU 2006/2000A, no polar motion): r_b = M r,
   * v_b = M v - omega x r_b. Independent of the core's EarthOrientation, which the tracker uses
   * internally, so a fault in the core's frame transform cannot cancel out of the comparison.
   */
  private static void sofaToItrs(long wholeTt, double[] r, double[] v, double[] rb, double[] vb) {
    final double days = (wholeTt) / DAY;
    final double[][] m = JSOFA.jauC2t06a(2451545.0, days, 2451545.0, days + UT1_MINUS_TT / DAY, 0.0, 0.0);
    for (int i = 0; i < 3; i++) {
      rb[i] = m[i][0] * r[0] + m[i][1] * r[1] + m[i][2] * r[2];
      vb[i] = m[i][0] * v[0] + m[i][1] * v[1] + m[i][2] * v[2];
    }
    vb[0] += OMEGA_ERA * rb[1];
    vb[1] -= OMEGA_ERA * rb[0];
  }

  @Test
  void earthFixedAndInertialInputsGiveTheSameOffset() {
    // Full model (degree 8, tides): the same orbit fed once inertial and once Earth-fixed, the
    // Earth-fixed states made with SOFA's matrices (outside the project); the tracker converts the
    // Earth-fixed input with its own model, so the offsets agree only if that conversion is right.
    final ProperTimeTracker inertial = tracker(ModelLevel.HARMONICS, true);
    final ProperTimeTracker fixed = tracker(ModelLevel.HARMONICS, true);
    final double[] r = new double[3];
    final double[] v = new double[3];
    final double[] rb = new double[3];
    final double[] vb = new double[3];
    final OrbitSample s = new OrbitSample();
    double worst = 0;
    for (double t = 0; t <= DAY; t += 10) {
      circle(CentralBody.EARTH, 7.0e6, Math.toRadians(51.6), t, r, v);
      feed(inertial, t, OrbitSample.FRAME_INERTIAL, r, v, s);
      sofaToItrs(T0 + (long) t, r, v, rb, vb);
      feed(fixed, t, OrbitSample.FRAME_BODY_FIXED, rb, vb, s);
      worst = Math.max(worst, Math.abs(inertial.offsetS() - fixed.offsetS()));
    }
    System.out.printf("Earth-fixed vs inertial input, degree 8 + tides, 1 day: worst offset difference %.2e s%n", worst);
    System.out.printf("evidence: invariants.frame_s = %.3e bound %.1e%n", worst, FRAME_BOUND_S);
    // Omitting the rotation term w x r would move the result by microseconds per day.
    assertTrue(worst < FRAME_BOUND_S, "frame dependence " + worst);
  }
}
