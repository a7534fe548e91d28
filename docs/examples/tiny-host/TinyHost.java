package org.example.host;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.corrector.ClockCorrector;
import org.eigenzeit.onboard.corrector.Housekeeping;
import org.eigenzeit.onboard.relativity.ClosedForms;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The smallest host loop of docs/integration.md: an invented circular 7000 km orbit, a perfect
 * oscillator that runs at its proper rate, a noise-free time-offset measurement every 10 s, 1 Hz
 * for 1800 s with a warm restart half-way. Every status is checked; any refusal ends the program
 * with exit code 1 and names the call.
 */
public final class TinyHost {
  private TinyHost() {}

  private static void check(String call, int status) {
    if (status != Status.OK) {
      System.out.println("tiny-host: " + call + " refused: " + Status.name(status));
      System.exit(1);
    }
  }

  private static ClockCorrector start(ModelConfig cfg, byte[] servoTable) {
    final ClockCorrector c = new ClockCorrector(cfg, true, false);
    check("loadTable(SERVO)", c.loadTable(TableId.SERVO, servoTable, 0, servoTable.length));
    check("activateTable(SERVO)", c.activateTable(TableId.SERVO));
    return c;
  }

  public static void main(String[] args) {
    // Start-up: the only phase that allocates.
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.J2).tides(false).build();
    final byte[] servoTable = new byte[ServoParameters.TABLE_BYTES]; // in flight: the uplinked image
    check("ServoParameters.encode", ServoParameters.encode(ServoParameters.typicalRubidium(), servoTable, 0));
    ClockCorrector corrector = start(cfg, servoTable);
    final byte[] restart = new byte[ClockCorrector.STATE_BYTES];
    final OrbitSample orbit = new OrbitSample();
    final TimeOffsetMeasurement meas = new TimeOffsetMeasurement();
    final Housekeeping hk = new Housekeeping();
    final SplitTime tt = new SplitTime();
    final SplitTime raw = new SplitTime();
    final SplitTime corrected = new SplitTime();
    final double r = 7.0e6;
    final double v = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / r);
    final double rate = ClosedForms.secularRate(CentralBody.EARTH, r, 0.0, true); // proper rate of the clock
    final long t0 = 846_000_000L; // TT seconds since J2000, in 2026
    int measurementsRefused = 0;
    for (int t = 0; t <= 1800; t++) {
      check("SplitTime.set(tt)", tt.set(t0 + t, 0.0));
      check("SplitTime.set(raw)", raw.set(t0 + t, rate * t));
      if (t == 900) { // a processor reset: save, a new corrector, warm restart
        check("save", corrector.save(restart, 0, restart.length));
        corrector = start(cfg, servoTable);
        check("restore", corrector.restore(restart, 0, restart.length));
      }
      final double w = v / r * t;
      orbit.set(tt, OrbitSample.FRAME_INERTIAL, r * Math.cos(w), r * Math.sin(w), 0, -v * Math.sin(w), v * Math.cos(w),
          0, true);
      TimeOffsetMeasurement m = null;
      if (t % 10 == 0) {
        corrector.correctedTime(raw, corrected);
        meas.set(corrected, 0, corrected.secondsSince(tt), true);
        m = meas;
      }
      final int verdict = corrector.cycle(raw, orbit, m);
      if (Status.isFault(verdict)) { // a refused measurement is counted, not fatal; everything else is
        if (m == null) {
          check("cycle", verdict);
        }
        measurementsRefused++;
      }
    }
    corrector.housekeeping(hk);
    corrector.correctedTime(raw, corrected);
    System.out.printf(java.util.Locale.ROOT, "tiny-host: done, 1801 cycles, mode %s, orbit %s, measurements refused %d, "
        + "time error %.3f ns%n", ServoMode.name(hk.mode()), Status.name(hk.orbitSolutionStatus()), measurementsRefused,
        corrected.secondsSince(tt) * 1e9);
  }
}
