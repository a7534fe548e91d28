package org.eigenzeit.onboard.corrector;

import org.eigenzeit.onboard.servo.ClockServo;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableStatus;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;

/**
 * Caller-owned housekeeping snapshot, filled by {@link ClockCorrector#housekeeping} without
 * allocating. Units are in the names: {@code ...S} seconds, fractional frequencies dimensionless,
 * {@code ...PerS} per second. Status codes are those of {@code Status}; mode codes those of
 * {@code ServoMode}; event codes those of {@code ModeEvent}. Mutable; one owner.
 */
public final class Housekeeping {
  int mode;
  int lastModeEvent;
  int modeTransitions;
  int lastMeasurementStatus;
  int lastOrbitStatus = Status.NOT_READY;
  int orbitSolutionStatus;
  int rawClockStatus = Status.NOT_READY;
  double phaseS;
  double sigmaPhaseS;
  double frequency;
  double sigmaFrequency;
  double driftPerS;
  double sigmaDriftPerS;
  double command;
  double steeringPhaseS;
  double lastPhaseStepS;
  double modelRate;
  double modelOffsetS;
  double modelRateErrorBound;
  double lastModelStepS;
  int modelHeldCycles;
  int synchronousRefreshes;
  double sinceMeasurementS;
  int phaseJumps;
  int phaseSteps;
  int restoreStatus = Status.NOT_READY;
  long cycles;
  int lunarStatus = Status.NOT_READY;
  boolean lunarValid;
  boolean lunarEverValid;
  double tlMinusTtS;
  double centreTlMinusTtS;
  double lunarPositionTermS;
  double lunarRate;
  long lunarTableId;
  int lunarHeldCycles;
  int lunarNoStateCycles;
  int lunarOutOfSpan;
  int lunarNotReady;
  int lunarBadInput;
  long lunarEvaluations;
  final int[] measurementCounts = new int[Status.COUNT];
  final int[] orbitCounts = new int[Status.COUNT];
  final int[] rawClockCounts = new int[Status.COUNT];
  final int[] restoreCounts = new int[Status.COUNT];
  final double[] timeInModeS = new double[ServoMode.COUNT];
  final TableStatus[] tables = new TableStatus[TableId.COUNT];
  private final TableStatus unknownTable = new TableStatus();

  /** Creates an empty snapshot. */
  public Housekeeping() {
    for (int i = 0; i < TableId.COUNT; i++) {
      tables[i] = new TableStatus();
    }
  }

  void fillServo(ClockServo servo) {
    mode = servo.mode();
    lastModeEvent = servo.lastEvent();
    modeTransitions = servo.modeTransitions();
    lastMeasurementStatus = servo.lastMeasurementStatus();
    final ClockEstimator e = servo.estimator();
    phaseS = e.phaseS();
    sigmaPhaseS = Math.sqrt(Math.max(0.0, e.covariance(0, 0)));
    frequency = e.frequency();
    sigmaFrequency = Math.sqrt(Math.max(0.0, e.covariance(1, 1)));
    driftPerS = e.driftPerS();
    sigmaDriftPerS = Math.sqrt(Math.max(0.0, e.covariance(2, 2)));
    command = servo.command();
    steeringPhaseS = servo.steeringPhaseS();
    sinceMeasurementS = servo.sinceAcceptedS();
    phaseJumps = servo.phaseJumps();
    phaseSteps = servo.phaseSteps();
    for (int i = 0; i < Status.COUNT; i++) {
      measurementCounts[i] = servo.count(i);
    }
    for (int i = 0; i < ServoMode.COUNT; i++) {
      timeInModeS[i] = servo.timeInModeS(i);
    }
  }

  void fillModel(ProperTimeTracker tracker) {
    orbitSolutionStatus = tracker.solutionStatus();
    modelRate = tracker.fractionalFrequency();
    modelOffsetS = tracker.offsetS();
    modelRateErrorBound = tracker.rateErrorBound();
    synchronousRefreshes = tracker.synchronousRefreshes();
    for (int i = 0; i < Status.COUNT; i++) {
      orbitCounts[i] = tracker.count(i);
    }
  }

