package org.eigenzeit.ground.truth;

/**
 * How time-offset measurements arrive: the source, its white noise, its cadence, one outage, and
 * outliers.
 *
 * @param source source index (0..3) in the servo table
 * @param sigmaS white noise, s
 * @param everyS cadence, s
 * @param outageStartS start of an outage, s from the run start (negative: none)
 * @param outageLengthS length of the outage, s
 * @param outlierProbability probability that a measurement is an outlier
 * @param outlierS size of an outlier, s (sign random)
 */
public record MeasurementPlan(int source, double sigmaS, double everyS, double outageStartS, double outageLengthS,
    double outlierProbability, double outlierS) {

  /**
   * Tells whether a measurement is due at t.
   *
   * @param t seconds from the run start
   * @param cycleS cycle length, s
   * @return true when the cadence hits and no outage covers t
   */
  public boolean due(double t, double cycleS) {
    if (everyS <= 0) {
      return false;
    }
    final boolean onCadence = Math.abs(Math.IEEEremainder(t, everyS)) < 0.5 * cycleS;
    final boolean inOutage = outageStartS >= 0 && t >= outageStartS && t < outageStartS + outageLengthS;
    return onCadence && !inOutage;
  }
}
