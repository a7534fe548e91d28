package org.eigenzeit.onboard.tracker.cadence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The staged slot refresh (values of the next 60 s slot and the next hour built a step per cycle,
 * installed at the slot) gives bit for bit the values of the synchronous refresh: every number read
 * from a cache driven cycle by cycle equals the number a fresh cache computes at once for the same
 * instant (a fresh cache has nothing staged, so it takes the synchronous path of the code before
 * staging). Checked over hour and minute boundaries, at 1 s, 0.5 s and 20 s cycles, an outage
 * across a boundary, a boundary reached before the staging finished, a restart in the middle of
 * the staging, and time going back; the counter says which path each slot took.
 */
class StagedRefreshTest {
  private static final long HOUR_START = 845_002_800L; // a whole hour of TT since J2000.0
  private static final ModelConfig EARTH = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(4).tides(true)
      .build();
  private static final ModelConfig EARTH_NO_TIDES = ModelConfig.builder().level(ModelLevel.J2).tides(false).build();
  private static final ModelConfig MOON = ModelConfig.builder().body(CentralBody.MOON).level(ModelLevel.J2)
      .tides(true).build();

  /** One cycle's refresh, then every value the cache hands out, as bits (pole, two bodies, matrix). */
  private static long[] cycle(OrientationCache c, SplitTime tt) {
    c.refresh(tt);
    final long[] out = new long[18];
    final double[] p = new double[3];
    c.pole(p);
    for (int i = 0; i < 3; i++) {
      out[i] = Double.doubleToRawLongBits(p[i]);
      out[3 + i] = Double.doubleToRawLongBits(c.bodies().firstM(i));
      out[6 + i] = Double.doubleToRawLongBits(c.bodies().secondM(i));
      for (int j = 0; j < 3; j++) {
        out[9 + 3 * i + j] = Double.doubleToRawLongBits(c.matrixElementAt(tt, i, j));
      }
    }
    return out;
  }

  /** The synchronous values: a fresh cache's first refresh. */
  private static long[] synchronous(ModelConfig config, SplitTime tt) {
    return cycle(new OrientationCache(config), tt);
  }

  /** Drives a cache from {@code from} to {@code to} (exclusive) and checks every cycle. */
  private static void drive(OrientationCache c, ModelConfig config, double from, double to, double step) {
    for (double t = from; t < to; t += step) {
      final long whole = (long) Math.floor(t);
      final SplitTime tt = SplitTime.of(whole, t - whole);
      assertArrayEquals(synchronous(config, tt), cycle(c, tt), "values at TT " + t);
    }
  }

  @Test
  void cyclesAcrossHourAndMinuteBoundariesInstallStagedValuesBitForBit() {
    for (ModelConfig config : new ModelConfig[] {EARTH, EARTH_NO_TIDES, MOON}) {
      final OrientationCache c = new OrientationCache(config);
      drive(c, config, HOUR_START - 3700, HOUR_START + 3700, 1.0);
      // Only the first refresh of each kind was synchronous: every later minute and hour was staged.
      final int first = config == EARTH ? 2 : 1;
      assertEquals(first, c.synchronousRefreshes(), "synchronous refreshes over two hours, " + config.body());
    }
    final OrientationCache half = new OrientationCache(EARTH);
    drive(half, EARTH, HOUR_START - 299.75, HOUR_START + 300, 0.5);
    assertEquals(2, half.synchronousRefreshes());
    final OrientationCache sparse = new OrientationCache(EARTH);
    drive(sparse, EARTH, HOUR_START - 3600, HOUR_START + 3600, 20.0);
    assertEquals(2, sparse.synchronousRefreshes(), "three cycles a minute still stage everything");
  }

  @Test
  void anOutageAcrossABoundaryFallsBackToTheSynchronousRefresh() {
    final OrientationCache c = new OrientationCache(EARTH);
    drive(c, EARTH, HOUR_START - 600, HOUR_START - 30, 1.0);
    final int before = c.synchronousRefreshes();
    drive(c, EARTH, HOUR_START + 90, HOUR_START + 300, 1.0); // no cycle from -30 s to +90 s
    // The minute after the outage is not the one staged (three slots on); the hour is: it was staged
    // for exactly the hour the outage ends in, and its values depend on the hour alone.
    assertEquals(before + 1, c.synchronousRefreshes(), "the minute after the outage");
    final OrientationCache longer = new OrientationCache(EARTH);
    drive(longer, EARTH, HOUR_START - 600, HOUR_START - 30, 1.0);
    drive(longer, EARTH, HOUR_START + 3630, HOUR_START + 3700, 1.0); // across two hour boundaries
    assertEquals(before + 2, longer.synchronousRefreshes(), "the minute and the hour after the outage");
  }

  @Test
  void aBoundaryBeforeTheStagingFinishedIsComputedAtOnce() {
    final OrientationCache c = new OrientationCache(EARTH);
    drive(c, EARTH, HOUR_START - 8, HOUR_START + 120, 1.0); // 8 cycles: 17 steps of the hour not done
    assertEquals(2 + 1, c.synchronousRefreshes(), "the first refresh (2) and the hour");
  }

  @Test
  void aRestartInTheMiddleOfTheStagingGivesTheSameValues() {
    for (ModelConfig config : new ModelConfig[] {EARTH, MOON}) {
      final OrientationCache c = new OrientationCache(config);
      drive(c, config, HOUR_START - 50, HOUR_START - 40, 1.0); // the hour's staging half done
      final byte[] saved = StateBytes.written(c::save);
      final OrientationCache other = new OrientationCache(config);
      for (OrientationCache target : new OrientationCache[] {c, other}) {
        final StateReader r = StateBytes.reader(saved);
        target.restore(r);
        assertEquals(Status.OK, r.status());
        final int before = target.synchronousRefreshes();
        drive(target, config, HOUR_START - 40, HOUR_START + 200, 1.0);
        assertEquals(before + (config == EARTH ? 2 : 1), target.synchronousRefreshes(),
            "after a restore the next slot is computed at once, later ones staged");
      }
    }
  }

  @Test
  void timeGoingBackIsNotGivenTheStagedValues() {
    final OrientationCache c = new OrientationCache(EARTH);
    drive(c, EARTH, HOUR_START - 100, HOUR_START + 59, 1.0); // the next minute is staged
    final int before = c.synchronousRefreshes();
    drive(c, EARTH, HOUR_START - 3590, HOUR_START - 3588, 1.0); // back into the previous hour
    assertEquals(before + 2, c.synchronousRefreshes(), "going back refreshes at once, not from staging");
    drive(c, EARTH, HOUR_START + 60, HOUR_START + 200, 1.0);
    assertEquals(before + 4, c.synchronousRefreshes(), "and forward again across the jump");
  }
}
