package org.eigenzeit.ground.budget;

import org.eigenzeit.ground.instant.Instants;
import org.eigenzeit.ground.reference.RateBreakdown;
import org.eigenzeit.ground.reference.ReferenceRate;
import org.eigenzeit.ground.trajectory.ExternalTrajectory;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelConfigBuilder;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;
import org.eigenzeit.onboard.relativity.RateComponents;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Runs the onboard core along the reference trajectory of an orbit, or along a given trajectory
 * file, at a fixed sample step, as flight software would (one {@code step} per sample), and
 * compares the accumulated offsets and rates. Two rates are reported for each: the end offset over
 * the span (which carries the periodic eccentricity term when the span is not a whole number of
 * orbits) and the secular rate, the mean of the smooth part of the integrand, obtained exactly by
 * removing the eccentricity term's end-point share -2(r.v(T) - r.v(0))/c^2 from the end offset.
 * Each call is a pure function of its arguments.
 */
public final class BudgetAnalysis {
  private BudgetAnalysis() {}

  /**
   * The reference configuration used for a body: Earth EGM96 degree 36 with DE405 Sun and Moon;
   * Moon J2 with DE405 Earth and Sun.
   *
   * @param body central body
   * @return the configuration
   */
  public static ReferenceConfig referenceFor(CentralBody body) {
    return body.centre() == CentralBody.CENTRE_EARTH ? ReferenceConfig.earth(36) : ReferenceConfig.moon();
  }

  /**
   * The onboard configuration used for a body: Earth HARMONICS to the given degree with tides;
   * Moon J2 with tides.
   *
   * @param body central body
   * @param degree harmonic degree for the Earth
   * @return the configuration
   */
  public static ModelConfig coreFor(CentralBody body, int degree) {
    final ModelConfigBuilder b = ModelConfig.builder().body(body).tides(true).energyToleranceRel(2e-3);
    if (body.centre() == CentralBody.CENTRE_EARTH) {
      b.level(ModelLevel.HARMONICS).degree(degree);
    } else {
      b.level(ModelLevel.J2);
    }
    return b.build();
  }

  /**
   * The harmonic degree Eigenzeit recommends for the onboard core at a given perigee radius: 36
   * below 3000 km altitude (LEO, where degrees 9-36 still move the offset by picoseconds per day
   * through the integrator's r . a term), 8 above (measured: docs/algorithms.md).
   *
   * @param body central body
   * @param perigeeRadiusM perigee radius, m
   * @return the degree
   */
  public static int recommendedDegree(CentralBody body, double perigeeRadiusM) {
    return perigeeRadiusM - body.referenceRadiusM() < 3.0e6 ? 36 : 8;
  }

  /**
   * Analyses an orbit.
   *
   * @param label label for the report
   * @param orbit initial orbit
   * @param epochTt start epoch, TT
   * @param spanS span, s
   * @param stepS sample step of the core, s
   * @param coreDegree harmonic degree of the core (Earth); 0 for {@link #recommendedDegree}
   * @return the budget
   */
  public static BudgetResult analyse(String label, OrbitSpec orbit, SplitTime epochTt, double spanS, double stepS,
      int coreDegree) {
    final int degree = coreDegree > 0 ? coreDegree : recommendedDegree(orbit.body(), perigeeRadius(orbit));
    return analyse(label, orbit, epochTt, spanS, stepS, coreFor(orbit.body(), degree));
  }

  /**
   * Analyses an orbit with a given onboard configuration (any model level).
   *
   * @param label label for the report
   * @param orbit initial orbit
   * @param epochTt start epoch, TT
   * @param spanS span, s
   * @param stepS sample step of the core, s
   * @param coreConfig onboard configuration
   * @return the budget
   */
  public static BudgetResult analyse(String label, OrbitSpec orbit, SplitTime epochTt, double spanS, double stepS,
      ModelConfig coreConfig) {
    final CentralBody body = orbit.body();
    final ReferenceTrajectory ref = new ReferencePropagator(referenceFor(body))
        .propagate(epochTt, orbit.position(), orbit.velocity(), spanS);
    return run(label, body, epochTt, spanS, stepS, coreConfig, new Along() {
      @Override
      public void state(double t, double[] r, double[] v) {
        ref.state(t, r, v);
      }

      @Override
      public double offsetS(double t) {
        return ref.properTimeOffsetS(t);
      }

      @Override
      public RateBreakdown rate(double t) {
        return ref.rate(t);
      }
    });
  }

