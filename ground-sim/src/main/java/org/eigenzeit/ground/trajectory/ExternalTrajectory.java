package org.eigenzeit.ground.trajectory;

import java.util.ArrayList;
import org.eigenzeit.ground.instant.Instants;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.reference.RateBreakdown;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferenceRate;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.DenseOutputModel;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * A trajectory about the Earth given as samples (from an OEM or SP3 file), interpolated with
 * {@link Lagrange} (10 nodes; velocities interpolated when the file gives them, otherwise the
 * derivative of the position polynomial), with the proper-time reference computed along it.
 *
 * <p>An OEM's segments stay apart: each is one piece, interpolated only within itself (a
 * manoeuvre between segments is never smoothed over), in its own frame. Earth-fixed (ITRF)
 * samples are rotated to the GCRS with the onboard core's EarthOrientation (UT1 - TT given,
 * polar motion neglected: at most about 0.5 arcsec, 15 m in position at 6000 km, which leaves r
 * and v, and so the clock rate, unchanged to first order), velocity v_I = M^T (v_E + omega x r_E);
 * EME2000 samples are rotated by the IAU 2000 {@link FrameBias}; GCRF/ICRF samples are used as
 * given.
 *
 * <p>Before any integration every sample is checked with {@link TrajectoryChecks}: radius, speed,
 * energy between consecutive samples and, for position-only files, smoothness; a refusal names
 * the file and the line. A failure of the integrator is reported with the file named.
 *
 * <p>Not thread-safe.
 */
public final class ExternalTrajectory {
  /** Nodes per interpolation window. */
  public static final int NODES = 10;

  /** One segment: samples in its own frame, times in seconds since the trajectory's t0. */
  private static final class Piece {
    final double[] t;
    final double[][] pos;
    final double[][] vel;
    final int[] lines;
    final OemFile.Frame frame;

    Piece(double[] t, double[][] pos, double[][] vel, int[] lines, OemFile.Frame frame) {
      this.t = t;
      this.pos = pos;
      this.vel = vel;
      this.lines = lines;
      this.frame = frame;
    }
  }

  private final String source;
  private final SplitTime t0Tt;
  private final List<Piece> pieces;
  private final double ut1MinusTtS;
  private final EarthOrientation eo = new EarthOrientation(MathMode.STRICT, 7.2921151467e-5);
  private final SplitTime now = new SplitTime();
  private final double worstEnergyStep;
  private final double worstSmoothness;

  private ExternalTrajectory(String source, SplitTime t0Tt, List<Piece> pieces, double ut1MinusTtS) {
    this.source = source;
    this.t0Tt = SplitTime.of(t0Tt.wholeSeconds(), t0Tt.fractionS());
    this.pieces = List.copyOf(pieces);
    this.ut1MinusTtS = ut1MinusTtS;
    double energy = 0;
    double smooth = 0;
    for (Piece p : pieces) {
      if (p.t.length < NODES) {
        throw new InputException(source, p.lines[0], "segment starting here has " + p.t.length
            + " samples, allowed " + NODES + " or more (one interpolation window)");
      }
      if (p.vel == null) {
        smooth = Math.max(smooth, TrajectoryChecks.checkSmoothness(source, p.lines, p.t, p.pos));
      }
      energy = Math.max(energy, checkPiece(p));
    }
    this.worstEnergyStep = energy;
    this.worstSmoothness = smooth;
  }

  private double checkPiece(Piece p) {
    final int n = p.t.length;
    final double[][] r = new double[n][3];
    final double[][] v = new double[n][3];
    for (int k = 0; k < n; k++) {
      pieceState(p, p.t[k], r[k], v[k]);
      TrajectoryChecks.checkState(source, p.lines[k], CentralBody.EARTH, r[k], v[k]);
    }
    return TrajectoryChecks.checkEnergySteps(source, p.lines, CentralBody.EARTH, r, v);
  }