  /** {@return servo mode (ServoMode code)} */
  public int mode() {
    return mode;
  }

  /** {@return event of the last mode transition (ModeEvent code)} */
  public int lastModeEvent() {
    return lastModeEvent;
  }

  /** {@return mode transitions since start} */
  public int modeTransitions() {
    return modeTransitions;
  }

  /** {@return verdict on the last measurement} */
  public int lastMeasurementStatus() {
    return lastMeasurementStatus;
  }

  /** {@return verdict on the last orbit sample} */
  public int lastOrbitStatus() {
    return lastOrbitStatus;
  }

  /** {@return orbit solution status: OK, DEGRADED_BRIDGED, STALE or NOT_READY} */
  public int orbitSolutionStatus() {
    return orbitSolutionStatus;
  }

  /** {@return verdict of the raw-clock gate on the last reading} */
  public int rawClockStatus() {
    return rawClockStatus;
  }

  /** {@return estimated phase error of the corrected time, s} */
  public double phaseS() {
    return phaseS;
  }

  /** {@return standard deviation of the phase estimate, s} */
  public double sigmaPhaseS() {
    return sigmaPhaseS;
  }

  /** {@return estimated free-oscillator frequency error} */
  public double frequency() {
    return frequency;
  }

  /** {@return standard deviation of the frequency estimate} */
  public double sigmaFrequency() {
    return sigmaFrequency;
  }

  /** {@return estimated drift, 1/s} */
  public double driftPerS() {
    return driftPerS;
  }

  /** {@return standard deviation of the drift estimate, 1/s} */
  public double sigmaDriftPerS() {
    return sigmaDriftPerS;
  }

  /** {@return current frequency command} */
  public double command() {
    return command;
  }

  /** {@return accumulated steering phase, s} */
  public double steeringPhaseS() {
    return steeringPhaseS;
  }

  /** {@return phase step commanded in the last cycle, s (0 when none)} */
  public double lastPhaseStepS() {
    return lastPhaseStepS;
  }

  /** {@return relativistic model rate y} */
  public double modelRate() {
    return modelRate;
  }

  /** {@return relativistic model offset (proper time minus scale) at the last node, s} */
  public double modelOffsetS() {
    return modelOffsetS;
  }

  /** {@return bound on the model rate error while bridging (0 on fresh orbits)} */
  public double modelRateErrorBound() {
    return modelRateErrorBound;
  }

  /** {@return change of the model's correction at the last cycle's raw reading, s} */
  public double lastModelStepS() {
    return lastModelStepS;
  }

  /**
   * {@return slot refreshes of the model's frame cadence computed at once, not staged over the
   * cycles before (first use, restart, outage or time jump; such a cycle carries the full refresh
   * cost)}
   */
  public int synchronousRefreshes() {
    return synchronousRefreshes;
  }

  /** {@return cycles whose model value was not finite (the last finite correction held)} */
  public int modelHeldCycles() {
    return modelHeldCycles;
  }

  /** {@return seconds since the last accepted measurement} */
  public double sinceMeasurementS() {
    return sinceMeasurementS;
  }

  /** {@return phase jumps declared} */
  public int phaseJumps() {
    return phaseJumps;
  }

  /** {@return phase steps commanded} */
  public int phaseSteps() {
    return phaseSteps;
  }

  /** {@return status of the last restore attempt (NOT_READY when none)} */
  public int restoreStatus() {
    return restoreStatus;
  }

  /** {@return cycles run since construction or the last restore} */
  public long cycles() {
    return cycles;
  }

  /**
   * Measurement verdicts, by status code.
   *
   * @param code a status code
   * @return the count (0 for a code out of range)
   */
  public int measurementCounts(int code) {
    return code >= 0 && code < Status.COUNT ? measurementCounts[code] : 0;
  }

  /**
   * Orbit sample verdicts, by status code.
   *
   * @param code a status code
   * @return the count (0 for a code out of range)
   */
  public int orbitCounts(int code) {
    return code >= 0 && code < Status.COUNT ? orbitCounts[code] : 0;
  }

