package org.eigenzeit.ground.scenario;

/**
 * A scenario's timing budget, the pass/fail criteria of its runs. Settling is defined by the error
 * itself: a run has settled at the time after which |time error| stays within {@code
 * maxAbsTimeErrorNs} to the end of the run; it must settle by {@code settleWithinS}. After
 * settling, the RMS time error must stay within {@code rmsTimeErrorNs} and the overlapping Allan
 * deviation of the time error at {@code adevTauS} within {@code adevMax}. Across seeds the verdict
 * takes the nearest-rank {@code percentile} of each figure; the worst case is reported beside it.
 * NaN marks a criterion the scenario does not state.
 *
 * @param maxAbsTimeErrorNs the band |time error| must stay in after settling, ns (NaN: no budget)
 * @param settleWithinS latest settling time, s from the start
 * @param rmsTimeErrorNs largest RMS time error after settling, ns (NaN: not stated)
 * @param adevMax largest ADEV of the time error at {@code adevTauS} (NaN: not stated)
 * @param adevTauS averaging time of the ADEV criterion, s
 * @param percentile nearest-rank percentile across seeds for the verdict, 50 .. 100
 */
public record TimingBudget(double maxAbsTimeErrorNs, double settleWithinS, double rmsTimeErrorNs, double adevMax,
    double adevTauS, double percentile) {

  /** No budget stated. */
  public static final TimingBudget NONE = new TimingBudget(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
      95);

  /** @return true when the scenario states a budget */
  public boolean stated() {
    return !Double.isNaN(maxAbsTimeErrorNs);
  }

  /** @return true when the RMS criterion is stated */
  public boolean hasRms() {
    return !Double.isNaN(rmsTimeErrorNs);
  }

  /** @return true when the ADEV criterion is stated */
  public boolean hasAdev() {
    return !Double.isNaN(adevMax);
  }
}
