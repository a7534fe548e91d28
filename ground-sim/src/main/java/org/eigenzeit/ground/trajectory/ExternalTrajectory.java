package org.eigenzeit.ground.trajectory;

import org.eigenzeit.ground.instant.Instants;
import java.util.List;
import org.eigenzeit.ground.reference.RateBreakdown;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferenceRate;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * A trajectory given as samples (from an OEM or SP3 file), interpolated with {@link Lagrange}
 * (10 nodes; velocities interpolated when the file gives them, otherwise the derivative of the
 * position polynomial), with the proper-time reference computed along it.
 *
 * <p>Earth-fixed samples are rotated to the GCRS with the onboard core's EarthOrientation
 * (UT1 - TT given), velocity v_I = M^T (v_E + omega x r_E). Not thread-safe.
 */
public final class ExternalTrajectory {
  /** Nodes per interpolation window. */
  public static final int NODES = 10;

  private final SplitTime t0Tt;
  private final double[] t;
  private final double[][] pos;
  private final double[][] vel;
  private final boolean earthFixed;
  private final double ut1MinusTtS;
  private final EarthOrientation eo = new EarthOrientation(MathMode.STRICT, 7.2921151467e-5);
  private final SplitTime now = new SplitTime();

  private ExternalTrajectory(SplitTime t0Tt, double[] t, double[][] pos, double[][] vel, boolean earthFixed,
      double ut1MinusTtS) {
    if (t.length < NODES) {
      throw new IllegalArgumentException("need at least " + NODES + " samples, got " + t.length);
    }
    this.t0Tt = SplitTime.of(t0Tt.wholeSeconds(), t0Tt.fractionS());
    this.t = t;
    this.pos = pos;
    this.vel = vel;
    this.earthFixed = earthFixed;
    this.ut1MinusTtS = ut1MinusTtS;
  }

  /**
   * From one satellite of an SP3 file (positions in ITRF; epochs in the file's {@code %c} time
   * system, converted by {@link GnssTimeSystem}, which refuses a system it does not know).
   *
   * @param sp3 the file
   * @param id satellite such as "G05"
   * @param ut1MinusTtS UT1 - TT for the rotation to the GCRS, s
   * @return the trajectory
   */
  public static ExternalTrajectory fromSp3(Sp3File sp3, String id, double ut1MinusTtS) {
    final List<double[]> s = sp3.satellite(id).samples();
    final double[] t = new double[s.size()];
    final double[][] p = new double[3][s.size()];
    for (int k = 0; k < s.size(); k++) {
      t[k] = s.get(k)[0] - s.get(0)[0];
      for (int c = 0; c < 3; c++) {
        p[c][k] = s.get(k)[1 + c];
      }
    }
    final double start = sp3.firstEpochSecondsJ2000() + s.get(0)[0];
    final SplitTime tt = GnssTimeSystem.of(sp3.timeSystem(), sp3.name(), 0)
        .toTt((long) Math.floor(start), start - Math.floor(start), sp3.name(), 0);
    return new ExternalTrajectory(tt, t, p, null, true, ut1MinusTtS);
  }

  /**
   * From an OEM.
   *
   * @param oem the message
   * @param ut1MinusTtS UT1 - TT for Earth-fixed frames, s
   * @return the trajectory
   */
  public static ExternalTrajectory fromOem(OemFile oem, double ut1MinusTtS) {
    final List<OemFile.Sample> s = oem.samples();
    final SplitTime t0 = s.get(0).epochTt();
    final double[] t = new double[s.size()];
    final double[][] p = new double[3][s.size()];
    final double[][] v = new double[3][s.size()];
    for (int k = 0; k < s.size(); k++) {
      t[k] = s.get(k).epochTt().secondsSince(t0);
      final double[] pk = s.get(k).positionM();
      final double[] vk = s.get(k).velocityMPerS();
      for (int c = 0; c < 3; c++) {
        p[c][k] = pk[c];
        v[c][k] = vk[c];
      }
    }
    return new ExternalTrajectory(t0, t, p, v, oem.isEarthFixed(), ut1MinusTtS);
  }

  /**
   * The same samples with another UT1 - TT for the rotation of Earth-fixed samples.
   *
   * @param ut1MinusTt UT1 - TT, s
   * @return a new trajectory
   */
  public ExternalTrajectory withUt1MinusTt(double ut1MinusTt) {
    return new ExternalTrajectory(t0Tt, t, pos, vel, earthFixed, ut1MinusTt);
  }

