package org.eigenzeit.ground.budget;

/**
 * The relativistic budget of an orbit over a span (all fractional frequencies dimensionless,
 * offsets in seconds). Serialised as the JSON of the {@code budget} command (see docs/cli.md).
 *
 * @param label scenario label
 * @param body central body name
 * @param timeScale the scale realised (TT, or Eigenzeit's lunar TT-like scale)
 * @param spanS span analysed, s
 * @param coreMeanRate mean y from the onboard core (accumulated offset over the span / span)
 * @param referenceMeanRate mean y from the ground reference
 * @param coreMinusReferenceRate difference of the mean rates
 * @param corePeriodicPeakToPeakS periodic part of the core's offset, peak to peak, s
 * @param referencePeriodicPeakToPeakS periodic part of the reference's offset, peak to peak, s
 * @param maxOffsetDifferenceS largest |core - reference| accumulated offset over the span, s
 * @param components mean component rates: core and reference
 * @param secondsPerDay the mean rate expressed as seconds per day (reference), s/d
 */
public record BudgetResult(String label, String body, String timeScale, double spanS, double coreMeanRate,
    double referenceMeanRate, double coreMinusReferenceRate, double corePeriodicPeakToPeakS,
    double referencePeriodicPeakToPeakS, double maxOffsetDifferenceS, Components components,
    double secondsPerDay) {

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
