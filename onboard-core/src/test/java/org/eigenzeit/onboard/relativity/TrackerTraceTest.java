package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.tracker.ProperTimeTracker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The model tracker is pinned bit for bit, step by step, on every body, level and input frame,
 * through rejected samples of every kind, irregular steps, hour boundaries (precession-nutation
 * refresh) and bridged outages. Recorded from the code before the component split (commit
 * 733baa3 plus this test); it pins that the split keeps the arithmetic identical (determinism,
 * not physics). STRICT math.
 */
class TrackerTraceTest {
  /** CRC-32C of the trace of each scenario (status, offset, rate, error bound, solution status). */
  static final long[] GOLDEN = {0x5681E354L, 0xB58A7835L, 0x9603FA44L, 0xE1869A93L};
  /**
   * Scenario 4: an outage past the bridging limit (STALE), then re-acquisition. Changed on purpose
   * once, when re-acquisition after STALE became a two-sample confirmation (docs/algorithms.md
   * section 3): the first plausible sample is held, the next one that agrees with it is taken, so
   * the first node after the outage is one sample later (was 0xE6C6CBEFL).
   */
  static final long GOLDEN_STALE = 0x32C71503L;

  private static final MathMode M = MathMode.STRICT;

  static long trace(int which) {
    final ModelConfig cfg;
    final KeplerOrbit orbit;
    final double gmE = CentralBody.EARTH.gmM3PerS2();
    switch (which) {
      case 0 -> {
        cfg = ModelConfig.builder().math(M).level(ModelLevel.HARMONICS).degree(8).tides(true)
            .energyToleranceRel(2e-3).build();
        orbit = new KeplerOrbit(gmE, 6.93e6, 0.0012, Math.toRadians(97.6), 0.3, 1.2, 0.0);
      }
      case 1 -> {
        cfg = ModelConfig.builder().math(M).level(ModelLevel.J2).tides(true).energyToleranceRel(2e-3).build();
        orbit = new KeplerOrbit(gmE, 2.656175e7, 0.01, Math.toRadians(55), 2.1, 0.4, 1.0);
      }
      case 2 -> {
        cfg = ModelConfig.builder().math(M).body(CentralBody.MOON).level(ModelLevel.J2).tides(true)
            .energyToleranceRel(2e-3).build();
        orbit = new KeplerOrbit(CentralBody.MOON.gmM3PerS2(), 1.838e6, 0.01, Math.toRadians(90), 0.2, 0.1, 0.5);
      }
      case 4 -> {
        cfg = ModelConfig.builder().math(M).level(ModelLevel.J2).tides(false).energyToleranceRel(2e-3)
            .bridgeLimitS(600).build();
        orbit = new KeplerOrbit(gmE, 7.0e6, 0.001, 0.9, 0.1, 0.2, 0.3);
      }
      default -> {
        cfg = ModelConfig.builder().math(M).level(ModelLevel.POINT_MASS).tides(false).c4(true)
            .energyToleranceRel(2e-3).build();
        orbit = new KeplerOrbit(gmE, 4.2164e7, 0.0002, Math.toRadians(0.05), 0.0, 0.0, 3.0);
      }
    }
    final boolean bodyFixed = which == 0;
    final ProperTimeTracker tracker = new ProperTimeTracker(cfg);
    final EarthOrientation eo = new EarthOrientation(M, CentralBody.EARTH.rotationRateRadPerS());
    final OrbitSample s = new OrbitSample();
    final SplitTime now = new SplitTime();
    final SplitTime epoch = new SplitTime();
    final double[] r = new double[3];
    final double[] v = new double[3];
    final double[] rb = new double[3];
    final double[] vb = new double[3];
    final CRC32C crc = new CRC32C();
    final byte[] w = new byte[8];
    final long start = 845_003_000L; // 50 min after a whole hour of TT: the pass crosses two hours
    int t = 0;
    boolean wentStale = false;
    for (int k = 0; k < 3200; k++) {
      t += k % 41 == 0 ? 5 : k % 13 == 0 ? 2 : 1;
      assertEquals(Status.OK, now.set(start + t, 0.125));
      final boolean outage = (k >= 700 && k < 820) || (k >= 2000 && k < (which == 4 ? 3000 : 2150));
      int st;
      if (outage || k % 59 == 0) {
        st = tracker.step(now, null);
      } else {
        final double age = k % 67 == 0 ? 100.0 : k % 71 == 0 ? -20.0 : 0.0;
        assertEquals(Status.OK, epoch.set(start + t, 0.125 - age));
        orbit.state(t - age, r, v);
        if (k % 73 == 0) {
          r[0] *= 1.01;
        }
        if (k % 79 == 0) {
          v[1] = Double.NaN;
        }
        if (bodyFixed) {
          eo.update(epoch, -69.2);
          eo.positionToItrs(r, rb);
          eo.velocityToItrs(rb, v, vb);
          s.set(epoch, OrbitSample.FRAME_BODY_FIXED, rb[0], rb[1], rb[2], vb[0], vb[1], vb[2], k % 83 != 0);
        } else {
          s.set(epoch, OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], k % 83 != 0);
        }
        st = tracker.step(now, s);
      }
      put(crc, w, st);
      put(crc, w, Double.doubleToRawLongBits(tracker.offsetS()));
      put(crc, w, Double.doubleToRawLongBits(tracker.fractionalFrequency()));
      put(crc, w, Double.doubleToRawLongBits(tracker.rateErrorBound()));
      put(crc, w, Double.doubleToRawLongBits(tracker.offsetAtS(now, 0.5)));
      put(crc, w, tracker.solutionStatus());
      wentStale |= tracker.solutionStatus() == Status.STALE;
    }
    assertEquals(which == 4, wentStale, "only scenario 4 goes STALE");
    for (int code : new int[] {Status.OK, Status.NOT_FINITE, Status.ENERGY_INCONSISTENT,
        Status.EPOCH_JUMP, Status.STALE, Status.INVALID_INPUT}) {
      assertTrue(tracker.count(code) > 0, "scenario " + which + " offers " + Status.name(code));
    }
    assertEquals(Status.OK, tracker.solutionStatus());
    return crc.getValue();
  }

  private static void put(CRC32C crc, byte[] w, long v) {
    for (int i = 0; i < 8; i++) {
      w[i] = (byte) (v >>> (56 - 8 * i));
    }
    crc.update(w, 0, 8);
  }

  @Test
  void everyScenarioIsBitIdenticalToItsRecordedTrace() {
    final long[] got = new long[GOLDEN.length];
    for (int i = 0; i < GOLDEN.length; i++) {
      got[i] = trace(i);
      System.out.printf("tracker trace %d: 0x%08XL%n", i, got[i]);
    }
    final long stale = trace(4);
    System.out.printf("tracker trace 4: 0x%08XL%n", stale);
    for (int i = 0; i < GOLDEN.length; i++) {
      assertEquals(GOLDEN[i], got[i], "scenario " + i);
    }
    assertEquals(GOLDEN_STALE, stale, "scenario 4");
  }
}
