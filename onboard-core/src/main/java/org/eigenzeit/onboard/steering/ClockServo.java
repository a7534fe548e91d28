package org.eigenzeit.onboard.steering;

import org.eigenzeit.onboard.math.CompensatedSum;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The clock servo: validates time-offset measurements, runs the {@link ClockEstimator}, steers the
 * oscillator's synthesizer and moves between the operating modes of {@link ServoMode}.
 *
 * <p><b>Steering law</b> (state feedback on the Kalman estimate with pole placement: Farina,
 * Galleani, Tavella and Bittanti 2010, "A control theory approach to clock steering techniques",
 * IEEE Trans. UFFC 57(10):2257-2270): {@code u = -y_hat - x_hat / T}, so that the estimated
 * frequency error is cancelled and the phase error decays with time constant T (T_acquire or
 * T_track from the table). In COAST {@code u = -y_hat} (hold the last frequency estimate; the
 * relativistic model keeps running outside the servo); in SAFE the last command is held. The
 * command is quantised to the table's resolution (a fractional step or a DDS tuning-word LSB),
 * limited in size and in slew rate per second. In ACQUIRE a phase step of {@code -x_hat}
 * (quantised) is made when |x_hat| exceeds the table's threshold.
 *
 * <p><b>State table</b> (event that drives each transition):
 *
 * <pre>
 * from        event                                                   to
 * STANDBY     first accepted measurement with an active table         ACQUIRE
 * ACQUIRE     |x| and sigma_x below TRACK_ENTER for N updates         TRACK
 * TRACK       |x| above TRACK_EXIT for N updates                      ACQUIRE
 * TRACK       phase jump (PHASE_JUMP_COUNT consistent outliers)       ACQUIRE
 * ACQ/TRACK   no accepted measurement for COAST_AFTER                 COAST
 * COAST       accepted measurement, |x| below TRACK_EXIT              TRACK
 * COAST       accepted measurement, |x| at or above TRACK_EXIT        ACQUIRE
 * COAST       phase jump                                              ACQUIRE
 * COAST       no accepted measurement for COAST_MAX                   SAFE
 * ACQ/TRACK/  SAFE_AFTER_INVALID cycles with neither a usable orbit   SAFE
 *   COAST       nor an accepted measurement; or estimator not finite
 * SAFE        SAFE_EXIT_COUNT cycles with a usable orbit and a        ACQUIRE
 *               valid measurement
 * </pre>
 *
 * Hysteresis: TRACK_EXIT exceeds TRACK_ENTER (checked when the table loads) and both directions
 * need HYSTERESIS_COUNT consecutive updates.
 *
 * <p><b>Measurement validation</b> (first failure wins, counted): producer flag (INVALID_INPUT),
 * source index (OUT_OF_RANGE), NaN (NOT_FINITE), |offset| above MAX_ABS_OFFSET (OUT_OF_RANGE),
 * epoch after the cycle (EPOCH_JUMP), older than MEASUREMENT_MAX_AGE (STALE), not after the last
 * accepted (EPOCH_NOT_INCREASING), innovation gate (OUTLIER), and PHASE_JUMP when the outliers
 * agree with each other.
 *
 * <p>Not thread-safe: one owner. No allocation after construction; never throws after it.
 */
public final class ClockServo {
  private final ServoParameters params;
  /** Activation count the derived values below were computed for (-1: none yet). */
  private int cachedActivation = -1;
  private double invTauAcquire;
  private double invTauTrack;
  private double invSteerResolution;
  private final ClockEstimator est = new ClockEstimator();
  private final CompensatedSum steeringPhase = new CompensatedSum();
  private final CompensatedSum phaseStepTotal = new CompensatedSum();
  private final SplitTime lastCycle = new SplitTime();
  private final SplitTime lastAccepted = new SplitTime();
  private final int[] counters = new int[Status.COUNT];
  private final double[] timeInMode = new double[ServoMode.COUNT];
  private boolean haveCycle;
  private boolean haveAccepted;
  private int mode = ServoMode.STANDBY;
  private double command;
  private double sinceAcceptedS;
  private int enterCount;
  private int exitCount;
  private int invalidCycles;
  private int safeGoodCycles;
  private int jumpCount;
  private double lastOutlierInnovation;
  private double pendingPhase;
  private int phaseJumps;
  private int phaseSteps;
  private int modeTransitions;
  private int lastMeasurementStatus = Status.NOT_READY;
  private int lastEvent;

