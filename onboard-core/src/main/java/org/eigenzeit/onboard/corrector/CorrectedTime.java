package org.eigenzeit.onboard.corrector;

import org.eigenzeit.onboard.corrector.rawclock.RawClockGate;
import org.eigenzeit.onboard.servo.ClockServo;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;

/**
 * The corrected-time formula {@code T = raw + S + M} of a corrector: S the servo's steering phase
 * extrapolated from the last adopted raw reading with the current command (only the phase steps
 * when the counter is steered by the synthesizer), M = -(tau - T) the model's offset extrapolated
 * from its last node (0 with the model off). A model value that is not finite is replaced by the
 * last finite one the corrector holds; a shift the instant cannot take leaves raw + S.
 *
 * <p>Reads the servo, the model and the gate; owns no state. One owner (the corrector).
 */
final class CorrectedTime {
  private final ProperTimeTracker tracker;
  private final ClockServo servo;
  private final RawClockGate gate;
  private final CycleState state;
  private final boolean applyModel;
  private final boolean counterIsSteered;

  CorrectedTime(ProperTimeTracker tracker, ClockServo servo, RawClockGate gate, CycleState state, boolean applyModel,
      boolean counterIsSteered) {
    this.tracker = tracker;
    this.servo = servo;
    this.gate = gate;
    this.state = state;
    this.applyModel = applyModel;
    this.counterIsSteered = counterIsSteered;
  }

  /** S at a cycle's reading just adopted by the gate (extrapolated over the gate's elapsed time). */
  double steeringAtCycle(boolean firstReading) {
    if (counterIsSteered) {
      return servo.phaseStepTotalS();
    }
    return firstReading ? servo.steeringPhaseS() : servo.steeringPhaseS() + servo.command() * gate.elapsedS();
  }

  /** S at any raw reading (between cycles). */
  double steeringAt(SplitTime raw) {
    if (counterIsSteered) {
      return servo.phaseStepTotalS();
    }
    return gate.hasReading() ? servo.steeringPhaseS() + servo.command() * gate.secondsSinceLast(raw)
        : servo.steeringPhaseS();
  }

  /** M at raw + steering, as the model gives it (may be not finite after a defect). */
  double model(SplitTime raw, double steering) {
    return (applyModel && tracker.isInitialized()) ? -tracker.offsetAtS(raw, steering) : 0.0;
  }

  /** M, or the last finite M the corrector holds. */
  double heldIfNotFinite(double model) {
    return Double.isFinite(model) ? model : state.heldModelS;
  }

  /** raw + steering + model into {@code out}. */
  void timeOf(SplitTime raw, double steering, double model, SplitTime out) {
    out.setTo(raw);
    if (out.addSeconds(steering + model) != Status.OK && out.addSeconds(steering) != Status.OK) {
      out.setTo(raw); // unreachable: the servo keeps S finite and bounded
    }
  }

  /** The corrected time of any raw reading. */
  void at(SplitTime raw, SplitTime out) {
    final double steering = steeringAt(raw);
    timeOf(raw, steering, heldIfNotFinite(model(raw, steering)), out);
  }
}
