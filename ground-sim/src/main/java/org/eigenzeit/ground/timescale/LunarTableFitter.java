package org.eigenzeit.ground.timescale;

import org.eigenzeit.ground.instant.Instants;
import java.nio.ByteBuffer;
import java.util.HashMap;
import java.util.Map;
import org.eigenzeit.onboard.lunartime.LunarTimeTable;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Fits the onboard lunar time table ({@link LunarTimeTable}) to the ground's numerical relation
 * and writes its binary image.
 *
 * <p>Over [start, start + span] of TT, split into m equal segments, each of the four quantities
 * (TL - TT at the selenocentre from {@link TimeScaleConverter}, and the Moon's geocentric velocity
 * from the ephemeris) is interpolated at the n + 1 Chebyshev nodes of the first kind of every
 * segment, x_k = cos(pi (k + 1/2)/(n + 1)), with c_j = (2/(n + 1)) sum_k f(x_k) T_j(x_k) (c_0
 * halved): the near-minimax interpolant (Press et al., Numerical Recipes, 3rd ed., section 5.8).
 * The fit error is then measured against the numerical relation every {@value #CHECK_STEP_S} s and
 * at every segment boundary; the table states twice the worst measured error (at least 1e-13 s)
 * as its accuracy. {@link #choose} takes the smallest table (fewest coefficients) whose measured
 * error meets a target, over degrees 4..24 and 1, 2, 4, 8 or 16 segments.
 *
 * <p>What the accuracy covers: the fit against the ground relation. The relation's own accuracy
 * (DE405, the constants' conventions) is the ground's: docs/time-scales.md.
 */
public final class LunarTableFitter {
  /** Spacing of the error check, s. */
  public static final double CHECK_STEP_S = 600.0;
  /** Smallest accuracy a table states, s. */
  public static final double MIN_ACCURACY_S = 1.0e-13;
  /** Ephemeris number written into the table. */
  public static final int EPHEMERIS = 405;

  /** Largest velocity error a chosen table may have, m/s (2e-13 s of position term at 1838 km). */
  public static final double VELOCITY_TARGET_M_PER_S = 0.01;

  private final TimeScaleConverter converter;
  private final Map<Double, double[]> cache = new HashMap<>();
  private long cachedStartTtS = Long.MIN_VALUE;

  /**
   * A fitted table.
   *
   * @param image the binary image (layout of {@link LunarTimeTable})
   * @param degree Chebyshev degree
   * @param segments segment count
   * @param startTtS span start, TT whole seconds since J2000.0
   * @param endTtS span end
   * @param maxErrorS worst |fit - numerical| of TL - TT over the check points, s
   * @param maxVelocityErrorMPerS worst velocity error, m/s
   * @param accuracyS the accuracy written into the table, s
   */
  public record Fit(byte[] image, int degree, int segments, long startTtS, long endTtS, double maxErrorS,
      double maxVelocityErrorMPerS, double accuracyS) {
    /** Defensive copy. */
    public Fit {
      image = image.clone();
    }

    @Override
    public byte[] image() {
      return image.clone();
    }
  }

  /**
   * Creates a fitter on a converter (which carries the relations and the lunar definition). The
   * fitter caches the numerical samples of the last span start; one owner (not thread-safe).
   *
   * @param converter the converter
   */
  public LunarTableFitter(TimeScaleConverter converter) {
    this.converter = converter;
  }

  /**
   * Fits with a given degree and segment count.
   *
   * @param startTtS span start, TT whole seconds since J2000.0
   * @param spanS span, s (1 h to 64 days)
   * @param degree Chebyshev degree (2..24)
   * @param segments segment count (1..16)
   * @param tableId table identifier (1 to 2^32 - 1)
   * @return the fit
   * @throws IllegalArgumentException when an argument is out of range or the span leaves the ephemeris
   */
  public Fit fit(long startTtS, long spanS, int degree, int segments, long tableId) {
    if (spanS < LunarTimeTable.MIN_SPAN_S || spanS > LunarTimeTable.MAX_SPAN_S || degree < LunarTimeTable.MIN_DEGREE
        || degree > LunarTimeTable.MAX_DEGREE || segments < 1 || segments > LunarTimeTable.MAX_SEGMENTS
        || tableId < 1 || tableId > 0xFFFF_FFFFL) {
      throw new IllegalArgumentException("lunar table out of range: span " + spanS + " s (allowed 3600 to 5529600), degree "
          + degree + " (2 to 24), segments " + segments + " (1 to 16), id " + tableId + " (1 to 4294967295)");
    }
    final Fit fit = tryFit(startTtS, spanS, degree, segments, tableId);
    final int st = LunarTimeTable.validate(fit.image(), 0, fit.image().length);
    if (st != Status.OK) {
      throw new IllegalStateException("degree " + degree + " in " + segments + " segments: the fitted lunar table fails "
          + "the onboard validator (" + Status.name(st) + "); fit error " + fit.maxErrorS() + " s, velocity error "
          + fit.maxVelocityErrorMPerS() + " m/s");
    }
    return fit;
  }

  private Fit tryFit(long startTtS, long spanS, int degree, int segments, long tableId) {
    final double h = (double) spanS / segments;
    final double[][] coefficients = new double[segments * LunarTimeTable.COMPONENTS][degree + 1];
    for (int j = 0; j < segments; j++) {
      final double[][] samples = new double[LunarTimeTable.COMPONENTS][degree + 1];
      for (int k = 0; k <= degree; k++) {
        final double x = Math.cos(Math.PI * (k + 0.5) / (degree + 1));
        final double[] f = sample(startTtS, j * h + 0.5 * (x + 1.0) * h);
        for (int c = 0; c < LunarTimeTable.COMPONENTS; c++) {
          samples[c][k] = f[c];
        }
      }
      for (int c = 0; c < LunarTimeTable.COMPONENTS; c++) {
        coefficients[j * LunarTimeTable.COMPONENTS + c] = chebyshevCoefficients(samples[c]);
      }
    }
    final double[] errors = measure(startTtS, spanS, segments, coefficients);
    final double accuracy = Math.max(MIN_ACCURACY_S, roundUp(2.0 * errors[0]));
    final byte[] image = write(degree, segments, startTtS, startTtS + spanS, tableId, converter.relations().lunar(),
        accuracy, coefficients);
    return new Fit(image, degree, segments, startTtS, startTtS + spanS, errors[0], errors[1], accuracy);
  }

  /**
   * Chooses the smallest table whose measured error of TL - TT meets a target (and whose
   * velocity error is at most {@link #VELOCITY_TARGET_M_PER_S}) and that the onboard validator
   * accepts.
   *
   * @param startTtS span start, TT whole seconds since J2000.0
   * @param spanS span, s
   * @param targetS largest acceptable |fit - numerical|, s
   * @param tableId table identifier
   * @return the fit
   * @throws IllegalArgumentException when no layout meets the target
   */
  public Fit choose(long startTtS, long spanS, double targetS, long tableId) {
    Fit best = null;
    for (int segments = 1; segments <= LunarTimeTable.MAX_SEGMENTS; segments *= 2) {
      for (int degree = 4; degree <= LunarTimeTable.MAX_DEGREE; degree++) {
        final int size = segments * (degree + 1);
        if (best != null && size >= best.segments() * (best.degree() + 1)) {
          break;
        }
        if ((double) spanS / segments < LunarTimeTable.MIN_SPAN_S) {
          break;
        }
        final Fit fit = tryFit(startTtS, spanS, degree, segments, tableId);
        if (fit.maxErrorS() <= targetS && fit.maxVelocityErrorMPerS() <= VELOCITY_TARGET_M_PER_S
            && LunarTimeTable.validate(fit.image(), 0, fit.image().length) == Status.OK) {
          best = fit;
          break;
        }
      }
    }
    if (best == null) {
      throw new IllegalArgumentException("no lunar table layout (degree up to 24, up to 16 segments) meets "
          + targetS + " s over " + spanS + " s");
    }
    return best;
  }

  /** TL - TT at the selenocentre and the Moon's geocentric velocity, at start + t (TT); cached. */
  private double[] sample(long startTtS, double t) {
    if (startTtS != cachedStartTtS) {
      cache.clear();
      cachedStartTtS = startTtS;
    }
    return cache.computeIfAbsent(t, k -> compute(startTtS, k));
  }

  private double[] compute(long startTtS, double t) {
    final SplitTime tt = SplitTime.of(startTtS, 0.0);
    Instants.shift(tt, t);
    final TimeScaleConverter.Converted c = converter.convert(TimeScale.TT, tt, false, Centre.MOON);
    final SplitTime tl = c.labels().get(TimeScale.TL);
    if (tl == null) {
      throw new IllegalArgumentException("lunar table span leaves the DE405 span of the time relations "
          + "(TDB 1999-12-24 to 2040-01-25)");
    }
    final double[] out = new double[LunarTimeTable.COMPONENTS];
    out[0] = tl.secondsSince(tt);
    final double tdbS = c.labels().get(TimeScale.TDB).toSecondsApprox();
    final double[] xm = new double[3];
    final double[] vm = new double[3];
    final double[] xe = new double[3];
    final double[] ve = new double[3];
    converter.relations().barycentricState(Centre.MOON, tdbS, xm, vm);
    converter.relations().barycentricState(Centre.EARTH, tdbS, xe, ve);
    for (int i = 0; i < 3; i++) {
      out[1 + i] = vm[i] - ve[i];
    }
    return out;
  }

  static double[] chebyshevCoefficients(double[] samples) {
    final int n = samples.length;
    final double[] c = new double[n];
    for (int j = 0; j < n; j++) {
      double sum = 0.0;
      for (int k = 0; k < n; k++) {
        sum += samples[k] * Math.cos(Math.PI * j * (k + 0.5) / n);
      }
      c[j] = 2.0 * sum / n;
    }
    c[0] *= 0.5;
    return c;
  }

  static double evaluate(double[] c, double s) {
    double tPrev = 1.0;
    double tCur = s;
    double sum = c[0] + c[1] * s;
    for (int i = 2; i < c.length; i++) {
      final double tNext = 2.0 * s * tCur - tPrev;
      sum += c[i] * tNext;
      tPrev = tCur;
      tCur = tNext;
    }
    return sum;
  }

  /** Worst errors of TL - TT (s) and of the velocity (m/s) over the check points and boundaries. */
  private double[] measure(long startTtS, long spanS, int segments, double[][] coefficients) {
    final double h = (double) spanS / segments;
    final int points = (int) Math.ceil(spanS / CHECK_STEP_S);
    double worst = 0.0;
    double worstV = 0.0;
    for (int p = 0; p <= points + segments; p++) {
      final double t = p <= points ? Math.min(spanS, p * CHECK_STEP_S) : (p - points) * h;
      final int j = (int) Math.min(segments - 1, Math.floor(t / h));
      final double s = 2.0 * (t - j * h) / h - 1.0;
      final double[] f = sample(startTtS, t);
      worst = Math.max(worst, Math.abs(evaluate(coefficients[j * LunarTimeTable.COMPONENTS], s) - f[0]));
      for (int c = 1; c < LunarTimeTable.COMPONENTS; c++) {
        worstV = Math.max(worstV, Math.abs(evaluate(coefficients[j * LunarTimeTable.COMPONENTS + c], s) - f[c]));
      }
      if (j > 0 && Math.abs(t - j * h) < 1e-9) {
        final double before = evaluate(coefficients[(j - 1) * LunarTimeTable.COMPONENTS], 1.0);
        worst = Math.max(worst, Math.abs(before - f[0]));
      }
    }
    return new double[] {worst, worstV};
  }

  /** Rounds up to two significant digits. */
  private static double roundUp(double x) {
    if (!(x > 0)) {
      return 0.0;
    }
    final double scale = Math.pow(10.0, Math.floor(Math.log10(x)) - 1);
    return Math.ceil(x / scale) * scale;
  }

  /**
   * Writes a table image in the onboard layout (version 1).
   *
   * @param degree Chebyshev degree
   * @param segments segment count
   * @param startTtS span start
   * @param endTtS span end
   * @param tableId identifier
   * @param lunar L_L and TL0 of the TL fitted
   * @param accuracyS stated accuracy, s
   * @param coefficients [segment * 4 + component][degree + 1]
   * @return the image
   */
  static byte[] write(int degree, int segments, long startTtS, long endTtS, long tableId, LunarTimeDefinition lunar,
      double accuracyS, double[][] coefficients) {
    final ByteBuffer b = ByteBuffer.allocate(LunarTimeTable.imageBytes(degree, segments));
    b.putInt(LunarTimeTable.MAGIC).putShort((short) LunarTimeTable.VERSION).putShort((short) LunarTimeTable.HEADER_BYTES)
        .putShort((short) degree).putShort((short) segments).putShort((short) LunarTimeTable.COMPONENTS)
        .putShort((short) EPHEMERIS).putInt((int) tableId).putInt(0).putLong(startTtS).putLong(endTtS)
        .putDouble(lunar.scaleRateL()).putDouble(accuracyS).putDouble(lunar.tlMinusTtAtT0S());
    for (double[] series : coefficients) {
      for (double c : series) {
        b.putDouble(c);
      }
    }
    return b.array();
  }
}
