package org.eigenzeit.onboard.tracker.cadence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** The frame cadence as docs/algorithms.md states it: ERA every use, bodies per minute, pole per hour. */
class OrientationCacheTest {
  private static final long HOUR_START = 845_002_800L; // a whole hour of TT since J2000.0
  private static final ModelConfig EARTH = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(4).tides(true)
      .build();
  private static final ModelConfig MOON = ModelConfig.builder().body(CentralBody.MOON).level(ModelLevel.J2)
      .tides(true).build();

  private static double[] pole(OrientationCache c, long t) {
    c.refresh(SplitTime.of(t, 0.5));
    final double[] p = new double[3];
    c.pole(p);
    return p;
  }

  private static double sunX(OrientationCache c, long t) {
    c.refresh(SplitTime.of(t, 0.5));
    return c.bodies().firstM(0);
  }

  @Test
  void stateSizeIsWhatItWrites() {
    assertEquals(OrientationCache.STATE_BYTES, StateBytes.written(new OrientationCache(EARTH)::save).length);
  }

  @Test
  void earthPoleChangesOnlyAtWholeHoursAndBodiesOnlyAtWholeMinutes() {
    assertEquals(0, HOUR_START % OrientationCache.ORIENTATION_SLOT_S);
    final OrientationCache c = new OrientationCache(EARTH);
    final double[] first = pole(c, HOUR_START);
    assertArrayEquals(first, pole(c, HOUR_START + 1799), 0.0);
    assertArrayEquals(first, pole(c, HOUR_START + 3599), 0.0);
    assertFalse(java.util.Arrays.equals(first, pole(c, HOUR_START + 3600)), "a new hour moves the pole");
    final double sun = sunX(c, HOUR_START + 60);
    assertEquals(sun, sunX(c, HOUR_START + 119), 0.0);
    assertNotEquals(sun, sunX(c, HOUR_START + 120), "a new minute moves the Sun");
    // Slot values are those of the slot's start, whatever the order of the calls.
    final OrientationCache fresh = new OrientationCache(EARTH);
    assertEquals(sun, sunX(fresh, HOUR_START + 100), 0.0);
    assertArrayEquals(first, pole(fresh, HOUR_START + 2000), 0.0);
  }

  @Test
  void lunarPoleFollowsTheMinuteSlots() {
    final OrientationCache c = new OrientationCache(MOON);
    final double[] p = pole(c, HOUR_START + 60);
    assertArrayEquals(p, pole(c, HOUR_START + 119), 0.0);
    assertFalse(java.util.Arrays.equals(p, pole(c, HOUR_START + 120)));
    assertTrue(c.isDirect(OrbitSample.FRAME_INERTIAL) == false, "the Moon's inertial samples still need rb");
  }

  @Test
  void restoreKeepsThePoleRecomputesTheSlotAndRefusesANonUnitPole() {
    final OrientationCache c = new OrientationCache(EARTH);
    final double[] p = pole(c, HOUR_START + 10);
    final double sun = c.bodies().firstM(1);
    final byte[] saved = StateBytes.written(c::save);
    final OrientationCache other = new OrientationCache(EARTH);
    StateReader r = StateBytes.reader(saved);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    final double[] restored = new double[3];
    other.pole(restored);
    assertArrayEquals(p, restored, 0.0, "the pole is restored before any refresh");
    other.refresh(SplitTime.of(HOUR_START + 20, 0));
    assertEquals(sun, other.bodies().firstM(1), 0.0, "the slot is recomputed after a restore");
    r = StateBytes.reader(StateBytes.withDouble(saved, 16, 0.5));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a pole of length != 1");
    r = StateBytes.reader(StateBytes.withDouble(saved, 0, Double.POSITIVE_INFINITY));
    other.restore(r);
    assertEquals(Status.NOT_FINITE, r.status());
  }
}
