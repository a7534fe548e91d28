package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.Geopotential;
import org.eigenzeit.onboard.gravity.LunisolarEphemeris;
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
 * <p>Third-body positions and the lunar pole are refreshed once per {@value #SLOW_SLOT_S} s slot
 * of TT (the Moon moves about 60 km in that time, changing the tidal term by below 1e-19).
 *
 * <p>Mutable scratch state: not thread-safe; one owner. Nothing allocates after construction.
 */
public final class RateModel {
  /** 1/c^2 (multiplying is cheaper than dividing on every cycle). */
  private static final double INV_C2 = 1.0 / CentralBody.C2;

  /** Cadence of the third-body and pole refresh, s. */
  public static final double SLOW_SLOT_S = 60.0;

  private final CentralBody body;
  private final double gm;
  private final double radius;
  private final double j2;
  private final double scaleL;
  private final Geopotential geopotential;
  private final LunisolarEphemeris ephemeris;
  private final double[] sunRel = new double[3];
  private final double[] moonRel = new double[3];
  private final double gmFirst;
  private final double gmSecond;
  private final boolean isJ2;
  private final boolean tides;
  private final boolean c4;

  /**
   * Creates the model.
   *
   * @param config the configuration
   */
  public RateModel(ModelConfig config) {
    this.body = config.body;
    this.gm = body.gmM3PerS2();
    this.radius = body.referenceRadiusM();
    this.j2 = body.j2();
    this.scaleL = body.scaleRateL();
    this.geopotential = config.level == ModelLevel.HARMONICS
        ? new Geopotential(config.field, config.degree) : null;
    this.ephemeris = new LunisolarEphemeris(config.math);
    this.gmFirst = TidalPotential.GM_SUN;
    this.gmSecond = body.centre() == CentralBody.CENTRE_EARTH
        ? TidalPotential.GM_MOON : CentralBody.EARTH.gmM3PerS2();
    this.isJ2 = config.level == ModelLevel.J2;
    this.tides = config.tides;
    this.c4 = config.c4;
  }

  /**
   * Refreshes the third-body positions for a slot. Called by the tracker when the slot changes.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0 at the slot start
   */
  public void refreshThirdBodies(double centuriesTt) {
    if (!tides) {
      return;
    }
    ephemeris.sun(centuriesTt, sunRel);
    ephemeris.moon(centuriesTt, moonRel);
    if (body.centre() == CentralBody.CENTRE_MOON) {
      // Seen from the Moon: the Sun at (sun - moon), the Earth at -moon.
      for (int i = 0; i < 3; i++) {
        sunRel[i] -= moonRel[i];
        moonRel[i] = -moonRel[i];
      }
    }
  }

  /**
   * Evaluates the model.
   *
   * @param rInertialM position in the inertial frame centred on the body (GCRS for the Earth), m
   * @param vInertialMPerS inertial velocity, m/s
   * @param rBodyFixedM body-fixed position (ITRS), m; read only at level HARMONICS
   * @param poleInertial unit vector of the body's rotation pole in the inertial frame (J2 level)
   * @param out receives the components
   */
  public void evaluate(double[] rInertialM, double[] vInertialMPerS, double[] rBodyFixedM,
      double[] poleInertial, RateComponents out) {
    evaluateWithInverseRadius(rInertialM, vInertialMPerS, rBodyFixedM, poleInertial, 1.0 / Vec3.norm(rInertialM),
        out);
  }

  /**
   * As {@link #evaluate(double[], double[], double[], double[], RateComponents)} with 1/|r| known
   * (the tracker has it from validation).
   */
  void evaluateWithInverseRadius(double[] rInertialM, double[] vInertialMPerS, double[] rBodyFixedM,
      double[] poleInertial, double invR, RateComponents out) {
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
    final double ut = tides ? tidalPotential(rInertialM) : 0.0;
    final double rGradT = tides ? tidalRadialDerivative(rInertialM) : 0.0;
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

  private double tidalPotential(double[] r) {
    return TidalPotential.potential(gmFirst, sunRel, r) + TidalPotential.potential(gmSecond, moonRel, r);
  }

  private double tidalRadialDerivative(double[] r) {
    return TidalPotential.radialDerivative(gmFirst, sunRel, r)
        + TidalPotential.radialDerivative(gmSecond, moonRel, r);
  }

  /** The c^-4 terms with L folded in: (a4 + L (a2 + L)) / (1 - L) for the potential u. */
  private double higherOrder(double u, double v2) {
    final double ic2 = INV_C2;
    final double a2 = -(0.5 * v2 + u) * ic2;
    final double a4 = (0.5 * u * u - 1.5 * u * v2 - 0.125 * v2 * v2) * (ic2 * ic2);
    return (a4 + scaleL * (a2 + scaleL)) / (1.0 - scaleL);
  }

  /**
   * Current third-body position (Sun), relative to the central body, m.
   *
   * @param out receives the position
   */
  public void sunPosition(double[] out) {
    Vec3.copy(sunRel, out);
  }

  /**
   * Current second third-body position (Moon for the Earth, Earth for the Moon), m.
   *
   * @param out receives the position
   */
  public void secondBodyPosition(double[] out) {
    Vec3.copy(moonRel, out);
  }

}