  /** @return the smallest radius of the samples, m */
  public double minRadiusM() {
    double min = Double.POSITIVE_INFINITY;
    for (int k = 0; k < t.length; k++) {
      min = Math.min(min, Math.sqrt(pos[0][k] * pos[0][k] + pos[1][k] * pos[1][k] + pos[2][k] * pos[2][k]));
    }
    return min;
  }

  /** @return the first epoch, TT */
  public SplitTime t0Tt() {
    return SplitTime.of(t0Tt.wholeSeconds(), t0Tt.fractionS());
  }

  /** @return seconds from the first to the last sample */
  public double spanS() {
    return t[t.length - 1];
  }

  /**
   * Interpolated state in the file's own frame.
   *
   * @param time seconds since the first sample
   * @param r receives the position, m
   * @param v receives the velocity, m/s
   */
  public void fileFrameState(double time, double[] r, double[] v) {
    final int from = Lagrange.window(t, NODES, time);
    for (int c = 0; c < 3; c++) {
      final double[] pv = Lagrange.valueAndDerivative(t, pos[c], from, NODES, time);
      r[c] = pv[0];
      v[c] = vel == null ? pv[1] : Lagrange.valueAndDerivative(t, vel[c], from, NODES, time)[0];
    }
  }

  /**
   * Interpolated inertial (GCRS) state.
   *
   * @param time seconds since the first sample
   * @param r receives the position, m
   * @param v receives the velocity, m/s
   */
  public void inertialState(double time, double[] r, double[] v) {
    if (!earthFixed) {
      fileFrameState(time, r, v);
      return;
    }
    final double[] re = new double[3];
    final double[] ve = new double[3];
    fileFrameState(time, re, ve);
    now.setTo(t0Tt);
    Instants.shift(now, time);
    eo.update(now, ut1MinusTtS);
    eo.positionToGcrs(re, r);
    eo.velocityToGcrs(re, ve, v);
  }

  /**
   * The proper-time offset tau - TT accumulated along the trajectory from its first sample, by
   * integrating the reference clock rate with Dormand-Prince 8(5,3) (absolute tolerance 1e-17 s).
   *
   * @param cfg reference configuration (body, field, third bodies, c^-4)
   * @param until seconds since the first sample
   * @return the offset, s
   */
  public double properTimeOffsetS(ReferenceConfig cfg, double until) {
    return properTimeModel(cfg, until).applyAsDouble(until);
  }

  /**
   * The proper-time offset along the trajectory as a continuous function: one Dormand-Prince
   * integration to {@code until} with dense output, then any instant without integrating again.
   *
   * @param cfg reference configuration (body, field, third bodies, c^-4)
   * @param until seconds since the first sample
   * @return tau - T_scale at any t in [0, until], s
   */
  public java.util.function.DoubleUnaryOperator properTimeModel(ReferenceConfig cfg, double until) {
    final ReferenceRate rate = new ReferenceRate(cfg, t0Tt);
    final double[] r = new double[3];
    final double[] v = new double[3];
    final OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
      @Override
      public int getDimension() {
        return 1;
      }

      @Override
      public double[] computeDerivatives(double time, double[] y) {
        inertialState(time, r, v);
        return new double[] {rate.rate(time, r, v).total()};
      }
    };
    final DormandPrince853Integrator integ = new DormandPrince853Integrator(1e-3, 300, 1e-17, 1e-12);
    final org.hipparchus.ode.DenseOutputModel dense = new org.hipparchus.ode.DenseOutputModel();
    integ.addStepHandler(dense);
    integ.integrate(ode, new ODEState(0, new double[] {0}), until);
    return t -> dense.getInterpolatedState(Math.max(0, Math.min(until, t))).getPrimaryState()[0];
  }

  /**
   * The reference clock rate at a time along the trajectory.
   *
   * @param rate evaluator (built for this trajectory's t0)
   * @param time seconds since the first sample
   * @return the breakdown
   */
  public RateBreakdown rate(ReferenceRate rate, double time) {
    final double[] r = new double[3];
    final double[] v = new double[3];
    inertialState(time, r, v);
    return rate.rate(time, r, v);
  }
}
