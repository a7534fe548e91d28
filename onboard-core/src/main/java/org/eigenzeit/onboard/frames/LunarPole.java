package org.eigenzeit.onboard.frames;

import org.eigenzeit.onboard.math.MathMode;

/**
 * Direction of the Moon's rotation pole in the ICRF/EME2000, from the IAU Working Group on
 * Cartographic Coordinates and Rotational Elements: Archinal et al. (2011), "Report of the IAU
 * Working Group on Cartographic Coordinates and Rotational Elements: 2009", Celest. Mech. Dyn.
 * Astron. 109:101-135, Table 2 (coefficients from memory; the ground module measures this pole
 * against the lunar libration angles of JPL DE405):
 *
 * <pre>
 *   alpha0 = 269.9949 + 0.0031 T - 3.8787 sin E1 - 0.1204 sin E2 + 0.0700 sin E3 - 0.0172 sin E4
 *            + 0.0072 sin E6 - 0.0052 sin E10 + 0.0043 sin E13              (degrees)
 *   delta0 = 66.5392 + 0.0130 T + 1.5419 cos E1 + 0.0239 cos E2 - 0.0278 cos E3 + 0.0068 cos E4
 *            - 0.0029 cos E6 + 0.0009 cos E7 + 0.0008 cos E10 - 0.0009 cos E13
 *   E1 = 125.045 - 0.0529921 d, E2 = 250.089 - 0.1059842 d, E3 = 260.008 + 13.0120009 d,
 *   E4 = 176.625 + 13.3407154 d, E6 = 357.529 + 0.9856003 d, E7 = 311.589 + 26.4057084 d,
 *   E10 = 15.134 - 0.1589763 d, E13 = 25.053 + 12.9590088 d      (d days, T centuries from J2000)
 * </pre>
 *
 * <p>Used only for the lunar J2 term, which is axially symmetric, so the prime meridian is not
 * needed. Accuracy: about 0.01 deg per the source; a pole error delta changes the lunar J2
 * potential at 100 km altitude by about 1.5e-14 * delta(rad) in y.
 *
 * <p>Stateless apart from the math mode; thread-safe. No allocation.
 */
public final class LunarPole {
  private static final double DEG = Math.PI / 180.0;
  private final MathMode math;

  /**
   * Creates the pole model.
   *
   * @param math math mode
   */
  public LunarPole(MathMode math) {
    this.math = math;
  }

  /**
   * Pole unit vector in the ICRF/EME2000.
   *
   * @param daysTt days of TT since J2000.0
   * @param out receives the unit vector
   */
  public void pole(double daysTt, double[] out) {
    final double d = daysTt;
    final double t = d / 36_525.0;
    final double e1 = (125.045 - 0.0529921 * d) * DEG;
    final double e2 = (250.089 - 0.1059842 * d) * DEG;
    final double e3 = (260.008 + 13.0120009 * d) * DEG;
    final double e4 = (176.625 + 13.3407154 * d) * DEG;
    final double e6 = (357.529 + 0.9856003 * d) * DEG;
    final double e7 = (311.589 + 26.4057084 * d) * DEG;
    final double e10 = (15.134 - 0.1589763 * d) * DEG;
    final double e13 = (25.053 + 12.9590088 * d) * DEG;
    final double alpha = (269.9949 + 0.0031 * t - 3.8787 * math.sin(e1) - 0.1204 * math.sin(e2)
        + 0.0700 * math.sin(e3) - 0.0172 * math.sin(e4) + 0.0072 * math.sin(e6)
        - 0.0052 * math.sin(e10) + 0.0043 * math.sin(e13)) * DEG;
    final double delta = (66.5392 + 0.0130 * t + 1.5419 * math.cos(e1) + 0.0239 * math.cos(e2)
        - 0.0278 * math.cos(e3) + 0.0068 * math.cos(e4) - 0.0029 * math.cos(e6)
        + 0.0009 * math.cos(e7) + 0.0008 * math.cos(e10) - 0.0009 * math.cos(e13)) * DEG;
    final double cd = math.cos(delta);
    out[0] = cd * math.cos(alpha);
    out[1] = cd * math.sin(alpha);
    out[2] = math.sin(delta);
  }
}
