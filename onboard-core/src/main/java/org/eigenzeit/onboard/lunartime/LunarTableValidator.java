package org.eigenzeit.onboard.lunartime;

import static org.eigenzeit.onboard.lunartime.LunarTimeTable.CHECK_POINTS;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.COMPONENTS;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.HEADER_BYTES;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.J2000_MINUS_T0_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MAGIC;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MAX_ABS_EPOCH_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MAX_ABS_TL0_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MAX_DEGREE;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MAX_MOON_SPEED_M_PER_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MAX_SEGMENTS;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MAX_SPAN_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MEAN_TCL_TT_RATE;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MIN_DEGREE;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MIN_MOON_SPEED_M_PER_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MIN_SPAN_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.MODEL_TOLERANCE_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.RATE_TOLERANCE;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.VELOCITY_CONTINUITY_M_PER_S;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.VERSION;
import static org.eigenzeit.onboard.lunartime.LunarTimeTable.imageBytes;

import org.eigenzeit.onboard.status.Status;

/**
 * The pure content check of a lunar time table image (layout and checks in {@link
 * LunarTimeTable}'s class doc) and the image's big-endian readers. Static, no state, no
 * allocation; reads the bytes only.
 */
final class LunarTableValidator {
  private static final int MAX_EPHEMERIS = 9999;

  private LunarTableValidator() {}

  /**
   * Checks a table image's content (see {@link LunarTimeTable}). Pure: reads the bytes only.
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
    if (image == null || offset < 0 || length < HEADER_BYTES || offset > image.length - length) {
      return Status.BUFFER_TOO_SMALL;
    }
    final int header = validateHeader(image, offset, length);
    if (header != Status.OK) {
      return header;
    }
    final int n = u16(image, offset + 8);
    final int m = u16(image, offset + 10);
    final int count = m * COMPONENTS * (n + 1);
    for (int i = 0; i < count; i++) {
      if (!Double.isFinite(f64(image, offset + HEADER_BYTES + 8 * i))) {
        return Status.NOT_FINITE;
      }
    }
    final long span = i64(image, offset + 32) - i64(image, offset + 24);
    final double h = (double) span / m;
    final double expectedRate = MEAN_TCL_TT_RATE - f64(image, offset + 40);
    final double accuracy = f64(image, offset + 48);
    final double startSinceT0S = (double) i64(image, offset + 24) + J2000_MINUS_T0_S;
    final double tl0 = f64(image, offset + 56);
    for (int j = 0; j < m; j++) {
      final double segmentStartS = startSinceT0S + j * h;
      final int st = checkSegment(image, offset, n, j, h, expectedRate, tl0, segmentStartS);
      if (st != Status.OK) {
        return st;
      }
      if (j > 0 && !continuous(image, offset, n, j, accuracy)) {
        return Status.OUT_OF_RANGE;
      }
    }
    return Status.OK;
  }

  private static int validateHeader(byte[] b, int o, int length) {
    if (i32(b, o) != MAGIC || u16(b, o + 4) != VERSION || u16(b, o + 6) != HEADER_BYTES
        || u16(b, o + 12) != COMPONENTS || i32(b, o + 20) != 0) {
      return Status.MALFORMED;
    }
    final int n = u16(b, o + 8);
    final int m = u16(b, o + 10);
    if (n < MIN_DEGREE || n > MAX_DEGREE || m < 1 || m > MAX_SEGMENTS) {
      return Status.OUT_OF_RANGE;
    }
    if (length != imageBytes(n, m)) {
      return Status.MALFORMED;
    }
    final int eph = u16(b, o + 14);
    final long start = i64(b, o + 24);
    final long end = i64(b, o + 32);
    if (eph < 1 || eph > MAX_EPHEMERIS || i32(b, o + 16) == 0 || start < -MAX_ABS_EPOCH_S || end > MAX_ABS_EPOCH_S
        || end - start < MIN_SPAN_S || end - start > MAX_SPAN_S) {
      return Status.OUT_OF_RANGE;
    }
    final double l = f64(b, o + 40);
    final double accuracy = f64(b, o + 48);
    final double tl0 = f64(b, o + 56);
    if (!Double.isFinite(l) || !Double.isFinite(accuracy) || !Double.isFinite(tl0)) {
      return Status.NOT_FINITE;
    }
    if (!(l > 0.0 && l < 1e-9) || !(accuracy > 0.0 && accuracy <= 1e-6) || !(Math.abs(tl0) <= MAX_ABS_TL0_S)) {
      return Status.OUT_OF_RANGE;
    }
    return Status.OK;
  }

  /** Offset, rate and speed checks at the check points of segment j (which starts segmentStartS after T0). */
  private static int checkSegment(byte[] b, int o, int n, int j, double h, double expectedRate, double tl0,
      double segmentStartS) {
    for (int p = 0; p < CHECK_POINTS; p++) {
      final double s = Math.cos(Math.PI * p / (CHECK_POINTS - 1));
      final double offsetS = seriesAt(b, coefficientOffset(o, n, j, 0), n, s, false);
      final double rate = seriesAt(b, coefficientOffset(o, n, j, 0), n, s, true) * 2.0 / h;
      final double model = tl0 + expectedRate * (segmentStartS + 0.5 * (s + 1.0) * h);
      if (!(Math.abs(offsetS - model) <= MODEL_TOLERANCE_S) || !(Math.abs(rate - expectedRate) <= RATE_TOLERANCE)) {
        return Status.OUT_OF_RANGE;
      }
      double v2 = 0.0;
      for (int c = 1; c < COMPONENTS; c++) {
        final double vc = seriesAt(b, coefficientOffset(o, n, j, c), n, s, false);
        v2 += vc * vc;
      }
      if (!(v2 >= MIN_MOON_SPEED_M_PER_S * MIN_MOON_SPEED_M_PER_S && v2 <= MAX_MOON_SPEED_M_PER_S * MAX_MOON_SPEED_M_PER_S)) {
        return Status.OUT_OF_RANGE;
      }
    }
    return Status.OK;
  }

