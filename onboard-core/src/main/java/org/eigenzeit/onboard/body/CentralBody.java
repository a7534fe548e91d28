package org.eigenzeit.onboard.body;

/**
 * Constants of a central body and of the coordinate time scale realised near it.
 *
 * <p>The clock-rate model is {@code y = dtau/dT - 1 = -(v^2/2 + U - W0)/c^2} (IERS Conventions
 * 2010, chapter 10, eq. 10.6 rearranged), where T is the body's "terrestrial-like" time scale
 * whose rate differs from the body's coordinate time by the defining constant {@code L = W0/c^2}.
 * For the Earth, T = TT and L = L_G (IAU 2000 Resolution B1.9).
 *
 * <p>Earth ({@link #EARTH}): GM and reference radius of EGM96 (Lemoine et al. 1998,
 * NASA/TP-1998-206861), because the default coefficient table is scaled by them (GM is the
 * TT-compatible value; the TCG-compatible value 3.986004418e14 of IERS 2010 Table 1.1 differs by
 * L_G, a relative 7e-10 of the monopole, i.e. below 1e-19 in y at any altitude); J2 = -sqrt(5) C20
 * of EGM96; rotation rate of WGS 84 (NIMA TR8350.2); L_G defining (IAU 2000 B1.9), hence
 * W0 = L_G c^2 = 62 636 856.0 m^2/s^2 (IERS 2010 Table 1.1).
 *
 * <p>Moon ({@link #MOON}): GM and mean radius from Wieczorek (2015), "Gravity and Topography of the
 * Terrestrial Planets", Treatise on Geophysics 2nd ed., vol. 10; J2 = 2.0330e-4 at reference
 * radius 1738 km, GRAIL-era value (from memory; the ground reference uses the same number, and the
 * verification module cross-checks it against the literature range 2.03e-4); rotation rate
 * synchronous with the sidereal month 27.321661 d. Lunar time: IAU 2024 Resolution II defines the
 * lunar coordinate time TCL and asks for a TT-like scale tied to it, without fixing its rate
 * constant. For the Moon, T is Eigenzeit's TL = TCL - L_L (TCL - T0) with, by default,
 * {@code W0_L = GM_M / R_M} at the mean radius (monopole potential on the mean sphere; the
 * rotational and J2 terms on that sphere are below 2e-5 of it) and {@code L_L = W0_L/c^2} =
 * 3.1403e-11; the drift of TL - TT published by Turyshev et al. (2024, arXiv 2406.16147) implies
 * 3.1391e-11 (docs/time-scales.md). A mission that adopts other constants substitutes its own body
 * with {@link #of}; an uplinked lunar time table carries the L_L it was fitted for.
 *
 * <p>Immutable; safe to share between threads.
 */
public final class CentralBody {
  /** Speed of light in vacuum, m/s (exact, SI). */
  public static final double C_M_PER_S = 299_792_458.0;
  /** c^2, m^2/s^2. */
  public static final double C2 = C_M_PER_S * C_M_PER_S;

  /** Ephemeris centre code: the body is the Earth (third bodies: Sun and Moon). */
  public static final int CENTRE_EARTH = 0;
  /** Ephemeris centre code: the body is the Moon (third bodies: Earth and Sun). */
  public static final int CENTRE_MOON = 1;

  /** The Earth, with TT as its time scale. */
  public static final CentralBody EARTH = new CentralBody("Earth", CENTRE_EARTH, 3.986004415e14,
      6_378_136.3, 1.0826266835531513e-3, 7.2921151467e-5, 6.969290134e-10,
      6_378_136.3 - 30_000.0, 2.0e9, 2.0e4);

  /** The Moon, with Eigenzeit's adopted TT-like lunar time scale (see class doc). */
  public static final CentralBody MOON = new CentralBody("Moon", CENTRE_MOON, 4.9028001e12,
      1_738_000.0,
      2.0330e-4, 2.0 * Math.PI / (27.321661 * 86_400.0),
      4.9028001e12 / 1_737_151.0 / (C_M_PER_S * C_M_PER_S), 1_737_151.0 - 12_000.0, 6.6e7,
      1.0e4);

  private final String name;
  private final int centre;
  private final double gmM3PerS2;
  private final double referenceRadiusM;
  private final double j2;
  private final double rotationRateRadPerS;
  private final double scaleRateL;
  private final double minRadiusM;
  private final double maxRadiusM;
  private final double maxSpeedMPerS;

