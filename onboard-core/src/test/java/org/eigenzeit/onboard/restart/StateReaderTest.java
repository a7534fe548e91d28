package org.eigenzeit.onboard.restart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** The checked readers latch the first refusal; an overrun outranks it. */
class StateReaderTest {
  @Test
  void firstRefusalLatchesAndAnOverrunOutranksIt() {
    final byte[] b = StateBytes.written(w -> {
      w.putLong(3_000_000_000_000L);
      w.putDouble(0.5);
      w.putLong(5L);
      w.putDouble(-0.5);
      w.putInt(7);
    });
    StateReader r = StateBytes.reader(b);
    final SplitTime t = SplitTime.of(1, 0.25);
    t.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "whole seconds beyond 1e12");
    assertEquals(0, r.failedAt());
    assertEquals(SplitTime.of(1, 0.25), t, "a refused instant is left as it was");
    t.restore(r);
    assertEquals(0, r.failedAt(), "the first refusal stays");
    r = StateBytes.reader(java.util.Arrays.copyOfRange(b, 16, b.length));
    t.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a negative fraction");
    assertEquals(SplitTime.of(1, 0.25), t);
    assertEquals(7, r.getIntIn(0, 10));
    r.getLongIn(0, 1);
    assertEquals(Status.BUFFER_TOO_SMALL, r.status(), "an overrun outranks a value refusal");
  }
}
