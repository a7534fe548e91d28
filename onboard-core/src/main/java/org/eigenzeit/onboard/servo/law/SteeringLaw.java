package org.eigenzeit.onboard.servo.law;

import org.eigenzeit.onboard.math.CompensatedSum;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.table.ServoParameters;

/**
 * The steering law: state feedback on the Kalman estimate with pole placement (Farina, Galleani,
 * Tavella and Bittanti 2010, "A control theory approach to clock steering techniques", IEEE
 * Trans. UFFC 57(10):2257-2270):
 *
 * <pre>
 *   ACQUIRE   phase step -x_hat (quantised) when |x_hat| exceeds PHASE_STEP_THRESHOLD, then
 *             u = -y_hat - x_hat / T_acquire
 *   TRACK     u = -y_hat - x_hat / T_track
 *   COAST     u = -y_hat                         (hold the frequency estimate)
 *   SAFE      u held
 *   STANDBY   u = 0
 *   then      u quantised to STEER_RESOLUTION, limited to +-STEER_MAX and to SLEW_MAX_PER_S per
 *             second of the cycle (at least one second); a non-finite u is not taken
 * </pre>
 *
 * It also keeps the steering phase S, the integral of the command over time plus the phase steps
 * (Neumaier-compensated), and the sum of the phase steps alone.
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class SteeringLaw {
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 5 * 8 + 8;
  /** Largest |steering phase| accepted on restore, s. */
  private static final double MAX_PHASE_S = 1.0e6;
  /** Largest |command| accepted on restore (the table's largest STEER_MAX). */
  private static final double MAX_COMMAND = 1.0e-4;

  private final CompensatedSum steeringPhase = new CompensatedSum();
  private final CompensatedSum phaseStepTotal = new CompensatedSum();
  private double command;
  private double invTauAcquire;
  private double invTauTrack;
  private double invSteerResolution;
  private int phaseSteps;

  /** Creates the law with a zero command. */
  public SteeringLaw() {
    // zero
  }

  /**
   * Takes the derived values of a newly activated table.
   *
   * @param p the active parameters
   */
  public void configure(ServoParameters p) {
    invTauAcquire = 1.0 / p.get(ServoParameters.F_TIME_CONSTANT_ACQUIRE_S);
    invTauTrack = 1.0 / p.get(ServoParameters.F_TIME_CONSTANT_TRACK_S);
    final double res = p.get(ServoParameters.F_STEER_RESOLUTION);
    invSteerResolution = res > 0 ? 1.0 / res : 0.0;
  }

  /**
   * Integrates the command over elapsed time into the steering phase.
   *
   * @param dt elapsed seconds (positive)
   */
  public void advance(double dt) {
    steeringPhase.add(command * dt);
  }

  /** No active table: command zero. */
  public void standby() {
    command = 0.0;
  }

  /**
   * One cycle of the law in a mode; a phase step is told to the estimator.
   *
   * @param mode the servo mode after this cycle's transition
   * @param est the estimator (its phase is shifted by a commanded phase step)
   * @param dt elapsed seconds of the cycle (for the slew limit)
   * @param p the active parameters
   */
  public void steer(int mode, ClockEstimator est, double dt, ServoParameters p) {
    double u;
    switch (mode) {
      case ServoMode.ACQUIRE:
        phaseStep(est, p);
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
    final double res = p.get(ServoParameters.F_STEER_RESOLUTION);
    if (res > 0) {
      u = Math.rint(u * invSteerResolution) * res;
    }
    final double max = p.get(ServoParameters.F_STEER_MAX);
    u = Math.max(-max, Math.min(max, u));
    final double slew = p.get(ServoParameters.F_SLEW_MAX_PER_S) * Math.max(dt, 1.0);
    u = Math.max(command - slew, Math.min(command + slew, u));
    if (Double.isFinite(u)) {
      command = u;
    }
  }

  private void phaseStep(ClockEstimator est, ServoParameters p) {
    final double res = p.get(ServoParameters.F_PHASE_STEP_RESOLUTION_S);
    final double x = est.phaseS();
    if (res > 0 && Math.abs(x) > p.get(ServoParameters.F_PHASE_STEP_THRESHOLD_S)) {
      final double step = -Math.rint(x / res) * res;
      steeringPhase.add(step);
      phaseStepTotal.add(step);
      est.shiftPhase(step);
      phaseSteps++;
    }
  }

  /**
   * Returns the frequency command (fractional).
   *
   * @return the command
   */
  public double command() {
    return command;
  }

  /**
   * Returns the steering phase: the command integrated over time plus the phase steps, s.
   *
   * @return the steering phase, s
   */
  public double steeringPhaseS() {
    return steeringPhase.value();
  }

  /**
   * Returns the sum of the phase steps commanded so far, s.
   *
   * @return the phase steps, s
   */
  public double phaseStepTotalS() {
    return phaseStepTotal.value();
  }

  /**
   * Returns the number of phase steps commanded.
   *
   * @return the count
   */
  public int phaseSteps() {
    return phaseSteps;
  }

  /**
   * Writes the law's state (the derived table values are recomputed from the table).
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    w.putDouble(steeringPhase.high());
    w.putDouble(steeringPhase.low());
    w.putDouble(phaseStepTotal.high());
    w.putDouble(phaseStepTotal.low());
    w.putDouble(command);
    w.putInt(phaseSteps);
    w.putInt(0); // reserved
  }

  /**
   * Restores the state: phases finite and within +-1e6 s, |command| up to 1e-4.
   *
   * @param r the reader (refusals latch in it)
   */
  public void restore(StateReader r) {
    final double hi = r.getDoubleIn(-MAX_PHASE_S, MAX_PHASE_S);
    final double lo = r.getDoubleIn(-MAX_PHASE_S, MAX_PHASE_S);
    steeringPhase.set(hi, lo);
    final double stepHi = r.getDoubleIn(-MAX_PHASE_S, MAX_PHASE_S);
    final double stepLo = r.getDoubleIn(-MAX_PHASE_S, MAX_PHASE_S);
    phaseStepTotal.set(stepHi, stepLo);
    command = r.getDoubleIn(-MAX_COMMAND, MAX_COMMAND);
    phaseSteps = r.getIntIn(0, Integer.MAX_VALUE);
    r.getIntIn(0, 0);
  }
}