  private CentralBody(String name, int centre, double gm, double radius, double j2, double omega, double l,
      double minRadius, double maxRadius, double maxSpeed) {
    this.name = name;
    this.centre = centre;
    this.gmM3PerS2 = gm;
    this.referenceRadiusM = radius;
    this.j2 = j2;
    this.rotationRateRadPerS = omega;
    this.scaleRateL = l;
    this.minRadiusM = minRadius;
    this.maxRadiusM = maxRadius;
    this.maxSpeedMPerS = maxSpeed;
  }

  /**
   * A body of the mission's own constants.
   *
   * @param name display name
   * @param centre {@link #CENTRE_EARTH} or {@link #CENTRE_MOON}: which third bodies apply
   * @param gmM3PerS2 gravitational parameter GM, m^3/s^2 (positive)
   * @param referenceRadiusM reference radius of J2 and the harmonic table, m (positive)
   * @param j2 unnormalised J2 (dimensionless)
   * @param rotationRateRadPerS rotation rate about the body's z axis, rad/s
   * @param scaleRateL the time scale's defining rate constant L = W0/c^2
   * @param minRadiusM smallest physically possible orbit radius (validation), m
   * @param maxRadiusM largest radius accepted (validation), m
   * @param maxSpeedMPerS largest speed accepted (validation), m/s
   * @return the body
   * @throws IllegalArgumentException when a value is not finite or not positive where it must be
   */
  public static CentralBody of(String name, int centre, double gmM3PerS2, double referenceRadiusM, double j2,
      double rotationRateRadPerS, double scaleRateL, double minRadiusM, double maxRadiusM,
      double maxSpeedMPerS) {
    if (!(gmM3PerS2 > 0) || !(referenceRadiusM > 0) || !Double.isFinite(j2)
        || !Double.isFinite(rotationRateRadPerS) || !(scaleRateL >= 0 && scaleRateL < 1e-6)
        || (centre != CENTRE_EARTH && centre != CENTRE_MOON) || !(minRadiusM > 0) || !(maxRadiusM > minRadiusM) || !(maxSpeedMPerS > 0)
        || !Double.isFinite(gmM3PerS2 + referenceRadiusM + maxRadiusM + maxSpeedMPerS)) {
      throw new IllegalArgumentException("central body constants out of range: " + name);
    }
    return new CentralBody(name, centre, gmM3PerS2, referenceRadiusM, j2, rotationRateRadPerS, scaleRateL,
        minRadiusM, maxRadiusM, maxSpeedMPerS);
  }

  /**
   * Returns display name.
   *
   * @return display name
   */
  public String name() {
    return name;
  }

  /**
   * Returns {@link #CENTRE_EARTH} or {@link #CENTRE_MOON}.
   *
   * @return {@link #CENTRE_EARTH} or {@link #CENTRE_MOON}
   */
  public int centre() {
    return centre;
  }

  /**
   * Returns gM, m^3/s^2.
   *
   * @return GM, m^3/s^2
   */
  public double gmM3PerS2() {
    return gmM3PerS2;
  }

  /**
   * Returns reference radius, m.
   *
   * @return reference radius, m
   */
  public double referenceRadiusM() {
    return referenceRadiusM;
  }

  /**
   * Returns unnormalised J2.
   *
   * @return unnormalised J2
   */
  public double j2() {
    return j2;
  }

  /**
   * Returns rotation rate, rad/s.
   *
   * @return rotation rate, rad/s
   */
  public double rotationRateRadPerS() {
    return rotationRateRadPerS;
  }

  /**
   * Returns the time scale's defining rate constant L = W0/c^2.
   *
   * @return the time scale's defining rate constant L = W0/c^2
   */
  public double scaleRateL() {
    return scaleRateL;
  }

  /**
   * Returns the reference potential W0 = L c^2, m^2/s^2.
   *
   * @return the reference potential W0 = L c^2, m^2/s^2
   */
  public double referencePotentialM2PerS2() {
    return scaleRateL * C2;
  }

  /**
   * Returns smallest accepted orbit radius, m.
   *
   * @return smallest accepted orbit radius, m
   */
  public double minRadiusM() {
    return minRadiusM;
  }

  /**
   * Returns largest accepted orbit radius, m.
   *
   * @return largest accepted orbit radius, m
   */
  public double maxRadiusM() {
    return maxRadiusM;
  }

  /**
   * Returns largest accepted speed, m/s.
   *
   * @return largest accepted speed, m/s
   */
  public double maxSpeedMPerS() {
    return maxSpeedMPerS;
  }

  @Override
  public String toString() {
    return "CentralBody[" + name + "]";
  }
}
