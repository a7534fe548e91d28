package org.eigenzeit.ground.pipeline;

import java.util.List;
import java.util.Map;

/**
 * The summary of one closed-loop run (serialised into summary.json, documented in docs/campaigns.md).
 *
 * @param scenario scenario name (with "@level" for the model-level comparison)
 * @param seed Monte-Carlo seed
 * @param modelLevel none, point-mass, j2 or full
 * @param oscillator the truth oscillator's name
 * @param spanS simulated span, s
 * @param settleTimeS first entry into TRACK, s (-1: never)
 * @param maxAbsTimeErrorNs largest |corrected time - true scale| after settling, ns
 * @param rmsTimeErrorNs RMS time error after settling, ns
 * @param maxAbsTimeErrorAllNs largest |time error| over the whole run, ns
 * @param fractionalFrequencyErrorRms RMS of the time error's 100 s differences divided by 100 s
 * @param stability ADEV and TDEV of the time error after settling, and the oscillator's own ADEV
 * @param timeInModeS seconds in each mode
 * @param faults nonzero fault counters, "orbit.CODE" and "measurement.CODE"
 * @param trueRelativisticRate mean true y over the span (tau - T_scale over span)
 * @param modelRelativisticRate mean onboard model y over the span
 * @param thirdBodies source of the truth's Sun and Moon
 */
public record RunResult(String scenario, long seed, String modelLevel, String oscillator, double spanS,
    double settleTimeS, double maxAbsTimeErrorNs, double rmsTimeErrorNs, double maxAbsTimeErrorAllNs,
    double fractionalFrequencyErrorRms, List<StabilityPoint> stability, Map<String, Double> timeInModeS,
    Map<String, Integer> faults, double trueRelativisticRate, double modelRelativisticRate, String thirdBodies) {

  /** Immutable copies of the collections. */
  public RunResult {
    stability = List.copyOf(stability);
    timeInModeS = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(timeInModeS));
    faults = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(faults));
  }

  /**
   * One averaging time.
   *
   * @param tauS averaging time, s
   * @param adev Allan deviation of the time error (overlapping)
   * @param tdev time deviation of the time error, s
   * @param oscillatorAdev the free oscillator's configured Allan deviation at tau
   */
  public record StabilityPoint(double tauS, double adev, double tdev, double oscillatorAdev) {}
}