  /**
   * From one satellite of an SP3 file (positions in ITRF; epochs in the file's {@code %c} time
   * system, converted by {@link GnssTimeSystem}, which refuses a system it does not know).
   *
   * @param sp3 the file
   * @param id satellite such as "G05"
   * @param ut1MinusTtS UT1 - TT for the rotation to the GCRS, s
   * @return the trajectory
   * @throws InputException naming the file (and line) when the satellite is absent, the file's time
   *     system is not one {@link GnssTimeSystem} converts, or a sample is implausible
   */
  public static ExternalTrajectory fromSp3(Sp3File sp3, String id, double ut1MinusTtS) {
    final List<double[]> s = sp3.satellite(id).samples();
    if (s.isEmpty()) {
      throw new InputException(sp3.name(), 0, "satellite " + id + " has no position in the file");
    }
    final double[] t = new double[s.size()];
    final double[][] p = new double[3][s.size()];
    final int[] lines = new int[s.size()];
    for (int k = 0; k < s.size(); k++) {
      t[k] = s.get(k)[0] - s.get(0)[0];
      lines[k] = sp3.satellite(id).line(k);
      for (int c = 0; c < 3; c++) {
        p[c][k] = s.get(k)[1 + c];
      }
    }
    final double start = sp3.firstEpochSecondsJ2000() + s.get(0)[0];
    final SplitTime tt = GnssTimeSystem.of(sp3.timeSystem(), sp3.name(), sp3.timeSystemLine())
        .toTt((long) Math.floor(start), start - Math.floor(start), sp3.name(), sp3.timeSystemLine());
    return new ExternalTrajectory(sp3.name(), tt, List.of(new Piece(t, p, null, lines, OemFile.Frame.EARTH_FIXED)),
        ut1MinusTtS);
  }

  /**
   * From an OEM about the Earth, each segment a piece.
   *
   * @param oem the message
   * @param ut1MinusTtS UT1 - TT for Earth-fixed frames, s
   * @return the trajectory
   * @throws InputException naming the file and line when a segment's centre is not the Earth,
   *     segments leave a gap, or a sample is implausible
   */
  public static ExternalTrajectory fromOem(OemFile oem, double ut1MinusTtS) {
    final SplitTime t0 = oem.segments().get(0).samples().get(0).epochTt();
    final List<Piece> pieces = new ArrayList<>();
    double previousEnd = 0;
    for (OemFile.Segment seg : oem.segments()) {
      if (!seg.metadata("CENTER_NAME").toUpperCase(Locale.ROOT).equals("EARTH")) {
        throw new InputException(oem.name(), seg.metadataLine("CENTER_NAME"), "CENTER_NAME "
            + seg.metadata("CENTER_NAME") + ": the trajectory must be about the body analysed, allowed EARTH");
      }
      final List<OemFile.Sample> s = seg.samples();
      final int n = s.size();
      final double[] t = new double[n];
      final double[][] p = new double[3][n];
      final double[][] v = new double[3][n];
      final int[] lines = new int[n];
      for (int k = 0; k < n; k++) {
        t[k] = s.get(k).epochTt().secondsSince(t0);
        lines[k] = s.get(k).line();
        final double[] pk = s.get(k).positionM();
        final double[] vk = s.get(k).velocityMPerS();
        for (int c = 0; c < 3; c++) {
          p[c][k] = pk[c];
          v[c][k] = vk[c];
        }
      }
      if (!pieces.isEmpty() && t[0] > previousEnd + 1e-6) {
        throw new InputException(oem.name(), lines[0], String.format(Locale.ROOT, "gap of %.3f s between this "
            + "segment and the previous one, allowed none (a trajectory must be continuous)", t[0] - previousEnd));
      }
      previousEnd = t[n - 1];
      pieces.add(new Piece(t, p, v, lines, seg.frame()));
    }
    return new ExternalTrajectory(oem.name(), t0, pieces, ut1MinusTtS);
  }

  /**
   * The same samples with another UT1 - TT for the rotation of Earth-fixed samples.
   *
   * @param ut1MinusTt UT1 - TT, s
   * @return a new trajectory
   */
  public ExternalTrajectory withUt1MinusTt(double ut1MinusTt) {
    return new ExternalTrajectory(source, t0Tt, pieces, ut1MinusTt);
  }

