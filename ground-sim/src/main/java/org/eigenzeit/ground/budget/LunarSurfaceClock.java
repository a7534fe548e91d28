package org.eigenzeit.ground.budget;

import org.eigenzeit.ground.instant.Instants;
import org.eigenzeit.ground.reference.RateBreakdown;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferenceRate;
import org.eigenzeit.ground.timescale.LunarTimeDefinition;
import org.eigenzeit.ground.timescale.TimeScaleConverter;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * A clock fixed on the Moon (selenographic latitude, longitude, height) against TL and TT, from
 * the ground reference.
 *
 * <p>Position: r_PA = (R_M + h)(cos lat cos lon, cos lat sin lon, sin lat) in the lunar
 * principal-axis frame of JPL DE405, R_M = 1737.151 km (Wieczorek 2015, the mean radius of the
 * default L_L); on ICRF axes r = M^T r_PA, v = (dM/dt)^T r_PA with M = R3(psi) R1(theta) R3(phi)
 * from the DE405 libration angles and their Chebyshev rates (the same frame and pole as the
 * reference's lunar J2). The principal-axis frame differs from the mean-Earth frame of lunar maps
 * by about 0.02 deg (well under a kilometre on the surface); a site's coordinates are read in the
 * principal-axis frame.
 *
 * <p>Rate against TL: the reference's y = -(v^2/2 + U - W0_L)/c^2 with U the lunar monopole and
 * J2 and the Earth's and Sun's tidal potentials (IERS Conventions 2010 ch. 10 form, about the
 * Moon), integrated by the trapezoid rule at the step given (y changes over days, so the rule's
 * error is below 1e-20 s per step at 60 s). Against TT: the same offsets plus TL - TT for the event
 * at the clock ({@link TimeScaleConverter#tlMinusTtAtClockS}). Not modelled: lunar harmonics
 * beyond J2 (C22 moves a surface clock by up to about 2e-15), topography beyond the height given,
 * solid tides of the Moon. The onboard core's tracker is not run here: it integrates a free-fall
 * orbit (its -2 r.v/c^2 term uses the gravitational acceleration), which a clock on the ground is not.
 */
public final class LunarSurfaceClock {
  /** Mean lunar radius the heights are measured from, m (Wieczorek 2015). */
  public static final double MEAN_RADIUS_M = 1_737_151.0;

  private LunarSurfaceClock() {}

  /**
   * A site.
   *
   * @param latitudeDeg selenographic latitude, deg, [-90, 90]
   * @param longitudeDeg selenographic east longitude, deg, [-180, 360]
   * @param heightM height above the mean sphere, m, [-12 000, 12 000]
   */
  public record Site(double latitudeDeg, double longitudeDeg, double heightM) {
    /** Checks the ranges. */
    public Site {
      if (!(latitudeDeg >= -90 && latitudeDeg <= 90) || !(longitudeDeg >= -180 && longitudeDeg <= 360)
          || !(heightM >= -12_000 && heightM <= 12_000)) {
        throw new IllegalArgumentException("lunar site out of range: latitude " + latitudeDeg + " (allowed -90 to 90), "
            + "longitude " + longitudeDeg + " (-180 to 360), height " + heightM + " m (-12000 to 12000)");
      }
    }
  }

  /**
   * The clock's budget.
   *
   * @param site the site
   * @param spanS span, s
   * @param scaleRateL L_L of TL
   * @param meanRateTl mean dtau/dTL - 1
   * @param meanRateTt mean dtau/dTT - 1
   * @param periodicPeakToPeakTlS peak to peak of the offset against TL minus its mean-rate line, s
   * @param periodicPeakToPeakTtS the same against TT, s
   * @param secondsPerDayTl mean rate against TL times 86 400, s/day
   * @param secondsPerDayTt mean rate against TT times 86 400, s/day
   * @param kinematic mean -v^2/2c^2
   * @param gravitational mean -(GM/r - W0_L)/c^2
   * @param harmonics mean -U_J2/c^2
   * @param tidal mean -U_tid/c^2 (Earth and Sun)
   */
  public record Result(Site site, double spanS, double scaleRateL, double meanRateTl, double meanRateTt,
      double periodicPeakToPeakTlS, double periodicPeakToPeakTtS, double secondsPerDayTl, double secondsPerDayTt,
      double kinematic, double gravitational, double harmonics, double tidal) {}

  /**
   * Runs the reference for the clock.
   *
   * @param site the site
   * @param epoch start labels (read as TL, as the lunar budget does)
   * @param spanS span, s
   * @param stepS step, s
   * @param body the Moon with its L_L
   * @return the budget
   */
  public static Result analyse(Site site, SplitTime epoch, double spanS, double stepS, CentralBody body) {
    if (body.centre() != CentralBody.CENTRE_MOON) {
      throw new IllegalArgumentException("a lunar surface clock needs the Moon as central body, not " + body.name());
    }
    final TimeScaleConverter conv = TimeScaleConverter.shipped(new LunarTimeDefinition(body.scaleRateL(), 0.0));
    final ReferenceConfig cfg = ReferenceConfig.moon();
    final ReferenceRate rate = new ReferenceRate(new ReferenceConfig(body, cfg.degree(), cfg.thirdBodies(), 0, 0,
        cfg.c4(), cfg.integrator(), cfg.relTolerance(), cfg.ut1MinusTtS(), null), epoch);
    final double lat = Math.toRadians(site.latitudeDeg());
    final double lon = Math.toRadians(site.longitudeDeg());
    final double rad = MEAN_RADIUS_M + site.heightM();
    final double[] rPa = {rad * Math.cos(lat) * Math.cos(lon), rad * Math.cos(lat) * Math.sin(lon), rad * Math.sin(lat)};
    final int n = (int) Math.floor(spanS / stepS);
    final double[] offTl = new double[n + 1];
    final double[] offTt = new double[n + 1];
    final double[] x = new double[n + 1];
    final double[] xTt = new double[n + 1];
    final double[] sums = new double[4];
    final double[] r = new double[3];
    final double[] v = new double[3];
    final SplitTime tl = new SplitTime();
    final SplitTime tt = new SplitTime();
    double yPrev = 0;
    double f0 = 0;
    for (int k = 0; k <= n; k++) {
      final double t = k * stepS;
      tl.setTo(epoch);
      Instants.shift(tl, t);
      tt.setTo(tl);
      double f = 0;
      for (int pass = 0; pass < 2; pass++) {
        surfaceState(conv, tt.toSecondsApprox(), rPa, r, v);
        f = conv.tlMinusTtAtClockS(tt, r);
        tt.setTo(tl);
        Instants.shift(tt, -f);
      }
      surfaceState(conv, tt.toSecondsApprox(), rPa, r, v);
      final RateBreakdown y = rate.rate(t, r, v);
      if (k == 0) {
        f0 = f;
      } else {
        offTl[k] = offTl[k - 1] + 0.5 * stepS * (yPrev + y.total());
      }
      yPrev = y.total();
      final double w = (k == 0 || k == n) ? 0.5 / n : 1.0 / n;
      sums[0] += w * y.kinematic();
      sums[1] += w * y.gravitational();
      sums[2] += w * y.harmonics();
      sums[3] += w * y.tidal();
      x[k] = t;
      xTt[k] = t - (f - f0);
      offTt[k] = offTl[k] + (f - f0);
    }
    final double meanTl = offTl[n] / x[n];
    final double meanTt = offTt[n] / xTt[n];
    return new Result(site, x[n], body.scaleRateL(), meanTl, meanTt, LunarBudget.peakToPeak(offTl, x, meanTl),
        LunarBudget.peakToPeak(offTt, xTt, meanTt), meanTl * 86_400.0, meanTt * 86_400.0, sums[0], sums[1], sums[2], sums[3]);
  }

  /** Selenocentric ICRF position and velocity of the site at a TDB (taken as TT: below 2 ms apart). */
  static void surfaceState(TimeScaleConverter conv, double tdbS, double[] rPa, double[] r, double[] v) {
    final double[] a = new double[3];
    final double[] rate = new double[3];
    conv.relations().lunarLibrations(tdbS, a, rate);
    final double[][] m = euler313(a[0], a[1], a[2]);
    final double[][] dm = new double[3][3];
    addScaled(dm, euler313Derivative(a[0], a[1], a[2], 0), rate[0]);
    addScaled(dm, euler313Derivative(a[0], a[1], a[2], 1), rate[1]);
    addScaled(dm, euler313Derivative(a[0], a[1], a[2], 2), rate[2]);
    for (int i = 0; i < 3; i++) {
      r[i] = m[0][i] * rPa[0] + m[1][i] * rPa[1] + m[2][i] * rPa[2];
      v[i] = dm[0][i] * rPa[0] + dm[1][i] * rPa[1] + dm[2][i] * rPa[2];
    }
  }

  private static void addScaled(double[][] acc, double[][] m, double k) {
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        acc[i][j] += k * m[i][j];
      }
    }
  }

  /** M = R3(psi) R1(theta) R3(phi), frame rotations. */
  static double[][] euler313(double phi, double theta, double psi) {
    return multiply(r3(psi, false), multiply(r1(theta, false), r3(phi, false)));
  }

  /** dM/d(angle k) for k = 0 (phi), 1 (theta), 2 (psi). */
  static double[][] euler313Derivative(double phi, double theta, double psi, int k) {
    return multiply(r3(psi, k == 2), multiply(r1(theta, k == 1), r3(phi, k == 0)));
  }

  private static double[][] r3(double a, boolean derivative) {
    final double c = Math.cos(a);
    final double s = Math.sin(a);
    return derivative ? new double[][] {{-s, c, 0}, {-c, -s, 0}, {0, 0, 0}} : new double[][] {{c, s, 0}, {-s, c, 0}, {0, 0, 1}};
  }

  private static double[][] r1(double a, boolean derivative) {
    final double c = Math.cos(a);
    final double s = Math.sin(a);
    return derivative ? new double[][] {{0, 0, 0}, {0, -s, c}, {0, -c, -s}} : new double[][] {{1, 0, 0}, {0, c, s}, {0, -s, c}};
  }

  private static double[][] multiply(double[][] a, double[][] b) {
    final double[][] c = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        c[i][j] = a[i][0] * b[0][j] + a[i][1] * b[1][j] + a[i][2] * b[2][j];
      }
    }
    return c;
  }
}
