package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.CucCodec;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * Zero allocation of the full servo cycle: clock-corrector cycle with orbit and measurement,
 * corrected time, CUC stamp, housekeeping snapshot and a restart save, bracketed per cycle with
 * the thread's allocated-byte counter (as in the tracker's AllocationTest), over 1e5 cycles.
 */
class CorrectorAllocationTest {
  private static final com.sun.management.ThreadMXBean BEAN =
      (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();

  /**
   * Runs cycles; verdicts[0] counts the INVALID_INPUT verdicts, verdicts[1] the flagged measurements
   * offered (the test's own count of its input; a verdict is never dropped). Created by the caller
   * before the measured windows, so no state outlives a test.
   */
  private static long cycles(ClockCorrector tk, int from, int count, OrbitSample s, TimeOffsetMeasurement m,
      SplitTime raw, SplitTime corr, Housekeeping hk, byte[] cuc, byte[] restart, CucCodec codec, int[] verdicts) {
    long bytes = 0;
    final double a = 7.0e6;
    final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (a * a * a));
    for (int t = from; t < from + count; t++) {
      final double ang = n * t;
      final double x = a * Math.cos(ang);
      final double y = a * Math.sin(ang);
      final double vx = -n * a * Math.sin(ang);
      final double vy = n * a * Math.cos(ang);
      final long before = BEAN.getCurrentThreadAllocatedBytes();
      assertEquals(Status.OK, raw.set(850_000_000L + t, 1e-11 * t));
      tk.correctedTime(raw, corr);
      s.set(corr, OrbitSample.FRAME_INERTIAL, x, y, 0, vx, vy, 0, t % 50 != 7);
      m.set(corr, t % 4, 1e-9, t % 5 == 0);
      if (tk.cycle(raw, s, t % 3 == 0 ? m : null) == Status.INVALID_INPUT) {
        verdicts[0]++;
      }
      if (t % 3 == 0 && t % 5 != 0) {
        verdicts[1]++;
      }
      assertEquals(Status.OK, tk.stampCuc(raw, codec, cuc, 0));
      tk.housekeeping(hk);
      if (t % 1000 == 0) {
        assertEquals(Status.OK, tk.save(restart, 0, restart.length));
      }
      bytes += BEAN.getCurrentThreadAllocatedBytes() - before;
    }
    return bytes;
  }

  @Test
  void fullCycleAllocatesNothing() {
    final ClockCorrector tk = new ClockCorrector(ModelConfig.builder().level(ModelLevel.HARMONICS).degree(8).tides(true)
        .energyToleranceRel(2e-3).build(), true, false);
    final byte[] table = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(ServoParameters.typicalRubidium(), table, 0));
    assertEquals(Status.OK, tk.loadTable(TableId.SERVO, table, 0, table.length));
    assertEquals(Status.OK, tk.activateTable(TableId.SERVO));
    final OrbitSample s = new OrbitSample();
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    final SplitTime raw = new SplitTime();
    final SplitTime corr = new SplitTime();
    final Housekeeping hk = new Housekeeping();
    final byte[] cuc = new byte[CucCodec.MAX_CODE_OCTETS];
    final byte[] restart = new byte[ClockCorrector.STATE_BYTES];
    final CucCodec codec = CucCodec.level1(4, 3);
    final int[] verdicts = new int[2];
    cycles(tk, 0, 20_000, s, m, raw, corr, hk, cuc, restart, codec, verdicts);
    long bytes = -1;
    final long[] windows = new long[3];
    for (int w = 0; w < 3 && bytes != 0; w++) {
      windows[w] = cycles(tk, 20_000 + w * 100_000, 100_000, s, m, raw, corr, hk, cuc, restart, codec, verdicts);
      bytes = windows[w];
    }
    System.out.println("clock corrector full cycle, allocated per 1e5 cycles: " + java.util.Arrays.toString(windows));
    System.out.println("evidence: core.alloc_bytes_per_1e5_cycles = " + bytes);
    assertEquals(0L, bytes);
    // Every flagged measurement offered is refused as INVALID_INPUT, and nothing else is.
    assertTrue(verdicts[1] > 0, "the run must offer flagged measurements");
    assertEquals(verdicts[1], verdicts[0], "INVALID_INPUT verdicts vs flagged measurements offered");
  }

  @Test
  void constructionAllocatesKilobytes() {
    // Measured for docs/integration.md; bounds with margin for other JVM object layouts.
    new ClockCorrector(ModelConfig.builder().level(ModelLevel.HARMONICS).degree(36).tides(true).build(), true, false);
    final long[] sizes = new long[2];
    for (int degree : new int[] {8, 36}) {
      final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(degree).tides(true).build();
      final long b0 = BEAN.getCurrentThreadAllocatedBytes();
      final ClockCorrector tk = new ClockCorrector(cfg, true, false);
      final long bytes = BEAN.getCurrentThreadAllocatedBytes() - b0;
      System.out.println("clock corrector construction at degree " + degree + ": " + bytes + " bytes ("
          + tk.frequencyCommand() + ")");
      sizes[degree == 8 ? 0 : 1] = bytes;
    }
    assertTrue(sizes[0] > 1000 && sizes[0] < 16_384, "degree 8: " + sizes[0]);
    // Degree 36: the corrector's own double-buffered coefficient table (4 x 703 doubles, 22.5 KB),
    // the transient uplink image of the configured field (11 KB) and the evaluator's recursion
    // coefficients (11 KB) dominate.
    assertTrue(sizes[1] > sizes[0] && sizes[1] < 65_536, "degree 36: " + sizes[1]);
  }
}