  /** @return the smallest radius of the samples, m */
  public double minRadiusM() {
    double min = Double.POSITIVE_INFINITY;
    for (Piece p : pieces) {
      for (int k = 0; k < p.t.length; k++) {
        min = Math.min(min, Math.sqrt(p.pos[0][k] * p.pos[0][k] + p.pos[1][k] * p.pos[1][k] + p.pos[2][k] * p.pos[2][k]));
      }
    }
    return min;
  }

  /** @return the first epoch, TT */
  public SplitTime t0Tt() {
    return SplitTime.of(t0Tt.wholeSeconds(), t0Tt.fractionS());
  }

  /** @return seconds from the first to the last sample */
  public double spanS() {
    final Piece last = pieces.get(pieces.size() - 1);
    return last.t[last.t.length - 1];
  }

  /** @return the file the trajectory was read from */
  public String source() {
    return source;
  }

  /** @return the largest energy change between consecutive samples, of GM/r (see TrajectoryChecks) */
  public double worstEnergyStep() {
    return worstEnergyStep;
  }

  /** @return the largest leave-one-out position error of position-only samples, of the radius */
  public double worstSmoothness() {
    return worstSmoothness;
  }

  private Piece pieceAt(double time) {
    for (int k = pieces.size() - 1; k > 0; k--) {
      if (time >= pieces.get(k).t[0]) {
        return pieces.get(k);
      }
    }
    return pieces.get(0);
  }

  /**
   * Interpolated state in the file's own frame (of the segment covering the time).
   *
   * @param time seconds since the first sample
   * @param r receives the position, m
   * @param v receives the velocity, m/s
   */
  public void fileFrameState(double time, double[] r, double[] v) {
    fileFrameState(pieceAt(time), time, r, v);
  }

  private static void fileFrameState(Piece p, double time, double[] r, double[] v) {
    final int from = Lagrange.window(p.t, NODES, time);
    for (int c = 0; c < 3; c++) {
      final double[] pv = Lagrange.valueAndDerivative(p.t, p.pos[c], from, NODES, time);
      r[c] = pv[0];
      v[c] = p.vel == null ? pv[1] : Lagrange.valueAndDerivative(p.t, p.vel[c], from, NODES, time)[0];
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
    pieceState(pieceAt(time), time, r, v);
  }

  private void pieceState(Piece p, double time, double[] r, double[] v) {
    switch (p.frame) {
      case GCRS -> fileFrameState(p, time, r, v);
      case EME2000 -> {
        final double[] rf = new double[3];
        final double[] vf = new double[3];
        fileFrameState(p, time, rf, vf);
        FrameBias.eme2000ToGcrs(rf, r);
        FrameBias.eme2000ToGcrs(vf, v);
      }
      default -> {
        final double[] re = new double[3];
        final double[] ve = new double[3];
        fileFrameState(p, time, re, ve);
        now.setTo(t0Tt);
        Instants.shift(now, time);
        eo.update(now, ut1MinusTtS);
        eo.positionToGcrs(re, r);
        eo.velocityToGcrs(re, ve, v);
      }
    }
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
   * @throws InputException naming the file when the integration fails
   */
  public DoubleUnaryOperator properTimeModel(ReferenceConfig cfg, double until) {
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
    final DenseOutputModel dense = new DenseOutputModel();
    integ.addStepHandler(dense);
    try {
      integ.integrate(ode, new ODEState(0, new double[] {0}), until);
    } catch (MathRuntimeException e) {
      throw integrationFailure(source, 0, e);
    }
    return t -> dense.getInterpolatedState(Math.max(0, Math.min(until, t))).getPrimaryState()[0];
  }

  /**
   * A failure of a Hipparchus integrator as an input refusal naming the input, without the
   * library's own text.
   *
   * @param source the input (file or command-line option)
   * @param line line, or 0
   * @param e the library's exception
   * @return the refusal
   */
  public static InputException integrationFailure(String source, int line, MathRuntimeException e) {
    final Object[] parts = e.getParts();
    final String near = parts.length > 0 && parts[0] instanceof Number n
        ? String.format(Locale.ROOT, " near t = %.6g s", n.doubleValue()) : "";
    return new InputException(source, line, "the integration along this input failed" + near
        + " (the state or its rate stopped being finite or the step size collapsed), allowed only physically "
        + "plausible orbits");
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