  /**
   * Raw-clock verdicts, by status code (OK, RAW_CLOCK_REPEATED, RAW_CLOCK_JUMP, EPOCH_NOT_INCREASING,
   * EPOCH_JUMP).
   *
   * @param code a status code
   * @return the count (0 for a code out of range)
   */
  public int rawClockCounts(int code) {
    return code >= 0 && code < Status.COUNT ? rawClockCounts[code] : 0;
  }

  /**
   * Answers of {@link ClockCorrector#restore}, by status code (OK and every refusal).
   *
   * @param code a status code
   * @return the count (0 for a code out of range)
   */
  public int restoreCounts(int code) {
    return code >= 0 && code < Status.COUNT ? restoreCounts[code] : 0;
  }

  /**
   * Seconds spent in a mode.
   *
   * @param m a mode code
   * @return the time (0 for a code out of range)
   */
  public double timeInModeS(int m) {
    return m >= 0 && m < ServoMode.COUNT ? timeInModeS[m] : 0;
  }

  /**
   * The snapshot of one uplink table (status, active CRC, counters).
   *
   * @param tableId a {@link TableId} code
   * @return the snapshot's own holder for that table (an empty holder for an unknown code)
   */
  public TableStatus table(int tableId) {
    return tableId >= 0 && tableId < TableId.COUNT ? tables[tableId] : unknownTable;
  }

  /**
   * The status of the last cycle's lunar evaluation (NOT_READY for an Earth-centred configuration,
   * before an orbit state, or with no lunar table active; OUT_OF_RANGE outside the table's span).
   *
   * @return the status code
   */
  public int lunarStatus() {
    return lunarStatus;
  }

  /**
   * Whether the lunar values below are this cycle's; false means held from an earlier cycle (or none
   * yet): flagged, never extrapolated.
   *
   * @return true when current
   */
  public boolean lunarValid() {
    return lunarValid;
  }

  /**
   * Whether any cycle produced a valid TL - TT (else the values below are zeros).
   *
   * @return true after a first valid value
   */
  public boolean lunarEverValid() {
    return lunarEverValid;
  }

  /**
   * TL - TT at the clock, s: the last valid value (see {@link #lunarValid}).
   *
   * @return TL - TT, s
   */
  public double tlMinusTtS() {
    return tlMinusTtS;
  }

  /**
   * TL - TT at the Moon's centre, s (last valid value).
   *
   * @return TL - TT at the selenocentre, s
   */
  public double centreTlMinusTtS() {
    return centreTlMinusTtS;
  }

  /**
   * The position term -(v_M - v_E).r/c^2 of TL - TT at the clock, s (last valid value).
   *
   * @return the position term, s
   */
  public double lunarPositionTermS() {
    return lunarPositionTermS;
  }

  /**
   * d(TL - TT)/dTT at the clock (last valid value).
   *
   * @return the rate
   */
  public double lunarRate() {
    return lunarRate;
  }

  /**
   * Identifier of the lunar table that gave the last valid value (0: none).
   *
   * @return the table identifier
   */
  public long lunarTableId() {
    return lunarTableId;
  }

  /**
   * Cycles whose lunar value was refused and held.
   *
   * @return the count
   */
  public int lunarHeldCycles() {
    return lunarHeldCycles;
  }

  /**
   * Cycles refused because the model had no orbit state yet.
   *
   * @return the count
   */
  public int lunarNoStateCycles() {
    return lunarNoStateCycles;
  }

  /**
   * Lunar evaluations refused outside the active table's span (expired or not yet valid).
   *
   * @return the count
   */
  public int lunarOutOfSpan() {
    return lunarOutOfSpan;
  }

  /**
   * Lunar evaluations refused with no table active.
   *
   * @return the count
   */
  public int lunarNotReady() {
    return lunarNotReady;
  }

  /**
   * Lunar evaluations refused for the clock's state (not finite, or beyond the Moon's sphere of
   * influence).
   *
   * @return the count
   */
  public int lunarBadInput() {
    return lunarBadInput;
  }

  /**
   * Lunar table evaluations.
   *
   * @return the count
   */
  public long lunarEvaluations() {
    return lunarEvaluations;
  }
}
