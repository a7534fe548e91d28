package org.eigenzeit.ground.input;

import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Strict parsing of text fields. Java's own parsers accept far more than a data file may hold
 * ({@code NaN}, {@code Infinity}, hexadecimal floats such as {@code 0x1p3}, a trailing {@code d}
 * or {@code f}, numbers that overflow to infinity): every method here accepts only plain decimal
 * notation (FORTRAN {@code D} exponents included, as in RINEX and JPL files), refuses everything
 * else, and names the source, the line, the field, what it found and what is allowed.
 *
 * <p>Stateless; thread-safe.
 */
public final class TextFields {
  private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eEdD][+-]?\\d{1,4})?");
  private static final Pattern WHOLE = Pattern.compile("[+-]?\\d{1,18}");

  private TextFields() {}

  /**
   * Parses a finite decimal number.
   *
   * @param source file name for messages
   * @param line 1-based line number
   * @param field what the field is (for messages)
   * @param text the field's text (surrounding blanks are ignored)
   * @return the value
   * @throws InputException when the text is not a finite decimal number
   */
  public static double decimal(String source, int line, String field, String text) {
    final String t = text.strip();
    if (!DECIMAL.matcher(t).matches()) {
      throw new InputException(source, line, field + ": not a decimal number, found '" + t
          + "', allowed digits with an optional sign, point and exponent");
    }
    final double v = Double.parseDouble(t.replace('D', 'E').replace('d', 'e'));
    if (!Double.isFinite(v)) {
      throw new InputException(source, line, field + ": number out of the double range, found '" + t + "'");
    }
    return v;
  }

  /**
   * Parses a finite decimal number and checks it lies in a closed range.
   *
   * @param source file name for messages
   * @param line 1-based line number
   * @param field what the field is, with its unit (for messages)
   * @param text the field's text
   * @param min smallest allowed value
   * @param max largest allowed value
   * @return the value
   * @throws InputException when not a number or outside [min, max]
   */
  public static double decimal(String source, int line, String field, String text, double min, double max) {
    final double v = decimal(source, line, field, text);
    return checkRange(source, line, field, v, text.strip(), min, max);
  }

  /**
   * Checks that a value lies in a closed range.
   *
   * @param source file name for messages
   * @param line 1-based line number
   * @param field what the field is, with its unit
   * @param value the value
   * @param found how the value was written (for messages)
   * @param min smallest allowed value
   * @param max largest allowed value
   * @return the value
   * @throws InputException when outside [min, max] or not finite
   */
  public static double checkRange(String source, int line, String field, double value, String found,
      double min, double max) {
    if (!(value >= min && value <= max)) {
      throw new InputException(source, line, field + ": out of range, found " + found + ", allowed "
          + format(min) + " to " + format(max));
    }
    return value;
  }

  /**
   * Parses a whole number (no fraction, no exponent) in a closed range.
   *
   * @param source file name for messages
   * @param line 1-based line number
   * @param field what the field is
   * @param text the field's text
   * @param min smallest allowed value
   * @param max largest allowed value
   * @return the value
   * @throws InputException when not a whole number or outside [min, max]
   */
  public static long whole(String source, int line, String field, String text, long min, long max) {
    final String t = text.strip();
    if (!WHOLE.matcher(t).matches()) {
      throw new InputException(source, line, field + ": not a whole number, found '" + t + "', allowed "
          + min + " to " + max);
    }
    final long v = Long.parseLong(t);
    if (v < min || v > max) {
      throw new InputException(source, line, field + ": out of range, found " + t + ", allowed " + min + " to " + max);
    }
    return v;
  }

  /**
   * Parses a whole number that fits an int, in a closed range.
   *
   * @param source file name for messages
   * @param line 1-based line number
   * @param field what the field is
   * @param text the field's text
   * @param min smallest allowed value
   * @param max largest allowed value
   * @return the value
   * @throws InputException when not a whole number or outside [min, max]
   */
  public static int integer(String source, int line, String field, String text, int min, int max) {
    return (int) whole(source, line, field, text, min, max);
  }

  /**
   * Checks calendar fields: a Gregorian date that exists, hour 0-23, minute 0-59 and seconds in
   * [0, 60), or [0, 61) when {@code leapSecondAllowed} (23:59:60.x on a day that may end with a leap
   * second; whether it does is the leap-second table's business).
   *
   * @param source file name for messages
   * @param line 1-based line number
   * @param year year (1900-2200)
   * @param month month 1-12
   * @param day day of the month
   * @param hour hour 0-23
   * @param minute minute 0-59
   * @param second seconds
   * @param leapSecondAllowed whether 60.x is allowed at 23:59
   * @throws InputException naming the first field that is out of range
   */
  public static void checkCalendar(String source, int line, int year, int month, int day, int hour,
      int minute, double second, boolean leapSecondAllowed) {
    checkRange(source, line, "year", year, Integer.toString(year), 1900, 2200);
    checkRange(source, line, "month", month, Integer.toString(month), 1, 12);
    final int days = daysInMonth(year, month);
    checkRange(source, line, "day of month " + year + "-" + month, day, Integer.toString(day), 1, days);
    checkRange(source, line, "hour", hour, Integer.toString(hour), 0, 23);
    checkRange(source, line, "minute", minute, Integer.toString(minute), 0, 59);
    final boolean leap = leapSecondAllowed && hour == 23 && minute == 59;
    final double limit = leap ? 61.0 : 60.0;
    if (!(second >= 0.0 && second < limit)) {
      throw new InputException(source, line, "seconds: out of range, found " + format(second) + ", allowed 0 to below "
          + format(limit) + (leap ? "" : " (60.x only at 23:59 where a leap second may be inserted)"));
    }
  }

  /**
   * Number of days of a Gregorian month.
   *
   * @param year the year
   * @param month the month 1-12
   * @return 28 to 31
   */
  public static int daysInMonth(int year, int month) {
    switch (month) {
      case 2:
        final boolean leapYear = (year % 4 == 0 && year % 100 != 0) || year % 400 == 0;
        return leapYear ? 29 : 28;
      case 4:
      case 6:
      case 9:
      case 11:
        return 30;
      default:
        return 31;
    }
  }

  private static String format(double v) {
    if (Double.compare(v, Math.rint(v)) == 0 && Math.abs(v) < 1e15) {
      return Long.toString((long) v);
    }
    return String.format(Locale.ROOT, "%.6g", v);
  }
}