  /**
   * Creates a servo reading its parameters from a table holder (the table may be loaded and
   * activated later; until then the servo stays in STANDBY).
   *
   * @param params the parameter table
   */
  public ClockServo(ServoParameters params) {
    this.params = params;
  }

  /**
   * One servo cycle.
   *
   * @param nowCorrected the cycle time on the corrected onboard scale (may step back after a
   *     phase step; measurement ages are taken against it)
   * @param dtS time since the previous cycle on the steady raw clock, s (non-negative; the
   *     timekeeper refuses a raw clock going backwards before calling the servo)
   * @param orbitUsable whether the relativistic model has a usable orbit this cycle
   * @param m the newest measurement, or null
   * @return the measurement's verdict ({@link Status#OK} when accepted, a fault code when
   *     rejected; every measurement offered with an active table is counted), {@link
   *     Status#NOT_READY} without an active table, or {@link Status#OK} when there was no
   *     measurement
   */
  public int cycle(SplitTime nowCorrected, double dtS, boolean orbitUsable, TimeOffsetMeasurement m) {
    final double dt = (dtS >= 0 && dtS <= 1e7) ? dtS : 0.0;
    advance(dt);
    lastCycle.setTo(nowCorrected);
    haveCycle = true;
    if (!params.isActive()) {
      setMode(ServoMode.STANDBY, 0);
      command = 0.0;
      return Status.NOT_READY;
    }
    refreshParameters();
    int verdict = Status.OK;
    boolean accepted = false;
    if (m != null) {
      verdict = validate(m, nowCorrected);
      if (verdict == Status.OK) {
        verdict = absorb(m, nowCorrected);
        accepted = verdict == Status.OK;
      }
      counters[verdict]++;
      lastMeasurementStatus = verdict;
    }
    transitions(accepted, verdict, orbitUsable, m != null && verdict == Status.OK);
    steer(dt);
    return verdict;
  }

  private void advance(double dt) {
    if (dt <= 0) {
      return;
    }
    steeringPhase.add(command * dt);
    timeInMode[mode] += dt;
    sinceAcceptedS += dt;
    if (mode != ServoMode.STANDBY) {
      est.predict(dt, command);
    }
  }

  /** Derived values of the active table, recomputed only when a new table is activated. */
  private void refreshParameters() {
    final int activation = params.activations();
    if (activation == cachedActivation) {
      return;
    }
    cachedActivation = activation;
    est.configure(params.get(ServoParameters.F_SIGMA_WHITE_FM), params.get(ServoParameters.F_SIGMA_RANDOM_WALK_FM),
        params.get(ServoParameters.F_SIGMA_RANDOM_RUN));
    invTauAcquire = 1.0 / params.get(ServoParameters.F_TIME_CONSTANT_ACQUIRE_S);
    invTauTrack = 1.0 / params.get(ServoParameters.F_TIME_CONSTANT_TRACK_S);
    final double res = params.get(ServoParameters.F_STEER_RESOLUTION);
    invSteerResolution = res > 0 ? 1.0 / res : 0.0;
  }

  private int validate(TimeOffsetMeasurement m, SplitTime now) {
    if (!m.valid()) {
      return Status.INVALID_INPUT;
    }
    if (m.source() < 0 || m.source() >= TimeOffsetMeasurement.SOURCES) {
      return Status.OUT_OF_RANGE;
    }
    final double z = m.offsetS();
    if (!Double.isFinite(z)) {
      return Status.NOT_FINITE;
    }
    if (Math.abs(z) > params.get(ServoParameters.F_MAX_ABS_OFFSET_S)) {
      return Status.OUT_OF_RANGE;
    }
    final double age = now.secondsSince(m.epochRef());
    if (age < -1.0) {
      return Status.EPOCH_JUMP;
    }
    if (age > params.get(ServoParameters.F_MEASUREMENT_MAX_AGE_S)) {
      return Status.STALE;
    }
    if (haveAccepted && m.epochRef().compareTo(lastAccepted) <= 0) {
      return Status.EPOCH_NOT_INCREASING;
    }
    return Status.OK;
  }

  private double sourceVariance(int source) {
    final double s = params.get(ServoParameters.F_SIGMA_SOURCE0 + source);
    return s * s;
  }

