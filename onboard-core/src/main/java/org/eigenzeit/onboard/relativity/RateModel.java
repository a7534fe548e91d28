package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.Geopotential;
import org.eigenzeit.onboard.gravity.GravityTable;
import org.eigenzeit.onboard.gravity.TidalPotential;
import org.eigenzeit.onboard.math.Vec3;

/**
 * The clock-rate model: fractional frequency of a clock on the satellite against the central
 * body's TT-like scale, after IERS Conventions (2010) chapter 10, eqs. 10.6-10.7:
 *
 * <pre>
 *   y = dtau/dT - 1 = -(v^2/2 + U - W0)/c^2                                       (order c^-2)
 *   y = (a2 + a4 + L)/(1 - L),  a2 = -(v^2/2 + U)/c^2,
 *        a4 = (U^2/2 - 3 U v^2/2 - v^4/8)/c^4                     (with the c^-4 terms enabled)
 *   U = GM/r + U_h + U_tid  (positive convention), v the inertial (GCRS) speed, L = W0/c^2.
 * </pre>
 *
 * The c^-4 form is the expansion of the IAU 2000 Resolution B1.3 metric (g00 = -1 + 2w/c^2 -
 * 2w^2/c^4, gij = delta_ij (1 + 2w/c^2)) for dtau/dTCG, divided by dTT/dTCG = 1 - L; the Earth's
 * gravitomagnetic term (about 1e-23) is omitted.
 *
 * <p>Validity: orbits from the minimum radius of the body to about 1.5 million km (weak field,
 * |U|/c^2 &lt; 1e-8); no atmosphere or radiation effects on the clock itself.
 *
 * <p>Accuracy of y against exact evaluation with the same r, v: rounding below 1e-20. Model
 * truncation: see docs/algorithms.md (per-level budget: point mass leaves the J2 term, up to
 * 7e-13 at LEO; J2 leaves the higher harmonics, up to 1e-15 at LEO; degree 8 leaves below 3e-17 at
 * LEO; the lunisolar term is about 1e-15 at GEO and is modelled to about 1 %).
 *
 * <p>The offset integrator needs {@code g = y + 2 (v^2 + r . a)/c^2} with {@code a = grad U};
 * {@code r . grad} of each term is exact: -GM/r for the monopole, -(n+1) U_n for a degree-n
 * harmonic, and the closed form of {@link TidalPotential#radialDerivative} for tides.
 *
 * <p>Third-body positions are inputs: the caller (the tracker's orientation cache) refreshes them
 * once per 60 s slot of TT (the Moon moves about 60 km in that time, changing the tidal term by
 * below 1e-19).
 *
 * <p>Holds no state between evaluations apart from the geopotential's scratch arrays: not
 * thread-safe; one owner. Nothing allocates after construction.
 */
public final class RateModel {
  /** 1/c^2 (multiplying is cheaper than dividing on every cycle). */
  private static final double INV_C2 = 1.0 / CentralBody.C2;

  private final double gm;
  private final double radius;
  private final double j2;
  private final double scaleL;
  private final Geopotential geopotential;
  private final double gmFirst;
  private final double gmSecond;
  private final boolean isJ2;
  private final boolean tides;
  private final boolean c4;

  /**
   * Creates the model with its own coefficient table holding the configuration's field.
   *
   * @param config the configuration
   */
  public RateModel(ModelConfig config) {
    this(config, gravityTableFor(config));
  }

  /**
   * Creates the model evaluating the active field of a coefficient table (at level HARMONICS).
   *
   * @param config the configuration
   * @param gravity the table (capacity at least the configured degree at level HARMONICS)
   */
  public RateModel(ModelConfig config, GravityTable gravity) {
    final CentralBody body = config.body();
    this.gm = body.gmM3PerS2();
    this.radius = body.referenceRadiusM();
    this.j2 = body.j2();
    this.scaleL = body.scaleRateL();
    this.geopotential = config.level() == ModelLevel.HARMONICS ? new Geopotential(gravity, config.degree()) : null;
    this.gmFirst = TidalPotential.GM_SUN;
    this.gmSecond = body.centre() == CentralBody.CENTRE_EARTH
        ? TidalPotential.GM_MOON : CentralBody.EARTH.gmM3PerS2();
    this.isJ2 = config.level() == ModelLevel.J2;
    this.tides = config.tides();
    this.c4 = config.c4();
  }

  /**
   * An empty coefficient table for a configuration: capacity the configured degree at level
   * HARMONICS (GM and radius of the body as the reference of its content rule), 0 otherwise.
   *
   * @param config the configuration
   * @return the table, nothing active
   */
  public static GravityTable emptyGravityTable(ModelConfig config) {
    final CentralBody body = config.body();
    return new GravityTable(config.level() == ModelLevel.HARMONICS ? config.degree() : 0, body.gmM3PerS2(),
        body.referenceRadiusM());
  }

