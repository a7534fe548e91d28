package org.eigenzeit.onboard.corrector.rawclock;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** The raw-clock gate's rule (its class Javadoc and docs/servo.md are the oracle). */
class RawClockGateTest {
  private final RawClockGate gate = new RawClockGate(60.0);

  private int at(double t) {
    final double w = Math.floor(t);
    return gate.admit(SplitTime.of(1_000_000L + (long) w, t - w));
  }

  @Test
  void everyBranchOfTheRule() {
    assertEquals(Status.OK, at(0), "the first reading");
    assertEquals(0.0, gate.elapsedS(), 0.0);
    assertEquals(Status.OK, at(1));
    assertEquals(Status.RAW_CLOCK_REPEATED, at(1), "the same reading");
    assertEquals(0.0, gate.elapsedS(), 0.0);
    assertEquals(Status.EPOCH_NOT_INCREASING, at(0.5), "backwards");
    assertEquals(Status.OK, at(61), "60 s: the bound itself is taken");
    assertEquals(60.0, gate.elapsedS(), 0.0);
    assertEquals(Status.EPOCH_JUMP, at(200), "beyond the bound: held, refused");
    assertEquals(Status.RAW_CLOCK_JUMP, at(201), "the next reading confirms it");
    assertEquals(140.0, gate.elapsedS(), 0.0, "the confirmed cycle runs with the whole elapsed time");
    for (int code : new int[] {Status.OK, Status.RAW_CLOCK_REPEATED, Status.EPOCH_NOT_INCREASING, Status.EPOCH_JUMP,
        Status.RAW_CLOCK_JUMP}) {
      assertEquals(code == Status.OK ? 3 : 1, gate.count(code), Status.name(code));
    }
    assertEquals(0, gate.count(-1));
    assertEquals(0, gate.count(Status.COUNT));
  }

  @Test
  void aSingleForwardGlitchCostsOneCycleAndNoLaterOne() {
    assertEquals(Status.OK, at(0));
    assertEquals(Status.OK, at(1));
    assertEquals(Status.EPOCH_JUMP, at(1 + 120), "a reading 120 s ahead");
    for (int t = 2; t < 500; t++) {
      assertEquals(Status.OK, at(t), "every later good reading is adopted: t " + t);
    }
    assertEquals(Status.EPOCH_JUMP, at(500 + 1e7), "a glitch of any size");
    assertEquals(Status.OK, at(500));
  }

  @Test
  void aHeldReadingIsConfirmedOnlyByTheNextConsistentOne() {
    assertEquals(Status.OK, at(0));
    assertEquals(Status.EPOCH_JUMP, at(1000));
    assertEquals(Status.EPOCH_NOT_INCREASING, at(-1), "a non-confirming reading drops the held one");
    assertEquals(Status.EPOCH_JUMP, at(1001), "nothing held any more: held again");
    assertEquals(Status.EPOCH_JUMP, at(999), "before the held one: no confirmation; held instead");
    assertEquals(Status.EPOCH_JUMP, at(1100), "more than the bound after the held one");
    assertEquals(Status.RAW_CLOCK_JUMP, at(1101));
    gate.dropHeld();
    assertEquals(Status.EPOCH_JUMP, at(3000));
    gate.dropHeld();
    assertEquals(Status.EPOCH_JUMP, at(3001), "a dropped held reading confirms nothing");
  }

  @Test
  void stateSizeIsWhatItWritesAndRestoreChecksIt() {
    assertEquals(Status.OK, at(5));
    final byte[] saved = StateBytes.written(gate::save);
    assertEquals(RawClockGate.STATE_BYTES, saved.length);
    final RawClockGate other = new RawClockGate(60.0);
    StateReader r = StateBytes.reader(saved);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    assertArrayEquals(saved, StateBytes.written(other::save));
    r = StateBytes.reader(StateBytes.withInt(saved, 4, Status.COUNT));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "an unknown verdict");
    r = StateBytes.reader(StateBytes.withDouble(saved, 16, Double.NaN));
    other.restore(r);
    assertEquals(Status.NOT_FINITE, r.status(), "a NaN fraction of the last reading");
    assertThrows(IllegalArgumentException.class, () -> new RawClockGate(0.0));
    assertThrows(IllegalArgumentException.class, () -> new RawClockGate(Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> new RawClockGate(Math.nextUp(1e6)), "above the documented 1e6 s");
    assertThrows(IllegalArgumentException.class, () -> new RawClockGate(Math.nextDown(1e-3)), "below 1e-3 s");
    for (double d : new double[] {1e-3, 1e6}) { // both ends of the documented range are taken, and are D
      final RawClockGate edge = new RawClockGate(d);
      assertEquals(Status.OK, edge.admit(SplitTime.of(850_000_000L, 0.0)));
      final SplitTime atD = SplitTime.of(850_000_000L, 0.0);
      assertEquals(Status.OK, atD.addSeconds(d));
      assertEquals(Status.OK, edge.admit(atD), "a step of exactly D is adopted");
      assertEquals(Status.OK, atD.addSeconds(2 * d));
      assertEquals(Status.EPOCH_JUMP, edge.admit(atD), "a step of 2 D is held");
    }
  }
}
