package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.tracker.ProperTimeTracker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** Input validation, bridging and refusal of the tracker: every fault flagged and counted. */
class TrackerFaultTest {
  private static final double GM = CentralBody.EARTH.gmM3PerS2();
  private final KeplerOrbit orbit = new KeplerOrbit(GM, 7.0e6, 0.001, 0.9, 0.1, 0.2, 0.3);
  private final double[] r = new double[3];
  private final double[] v = new double[3];
  private final SplitTime now = new SplitTime();
  private final OrbitSample s = new OrbitSample();
  private ProperTimeTracker tracker;

  @BeforeEach
  void start() {
    tracker = new ProperTimeTracker(ModelConfig.builder().level(ModelLevel.J2).tides(true)
        .energyToleranceRel(2e-3).bridgeLimitS(600).build());
    assertEquals(Status.NOT_READY, tracker.step(at(0), null));
    assertEquals(Status.OK, tracker.step(at(0), good(0)));
  }

  private SplitTime at(double t) {
    now.setTo(RateModelTest.EPOCH);
    assertEquals(Status.OK, now.addSeconds(t));
    return now;
  }

  private OrbitSample good(double t) {
    orbit.state(t, r, v);
    s.set(at(t), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
    return s;
  }

  @Test
  void hugeFiniteComponentsAreOutOfRangeNotNonFinite() {
    // r.r overflows to infinity although every component is finite: the verdict must name the
    // radius, not a non-finite input (the finiteness test runs on the sum first).
    good(1);
    s.set(at(2), OrbitSample.FRAME_INERTIAL, 1e200, 1e200, 0, v[0], v[1], v[2], true);
    assertEquals(Status.RADIUS_OUT_OF_RANGE, tracker.step(at(2), s));
    s.set(at(2), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], 1e200, v[1], v[2], true);
    assertEquals(Status.SPEED_OUT_OF_RANGE, tracker.step(at(2), s));
    s.set(at(2), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], Double.NaN, true);
    assertEquals(Status.NOT_FINITE, tracker.step(at(2), s));
  }

  @Test
  void everyFaultIsFlaggedCountedAndLeavesStateUsable() {
    double t = 1;
    good(t);
    s.set(at(t), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], false);
    assertEquals(Status.INVALID_INPUT, tracker.step(at(t), s));
    good(++t);
    s.set(at(t), OrbitSample.FRAME_INERTIAL, Double.NaN, r[1], r[2], v[0], v[1], v[2], true);
    assertEquals(Status.NOT_FINITE, tracker.step(at(t), s));
    good(++t);
    s.set(at(t), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], Double.POSITIVE_INFINITY, v[2], true);
    assertEquals(Status.NOT_FINITE, tracker.step(at(t), s));
    good(++t);
    s.set(at(t), OrbitSample.FRAME_INERTIAL, 1e3, 0, 0, v[0], v[1], v[2], true);
    assertEquals(Status.RADIUS_OUT_OF_RANGE, tracker.step(at(t), s));
    good(++t);
    s.set(at(t), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], 3 * v[0], 3 * v[1], 3 * v[2], true);
    assertEquals(Status.SPEED_OUT_OF_RANGE, tracker.step(at(t), s));
    good(++t);
    s.set(at(t), OrbitSample.FRAME_INERTIAL, r[0] * 1.01, r[1] * 1.01, r[2] * 1.01, v[0], v[1], v[2], true);
    assertEquals(Status.ENERGY_INCONSISTENT, tracker.step(at(t), s));
    good(++t);
    s.set(at(t), 7, r[0], r[1], r[2], v[0], v[1], v[2], true);
    assertEquals(Status.OUT_OF_RANGE, tracker.step(at(t), s));
    // A sample from the future, and one too old.
    good(t + 50);
    assertEquals(Status.EPOCH_JUMP, tracker.step(at(++t), s));
    good(t - 100);
    assertEquals(Status.STALE, tracker.step(at(t), s));
    // A good sample, then one that does not advance.
    assertEquals(Status.OK, tracker.step(at(++t), good(t)));
    assertEquals(Status.EPOCH_NOT_INCREASING, tracker.step(at(t), good(t)));
    for (int code : new int[] {Status.INVALID_INPUT, Status.RADIUS_OUT_OF_RANGE, Status.SPEED_OUT_OF_RANGE,
        Status.ENERGY_INCONSISTENT, Status.OUT_OF_RANGE, Status.EPOCH_JUMP, Status.STALE,
        Status.EPOCH_NOT_INCREASING}) {
      assertEquals(1, tracker.count(code), Status.name(code));
    }
    assertEquals(2, tracker.count(Status.NOT_FINITE));
    assertEquals(2, tracker.count(Status.OK));
    assertEquals(0, tracker.count(-1));
    assertEquals(Status.EPOCH_NOT_INCREASING, tracker.lastSampleStatus());
    assertTrue(Double.isFinite(tracker.offsetS()) && Double.isFinite(tracker.fractionalFrequency()));
  }

  @Test
  void bridgesOutageWithGrowingBoundThenRefusesAndReacquires() {
    for (int t = 1; t <= 100; t++) {
      assertEquals(Status.OK, tracker.step(at(t), good(t)));
    }
    // Truth for the outage: the same state at t = 100 propagated with J2 about the same pole at a
    // 1 s step (a 10x finer step than the bridge), fed as samples to a second tracker.
    final ProperTimeTracker truth = new ProperTimeTracker(ModelConfig.builder().level(ModelLevel.J2).tides(true)
        .energyToleranceRel(2e-3).build());
    for (int t = 0; t <= 100; t++) {
      assertEquals(Status.OK, truth.step(at(t), good(t)));
    }
    final org.eigenzeit.onboard.frames.EarthOrientation eo = new org.eigenzeit.onboard.frames.EarthOrientation(
        org.eigenzeit.onboard.math.MathMode.FAST, CentralBody.EARTH.rotationRateRadPerS());
    eo.update(at(100), -69.2);
    final double[] pole = new double[3];
    eo.poleInGcrs(pole);
    final OrbitBridge fine = new OrbitBridge(GM, CentralBody.EARTH.referenceRadiusM(), CentralBody.EARTH.j2());
    fine.setPole(pole);
    orbit.state(100, r, v);
    for (int t = 101; t <= 400; t++) {
      fine.propagate(r, v, 1.0, 1.0);
      s.set(at(t), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
      assertEquals(Status.OK, truth.step(at(t), s));
    }
    double lastBound = 0;
    for (int t = 101; t <= 400; t++) {
      assertEquals(Status.DEGRADED_BRIDGED, tracker.step(at(t), null));
      assertTrue(tracker.rateErrorBound() > lastBound);
      lastBound = tracker.rateErrorBound();
    }
    assertEquals(300, tracker.bridgedForS(), 1e-9);
    // Same dynamics, different step: pinned at about 8x the 1.3e-18 s measured (docs/algorithms.md).
    final double bridgeError = Math.abs(truth.offsetS() - tracker.offsetS());
    System.out.printf("evidence: model.bridge_offset_300s_s = %.3e bound %.1e%n", bridgeError, 1e-17);
    assertTrue(bridgeError <= 1e-17, "bridge vs fine J2 after 300 s: " + bridgeError);
    for (int t = 401; t <= 701; t++) {
      assertEquals(t <= 700 ? Status.DEGRADED_BRIDGED : Status.STALE, tracker.step(at(t), null), "t " + t);
    }
    assertEquals(Status.STALE, tracker.solutionStatus());
    final double frozen = tracker.offsetS();
    assertEquals(Status.STALE, tracker.step(at(710), null));
    assertEquals(frozen, tracker.offsetS(), 0.0);
    // Re-acquisition after STALE: a plausible sample is held, the next one confirms it and is taken.
    assertEquals(Status.REACQUIRING, tracker.step(at(719), good(719)));
    assertEquals(Status.STALE, tracker.solutionStatus(), "a held sample is not taken");
    assertEquals(frozen, tracker.offsetS(), 0.0);
    assertEquals(Status.LONG_STEP, tracker.step(at(720), good(720)));
    assertEquals(Status.OK, tracker.solutionStatus());
    assertEquals(0.0, tracker.rateErrorBound(), 0.0);
    final SplitTime node = new SplitTime();
    tracker.nodeTime(node);
    assertEquals(720.0, node.secondsSince(RateModelTest.EPOCH), 1e-9);
    assertEquals(tracker.offsetS() + 10 * tracker.fractionalFrequency(), tracker.offsetAtS(at(730)), 1e-18);
  }

  @Test
  void bodyFixedInputIsRefusedForTheMoonAndHarmonicsNeedTheEarth() {
    final ProperTimeTracker moon = new ProperTimeTracker(ModelConfig.builder().body(CentralBody.MOON)
        .level(ModelLevel.J2).build());
    s.set(at(0), OrbitSample.FRAME_BODY_FIXED, 1.9e6, 0, 0, 0, 1600, 0, true);
    assertEquals(Status.OUT_OF_RANGE, moon.step(at(0), s));
    s.set(at(0), OrbitSample.FRAME_INERTIAL, 1.9e6, 0, 0, 0, 1600, 0, true);
    assertEquals(Status.OK, moon.step(at(0), s));
    assertThrows(IllegalArgumentException.class,
        () -> ModelConfig.builder().body(CentralBody.MOON).level(ModelLevel.HARMONICS).build());
    assertThrows(IllegalArgumentException.class, () -> ModelConfig.builder().bridgeStepS(0).build());
    assertThrows(IllegalArgumentException.class, () -> ModelConfig.builder().degree(40).build());
    assertFalse(Status.isFault(Status.OK));
    assertTrue(Status.isFault(Status.STALE));
  }

  @Test
  void lunarOrbiterRateHasTheExpectedSizeAndSign() {
    // Lunar orbit at 100 km: the point-mass rate -(3/2) GM_M/a/c^2 + L_L (about -1.31e-11); lunar J2
    // and the Earth's tide add about 3e-15 at this altitude.
    final double a = 1.838e6;
    final double vc = Math.sqrt(CentralBody.MOON.gmM3PerS2() / a);
    final ProperTimeTracker moon = new ProperTimeTracker(ModelConfig.builder().body(CentralBody.MOON)
        .level(ModelLevel.J2).tides(true).build());
    s.set(at(0), OrbitSample.FRAME_INERTIAL, a, 0, 0, 0, vc, 0, true);
    assertEquals(Status.OK, moon.step(at(0), s));
    final double expected = ClosedForms.secularRate(CentralBody.MOON, a, 0, false);
    assertEquals(expected, moon.fractionalFrequency(), 5e-15);
    assertTrue(CentralBody.MOON.scaleRateL() > 3.1e-11 && CentralBody.MOON.scaleRateL() < 3.2e-11);
  }

  @Test
  void bridgeWithoutJ2FollowsKeplerBothWaysAndAZeroSpanChangesNothing() {
    // Outside check: with J2 = 0 the bridge integrates the two-body problem, whose solution the
    // test's KeplerOrbit gives in closed form (Kepler's equation); OrbitBridge's Javadoc claims an
    // RK4 error below 1 mm per hour at its nominal steps.
    final KeplerOrbit kepler = new KeplerOrbit(GM, 7.0e6, 0.01, 0.9, 0.1, 0.2, 0.3);
    final OrbitBridge bridge = new OrbitBridge(GM, CentralBody.EARTH.referenceRadiusM(), 0.0);
    bridge.setPole(new double[] {0, 0, 1});
    final double[] r = new double[3];
    final double[] v = new double[3];
    final double[] rRef = new double[3];
    final double[] vRef = new double[3];
    kepler.state(0, r, v);
    final double[] r0 = r.clone();
    final double[] v0 = v.clone();
    assertEquals(0, bridge.propagate(r, v, 0.0, 1.0), "a zero span takes no step");
    assertTrue(java.util.Arrays.equals(r0, r) && java.util.Arrays.equals(v0, v), "and leaves the state as it was");
    assertEquals(100, bridge.propagate(r, v, 100.0, 1.0));
    kepler.state(100, rRef, vRef);
    assertTrue(distance(r, rRef) < 1e-3, "forward: " + distance(r, rRef) + " m");
    assertEquals(100, bridge.propagate(r, v, -100.0, 1.0), "a negative span steps back");
    assertTrue(distance(r, r0) < 1e-3, "back to the start: " + distance(r, r0) + " m");
  }

  private static double distance(double[] a, double[] b) {
    return Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1]) + (a[2] - b[2]) * (a[2] - b[2]));
  }
}
