package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.servo.modes.ModeEvent;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** Every transition of the servo's state table, each driven by its event (docs/servo.md). */
class ModeTransitionTest {
  private static double[] params() {
    final double[] v = ServoParameters.typicalRubidium();
    v[ServoParameters.F_COAST_MAX_S] = 3600;
    v[ServoParameters.F_SAFE_AFTER_INVALID] = 30;
    v[ServoParameters.F_SAFE_EXIT_COUNT] = 5;
    return v;
  }

  private static LoopHarness tracking() {
    final LoopHarness h = new LoopHarness(params(), 5e-11, 0, 2e-6, 10e-9, 1L);
    assertEquals(ServoMode.STANDBY, h.tk.servo().mode());
    h.run(1, 1, true);
    assertEquals(ServoMode.ACQUIRE, h.tk.servo().mode(), "STANDBY -> ACQUIRE on the first measurement");
    assertEquals(ModeEvent.FIRST_MEASUREMENT, h.tk.servo().lastEvent());
    h.run(4 * 3600, 1, true);
    assertEquals(ServoMode.TRACK, h.tk.servo().mode(), "ACQUIRE -> TRACK when converged");
    assertEquals(ModeEvent.CONVERGED, h.tk.servo().lastEvent());
    assertTrue(h.tk.servo().phaseSteps() >= 1, "the 2 us initial error is removed by a phase step");
    return h;
  }

  @Test
  void standbyWithoutTable() {
    final ClockCorrector tk = new ClockCorrector(ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(false).build(),
        false, false);
    final org.eigenzeit.onboard.steering.TimeOffsetMeasurement m = new org.eigenzeit.onboard.steering.TimeOffsetMeasurement();
    final SplitTime raw = SplitTime.of(1000, 0);
    m.set(raw, 0, 1e-6, true);
    assertEquals(Status.NOT_READY, tk.cycle(raw, null, m));
    assertEquals(ServoMode.STANDBY, tk.servo().mode());
  }

  @Test
  void trackToCoastAndBack() {
    final LoopHarness h = tracking();
    h.run(120, 1, false);
    assertEquals(ServoMode.COAST, h.tk.servo().mode(), "TRACK -> COAST when measurements stop");
    assertEquals(ModeEvent.MEASUREMENTS_LOST, h.tk.servo().lastEvent());
    h.run(1, 1, true);
    assertEquals(ServoMode.TRACK, h.tk.servo().mode(), "COAST -> TRACK when they return, error small");
    assertEquals(ModeEvent.RESUMED_SMALL, h.tk.servo().lastEvent());
  }

  @Test
  void acquireToCoast() {
    final LoopHarness h = new LoopHarness(params(), 5e-11, 0, 2e-6, 10e-9, 2L);
    h.run(5, 1, true);
    assertEquals(ServoMode.ACQUIRE, h.tk.servo().mode());
    h.run(120, 1, false);
    assertEquals(ServoMode.COAST, h.tk.servo().mode(), "ACQUIRE -> COAST");
  }

  @Test
  void coastToSafeToAcquire() {
    final LoopHarness h = tracking();
    h.run(3700, 1, false);
    assertEquals(ServoMode.SAFE, h.tk.servo().mode(), "COAST -> SAFE after COAST_MAX");
    assertEquals(ModeEvent.COAST_TOO_LONG, h.tk.servo().lastEvent());
    h.run(6, 1, true);
    assertEquals(ServoMode.ACQUIRE, h.tk.servo().mode(), "SAFE -> ACQUIRE after SAFE_EXIT_COUNT good cycles");
    assertEquals(ModeEvent.SAFE_RECOVERED, h.tk.servo().lastEvent());
  }

  @Test
  void phaseJumpFromTrackToAcquire() {
    final LoopHarness h = tracking();
    h.truth.setPhase(h.truth.phase() + 5e-6); // the oscillator's phase jumps by 5 us
    int jumps = 0;
    for (int k = 0; k < 10; k++) {
      if (h.run(1, 1, true) == Status.PHASE_JUMP) {
        jumps++;
      }
    }
    assertEquals(1, jumps);
    assertEquals(1, h.tk.servo().phaseJumps());
    assertTrue(h.tk.servo().count(Status.OUTLIER) >= 4);
    assertEquals(ServoMode.ACQUIRE, h.tk.servo().mode(), "TRACK -> ACQUIRE on a phase jump");
    assertEquals(ModeEvent.PHASE_JUMP_IN_TRACK, h.tk.servo().lastEvent());
    h.run(4 * 3600, 1, true);
    assertEquals(ServoMode.TRACK, h.tk.servo().mode());
    assertTrue(Math.abs(h.error) < 5e-9, "recovered: " + h.error);
  }