  /**
   * Analyses a given trajectory (an SP3 satellite or an OEM): the onboard core stepped along the
   * interpolated inertial states, against the ground reference's proper time integrated along the
   * same states ({@link ExternalTrajectory#properTimeModel}).
   *
   * @param label label for the report
   * @param trajectory the trajectory
   * @param reference the reference configuration (its UT1 - TT should be the trajectory's)
   * @param spanS span from the first sample, s (at most the trajectory's)
   * @param stepS sample step of the core, s
   * @param coreConfig onboard configuration
   * @return the budget
   */
  public static BudgetResult analyseTrajectory(String label, ExternalTrajectory trajectory, ReferenceConfig reference,
      double spanS, double stepS, ModelConfig coreConfig) {
    if (!(spanS > 0 && spanS <= trajectory.spanS())) {
      throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
          "span %.0f s outside the trajectory's (0, %.0f] s", spanS, trajectory.spanS()));
    }
    final java.util.function.DoubleUnaryOperator offset = trajectory.properTimeModel(reference, spanS);
    final ReferenceRate rate = new ReferenceRate(reference, trajectory.t0Tt());
    return run(label, reference.body(), trajectory.t0Tt(), spanS, stepS, coreConfig, new Along() {
      @Override
      public void state(double t, double[] r, double[] v) {
        trajectory.inertialState(t, r, v);
      }

      @Override
      public double offsetS(double t) {
        return offset.applyAsDouble(t);
      }

      @Override
      public RateBreakdown rate(double t) {
        return trajectory.rate(rate, t);
      }
    });
  }

  /** What the reference gives along the orbit being analysed. */
  private interface Along {
    void state(double t, double[] r, double[] v);

    double offsetS(double t);

    RateBreakdown rate(double t);
  }

  private static BudgetResult run(String label, CentralBody body, SplitTime epochTt, double spanS, double stepS,
      ModelConfig coreConfig, Along ref) {
    final ProperTimeTracker core = new ProperTimeTracker(coreConfig);
    final OrbitSample sample = new OrbitSample();
    final SplitTime now = new SplitTime();
    final double[] r = new double[3];
    final double[] v = new double[3];
    final RateComponents c = new RateComponents();
    final int n = (int) Math.floor(spanS / stepS);
    final double[] coreOffset = new double[n + 1];
    final double[] refOffset = new double[n + 1];
    final double[] sums = new double[8];
    double rvStart = 0;
    double rvEnd = 0;
    for (int k = 0; k <= n; k++) {
      final double t = k * stepS;
      ref.state(t, r, v);
      if (k == 0) {
        rvStart = r[0] * v[0] + r[1] * v[1] + r[2] * v[2];
      } else if (k == n) {
        rvEnd = r[0] * v[0] + r[1] * v[1] + r[2] * v[2];
      }
      now.setTo(epochTt);
      Instants.shift(now, t);
      sample.set(now, OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
      final int st = core.step(now, sample);
      if (!Status.isUsable(st)) {
        throw new IllegalStateException("core refused a reference sample at t = " + t + " s: " + Status.name(st));
      }
      coreOffset[k] = core.offsetS();
      refOffset[k] = ref.offsetS(t);
      core.rate(c);
      final RateBreakdown rb = ref.rate(t);
      final double w = (k == 0 || k == n) ? 0.5 : 1.0;
      sums[0] += w * c.kinematic();
      sums[1] += w * rb.kinematic();
      sums[2] += w * c.gravitational();
      sums[3] += w * rb.gravitational();
      sums[4] += w * c.harmonics();
      sums[5] += w * rb.harmonics();
      sums[6] += w * c.tidal();
      sums[7] += w * rb.tidal();
    }
    final double span = n * stepS;
    final double coreMean = coreOffset[n] / span;
    final double refMean = refOffset[n] / span;
    // The eccentricity term's share of the end offset is -2(r.v(T) - r.v(0))/c^2 exactly
    // (docs/algorithms.md section 4); adding it back leaves the mean of the smooth part g.
    final double periodicEnd = -2.0 * (rvEnd - rvStart) / CentralBody.C2;
    final double coreSecular = (coreOffset[n] - periodicEnd) / span;
    final double refSecular = (refOffset[n] - periodicEnd) / span;
    double maxDiff = 0;
    for (int k = 0; k <= n; k++) {
      maxDiff = Math.max(maxDiff, Math.abs(coreOffset[k] - refOffset[k]));
    }
    for (int i = 0; i < 8; i++) {
      sums[i] /= n;
    }
    final BudgetResult.Components comps = new BudgetResult.Components(sums[0], sums[1], sums[2], sums[3], sums[4],
        sums[5], sums[6], sums[7]);
    return new BudgetResult(label, body.name(), body.centre() == CentralBody.CENTRE_EARTH ? "TT" : "TL (Eigenzeit lunar)",
        span, coreMean, refMean, coreMean - refMean, peakToPeak(coreOffset, coreSecular, stepS),
        peakToPeak(refOffset, refSecular, stepS), maxDiff, comps, refMean * 86_400.0, coreSecular, refSecular,
        coreSecular - refSecular);
  }

  /**
   * Perigee radius of the osculating two-body orbit.
   *
   * @param o the orbit
   * @return the radius, m
   */
  public static double perigeeRadiusOf(OrbitSpec o) {
    return perigeeRadius(o);
  }

  /** Perigee radius of the osculating two-body orbit, m. */
  static double perigeeRadius(OrbitSpec o) {
    final double[] r = o.position();
    final double[] v = o.velocity();
    final double gm = o.body().gmM3PerS2();
    final double rn = Math.sqrt(r[0] * r[0] + r[1] * r[1] + r[2] * r[2]);
    final double v2 = v[0] * v[0] + v[1] * v[1] + v[2] * v[2];
    final double a = 1.0 / (2.0 / rn - v2 / gm);
    final double hx = r[1] * v[2] - r[2] * v[1];
    final double hy = r[2] * v[0] - r[0] * v[2];
    final double hz = r[0] * v[1] - r[1] * v[0];
    final double h2 = hx * hx + hy * hy + hz * hz;
    final double e = Math.sqrt(Math.max(0.0, 1.0 - h2 / (gm * a)));
    return a * (1 - e);
  }

  /** Peak to peak of offset(t) - secular rate * t: the periodic part. */
  private static double peakToPeak(double[] offset, double mean, double step) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < offset.length; k++) {
      final double p = offset[k] - mean * k * step;
      lo = Math.min(lo, p);
      hi = Math.max(hi, p);
    }
    return hi - lo;
  }
}
