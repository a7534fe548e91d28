package org.eigenzeit.ground.truth;

import java.util.Locale;

/**
 * Noise and drift of a free-running oscillator, in Allan-deviation terms at tau0 = 1 s.
 *
 * @param name label
 * @param whitePmSigmaXS white phase noise: standard deviation of the phase, s (sigma_y(tau) = sqrt(3) sigma_x / tau)
 * @param whiteFmAdev1s white frequency noise: sigma_y(1 s) (falls as tau^-1/2)
 * @param flickerFmFloor flicker frequency noise: the flat sigma_y floor
 * @param randomWalkFmAdev1s random-walk frequency noise: sigma_y(1 s) of that term (grows as tau^1/2)
 * @param driftPerDay linear frequency drift, 1/day
 * @param initialFrequency frequency offset at the start
 */
public record OscillatorModel(String name, double whitePmSigmaXS, double whiteFmAdev1s, double flickerFmFloor,
    double randomWalkFmAdev1s, double driftPerDay, double initialFrequency) {

  /** Validates the values. */
  public OscillatorModel {
    for (double v : new double[] {whitePmSigmaXS, whiteFmAdev1s, flickerFmFloor, randomWalkFmAdev1s}) {
      if (!(v >= 0 && v < 1e-3)) {
        throw new IllegalArgumentException("oscillator noise levels must be in [0, 1e-3)");
      }
    }
    if (!Double.isFinite(driftPerDay) || !Double.isFinite(initialFrequency)) {
      throw new IllegalArgumentException("drift and initial frequency must be finite");
    }
  }

  /**
   * A preset of a common oscillator class. Typical values from the trade (REFERENCE-VALUES,
   * from memory), for demonstrations only: a mission uses its own oscillator's data.
   *
   * @param name quartz, rubidium, passive-maser or caesium
   * @return the model
   */
  public static OscillatorModel preset(String name) {
    return switch (name.toLowerCase(Locale.ROOT)) {
      case "quartz" -> new OscillatorModel("quartz (typical OCXO)", 1e-12, 3e-13, 3e-13, 3e-14, 5e-11, 2e-9);
      case "rubidium" -> new OscillatorModel("rubidium (typical)", 1e-12, 3e-12, 3e-15, 1e-16, 1e-13, 5e-11);
      case "passive-maser" -> new OscillatorModel("passive hydrogen maser (typical)", 1e-12, 1e-12, 8e-16, 2e-17,
          1e-15, 1e-12);
      case "caesium" -> new OscillatorModel("caesium beam (typical)", 1e-11, 1e-11, 1e-14, 0, 0, 1e-12);
      default -> throw new IllegalArgumentException("unknown oscillator preset '" + name
          + "' (quartz, rubidium, passive-maser, caesium)");
    };
  }

  /**
   * The Allan deviation this model should produce at tau (the sum of the power-law terms'
   * variances plus the drift's contribution D tau / sqrt(2); Riley 2008, Table 5 and section
   * 5.2.4), with D the drift per second.
   *
   * @param tau averaging time, s
   * @return sigma_y(tau)
   */
  public double expectedAdev(double tau) {
    final double d = driftPerDay / 86_400.0;
    final double var = 3 * whitePmSigmaXS * whitePmSigmaXS / (tau * tau)
        + whiteFmAdev1s * whiteFmAdev1s / tau
        + flickerFmFloor * flickerFmFloor
        + randomWalkFmAdev1s * randomWalkFmAdev1s * tau
        + d * d * tau * tau / 2;
    return Math.sqrt(var);
  }
}
