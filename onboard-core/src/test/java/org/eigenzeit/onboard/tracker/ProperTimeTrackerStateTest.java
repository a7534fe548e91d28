package org.eigenzeit.onboard.tracker;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.KeplerOrbit;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** The composed tracker's restart state: its size, its round trip, and refusals across components. */
class ProperTimeTrackerStateTest {
  private static final ModelConfig CONFIG = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(4).tides(true)
      .energyToleranceRel(2e-3).build();

  private static ProperTimeTracker driven() {
    final ProperTimeTracker t = new ProperTimeTracker(CONFIG);
    final KeplerOrbit orbit = new KeplerOrbit(CentralBody.EARTH.gmM3PerS2(), 7.0e6, 0.001, 0.9, 0.1, 0.2, 0.3);
    final OrbitSample s = new OrbitSample();
    final double[] r = new double[3];
    final double[] v = new double[3];
    for (int k = 0; k < 50; k++) {
      final SplitTime now = SplitTime.of(850_000_000L + k, 0.0);
      orbit.state(k, r, v);
      s.set(now, OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
      assertEquals(k < 40 ? Status.OK : Status.DEGRADED_BRIDGED, t.step(now, k < 40 ? s : null));
    }
    return t;
  }

  @Test
  void stateSizeIsWhatItWritesAndRoundTrips() {
    final ProperTimeTracker a = driven();
    final byte[] saved = StateBytes.written(a::save);
    assertEquals(ProperTimeTracker.STATE_BYTES, saved.length);
    final ProperTimeTracker b = new ProperTimeTracker(CONFIG);
    assertEquals(Status.OK, b.restore(StateBytes.reader(saved)));
    assertArrayEquals(saved, StateBytes.written(b::save));
    assertEquals(a.offsetS(), b.offsetS(), 0.0);
  }

  @Test
  void refusesCountersBelowZeroAndAFirstNodeWithoutSolution() {
    final byte[] saved = StateBytes.written(driven()::save);
    final ProperTimeTracker b = new ProperTimeTracker(CONFIG);
    StateReader r = StateBytes.reader(StateBytes.withInt(saved, 4, -1));
    assertEquals(Status.OUT_OF_RANGE, b.restore(r), "a negative counter");
    r = StateBytes.reader(StateBytes.withInt(saved, 0, Status.COUNT));
    assertEquals(Status.OUT_OF_RANGE, b.restore(r), "an unknown verdict");
    final int bridgeAt = ProperTimeTracker.STATE_BYTES - org.eigenzeit.onboard.tracker.bridging.OutageBridge.STATE_BYTES;
    final byte[] notReady = StateBytes.withInt(saved, bridgeAt, Status.NOT_READY);
    assertEquals(Status.OUT_OF_RANGE, b.restore(StateBytes.reader(notReady)), "a state but NOT_READY");
    final int integratorAt = 4 + 4 * Status.COUNT + org.eigenzeit.onboard.tracker.validation.SampleValidator.STATE_BYTES
        + org.eigenzeit.onboard.tracker.cadence.OrientationCache.STATE_BYTES;
    final byte[] uninitialised = StateBytes.withInt(saved, integratorAt, 0);
    r = StateBytes.reader(uninitialised);
    assertEquals(Status.OUT_OF_RANGE, b.restore(r), "a solution without a first node");
    assertEquals(integratorAt, r.failedAt(), "refused by the rule across the integrator and the bridge");
  }
}
