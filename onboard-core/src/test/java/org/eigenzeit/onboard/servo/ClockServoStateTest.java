package org.eigenzeit.onboard.servo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** The composed servo's restart state: size, round trip, refusals. */
class ClockServoStateTest {
  @Test
  void stateSizeIsWhatItWritesAndRoundTrips() {
    final ClockServo a = new ClockServo(Tables.active(ServoParameters.typicalRubidium()));
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    for (int k = 0; k < 100; k++) {
      final SplitTime t = SplitTime.of(2_000_000L + k, 0.0);
      m.set(t, 0, 1e-7 + 1e-11 * k, true);
      assertEquals(Status.OK, a.cycle(t, 1.0, true, k % 5 == 0 ? m : null));
    }
    final byte[] saved = StateBytes.written(a::save);
    assertEquals(ClockServo.STATE_BYTES, saved.length);
    final ClockServo b = new ClockServo(Tables.active(ServoParameters.typicalRubidium()));
    assertEquals(Status.OK, b.restore(StateBytes.reader(saved)));
    assertArrayEquals(saved, StateBytes.written(b::save));
    assertEquals(Status.NOT_FINITE, b.restore(StateBytes.reader(StateBytes.withDouble(saved, saved.length - 8,
        Double.NaN))), "a NaN pending phase");
    assertEquals(Status.OUT_OF_RANGE, b.restore(StateBytes.reader(StateBytes.withDouble(saved, saved.length - 16,
        -1.0))), "a negative time since the last measurement");
  }
}
