package org.eigenzeit.ground.budget;

/**
 * The relativistic budget of an orbit over a span (all fractional frequencies dimensionless,
 * offsets in seconds). Serialised as the JSON of the {@code budget} command (see docs/cli.md).
 *
 * @param label scenario label
 * @param body central body name
 * @param timeScale the scale realised (TT, or Eigenzeit's lunar TT-like scale)
 * @param spanS span analysed, s
 * @param coreMeanRate the core's end offset over the span (the mean of y over the span; it carries
 *     the periodic eccentricity term when the span is not a whole number of orbits)
 * @param referenceMeanRate the same for the ground reference
 * @param coreMinusReferenceRate difference of the two end-offset rates
 * @param corePeriodicPeakToPeakS periodic part of the core's offset (offset minus the secular line), peak to peak, s
 * @param referencePeriodicPeakToPeakS the same for the reference, s
 * @param maxOffsetDifferenceS largest |core - reference| accumulated offset over the span, s
 * @param components mean component rates: core and reference
 * @param secondsPerDay the reference's end-offset rate expressed as seconds per day, s/d
 * @param coreSecularRate the core's secular rate: end offset with the eccentricity term's end-point
 *     share -2(r.v(T) - r.v(0))/c^2 removed, over the span (the mean of the smooth part of the integrand)
 * @param referenceSecularRate the same for the reference
 * @param coreMinusReferenceSecularRate difference of the secular rates
 */
public record BudgetResult(String label, String body, String timeScale, double spanS, double coreMeanRate,
    double referenceMeanRate, double coreMinusReferenceRate, double corePeriodicPeakToPeakS,
    double referencePeriodicPeakToPeakS, double maxOffsetDifferenceS, Components components,
    double secondsPerDay, double coreSecularRate, double referenceSecularRate,
    double coreMinusReferenceSecularRate) {

  /**
   * Mean component rates.
   *
   * @param kinematicCore core, -v^2/2c^2
   * @param kinematicReference reference
   * @param gravitationalCore core, -(GM/r - W0)/c^2
   * @param gravitationalReference reference
   * @param harmonicsCore core, -U_h/c^2
   * @param harmonicsReference reference
   * @param tidalCore core, -U_tid/c^2
   * @param tidalReference reference
   */
  public record Components(double kinematicCore, double kinematicReference, double gravitationalCore,
      double gravitationalReference, double harmonicsCore, double harmonicsReference, double tidalCore,
      double tidalReference) {}
}
