package org.eigenzeit.onboard.time;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;

/**
 * A mutable instant held as whole seconds plus a fraction of a second, counted from
 * 2000-01-01T12:00:00 (J2000.0) in the labels of whatever scale the owner says it is in.
 *
 * <p>Storage: {@code long wholeSeconds} and {@code double fractionS} with 0 &lt;= fractionS &lt; 1.
 * The fraction's resolution is 2^-53 s (about 1.1e-16 s) everywhere, so picosecond resolution
 * holds for any date the long can hold, unlike a single double of seconds (whose resolution is
 * about 1e-7 s in 2026 when counted from J2000).
 *
 * <p>The scale is not stored: the variable name says it ({@code epochTt}, {@code epochTai}).
 *
 * <p>Mutable and not thread-safe: one owner. Nothing in this class allocates.
 */
public final class SplitTime implements Comparable<SplitTime> {
  /** Seconds in a day. */
  public static final long SECONDS_PER_DAY = 86_400L;
  /** Julian date of J2000.0, the zero of this representation. */
  public static final double JD_J2000 = 2_451_545.0;
  /** Largest |whole seconds| of a restored instant (about 31 700 years from J2000.0). */
  public static final long MAX_RESTORED_WHOLE_S = 1_000_000_000_000L;
  /** Largest |shift| accepted by {@link #addSeconds(double)} (about 31.7 million years). */
  public static final double MAX_SHIFT_S = 1.0e15;

  private long wholeSeconds;
  private double fractionS;

  /** Creates the instant J2000.0 (zero). */
  public SplitTime() {
    // zero
  }

  /**
   * Creates an instant from whole seconds and a fraction (normalised).
   *
   * @param wholeSeconds whole seconds since J2000.0
   * @param fractionS fraction; any finite value, normalised into [0, 1)
   * @return the new instant (allocation: construction only)
   */
  public static SplitTime of(long wholeSeconds, double fractionS) {
    final SplitTime t = new SplitTime();
    if (t.set(wholeSeconds, fractionS) != Status.OK) {
      throw new IllegalArgumentException("fraction must be finite");
    }
    return t;
  }

  /**
   * Sets the instant. The fraction is normalised into [0, 1) by moving whole seconds.
   *
   * @param whole whole seconds since J2000.0
   * @param fraction fraction of a second; |fraction| must be below {@link #MAX_SHIFT_S}
   * @return {@link Status#OK}, or {@link Status#NOT_FINITE} / {@link Status#OUT_OF_RANGE} (the
   *     instant is then unchanged)
   */
  @CheckReturnValue
  public int set(long whole, double fraction) {
    if (!Double.isFinite(fraction)) {
      return Status.NOT_FINITE;
    }
    if (Math.abs(fraction) >= MAX_SHIFT_S) {
      return Status.OUT_OF_RANGE;
    }
    final double fl = Math.floor(fraction);
    long w = whole + (long) fl;
    double f = fraction - fl;
    if (f >= 1.0) { // fraction - floor can round up to 1.0 for tiny negative inputs
      f -= 1.0;
      w += 1;
    }
    this.wholeSeconds = w;
    this.fractionS = f;
    return Status.OK;
  }

  /**
   * Sets the instant from parts the caller knows to be valid, for the time package's conversions,
   * which return no status of their own. {@link #set(long, double)} can refuse only a non-finite
   * fraction or one of magnitude {@link #MAX_SHIFT_S} or more; no caller can pass either:
   *
   * <ul>
   *   <li>{@link TimeScales} TAI/TT and TAI/system time: another instant's fraction (in [0, 1))
   *       plus a constant below 33 s or nothing;
   *   <li>{@link TimeScales} TT/TCG and TDB/TCB: a fraction in [0, 1) plus L_G or L_B (or
   *       L / (1 - L)) times the seconds since 1977 (plus TDB0), which for any long of seconds
   *       (below 9.3e18) is below 1.5e11 s;
   *   <li>{@link TimeScales} TCL/TL: the same with L_L, which they first check to be below
   *       {@link TimeScales#MAX_ABS_SCALE_RATE} (1e-6), so below 1e13 s;
   *   <li>{@link LeapSecondTable} UTC/TAI: another instant's fraction, unchanged;
   *   <li>{@link CucCodec#decode}: a sum of at most 10 fine octets, octet k (each below 256)
   *       times 256^-k, so in [0, 1] (a rounded 1.0 is normalised).
   * </ul>
   *
   * <p>The assertion below documents this and checks it in the tests (which run with assertions
   * on); it is off in flight code, where a refusal could leave the instant unchanged, so a new
   * caller must give the same argument here or use {@link #set(long, double)} and its status.
   */
  void setInRange(long whole, double fraction) {
    final int st = set(whole, fraction);
    assert st == Status.OK : "fraction out of range: " + fraction;
  }

  /**
   * Copies another instant.
   *
   * @param other the source
   */
  public void setTo(SplitTime other) {
    this.wholeSeconds = other.wholeSeconds;
    this.fractionS = other.fractionS;
  }

