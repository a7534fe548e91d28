package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.tracker.ProperTimeTracker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** The rate model against published values: Ashby (2003), Pound and Rebka (1960), IERS W0. */
class RateModelTest {
  private static final double DAY = 86_400.0;
  static final SplitTime EPOCH = SplitTime.of(845_000_000L, 0.0); // 2026-10-11 TT

  /** WGS 84 geodetic to Earth-fixed (NIMA TR8350.2, eq. 4-14). */
  static double[] geodeticToEcef(double latDeg, double lonDeg, double hM) {
    final double a = 6378137.0;
    final double f = 1 / 298.257223563;
    final double e2 = f * (2 - f);
    final double lat = Math.toRadians(latDeg);
    final double lon = Math.toRadians(lonDeg);
    final double n = a / Math.sqrt(1 - e2 * Math.sin(lat) * Math.sin(lat));
    return new double[] {(n + hM) * Math.cos(lat) * Math.cos(lon), (n + hM) * Math.cos(lat) * Math.sin(lon),
        (n * (1 - e2) + hM) * Math.sin(lat)};
  }

  static double rateAt(ModelConfig cfg, int frame, double[] r, double[] v, RateComponents out) {
    final ProperTimeTracker t = new ProperTimeTracker(cfg);
    final OrbitSample s = new OrbitSample();
    s.set(EPOCH, frame, r[0], r[1], r[2], v[0], v[1], v[2], true);
    assertEquals(Status.OK, t.step(EPOCH, s));
    if (out != null) {
      t.rate(out);
    }
    return t.fractionalFrequency();
  }

