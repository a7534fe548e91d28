package org.eigenzeit.ground.gnss;

import org.eigenzeit.ground.instant.Instants;
import java.util.List;
import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferenceRate;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The ground reference's clock rate y = -(v^2/2 + U - W0)/c^2 (EGM96 degree 36, DE405 Sun and
 * Moon) along Earth-fixed orbit states, and the secular rate over a stretch of them.
 *
 * <p>States are rotated to the GCRS by the onboard EarthOrientation with the given UT1 - UTC
 * (TT - UTC from the leap-second table); the reference rotates back with the same UT1 for the
 * geopotential, so an error in UT1 moves only the Sun's and Moon's positions relative to the
 * Earth-fixed frame (tidal term, below 1e-20). Not thread-safe.
 */
final class ClockRateAlong {
  /** Largest quadrature step of the secular rate, s. */
  static final double QUADRATURE_STEP_S = 60.0;

  private final ReferenceRate rate;
  private final double firstGpsS;
  private final double ut1MinusTt;
  private final SplitTime t0;
  private final EarthOrientation eo = new EarthOrientation(MathMode.STRICT, TermSurvey.OMEGA_E);
  private final SplitTime now = new SplitTime();
  private final double[] r = new double[3];
  private final double[] v = new double[3];

  /**
   * Creates the evaluator for a day.
   *
   * @param firstGpsS the instant that times count from, GPS seconds
   * @param ut1MinusUtcS UT1 - UTC, s
   */
  ClockRateAlong(double firstGpsS, double ut1MinusUtcS) {
    this.t0 = GnssTimeSystem.ttOfGps(firstGpsS);
    this.firstGpsS = firstGpsS;
    this.ut1MinusTt = ut1MinusUtcS - GnssTimeSystem.taiMinusUtcS(t0) - 32.184;
    final ReferenceConfig cfg = new ReferenceConfig(CentralBody.EARTH, 36, ThirdBodies.de405(), 0, 0, false,
        ReferenceConfig.IntegratorKind.DORMAND_PRINCE_853, 1e-13, ut1MinusTt, null);
    this.rate = new ReferenceRate(cfg, t0);
  }

  /**
   * The reference clock rate at an Earth-fixed state.
   *
   * @param gpsS instant, GPS seconds
   * @param rE position, m
   * @param vE Earth-fixed velocity, m/s
   * @return y
   */
  double rate(double gpsS, double[] rE, double[] vE) {
    now.setTo(t0);
    Instants.shift(now, gpsS - firstGpsS);
    eo.update(now, ut1MinusTt);
    eo.positionToGcrs(rE, r);
    eo.velocityToGcrs(rE, vE, v);
    return rate.rate(gpsS - firstGpsS, r, v).total();
  }

  /**
   * The longest run of consecutive grid epochs at which every source serves the satellite.
   *
   * @param sources the orbit sources
   * @param id satellite
   * @param grid epochs, GPS seconds
   * @return {first index, length} (length 0 when none)
   */
  static int[] longestRun(List<OrbitSource> sources, String id, List<Double> grid) {
    final double[] rr = new double[3];
    final double[] vv = new double[3];
    int bestFrom = -1;
    int bestLen = 0;
    int from = -1;
    for (int k = 0; k <= grid.size(); k++) {
      boolean ok = k < grid.size();
      for (int s = 0; ok && s < sources.size(); s++) {
        ok = sources.get(s).state(id, grid.get(k), rr, vv) == null;
      }
      if (ok && from < 0) {
        from = k;
      } else if (!ok && from >= 0) {
        if (k - from > bestLen) {
          bestLen = k - from;
          bestFrom = from;
        }
        from = -1;
      }
    }
    return new int[] {bestFrom, bestLen};
  }

  /**
   * The reference proper time along a stretch of states and what the correction model makes of
   * it.
   *
   * @param t the nodes, GPS seconds
   * @param offsetS the integral of y from the first node, s
   * @param rv r.v at the nodes, m^2/s
   * @param j2S Kouba's J2 term at the nodes, s
   * @param secularRate the mean of the smooth part g over the stretch
   */
  record Arc(double[] t, double[] offsetS, double[] rv, double[] j2S, double secularRate) {
    /**
     * What the correction model (secular rate, -2 r.v/c^2 and Kouba's J2 term) leaves of the
     * reference proper time at the nodes, minus its mean.
     *
     * @param withJ2 whether the model includes the J2 term
     * @return the residuals, s
     */
    double[] residuals(boolean withJ2) {
      final double[] out = new double[t.length];
      double mean = 0;
      for (int k = 0; k < t.length; k++) {
        out[k] = offsetS[k] - secularRate * (t[k] - t[0]) + 2.0 / CentralBody.C2 * (rv[k] - rv[0])
            - (withJ2 ? j2S[k] - j2S[0] : 0.0);
        mean += out[k] / t.length;
      }
      for (int k = 0; k < t.length; k++) {
        out[k] -= mean;
      }
      return out;
    }
  }

  /**
   * Integrates y along the states between consecutive nodes (composite Simpson, an even number of
   * steps of at most {@link #QUADRATURE_STEP_S} per interval). The secular rate, the mean of the
   * smooth part g = y + (2/c^2) d(r.v)/dt, follows exactly as
   * [integral of y dt + (2/c^2)(r.v(end) - r.v(start))]/span, whatever the span.
   *
   * @param orbit the states
   * @param id satellite
   * @param nodes at least two increasing instants, GPS seconds, all served by the orbit
   * @return the arc, or null when a state is missing
   */
  Arc integrate(OrbitSource orbit, String id, double[] nodes) {
    final double[] rr = new double[3];
    final double[] vv = new double[3];
    final int m = nodes.length;
    final double[] offset = new double[m];
    final double[] rv = new double[m];
    final double[] j2 = new double[m];
    double yPrev = Double.NaN;
    for (int k = 0; k < m; k++) {
      if (orbit.state(id, nodes[k], rr, vv) != null) {
        return null;
      }
      rv[k] = TermSurvey.dot(rr, vv);
      j2[k] = TermSurvey.j2Term(rr, vv);
      final double yk = rate(nodes[k], rr, vv);
      if (k > 0) {
        final double a = nodes[k - 1];
        int n = (int) Math.ceil((nodes[k] - a) / QUADRATURE_STEP_S);
        n += n & 1;
        final double h = (nodes[k] - a) / n;
        double sum = yPrev + yk;
        for (int s = 1; s < n; s++) {
          if (orbit.state(id, a + s * h, rr, vv) != null) {
            return null;
          }
          sum += ((s & 1) == 1 ? 4 : 2) * rate(a + s * h, rr, vv);
        }
        offset[k] = offset[k - 1] + sum * h / 3;
      }
      yPrev = yk;
    }
    final double span = nodes[m - 1] - nodes[0];
    final double secular = (offset[m - 1] + 2.0 / CentralBody.C2 * (rv[m - 1] - rv[0])) / span;
    return new Arc(nodes.clone(), offset, rv, j2, secular);
  }

  /**
   * The secular rate over consecutive nodes.
   *
   * @param orbit the states
   * @param id satellite
   * @param nodes the nodes, GPS seconds
   * @return the rate, or NaN when a state is missing
   */
  double secular(OrbitSource orbit, String id, double[] nodes) {
    final Arc arc = integrate(orbit, id, nodes);
    return arc == null ? Double.NaN : arc.secularRate();
  }
}
