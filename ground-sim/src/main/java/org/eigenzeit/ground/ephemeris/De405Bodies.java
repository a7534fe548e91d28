package org.eigenzeit.ground.ephemeris;

/** {@link ThirdBodies} from a JPL DE ephemeris. Thread-safe (no mutable state). */
final class De405Bodies implements ThirdBodies {
  private static final double J2000 = 2_451_545.0;
  private static final double DAY_S = 86_400.0;
  private final JplEphemeris eph;
  private final double emrat;

  De405Bodies(JplEphemeris eph) {
    this.eph = eph;
    this.emrat = eph.constant("EMRAT");
  }

  private void eval(int item, double t, double[] out) {
    final double days = t / DAY_S;
    final double whole = Math.floor(days);
    eph.evaluate(item, J2000 + whole, days - whole, out);
  }

  @Override
  public void sunGeocentricM(double t, double[] out) {
    final double[] sun = new double[3];
    final double[] emb = new double[3];
    final double[] moon = new double[3];
    eval(JplEphemeris.SUN, t, sun);
    eval(JplEphemeris.EMB, t, emb);
    eval(JplEphemeris.MOON, t, moon);
    for (int i = 0; i < 3; i++) {
      final double earth = emb[i] - moon[i] / (1.0 + emrat);
      out[i] = (sun[i] - earth) * 1000.0;
    }
  }

  @Override
  public void moonGeocentricM(double t, double[] out) {
    eval(JplEphemeris.MOON, t, out);
    for (int i = 0; i < 3; i++) {
      out[i] *= 1000.0;
    }
  }

  /**
   * Pole of the lunar principal-axis frame from the libration Euler angles (phi, theta, psi) of
   * the 3-1-3 rotation ICRF to Moon: the body z axis is (sin theta sin phi, -sin theta cos phi,
   * cos theta) on ICRF axes.
   */
  @Override
  public void lunarPole(double t, double[] out) {
    final double[] lib = new double[3];
    eval(JplEphemeris.LIBRATION, t, lib);
    final double phi = lib[0];
    final double theta = lib[1];
    out[0] = Math.sin(theta) * Math.sin(phi);
    out[1] = -Math.sin(theta) * Math.cos(phi);
    out[2] = Math.cos(theta);
  }

  @Override
  public boolean covers(double jd) {
    return eph.covers(jd);
  }

  @Override
  public String source() {
    return "JPL DE405";
  }
}