  @Test
  void ashbySplitOfTheGpsRate() {
    // Ashby (2003) Living Rev. Relativ. 6:1: gravitational +45.7 us/day, velocity -7.2 us/day,
    // net +38.6 us/day for a = 26561.75 km.
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(false).build();
    final double a = 2.656175e7;
    final double v = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / a);
    final RateComponents c = new RateComponents();
    final double y = rateAt(cfg, OrbitSample.FRAME_INERTIAL, new double[] {a, 0, 0}, new double[] {0, v, 0}, c);
    // Published to 0.1 us/day with Ashby's own rounding of the constants: tolerance 0.1 us/day.
    assertEquals(45.7e-6, c.gravitational() * DAY, 0.1e-6);
    assertEquals(-7.2e-6, c.kinematic() * DAY, 0.1e-6);
    assertEquals(38.6e-6, y * DAY, 0.1e-6);
    final double worstAshby = Math.max(Math.abs(c.gravitational() * DAY - 45.7e-6),
        Math.max(Math.abs(c.kinematic() * DAY + 7.2e-6), Math.abs(y * DAY - 38.6e-6)));
    System.out.printf("evidence: model.ashby_split_us_per_day = %.4f%n", worstAshby * 1e6);
    assertEquals(y, c.kinematic() + c.gravitational() + c.harmonics() + c.tidal() + c.higherOrder(), 1e-25);
  }

  @Test
  void poundRebkaTowerShift() {
    // Pound and Rebka (1960) PRL 4:337: 22.5 m tower at Harvard, predicted gh/c^2 = 2.45e-15
    // (REFERENCE-VALUES). Clocks at rest on the rotating Earth, with the centrifugal potential.
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(8).tides(false).build();
    final double[] zero = {0, 0, 0};
    final double yBottom = rateAt(cfg, OrbitSample.FRAME_BODY_FIXED, geodeticToEcef(42.373, -71.118, 10.0), zero, null);
    final double yTop = rateAt(cfg, OrbitSample.FRAME_BODY_FIXED, geodeticToEcef(42.373, -71.118, 32.5), zero, null);
    assertEquals(2.45e-15, yTop - yBottom, 0.01e-15);
    System.out.printf("evidence: model.pound_rebka_rel_error = %.4f%n", Math.abs((yTop - yBottom) / 2.45e-15 - 1));
  }

  @Test
  void clocksOnTheGeoidKeepTt() {
    // IERS 2010: TT is the time of clocks on the geoid (W = W0). EGM96 geoid undulations stay
    // within about -107..+85 m of the WGS 84 ellipsoid (common practice), i.e. |y| < 1.2e-14.
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(36).tides(false).build();
    final double[] zero = {0, 0, 0};
    double worst = 0;
    for (double lat = -80; lat <= 80; lat += 20) {
      for (double lon = -180; lon < 180; lon += 30) {
        final double y = rateAt(cfg, OrbitSample.FRAME_BODY_FIXED, geodeticToEcef(lat, lon, 0.0), zero, null);
        worst = Math.max(worst, Math.abs(y));
      }
    }
    assertTrue(worst < 1.2e-14, "worst " + worst);
    assertTrue(worst > 1e-15, "undulations should show: " + worst);
  }

  @Test
  void earthFixedAndInertialInputsGiveTheSameRate() {
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(20).tides(true).build();
    final double[] rE = {-1.2e7, 1.9e7, 1.3e7};
    final double[] vE = {-1200.0, -1400.0, 2700.0};
    final org.eigenzeit.onboard.frames.EarthOrientation eo =
        new org.eigenzeit.onboard.frames.EarthOrientation(cfg.math(), CentralBody.EARTH.rotationRateRadPerS());
    final long hour = org.eigenzeit.onboard.tracker.cadence.OrientationCache.ORIENTATION_SLOT_S;
    eo.updateCelestial(Math.floorDiv(EPOCH.wholeSeconds(), hour) * (double) hour / (36525.0 * DAY));
    eo.updateRotation(EPOCH, -69.2);
    final double[] rI = new double[3];
    final double[] vI = new double[3];
    eo.positionToGcrs(rE, rI);
    eo.velocityToGcrs(rE, vE, vI);
    final double yE = rateAt(cfg, OrbitSample.FRAME_BODY_FIXED, rE, vE, null);
    final double yI = rateAt(cfg, OrbitSample.FRAME_INERTIAL, rI, vI, null);
    assertEquals(yE, yI, 1e-22);
  }

  @Test
  void c4TermsAreOfTheExpectedOrder() {
    // (GM/r)^2/c^4 scale: about 1e-19 at GPS altitude (common practice: c^-4 terms are ~1e-19).
    final double a = 2.656175e7;
    final double v = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / a);
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(false).c4(true).build();
    final RateComponents c = new RateComponents();
    rateAt(cfg, OrbitSample.FRAME_INERTIAL, new double[] {a, 0, 0}, new double[] {0, v, 0}, c);
    // For a circular orbit: U = v^2 = GM/a; a4 = (U^2/2 - 3U^2/2 - U^2/8)/c^4 = -9/8 U^2/c^4.
    final double u = CentralBody.EARTH.gmM3PerS2() / a;
    final double l = CentralBody.EARTH.scaleRateL();
    final double a2 = -1.5 * u / CentralBody.C2;
    final double expected = (-1.125 * u * u / (CentralBody.C2 * CentralBody.C2) + l * (a2 + l)) / (1 - l);
    assertEquals(expected, c.higherOrder(), 1e-30);
    assertTrue(Math.abs(c.higherOrder()) < 1e-18 && Math.abs(c.higherOrder()) > 1e-20);
  }

  @Test
  void tidalComponentAtGpsAltitude() {
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(true).build();
    final double a = 2.656175e7;
    final double v = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / a);
    final RateComponents c = new RateComponents();
    rateAt(cfg, OrbitSample.FRAME_INERTIAL, new double[] {0, a, 0}, new double[] {-v, 0, 0}, c);
    // Sum of Moon (~7e-16) and Sun (~3e-16) peak magnitudes bounds the term (REFERENCE-VALUES).
    assertTrue(Math.abs(c.tidal()) < 1.1e-15 && Math.abs(c.tidal()) > 1e-18, "tidal " + c.tidal());
  }
}
