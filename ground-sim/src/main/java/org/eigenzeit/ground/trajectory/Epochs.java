package org.eigenzeit.ground.trajectory;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.uplink.LeapSecondsList;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.LeapSecondTable;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.time.TimeScales;

/**
 * Calendar epochs in CCSDS ASCII form (CCSDS 301.0-B-4, "Time Code Formats", 2010, section 3.5:
 * code A {@code YYYY-MM-DDThh:mm:ss[.d...][Z]} and code B {@code YYYY-DDDThh:mm:ss[.d...][Z]}) in
 * TT, TAI, GPS or UTC, converted to TT.
 *
 * <p>Strict: every field must have its fixed number of digits and exist in the calendar (month
 * 1-12, day of month or day of year of that year, hour 0-23, minute 0-59, seconds below 60);
 * nothing is rolled over. Seconds 60.x are accepted only in UTC, at 23:59 of a day that the
 * leap-second table ends with a leap second. The terminator {@code Z} (Zulu, i.e. UTC) is accepted
 * only for UTC epochs. UTC goes through the shipped leap-second list, decoded and checked by {@link LeapSecondsList}
 * (hash, structure, content) into the onboard core's table; a UTC epoch before 1972 or at or after the table's expiry is
 * refused, since TAI - UTC is then not known.
 *
 * <p>Stateless apart from the immutable shipped table; thread-safe.
 */
public final class Epochs {
  private static final Pattern CALENDAR =
      Pattern.compile("(\\d{4})-(\\d{2})-(\\d{2})T(\\d{2}):(\\d{2}):(\\d{2})(?:\\.(\\d{1,15}))?(Z?)");
  private static final Pattern DAY_OF_YEAR =
      Pattern.compile("(\\d{4})-(\\d{3})T(\\d{2}):(\\d{2}):(\\d{2})(?:\\.(\\d{1,15}))?(Z?)");
  /** The allowed time systems, as named in messages. */
  public static final String TIME_SYSTEMS = "TT, TAI, GPS, UTC";
  private static final LeapSecondTable LEAPS = leapTable();

  private Epochs() {}

