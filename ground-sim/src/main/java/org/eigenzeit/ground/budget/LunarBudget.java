package org.eigenzeit.ground.budget;

import org.eigenzeit.ground.instant.Instants;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.ground.timescale.LunarTableFitter;
import org.eigenzeit.ground.timescale.LunarTimeDefinition;
import org.eigenzeit.ground.timescale.TimeScaleConverter;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.lunartime.LunarTimeOffset;
import org.eigenzeit.onboard.lunartime.LunarTimeTable;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;

/**
 * A lunar orbiter's clock against TT, beside its budget against TL ({@link BudgetAnalysis}).
 *
 * <p>The budget of a lunar orbit runs on the TL axis: sample k is the TL instant TL_0 + k step
 * (the tracker integrates dtau/dTL). Here each sample's TT follows from TL - TT for the event at
 * the clock (the selenocentric relation plus the position term -(v_M - v_E) . r/c^2), and
 *
 * <pre>
 *   (tau - TT)(k) - (tau - TT)(0) = (tau - TL)(k) - (tau - TL)(0) + (TL - TT)(k) - (TL - TT)(0)
 * </pre>
 *
 * For the reference, TL - TT comes from the ground's numerical relation ({@link
 * TimeScaleConverter#tlMinusTtAtClockS}); for the core, from the onboard lunar time table
 * ({@link LunarTimeTable}) fitted by the ground over the span (1 ps target) and evaluated by the
 * core as flight software would, with the core's own offset against TL. So the core - reference
 * difference against TT contains the table's fit error (its stated accuracy) on top of the TL
 * difference.
 */
public final class LunarBudget {
  /** Fit target of the table made for the span, s. */
  public static final double TABLE_TARGET_S = 1e-12;

  private LunarBudget() {}

  /**
   * A lunar clock against TT.
   *
   * @param scaleRateL L_L of the TL realised
   * @param coreMeanRate mean d(tau)/d(TT) - 1 from the core and its table
   * @param referenceMeanRate the same from the reference and the numerical relation
   * @param coreMinusReferenceRate difference of the two
   * @param corePeriodicPeakToPeakS peak to peak of the core's offset against TT minus its mean-rate line, s
   * @param referencePeriodicPeakToPeakS the same for the reference, s
   * @param maxOffsetDifferenceS largest |core - reference| offset against TT, s
   * @param tlMinusTtMeanRate mean d(TL - TT)/dTT at the clock over the span
   * @param positionTermPeakToPeakS peak to peak of the position term, s
   * @param secondsPerDay the reference's mean rate against TT times 86 400, s/day
   * @param tableDegree degree of the table fitted for the span
   * @param tableSegments its segments
   * @param tableAccuracyS its stated accuracy, s
   * @param tableMaxErrorS largest |core table - ground relation| of TL - TT at the clock, s
   */
  public record AgainstTt(double scaleRateL, double coreMeanRate, double referenceMeanRate,
      double coreMinusReferenceRate, double corePeriodicPeakToPeakS, double referencePeriodicPeakToPeakS,
      double maxOffsetDifferenceS, double tlMinusTtMeanRate, double positionTermPeakToPeakS, double secondsPerDay,
      int tableDegree, int tableSegments, double tableAccuracyS, double tableMaxErrorS) {}

