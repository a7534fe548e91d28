package org.eigenzeit.ground.reference;

import java.util.Objects;
import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;

/**
 * What the reference integrates: central body and its field, third bodies, radiation pressure,
 * drag, the c^-4 terms, the integrator and its tolerance.
 *
 * @param body central body (Earth or Moon)
 * @param degree harmonic degree for the Earth (2..36); ignored for the Moon (J2 only)
 * @param thirdBodies Sun and Moon (Earth and Sun for a lunar orbiter) source, or null for none
 * @param srpCrAreaOverMassM2PerKg radiation-pressure coefficient times area over mass (0: off)
 * @param dragCdAreaOverMassM2PerKg drag coefficient times area over mass (0: off)
 * @param c4 whether the clock rate includes the c^-4 terms
 * @param integrator which Hipparchus integrator
 * @param relTolerance relative tolerance of the position and velocity components
 * @param ut1MinusTtS UT1 - TT, s
 * @param customField a coefficient table to use instead of EGM96 (null: EGM96 to the degree)
 */
public record ReferenceConfig(CentralBody body, int degree, ThirdBodies thirdBodies,
    double srpCrAreaOverMassM2PerKg, double dragCdAreaOverMassM2PerKg, boolean c4,
    IntegratorKind integrator, double relTolerance, double ut1MinusTtS, GravityField customField) {

  /** GM of the Sun for the third-body acceleration, m^3/s^2 (the DE405 value, Standish 1998; from memory). */
  public static final double GM_SUN_M3_PER_S2 = 1.32712440017987e20;
  /** GM of the Moon for the third-body acceleration, m^3/s^2 (Wieczorek 2015; REFERENCE-VALUES). */
  public static final double GM_MOON_M3_PER_S2 = 4.9028001e12;

  /** The two integrators the reference offers (independent methods, to check each other). */
  public enum IntegratorKind {
    /** Dormand-Prince 8(5,3), Hairer, Norsett and Wanner (1993), section II.10. */
    DORMAND_PRINCE_853,
    /** Gragg-Bulirsch-Stoer extrapolation, Hairer, Norsett and Wanner (1993), section II.9. */
    GRAGG_BULIRSCH_STOER
  }

  /** Validates the record. */
  public ReferenceConfig {
    Objects.requireNonNull(body, "body");
    Objects.requireNonNull(integrator, "integrator");
    if (body.centre() == CentralBody.CENTRE_EARTH && (degree < 0 || degree == 1 || degree > 36)) {
      throw new IllegalArgumentException("degree must be 0 (point mass) or 2..36 (EGM96 shipped to 36)");
    }
    if (customField != null && customField.degree() < degree) {
      throw new IllegalArgumentException("custom field has degree " + customField.degree() + " < " + degree);
    }
    if (!(relTolerance > 0 && relTolerance < 1e-6)) {
      throw new IllegalArgumentException("relative tolerance must be in (0, 1e-6)");
    }
    if (srpCrAreaOverMassM2PerKg < 0 || dragCdAreaOverMassM2PerKg < 0) {
      throw new IllegalArgumentException("radiation pressure and drag coefficients must be >= 0");
    }
  }

  /**
   * The full Earth reference: degree 36, DE405 Sun and Moon, no radiation pressure or drag.
   *
   * @param degree harmonic degree
   * @return a configuration
   */
  public static ReferenceConfig earth(int degree) {
    return new ReferenceConfig(CentralBody.EARTH, degree, ThirdBodies.de405(), 0.0, 0.0, false,
        IntegratorKind.DORMAND_PRINCE_853, 1e-13, -69.2, null);
  }

  /**
   * A lunar-orbiter reference: lunar J2, Earth and Sun from DE405.
   *
   * @return a configuration
   */
  public static ReferenceConfig moon() {
    return new ReferenceConfig(CentralBody.MOON, 2, ThirdBodies.de405(), 0.0, 0.0, false,
        IntegratorKind.DORMAND_PRINCE_853, 1e-13, -69.2, null);
  }

  /**
   * Same configuration with other third bodies.
   *
   * @param tb the provider, or null for none
   * @return a copy
   */
  public ReferenceConfig withThirdBodies(ThirdBodies tb) {
    return new ReferenceConfig(body, degree, tb, srpCrAreaOverMassM2PerKg, dragCdAreaOverMassM2PerKg, c4,
        integrator, relTolerance, ut1MinusTtS, customField);
  }

  /**
   * Same configuration with another integrator and tolerance.
   *
   * @param kind integrator
   * @param tol relative tolerance
   * @return a copy
   */
  public ReferenceConfig withIntegrator(IntegratorKind kind, double tol) {
    return new ReferenceConfig(body, degree, thirdBodies, srpCrAreaOverMassM2PerKg, dragCdAreaOverMassM2PerKg,
        c4, kind, tol, ut1MinusTtS, customField);
  }

  /**
   * Same configuration with non-gravitational forces.
   *
   * @param srp Cr A/m, m^2/kg
   * @param drag Cd A/m, m^2/kg
   * @return a copy
   */
  public ReferenceConfig withSurfaceForces(double srp, double drag) {
    return new ReferenceConfig(body, degree, thirdBodies, srp, drag, c4, integrator, relTolerance, ut1MinusTtS, customField);
  }

  /**
   * Same configuration with or without the c^-4 terms.
   *
   * @param on c^-4 on
   * @return a copy
   */
  public ReferenceConfig withC4(boolean on) {
    return new ReferenceConfig(body, degree, thirdBodies, srpCrAreaOverMassM2PerKg, dragCdAreaOverMassM2PerKg, on,
        integrator, relTolerance, ut1MinusTtS, customField);
  }

  /**
   * Same configuration with another degree.
   *
   * @param n degree
   * @return a copy
   */
  public ReferenceConfig withDegree(int n) {
    return new ReferenceConfig(body, n, thirdBodies, srpCrAreaOverMassM2PerKg, dragCdAreaOverMassM2PerKg, c4,
        integrator, relTolerance, ut1MinusTtS, customField);
  }

  /**
   * Same configuration with a coefficient table of the caller's (for example J2 only).
   *
   * @param field the table
   * @param n degree to use
   * @return a copy
   */
  public ReferenceConfig withField(GravityField field, int n) {
    return new ReferenceConfig(body, n, thirdBodies, srpCrAreaOverMassM2PerKg, dragCdAreaOverMassM2PerKg, c4,
        integrator, relTolerance, ut1MinusTtS, field);
  }

  /**
   * The coefficient table: the custom one, or the shipped EGM96 (degree 36, loaded once; the force
   * model reads it to the configured degree only). Callers only read it.
   *
   * @return the table (Earth only)
   */
  GravityField field() {
    return customField != null ? customField : Egm96Holder.TABLE;
  }

  /** The shipped EGM96 table, read once (never staged again, so safe to share between runs). */
  private static final class Egm96Holder {
    static final GravityField TABLE = GravityField.egm96(36);

    private Egm96Holder() {}
  }
}
