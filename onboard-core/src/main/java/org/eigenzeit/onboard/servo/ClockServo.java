package org.eigenzeit.onboard.servo;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.servo.gate.MeasurementGate;
import org.eigenzeit.onboard.servo.law.SteeringLaw;
import org.eigenzeit.onboard.servo.modes.ModeMachine;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The clock servo: one cycle runs, in this order,
 *
 * <pre>
 *   elapsed time   -> {@link SteeringLaw} (steering phase), {@link ModeMachine} (time in mode),
 *                     {@link ClockEstimator} prediction with the applied command
 *   measurement    -> {@link MeasurementGate} validation -> innovation -> gate / phase jump
 *                     -> {@link ClockEstimator} update when accepted
 *   mode           -> {@link ModeMachine} guards and transition table (named events)
 *                     -> estimator restart when the event asks for it
 *   command        -> {@link SteeringLaw} for the mode (phase step in ACQUIRE)
 * </pre>
 *
 * In STANDBY and SAFE an accepted measurement only sets the phase the estimator restarts from
 * (the pending phase); the estimator is not updated.
 *
 * <p>Not thread-safe: one owner. No allocation after construction; never throws after it.
 */
public final class ClockServo {
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = ClockEstimator.STATE_BYTES + MeasurementGate.STATE_BYTES
      + ModeMachine.STATE_BYTES + SteeringLaw.STATE_BYTES + 2 * 8;
  /** Largest |pending phase| accepted on restore, s (the table's largest MAX_ABS_OFFSET). */
  private static final double MAX_PENDING_S = 1.0e3;

