package org.eigenzeit.ground.ephemeris;

/**
 * Geocentric positions of the Sun and the Moon, and the lunar pole, for the ground reference.
 * Times are TT seconds since J2000.0; positions in metres on ICRF/GCRS axes.
 */
public interface ThirdBodies {
  /**
   * Geocentric Sun.
   *
   * @param ttSecondsJ2000 TT seconds since J2000.0
   * @param outM receives the position, m
   */
  void sunGeocentricM(double ttSecondsJ2000, double[] outM);

  /**
   * Geocentric Moon.
   *
   * @param ttSecondsJ2000 TT seconds since J2000.0
   * @param outM receives the position, m
   */
  void moonGeocentricM(double ttSecondsJ2000, double[] outM);

  /**
   * The Moon's rotation pole (unit vector, ICRF axes).
   *
   * @param ttSecondsJ2000 TT seconds since J2000.0
   * @param out receives the unit vector
   */
  void lunarPole(double ttSecondsJ2000, double[] out);

  /** @return a short name of the source, for reports */
  String source();

  /**
   * Whether the source has data at an instant (series without a span: always).
   *
   * @param jd Julian date (TT or TDB; the two differ by less than 2 ms)
   * @return true when the positions at {@code jd} can be evaluated
   */
  default boolean covers(double jd) {
    return true;
  }

  /**
   * DE405 where it has data, else nothing: callers choose {@link #analytic()} explicitly.
   *
   * @return the DE405-backed provider
   */
  static ThirdBodies de405() {
    return De405Holder.INSTANCE;
  }

  /** Loads the shipped DE405 once (immutable and thread-safe once loaded). */
  final class De405Holder {
    static final ThirdBodies INSTANCE = new De405Bodies(JplEphemeris.de405());

    private De405Holder() {}
  }

  /**
   * The onboard core's low-precision series (Montenbruck and Gill 2000, section 3.3.2) and IAU
   * lunar pole: for dates outside the shipped DE405 span (for example the 2010 GNSS data).
   *
   * @return the analytic provider
   */
  static ThirdBodies analytic() {
    return new AnalyticBodies();
  }
}
