package org.eigenzeit.onboard.corrector;

import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableStatus;

/**
 * Caller-owned housekeeping snapshot, filled by {@link ClockCorrector#housekeeping} without
 * allocating. Units are in the names: {@code ...S} seconds, fractional frequencies dimensionless,
 * {@code ...PerS} per second. Status codes are those of {@code Status}; mode codes those of
 * {@code ServoMode}. Mutable; one owner.
 */
public final class Housekeeping {
  int mode;
  int lastModeEvent;
  int modeTransitions;
  int lastMeasurementStatus;
  int lastOrbitStatus;
  int orbitSolutionStatus;
  double phaseS;
  double sigmaPhaseS;
  double frequency;
  double sigmaFrequency;
  double driftPerS;
  double sigmaDriftPerS;
  double command;
  double steeringPhaseS;
  double modelRate;
  double modelOffsetS;
  double modelRateErrorBound;
  double sinceMeasurementS;
  int phaseJumps;
  int phaseSteps;
  final TableStatus[] tables = new TableStatus[TableId.COUNT];
  private final TableStatus unknownTable = new TableStatus();
  int restoreStatus = Status.NOT_READY;
  long cycles;
  final int[] measurementCounts = new int[Status.COUNT];
  final int[] orbitCounts = new int[Status.COUNT];
  final double[] timeInModeS = new double[5];

  /** Creates an empty snapshot. */
  public Housekeeping() {
    for (int i = 0; i < TableId.COUNT; i++) {
      tables[i] = new TableStatus();
    }
  }

  /**
   * Returns: servo mode (see ServoMode).
   *
   * @return servo mode (see ServoMode)
   */
  public int mode() {
    return mode;
  }

  /**
   * Returns: event code of the last mode transition.
   *
   * @return event code of the last mode transition
   */
  public int lastModeEvent() {
    return lastModeEvent;
  }

  /**
   * Returns: number of mode transitions since start.
   *
   * @return number of mode transitions since start
   */
  public int modeTransitions() {
    return modeTransitions;
  }

  /**
   * Returns: verdict on the last measurement.
   *
   * @return verdict on the last measurement
   */
  public int lastMeasurementStatus() {
    return lastMeasurementStatus;
  }

  /**
   * Returns: verdict on the last orbit sample.
   *
   * @return verdict on the last orbit sample
   */
  public int lastOrbitStatus() {
    return lastOrbitStatus;
  }

  /**
   * Returns: orbit solution status: OK, DEGRADED_BRIDGED, STALE or NOT_READY.
   *
   * @return orbit solution status: OK, DEGRADED_BRIDGED, STALE or NOT_READY
   */
  public int orbitSolutionStatus() {
    return orbitSolutionStatus;
  }

  /**
   * Returns: estimated phase error of the corrected time, s.
   *
   * @return estimated phase error of the corrected time, s
   */
  public double phaseS() {
    return phaseS;
  }

  /**
   * Returns: its standard deviation, s.
   *
   * @return its standard deviation, s
   */
  public double sigmaPhaseS() {
    return sigmaPhaseS;
  }

  /**
   * Returns: estimated free-oscillator frequency error.
   *
   * @return estimated free-oscillator frequency error
   */
  public double frequency() {
    return frequency;
  }

  /**
   * Returns: its standard deviation.
   *
   * @return its standard deviation
   */
  public double sigmaFrequency() {
    return sigmaFrequency;
  }

  /**
   * Returns: estimated drift, 1/s.
   *
   * @return estimated drift, 1/s
   */
  public double driftPerS() {
    return driftPerS;
  }

  /**
   * Returns: its standard deviation, 1/s.
   *
   * @return its standard deviation, 1/s
   */
  public double sigmaDriftPerS() {
    return sigmaDriftPerS;
  }

  /**
   * Returns: current frequency command.
   *
   * @return current frequency command
   */
  public double command() {
    return command;
  }

  /**
   * Returns: accumulated steering phase, s.
   *
   * @return accumulated steering phase, s
   */
  public double steeringPhaseS() {
    return steeringPhaseS;
  }

  /**
   * Returns: relativistic model rate y.
   *
   * @return relativistic model rate y
   */
  public double modelRate() {
    return modelRate;
  }

  /**
   * Returns: relativistic model offset (proper time minus scale) at the last cycle, s.
   *
   * @return relativistic model offset (proper time minus scale) at the last cycle, s
   */
  public double modelOffsetS() {
    return modelOffsetS;
  }

  /**
   * Returns: bound on the model rate error while bridging (0 on fresh orbits).
   *
   * @return bound on the model rate error while bridging (0 on fresh orbits)
   */
  public double modelRateErrorBound() {
    return modelRateErrorBound;
  }

  /**
   * Returns: seconds since the last accepted measurement.
   *
   * @return seconds since the last accepted measurement
   */
  public double sinceMeasurementS() {
    return sinceMeasurementS;
  }

  /**
   * Returns: phase jumps declared.
   *
   * @return phase jumps declared
   */
  public int phaseJumps() {
    return phaseJumps;
  }

  /**
   * Returns: phase steps commanded.
   *
   * @return phase steps commanded
   */
  public int phaseSteps() {
    return phaseSteps;
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
   * Returns: status of the last restore attempt (NOT_READY when none).
   *
   * @return status of the last restore attempt (NOT_READY when none)
   */
  public int restoreStatus() {
    return restoreStatus;
  }

  /**
   * Returns: cycles run since construction or restore.
   *
   * @return cycles run since construction or restore
   */
  public long cycles() {
    return cycles;
  }

  /**
   * Measurement verdict counters, indexed by status code.
   *
   * @param index the index
   * @return the value (0 for an index out of range)
   */
  public int measurementCounts(int index) {
    return index >= 0 && index < measurementCounts.length ? measurementCounts[index] : 0;
  }

  /**
   * Orbit sample verdict counters, indexed by status code.
   *
   * @param index the index
   * @return the value (0 for an index out of range)
   */
  public int orbitCounts(int index) {
    return index >= 0 && index < orbitCounts.length ? orbitCounts[index] : 0;
  }

  /**
   * Seconds spent in each mode, indexed by mode code.
   *
   * @param index the index
   * @return the value (0 for an index out of range)
   */
  public double timeInModeS(int index) {
    return index >= 0 && index < timeInModeS.length ? timeInModeS[index] : 0;
  }

}
