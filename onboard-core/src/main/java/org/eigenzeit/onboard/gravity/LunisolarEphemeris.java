package org.eigenzeit.onboard.gravity;

import org.eigenzeit.onboard.math.MathMode;

/**
 * Low-precision geocentric positions of the Sun and the Moon, in the mean equator and equinox of
 * J2000 (EME2000, which differs from the GCRS by the 23 mas frame bias, negligible here), from the
 * series of Montenbruck and Gill, "Satellite Orbits" (Springer 2000, ISBN 3-540-67280-X), section
 * 3.3.2, eqs. 3.43-3.48 (themselves after van Flandern and Pulkkinen 1979):
 *
 * <pre>
 *   Sun:  M = 357.5256 + 35999.049 T;  lambda = 282.9400 + 0.32257 T + M + 6892" sin M + 72" sin 2M
 *         r = (149.619 - 2.499 cos M - 0.021 cos 2M) 10^6 km,  beta = 0
 *   Moon: mean longitude, anomalies and elongation linear in T; longitude with 14 terms,
 *         latitude with 8, distance with 9 (see the code).  Both rotated by eps = 23.43929111 deg.
 * </pre>
 *
 * <p>The term 0.32257 T (degrees) is added by this project: it is the motion of the Sun's
 * perigee against the fixed J2000 equinox (Meeus, "Astronomical Algorithms", 2nd ed. 1998,
 * ch. 25: perigee of date 282.93735 + 1.71954 T, less the general precession 1.39697 T), which
 * the source omits; without it the longitude drifts by 0.36 deg per century from J2000 (measured
 * against SOFA epv00 in the tests).
 *
 * <p>Accuracy (stated by the source): Sun about 0.1-1 arcmin and 1e-4 in distance; Moon several
 * arcmin in direction and about 500 km in distance. Measured here against JPL DE405 over
 * 2020-2039 in the ground module's tests (see docs/algorithms.md for the numbers). Effect on the
 * clock rate: the tidal term scales with GM_b r^2 / R^3, so a relative distance error e and a
 * direction error a change it by about 3e + 2a, i.e. about 1 % of the term: below 1e-17 in y up to
 * GEO.
 *
 * <p>Mutable outputs; not thread-safe: one owner. Nothing allocates after construction.
 */
public final class LunisolarEphemeris {
  private static final double DEG = Math.PI / 180.0;
  private static final double ARCSEC = DEG / 3600.0;
  private static final double OBLIQUITY_J2000_RAD = 23.43929111 * DEG;

  private final MathMode math;
  private final double cosEps;
  private final double sinEps;

  /**
   * Creates the series evaluator.
   *
   * @param math math mode
   */
  public LunisolarEphemeris(MathMode math) {
    this.math = math;
    this.cosEps = math.cos(OBLIQUITY_J2000_RAD);
    this.sinEps = math.sin(OBLIQUITY_J2000_RAD);
  }

  /**
   * Geocentric position of the Sun.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0
   * @param outM receives the position in EME2000, m
   */
  public void sun(double centuriesTt, double[] outM) {
    final double m = (357.5256 + 35999.049 * centuriesTt) * DEG;
    final double lambda = (282.9400 + 0.32257 * centuriesTt) * DEG + m
        + (6892.0 * math.sin(m) + 72.0 * math.sin(2 * m)) * ARCSEC;
    final double r = (149.619 - 2.499 * math.cos(m) - 0.021 * math.cos(2 * m)) * 1.0e9;
    toEquatorial(r, lambda, 0.0, outM);
  }

  /**
   * Geocentric position of the Moon.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0
   * @param outM receives the position in EME2000, m
   */
  public void moon(double centuriesTt, double[] outM) {
    final double t = centuriesTt;
    final double l0 = (218.31617 + 481267.88088 * t - 1.3972 * t) * DEG;
    final double l = (134.96292 + 477198.86753 * t) * DEG;
    final double lp = (357.52543 + 35999.04944 * t) * DEG;
    final double f = (93.27283 + 483202.01873 * t) * DEG;
    final double d = (297.85027 + 445267.11135 * t) * DEG;
    final double dLambda = 22640 * math.sin(l) + 769 * math.sin(2 * l)
        - 4586 * math.sin(l - 2 * d) + 2370 * math.sin(2 * d) - 668 * math.sin(lp)
        - 412 * math.sin(2 * f) - 212 * math.sin(2 * l - 2 * d) - 206 * math.sin(l + lp - 2 * d)
        + 192 * math.sin(l + 2 * d) - 165 * math.sin(lp - 2 * d) + 148 * math.sin(l - lp)
        - 125 * math.sin(d) - 110 * math.sin(l + lp) - 55 * math.sin(2 * f - 2 * d);
    final double lambda = l0 + dLambda * ARCSEC;
    final double beta = (18520 * math.sin(f + lambda - l0 + (412 * math.sin(2 * f) + 541 * math.sin(lp)) * ARCSEC)
        - 526 * math.sin(f - 2 * d) + 44 * math.sin(l + f - 2 * d) - 31 * math.sin(-l + f - 2 * d)
        - 25 * math.sin(-2 * l + f) - 23 * math.sin(lp + f - 2 * d) + 21 * math.sin(-l + f)
        + 11 * math.sin(-lp + f - 2 * d)) * ARCSEC;
    final double rKm = 385000 - 20905 * math.cos(l) - 3699 * math.cos(2 * d - l)
        - 2956 * math.cos(2 * d) - 570 * math.cos(2 * l) + 246 * math.cos(2 * l - 2 * d)
        - 205 * math.cos(lp - 2 * d) - 171 * math.cos(l + 2 * d) - 152 * math.cos(l + lp - 2 * d);
    toEquatorial(rKm * 1000.0, lambda, beta, outM);
  }

  private void toEquatorial(double r, double lambda, double beta, double[] out) {
    final double cb = math.cos(beta);
    final double x = r * math.cos(lambda) * cb;
    final double y = r * math.sin(lambda) * cb;
    final double z = r * math.sin(beta);
    out[0] = x;
    out[1] = cosEps * y - sinEps * z;
    out[2] = sinEps * y + cosEps * z;
  }
}
