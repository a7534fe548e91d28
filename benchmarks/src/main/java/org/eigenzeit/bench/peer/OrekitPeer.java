package org.eigenzeit.bench.peer;

import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.orekit.forces.gravity.HolmesFeatherstoneAttractionModel;
import org.orekit.forces.gravity.ThirdBodyAttraction;
import org.orekit.forces.gravity.potential.GravityFieldFactory;
import org.orekit.forces.gravity.potential.NormalizedSphericalHarmonicsProvider;
import org.orekit.forces.gravity.potential.TideSystem;
import org.orekit.frames.Frame;
import org.orekit.frames.FramesFactory;
import org.orekit.orbits.CartesianOrbit;
import org.orekit.orbits.OrbitType;
import org.orekit.propagation.SpacecraftState;
import org.orekit.propagation.numerical.NumericalPropagator;
import org.orekit.time.AbsoluteDate;
import org.orekit.utils.PVCoordinates;

/**
 * Orekit 13 (Luc Maisonobe et al., CS Group; a general-purpose flight-dynamics library) set up to
 * do the work of our {@code ReferenceConfig.earth(degree)} orbit:
 *
 * <ul>
 *   <li>gravity: {@link HolmesFeatherstoneAttractionModel} (Holmes and Featherstone 2002) with a
 *       normalised provider built from our EGM96 table ({@link GravityField#egm96}: the same
 *       C_nm, S_nm, GM and radius), plus the Newtonian term Orekit adds with the same GM;
 *   <li>Earth rotation: {@link SharedEarthFrame}, our EarthOrientation at every call;
 *   <li>Sun and Moon: {@link ThirdBodyAttraction} with {@link SharedBody} positions from our
 *       DE405 reader and our GM values ({@link ReferenceConfig#GM_SUN_M3_PER_S2},
 *       {@link ReferenceConfig#GM_MOON_M3_PER_S2});
 *   <li>integrator: Hipparchus DormandPrince853 with our step bounds (1e-3 s, 300 s) and our
 *       tolerances (relative tol, absolute tol |r0| and tol |v0|), Cartesian state.
 * </ul>
 *
 * What ours does in addition: the proper-time state (a seventh component with its clock-rate
 * evaluation) and the dense output of every step. Not thread-safe: one per thread.
 */
public final class OrekitPeer {
  private final int degree;
  private final ThirdBodies bodies;
  private final double ut1MinusTtS;
  private final double tol;
  private final NormalizedSphericalHarmonicsProvider field;
  private final double gm;
  private long lastEvaluations;

  /**
   * Sets up the peer for the reference configuration {@code ReferenceConfig.earth(degree)}.
   *
   * @param cfg our configuration (Earth, DE405 or no third bodies, DP853; surface forces off)
   */
  public OrekitPeer(ReferenceConfig cfg) {
    if (cfg.body().centre() != CentralBody.CENTRE_EARTH || cfg.degree() < 2
        || cfg.integrator() != ReferenceConfig.IntegratorKind.DORMAND_PRINCE_853
        || cfg.srpCrAreaOverMassM2PerKg() > 0 || cfg.dragCdAreaOverMassM2PerKg() > 0 || cfg.customField() != null) {
      throw new IllegalArgumentException("the peer mirrors Earth, EGM96 degree >= 2, DP853, no surface forces only");
    }
    this.degree = cfg.degree();
    this.bodies = cfg.thirdBodies();
    this.ut1MinusTtS = cfg.ut1MinusTtS();
    this.tol = cfg.relTolerance();
    final GravityField egm96 = GravityField.egm96(degree);
    this.gm = egm96.gmM3PerS2();
    final double[][] c = new double[degree + 1][];
    final double[][] s = new double[degree + 1][];
    for (int n = 0; n <= degree; n++) {
      c[n] = new double[n + 1];
      s[n] = new double[n + 1];
      for (int m = 0; m <= n; m++) {
        c[n][m] = egm96.c(n, m); // 0 below degree 2: Orekit adds the central term itself
        s[n][m] = egm96.s(n, m);
      }
    }
    this.field = GravityFieldFactory.getNormalizedProvider(egm96.radiusM(), gm, TideSystem.TIDE_FREE, c, s);
  }

  /**
   * Returns the force-model evaluations of the last propagation.
   *
   * @return the number of evaluations
   */
  public long lastEvaluations() {
    return lastEvaluations;
  }

  /**
   * Propagates an inertial state as our ReferencePropagator does (a new propagator per call, as
   * ours builds a new force model per call).
   *
   * @param t0 initial epoch, TT
   * @param r0 initial position, m (GCRS)
   * @param v0 initial velocity, m/s
   * @param spanS span, s
   * @return the position at t0 + span, m (GCRS)
   */
  public double[] propagate(SplitTime t0, double[] r0, double[] v0, double spanS) {
    final AbsoluteDate date0 = new AbsoluteDate(AbsoluteDate.J2000_EPOCH, (double) t0.wholeSeconds())
        .shiftedBy(t0.fractionS());
    final Frame gcrf = FramesFactory.getGCRF();
    final SharedEarthFrame earth = new SharedEarthFrame(t0, date0, ut1MinusTtS, CentralBody.EARTH.rotationRateRadPerS());
    final CartesianOrbit orbit = new CartesianOrbit(new PVCoordinates(new Vector3D(r0[0], r0[1], r0[2]),
        new Vector3D(v0[0], v0[1], v0[2])), gcrf, date0, gm);
    final double rn = Math.sqrt(r0[0] * r0[0] + r0[1] * r0[1] + r0[2] * r0[2]);
    final double vn = Math.sqrt(v0[0] * v0[0] + v0[1] * v0[1] + v0[2] * v0[2]);
    // Orekit's state is (r, v, mass): the mass has a zero derivative, so its error is exactly 0,
    // as our seventh component (proper time) adds next to nothing to the error norm.
    final double[] abs = {tol * rn, tol * rn, tol * rn, tol * vn, tol * vn, tol * vn, 1.0};
    final double[] rel = {tol, tol, tol, tol, tol, tol, tol};
    final DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-3, Math.min(300.0, spanS), abs, rel);
    final NumericalPropagator prop = new NumericalPropagator(integrator);
    prop.setOrbitType(OrbitType.CARTESIAN);
    prop.setInitialState(new SpacecraftState(orbit));
    prop.addForceModel(new HolmesFeatherstoneAttractionModel(earth.frame(), field));
    SharedBody sun = null;
    if (bodies != null) {
      sun = new SharedBody(bodies, true);
      prop.addForceModel(new ThirdBodyAttraction(sun, "Sun", ReferenceConfig.GM_SUN_M3_PER_S2));
      prop.addForceModel(new ThirdBodyAttraction(new SharedBody(bodies, false), "Moon", ReferenceConfig.GM_MOON_M3_PER_S2));
    }
    final Vector3D p = prop.propagate(date0.shiftedBy(spanS)).getPosition(gcrf);
    lastEvaluations = sun != null ? sun.calls() : earth.calls();
    return new double[] {p.getX(), p.getY(), p.getZ()};
  }

  /**
   * Returns the degree of the field.
   *
   * @return the degree
   */
  public int degree() {
    return degree;
  }
}
