package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.lists;

import java.util.List;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * Stateful property test: random sequences of normal and faulty inputs (good and corrupted orbit
 * samples and measurements, outliers, gaps, table uploads, warm restarts, a clock going
 * backwards). After every action: no exception, nothing non-finite in the outputs, the mode is
 * legal, every measurement and orbit sample offered is counted exactly once.
 */
class CorrectorProperties {
  private static final ModelConfig CONFIG = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(4)
      .tides(true).energyToleranceRel(2e-3).build();
  private static final byte[] TABLE = new byte[ServoParameters.TABLE_BYTES];

  static {
    assertEquals(Status.OK, ServoParameters.encode(ServoParameters.typicalRubidium(), TABLE, 0));
  }

  /** One run of a sequence of actions. */
  private static final class Run {
    ClockCorrector tk = new ClockCorrector(CONFIG, true, false);
    final OrbitSample s = new OrbitSample();
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    final SplitTime raw = SplitTime.of(850_000_000L, 0.0);
    final SplitTime corr = new SplitTime();
    final Housekeeping hk = new Housekeeping();
    final byte[] restart = new byte[ClockCorrector.STATE_BYTES];
    long t;
    /** The raw-clock gate's rule as the oracle: the last adopted reading and whether one is held. */
    long adoptedT = -1;
    long heldT;
    boolean held;
    int measurements;
    int orbits;
    boolean cycled;

    Run() {
      assertEquals(Status.OK, tk.loadTable(TableId.SERVO, TABLE, 0, TABLE.length));
      assertEquals(Status.OK, tk.activateTable(TableId.SERVO));
    }

    void orbit(boolean corrupt) {
      final double a = 7.0e6;
      final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (a * a * a));
      final double ang = n * t;
      tk.correctedTime(raw, corr);
      s.set(corr, OrbitSample.FRAME_INERTIAL, corrupt ? Double.NaN : a * Math.cos(ang), a * Math.sin(ang), 0,
          -n * a * Math.sin(ang), n * a * Math.cos(ang), 0, true);
      orbits++;
    }

    void measurement(double extra, int source, boolean valid) {
      tk.correctedTime(raw, corr);
      m.set(corr, source, corr.secondsSince(SplitTime.of(850_000_000L + t, 0.0)) + extra, valid);
      measurements++;
    }

    void act(int a) {
      boolean withOrbit = false;
      boolean withMeas = false;
      switch (a) {
        case 0 -> { orbit(false); measurement(0, 0, true); withOrbit = true; withMeas = true; }
        case 1 -> { orbit(false); withOrbit = true; }
        case 2 -> { measurement(0, 0, true); withMeas = true; }
        case 3 -> { orbit(true); withOrbit = true; }
        case 4 -> { measurement(Double.NaN, 0, true); withMeas = true; }
        case 5 -> { measurement(1e-6, 0, true); withMeas = true; }
        case 6 -> { measurement(0, 0, false); withMeas = true; }
        case 7 -> t += 500;
        case 8 -> {
          assertEquals(Status.OK, tk.save(restart, 0, restart.length));
          final ClockCorrector next = new ClockCorrector(CONFIG, true, false);
          assertEquals(Status.OK, next.loadTable(TableId.SERVO, TABLE, 0, TABLE.length));
          assertEquals(Status.OK, next.activateTable(TableId.SERVO));
          assertEquals(Status.OK, next.restore(restart, 0, restart.length));
          tk = next;
          held = false; // a held reading is not kept across a restart
          cycled = true;
        }
        case 9 -> {
          final byte[] bad = TABLE.clone();
          bad[30] ^= 1;
          assertEquals(Status.CHECKSUM_MISMATCH, tk.loadTable(TableId.SERVO, bad, 0, bad.length));
        }
        case 10 -> { measurement(0, 7, true); withMeas = true; }
        default -> {
          if (adoptedT >= 0) { // a clock going backwards can only be seen after a first adopted reading
            final SplitTime back = SplitTime.of(850_000_000L + adoptedT - 5, 0.0);
            assertEquals(Status.EPOCH_NOT_INCREASING, tk.cycle(back, null, null));
            held = false; // a reading that does not confirm drops the held one
          }
          return;
        }
      }
      t++;
      assertEquals(Status.OK, raw.set(850_000_000L + t, 0.0));
      final boolean far = adoptedT >= 0 && t - adoptedT > ClockCorrector.DEFAULT_MAX_RAW_STEP_S;
      final int verdict = tk.cycle(raw, withOrbit ? s : null, withMeas ? m : null);
      cycled = true;
      final boolean confirmed = held && t - heldT > 0 && t - heldT <= ClockCorrector.DEFAULT_MAX_RAW_STEP_S;
      if (far && !confirmed) { // a jump nobody confirmed yet: refused, the inputs of the cycle unused
        assertEquals(Status.EPOCH_JUMP, verdict);
        held = true;
        heldT = t;
        measurements -= withMeas ? 1 : 0;
        orbits -= withOrbit ? 1 : 0;
        check();
        return;
      }
      held = false;
      adoptedT = t;
      check();
      assertEquals(far ? Status.RAW_CLOCK_JUMP : Status.OK, hk.rawClockStatus(), "the gate's verdict");
      if (withMeas) {
        assertEquals(hk.lastMeasurementStatus(), verdict, "the verdict returned is the one counted");
      }
    }

    void check() {
      tk.housekeeping(hk);
      tk.correctedTime(raw, corr);
      assertTrue(Double.isFinite(corr.fractionS()));
      assertTrue(hk.mode() >= ServoMode.STANDBY && hk.mode() < ServoMode.COUNT);
      for (double v : new double[] {hk.phaseS(), hk.sigmaPhaseS(), hk.frequency(), hk.command(), hk.steeringPhaseS(),
          hk.modelRate(), hk.modelOffsetS(), hk.modelRateErrorBound(), hk.sinceMeasurementS()}) {
        assertTrue(Double.isFinite(v), "non-finite housekeeping");
      }
      int mSum = 0;
      int oSum = 0;
      for (int c = 0; c < Status.COUNT; c++) {
        mSum += hk.measurementCounts(c);
        oSum += hk.orbitCounts(c);
      }
      assertEquals(measurements, mSum, "every measurement counted once");
      assertEquals(orbits, oSum, "every orbit sample counted once");
    }
  }

  @Test
  void randomActionSequencesKeepTheInvariants() {
    qt().withExamples(300).withFixedSeed(20261202L)
        .forAll(lists().of(integers().between(0, 11)).ofSizeBetween(1, 400))
        .checkAssert((List<Integer> actions) -> {
          final Run run = new Run();
          for (int a : actions) {
            run.act(a);
          }
        });
  }
}
