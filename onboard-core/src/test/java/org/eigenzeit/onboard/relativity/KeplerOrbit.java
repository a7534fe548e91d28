package org.eigenzeit.onboard.relativity;

/** Test helper: two-body (Keplerian) orbit in closed form (textbook: Vallado 2013, ch. 2). */
public final class KeplerOrbit {
  final double gm;
  final double a;
  final double e;
  final double inc;
  final double raan;
  final double argp;
  final double m0;

  public KeplerOrbit(double gm, double a, double e, double inc, double raan, double argp, double m0) {
    this.gm = gm;
    this.a = a;
    this.e = e;
    this.inc = inc;
    this.raan = raan;
    this.argp = argp;
    this.m0 = m0;
  }

  double meanMotion() {
    return Math.sqrt(gm / (a * a * a));
  }

  double eccentricAnomaly(double t) {
    final double m = m0 + meanMotion() * t;
    double ea = m;
    for (int i = 0; i < 50; i++) {
      ea = ea - (ea - e * Math.sin(ea) - m) / (1 - e * Math.cos(ea));
    }
    return ea;
  }

  /** Position and velocity at t seconds after epoch, inertial frame. */
  public void state(double t, double[] r, double[] v) {
    final double ea = eccentricAnomaly(t);
    final double cosE = Math.cos(ea);
    final double sinE = Math.sin(ea);
    final double b = a * Math.sqrt(1 - e * e);
    final double xp = a * (cosE - e);
    final double yp = b * sinE;
    final double rr = a * (1 - e * cosE);
    final double edot = meanMotion() * a / rr;
    final double vxp = -a * sinE * edot;
    final double vyp = b * cosE * edot;
    rotate(xp, yp, r);
    rotate(vxp, vyp, v);
  }

  private void rotate(double x, double y, double[] out) {
    final double cO = Math.cos(raan);
    final double sO = Math.sin(raan);
    final double cw = Math.cos(argp);
    final double sw = Math.sin(argp);
    final double ci = Math.cos(inc);
    final double si = Math.sin(inc);
    final double p1 = cO * cw - sO * sw * ci;
    final double p2 = sO * cw + cO * sw * ci;
    final double p3 = sw * si;
    final double q1 = -cO * sw - sO * cw * ci;
    final double q2 = -sO * sw + cO * cw * ci;
    final double q3 = cw * si;
    out[0] = p1 * x + q1 * y;
    out[1] = p2 * x + q2 * y;
    out[2] = p3 * x + q3 * y;
  }
}
