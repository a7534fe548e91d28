package org.eigenzeit.onboard.servo.law;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.servo.Tables;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.table.ServoParameters;
import org.junit.jupiter.api.Test;

/**
 * The steering law as docs/servo.md states it (pole placement after Farina et al. 2010: u = -y -
 * x/T), with quantisation, limits, slew and phase steps; the oracle is the documented rule.
 */
class SteeringLawTest {
  private final ServoParameters p = Tables.active(ServoParameters.typicalRubidium());
  private final SteeringLaw law = new SteeringLaw();
  private final ClockEstimator est = new ClockEstimator();

  @Test
  void trackAndCoastFollowThePolePlacementLaw() {
    law.configure(p);
    est.initialize(3e-8, 1e-9, 1e-12, 1e-18, true); // x = 30 ns, y = 0
    law.steer(ServoMode.TRACK, est, 1.0, p);
    // u = -0 - 30e-9 / 3000 = -1e-11, a multiple of the 1e-15 resolution, within the slew of 1e-10/s.
    assertEquals(-1e-11, law.command(), 1e-24);
    law.steer(ServoMode.COAST, est, 1.0, p);
    assertEquals(0.0, law.command(), 0.0, "COAST cancels the frequency estimate only");
    law.steer(ServoMode.ACQUIRE, est, 3.0, p);
    assertEquals(-3e-10, law.command(), 1e-24, "T_acquire = 100 s (a 3 s cycle allows the slew)");
    final double held = law.command();
    law.steer(ServoMode.SAFE, est, 1.0, p);
    assertEquals(held, law.command(), 0.0, "SAFE holds");
    law.steer(ServoMode.STANDBY, est, 1.0, p);
    assertEquals(0.0, law.command(), 0.0, "STANDBY commands zero");
  }

  @Test
  void slewLimitPhaseStepAndQuantisation() {
    law.configure(p);
    est.initialize(5e-6, 1e-9, 1e-12, 1e-18, true); // 5 us: above the 1 us phase-step threshold
    law.steer(ServoMode.ACQUIRE, est, 1.0, p);
    assertEquals(1, law.phaseSteps());
    assertEquals(-5e-6, law.phaseStepTotalS(), 1e-21, "phase step -x quantised to 1 ns");
    assertEquals(-5e-6, law.steeringPhaseS(), 1e-21);
    assertEquals(0.0, est.phaseS(), 1e-21, "the estimator is told of the step");
    est.initialize(0.9e-6, 1e-9, 1e-12, 1e-18, true);
    law.steer(ServoMode.ACQUIRE, est, 1.0, p);
    assertEquals(1, law.phaseSteps(), "below the threshold: no step");
    assertEquals(-1e-10, law.command(), 1e-24, "slew-limited to 1e-10 per second");
    law.steer(ServoMode.ACQUIRE, est, 10.0, p);
    assertEquals(-1.1e-9, law.command(), 1e-22, "a 10 s cycle allows a change of 1e-9");
    law.advance(2.0);
    assertEquals(-5e-6 - 2.2e-9, law.steeringPhaseS(), 1e-20, "the command integrates into S");
  }

  @Test
  void stateSizeIsWhatItWritesAndRestoreChecksTheCommand() {
    law.configure(p);
    est.initialize(3e-8, 1e-9, 1e-12, 1e-18, true);
    law.steer(ServoMode.TRACK, est, 1.0, p);
    final byte[] saved = StateBytes.written(law::save);
    assertEquals(SteeringLaw.STATE_BYTES, saved.length);
    final SteeringLaw other = new SteeringLaw();
    StateReader r = StateBytes.reader(saved);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    assertEquals(law.command(), other.command(), 0.0);
    r = StateBytes.reader(StateBytes.withDouble(saved, 32, Double.NaN));
    other.restore(r);
    assertEquals(Status.NOT_FINITE, r.status(), "a NaN command");
    r = StateBytes.reader(StateBytes.withDouble(saved, 32, 1e-3));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a command beyond any STEER_MAX");
  }

  @Test
  void zeroResolutionsAndANonFiniteEstimate() {
    final double[] v = ServoParameters.typicalRubidium();
    v[ServoParameters.F_STEER_RESOLUTION] = 0;
    v[ServoParameters.F_PHASE_STEP_RESOLUTION_S] = 0;
    final ServoParameters q = Tables.active(v);
    law.configure(q);
    est.initialize(5e-6, 1e-9, 1e-12, 1e-18, true);
    law.steer(ServoMode.ACQUIRE, est, 1.0, q);
    assertEquals(0, law.phaseSteps(), "phase-step resolution 0 disables phase steps");
    assertEquals(-1e-10, law.command(), 0.0, "no quantisation; slew-limited");
    est.shiftPhase(Double.NaN);
    law.steer(ServoMode.TRACK, est, 1.0, q);
    assertEquals(-1e-10, law.command(), 0.0, "a non-finite command is not taken");
  }
}
