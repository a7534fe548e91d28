package org.eigenzeit.onboard.servo.modes;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.table.ServoParameters;

/**
 * The servo's operating modes as a table-driven state machine. Each cycle the guards of the
 * current mode name at most one {@link ModeEvent}; the transition table gives, for every event,
 * the modes it may fire in, the mode it leads to and what the estimator must do:
 *
 * <pre>
 *   event                  from                   to       estimator
 *   FIRST_MEASUREMENT      STANDBY                ACQUIRE  start from the measurement, zero frequency
 *   CONVERGED              ACQUIRE                TRACK    -
 *   DIVERGED               TRACK                  ACQUIRE  -
 *   PHASE_JUMP_IN_TRACK    TRACK                  ACQUIRE  restart the phase, keep the frequency
 *   MEASUREMENTS_LOST      ACQUIRE, TRACK         COAST    -
 *   RESUMED_SMALL          COAST                  TRACK    -
 *   RESUMED_LARGE          COAST                  ACQUIRE  -
 *   PHASE_JUMP_IN_COAST    COAST                  ACQUIRE  restart the phase, keep the frequency
 *   INPUTS_INVALID         ACQUIRE, TRACK, COAST  SAFE     -
 *   ESTIMATOR_NOT_FINITE   ACQUIRE, TRACK, COAST  SAFE     -
 *   COAST_TOO_LONG         COAST                  SAFE     -
 *   SAFE_RECOVERED         SAFE                   ACQUIRE  restart the phase; zero the frequency if not finite
 *   NO_ACTIVE_TABLE        any                    STANDBY  -
 *   PHASE_JUMP_IN_ACQUIRE  ACQUIRE                ACQUIRE  restart the phase, keep the frequency
 * </pre>
 *
 * Guards (thresholds from the parameter table): INPUTS_INVALID and ESTIMATOR_NOT_FINITE are
 * checked first in every mode but STANDBY and SAFE; CONVERGED needs HYSTERESIS_COUNT consecutive
 * accepted updates with |x| and sigma_x below TRACK_ENTER, DIVERGED as many with |x| above
 * TRACK_EXIT; MEASUREMENTS_LOST after COAST_AFTER without an accepted measurement, COAST_TOO_LONG
 * after COAST_MAX; SAFE_RECOVERED after SAFE_EXIT_COUNT consecutive cycles with a usable orbit and
 * an accepted measurement. Entering SAFE clears the good-cycle count; SAFE_RECOVERED clears the
 * invalid-cycle count; a mode change clears both hysteresis counts.
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class ModeMachine {
  /** Estimator action: none. */
  public static final int KEEP_ESTIMATE = 0;
  /** Estimator action: restart the phase from the pending measurement, keep frequency and drift. */
  public static final int RESTART_PHASE = 1;
  /** Estimator action: restart the phase and zero frequency and drift. */
  public static final int RESTART_ALL = 2;
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 8 * 4 + ServoMode.COUNT * 8;

  private static final int STANDBY = 1 << ServoMode.STANDBY;
  private static final int ACQUIRE = 1 << ServoMode.ACQUIRE;
  private static final int TRACK = 1 << ServoMode.TRACK;
  private static final int COAST = 1 << ServoMode.COAST;
  private static final int SAFE = 1 << ServoMode.SAFE;
  private static final int ANY = STANDBY | ACQUIRE | TRACK | COAST | SAFE;
  /** Sentinel action of SAFE_RECOVERED: RESTART_ALL when the estimator is not finite. */
  private static final int RESTART_IF_UNHEALTHY = 3;

  /** The transition table, indexed by event: {modes it may fire in (mask), target mode, action}. */
  private static final int[][] TABLE = {
    {0, ServoMode.STANDBY, KEEP_ESTIMATE}, // NONE: never fires
    {STANDBY, ServoMode.ACQUIRE, RESTART_ALL},
    {ACQUIRE, ServoMode.TRACK, KEEP_ESTIMATE},
    {TRACK, ServoMode.ACQUIRE, KEEP_ESTIMATE},
    {TRACK, ServoMode.ACQUIRE, RESTART_PHASE},
    {ACQUIRE | TRACK, ServoMode.COAST, KEEP_ESTIMATE},
    {COAST, ServoMode.TRACK, KEEP_ESTIMATE},
    {COAST, ServoMode.ACQUIRE, KEEP_ESTIMATE},
    {COAST, ServoMode.ACQUIRE, RESTART_PHASE},
    {ACQUIRE | TRACK | COAST, ServoMode.SAFE, KEEP_ESTIMATE},
    {ACQUIRE | TRACK | COAST, ServoMode.SAFE, KEEP_ESTIMATE},
    {COAST, ServoMode.SAFE, KEEP_ESTIMATE},
    {SAFE, ServoMode.ACQUIRE, RESTART_IF_UNHEALTHY},
    {ANY, ServoMode.STANDBY, KEEP_ESTIMATE},
    {ACQUIRE, ServoMode.ACQUIRE, RESTART_PHASE},
  };

  private final double[] timeInMode = new double[ServoMode.COUNT];
  private int mode = ServoMode.STANDBY;
  private int lastEvent = ModeEvent.NONE;
  private int transitions;
  private int enterCount;
  private int exitCount;
  private int invalidCycles;
  private int safeGoodCycles;

  /** Creates the machine in STANDBY. */
  public ModeMachine() {
    // STANDBY
  }

  /**
   * Counts time in the current mode.
   *
   * @param dt elapsed seconds (positive)
   */
  public void advance(double dt) {
    timeInMode[mode] += dt;
  }

  /** No active parameter table: STANDBY. */
  public void standby() {
    fire(ModeEvent.NO_ACTIVE_TABLE, null);
  }

  /**
   * One cycle with an active table: names this cycle's event from the guards and fires it.
   *
   * @param accepted whether a measurement was accepted this cycle
   * @param verdict the measurement's verdict ({@link Status#PHASE_JUMP} matters)
   * @param orbitUsable whether the model had a usable orbit this cycle
   * @param est the estimator after this cycle's update (read)
   * @param sinceAcceptedS seconds since the last accepted measurement
   * @param p the active parameters
   * @return the estimator action of the event: {@link #KEEP_ESTIMATE}, {@link #RESTART_PHASE}
   *     or {@link #RESTART_ALL}
   */
  public int step(boolean accepted, int verdict, boolean orbitUsable, ClockEstimator est, double sinceAcceptedS,
      ServoParameters p) {
    invalidCycles = (!orbitUsable && !accepted) ? invalidCycles + 1 : 0;
    return fire(event(accepted, verdict, orbitUsable, est, sinceAcceptedS, p), est);
  }

  private int event(boolean accepted, int verdict, boolean orbitUsable, ClockEstimator est, double sinceAcceptedS,
      ServoParameters p) {
    if (mode != ServoMode.STANDBY && mode != ServoMode.SAFE) {
      if (!est.isHealthy()) {
        return ModeEvent.ESTIMATOR_NOT_FINITE;
      }
      if (invalidCycles >= (int) p.get(ServoParameters.F_SAFE_AFTER_INVALID)) {
        return ModeEvent.INPUTS_INVALID;
      }
    }
    switch (mode) {
      case ServoMode.STANDBY:
        return accepted ? ModeEvent.FIRST_MEASUREMENT : ModeEvent.NONE;
      case ServoMode.ACQUIRE:
        return acquire(accepted, verdict, est, sinceAcceptedS, p);
      case ServoMode.TRACK:
        return track(accepted, verdict, est, sinceAcceptedS, p);
      case ServoMode.COAST:
        if (verdict == Status.PHASE_JUMP) {
          return ModeEvent.PHASE_JUMP_IN_COAST;
        }
        if (accepted) {
          return Math.abs(est.phaseS()) < p.get(ServoParameters.F_TRACK_EXIT_S) ? ModeEvent.RESUMED_SMALL
              : ModeEvent.RESUMED_LARGE;
        }
        return sinceAcceptedS > p.get(ServoParameters.F_COAST_MAX_S) ? ModeEvent.COAST_TOO_LONG : ModeEvent.NONE;
      default: // SAFE
        safeGoodCycles = (orbitUsable && accepted) ? safeGoodCycles + 1 : 0;
        return safeGoodCycles >= (int) p.get(ServoParameters.F_SAFE_EXIT_COUNT) ? ModeEvent.SAFE_RECOVERED
            : ModeEvent.NONE;
    }
  }

  private int acquire(boolean accepted, int verdict, ClockEstimator est, double sinceAcceptedS, ServoParameters p) {
    if (verdict == Status.PHASE_JUMP) {
      return ModeEvent.PHASE_JUMP_IN_ACQUIRE;
    }
    if (accepted) {
      final double enter = p.get(ServoParameters.F_TRACK_ENTER_S);
      final boolean small = Math.abs(est.phaseS()) < enter && Math.sqrt(est.covariance(0, 0)) < enter;
      enterCount = small ? enterCount + 1 : 0;
      return enterCount >= (int) p.get(ServoParameters.F_HYSTERESIS_COUNT) ? ModeEvent.CONVERGED : ModeEvent.NONE;
    }
    return sinceAcceptedS > p.get(ServoParameters.F_COAST_AFTER_S) ? ModeEvent.MEASUREMENTS_LOST : ModeEvent.NONE;
  }

  private int track(boolean accepted, int verdict, ClockEstimator est, double sinceAcceptedS, ServoParameters p) {
    if (verdict == Status.PHASE_JUMP) {
      return ModeEvent.PHASE_JUMP_IN_TRACK;
    }
    if (accepted) {
      exitCount = Math.abs(est.phaseS()) > p.get(ServoParameters.F_TRACK_EXIT_S) ? exitCount + 1 : 0;
      return exitCount >= (int) p.get(ServoParameters.F_HYSTERESIS_COUNT) ? ModeEvent.DIVERGED : ModeEvent.NONE;
    }
    return sinceAcceptedS > p.get(ServoParameters.F_COAST_AFTER_S) ? ModeEvent.MEASUREMENTS_LOST : ModeEvent.NONE;
  }

  /** Applies an event through the table; returns its estimator action. */
  private int fire(int event, ClockEstimator est) {
    final int[] row = TABLE[event];
    if ((row[0] & (1 << mode)) == 0) {
      return KEEP_ESTIMATE; // NONE, or an event not allowed in this mode: no transition
    }
    final int target = row[1];
    if (target == ServoMode.SAFE) {
      safeGoodCycles = 0;
    }
    if (event == ModeEvent.SAFE_RECOVERED) {
      invalidCycles = 0;
    }
    if (target != mode) {
      mode = target;
      transitions++;
      lastEvent = event;
      enterCount = 0;
      exitCount = 0;
    }
    final int action = row[2];
    return action == RESTART_IF_UNHEALTHY ? (est.isHealthy() ? RESTART_PHASE : RESTART_ALL) : action;
  }

  /**
   * The transition table's target for an event (for tests and displays).
   *
   * @param event an event code
   * @return the mode it leads to, or -1 for an unknown code
   */
  public static int targetOf(int event) {
    return event >= 0 && event < ModeEvent.COUNT ? TABLE[event][1] : -1;
  }

  /**
   * Whether the table lets an event fire in a mode.
   *
   * @param event an event code
   * @param fromMode a mode code
   * @return true when allowed
   */
  public static boolean allows(int event, int fromMode) {
    return event >= 0 && event < ModeEvent.COUNT && fromMode >= 0 && fromMode < ServoMode.COUNT
        && (TABLE[event][0] & (1 << fromMode)) != 0;
  }

  /**
   * Returns the mode code.
   *
   * @return the mode
   */
  public int mode() {
    return mode;
  }

  /**
   * Returns the event of the last transition.
   *
   * @return the event code
   */
  public int lastEvent() {
    return lastEvent;
  }

  /**
   * Returns the number of transitions.
   *
   * @return the count
   */
  public int transitions() {
    return transitions;
  }

  /**
   * Seconds spent in a mode.
   *
   * @param m mode code
   * @return the time, s (0 for codes out of range)
   */
  public double timeInModeS(int m) {
    return m >= 0 && m < ServoMode.COUNT ? timeInMode[m] : 0.0;
  }

  /**
   * Writes the machine's state.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    w.putInt(mode);
    w.putInt(lastEvent);
    w.putInt(transitions);
    w.putInt(enterCount);
    w.putInt(exitCount);
    w.putInt(invalidCycles);
    w.putInt(safeGoodCycles);
    w.putInt(0); // reserved
    for (int i = 0; i < ServoMode.COUNT; i++) {
      w.putDouble(timeInMode[i]);
    }
  }

  /**
   * Restores the state: mode and event codes known, counts and times not negative.
   *
   * @param r the reader (refusals latch in it)
   */
  public void restore(StateReader r) {
    mode = r.getIntIn(0, ServoMode.COUNT - 1);
    lastEvent = r.getIntIn(0, ModeEvent.COUNT - 1);
    transitions = r.getIntIn(0, Integer.MAX_VALUE);
    enterCount = r.getIntIn(0, Integer.MAX_VALUE);
    exitCount = r.getIntIn(0, Integer.MAX_VALUE);
    invalidCycles = r.getIntIn(0, Integer.MAX_VALUE);
    safeGoodCycles = r.getIntIn(0, Integer.MAX_VALUE);
    r.getIntIn(0, 0);
    for (int i = 0; i < ServoMode.COUNT; i++) {
      timeInMode[i] = r.getDoubleIn(0.0, Double.MAX_VALUE);
    }
  }
}
