package org.eigenzeit.ground.budget;

import org.eigenzeit.onboard.body.CentralBody;

/**
 * An initial orbit: Keplerian elements or an inertial state vector, about the Earth or the Moon.
 *
 * @param body central body
 * @param position inertial position, m (GCRS, or Moon-centred ICRF axes)
 * @param velocity inertial velocity, m/s
 */
public record OrbitSpec(CentralBody body, double[] position, double[] velocity) {
  /** Defensive copies. */
  public OrbitSpec {
    position = position.clone();
    velocity = velocity.clone();
  }

  @Override
  public double[] position() {
    return position.clone();
  }

  @Override
  public double[] velocity() {
    return velocity.clone();
  }

  /**
   * From classical elements (angles in degrees), by the standard perifocal-to-inertial rotation
   * (e.g. Vallado 2013, algorithm 10).
   *
   * @param body central body
   * @param aM semi-major axis, m
   * @param e eccentricity, 0 &lt;= e &lt; 1
   * @param incDeg inclination
   * @param raanDeg right ascension of the ascending node
   * @param argpDeg argument of perigee
   * @param trueAnomalyDeg true anomaly
   * @return the orbit
   */
  public static OrbitSpec fromElements(CentralBody body, double aM, double e, double incDeg, double raanDeg,
      double argpDeg, double trueAnomalyDeg) {
    if (!(aM > body.minRadiusM()) || !(e >= 0 && e < 1) || !(aM * (1 - e) > body.minRadiusM())) {
      throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
          "orbit out of range: a = %.0f m, e = %.4f gives perigee radius %.0f m below %.0f m",
          aM, e, aM * (1 - e), body.minRadiusM()));
    }
    final double p = aM * (1 - e * e);
    final double nu = Math.toRadians(trueAnomalyDeg);
    final double r = p / (1 + e * Math.cos(nu));
    final double sq = Math.sqrt(body.gmM3PerS2() / p);
    final double[] rp = {r * Math.cos(nu), r * Math.sin(nu), 0};
    final double[] vp = {-sq * Math.sin(nu), sq * (e + Math.cos(nu)), 0};
    final double o = Math.toRadians(raanDeg);
    final double w = Math.toRadians(argpDeg);
    final double i = Math.toRadians(incDeg);
    final double[][] m = {
      {Math.cos(o) * Math.cos(w) - Math.sin(o) * Math.sin(w) * Math.cos(i),
          -Math.cos(o) * Math.sin(w) - Math.sin(o) * Math.cos(w) * Math.cos(i), Math.sin(o) * Math.sin(i)},
      {Math.sin(o) * Math.cos(w) + Math.cos(o) * Math.sin(w) * Math.cos(i),
          -Math.sin(o) * Math.sin(w) + Math.cos(o) * Math.cos(w) * Math.cos(i), -Math.cos(o) * Math.sin(i)},
      {Math.sin(w) * Math.sin(i), Math.cos(w) * Math.sin(i), Math.cos(i)},
    };
    final double[] pos = new double[3];
    final double[] vel = new double[3];
    for (int k = 0; k < 3; k++) {
      pos[k] = m[k][0] * rp[0] + m[k][1] * rp[1];
      vel[k] = m[k][0] * vp[0] + m[k][1] * vp[1];
    }
    return new OrbitSpec(body, pos, vel);
  }
}
