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
 * @param settleTimeS the time after which |time error| stays within {@code settlingBandNs} to the end, s (-1: never)
 * @param settlingBandNs the settling band: the budget's max |time error|, else the servo's track-exit threshold, ns
 * @param firstTrackS first entry into TRACK, s (-1: never); for information, not used for settling
 * @param maxAbsTimeErrorNs largest |corrected time - true scale| after settling, ns
 * @param rmsTimeErrorNs RMS time error after settling, ns
 * @param maxAbsTimeErrorAllNs largest |time error| over the whole run, ns
 * @param fractionalFrequencyErrorRms RMS of the time error's 100 s differences divided by 100 s, after settling
 * @param stability ADEV and TDEV of the time error after settling at octave-spaced taus, and the oscillator's own ADEV
 * @param timeInModeS seconds in each mode
 * @param faults nonzero fault counters, "orbit.CODE" and "measurement.CODE"
 * @param trueRelativisticRate mean true y over the span (tau - T_scale over span)
 * @param modelRelativisticRate mean onboard model y over the span
 * @param thirdBodies source of the truth's Sun and Moon
 * @param lunar lunar time figures of a Moon-centred run (TL - TT against the ground's relation, the
 *     corrected time against TT, the table's refusals), null for the Earth
 * @param verdict the run against the scenario's timing budget
 */
public record RunResult(String scenario, long seed, String modelLevel, String oscillator, double spanS,
    double settleTimeS, double settlingBandNs, double firstTrackS, double maxAbsTimeErrorNs, double rmsTimeErrorNs,
    double maxAbsTimeErrorAllNs, double fractionalFrequencyErrorRms, List<StabilityPoint> stability,
    Map<String, Double> timeInModeS, Map<String, Integer> faults, double trueRelativisticRate,
    double modelRelativisticRate, String thirdBodies, Verdict verdict,
    @com.fasterxml.jackson.annotation.JsonInclude(com.fasterxml.jackson.annotation.JsonInclude.Include.NON_NULL)
    org.eigenzeit.ground.timescale.LunarRecord lunar) {

  /** Immutable copies of the collections. */
  public RunResult {
    stability = List.copyOf(stability);
    timeInModeS = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(timeInModeS));
    faults = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(faults));
  }

  /**
   * One averaging time. The error bars are the simple 1-sigma estimate sigma / sqrt(N), N the
   * number of non-overlapping tau intervals less one (Riley, Handbook of Frequency Stability
   * Analysis, NIST SP 1065, 2008, section 5.3; section number from memory).
   *
   * @param tauS averaging time, s
   * @param adev overlapping Allan deviation of the time error
   * @param adevError its 1-sigma error bar
   * @param tdev time deviation of the time error, s
   * @param tdevError its 1-sigma error bar, s
   * @param oscillatorAdev the free oscillator's configured Allan deviation at tau
   */
  public record StabilityPoint(double tauS, double adev, double adevError, double tdev, double tdevError,
      double oscillatorAdev) {}

  /**
   * A run against its budget.
   *
   * @param status "pass", "fail" or "no budget"
   * @param adevAtBudgetTau ADEV of the time error at the budget's tau after settling (NaN without that criterion)
   * @param reasons the criteria missed, in words
   */
  public record Verdict(String status, double adevAtBudgetTau, List<String> reasons) {
    /** Immutable copy. */
    public Verdict {
      reasons = List.copyOf(reasons);
    }
  }
}
