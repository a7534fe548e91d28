package org.eigenzeit.ground.truth;

/**
 * Errors of the onboard orbit estimate: white noise, a constant bias along the radius, gaps and
 * corrupted samples (NaN, or a position jump), all drawn from the run's seeded random source.
 *
 * @param positionNoiseM white noise per axis, m
 * @param velocityNoiseMPerS white noise per axis, m/s
 * @param radialBiasM constant radial bias, m
 * @param gapEveryS a gap starts every this many seconds (0: no gaps)
 * @param gapLengthS length of each gap, s
 * @param corruptProbability probability that a sample is corrupted
 */
public record EstimateErrors(double positionNoiseM, double velocityNoiseMPerS, double radialBiasM, double gapEveryS,
    double gapLengthS, double corruptProbability) {
  /** No errors. */
  public static final EstimateErrors NONE = new EstimateErrors(0, 0, 0, 0, 0, 0);
}