  /**
   * Runs the reference and the core along a lunar orbit and refers both to TT.
   *
   * @param orbit the orbit (Moon)
   * @param epoch start labels (read as TL, as the lunar budget does)
   * @param spanS span, s
   * @param stepS sample step, s
   * @param coreConfig onboard configuration (its body's scaleRateL is L_L)
   * @return the figures against TT
   */
  public static AgainstTt againstTt(OrbitSpec orbit, SplitTime epoch, double spanS, double stepS, ModelConfig coreConfig) {
    final CentralBody body = orbit.body();
    if (body.centre() != CentralBody.CENTRE_MOON) {
      throw new IllegalArgumentException("a lunar budget needs the Moon as central body, not " + body.name());
    }
    final TimeScaleConverter conv = TimeScaleConverter.shipped(new LunarTimeDefinition(body.scaleRateL(), 0.0));
    final ReferenceTrajectory ref = new ReferencePropagator(BudgetAnalysis.referenceFor(body))
        .propagate(epoch, orbit.position(), orbit.velocity(), spanS);
    final long start = epoch.wholeSeconds() - 3_600L;
    final long span = (long) Math.ceil(spanS) + 7_200L;
    final LunarTableFitter.Fit fit = new LunarTableFitter(conv).choose(start, span, TABLE_TARGET_S, 1);
    final LunarTimeTable table = new LunarTimeTable();
    final byte[] image = fit.image();
    if (table.load(image, 0, image.length) != Status.OK) {
      throw new IllegalStateException("the onboard core refused the lunar table fitted for the span");
    }
    final ProperTimeTracker core = new ProperTimeTracker(coreConfig);
    final OrbitSample sample = new OrbitSample();
    final LunarTimeOffset offset = new LunarTimeOffset();
    final int n = (int) Math.floor(spanS / stepS);
    final double[] coreTt = new double[n + 1];
    final double[] refTt = new double[n + 1];
    final double[] ttSince = new double[n + 1];
    final double[] term = new double[n + 1];
    final double[] r = new double[3];
    final double[] v = new double[3];
    double tableError = 0;
    double f0 = 0;
    double g0 = 0;
    final SplitTime now = new SplitTime();
    final SplitTime tt = new SplitTime();
    for (int k = 0; k <= n; k++) {
      final double t = k * stepS;
      ref.state(t, r, v);
      now.setTo(epoch);
      Instants.shift(now, t);
      sample.set(now, OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
      if (!Status.isUsable(core.step(now, sample))) {
        throw new IllegalStateException("core refused a reference sample at t = " + t + " s");
      }
      tt.setTo(now);
      double f = conv.tlMinusTtAtClockS(tt, r);
      tt.setTo(now);
      Instants.shift(tt, -f);
      f = conv.tlMinusTtAtClockS(tt, r);
      tt.setTo(now);
      Instants.shift(tt, -f);
      if (table.evaluate(tt, r, v, offset) != Status.OK) {
        throw new IllegalStateException("the onboard lunar table refused t = " + t + " s: " + Status.name(table.lastEvaluateStatus()));
      }
      final double g = offset.tlMinusTtS();
      tableError = Math.max(tableError, Math.abs(g - f));
      if (k == 0) {
        f0 = f;
        g0 = g;
      }
      ttSince[k] = t - (f - f0);
      refTt[k] = ref.properTimeOffsetS(t) + (f - f0);
      coreTt[k] = core.offsetS() + (g - g0);
      term[k] = offset.positionTermS();
    }
    double maxDiff = 0;
    for (int k = 0; k <= n; k++) {
      maxDiff = Math.max(maxDiff, Math.abs(coreTt[k] - refTt[k]));
    }
    final double coreMean = coreTt[n] / ttSince[n];
    final double refMean = refTt[n] / ttSince[n];
    return new AgainstTt(body.scaleRateL(), coreMean, refMean, coreMean - refMean, peakToPeak(coreTt, ttSince, coreMean),
        peakToPeak(refTt, ttSince, refMean), maxDiff, (n * stepS - ttSince[n]) / ttSince[n],
        peakToPeak(term, ttSince, 0.0), refMean * 86_400.0, fit.degree(), fit.segments(), fit.accuracyS(), tableError);
  }

  /** Peak to peak of y(x) - mean x. */
  static double peakToPeak(double[] y, double[] x, double mean) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < y.length; k++) {
      final double p = y[k] - mean * x[k];
      lo = Math.min(lo, p);
      hi = Math.max(hi, p);
    }
    return hi - lo;
  }
}
