package org.eigenzeit.onboard.servo.gate;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The servo's measurement gate: validation of each time-offset measurement, then the innovation
 * gate and the phase-jump detector. First failure wins; every verdict is counted.
 *
 * <pre>
 *   {@link #validate} (pure)   producer flag            INVALID_INPUT
 *                              source index             OUT_OF_RANGE  (0 .. SOURCES - 1)
 *                              NaN or infinity          NOT_FINITE
 *                              |offset|                 OUT_OF_RANGE  above MAX_ABS_OFFSET
 *                              epoch after the cycle    EPOCH_JUMP    (more than 1 s)
 *                              epoch too old            STALE         beyond MEASUREMENT_MAX_AGE
 *                              not after the last one   EPOCH_NOT_INCREASING
 *   {@link #judge}             |innovation| &lt;= g sqrt(S)                        OK
 *                              else, agreeing within g sqrt(S) with the previous
 *                              outlier for PHASE_JUMP_COUNT outliers in a row     PHASE_JUMP
 *                              else                                             OUTLIER
 * </pre>
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class MeasurementGate {
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 16 + 4 * 4 + 8 + Status.COUNT * 4;

  private final SplitTime epoch = new SplitTime();
  private final SplitTime lastAccepted = new SplitTime();
  private final int[] counters = new int[Status.COUNT];
  private boolean haveAccepted;
  private int jumpCount;
  private double lastOutlierInnovation;
  private int phaseJumps;
  private int lastStatus = Status.NOT_READY;

  /** Creates a gate that has accepted nothing. */
  public MeasurementGate() {
    // empty
  }

  /**
   * Validates a measurement against the cycle time and the last accepted one; keeps a copy of
   * its epoch for {@link #ageS} and {@link #accepted}.
   *
   * @param m the measurement
   * @param now the cycle time on the corrected scale
   * @param p the active parameters
   * @return {@link Status#OK} or the first fault (see the class table)
   */
  @CheckReturnValue
  public int validate(TimeOffsetMeasurement m, SplitTime now, ServoParameters p) {
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
    if (Math.abs(z) > p.get(ServoParameters.F_MAX_ABS_OFFSET_S)) {
      return Status.OUT_OF_RANGE;
    }
    m.epoch(epoch);
    final double age = now.secondsSince(epoch);
    if (age < -1.0) {
      return Status.EPOCH_JUMP;
    }
    if (age > p.get(ServoParameters.F_MEASUREMENT_MAX_AGE_S)) {
      return Status.STALE;
    }
    if (haveAccepted && epoch.compareTo(lastAccepted) <= 0) {
      return Status.EPOCH_NOT_INCREASING;
    }
    return Status.OK;
  }

  /**
   * Age of the last validated measurement at an instant, s.
   *
   * @param now the instant on the corrected scale
   * @return now - epoch, s
   */
  public double ageS(SplitTime now) {
    return now.secondsSince(epoch);
  }

  /**
   * The innovation gate and phase-jump detector on a validated measurement's innovation. OK and
   * PHASE_JUMP make it the last accepted measurement.
   *
   * @param innovationS the innovation, s
   * @param widthS the gate's half-width g sqrt(S), s
   * @param jumpCountThreshold PHASE_JUMP_COUNT
   * @return {@link Status#OK}, {@link Status#OUTLIER} or {@link Status#PHASE_JUMP}
   */
  @CheckReturnValue
  public int judge(double innovationS, double widthS, int jumpCountThreshold) {
    if (Math.abs(innovationS) <= widthS) {
      accepted();
      jumpCount = 0;
      return Status.OK;
    }
    if (jumpCount > 0 && Math.abs(innovationS - lastOutlierInnovation) <= widthS) {
      jumpCount++;
    } else {
      jumpCount = 1;
    }
    lastOutlierInnovation = innovationS;
    if (jumpCount >= jumpCountThreshold) {
      jumpCount = 0;
      phaseJumps++;
      accepted();
      return Status.PHASE_JUMP;
    }
    return Status.OUTLIER;
  }

  /** The last validated measurement is the last accepted one (epoch order starts from it). */
  public void accepted() {
    lastAccepted.setTo(epoch);
    haveAccepted = true;
  }

  /**
   * Counts a measurement's final verdict.
   *
   * @param verdict its status code
   */
  public void record(int verdict) {
    counters[verdict]++;
    lastStatus = verdict;
  }

  /**
   * Measurements that received a verdict.
   *
   * @param code status code
   * @return the count (0 for codes out of range)
   */
  public int count(int code) {
    return code >= 0 && code < Status.COUNT ? counters[code] : 0;
  }

  /**
   * Returns the verdict on the last measurement.
   *
   * @return the status code
   */
  public int lastStatus() {
    return lastStatus;
  }

  /**
   * Returns the number of phase jumps declared.
   *
   * @return the count
   */
  public int phaseJumps() {
    return phaseJumps;
  }

  /**
   * Writes the gate's state.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    lastAccepted.save(w);
    w.putBoolean(haveAccepted);
    w.putInt(jumpCount);
    w.putInt(phaseJumps);
    w.putInt(lastStatus);
    w.putDouble(lastOutlierInnovation);
    for (int i = 0; i < Status.COUNT; i++) {
      w.putInt(counters[i]);
    }
  }

  /**
   * Restores the state: counts not negative, status codes known, innovation finite.
   *
   * @param r the reader (refusals latch in it)
   */
  public void restore(StateReader r) {
    lastAccepted.restore(r);
    haveAccepted = r.getFlag();
    jumpCount = r.getIntIn(0, Integer.MAX_VALUE);
    phaseJumps = r.getIntIn(0, Integer.MAX_VALUE);
    lastStatus = r.getIntIn(0, Status.COUNT - 1);
    lastOutlierInnovation = r.getFinite();
    for (int i = 0; i < Status.COUNT; i++) {
      counters[i] = r.getIntIn(0, Integer.MAX_VALUE);
    }
  }
}
