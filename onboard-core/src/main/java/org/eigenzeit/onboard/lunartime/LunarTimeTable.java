package org.eigenzeit.onboard.lunartime;

import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The uplinked relation between Eigenzeit's TT-like lunar time TL and TT: its binary layout, a
 * pure content validator, and an allocation-free evaluator.
 *
 * <p><b>What it holds.</b> Over a validity span [start, end] of TT, split into m equal segments,
 * four Chebyshev series of degree n per segment, in the normalised time s = 2 (t - t_j)/h - 1 of
 * segment j (length h): component 0 is TL - TT for an event at the Moon's centre, in seconds;
 * components 1-3 are the Moon's geocentric velocity v_M - v_E on ICRF axes, in m/s. The ground
 * fits them to its numerical relation along the JPL ephemeris (ground-sim's
 * {@code LunarTableFitter}) and states the fit's accuracy in the table.
 *
 * <p><b>What it computes.</b> For a clock at selenocentric position r with velocity v (ICRF axes),
 *
 * <pre>
 *   TL - TT (clock)  = TL - TT (centre) - (v_M - v_E) . r / c^2
 *   d(TL - TT)/dTT   = d(TL - TT)/dTT (centre) - [(a_M - a_E) . r + (v_M - v_E) . v] / c^2
 * </pre>
 *
 * The position term is the difference of the two 4-D transformations' v . (x - x_B)/c^2 terms
 * (IERS Conventions 2010 eq. 10.5 for the Earth, the same form about the Moon per IAU 2024
 * Resolution II); it reaches about 21 ns for a 100 km lunar orbit. Accuracy: the table's stated
 * fit accuracy (at most 1e-6 s by validation) plus the velocity fit's share of the position term
 * (below 1e-13 s for the ground's fits); the relation itself is as accurate as the ground's
 * (docs/time-scales.md).
 *
 * <p><b>Binary layout</b>, version 1, big-endian, IEEE-754 doubles:
 *
 * <pre>
 *   offset size type  field
 *    0     4   u32   magic 0x455A4C54 ("EZLT")
 *    4     2   u16   layout version = 1
 *    6     2   u16   header length = 64
 *    8     2   u16   Chebyshev degree n, 2..24 (n + 1 coefficients per series)
 *   10     2   u16   segment count m, 1..16
 *   12     2   u16   components per segment = 4
 *   14     2   u16   ephemeris number the ground fitted along (for example 405), 1..9999
 *   16     4   u32   table identifier, non-zero (ground-assigned)
 *   20     4   u32   reserved, zero
 *   24     8   i64   span start, TT whole seconds since J2000.0, |start| &lt;= 100 years
 *   32     8   i64   span end, TT whole seconds since J2000.0; end - start in [1 h, 64 days]
 *   40     8   f64   L_L of the TL realised, 0 &lt; L_L &lt; 1e-9
 *   48     8   f64   fit accuracy, s, 0 &lt; accuracy &lt;= 1e-6
 *   56     8   f64   TL0 of the TL realised: TL - TT at T0 apart from periodic terms, s, |TL0| &lt;= 1
 *   64   8 m 4 (n+1) f64 coefficients: segment 0 component 0 c_0..c_n, component 1 ..., segment 1 ...
 * </pre>
 *
 * A table's total length is {@link #imageBytes}(n, m): 64 + 32 m (n + 1) bytes, at most
 * {@link #MAX_IMAGE_BYTES}. The layout carries no CRC: the uplink-table mechanism that stages and
 * activates tables ({@link LunarTimeLayout} in an {@link org.eigenzeit.onboard.table.UplinkTable})
 * checks the CRC of its frame and then calls {@link #validate}.
 *
 * <p><b>Validation</b> ({@link #validate}, pure): length and header fields as above; every
 * coefficient finite; then at {@value #CHECK_POINTS} points of every segment (both ends
 * included): TL - TT within {@link #MODEL_TOLERANCE_S} of TL0 + ({@link #MEAN_TCL_TT_RATE} - L_L)
 * (t - T0), T0 = 1977-01-01T00:00:32.184 TT (the periodic terms are below 1 us, the secular
 * rate's uncertainty adds below 1e-6 s over a century); the rate d(TL - TT)/dTT within {@link
 * #RATE_TOLERANCE} of {@link #MEAN_TCL_TT_RATE} - L_L (the monthly periodic terms move it by about
 * 1.3e-12, so TL - TT is monotonic for any L_L below 6.7e-10); the Moon's geocentric speed in [850, 1200] m/s (its
 * orbit gives 960-1090 m/s); and across each segment boundary the two series agree within the
 * stated accuracy (TL - TT) and 0.01 m/s (velocity).
 *
 * <p><b>Evaluation</b> ({@link #evaluate}): bounded loops (degree at most 24), no allocation, no
 * exceptions. Outside [start, end] it refuses with {@link Status#OUT_OF_RANGE} (the table is
 * expired or not yet valid) and counts the refusal; the holder is then unchanged.
 *
 * <p>Mutable, one owner. Allocation only in the constructor.
 */
public final class LunarTimeTable {
  /** Magic number "EZLT". */
  public static final int MAGIC = 0x455A4C54;
  /** Layout version. */
  public static final int VERSION = 1;
  /** Header length, bytes. */
  public static final int HEADER_BYTES = 64;
  /** Series per segment: TL - TT and three velocity components. */
  public static final int COMPONENTS = 4;
  /** Smallest degree. */
  public static final int MIN_DEGREE = 2;
  /** Largest degree. */
  public static final int MAX_DEGREE = 24;
  /** Largest segment count. */
  public static final int MAX_SEGMENTS = 16;
  /** Shortest span, s. */
  public static final long MIN_SPAN_S = 3_600L;
  /** Longest span, s (64 days). */
  public static final long MAX_SPAN_S = 64L * 86_400L;
  /** Largest |span start| and |span end|, s from J2000.0 (100 Julian years). */
  public static final long MAX_ABS_EPOCH_S = 3_155_760_000L;
  /** Largest table, bytes. */
  public static final int MAX_IMAGE_BYTES = HEADER_BYTES + 8 * MAX_SEGMENTS * COMPONENTS * (MAX_DEGREE + 1);
  /**
   * Mean d(TCL)/d(TT) - 1 used for the rate check: 6.798355238e-10 (Lu, Yang and Xie 2025, arXiv
   * 2506.19213, dTCL/dTDB; TDB and TT have no mean rate difference by IAU 2006 B3).
   */
  public static final double MEAN_TCL_TT_RATE = 6.798355238e-10;
  /** Allowed |rate - (MEAN_TCL_TT_RATE - L_L)|. */
  public static final double RATE_TOLERANCE = 1.0e-11;
  /** Allowed |TL - TT - (TL0 + (MEAN_TCL_TT_RATE - L_L)(t - T0))|, s. */
  public static final double MODEL_TOLERANCE_S = 1.0e-5;
  /** Largest |TL0|, s. */
  public static final double MAX_ABS_TL0_S = 1.0;
  /** TT seconds from T0 (1977-01-01T00:00:32.184 TT) to J2000.0 (as TimeScales). */
  static final double J2000_MINUS_T0_S = 725_803_167.816;
  /** Slowest accepted geocentric speed of the Moon, m/s. */
  public static final double MIN_MOON_SPEED_M_PER_S = 850.0;
  /** Fastest accepted geocentric speed of the Moon, m/s. */
  public static final double MAX_MOON_SPEED_M_PER_S = 1200.0;
  /** Allowed velocity jump across a segment boundary, m/s. */
  public static final double VELOCITY_CONTINUITY_M_PER_S = 0.01;
  /** Largest accepted |r| of the clock from the Moon's centre, m (the Moon's sphere of influence). */
  public static final double MAX_CLOCK_RADIUS_M = 6.6e7;
  /** Check points per segment in validation. */
  public static final int CHECK_POINTS = 9;

  private static final double C2 = 299_792_458.0 * 299_792_458.0;

  private final double[] coefficients = new double[MAX_SEGMENTS * COMPONENTS * (MAX_DEGREE + 1)];
  private final double[] value = new double[COMPONENTS];
  private final double[] slope = new double[COMPONENTS];
  private final SplitTime guess = new SplitTime();
  private boolean loaded;
  private int degree;
  private int segments;
  private int ephemeris;
  private long tableId;
  private long startTtS;
  private long endTtS;
  private double segmentS;
  private double scaleRateL;
  private double accuracyS;
  private double tl0S;
  private int loads;
  private int loadFailures;
  private int lastLoadStatus = Status.NOT_READY;
  private long evaluations;
  private int outOfSpan;
  private int notReady;
  private int badInput;
  private int lastEvaluateStatus = Status.NOT_READY;

  /** Creates an empty table (nothing loaded; evaluation returns {@link Status#NOT_READY}). */
  public LunarTimeTable() {
    // storage allocated above, for the largest table
  }

  /**
   * Size of a table image.
   *
   * @param degree Chebyshev degree n
   * @param segments segment count m
   * @return 64 + 32 m (n + 1) bytes
   */
  public static int imageBytes(int degree, int segments) {
    return HEADER_BYTES + 8 * segments * COMPONENTS * (degree + 1);
  }

  /**
   * Checks a table image's content (see the class doc). Pure: reads the bytes only. The checks
   * live in {@link LunarTableValidator}.
   *
   * @param image buffer holding the image
   * @param offset where the image starts
   * @param length its length, bytes
   * @return {@link Status#OK}, {@link Status#BUFFER_TOO_SMALL} (the range lies outside the buffer
   *     or is shorter than the header), {@link Status#MALFORMED} (magic, version, header length,
   *     components, reserved fields, or a length that does not match degree and segments),
   *     {@link Status#NOT_FINITE} (a NaN or infinite value), or {@link Status#OUT_OF_RANGE} (a
   *     header value or a sanity check out of its range)
   */
  public static int validate(byte[] image, int offset, int length) {
    return LunarTableValidator.validate(image, offset, length);
  }

  /**
   * Validates an image and, when it is valid, decodes it into this table (replacing what it
   * held). On a fault the table is unchanged and the failure is counted.
   *
   * @param image buffer holding the image
   * @param offset where the image starts
   * @param length its length, bytes
   * @return the status of {@link #validate}
   */
  public int load(byte[] image, int offset, int length) {
    loads++;
    final int st = validate(image, offset, length);
    lastLoadStatus = st;
    if (st != Status.OK) {
      loadFailures++;
      return st;
    }
    install(image, offset, length);
    return Status.OK;
  }

  /**
   * Decodes an image that {@link #validate} accepted into this table (replacing what it held);
   * the uplink-table path ({@link LunarTimeLayout}) validates when it stages and installs when it
   * activates. Counts nothing.
   *
   * @param image buffer holding a validated image
   * @param offset where the image starts
   * @param length its length, bytes
   */
  void install(byte[] image, int offset, int length) {
    degree = LunarTableValidator.u16(image, offset + 8);
    segments = LunarTableValidator.u16(image, offset + 10);
    ephemeris = LunarTableValidator.u16(image, offset + 14);
    tableId = LunarTableValidator.i32(image, offset + 16) & 0xFFFF_FFFFL;
    startTtS = LunarTableValidator.i64(image, offset + 24);
    endTtS = LunarTableValidator.i64(image, offset + 32);
    scaleRateL = LunarTableValidator.f64(image, offset + 40);
    accuracyS = LunarTableValidator.f64(image, offset + 48);
    tl0S = LunarTableValidator.f64(image, offset + 56);
    segmentS = (double) (endTtS - startTtS) / segments;
    final int count = segments * COMPONENTS * (degree + 1);
    for (int i = 0; i < count; i++) {
      coefficients[i] = LunarTableValidator.f64(image, offset + HEADER_BYTES + 8 * i);
    }
    loaded = true;
  }

  /**
   * TL - TT for an event at a clock, at a TT instant.
   *
   * @param tt the instant, TT
   * @param selenocentricPositionM the clock's position from the Moon's centre, ICRF axes, m (three
   *     elements; zeros for the centre)
   * @param velocityMPerS the clock's velocity relative to the Moon's centre, m/s (three elements)
   * @param out receives the result; unchanged on a fault
   * @return {@link Status#OK}; {@link Status#NOT_READY} (no table loaded); {@link
   *     Status#OUT_OF_RANGE} (the instant lies outside the table's span, or |r| exceeds {@link
   *     #MAX_CLOCK_RADIUS_M}); {@link Status#NOT_FINITE} (a position or velocity component is not
   *     finite); {@link Status#BUFFER_TOO_SMALL} (an array shorter than three). Faults are counted.
   */
  public int evaluate(SplitTime tt, double[] selenocentricPositionM, double[] velocityMPerS, LunarTimeOffset out) {
    evaluations++;
    final int st = checkEvaluation(tt, selenocentricPositionM, velocityMPerS);
    lastEvaluateStatus = st;
    if (st != Status.OK) {
      return st;
    }
    final double sinceStartS = (double) (tt.wholeSeconds() - startTtS) + tt.fractionS();
    final int j = (int) Math.min(segments - 1, Math.floor(sinceStartS / segmentS));
    final double s = 2.0 * (sinceStartS - j * segmentS) / segmentS - 1.0;
    for (int c = 0; c < COMPONENTS; c++) {
      series(j * COMPONENTS + c, s);
    }
    final double[] r = selenocentricPositionM;
    final double[] v = velocityMPerS;
    final double vr = value[1] * r[0] + value[2] * r[1] + value[3] * r[2];
    final double ar = slope[1] * r[0] + slope[2] * r[1] + slope[3] * r[2];
    final double vv = value[1] * v[0] + value[2] * v[1] + value[3] * v[2];
    out.centreTlMinusTtS = value[0];
    out.positionTermS = -vr / C2;
    out.tlMinusTtS = value[0] - vr / C2;
    out.centreRate = slope[0];
    out.rate = slope[0] - (ar + vv) / C2;
    out.tableId = tableId;
    return Status.OK;
  }

  /**
   * TL - TT for an event at a clock whose time is known in TL (a lunar clock realising TL), and the
   * event's TT. The TT argument is first taken from the table's own secular model, TT = TL - [TL0 +
   * ({@link #MEAN_TCL_TT_RATE} - L_L)(TL - T0)], which validation holds within {@link
   * #MODEL_TOLERANCE_S} of the series (so the argument is off by at most 1e-5 s and the value by
   * 1e-5 s times a rate below 7e-10: under 1e-14 s); one evaluation there, then TT = TL - (TL - TT).
   *
   * @param tl the event's TL
   * @param selenocentricPositionM the clock's position from the Moon's centre, ICRF axes, m
   * @param velocityMPerS the clock's velocity relative to the Moon's centre, m/s
   * @param ttOut receives the event's TT; unchanged on a fault
   * @param out receives the result; unchanged on a fault
   * @return as {@link #evaluate} (one evaluation, counted as such), or {@link Status#OUT_OF_RANGE}
   *     when the shift to TT is refused
   */
  public int evaluateAtTl(SplitTime tl, double[] selenocentricPositionM, double[] velocityMPerS, SplitTime ttOut,
      LunarTimeOffset out) {
    final double sinceT0S = tl.toSecondsApprox() + J2000_MINUS_T0_S;
    final double secular = loaded ? tl0S + (MEAN_TCL_TT_RATE - scaleRateL) * sinceT0S : 0.0;
    guess.setTo(tl);
    if (guess.addSeconds(-secular) != Status.OK) {
      return Status.OUT_OF_RANGE; // unreachable for a validated table: |secular| stays below 3 s
    }
    final int st = evaluate(guess, selenocentricPositionM, velocityMPerS, out);
    if (st != Status.OK) {
      return st;
    }
    guess.setTo(tl);
    if (guess.addSeconds(-out.tlMinusTtS) != Status.OK) {
      return Status.OUT_OF_RANGE; // unreachable: the value passed validation's bounds
    }
    ttOut.setTo(guess);
    return Status.OK;
  }

  private int checkEvaluation(SplitTime tt, double[] r, double[] v) {
    if (!loaded) {
      notReady++;
      return Status.NOT_READY;
    }
    if (r.length < 3 || v.length < 3) {
      badInput++;
      return Status.BUFFER_TOO_SMALL;
    }
    if (!Double.isFinite(r[0] + r[1] + r[2] + v[0] + v[1] + v[2])) {
      badInput++;
      return Status.NOT_FINITE;
    }
    final double r2 = r[0] * r[0] + r[1] * r[1] + r[2] * r[2];
    if (!(r2 <= MAX_CLOCK_RADIUS_M * MAX_CLOCK_RADIUS_M)) {
      badInput++;
      return Status.OUT_OF_RANGE;
    }
    final long w = tt.wholeSeconds();
    if (w < startTtS || w > endTtS || (w == endTtS && tt.fractionS() > 0.0)) {
      outOfSpan++;
      return Status.OUT_OF_RANGE;
    }
    return Status.OK;
  }

  /** Value and d/dt (per second) of series k of the loaded table at s, into value/slope. */
  private void series(int k, double s) {
    final int base = k * (degree + 1);
    double tPrev = 1.0;
    double tCur = s;
    double dPrev = 0.0;
    double dCur = 1.0;
    double sum = coefficients[base] + coefficients[base + 1] * s;
    double dsum = coefficients[base + 1];
    for (int i = 2; i <= degree; i++) {
      final double tNext = 2.0 * s * tCur - tPrev;
      final double dNext = 2.0 * tCur + 2.0 * s * dCur - dPrev;
      sum += coefficients[base + i] * tNext;
      dsum += coefficients[base + i] * dNext;
      tPrev = tCur;
      tCur = tNext;
      dPrev = dCur;
      dCur = dNext;
    }
    final int c = k % COMPONENTS;
    value[c] = sum;
    slope[c] = dsum * 2.0 / segmentS;
  }

  /**
   * Whether a valid table is loaded.
   *
   * @return true after a successful {@link #load}
   */
  public boolean loaded() {
    return loaded;
  }

  /**
   * Returns the table identifier (unsigned 32 bits).
   *
   * @return the identifier, 0 when nothing is loaded
   */
  public long tableId() {
    return tableId;
  }

  /**
   * Returns the start of the validity span.
   *
   * @return TT whole seconds since J2000.0
   */
  public long startTtS() {
    return startTtS;
  }

  /**
   * Returns the end of the validity span.
   *
   * @return TT whole seconds since J2000.0
   */
  public long endTtS() {
    return endTtS;
  }

  /**
   * Returns L_L of the TL the table realises (check it against the lunar body's scaleRateL).
   *
   * @return L_L
   */
  public double scaleRateL() {
    return scaleRateL;
  }

  /**
   * Returns the fit accuracy the ground stated.
   *
   * @return accuracy, s
   */
  public double accuracyS() {
    return accuracyS;
  }

  /**
   * Returns TL0 of the TL the table realises.
   *
   * @return TL - TT at T0 apart from periodic terms, s
   */
  public double tl0S() {
    return tl0S;
  }

  /**
   * Returns the Chebyshev degree.
   *
   * @return n
   */
  public int degree() {
    return degree;
  }

  /**
   * Returns the segment count.
   *
   * @return m
   */
  public int segments() {
    return segments;
  }

  /**
   * Returns the ephemeris number the ground fitted along.
   *
   * @return for example 405
   */
  public int ephemeris() {
    return ephemeris;
  }

  /**
   * Returns the number of {@link #load} calls.
   *
   * @return loads
   */
  public int loads() {
    return loads;
  }

  /**
   * Returns the number of refused loads.
   *
   * @return refused loads
   */
  public int loadFailures() {
    return loadFailures;
  }

  /**
   * Returns the status of the last load.
   *
   * @return a {@link Status} code ({@link Status#NOT_READY} before any load)
   */
  public int lastLoadStatus() {
    return lastLoadStatus;
  }

  /**
   * Returns the number of {@link #evaluate} calls.
   *
   * @return evaluations
   */
  public long evaluations() {
    return evaluations;
  }

  /**
   * Returns the evaluations refused because the instant lay outside the span.
   *
   * @return count
   */
  public int outOfSpanCount() {
    return outOfSpan;
  }

  /**
   * Returns the evaluations refused because no table was loaded.
   *
   * @return count
   */
  public int notReadyCount() {
    return notReady;
  }

  /**
   * Returns the evaluations refused for a bad position or velocity.
   *
   * @return count
   */
  public int badInputCount() {
    return badInput;
  }

  /**
   * Returns the status of the last evaluation.
   *
   * @return a {@link Status} code
   */
  public int lastEvaluateStatus() {
    return lastEvaluateStatus;
  }
}