  /**
   * Adds a shift in seconds, keeping full resolution.
   *
   * @param shiftS shift in seconds
   * @return {@link Status#OK}, or {@link Status#NOT_FINITE} / {@link Status#OUT_OF_RANGE} (the
   *     instant is then unchanged)
   */
  @CheckReturnValue
  public int addSeconds(double shiftS) {
    final double f = fractionS + shiftS;
    if (f >= 0.0 && f < 1.0) {
      // No carry (the common case of a sub-second correction); NaN and infinities fail the test.
      fractionS = f;
      return Status.OK;
    }
    if (!Double.isFinite(shiftS)) {
      return Status.NOT_FINITE;
    }
    if (Math.abs(shiftS) >= MAX_SHIFT_S) {
      return Status.OUT_OF_RANGE;
    }
    final double whole = Math.floor(shiftS);
    return set(wholeSeconds + (long) whole, fractionS + (shiftS - whole));
  }

  /**
   * Adds whole seconds exactly.
   *
   * @param seconds whole seconds to add
   */
  public void addWholeSeconds(long seconds) {
    wholeSeconds += seconds;
  }

  /**
   * Seconds from {@code origin} to this instant, as a double: (this - origin).
   *
   * @param origin the earlier instant
   * @return the difference in seconds (resolution limited by a double of the difference)
   */
  public double secondsSince(SplitTime origin) {
    return (double) (wholeSeconds - origin.wholeSeconds) + (fractionS - origin.fractionS);
  }

  /**
   * Compares two instants.
   *
   * @param other the other instant
   * @return negative, zero or positive as this is before, equal to or after {@code other}
   */
  @Override
  public int compareTo(SplitTime other) {
    if (wholeSeconds != other.wholeSeconds) {
      return wholeSeconds < other.wholeSeconds ? -1 : 1;
    }
    return Double.compare(fractionS, other.fractionS);
  }

  /**
   * Whole seconds since J2000.0.
   *
   * @return whole seconds
   */
  public long wholeSeconds() {
    return wholeSeconds;
  }

  /**
   * Fraction of a second, in [0, 1).
   *
   * @return the fraction in seconds
   */
  public double fractionS() {
    return fractionS;
  }

  /**
   * Seconds since J2000.0 as one double (loses resolution: for display and slow terms only).
   *
   * @return seconds since J2000.0
   */
  public double toSecondsApprox() {
    return (double) wholeSeconds + fractionS;
  }

  /**
   * Julian centuries since J2000.0 (for slowly varying series such as precession).
   *
   * @return centuries of 36525 days
   */
  public double julianCenturies() {
    return ((double) wholeSeconds + fractionS) / (36_525.0 * SECONDS_PER_DAY);
  }

  /**
   * Sets this instant from a two-part Julian date in its scale, as SOFA writes dates.
   *
   * @param jd1 first part (for example 2453750.5)
   * @param jd2 second part (for example 0.892482639)
   * @return {@link Status#OK}, {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE}
   */
  @CheckReturnValue
  public int setJulianDate(double jd1, double jd2) {
    if (!Double.isFinite(jd1) || !Double.isFinite(jd2)) {
      return Status.NOT_FINITE;
    }
    final double d1 = jd1 - JD_J2000;
    if (Math.abs(d1) > 1.0e9 || Math.abs(jd2) > 1.0e9) {
      return Status.OUT_OF_RANGE;
    }
    final double w1 = Math.floor(d1);
    final double w2 = Math.floor(jd2);
    final double fracDays = (d1 - w1) + (jd2 - w2);
    final double secs = fracDays * SECONDS_PER_DAY;
    final double ws = Math.floor(secs);
    return set(((long) w1 + (long) w2) * SECONDS_PER_DAY + (long) ws, secs - ws);
  }

  /**
   * Writes this instant as a two-part Julian date: {@code out[0]} = 2451545.0 plus whole days,
   * {@code out[1]} = the fraction of a day in [0, 1).
   *
   * @param out two-element array to receive the parts
   */
  public void toJulianDate(double[] out) {
    final long days = Math.floorDiv(wholeSeconds, SECONDS_PER_DAY);
    final long secOfDay = wholeSeconds - days * SECONDS_PER_DAY;
    out[0] = JD_J2000 + (double) days;
    out[1] = ((double) secOfDay + fractionS) / SECONDS_PER_DAY;
  }

  /**
   * Writes this instant as its whole seconds and fraction (read back by {@link #restore}).
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    w.putLong(wholeSeconds);
    w.putDouble(fractionS);
  }

  /**
   * Reads an instant written by {@link #save}: whole seconds within +-{@value
   * #MAX_RESTORED_WHOLE_S}, a fraction in [0, 1); a refusal latches in the reader and leaves this
   * instant unchanged.
   *
   * @param r the reader
   */
  public void restore(StateReader r) {
    final long whole = r.getLongIn(-MAX_RESTORED_WHOLE_S, MAX_RESTORED_WHOLE_S);
    final int at = r.position();
    final double fraction = r.getFinite();
    if (!(fraction >= 0.0 && fraction < 1.0)) {
      r.refuse(at);
    } else if (r.status() == Status.OK) {
      wholeSeconds = whole;
      fractionS = fraction;
    }
  }

  @Override
  public boolean equals(Object o) {
    if (!(o instanceof SplitTime)) {
      return false;
    }
    final SplitTime t = (SplitTime) o;
    return t.wholeSeconds == wholeSeconds && Double.compare(t.fractionS, fractionS) == 0;
  }

  @Override
  public int hashCode() {
    return Long.hashCode(wholeSeconds) * 31 + Double.hashCode(fractionS);
  }

  @Override
  public String toString() {
    return "SplitTime[" + wholeSeconds + " s + " + fractionS + " s since J2000.0]";
  }
}
