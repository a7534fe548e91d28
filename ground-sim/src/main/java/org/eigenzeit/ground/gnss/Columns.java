package org.eigenzeit.ground.gnss;

import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;

/** Fixed-column access to text lines (1-based inclusive columns, as the format documents number them). */
final class Columns {
  private Columns() {}

  /**
   * Columns {@code from..to} of a line, padded with blanks where the line is shorter (trailing
   * blanks are often stripped from real files).
   *
   * @param line the line
   * @param from first column, 1-based
   * @param to last column, 1-based, inclusive
   * @return the text, exactly {@code to - from + 1} characters
   */
  static String of(String line, int from, int to) {
    final StringBuilder b = new StringBuilder(to - from + 1);
    for (int c = from; c <= to; c++) {
      b.append(c <= line.length() ? line.charAt(c - 1) : ' ');
    }
    return b.toString();
  }

  /**
   * Whether columns {@code from..} to the end of the line are blank.
   *
   * @param line the line
   * @param from first column, 1-based
   * @return true when nothing but blanks follows
   */
  static boolean blankFrom(String line, int from) {
    return from > line.length() || line.substring(from - 1).isBlank();
  }

  /**
   * Calendar fields of an epoch at fixed columns, checked by {@link TextFields#checkCalendar}
   * (leap second allowed at 23:59).
   *
   * @param source file name for messages
   * @param line line number
   * @param l the line
   * @param cols first and last column of year, month, day, hour, minute and second (12 numbers)
   * @param twoDigitYear whether the year has two digits (80-99: 19xx, 00-79: 20xx, RINEX 2)
   * @return {year, month, day, hour, minute, second}
   * @throws InputException naming the first field that is wrong
   */
  static double[] epoch(String source, int line, String l, int[] cols, boolean twoDigitYear) {
    final int y = twoDigitYear
        ? TextFields.integer(source, line, "year (2 digits, columns " + cols[0] + "-" + cols[1] + ")", of(l, cols[0], cols[1]), 0, 99)
        : TextFields.integer(source, line, "year (columns " + cols[0] + "-" + cols[1] + ")", of(l, cols[0], cols[1]), 1900, 2200);
    final int year = twoDigitYear ? (y < 80 ? 2000 + y : 1900 + y) : y;
    final String[] names = {"month", "day", "hour", "minute"};
    final int[] max = {12, 31, 23, 59};
    final int[] f = new int[4];
    for (int k = 0; k < 4; k++) {
      final int a = cols[2 + 2 * k];
      final int b = cols[3 + 2 * k];
      f[k] = TextFields.integer(source, line, names[k] + " (columns " + a + "-" + b + ")", of(l, a, b), k < 2 ? 1 : 0, max[k]);
    }
    final double second = TextFields.decimal(source, line, "second (columns " + cols[10] + "-" + cols[11] + ")",
        of(l, cols[10], cols[11]), 0, 60.999_999_999);
    TextFields.checkCalendar(source, line, year, f[0], f[1], f[2], f[3], second, true);
    return new double[] {year, f[0], f[1], f[2], f[3], second};
  }

  /**
   * Seconds since 2000-01-01T12:00 of calendar labels, with the fraction.
   *
   * @param e {year, month, day, hour, minute, second}
   * @return label seconds
   */
  static double labels(double[] e) {
    return GnssTimeSystem.labelsJ2000((int) e[0], (int) e[1], (int) e[2], (int) e[3], (int) e[4], 0) + e[5];
  }
}
