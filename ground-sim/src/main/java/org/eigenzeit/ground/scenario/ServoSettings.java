package org.eigenzeit.ground.scenario;

import org.eigenzeit.ground.truth.MeasurementPlan;
import org.eigenzeit.ground.truth.OscillatorModel;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;

/**
 * The servo keys of a scenario, in the file's units, and the core's parameter table made from them
 * and from the truth models: the filter's noise follows the oscillator (white FM from its white
 * FM; random-walk FM from its random-walk FM with the flicker floor folded in at the tracking time
 * constant, since sigma_y^2 of random-walk FM equals the flicker floor's at tau = T; random run from
 * its drift), the measurement source's noise from the plan.
 *
 * @param timeConstantTrackS tracking time constant, s
 * @param timeConstantAcquireS acquisition time constant, s
 * @param steerResolution frequency-command resolution
 * @param steerMax largest frequency command
 * @param slewMaxPerS largest change of the command per second
 * @param gateSigma measurement gate, sigmas
 * @param trackEnterNs time error below which the servo enters TRACK, ns
 * @param trackExitNs time error above which it leaves TRACK, ns
 * @param coastAfterS seconds without measurements before COAST
 * @param coastMaxH longest coast, h
 * @param phaseStepThresholdNs phase error above which the servo steps the phase, ns
 * @param phaseStepResolutionNs phase-step resolution, ns
 */
public record ServoSettings(double timeConstantTrackS, double timeConstantAcquireS, double steerResolution,
    double steerMax, double slewMaxPerS, double gateSigma, double trackEnterNs, double trackExitNs, double coastAfterS,
    double coastMaxH, double phaseStepThresholdNs, double phaseStepResolutionNs) {

  /**
   * The core's parameter table values ({@link ServoParameters#FIELD_COUNT} of them).
   *
   * @param osc the truth oscillator
   * @param plan the measurement plan
   * @return the values, indexed by the table's field numbers
   */
  public double[] tableValues(OscillatorModel osc, MeasurementPlan plan) {
    final double[] v = ServoParameters.typicalRubidium();
    v[ServoParameters.F_TIME_CONSTANT_TRACK_S] = timeConstantTrackS;
    v[ServoParameters.F_TIME_CONSTANT_ACQUIRE_S] = timeConstantAcquireS;
    v[ServoParameters.F_SIGMA_WHITE_FM] = whiteFm(osc);
    v[ServoParameters.F_SIGMA_RANDOM_WALK_FM] = randomWalkFm(osc);
    v[ServoParameters.F_SIGMA_RANDOM_RUN] = randomRun(osc);
    v[ServoParameters.F_SIGMA_SOURCE0 + plan.source()] = plan.sigmaS();
    v[ServoParameters.F_STEER_RESOLUTION] = steerResolution;
    v[ServoParameters.F_STEER_MAX] = steerMax;
    v[ServoParameters.F_SLEW_MAX_PER_S] = slewMaxPerS;
    v[ServoParameters.F_GATE_SIGMA] = gateSigma;
    v[ServoParameters.F_TRACK_ENTER_S] = trackEnterNs * 1e-9;
    v[ServoParameters.F_TRACK_EXIT_S] = trackExitNs * 1e-9;
    v[ServoParameters.F_COAST_AFTER_S] = coastAfterS;
    v[ServoParameters.F_COAST_MAX_S] = coastMaxH * 3600;
    v[ServoParameters.F_PHASE_STEP_THRESHOLD_S] = phaseStepThresholdNs * 1e-9;
    v[ServoParameters.F_PHASE_STEP_RESOLUTION_S] = phaseStepResolutionNs * 1e-9;
    v[ServoParameters.F_MEASUREMENT_MAX_AGE_S] = Math.max(10, 2 * plan.everyS());
    return v;
  }

  /**
   * The core's encoded parameter table (load it, then activate it).
   *
   * @param osc the truth oscillator
   * @param plan the measurement plan
   * @return the table image
   */
  public byte[] tableImage(OscillatorModel osc, MeasurementPlan plan) {
    final byte[] table = new byte[ServoParameters.TABLE_BYTES];
    final int st = ServoParameters.encode(tableValues(osc, plan), table, 0);
    if (st != Status.OK) {
      throw new IllegalArgumentException("the servo table does not encode (" + Status.name(st) + ")");
    }
    return table;
  }

  static double whiteFm(OscillatorModel osc) {
    return Math.max(osc.whiteFmAdev1s(), 1e-14);
  }

  double randomWalkFm(OscillatorModel osc) {
    return Math.sqrt(osc.randomWalkFmAdev1s() * osc.randomWalkFmAdev1s()
        + osc.flickerFmFloor() * osc.flickerFmFloor() / timeConstantTrackS);
  }

  static double randomRun(OscillatorModel osc) {
    return Math.max(Math.abs(osc.driftPerDay()) / 86_400.0 / Math.sqrt(86_400.0), 1e-24);
  }

  /**
   * The table field's name in words, for messages.
   *
   * @param field a field number, or {@link ServoParameters#FIELD_COUNT} for a consistency rule
   * @return the name
   */
  static String fieldName(int field) {
    final String[] names = {"filter white FM noise", "filter random-walk FM noise", "filter random-run noise",
      "source 0 noise", "source 1 noise", "source 2 noise", "source 3 noise", "gate sigma", "phase-jump count",
      "tracking time constant", "acquisition time constant", "steer resolution", "steer maximum", "slew maximum",
      "phase-step resolution", "phase-step threshold", "track-enter threshold", "track-exit threshold",
      "hysteresis count", "coast-after time", "coast maximum", "measurement maximum age", "maximum offset",
      "initial phase sigma", "initial frequency sigma", "initial drift sigma", "safe-after-invalid time",
      "safe-exit count"};
    return field >= 0 && field < names.length ? names[field] : "a consistency rule between fields";
  }
}
