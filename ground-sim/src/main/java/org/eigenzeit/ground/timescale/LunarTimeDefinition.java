package org.eigenzeit.ground.timescale;

import org.eigenzeit.onboard.body.CentralBody;

/**
 * The two constants that the literature has not fixed for a TT-like lunar time scale TL, as
 * Eigenzeit realises it:
 *
 * <pre>
 *   TL = TCL - L_L (TCL - T0)            (the analogue of TT = TCG - L_G (TCG - T0))
 *   TL - TT at the Moon's centre = TL0 + R (TT - T0) + P(TT)   (P: periodic, no constant term)
 * </pre>
 *
 * <p>{@code scaleRateL} is L_L. Default: the value the onboard core has always used,
 * L_L = GM_M / (R_M c^2) = 3.1403e-11 with GM_M = 4.9028001e12 m^3/s^2 and the mean radius
 * R_M = 1737.151 km of Wieczorek (2015, Treatise on Geophysics 2nd ed., vol. 10): the monopole
 * potential on the mean lunar sphere, as {@link CentralBody#MOON}. IAU 2024 Resolution II asks for
 * a lunar coordinate time and a TT-like scale tied to it but (as we read it) fixes no L_L; the
 * drift 56.0256 us/day of TL - TT quoted by Turyshev, Williams, Boggs and Park (2024, arXiv
 * 2406.16147), together with the mean dTCL/dTDB of Lu, Yang and Xie (2025, arXiv 2506.19213),
 * implies L_L = 3.1391e-11 (derived here, not a value quoted by them); the two choices differ by
 * 1.2e-14, i.e. 1.0 ns/day in the drift of TL - TT. A mission follows the value its standard adopts.
 *
 * <p>{@code tlMinusTtAtT0S} is TL0, TL - TT at T0 = 1977-01-01T00:00:32.184 TT apart from the
 * periodic terms; default 0 (TL and TT start together like TT and TCG). IAU 2024 Resolution II
 * sets, as recalled, TCL's origin like TCG's; realising that origin would need the time ephemeris
 * back to 1977, which the shipped DE405 does not cover, so Eigenzeit fixes the constant by this
 * convention instead.
 *
 * @param scaleRateL L_L, in (0, 1e-9)
 * @param tlMinusTtAtT0S TL0, s, |TL0| &lt;= 1 s
 */
public record LunarTimeDefinition(double scaleRateL, double tlMinusTtAtT0S) {
  /** Eigenzeit's default definition (see the class doc). */
  public static final LunarTimeDefinition DEFAULT = new LunarTimeDefinition(CentralBody.MOON.scaleRateL(), 0.0);

  /** Validates the constants. */
  public LunarTimeDefinition {
    if (!(scaleRateL > 0 && scaleRateL < 1e-9)) {
      throw new IllegalArgumentException("L_L out of range: found " + scaleRateL + ", allowed 0 < L_L < 1e-9");
    }
    if (!(Math.abs(tlMinusTtAtT0S) <= 1.0)) {
      throw new IllegalArgumentException("TL0 out of range: found " + tlMinusTtAtT0S + " s, allowed -1 to 1 s");
    }
  }
}
