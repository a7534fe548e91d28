package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Test helper: a simple simulated loop. A free-running three-state clock (exact discrete process
 * noise) is steered by a {@link ClockCorrector} from time-offset measurements; the relativistic model
 * is off (this harness isolates the servo: the closed loop with orbit truth lives in ground-sim).
 * Invented scenario for tests.
 */
final class LoopHarness {
  final ClockCorrector tk;
  final double sWfm;
  final double sRw;
  final double sRr;
  final double sigmaMeas;
  final Random noise;
  final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
  final SplitTime raw = new SplitTime();
  final SplitTime corrected = new SplitTime();
  final org.eigenzeit.onboard.steering.ClockTruthAccess truth;
  /** Time error of the corrected clock against the true scale, s. */
  double error;
  long t;

  LoopHarness(double[] params, double freq0, double drift0, double phase0, double sigmaMeas, long seed) {
    tk = new ClockCorrector(ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(false).build(), false, false);
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(params, b, 0));
    if (tk.loadTable(TableId.SERVO, b, 0, b.length) != Status.OK || tk.activateTable(TableId.SERVO) != Status.OK) {
      throw new IllegalStateException("table");
    }
    sWfm = params[ServoParameters.F_SIGMA_WHITE_FM];
    sRw = params[ServoParameters.F_SIGMA_RANDOM_WALK_FM];
    sRr = params[ServoParameters.F_SIGMA_RANDOM_RUN];
    this.sigmaMeas = sigmaMeas;
    truth = new org.eigenzeit.onboard.steering.ClockTruthAccess(sWfm, sRw, sRr, freq0, drift0, seed);
    truth.setPhase(phase0);
    noise = new Random(seed + 1);
    assertEquals(Status.OK, raw.set(850_000_000L, 0.0));
  }

  /** Runs n cycles of 1 s; measurements every measEvery s when enabled. Returns the last verdict. */
  int run(int n, int measEvery, boolean measure) {
    int verdict = Status.OK;
    for (int k = 0; k < n; k++) {
      final double u = tk.servo().command();
      truth.step(1.0, 0.0);
      t++;
      assertEquals(Status.OK, raw.set(850_000_000L + t, truth.phase()));
      // corrected = raw + S: its error against the true scale is the oscillator phase plus steering.
      final boolean doMeasure = measure && t % measEvery == 0;
      if (doMeasure) {
        tk.correctedTime(raw, corrected);
        final double trueError = corrected.secondsSince(trueScale());
        m.set(corrected, 0, trueError + sigmaMeas * noise.nextGaussian(), true);
      }
      verdict = tk.cycle(raw, null, doMeasure ? m : null);
      tk.correctedTime(raw, corrected);
      error = corrected.secondsSince(trueScale());
      if (Double.isNaN(u)) {
        throw new IllegalStateException("NaN command");
      }
    }
    return verdict;
  }

  private final SplitTime scale = new SplitTime();

  SplitTime trueScale() {
    assertEquals(Status.OK, scale.set(850_000_000L + t, 0.0));
    return scale;
  }

  /** Coasts while the true oscillator frequency is offset by an unknown amount. */
  static final class Kick {
    private final LoopHarness h;
    private final double extraFrequency;

    Kick(LoopHarness h, double extraFrequency) {
      this.h = h;
      this.extraFrequency = extraFrequency;
    }

    void runMeasured(int seconds) {
      for (int k = 0; k < seconds; k++) {
        h.truth.setPhase(h.truth.phase() + extraFrequency);
        h.run(1, 1, true);
      }
    }

    void runCoast(int seconds) {
      for (int k = 0; k < seconds; k++) {
        h.truth.setPhase(h.truth.phase() + extraFrequency);
        h.run(1, 1, false);
      }
    }
  }
}
