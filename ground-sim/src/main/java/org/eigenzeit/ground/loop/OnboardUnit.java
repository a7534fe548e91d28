package org.eigenzeit.ground.loop;

import org.eigenzeit.onboard.corrector.ClockCorrector;
import org.eigenzeit.onboard.corrector.Housekeeping;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableStatus;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The one place where the ground loop touches the onboard core's host-facing object: it builds it,
 * loads and activates its servo table through the CRC-checked upload path, and calls it once per
 * cycle exactly as flight software does. Kept thin so that a change of the core's API changes one
 * class here.
 */
final class OnboardUnit {
  private final ClockCorrector tk;
  private final Housekeeping hk = new Housekeeping();

  /**
   * Builds the core and activates its servo table through the uplink-table path (stage, CRC and
   * content rules, activate).
   *
   * @param config the core's model configuration
   * @param applyModel false to run without relativistic corrections
   * @param servoTable the encoded servo table
   * @param cycleS the loop's cycle, s: the raw-clock gate's largest step is at least twice it
   *     (a cycle plus the oscillator's own offset must pass the gate)
   * @throws IllegalArgumentException when the core refuses the table (naming the field)
   */
  OnboardUnit(ModelConfig config, boolean applyModel, byte[] servoTable, int cycleS) {
    tk = new ClockCorrector(config, applyModel, true, Math.max(ClockCorrector.DEFAULT_MAX_RAW_STEP_S, 2.0 * cycleS));
    final int load = tk.loadTable(TableId.SERVO, servoTable, 0, servoTable.length);
    final int activate = load == Status.OK ? tk.activateTable(TableId.SERVO) : load;
    if (activate != Status.OK) {
      final TableStatus ts = new TableStatus();
      final int item = tk.tableStatus(TableId.SERVO, ts) == Status.OK ? ts.lastFailedItem() : -1;
      throw new IllegalArgumentException("the onboard core refused the servo table (" + Status.name(activate)
          + ", field number " + item + ")");
    }
  }

  /**
   * Uplinks the lunar time table (TableId.LUNAR_TIME): load, then activate when accepted. A refusal
   * is the core's to flag (its counters and lunar status); the run goes on without a table.
   *
   * @param image the framed image
   * @return the load status, or the activation's when the load was accepted
   */
  int uplinkLunarTable(byte[] image) {
    final int load = tk.loadTable(TableId.LUNAR_TIME, image, 0, image.length);
    return load == Status.OK ? tk.activateTable(TableId.LUNAR_TIME) : load;
  }

  /** @return the core's corrected time in TT (lunar configuration) and the status of its TL - TT */
  int correctedTimeTt(SplitTime raw, SplitTime out) {
    return tk.correctedTimeTt(raw, out);
  }

  /** @return the lunar stage's housekeeping as of the last cycle */
  Housekeeping housekeeping() {
    return hk;
  }

  void correctedTime(SplitTime raw, SplitTime out) {
    tk.correctedTime(raw, out);
  }

  /**
   * One cycle. A measurement's verdict is the core's, recorded in its counters and read through
   * housekeeping; a cycle without a measurement must be accepted (the loop feeds a raw clock that
   * never goes backwards and steps by one cycle), so any other verdict stops the run.
   *
   * @throws IllegalStateException when the core refuses a cycle without a measurement
   */
  int cycle(SplitTime raw, OrbitSample orbit, TimeOffsetMeasurement measurement) {
    final int st = tk.cycle(raw, orbit, measurement);
    tk.housekeeping(hk);
    if (measurement == null && st != Status.OK) {
      throw new IllegalStateException("the onboard cycle was refused: " + Status.name(st));
    }
    return st;
  }

  int mode() {
    return hk.mode();
  }

  boolean tracking() {
    return hk.mode() == ServoMode.TRACK;
  }

  double command() {
    return hk.command();
  }

  double phaseS() {
    return hk.phaseS();
  }

  double modelOffsetS() {
    return hk.modelOffsetS();
  }

  int orbitSolutionStatus() {
    return hk.orbitSolutionStatus();
  }

  /** @return seconds in each mode, indexed by mode code */
  double[] timeInModeS() {
    final double[] t = new double[ServoMode.COUNT];
    for (int m = 0; m < t.length; m++) {
      t[m] = hk.timeInModeS(m);
    }
    return t;
  }

  /** @return the nonzero fault counters, "orbit.CODE" and "measurement.CODE", in code order */
  java.util.Map<String, Integer> faults() {
    final java.util.Map<String, Integer> faults = new java.util.LinkedHashMap<>();
    for (int c = Status.FIRST_FAULT; c < Status.COUNT; c++) {
      if (hk.orbitCounts(c) > 0) {
        faults.put("orbit." + Status.name(c), hk.orbitCounts(c));
      }
      if (hk.measurementCounts(c) > 0) {
        faults.put("measurement." + Status.name(c), hk.measurementCounts(c));
      }
    }
    return faults;
  }

  static String modeName(int mode) {
    return ServoMode.name(mode);
  }
}
