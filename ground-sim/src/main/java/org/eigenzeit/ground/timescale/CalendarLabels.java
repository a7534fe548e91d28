package org.eigenzeit.ground.timescale;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.trajectory.CalendarMath;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Reads and writes the labels of an instant in a time scale: CCSDS ASCII calendar forms
 * (YYYY-MM-DDThh:mm:ss[.s...] and YYYY-DDDThh:mm:ss[.s...], CCSDS 301.0-B-4 section 3.5, with an
 * optional trailing Z) or a Julian date written "JD" followed by a decimal number. Labels are
 * counted from J2000.0 = 2000-01-01T12:00:00 in the scale's own labels ({@link SplitTime}).
 * Calendar arithmetic: Fliegel and van Flandern (1968), Comm. ACM 11:657, both directions.
 */
public final class CalendarLabels {
  private static final Pattern CALENDAR = Pattern.compile(
      "(\\d{4})-(\\d{2})-(\\d{2})T(\\d{2}):(\\d{2}):(\\d{2}(?:\\.\\d{1,15})?)Z?");
  private static final Pattern DAY_OF_YEAR = Pattern.compile(
      "(\\d{4})-(\\d{3})T(\\d{2}):(\\d{2}):(\\d{2}(?:\\.\\d{1,15})?)Z?");
  private static final Pattern JULIAN = Pattern.compile("JD\\s*(\\d{7}(?:\\.\\d{1,15})?)");
  private static final long J2000_JDN = 2_451_545L;
  private static final long DAY_S = 86_400L;

  /**
   * Labels read from text.
   *
   * @param labels the instant's labels; for a leap second (seconds 60.x) the labels of 23:59:59
   *     plus the fraction
   * @param leapSecond whether the text named second 60 of a minute (UTC only)
   */
  public record Parsed(SplitTime labels, boolean leapSecond) {
    /** Defensive copy. */
    public Parsed {
      labels = SplitTime.of(labels.wholeSeconds(), labels.fractionS());
    }

    @Override
    public SplitTime labels() {
      return SplitTime.of(labels.wholeSeconds(), labels.fractionS());
    }
  }

  private CalendarLabels() {}

  /**
   * Parses labels.
   *
   * @param option the option or field name, for messages
   * @param text the text
   * @param leapSecondAllowed whether 23:59:60.x is accepted (UTC)
   * @return the labels
   * @throws InputException naming the option, what was found and what is allowed
   */
  public static Parsed parse(String option, String text, boolean leapSecondAllowed) {
    final String t = text.strip();
    Matcher m = JULIAN.matcher(t);
    if (m.matches()) {
      return new Parsed(julian(option, m.group(1)), false);
    }
    m = CALENDAR.matcher(t);
    final int year;
    final int month;
    final int day;
    final int hourGroup;
    if (m.matches()) {
      year = Integer.parseInt(m.group(1));
      month = Integer.parseInt(m.group(2));
      day = Integer.parseInt(m.group(3));
      hourGroup = 4;
    } else {
      m = DAY_OF_YEAR.matcher(t);
      if (!m.matches()) {
        throw new InputException(option, 0, "not an epoch, found '" + t + "', allowed YYYY-MM-DDThh:mm:ss[.s], "
            + "YYYY-DDDThh:mm:ss[.s] or JD<julian date>");
      }
      year = Integer.parseInt(m.group(1));
      final int doy = Integer.parseInt(m.group(2));
      final int days = (year % 4 == 0 && year % 100 != 0) || year % 400 == 0 ? 366 : 365;
      TextFields.checkRange(option, 0, "day of year", doy, m.group(2), 1, days);
      final int[] md = monthDay(year, doy);
      month = md[0];
      day = md[1];
      hourGroup = 3;
    }
    final int hour = Integer.parseInt(m.group(hourGroup));
    final int minute = Integer.parseInt(m.group(hourGroup + 1));
    final BigDecimal seconds = new BigDecimal(m.group(hourGroup + 2));
    TextFields.checkCalendar(option, 0, year, month, day, hour, minute, seconds.doubleValue(), leapSecondAllowed);
    final boolean leap = seconds.compareTo(BigDecimal.valueOf(60)) >= 0;
    final BigDecimal within = leap ? seconds.subtract(BigDecimal.ONE) : seconds;
    final long whole = within.setScale(0, RoundingMode.FLOOR).longValueExact();
    final double fraction = within.subtract(BigDecimal.valueOf(whole)).doubleValue();
    final long jdn = CalendarMath.julianDayNumber(year, month, day);
    final long labelS = (jdn - J2000_JDN) * DAY_S - DAY_S / 2 + hour * 3600L + minute * 60L + whole;
    return new Parsed(SplitTime.of(labelS, fraction), leap);
  }