  /**
   * A coefficient table for a configuration with its field installed, cut at the configured
   * degree (construction time).
   *
   * @param config the configuration
   * @return the table
   */
  public static GravityTable gravityTableFor(ModelConfig config) {
    final GravityTable t = emptyGravityTable(config);
    if (config.field() != null) {
      t.install(config.field().truncated(config.degree()));
    }
    return t;
  }

  /**
   * Evaluates the model.
   *
   * @param rInertialM position in the inertial frame centred on the body (GCRS for the Earth), m
   * @param vInertialMPerS inertial velocity, m/s
   * @param rBodyFixedM body-fixed position (ITRS), m; read only at level HARMONICS
   * @param poleInertial unit vector of the body's rotation pole in the inertial frame (J2 level)
   * @param bodies the third-body positions relative to the central body (read only with tides)
   * @param out receives the components
   */
  public void evaluate(double[] rInertialM, double[] vInertialMPerS, double[] rBodyFixedM,
      double[] poleInertial, ThirdBodies bodies, RateComponents out) {
    evaluate(rInertialM, vInertialMPerS, rBodyFixedM, poleInertial, bodies, 1.0 / Vec3.norm(rInertialM), out);
  }

  /**
   * As {@link #evaluate(double[], double[], double[], double[], ThirdBodies, RateComponents)} with
   * 1/|r| known (the tracker has it from validation).
   *
   * @param rInertialM position in the inertial frame centred on the body, m
   * @param vInertialMPerS inertial velocity, m/s
   * @param rBodyFixedM body-fixed position, m (read only at level HARMONICS)
   * @param poleInertial unit vector of the rotation pole in the inertial frame
   * @param bodies the third-body positions (read only with tides)
   * @param invR 1/|r|, 1/m
   * @param out receives the components
   */
  public void evaluate(double[] rInertialM, double[] vInertialMPerS, double[] rBodyFixedM,
      double[] poleInertial, ThirdBodies bodies, double invR, RateComponents out) {
    // Kept small (the rare terms live in their own methods) so that a JIT inlines the whole cycle.
    final double v2 = Vec3.dot(vInertialMPerS, vInertialMPerS);
    final double u0 = gm * invR;
    double uh = 0.0;
    double radialH = 0.0;
    if (isJ2) {
      final double sinLat = Vec3.dot(rInertialM, poleInertial) * invR;
      final double ratio = radius * invR;
      uh = -u0 * j2 * ratio * ratio * (1.5 * sinLat * sinLat - 0.5);
      radialH = 3.0 * uh;
    } else if (geopotential != null) {
      uh = harmonics(rBodyFixedM);
      radialH = geopotential.radialSumM2PerS2();
    }
    final double ut = tides ? tidalPotential(bodies, rInertialM) : 0.0;
    final double rGradT = tides ? tidalRadialDerivative(bodies, rInertialM) : 0.0;
    final double ic2 = INV_C2;
    out.kinematic = -0.5 * v2 * ic2;
    out.gravitational = scaleL - u0 * ic2;
    out.harmonics = -uh * ic2;
    out.tidal = -ut * ic2;
    out.higherOrder = c4 ? higherOrder(u0 + uh + ut, v2) : 0.0;
    out.total = out.kinematic + out.gravitational + out.harmonics + out.tidal + out.higherOrder;
    out.rDotVM2PerS = Vec3.dot(rInertialM, vInertialMPerS);
    final double rDotA = -u0 - radialH + rGradT;
    out.integrandRate = out.total + 2.0 * (v2 + rDotA) * ic2;
  }

  /** Evaluates the geopotential harmonics at the body-fixed position; returns their potential. */
  private double harmonics(double[] rBodyFixedM) {
    geopotential.evaluate(rBodyFixedM[0], rBodyFixedM[1], rBodyFixedM[2]);
    return geopotential.potentialM2PerS2();
  }

  private double tidalPotential(ThirdBodies b, double[] r) {
    return TidalPotential.potential(gmFirst, b.first, r) + TidalPotential.potential(gmSecond, b.second, r);
  }

  private double tidalRadialDerivative(ThirdBodies b, double[] r) {
    return TidalPotential.radialDerivative(gmFirst, b.first, r)
        + TidalPotential.radialDerivative(gmSecond, b.second, r);
  }

  /** The c^-4 terms with L folded in: (a4 + L (a2 + L)) / (1 - L) for the potential u. */
  private double higherOrder(double u, double v2) {
    final double ic2 = INV_C2;
    final double a2 = -(0.5 * v2 + u) * ic2;
    final double a4 = (0.5 * u * u - 1.5 * u * v2 - 0.125 * v2 * v2) * (ic2 * ic2);
    return (a4 + scaleL * (a2 + scaleL)) / (1.0 - scaleL);
  }

}