  /** Gating and update; returns OK, OUTLIER or PHASE_JUMP. */
  private int absorb(TimeOffsetMeasurement m, SplitTime now) {
    final double age = Math.max(0.0, now.secondsSince(m.epochRef()));
    final double r = sourceVariance(m.source());
    if (mode == ServoMode.STANDBY || mode == ServoMode.SAFE) {
      // Initialisation (STANDBY) or re-initialisation after SAFE happens in the transitions.
      lastAccepted.setTo(m.epochRef());
      haveAccepted = true;
      sinceAcceptedS = 0.0;
      pendingPhase = m.offsetS() + (est.frequency() + command) * age;
      return Status.OK;
    }
    final double z = m.offsetS() + (est.frequency() + command) * age;
    est.innovate(z, r);
    final double gate = params.get(ServoParameters.F_GATE_SIGMA) * Math.sqrt(est.lastInnovationVariance());
    final double nu = est.lastInnovationS();
    if (Math.abs(nu) <= gate) {
      est.update(r);
      lastAccepted.setTo(m.epochRef());
      haveAccepted = true;
      sinceAcceptedS = 0.0;
      jumpCount = 0;
      return Status.OK;
    }
    if (jumpCount > 0 && Math.abs(nu - lastOutlierInnovation) <= gate) {
      jumpCount++;
    } else {
      jumpCount = 1;
    }
    lastOutlierInnovation = nu;
    if (jumpCount >= (int) params.get(ServoParameters.F_PHASE_JUMP_COUNT)) {
      jumpCount = 0;
      phaseJumps++;
      pendingPhase = z;
      lastAccepted.setTo(m.epochRef());
      haveAccepted = true;
      sinceAcceptedS = 0.0;
      return Status.PHASE_JUMP;
    }
    return Status.OUTLIER;
  }

  private void reinitialize(boolean resetFrequency) {
    est.initialize(pendingPhase, params.get(ServoParameters.F_INITIAL_SIGMA_PHASE_S),
        params.get(ServoParameters.F_INITIAL_SIGMA_FREQUENCY), params.get(ServoParameters.F_INITIAL_SIGMA_DRIFT_PER_S),
        resetFrequency);
  }

  private void transitions(boolean accepted, int verdict, boolean orbitUsable, boolean validMeasurement) {
    final int n = (int) params.get(ServoParameters.F_HYSTERESIS_COUNT);
    final double enter = params.get(ServoParameters.F_TRACK_ENTER_S);
    final double exit = params.get(ServoParameters.F_TRACK_EXIT_S);
    final boolean invalidCycle = !orbitUsable && !accepted;
    invalidCycles = invalidCycle ? invalidCycles + 1 : 0;
    if (mode != ServoMode.STANDBY && mode != ServoMode.SAFE
        && (!est.isHealthy() || invalidCycles >= (int) params.get(ServoParameters.F_SAFE_AFTER_INVALID))) {
      setMode(ServoMode.SAFE, est.isHealthy() ? 9 : 10);
      safeGoodCycles = 0;
      return;
    }
    switch (mode) {
      case ServoMode.STANDBY:
        if (accepted) {
          reinitialize(true);
          setMode(ServoMode.ACQUIRE, 1);
        }
        break;
      case ServoMode.ACQUIRE:
        if (verdict == Status.PHASE_JUMP) {
          reinitialize(false);
        } else if (accepted) {
          final boolean small = Math.abs(est.phaseS()) < enter && Math.sqrt(est.covariance(0, 0)) < enter;
          enterCount = small ? enterCount + 1 : 0;
          if (enterCount >= n) {
            setMode(ServoMode.TRACK, 2);
          }
        } else if (sinceAcceptedS > params.get(ServoParameters.F_COAST_AFTER_S)) {
          setMode(ServoMode.COAST, 5);
        }
        break;
      case ServoMode.TRACK:
        if (verdict == Status.PHASE_JUMP) {
          reinitialize(false);
          setMode(ServoMode.ACQUIRE, 4);
        } else if (accepted) {
          exitCount = Math.abs(est.phaseS()) > exit ? exitCount + 1 : 0;
          if (exitCount >= n) {
            setMode(ServoMode.ACQUIRE, 3);
          }
        } else if (sinceAcceptedS > params.get(ServoParameters.F_COAST_AFTER_S)) {
          setMode(ServoMode.COAST, 5);
        }
        break;
      case ServoMode.COAST:
        if (verdict == Status.PHASE_JUMP) {
          reinitialize(false);
          setMode(ServoMode.ACQUIRE, 8);
        } else if (accepted) {
          setMode(Math.abs(est.phaseS()) < exit ? ServoMode.TRACK : ServoMode.ACQUIRE,
              Math.abs(est.phaseS()) < exit ? 6 : 7);
        } else if (sinceAcceptedS > params.get(ServoParameters.F_COAST_MAX_S)) {
          setMode(ServoMode.SAFE, 11);
          safeGoodCycles = 0;
        }
        break;
      default: // SAFE
        safeGoodCycles = (orbitUsable && validMeasurement) ? safeGoodCycles + 1 : 0;
        if (safeGoodCycles >= (int) params.get(ServoParameters.F_SAFE_EXIT_COUNT)) {
          reinitialize(!est.isHealthy());
          invalidCycles = 0;
          setMode(ServoMode.ACQUIRE, 12);
        }
        break;
    }
  }