  private static SplitTime julian(String option, String text) {
    final BigDecimal jd = new BigDecimal(text);
    final BigDecimal days = jd.subtract(BigDecimal.valueOf(J2000_JDN));
    TextFields.checkRange(option, 0, "Julian date", jd.doubleValue(), text, 2_415_020.5, 2_488_070.5);
    final BigDecimal seconds = days.multiply(BigDecimal.valueOf(DAY_S));
    final long whole = seconds.setScale(0, RoundingMode.FLOOR).longValueExact();
    return SplitTime.of(whole, seconds.subtract(BigDecimal.valueOf(whole)).doubleValue());
  }

  /** Month and day of a day of the year. */
  private static int[] monthDay(int year, int doy) {
    int rest = doy;
    for (int month = 1; month <= 12; month++) {
      final int n = TextFields.daysInMonth(year, month);
      if (rest <= n) {
        return new int[] {month, rest};
      }
      rest -= n;
    }
    throw new IllegalStateException("day of year beyond December: " + doy);
  }

  /**
   * Writes labels as YYYY-MM-DDThh:mm:ss.sss... with a given number of decimals (rounded half
   * up at the last digit; a carry moves to the next second).
   *
   * @param labels the labels
   * @param decimals digits after the point, 0..12
   * @param heldLeapSecond whether the labels are UTC held at 23:59:59 during a leap second (then
   *     written as second 60)
   * @return the text
   */
  public static String format(SplitTime labels, int decimals, boolean heldLeapSecond) {
    final long scale = pow10(decimals);
    long units = Math.round(labels.fractionS() * scale);
    long whole = labels.wholeSeconds();
    if (units >= scale) {
      units -= scale;
      whole += 1;
    }
    final long sinceMidnight = whole + DAY_S / 2;
    final long day = Math.floorDiv(sinceMidnight, DAY_S);
    long secOfDay = sinceMidnight - day * DAY_S;
    final int[] ymd = civil(J2000_JDN + day);
    if (heldLeapSecond) {
      secOfDay += 1;
    }
    final long hh = Math.min(23, secOfDay / 3600);
    final long mm = Math.min(59, (secOfDay - hh * 3600) / 60);
    final long ss = secOfDay - hh * 3600 - mm * 60;
    final String base = String.format(Locale.ROOT, "%04d-%02d-%02dT%02d:%02d:%02d", ymd[0], ymd[1], ymd[2], hh, mm, ss);
    if (decimals == 0) {
      return base;
    }
    final String digits = Long.toString(units);
    return base + "." + "0".repeat(decimals - digits.length()) + digits;
  }

  /**
   * Writes labels as a Julian date with 12 decimals of a day (about 0.1 us).
   *
   * @param labels the labels
   * @return "JD" and the number
   */
  public static String julianDate(SplitTime labels) {
    final BigDecimal seconds = BigDecimal.valueOf(labels.wholeSeconds()).add(new BigDecimal(labels.fractionS()));
    final BigDecimal jd = BigDecimal.valueOf(J2000_JDN).add(seconds.divide(BigDecimal.valueOf(DAY_S), 15, RoundingMode.HALF_EVEN));
    return "JD" + jd.setScale(12, RoundingMode.HALF_EVEN).toPlainString();
  }

  private static long pow10(int n) {
    if (n < 0 || n > 12) {
      throw new IllegalArgumentException("decimals must be 0..12, found " + n);
    }
    long p = 1;
    for (int i = 0; i < n; i++) {
      p *= 10;
    }
    return p;
  }

  /** Gregorian date of a Julian Day Number (Fliegel and van Flandern 1968). */
  static int[] civil(long jdn) {
    long l = jdn + 68_569;
    final long n = 4 * l / 146_097;
    l = l - (146_097 * n + 3) / 4;
    final long i = 4000 * (l + 1) / 1_461_001;
    l = l - 1461 * i / 4 + 31;
    final long j = 80 * l / 2447;
    final long d = l - 2447 * j / 80;
    l = j / 11;
    final long m = j + 2 - 12 * l;
    final long y = 100 * (n - 49) + i + l;
    return new int[] {(int) y, (int) m, (int) d};
  }
}
