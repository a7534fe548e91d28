package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.table.ServoParameters;
import org.junit.jupiter.api.Test;

/**
 * A simple simulated loop (invented scenario, typical oscillator values marked as such): a
 * rubidium-class and a quartz-class clock steered from a GNSS timing receiver (10 ns white noise,
 * 1 Hz), then left to coast for a day. Prints the steady-state time error and the holdover drift.
 */
class SimulatedLoopTest {
  /** Typical quartz (OCXO) values, not a specific product: tuned loop of 300 s. */
  static double[] typicalQuartz() {
    final double[] v = ServoParameters.typicalRubidium();
    v[ServoParameters.F_SIGMA_WHITE_FM] = 1e-12;
    v[ServoParameters.F_SIGMA_RANDOM_WALK_FM] = 3e-14;
    v[ServoParameters.F_SIGMA_RANDOM_RUN] = 1e-19;
    v[ServoParameters.F_TIME_CONSTANT_TRACK_S] = 300;
    v[ServoParameters.F_TIME_CONSTANT_ACQUIRE_S] = 60;
    v[ServoParameters.F_INITIAL_SIGMA_DRIFT_PER_S] = 1e-14;
    return v;
  }

  private static double[] run(double[] params, double freq0, double drift0, long seed, String name) {
    final LoopHarness h = new LoopHarness(params, freq0, drift0, 2e-6, 10e-9, seed);
    h.run(6 * 3600, 1, true); // acquisition and settling
    assertEquals(ServoMode.TRACK, h.tk.servo().mode(), name + " should track");
    double sum2 = 0;
    double max = 0;
    final int n = 12 * 3600;
    for (int k = 0; k < n; k++) {
      h.run(1, 1, true);
      sum2 += h.error * h.error;
      max = Math.max(max, Math.abs(h.error));
    }
    final double rms = Math.sqrt(sum2 / n);
    final double start = h.error;
    h.run(86_400, 1, false);
    final double holdover = Math.abs(h.error - start);
    assertEquals(ServoMode.COAST, h.tk.servo().mode(), name + " should coast");
    System.out.printf("%s: steady-state time error %.3f ns RMS (max %.3f ns) over 12 h; holdover drift %.1f ns "
        + "after 1 day without measurements%n", name, rms * 1e9, max * 1e9, holdover * 1e9);
    return new double[] {rms, holdover};
  }

  @Test
  void rubidiumClassLoop() {
    // Typical rubidium values (REFERENCE-VALUES, demo presets): sigma_y(1 s) 3e-12, drift 1e-13/day.
    final double[] r = run(ServoParameters.typicalRubidium(), 5e-11, 1e-13 / 86_400, 42L, "rubidium-class");
    System.out.printf("evidence: servo.rubidium_steady_rms_ns = %.4f bound %.1f%n", r[0] * 1e9, 1.5);
    System.out.printf("evidence: servo.rubidium_holdover_ns = %.3f bound %.1f%n", r[1] * 1e9, 30.0);
    assertTrue(r[0] < 1.5e-9, "steady RMS " + r[0]); // about 7.6x the 0.198 ns measured
    assertTrue(r[1] < 30e-9, "holdover " + r[1]); // about 10x the 3.1 ns measured
  }

  @Test
  void quartzClassLoop() {
    // Typical space OCXO values (REFERENCE-VALUES, demo presets): drift 1e-10/day.
    final double[] r = run(typicalQuartz(), 1e-8, 1e-10 / 86_400, 43L, "quartz-class");
    System.out.printf("evidence: servo.quartz_steady_rms_ns = %.4f bound %.1f%n", r[0] * 1e9, 5.0);
    // 3 us: twice the 1.49 us measured (docs/servo.md). A filter without the drift state coasts on
    // the frequency alone and gathers d t^2 / 2 = 1.157e-15/s x (86 400 s)^2 / 2 = 4.3 us in the day
    // (closed form of a constant drift), so this bound fails for it (seeded fault SRV-DRIFT-01).
    System.out.printf("evidence: servo.quartz_holdover_ns = %.1f bound %.1f%n", r[1] * 1e9, 3000.0);
    assertTrue(r[0] < 5e-9, "steady RMS " + r[0]);
    assertTrue(r[1] < 3e-6, "holdover " + r[1]);
  }
}