  /** Whether segment j starts where segment j - 1 ends. */
  private static boolean continuous(byte[] b, int o, int n, int j, double accuracyS) {
    for (int c = 0; c < COMPONENTS; c++) {
      final double before = seriesAt(b, coefficientOffset(o, n, j - 1, c), n, 1.0, false);
      final double after = seriesAt(b, coefficientOffset(o, n, j, c), n, -1.0, false);
      final double allowed = c == 0 ? accuracyS : VELOCITY_CONTINUITY_M_PER_S;
      if (!(Math.abs(after - before) <= allowed)) {
        return false;
      }
    }
    return true;
  }

  private static int coefficientOffset(int o, int n, int segment, int component) {
    return o + HEADER_BYTES + 8 * (segment * COMPONENTS + component) * (n + 1);
  }

  /** A Chebyshev series (or its derivative in s) read from the image. */
  private static double seriesAt(byte[] b, int pos, int n, double s, boolean derivative) {
    double tPrev = 1.0;
    double tCur = s;
    double dPrev = 0.0;
    double dCur = 1.0;
    double sum = derivative ? f64(b, pos + 8) : f64(b, pos) + f64(b, pos + 8) * s;
    for (int i = 2; i <= n; i++) {
      final double tNext = 2.0 * s * tCur - tPrev;
      final double dNext = 2.0 * tCur + 2.0 * s * dCur - dPrev;
      sum += f64(b, pos + 8 * i) * (derivative ? dNext : tNext);
      tPrev = tCur;
      tCur = tNext;
      dPrev = dCur;
      dCur = dNext;
    }
    return sum;
  }

  static int u16(byte[] b, int p) {
    return ((b[p] & 0xFF) << 8) | (b[p + 1] & 0xFF);
  }

  static int i32(byte[] b, int p) {
    return ((b[p] & 0xFF) << 24) | ((b[p + 1] & 0xFF) << 16) | ((b[p + 2] & 0xFF) << 8) | (b[p + 3] & 0xFF);
  }

  static long i64(byte[] b, int p) {
    return ((long) i32(b, p) << 32) | (i32(b, p + 4) & 0xFFFF_FFFFL);
  }

  static double f64(byte[] b, int p) {
    return Double.longBitsToDouble(i64(b, p));
  }
}