  private void setMode(int newMode, int event) {
    if (newMode != mode) {
      mode = newMode;
      modeTransitions++;
      lastEvent = event;
      enterCount = 0;
      exitCount = 0;
    }
  }

  private void steer(double dt) {
    double u;
    switch (mode) {
      case ServoMode.ACQUIRE:
        phaseStep();
        u = -est.frequency() - est.phaseS() * invTauAcquire;
        break;
      case ServoMode.TRACK:
        u = -est.frequency() - est.phaseS() * invTauTrack;
        break;
      case ServoMode.COAST:
        u = -est.frequency();
        break;
      case ServoMode.SAFE:
        return;
      default:
        command = 0.0;
        return;
    }
    final double res = params.get(ServoParameters.F_STEER_RESOLUTION);
    if (res > 0) {
      u = Math.rint(u * invSteerResolution) * res;
    }
    final double max = params.get(ServoParameters.F_STEER_MAX);
    u = Math.max(-max, Math.min(max, u));
    final double slew = params.get(ServoParameters.F_SLEW_MAX_PER_S) * Math.max(dt, 1.0);
    u = Math.max(command - slew, Math.min(command + slew, u));
    if (Double.isFinite(u)) {
      command = u;
    }
  }

  private void phaseStep() {
    final double res = params.get(ServoParameters.F_PHASE_STEP_RESOLUTION_S);
    final double x = est.phaseS();
    if (res > 0 && Math.abs(x) > params.get(ServoParameters.F_PHASE_STEP_THRESHOLD_S)) {
      final double step = -Math.rint(x / res) * res;
      steeringPhase.add(step);
      phaseStepTotal.add(step);
      est.shiftPhase(step);
      phaseSteps++;
    }
  }

  /**
   * The accumulated steering (frequency commands integrated over time plus phase steps) at the
   * last cycle, s.
   *
   * @return the steering phase
   */
  public double steeringPhaseS() {
    return steeringPhase.value();
  }

  /**
   * The steering phase extrapolated to a later instant with the current command.
   *
   * @param t instant on the corrected scale
   * @return the steering phase, s
   */
  public double steeringPhaseAtS(SplitTime t) {
    return steeringPhase.value() + (haveCycle ? command * t.secondsSince(lastCycle) : 0.0);
  }

  /**
   * The sum of the phase steps commanded so far (part of {@link #steeringPhaseS()}). A host whose
   * counter is steered in frequency by the synthesizer applies these steps in software.
   *
   * @return the phase steps, s
   */
  public double phaseStepTotalS() {
    return phaseStepTotal.value();
  }

  /**
   * Returns the current frequency command (fractional).
   *
   * @return the current frequency command (fractional)
   */
  public double command() {
    return command;
  }

  /**
   * Returns the mode code.
   *
   * @return the mode code
   */
  public int mode() {
    return mode;
  }

  /**
   * Returns the event code of the last mode transition (see docs/servo.md).
   *
   * @return the event code of the last mode transition (see docs/servo.md)
   */
  public int lastEvent() {
    return lastEvent;
  }

  /**
   * Returns the estimator (read-only use).
   *
   * @return the estimator (read-only use)
   */
  public ClockEstimator estimator() {
    return est;
  }

  /**
   * Measurements that received a verdict.
   *
   * @param code status code
   * @return the count
   */
  public int count(int code) {
    return code >= 0 && code < Status.COUNT ? counters[code] : 0;
  }

  /**
   * Seconds spent in a mode.
   *
   * @param m mode code
   * @return the time, s
   */
  public double timeInModeS(int m) {
    return m >= 0 && m < ServoMode.COUNT ? timeInMode[m] : 0.0;
  }

