package org.eigenzeit.onboard.corrector;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.Status;

/**
 * The corrector's own state across cycles: the last orbit verdict, the last finite model
 * correction (held when the model's value is not finite), the count of such cycles, and the two
 * steps of the last cycle that explain a change of the corrected time (the commanded phase step
 * and the model's step). The cycle count is not saved: it counts cycles since construction or
 * the last restore.
 *
 * <p>Mutable; one owner (the corrector).
 */
final class CycleState {
  /** Bytes written by {@link #save}. */
  static final int STATE_BYTES = 4 + 4 + 3 * 8;
  /** Largest |model correction| accepted on restore, s. */
  private static final double MAX_MODEL_S = 1.0e4;

  long cycles;
  int lastOrbitStatus = Status.NOT_READY;
  int modelHeldCycles;
  double heldModelS;
  double lastPhaseStepS;
  double lastModelStepS;

  void save(StateWriter w) {
    w.putInt(lastOrbitStatus);
    w.putInt(modelHeldCycles);
    w.putDouble(heldModelS);
    w.putDouble(lastPhaseStepS);
    w.putDouble(lastModelStepS);
  }

  void restore(StateReader r) {
    lastOrbitStatus = r.getIntIn(0, Status.COUNT - 1);
    modelHeldCycles = r.getIntIn(0, Integer.MAX_VALUE);
    heldModelS = r.getDoubleIn(-MAX_MODEL_S, MAX_MODEL_S);
    lastPhaseStepS = r.getDoubleIn(-MAX_MODEL_S, MAX_MODEL_S);
    lastModelStepS = r.getDoubleIn(-MAX_MODEL_S, MAX_MODEL_S);
  }
}
