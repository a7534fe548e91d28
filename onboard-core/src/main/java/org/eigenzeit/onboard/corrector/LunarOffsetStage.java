package org.eigenzeit.onboard.corrector;

import org.eigenzeit.onboard.lunartime.LunarTimeOffset;
import org.eigenzeit.onboard.lunartime.LunarTimeTable;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;

/**
 * The corrector's lunar stage, run each cycle of a Moon-centred configuration: TL - TT at the
 * clock from the active lunar time table ({@link org.eigenzeit.onboard.table.TableId#LUNAR_TIME}).
 *
 * <p>The corrected time of such a configuration is TL (the tracker's target scale is the Moon's,
 * L_L of its body). The stage takes the cycle's corrected TL and the clock's selenocentric state
 * (the tracker's node state, moved to the cycle's instant by r + v dt; the node is the cycle's own
 * when a sample arrived, and the term a dt^2/2 is 1.6 m/s^2 dt^2/2: 3e-14 s of position term for
 * dt = 1 s, 3e-11 s for 60 s) and evaluates the table at the event's TT ({@link
 * LunarTimeTable#evaluateAtTl}).
 *
 * <p>A cycle whose evaluation is refused (no table active: NOT_READY; outside the table's span:
 * OUT_OF_RANGE; no orbit state yet: NOT_READY; a state not finite or beyond the Moon's sphere of
 * influence) keeps the last valid value, marks it not current (housekeeping's {@code lunarValid} false) and counts
 * the cycle; the value is never extrapolated. The table counts each reason itself.
 *
 * <p>Mutable; one owner. Allocation only in the constructor.
 */
final class LunarOffsetStage {
  private final LunarTimeTable table;
  private final LunarTimeOffset offset = new LunarTimeOffset();
  private final double[] r = new double[3];
  private final double[] v = new double[3];
  private final SplitTime node = new SplitTime();
  private final SplitTime tt = new SplitTime();
  private int lastStatus = Status.NOT_READY;
  private boolean valid;
  private boolean everValid;
  private int heldCycles;
  private int noStateCycles;

  LunarOffsetStage(LunarTimeTable table) {
    this.table = table;
  }

  /**
   * One cycle's evaluation.
   *
   * @param tl the cycle's corrected time (TL)
   * @param tracker the model tracker (its node state is the clock's)
   */
  void update(SplitTime tl, ProperTimeTracker tracker) {
    int st;
    if (!tracker.isInitialized()) {
      noStateCycles++;
      st = Status.NOT_READY;
    } else {
      tracker.nodeTime(node);
      final double dt = tl.secondsSince(node);
      for (int i = 0; i < 3; i++) {
        v[i] = tracker.inertialVelocityMPerS(i);
        r[i] = tracker.inertialPositionM(i) + v[i] * dt;
      }
      st = table.evaluateAtTl(tl, r, v, tt, offset);
    }
    lastStatus = st;
    valid = st == Status.OK;
    if (valid) {
      everValid = true;
    } else {
      heldCycles++;
    }
  }

  /**
   * TT of a TL instant with the last valid TL - TT (held when the last cycle's was refused).
   *
   * @param tl an instant in TL
   * @param out receives TT; unchanged when no value was ever valid
   * @return {@link Status#OK} (this cycle's value), the last cycle's refusal (the held value was
   *     used: flagged), or {@link Status#NOT_READY} (no value yet, out unchanged)
   */
  int toTt(SplitTime tl, SplitTime out) {
    if (!everValid) {
      return Status.NOT_READY;
    }
    out.setTo(tl);
    if (out.addSeconds(-offset.tlMinusTtS()) != Status.OK) {
      out.setTo(tl);
      return Status.OUT_OF_RANGE; // unreachable: a valid value is below 3 s
    }
    return lastStatus;
  }

  void fill(Housekeeping hk) {
    hk.lunarStatus = lastStatus;
    hk.lunarValid = valid;
    hk.lunarEverValid = everValid;
    hk.tlMinusTtS = offset.tlMinusTtS();
    hk.centreTlMinusTtS = offset.centreTlMinusTtS();
    hk.lunarPositionTermS = offset.positionTermS();
    hk.lunarRate = offset.rate();
    hk.lunarTableId = offset.tableId();
    hk.lunarHeldCycles = heldCycles;
    hk.lunarNoStateCycles = noStateCycles;
    hk.lunarOutOfSpan = table.outOfSpanCount();
    hk.lunarNotReady = table.notReadyCount();
    hk.lunarBadInput = table.badInputCount();
    hk.lunarEvaluations = table.evaluations();
  }
}
