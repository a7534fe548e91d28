package org.eigenzeit.onboard.tracker.bridging;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** The bridge's status machine as docs/algorithms.md section 7 states it, and its restore checks. */
class OutageBridgeTest {
  private static final ModelConfig CONFIG = ModelConfig.builder().level(ModelLevel.J2).bridgeLimitS(600)
      .bridgeRateErrorPerS(5e-18).build();
  private static final double[] POLE = {0, 0, 1};
  private final OutageBridge bridge = new OutageBridge(CONFIG);
  private final SplitTime node = SplitTime.of(850_000_000L, 0);

  private void accept() {
    bridge.sampleAccepted(node, new double[] {7e6, 0, 0}, new double[] {0, 7546, 0}, new double[] {7e6, 0, 0});
  }

  @Test
  void stateSizeIsWhatItWrites() {
    assertEquals(OutageBridge.STATE_BYTES, StateBytes.written(bridge::save).length);
  }

  @Test
  void bridgesUntilTheLimitThenGoesStale() {
    assertEquals(Status.NOT_READY, bridge.solutionStatus());
    accept();
    assertEquals(Status.OK, bridge.solutionStatus());
    assertEquals(0.0, bridge.rateErrorBound(), 0.0);
    assertFalse(bridge.propagateTo(node, 0.0, POLE), "nothing to do at the node's own time");
    assertTrue(bridge.propagateTo(SplitTime.of(850_000_100L, 0), 100.0, POLE));
    assertEquals(Status.OK, bridge.solutionStatus(), "not degraded until the node is taken");
    bridge.bridged(new double[3]);
    assertEquals(Status.DEGRADED_BRIDGED, bridge.solutionStatus());
    assertEquals(5e-18 * 100, bridge.rateErrorBound(), 1e-30);
    assertTrue(bridge.positionM(1) > 7e5, "the state moved along the orbit: " + bridge.positionM(1));
    assertFalse(bridge.propagateTo(SplitTime.of(850_000_601L, 0), 501.0, POLE));
    assertEquals(Status.STALE, bridge.solutionStatus());
    assertEquals(601.0, bridge.bridgedForS(), 0.0);
  }

  @Test
  void aSpanOfMoreStepsThanAllowedGoesStale() {
    final OutageBridge longLimit = new OutageBridge(ModelConfig.builder().level(ModelLevel.J2).bridgeStepS(1)
        .bridgeLimitS(16_000).build());
    longLimit.sampleAccepted(node, new double[] {7e6, 0, 0}, new double[] {0, 7546, 0}, new double[3]);
    assertFalse(longLimit.propagateTo(SplitTime.of(850_002_000L, 0), 2000.0, POLE), "2000 steps of 1 s > 1024");
    assertEquals(Status.STALE, longLimit.solutionStatus());
  }

  @Test
  void restoreRefusesStatesThatCannotOccur() {
    accept();
    final byte[] good = StateBytes.written(bridge::save);
    final OutageBridge other = new OutageBridge(CONFIG);
    StateReader r = StateBytes.reader(good);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    assertArrayEquals(good, StateBytes.written(other::save));
    r = StateBytes.reader(StateBytes.withInt(good, 0, Status.LONG_STEP));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a solution status the bridge never has");
    r = StateBytes.reader(StateBytes.withInt(good, 0, Status.NOT_READY));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "NOT_READY with a state");
    final byte[] inside = StateBytes.withDouble(good, 28, 1e6);
    r = StateBytes.reader(inside);
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a radius far inside the body");
    r = StateBytes.reader(StateBytes.withDouble(good, 36, Double.NaN));
    other.restore(r);
    assertEquals(Status.NOT_FINITE, r.status());
    r = StateBytes.reader(StateBytes.withDouble(good, 28, 1e10));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a radius beyond 2 r_max");
    final OutageBridge empty = new OutageBridge(CONFIG);
    final byte[] zero = StateBytes.written(empty::save);
    r = StateBytes.reader(StateBytes.withDouble(zero, 36, 1.0));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "NOT_READY with a velocity");
    r = StateBytes.reader(StateBytes.written(empty::save));
    other.restore(r);
    assertEquals(Status.OK, r.status(), "the state before the first sample");
  }
}
