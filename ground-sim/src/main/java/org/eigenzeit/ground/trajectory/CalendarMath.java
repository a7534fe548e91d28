package org.eigenzeit.ground.trajectory;

/**
 * Gregorian calendar arithmetic (Fliegel and van Flandern 1968, Comm. ACM 11:657, the integer
 * Julian Day Number algorithm). Stateless.
 */
public final class CalendarMath {
  private CalendarMath() {}

  /**
   * Julian Day Number of a Gregorian date (the JD at noon of that date).
   *
   * @param y year
   * @param m month 1..12
   * @param d day 1..31
   * @return the day number
   */
  public static long julianDayNumber(int y, int m, int d) {
    final long a = (14 - m) / 12;
    final long yy = y + 4800 - a;
    final long mm = m + 12 * a - 3;
    return d + (153 * mm + 2) / 5 + 365 * yy + yy / 4 - yy / 100 + yy / 400 - 32045;
  }

  /**
   * Days from 2000-01-01T00:00 to the given date's midnight (so J2000.0 noon is +0.5).
   *
   * @param y year
   * @param m month
   * @param d day
   * @return days
   */
  public static double daysSinceJ2000Midnight(int y, int m, int d) {
    return (double) (julianDayNumber(y, m, d) - 2_451_545L);
  }

  /**
   * Gregorian date of a Julian Day Number (the inverse algorithm of the same paper).
   *
   * @param jdn the day number
   * @return {year, month, day}
   */
  public static int[] calendarOf(long jdn) {
    final long a = jdn + 32_044;
    final long b = (4 * a + 3) / 146_097;
    final long c = a - 146_097 * b / 4;
    final long d = (4 * c + 3) / 1461;
    final long e = c - 1461 * d / 4;
    final long m = (5 * e + 2) / 153;
    return new int[] {(int) (100 * b + d - 4800 + m / 10), (int) (m + 3 - 12 * (m / 10)),
      (int) (e - (153 * m + 2) / 5 + 1)};
  }
}
