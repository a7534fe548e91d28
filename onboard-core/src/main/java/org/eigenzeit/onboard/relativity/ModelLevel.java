package org.eigenzeit.onboard.relativity;

/**
 * How much of the central body's gravity field the rate model includes. Tides and the c^-4 terms
 * are switched separately in {@link ModelConfig}.
 */
public enum ModelLevel {
  /** Monopole GM/r only. */
  POINT_MASS,
  /** Monopole plus the J2 zonal term (closed form). */
  J2,
  /** Monopole plus the zonal and tesseral harmonics of the coefficient table to a set degree. */
  HARMONICS
}
