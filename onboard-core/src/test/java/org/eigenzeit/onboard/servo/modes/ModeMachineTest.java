package org.eigenzeit.onboard.servo.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.servo.Tables;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.table.ServoParameters;
import org.junit.jupiter.api.Test;

/** The mode machine's table against the state table of docs/servo.md, and each guard once. */
class ModeMachineTest {
  private static final ServoParameters P = Tables.active(params());
  private final ModeMachine m = new ModeMachine();
  private final ClockEstimator est = new ClockEstimator();

  private static double[] params() {
    final double[] v = ServoParameters.typicalRubidium();
    v[ServoParameters.F_HYSTERESIS_COUNT] = 2;
    v[ServoParameters.F_SAFE_AFTER_INVALID] = 3;
    v[ServoParameters.F_SAFE_EXIT_COUNT] = 2;
    return v;
  }

  /** The state table of docs/servo.md: event, modes it fires in, mode it leads to. */
  private static final int[][] DOC = {
    {ModeEvent.FIRST_MEASUREMENT, 1 << ServoMode.STANDBY, ServoMode.ACQUIRE},
    {ModeEvent.CONVERGED, 1 << ServoMode.ACQUIRE, ServoMode.TRACK},
    {ModeEvent.DIVERGED, 1 << ServoMode.TRACK, ServoMode.ACQUIRE},
    {ModeEvent.PHASE_JUMP_IN_TRACK, 1 << ServoMode.TRACK, ServoMode.ACQUIRE},
    {ModeEvent.MEASUREMENTS_LOST, (1 << ServoMode.ACQUIRE) | (1 << ServoMode.TRACK), ServoMode.COAST},
    {ModeEvent.RESUMED_SMALL, 1 << ServoMode.COAST, ServoMode.TRACK},
    {ModeEvent.RESUMED_LARGE, 1 << ServoMode.COAST, ServoMode.ACQUIRE},
    {ModeEvent.PHASE_JUMP_IN_COAST, 1 << ServoMode.COAST, ServoMode.ACQUIRE},
    {ModeEvent.INPUTS_INVALID, 14, ServoMode.SAFE},
    {ModeEvent.ESTIMATOR_NOT_FINITE, 14, ServoMode.SAFE},
    {ModeEvent.COAST_TOO_LONG, 1 << ServoMode.COAST, ServoMode.SAFE},
    {ModeEvent.SAFE_RECOVERED, 1 << ServoMode.SAFE, ServoMode.ACQUIRE},
    {ModeEvent.NO_ACTIVE_TABLE, 31, ServoMode.STANDBY},
    {ModeEvent.PHASE_JUMP_IN_ACQUIRE, 1 << ServoMode.ACQUIRE, ServoMode.ACQUIRE},
  };

  @Test
  void tableMatchesTheDocumentedStateTable() {
    assertEquals(ModeEvent.COUNT - 1, DOC.length);
    for (int[] row : DOC) {
      assertEquals(row[2], ModeMachine.targetOf(row[0]), ModeEvent.name(row[0]));
      for (int mode = 0; mode < ServoMode.COUNT; mode++) {
        assertEquals((row[1] & (1 << mode)) != 0, ModeMachine.allows(row[0], mode),
            ModeEvent.name(row[0]) + " from " + ServoMode.name(mode));
      }
    }
    for (int mode = 0; mode < ServoMode.COUNT; mode++) {
      assertFalse(ModeMachine.allows(ModeEvent.NONE, mode), "NONE never fires");
    }
    assertEquals(-1, ModeMachine.targetOf(ModeEvent.COUNT));
    assertFalse(ModeMachine.allows(-1, 0));
    assertFalse(ModeMachine.allows(0, ServoMode.COUNT));
  }

  @Test
  void queriesOutsideTheTableAreAnswered() {
    assertEquals(-1, ModeMachine.targetOf(-1));
    assertFalse(ModeMachine.allows(ModeEvent.COUNT, 0));
    assertFalse(ModeMachine.allows(ModeEvent.CONVERGED, -1));
  }

  @Test
  void namesMatchTheConstants() throws IllegalAccessException {
    int seen = 0;
    for (Field f : ModeEvent.class.getFields()) {
      if (Modifier.isStatic(f.getModifiers()) && f.getType() == int.class && !f.getName().equals("COUNT")) {
        assertEquals(f.getName(), ModeEvent.name(f.getInt(null)));
        seen++;
      }
    }
    assertEquals(ModeEvent.COUNT, seen);
    assertEquals("UNKNOWN", ModeEvent.name(ModeEvent.COUNT));
  }

  private int step(boolean accepted, int verdict, boolean orbit, double since) {
    return m.step(accepted, verdict, orbit, est, since, P);
  }