  /**
   * Returns the number of phase jumps declared.
   *
   * @return the number of phase jumps declared
   */
  public int phaseJumps() {
    return phaseJumps;
  }

  /**
   * Returns the number of phase steps commanded.
   *
   * @return the number of phase steps commanded
   */
  public int phaseSteps() {
    return phaseSteps;
  }

  /**
   * Returns the number of mode transitions.
   *
   * @return the number of mode transitions
   */
  public int modeTransitions() {
    return modeTransitions;
  }

  /**
   * Returns the verdict on the last measurement.
   *
   * @return the verdict on the last measurement
   */
  public int lastMeasurementStatus() {
    return lastMeasurementStatus;
  }

  /**
   * Returns seconds since the last accepted measurement.
   *
   * @return seconds since the last accepted measurement
   */
  public double sinceAcceptedS() {
    return sinceAcceptedS;
  }

  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = ClockEstimator.STATE_BYTES + 8 * 8 + 2 * 16 + 16 * 4
      + (Status.COUNT + ServoMode.COUNT * 2) * 4 + 8;

  /**
   * Writes the servo state.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    est.save(w);
    w.putDouble(steeringPhase.high());
    w.putDouble(steeringPhase.low());
    w.putDouble(command);
    w.putDouble(sinceAcceptedS);
    w.putDouble(lastOutlierInnovation);
    w.putDouble(pendingPhase);
    w.putDouble(phaseStepTotal.high());
    w.putDouble(phaseStepTotal.low());
    w.putLong(lastCycle.wholeSeconds());
    w.putDouble(lastCycle.fractionS());
    w.putLong(lastAccepted.wholeSeconds());
    w.putDouble(lastAccepted.fractionS());
    w.putBoolean(haveCycle);
    w.putBoolean(haveAccepted);
    w.putInt(mode);
    w.putInt(enterCount);
    w.putInt(exitCount);
    w.putInt(invalidCycles);
    w.putInt(safeGoodCycles);
    w.putInt(jumpCount);
    w.putInt(phaseJumps);
    w.putInt(phaseSteps);
    w.putInt(modeTransitions);
    w.putInt(lastMeasurementStatus);
    w.putInt(lastEvent);
    w.putInt(0);
    w.putInt(0);
    w.putInt(0);
    for (int i = 0; i < Status.COUNT; i++) {
      w.putInt(counters[i]);
    }
    for (int i = 0; i < ServoMode.COUNT; i++) {
      w.putDouble(timeInMode[i]);
    }
    w.putLong(0L);
  }

  /**
   * Restores the servo state (integrity checked by the caller).
   *
   * @param r the reader
   * @return the reader's status
   */
  public int restore(StateReader r) {
    est.restore(r);
    final double hi = r.getDouble();
    final double lo = r.getDouble();
    steeringPhase.set(hi, lo);
    command = r.getDouble();
    sinceAcceptedS = r.getDouble();
    lastOutlierInnovation = r.getDouble();
    pendingPhase = r.getDouble();
    final double stepHi = r.getDouble();
    final double stepLo = r.getDouble();
    phaseStepTotal.set(stepHi, stepLo);
    final long cw = r.getLong();
    final double cf = r.getDouble();
    final long aw = r.getLong();
    final double af = r.getDouble();
    if (lastCycle.set(cw, cf) != Status.OK || lastAccepted.set(aw, af) != Status.OK) {
      return Status.MALFORMED;
    }
    haveCycle = r.getBoolean();
    haveAccepted = r.getBoolean();
    mode = r.getInt();
    enterCount = r.getInt();
    exitCount = r.getInt();
    invalidCycles = r.getInt();
    safeGoodCycles = r.getInt();
    jumpCount = r.getInt();
    phaseJumps = r.getInt();
    phaseSteps = r.getInt();
    modeTransitions = r.getInt();
    lastMeasurementStatus = r.getInt();
    lastEvent = r.getInt();
    r.getInt();
    r.getInt();
    r.getInt();
    for (int i = 0; i < Status.COUNT; i++) {
      counters[i] = r.getInt();
    }
    for (int i = 0; i < ServoMode.COUNT; i++) {
      timeInMode[i] = r.getDouble();
    }
    r.getLong();
    if (mode < 0 || mode >= ServoMode.COUNT) {
      return Status.MALFORMED;
    }
    return r.status();
  }
}
