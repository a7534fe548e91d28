package org.eigenzeit.ground.reference;

import org.eigenzeit.onboard.time.SplitTime;

/**
 * The reference's clock-rate model on its own, for states that come from elsewhere (an external
 * trajectory, a closed-loop truth). Not thread-safe: one per run.
 */
public final class ReferenceRate {
  private final ForceModel forces;
  private final double[] a = new double[3];

  /**
   * Creates the evaluator.
   *
   * @param cfg configuration (body, field, third bodies, c^-4)
   * @param t0 epoch that {@code t} counts from, TT
   */
  public ReferenceRate(ReferenceConfig cfg, SplitTime t0) {
    this.forces = new ForceModel(cfg, t0);
  }

  /**
   * Clock rate at an inertial state.
   *
   * @param t seconds since t0
   * @param r inertial position, m
   * @param v inertial velocity, m/s
   * @return the breakdown
   */
  public RateBreakdown rate(double t, double[] r, double[] v) {
    return forces.evaluate(t, r, v, a);
  }
}
