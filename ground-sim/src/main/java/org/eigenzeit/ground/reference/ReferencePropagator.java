package org.eigenzeit.ground.reference;

import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.ode.DenseOutputModel;
import org.hipparchus.ode.ODEIntegrator;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.nonstiff.GraggBulirschStoerIntegrator;

/**
 * Integrates the orbit and the proper time together: the state is (r, v, tau - T) with
 * d(tau - T)/dT = y from {@link ForceModel}, so the proper-time offset comes from the same
 * trajectory the integrator builds, with the integrator's own error control on it.
 *
 * <p>Integrators (Hipparchus 4, not hand-written): Dormand-Prince 8(5,3) and
 * Gragg-Bulirsch-Stoer, both with vector tolerances: position and velocity relative tolerance
 * {@code tol} (absolute {@code tol |r0|} and {@code tol |v0|}), proper time absolute
 * {@code tol * 1e-4 s}. The reference's own error is measured, not assumed: see the convergence
 * and cross-integrator tests (docs/reference.md).
 *
 * <p>Each call builds its own force model; instances are stateless and thread-safe.
 */
public final class ReferencePropagator {
  private final ReferenceConfig cfg;

  /**
   * Creates a propagator.
   *
   * @param cfg the configuration
   */
  public ReferencePropagator(ReferenceConfig cfg) {
    this.cfg = cfg;
  }

  /**
   * Propagates an inertial state.
   *
   * @param t0 initial epoch, TT
   * @param r0 initial position, m (GCRS, or Moon-centred ICRF axes)
   * @param v0 initial velocity, m/s
   * @param spanS span to integrate, s (positive)
   * @return the dense trajectory
   */
  public ReferenceTrajectory propagate(SplitTime t0, double[] r0, double[] v0, double spanS) {
    if (!(spanS > 0) || !Double.isFinite(spanS)) {
      throw new IllegalArgumentException("span must be positive and finite");
    }
    final ForceModel forces = new ForceModel(cfg, t0);
    final Equations ode = new Equations(forces);
    final double tol = cfg.relTolerance();
    final double rn = Math.sqrt(r0[0] * r0[0] + r0[1] * r0[1] + r0[2] * r0[2]);
    final double vn = Math.sqrt(v0[0] * v0[0] + v0[1] * v0[1] + v0[2] * v0[2]);
    final double[] abs = {tol * rn, tol * rn, tol * rn, tol * vn, tol * vn, tol * vn, tol * 1e-4};
    final double[] rel = {tol, tol, tol, tol, tol, tol, tol};
    final double maxStep = Math.min(300.0, spanS);
    final ODEIntegrator integrator = switch (cfg.integrator()) {
      case DORMAND_PRINCE_853 -> new DormandPrince853Integrator(1e-3, maxStep, abs, rel);
      case GRAGG_BULIRSCH_STOER -> new GraggBulirschStoerIntegrator(1e-3, maxStep, abs, rel);
    };
    final DenseOutputModel dense = new DenseOutputModel();
    integrator.addStepHandler(dense);
    final double[] y0 = {r0[0], r0[1], r0[2], v0[0], v0[1], v0[2], 0.0};
    integrator.integrate(ode, new ODEState(0.0, y0), spanS);
    return new ReferenceTrajectory(cfg, t0, spanS, dense, ode.evaluations);
  }

  /** Orbit plus proper time: d(r, v, tau - T)/dt = (v, a, y). */
  private static final class Equations implements OrdinaryDifferentialEquation {
    private final ForceModel forces;
    private final double[] r = new double[3];
    private final double[] v = new double[3];
    private final double[] a = new double[3];
    private long evaluations;

    Equations(ForceModel forces) {
      this.forces = forces;
    }

    @Override
    public int getDimension() {
      return 7;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
      System.arraycopy(y, 0, r, 0, 3);
      System.arraycopy(y, 3, v, 0, 3);
      final RateBreakdown rate = forces.evaluate(t, r, v, a);
      evaluations++;
      return new double[] {y[3], y[4], y[5], a[0], a[1], a[2], rate.total()};
    }
  }
}