  private static LeapSecondTable leapTable() {
    try (InputStream in = Epochs.class.getResourceAsStream("leap-seconds.list")) {
      return LeapSecondsList.read("leap-seconds.list (shipped)", in.readAllBytes()).activeTable();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** Calendar fields of an epoch as written (labels of its time system). */
  private record Fields(int year, int month, int day, int hour, int minute, int second, double fraction,
      boolean zulu) {}

  /**
   * Converts an epoch to TT.
   *
   * @param name source name for messages
   * @param lineNo line number for messages (0 when none applies)
   * @param iso the epoch text
   * @param timeSystem TT, TAI, GPS or UTC
   * @return the instant in TT
   * @throws TrajectoryFormatException naming the source, the line and the field when the epoch is
   *     malformed, does not exist in the calendar, or cannot be converted
   */
  public static SplitTime toTt(String name, int lineNo, String iso, String timeSystem) {
    final String ts = checkTimeSystem(name, lineNo, timeSystem);
    final Fields f = fields(name, lineNo, iso, ts.equals("UTC"));
    if (f.zulu() && !ts.equals("UTC")) {
      throw new TrajectoryFormatException(name, lineNo, "epoch '" + iso + "': terminator Z (UTC) in time system "
          + ts + ", allowed only for UTC");
    }
    final long whole = (CalendarMath.julianDayNumber(f.year(), f.month(), f.day()) - 2_451_545L) * 86_400L
        - 43_200L + f.hour() * 3600L + f.minute() * 60L + f.second();
    final SplitTime tt = new SplitTime();
    switch (ts) {
      case "TT" -> tt.setTo(SplitTime.of(whole, f.fraction()));
      case "TAI" -> TimeScales.taiToTt(SplitTime.of(whole, f.fraction()), tt);
      case "GPS" -> {
        TimeScales.systemToTai(SplitTime.of(whole, f.fraction()), TimeScales.TAI_MINUS_GPS_S, tt);
        TimeScales.taiToTt(tt, tt);
      }
      default -> {
        utcToTai(name, lineNo, iso, f, whole, tt);
        TimeScales.taiToTt(tt, tt);
      }
    }
    return tt;
  }

  /**
   * Checks a time-system name.
   *
   * @param name source name for messages
   * @param lineNo line number (0 when none applies)
   * @param timeSystem the name as written (case is ignored)
   * @return the upper-case name
   * @throws TrajectoryFormatException when not one of {@link #TIME_SYSTEMS}
   */
  public static String checkTimeSystem(String name, int lineNo, String timeSystem) {
    final String ts = timeSystem == null ? "" : timeSystem.strip().toUpperCase(Locale.ROOT);
    return switch (ts) {
      case "TT", "TAI", "GPS", "UTC" -> ts;
      default -> throw new TrajectoryFormatException(name, lineNo, "time system not supported, found '"
          + timeSystem + "', allowed " + TIME_SYSTEMS);
    };
  }

  private static Fields fields(String name, int lineNo, String iso, boolean utc) {
    final String text = iso == null ? "" : iso;
    final Matcher a = CALENDAR.matcher(text);
    final Matcher b = DAY_OF_YEAR.matcher(text);
    final int year;
    final int month;
    final int day;
    final int g;
    if (a.matches()) {
      year = Integer.parseInt(a.group(1));
      month = Integer.parseInt(a.group(2));
      day = Integer.parseInt(a.group(3));
      g = 4;
    } else if (b.matches()) {
      year = Integer.parseInt(b.group(1));
      TextFields.checkRange(name, lineNo, "year", year, b.group(1), 1900, 2200);
      final int doy = Integer.parseInt(b.group(2));
      final int daysInYear = TextFields.daysInMonth(year, 2) == 29 ? 366 : 365;
      TextFields.checkRange(name, lineNo, "day of year " + year, doy, b.group(2), 1, daysInYear);
      int m = 1;
      int d = doy;
      while (d > TextFields.daysInMonth(year, m)) {
        d -= TextFields.daysInMonth(year, m);
        m++;
      }
      month = m;
      day = d;
      g = 3;
    } else {
      throw new TrajectoryFormatException(name, lineNo, "unreadable epoch, found '" + text
          + "', allowed YYYY-MM-DDThh:mm:ss[.s] or YYYY-DDDThh:mm:ss[.s]");
    }
    final Matcher m = a.matches() ? a : b;
    final int hour = Integer.parseInt(m.group(g));
    final int minute = Integer.parseInt(m.group(g + 1));
    final int second = Integer.parseInt(m.group(g + 2));
    final double fraction = m.group(g + 3) == null ? 0.0 : Double.parseDouble("0." + m.group(g + 3));
    TextFields.checkCalendar(name, lineNo, year, month, day, hour, minute, second + fraction, utc);
    return new Fields(year, month, day, hour, minute, second, fraction, !m.group(g + 4).isEmpty());
  }

  private static void utcToTai(String name, int lineNo, String iso, Fields f, long whole, SplitTime taiOut) {
    final boolean leapSecond = f.second() == 60;
    // 23:59:60.x is one second after 23:59:59.x with the offset still in force before the leap.
    final long label = leapSecond ? whole - 1 : whole;
    final int st = LEAPS.utcToTai(SplitTime.of(label, f.fraction()), taiOut);
    if (st == Status.OUT_OF_RANGE) {
      throw new TrajectoryFormatException(name, lineNo, "UTC epoch '" + iso
          + "' before the leap-second table (1972-01-01), allowed from 1972-01-01 on");
    }
    if (st != Status.OK) {
      throw new TrajectoryFormatException(name, lineNo, "UTC epoch '" + iso + "' at or after the expiry of the "
          + "leap-second table (" + Status.name(st) + "): TAI - UTC is not known, allowed UTC epochs before "
          + expiryText() + "; give the epoch in TT, TAI or GPS instead");
    }
    if (leapSecond) {
      final SplitTime next = new SplitTime();
      final int stNext = LEAPS.utcToTai(SplitTime.of(whole, 0.0), next);
      final SplitTime before = new SplitTime();
      final int stBefore = LEAPS.utcToTai(SplitTime.of(label, 0.0), before);
      if (stNext != Status.OK || stBefore != Status.OK || next.secondsSince(before) < 1.5) {
        throw new TrajectoryFormatException(name, lineNo, "seconds: 60 on " + f.year() + "-" + f.month() + "-"
            + f.day() + ", a day that does not end with a leap second in the leap-second table, allowed 0 to below 60");
      }
      taiOut.addWholeSeconds(1);
    }
  }

  private static String expiryText() {
    final int[] ymd = CalendarMath.calendarOf(Math.floorDiv(LEAPS.expiryUtcS() + 43_200L, 86_400L) + 2_451_545L);
    return String.format(Locale.ROOT, "%04d-%02d-%02d", ymd[0], ymd[1], ymd[2]);
  }

  /**
   * Converts an epoch given on a command line or in a scenario.
   *
   * @param source what the epoch is (e.g. {@code --epoch} or a scenario key), for messages
   * @param iso the epoch text
   * @param timeSystem TT, TAI, GPS or UTC
   * @return the instant in TT
   * @throws InputException naming the source when unreadable, non-existent or not convertible
   */
  public static SplitTime parse(String source, String iso, String timeSystem) {
    return toTt(source, 0, iso, timeSystem);
  }

  /**
   * Converts an epoch given in code (demo missions, benchmarks).
   *
   * @param iso the epoch text
   * @param timeSystem TT, TAI, GPS or UTC
   * @return the instant in TT
   * @throws InputException when unreadable
   */
  public static SplitTime parse(String iso, String timeSystem) {
    return parse("epoch", iso, timeSystem);
  }

  /**
   * UTC to TAI through the shipped leap-second table.
   *
   * @param utc UTC labels, seconds since 2000-01-01T12:00 (calendar reading)
   * @param taiOut receives TAI
   * @return the table's status ({@link Status#isUsable} tells whether the result holds)
   */
  public static int utcToTai(SplitTime utc, SplitTime taiOut) {
    return LEAPS.utcToTai(utc, taiOut);
  }
}
