package org.eigenzeit.ground.reference;

import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.ode.DenseOutputModel;
import org.hipparchus.ode.ODEStateAndDerivative;

/**
 * A propagated reference: orbit and proper-time offset at any instant of its span, from the
 * integrator's own continuous output (Hipparchus DenseOutputModel), without integrating again.
 *
 * <p>Not thread-safe (the rate re-evaluation shares a force model): one owner per run.
 */
public final class ReferenceTrajectory {
  private final ReferenceConfig cfg;
  private final SplitTime t0;
  private final double spanS;
  private final DenseOutputModel dense;
  private final long evaluations;
  private final ForceModel forces;
  private final double[] r = new double[3];
  private final double[] v = new double[3];
  private final double[] a = new double[3];

  ReferenceTrajectory(ReferenceConfig cfg, SplitTime t0, double spanS, DenseOutputModel dense, long evaluations) {
    this.cfg = cfg;
    this.t0 = SplitTime.of(t0.wholeSeconds(), t0.fractionS());
    this.spanS = spanS;
    this.dense = dense;
    this.evaluations = evaluations;
    this.forces = new ForceModel(cfg, t0);
  }

  /** @return the span, s */
  public double spanS() {
    return spanS;
  }

  /**
   * The start epoch.
   *
   * @return a copy of t0 (TT)
   */
  public SplitTime t0() {
    return SplitTime.of(t0.wholeSeconds(), t0.fractionS());
  }

  /** @return the number of force-model evaluations the integration took */
  public long evaluations() {
    return evaluations;
  }

  /** @return the configuration */
  public ReferenceConfig config() {
    return cfg;
  }

  /**
   * Inertial position and velocity at t.
   *
   * @param t seconds since t0, within the span
   * @param rOut receives the position, m
   * @param vOut receives the velocity, m/s
   */
  public void state(double t, double[] rOut, double[] vOut) {
    final double[] y = interpolated(t).getPrimaryState();
    System.arraycopy(y, 0, rOut, 0, 3);
    System.arraycopy(y, 3, vOut, 0, 3);
  }

  /**
   * Proper-time offset tau - T accumulated since t0.
   *
   * @param t seconds since t0
   * @return the offset, s
   */
  public double properTimeOffsetS(double t) {
    return interpolated(t).getPrimaryState()[6];
  }

  /**
   * The clock rate and its components at t, re-evaluated on the interpolated state.
   *
   * @param t seconds since t0
   * @return the breakdown
   */
  public RateBreakdown rate(double t) {
    state(t, r, v);
    return forces.evaluate(t, r, v, a);
  }

  private ODEStateAndDerivative interpolated(double t) {
    if (t < -1e-9 || t > spanS + 1e-9) {
      throw new IllegalArgumentException("t = " + t + " s outside the span 0.." + spanS);
    }
    return dense.getInterpolatedState(Math.max(0.0, Math.min(spanS, t)));
  }
}