  @Test
  void everyGuardFiresItsEvent() {
    est.initialize(0.0, 1e-9, 1e-12, 1e-18, true);
    assertEquals(ModeMachine.KEEP_ESTIMATE, step(false, Status.OK, true, 0));
    assertEquals(ServoMode.STANDBY, m.mode());
    assertEquals(ModeMachine.RESTART_ALL, step(true, Status.OK, true, 0));
    assertEquals(ModeEvent.FIRST_MEASUREMENT, m.lastEvent());
    assertEquals(ModeMachine.RESTART_PHASE, step(false, Status.PHASE_JUMP, true, 0));
    assertEquals(ServoMode.ACQUIRE, m.mode(), "a phase jump in ACQUIRE restarts the phase, no transition");
    assertEquals(1, m.transitions());
    step(true, Status.OK, true, 0);
    assertEquals(ServoMode.ACQUIRE, m.mode(), "one small update is not enough (hysteresis 2)");
    step(true, Status.OK, true, 0);
    assertEquals(ModeEvent.CONVERGED, m.lastEvent());
    est.shiftPhase(2e-6);
    step(true, Status.OK, true, 0);
    step(true, Status.OK, true, 0);
    assertEquals(ModeEvent.DIVERGED, m.lastEvent());
    step(false, Status.OK, true, 61);
    assertEquals(ModeEvent.MEASUREMENTS_LOST, m.lastEvent());
    step(true, Status.OK, true, 0);
    assertEquals(ModeEvent.RESUMED_LARGE, m.lastEvent(), "|x| 2 us >= TRACK_EXIT 1 us");
    est.shiftPhase(-2e-6);
    step(true, Status.OK, true, 0);
    step(true, Status.OK, true, 0);
    assertEquals(ModeEvent.CONVERGED, m.lastEvent());
    assertEquals(ModeMachine.RESTART_PHASE, step(false, Status.PHASE_JUMP, true, 0));
    assertEquals(ModeEvent.PHASE_JUMP_IN_TRACK, m.lastEvent());
    step(false, Status.OK, true, 61);
    step(true, Status.OK, true, 0);
    assertEquals(ModeEvent.RESUMED_SMALL, m.lastEvent());
    step(false, Status.OK, true, 61);
    assertEquals(ModeMachine.RESTART_PHASE, step(false, Status.PHASE_JUMP, true, 0));
    assertEquals(ModeEvent.PHASE_JUMP_IN_COAST, m.lastEvent());
    step(false, Status.OK, true, 61);
    step(false, Status.OK, true, 7 * 86_400.0 + 1);
    assertEquals(ModeEvent.COAST_TOO_LONG, m.lastEvent());
    step(true, Status.OK, true, 0);
    assertEquals(ModeMachine.RESTART_PHASE, step(true, Status.OK, true, 0), "healthy: keep the frequency");
    assertEquals(ModeEvent.SAFE_RECOVERED, m.lastEvent());
    for (int k = 0; k < 3; k++) {
      step(false, Status.OK, false, 0);
    }
    assertEquals(ModeEvent.INPUTS_INVALID, m.lastEvent(), "SAFE_AFTER_INVALID = 3 cycles without inputs");
    step(true, Status.OK, false, 0);
    step(true, Status.OK, true, 0);
    assertEquals(ServoMode.SAFE, m.mode(), "good cycles must be consecutive with a usable orbit");
    est.shiftPhase(Double.NaN);
    assertEquals(ModeMachine.RESTART_ALL, step(true, Status.OK, true, 0), "not finite: zero the frequency");
    assertEquals(ModeEvent.SAFE_RECOVERED, m.lastEvent());
    step(true, Status.OK, true, 0); // the machine does not restart the estimator itself: still NaN
    assertEquals(ModeEvent.ESTIMATOR_NOT_FINITE, m.lastEvent());
    m.standby();
    assertEquals(ModeEvent.NO_ACTIVE_TABLE, m.lastEvent());
    assertEquals(ServoMode.STANDBY, m.mode());
  }

  @Test
  void stateSizeIsWhatItWritesAndRestoreChecksCodes() {
    m.advance(5.0);
    final byte[] saved = StateBytes.written(m::save);
    assertEquals(ModeMachine.STATE_BYTES, saved.length);
    final ModeMachine other = new ModeMachine();
    StateReader r = StateBytes.reader(saved);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    assertEquals(5.0, other.timeInModeS(ServoMode.STANDBY), 0.0);
    r = StateBytes.reader(StateBytes.withInt(saved, 4, ModeEvent.COUNT));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "unknown event");
    r = StateBytes.reader(StateBytes.withDouble(saved, 32, -1.0));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "negative time in mode");
    assertTrue(other.timeInModeS(ServoMode.COUNT) == 0.0);
  }
}