  private final ServoParameters params;
  private final ClockEstimator est = new ClockEstimator();
  private final MeasurementGate gate = new MeasurementGate();
  private final ModeMachine modes = new ModeMachine();
  private final SteeringLaw law = new SteeringLaw();
  /** Activation count the derived values were computed for (-1: none yet). */
  private int cachedActivation = -1;
  private double sinceAcceptedS;
  private double pendingPhase;

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
   * @param nowCorrected the cycle time on the corrected onboard scale (measurement ages are taken
   *     against it)
   * @param dtS time since the previous cycle on the steady raw clock, s: taken whole, however long
   *     (the oscillator was steered at the command throughout), so the steering phase and the
   *     corrected time stay continuous across a long gap
   * @param orbitUsable whether the relativistic model has a usable orbit this cycle
   * @param m the newest measurement, or null
   * @return the measurement's verdict ({@link Status#OK} when accepted, a fault code when
   *     rejected; every measurement offered with an active table is counted), {@link
   *     Status#NOT_READY} without an active table, {@link Status#OK} when there was no
   *     measurement; {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE} for an elapsed time
   *     that is not finite or negative (nothing changes then; the corrector's raw-clock gate never
   *     passes one)
   */
  @CheckReturnValue
  public int cycle(SplitTime nowCorrected, double dtS, boolean orbitUsable, TimeOffsetMeasurement m) {
    if (!Double.isFinite(dtS)) {
      return Status.NOT_FINITE;
    }
    if (dtS < 0) {
      return Status.OUT_OF_RANGE;
    }
    final double dt = dtS;
    advance(dt);
    if (!params.isActive()) {
      modes.standby();
      law.standby();
      return Status.NOT_READY;
    }
    refreshParameters();
    int verdict = Status.OK;
    boolean accepted = false;
    if (m != null) {
      verdict = gate.validate(m, nowCorrected, params);
      if (verdict == Status.OK) {
        verdict = absorb(m, nowCorrected);
        accepted = verdict == Status.OK;
      }
      gate.record(verdict);
    }
    final int action = modes.step(accepted, verdict, orbitUsable, est, sinceAcceptedS, params);
    if (action != ModeMachine.KEEP_ESTIMATE) {
      est.initialize(pendingPhase, params.get(ServoParameters.F_INITIAL_SIGMA_PHASE_S),
          params.get(ServoParameters.F_INITIAL_SIGMA_FREQUENCY),
          params.get(ServoParameters.F_INITIAL_SIGMA_DRIFT_PER_S), action == ModeMachine.RESTART_ALL);
    }
    law.steer(modes.mode(), est, dt, params);
    return verdict;
  }

  private void advance(double dt) {
    if (dt <= 0) {
      return;
    }
    law.advance(dt);
    modes.advance(dt);
    sinceAcceptedS += dt;
    if (modes.mode() != ServoMode.STANDBY) {
      est.predict(dt, law.command());
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
    law.configure(params);
  }

  /** Innovation, gate and update of a validated measurement; returns OK, OUTLIER or PHASE_JUMP. */
  private int absorb(TimeOffsetMeasurement m, SplitTime now) {
    final double age = Math.max(0.0, gate.ageS(now));
    final double s = params.get(ServoParameters.F_SIGMA_SOURCE0 + m.source());
    final double r = s * s;
    final int mode = modes.mode();
    final double z = m.offsetS() + (est.frequency() + law.command()) * age;
    if (mode == ServoMode.STANDBY || mode == ServoMode.SAFE) {
      // Initialisation (STANDBY) or re-initialisation after SAFE happens in the mode machine.
      gate.accepted();
      sinceAcceptedS = 0.0;
      pendingPhase = z;
      return Status.OK;
    }
    est.innovate(z, r);
    final double width = params.get(ServoParameters.F_GATE_SIGMA) * Math.sqrt(est.lastInnovationVariance());
    final int verdict = gate.judge(est.lastInnovationS(), width, (int) params.get(ServoParameters.F_PHASE_JUMP_COUNT));
    if (verdict == Status.OK) {
      est.update(r);
      sinceAcceptedS = 0.0;
    } else if (verdict == Status.PHASE_JUMP) {
      pendingPhase = z;
      sinceAcceptedS = 0.0;
    }
    return verdict;
  }

  /**
   * The accumulated steering (frequency commands integrated over time plus phase steps) at the
   * last cycle, s.
   *
   * @return the steering phase
   */
  public double steeringPhaseS() {
    return law.steeringPhaseS();
  }

  /**
   * The sum of the phase steps commanded so far (part of {@link #steeringPhaseS()}). A host whose
   * counter is steered in frequency by the synthesizer applies these steps in software.
   *
   * @return the phase steps, s
   */
  public double phaseStepTotalS() {
    return law.phaseStepTotalS();
  }

  /**
   * Returns the current frequency command (fractional).
   *
   * @return the command
   */
  public double command() {
    return law.command();
  }

  /**
   * Returns the mode code.
   *
   * @return the mode code
   */
  public int mode() {
    return modes.mode();
  }

  /**
   * Returns the event code of the last mode transition (see {@code ModeEvent}).
   *
   * @return the event code
   */
  public int lastEvent() {
    return modes.lastEvent();
  }

  /**
   * Returns the estimator (read-only use).
   *
   * @return the estimator
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
    return gate.count(code);
  }

  /**
   * Seconds spent in a mode.
   *
   * @param m mode code
   * @return the time, s
   */
  public double timeInModeS(int m) {
    return modes.timeInModeS(m);
  }

  /**
   * Returns the number of phase jumps declared.
   *
   * @return the count
   */
  public int phaseJumps() {
    return gate.phaseJumps();
  }

  /**
   * Returns the number of phase steps commanded.
   *
   * @return the count
   */
  public int phaseSteps() {
    return law.phaseSteps();
  }

  /**
   * Returns the number of mode transitions.
   *
   * @return the count
   */
  public int modeTransitions() {
    return modes.transitions();
  }

  /**
   * Returns the verdict on the last measurement.
   *
   * @return the status code
   */
  public int lastMeasurementStatus() {
    return gate.lastStatus();
  }

  /**
   * Returns seconds since the last accepted measurement.
   *
   * @return the time, s
   */
  public double sinceAcceptedS() {
    return sinceAcceptedS;
  }

  /**
   * Writes the servo state.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    est.save(w);
    gate.save(w);
    modes.save(w);
    law.save(w);
    w.putDouble(sinceAcceptedS);
    w.putDouble(pendingPhase);
  }

  /**
   * Restores the servo state, every field range- and finiteness-checked (integrity checked by the
   * caller, who puts the previous state back when this refuses).
   *
   * @param r the reader
   * @return {@link Status#OK} or the reader's first refusal
   */
  @CheckReturnValue
  public int restore(StateReader r) {
    est.restore(r);
    gate.restore(r);
    modes.restore(r);
    law.restore(r);
    sinceAcceptedS = r.getDoubleIn(0.0, Double.MAX_VALUE);
    pendingPhase = r.getDoubleIn(-MAX_PENDING_S, MAX_PENDING_S);
    return r.status();
  }
}
