package org.eigenzeit.ground.loop;

import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.timekeeper.Housekeeping;
import org.eigenzeit.onboard.timekeeper.Timekeeper;

/**
 * The one place where the ground loop touches the onboard core's host-facing object: it builds it,
 * loads and activates its servo table through the CRC-checked upload path, and calls it once per
 * cycle exactly as flight software does. Kept thin so that a change of the core's API changes one
 * class here.
 */
final class OnboardUnit {
  private final Timekeeper tk;
  private final Housekeeping hk = new Housekeeping();

  /**
   * Builds the core and activates its table.
   *
   * @param config the core's model configuration
   * @param applyModel false to run without relativistic corrections
   * @param servoTable the encoded servo table
   * @throws IllegalArgumentException when the core refuses the table (naming the field)
   */
  OnboardUnit(ModelConfig config, boolean applyModel, byte[] servoTable) {
    tk = new Timekeeper(config, applyModel, true);
    final int load = tk.parameters().load(servoTable, 0, servoTable.length);
    if (load != Status.OK || tk.parameters().activate() != Status.OK) {
      throw new IllegalArgumentException("the onboard core refused the servo table (" + Status.name(load)
          + ", field number " + tk.parameters().lastFailedField() + ")");
    }
  }

  void correctedTime(SplitTime raw, SplitTime out) {
    tk.correctedTime(raw, out);
  }

  /** One cycle; the status is the core's, recorded in its own counters and read through housekeeping. */
  int cycle(SplitTime raw, OrbitSample orbit, TimeOffsetMeasurement measurement) {
    final int st = tk.cycle(raw, orbit, measurement);
    tk.housekeeping(hk);
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
