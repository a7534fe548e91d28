package org.eigenzeit.ground.trajectory;

/**
 * One GPS broadcast ephemeris (the Keplerian elements of a RINEX 2 navigation record) and the
 * IS-GPS-200 user algorithm of section 20.3.3.4.3 (Table 20-IV) for the eccentric anomaly, the
 * relativistic clock term and the Earth-fixed position.
 *
 * @param prn satellite number
 * @param tocSecondsOfWeek clock reference time, GPS seconds of week
 * @param toeSecondsOfWeek ephemeris reference time, GPS seconds of week
 * @param week GPS week of toe
 * @param sqrtA square root of the semi-major axis, sqrt(m)
 * @param e eccentricity
 * @param m0 mean anomaly at toe, rad
 * @param deltaN mean motion difference, rad/s
 * @param omega0 longitude of ascending node at weekly epoch, rad
 * @param i0 inclination at toe, rad
 * @param omega argument of perigee, rad
 * @param omegaDot rate of right ascension, rad/s
 * @param idot rate of inclination, rad/s
 * @param cuc harmonic correction, rad
 * @param cus harmonic correction, rad
 * @param crc harmonic correction, m
 * @param crs harmonic correction, m
 * @param cic harmonic correction, rad
 * @param cis harmonic correction, rad
 * @param health SV health word (0 = healthy)
 */
public record BroadcastEphemeris(int prn, double tocSecondsOfWeek, double toeSecondsOfWeek, int week,
    double sqrtA, double e, double m0, double deltaN, double omega0, double i0, double omega,
    double omegaDot, double idot, double cuc, double cus, double crc, double crs, double cic, double cis,
    int health) {
  /** IS-GPS-200 value of the Earth's gravitational constant, m^3/s^2. */
  public static final double MU = 3.986005e14;
  /** IS-GPS-200 value of the Earth's rotation rate, rad/s. */
  public static final double OMEGA_E = 7.2921151467e-5;
  /** IS-GPS-200 relativistic constant F = -2 sqrt(mu)/c^2, s/sqrt(m). */
  public static final double F = -4.442807633e-10;

  /**
   * Time from toe, with the week crossover of IS-GPS-200 (t_k within +-302400 s).
   *
   * @param secondsOfWeek GPS seconds of week of the instant
   * @return t_k, s
   */
  public double tk(double secondsOfWeek) {
    double tk = secondsOfWeek - toeSecondsOfWeek;
    if (tk > 302_400) {
      tk -= 604_800;
    } else if (tk < -302_400) {
      tk += 604_800;
    }
    return tk;
  }

  /**
   * Eccentric anomaly E_k by Newton iteration of Kepler's equation.
   *
   * @param secondsOfWeek GPS seconds of week
   * @return E_k, rad
   */
  public double eccentricAnomaly(double secondsOfWeek) {
    final double a = sqrtA * sqrtA;
    final double n = Math.sqrt(MU / (a * a * a)) + deltaN;
    final double mk = m0 + n * tk(secondsOfWeek);
    double ek = mk;
    for (int i = 0; i < 30; i++) {
      final double d = (ek - e * Math.sin(ek) - mk) / (1 - e * Math.cos(ek));
      ek -= d;
      if (Math.abs(d) < 1e-15) {
        break;
      }
    }
    return ek;
  }

  /**
   * The relativistic clock term dt_r = F e sqrt(A) sin E_k (IS-GPS-200 section 20.3.3.3.3.1).
   *
   * @param secondsOfWeek GPS seconds of week
   * @return the term, s
   */
  public double relativisticTermS(double secondsOfWeek) {
    return F * e * sqrtA * Math.sin(eccentricAnomaly(secondsOfWeek));
  }

  /**
   * Earth-fixed (WGS 84) position by the user algorithm of IS-GPS-200 Table 20-IV.
   *
   * @param secondsOfWeek GPS seconds of week
   * @return x, y, z in m
   */
  public double[] positionEcef(double secondsOfWeek) {
    final double a = sqrtA * sqrtA;
    final double tk = tk(secondsOfWeek);
    final double ek = eccentricAnomaly(secondsOfWeek);
    final double nu = Math.atan2(Math.sqrt(1 - e * e) * Math.sin(ek), Math.cos(ek) - e);
    final double phi = nu + omega;
    final double du = cus * Math.sin(2 * phi) + cuc * Math.cos(2 * phi);
    final double dr = crs * Math.sin(2 * phi) + crc * Math.cos(2 * phi);
    final double di = cis * Math.sin(2 * phi) + cic * Math.cos(2 * phi);
    final double u = phi + du;
    final double r = a * (1 - e * Math.cos(ek)) + dr;
    final double inc = i0 + di + idot * tk;
    final double xp = r * Math.cos(u);
    final double yp = r * Math.sin(u);
    final double om = omega0 + (omegaDot - OMEGA_E) * tk - OMEGA_E * toeSecondsOfWeek;
    return new double[] {xp * Math.cos(om) - yp * Math.cos(inc) * Math.sin(om),
        xp * Math.sin(om) + yp * Math.cos(inc) * Math.cos(om), yp * Math.sin(inc)};
  }
}