  @Test
  void phaseJumpWhileCoastingAndLargeErrorAfterCoast() {
    final LoopHarness h = tracking();
    h.run(120, 1, false);
    assertEquals(ServoMode.COAST, h.tk.servo().mode());
    h.truth.setPhase(h.truth.phase() + 5e-6);
    for (int k = 0; k < 6; k++) {
      h.run(1, 1, true);
    }
    assertEquals(ServoMode.ACQUIRE, h.tk.servo().mode(), "COAST -> ACQUIRE on a phase jump");
    assertEquals(ModeEvent.PHASE_JUMP_IN_COAST, h.tk.servo().lastEvent());
  }

  @Test
  void coastToAcquireWhenTheErrorIsStillLarge() {
    final double[] v = params();
    v[ServoParameters.F_TRACK_EXIT_S] = 60e-9;
    // 500 ns initial error: below the phase-step threshold, so acquisition pulls it in slowly.
    final LoopHarness h = new LoopHarness(v, 5e-11, 0, 500e-9, 10e-9, 3L);
    h.run(5, 1, true);
    assertEquals(ServoMode.ACQUIRE, h.tk.servo().mode());
    h.run(120, 1, false);
    assertEquals(ServoMode.COAST, h.tk.servo().mode());
    h.run(1, 1, true);
    assertEquals(ServoMode.ACQUIRE, h.tk.servo().mode(), "COAST -> ACQUIRE when |x| >= TRACK_EXIT");
    assertEquals(ModeEvent.RESUMED_LARGE, h.tk.servo().lastEvent());
  }

  @Test
  void trackToAcquireOnDivergence() {
    final double[] v = params();
    v[ServoParameters.F_TRACK_EXIT_S] = 60e-9;
    v[ServoParameters.F_STEER_MAX] = 1e-11;
    v[ServoParameters.F_GATE_SIGMA] = 100; // accept the growing offsets: no phase-jump path
    final LoopHarness h = new LoopHarness(v, 5e-12, 0, 20e-9, 10e-9, 4L);
    h.run(6 * 3600, 1, true);
    assertEquals(ServoMode.TRACK, h.tk.servo().mode());
    // The oscillator's frequency steps by 5e-11, beyond what the limited steering can cancel:
    // the phase error grows by about 4e-11 s per second while the measurements follow it.
    final LoopHarness.Kick kick = new LoopHarness.Kick(h, 5e-11);
    for (int k = 0; k < 4000 && h.tk.servo().mode() == ServoMode.TRACK; k++) {
      kick.runMeasured(1);
    }
    assertEquals(ServoMode.ACQUIRE, h.tk.servo().mode(), "TRACK -> ACQUIRE on divergence");
    assertEquals(ModeEvent.DIVERGED, h.tk.servo().lastEvent());
  }

  @Test
  void invalidInputsForceSafe() {
    final LoopHarness h = tracking();
    // Orbit unusable (model on, no orbit ever) and no measurements: SAFE after SAFE_AFTER_INVALID.
    final ClockCorrector tk = new ClockCorrector(ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(false).build(),
        true, false);
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(params(), b, 0));
    assertEquals(Status.OK, tk.loadTable(TableId.SERVO, b, 0, b.length));
    assertEquals(Status.OK, tk.activateTable(TableId.SERVO));
    final org.eigenzeit.onboard.steering.TimeOffsetMeasurement m = new org.eigenzeit.onboard.steering.TimeOffsetMeasurement();
    final SplitTime raw = SplitTime.of(850_000_000L, 0);
    m.set(raw, 0, 1e-7, true);
    assertEquals(Status.OK, tk.cycle(raw, null, m));
    assertEquals(ServoMode.ACQUIRE, tk.servo().mode());
    for (int k = 0; k < 40; k++) {
      raw.addWholeSeconds(1);
      assertEquals(Status.OK, tk.cycle(raw, null, null));
    }
    assertEquals(ServoMode.SAFE, tk.servo().mode(), "ACQUIRE -> SAFE on invalid inputs");
    assertEquals(ModeEvent.INPUTS_INVALID, tk.servo().lastEvent());
    assertTrue(h.tk.servo().modeTransitions() >= 2);
  }
}
