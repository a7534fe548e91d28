package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * Raw-clock faults through the whole corrector: refused and counted, flagged, survivable, and a
 * long gap taken whole without a step of the corrected time (docs/servo.md, raw-clock gate).
 */
class RawClockFaultTest {
  private static ClockCorrector steered() {
    final ClockCorrector c = new ClockCorrector(ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(false).build(),
        false, false);
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(ServoParameters.typicalRubidium(), b, 0));
    assertEquals(Status.OK, c.loadTable(TableId.SERVO, b, 0, b.length));
    assertEquals(Status.OK, c.activateTable(TableId.SERVO));
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    final SplitTime raw = new SplitTime();
    final SplitTime corr = new SplitTime();
    for (int t = 0; t < 300; t++) { // a clock 3e-11 fast: the servo steers a rate
      assertEquals(Status.OK, raw.set(900_000_000L + t, 3e-11 * t));
      c.correctedTime(raw, corr);
      m.set(corr, 0, corr.secondsSince(SplitTime.of(900_000_000L + t, 0.0)), true);
      final int v = c.cycle(raw, null, t % 5 == 0 ? m : null);
      assertTrue(v == Status.OK || v == Status.OUTLIER, Status.name(v));
    }
    return c;
  }

  @Test
  void faultsAreCountedAndAGlitchDoesNotRefuseLaterCycles() {
    final ClockCorrector c = steered();
    final SplitTime raw = SplitTime.of(900_000_299L, 3e-11 * 299);
    assertEquals(Status.OK, c.cycle(raw, null, null), "a repeated reading runs the cycle (flagged in housekeeping)");
    assertEquals(Status.EPOCH_NOT_INCREASING, c.cycle(SplitTime.of(900_000_250L, 0.0), null, null));
    assertEquals(Status.EPOCH_JUMP, c.cycle(SplitTime.of(900_000_300L + 120, 0.0), null, null), "a 120 s glitch");
    for (int t = 300; t < 400; t++) {
      assertEquals(Status.OK, c.cycle(SplitTime.of(900_000_000L + t, 3e-11 * t), null, null), "t " + t);
    }
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertEquals(1, hk.rawClockCounts(Status.RAW_CLOCK_REPEATED));
    assertEquals(1, hk.rawClockCounts(Status.EPOCH_NOT_INCREASING));
    assertEquals(1, hk.rawClockCounts(Status.EPOCH_JUMP));
    assertEquals(400, hk.rawClockCounts(Status.OK));
    assertEquals(Status.OK, hk.rawClockStatus());
    assertEquals(401, hk.cycles(), "refused cycles do not run");
  }

  @Test
  void aConfirmedGapIsTakenWholeWithoutAStep() {
    for (double gapS : new double[] {1.2e7, 5.0e3}) {
      final ClockCorrector c = steered();
      final double command = c.frequencyCommand();
      assertTrue(command != 0.0, "the servo commands a rate");
      final SplitTime raw = SplitTime.of(900_000_299L, 0.0);
      raw.addWholeSeconds((long) gapS);
      final SplitTime before = new SplitTime();
      final SplitTime after = new SplitTime();
      assertEquals(Status.EPOCH_JUMP, c.cycle(raw, null, null), "the first reading after the gap is held");
      raw.addWholeSeconds(1);
      c.correctedTime(raw, before);
      final int v = c.cycle(raw, null, null);
      assertEquals(Status.OK, v);
      c.correctedTime(raw, after);
      final Housekeeping hk = new Housekeeping();
      c.housekeeping(hk);
      assertEquals(Status.RAW_CLOCK_JUMP, hk.rawClockStatus());
      final double step = after.secondsSince(before) - hk.lastPhaseStepS();
      System.out.printf("gap %.1e s taken whole: corrected-time step %.3e s (command %.2e)%n", gapS, step, command);
      assertEquals(0.0, step, 1e-12, "no step beyond a commanded phase step: the command applied over the gap");
    }
  }
}
