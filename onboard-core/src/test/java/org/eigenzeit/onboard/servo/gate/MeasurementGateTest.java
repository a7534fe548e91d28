package org.eigenzeit.onboard.servo.gate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.servo.Tables;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** The measurement gate: pure validation, the innovation gate and the phase-jump rule. */
class MeasurementGateTest {
  private final ServoParameters p = Tables.active(ServoParameters.typicalRubidium());
  private final MeasurementGate gate = new MeasurementGate();
  private final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
  private final SplitTime now = SplitTime.of(1_000_000L, 0.0);

  @Test
  void validationIsPureAndFirstFailureWins() {
    m.set(now, 0, 1e-7, true);
    assertEquals(Status.OK, gate.validate(m, now, p));
    gate.accepted();
    final byte[] before = StateBytes.written(gate::save);
    final SplitTime later = SplitTime.of(1_000_001L, 0.0);
    m.set(later, 0, Double.NaN, false);
    assertEquals(Status.INVALID_INPUT, gate.validate(m, later, p));
    m.set(later, 9, Double.NaN, true);
    assertEquals(Status.OUT_OF_RANGE, gate.validate(m, later, p));
    m.set(later, 0, Double.NaN, true);
    assertEquals(Status.NOT_FINITE, gate.validate(m, later, p));
    m.set(later, 0, 2.0, true);
    assertEquals(Status.OUT_OF_RANGE, gate.validate(m, later, p));
    m.set(SplitTime.of(1_000_003L, 0.0), 0, 1e-7, true);
    assertEquals(Status.EPOCH_JUMP, gate.validate(m, later, p));
    m.set(SplitTime.of(999_980L, 0.0), 0, 1e-7, true);
    assertEquals(Status.STALE, gate.validate(m, later, p));
    m.set(now, 0, 1e-7, true);
    assertEquals(Status.EPOCH_NOT_INCREASING, gate.validate(m, later, p));
    assertArrayEquals(before, StateBytes.written(gate::save), "validation changes no state");
  }

  @Test
  void consistentOutliersDeclareAPhaseJumpAndInconsistentOnesDoNot() {
    m.set(now, 0, 1e-7, true);
    assertEquals(Status.OK, gate.validate(m, now, p));
    assertEquals(Status.OK, gate.judge(5e-9, 6e-9, 3));
    assertEquals(Status.OUTLIER, gate.judge(1e-6, 6e-9, 3));
    assertEquals(Status.OUTLIER, gate.judge(-1e-6, 6e-9, 3), "disagrees with the last outlier: count restarts");
    assertEquals(Status.OUTLIER, gate.judge(-1.004e-6, 6e-9, 3));
    assertEquals(Status.PHASE_JUMP, gate.judge(-0.999e-6, 6e-9, 3), "three consistent outliers");
    assertEquals(1, gate.phaseJumps());
    assertEquals(Status.OUTLIER, gate.judge(-1e-6, 6e-9, 3), "the count starts again after a jump");
  }

  @Test
  void stateSizeIsWhatItWritesAndRestoreChecksCounts() {
    gate.record(Status.OUTLIER);
    final byte[] saved = StateBytes.written(gate::save);
    assertEquals(MeasurementGate.STATE_BYTES, saved.length);
    final MeasurementGate other = new MeasurementGate();
    StateReader r = StateBytes.reader(saved);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    assertEquals(1, other.count(Status.OUTLIER));
    r = StateBytes.reader(StateBytes.withInt(saved, 16, 7));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a flag word of 7");
    r = StateBytes.reader(StateBytes.withDouble(saved, 32, Double.NaN));
    other.restore(r);
    assertEquals(Status.NOT_FINITE, r.status());
  }
}
