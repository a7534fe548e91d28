package org.eigenzeit.ground.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.time.LocalDate;
import java.time.Year;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.ground.uplink.LeapSecondsList;
import org.eigenzeit.onboard.time.LeapSecondTable;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Checks a scenario epoch before it is used: the CCSDS ASCII calendar or day-of-year form (CCSDS
 * 301.0-B-4 section 3.5), calendar-valid fields (no month 13, day 45, hour 25 or second 75), years
 * 1972 to 2100, and for UTC a whole run before the expiry of the shipped leap-second table (after
 * it, TAI - UTC is unknown: a leap second may have been announced).
 */
final class EpochCheck {
  private static final Pattern CALENDAR =
      Pattern.compile("(\\d{4})-(\\d{2})-(\\d{2})T(\\d{2}):(\\d{2}):(\\d{2})(\\.\\d{1,9})?");
  private static final Pattern DAY_OF_YEAR = Pattern.compile("(\\d{4})-(\\d{3})T(\\d{2}):(\\d{2}):(\\d{2})(\\.\\d{1,9})?");
  private static final String FORMS = "YYYY-MM-DDThh:mm:ss[.s] or YYYY-DDDThh:mm:ss[.s], years 1972 .. 2100";
  private static final LeapSecondTable LEAPS = load();

  private EpochCheck() {}

  /** A refused epoch: what, found, allowed. */
  static final class Refusal extends RuntimeException {
    private static final long serialVersionUID = 1L;
    final String what;
    final String found;
    final String allowed;

    Refusal(String what, String found, String allowed) {
      super(what, null, false, false);
      this.what = what;
      this.found = found;
      this.allowed = allowed;
    }
  }

  private static LeapSecondTable load() {
    try (InputStream in = EpochCheck.class.getResourceAsStream("/org/eigenzeit/ground/trajectory/leap-seconds.list")) {
      if (in == null) {
        throw new IllegalStateException("the shipped leap-second table is missing");
      }
      return LeapSecondsList.read("leap-seconds.list (shipped)", in.readAllBytes()).activeTable();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * Checks an epoch.
   *
   * @param epoch the text
   * @param scale TT, TAI, GPS or UTC
   * @param spanS the run's span, s
   * @return the epoch's labels as whole seconds since J2000.0 (2000-01-01T12:00:00) in its scale
   * @throws Refusal when refused
   */
  static long check(String epoch, String scale, double spanS) {
    final Matcher c = CALENDAR.matcher(epoch);
    final Matcher d = DAY_OF_YEAR.matcher(epoch);
    final LocalDate date;
    final int h;
    final int mi;
    final int s;
    if (c.matches()) {
      final int y = year(c.group(1), epoch);
      final int mo = Integer.parseInt(c.group(2));
      final int day = Integer.parseInt(c.group(3));
      if (mo < 1 || mo > 12) {
        throw new Refusal("no such month", "month " + mo + " in '" + epoch + "'", "01 .. 12");
      }
      final int len = java.time.YearMonth.of(y, mo).lengthOfMonth();
      if (day < 1 || day > len) {
        throw new Refusal("no such day", "day " + day + " of month " + mo + " in '" + epoch + "'", "01 .. " + len);
      }
      date = LocalDate.of(y, mo, day);
      h = Integer.parseInt(c.group(4));
      mi = Integer.parseInt(c.group(5));
      s = Integer.parseInt(c.group(6));
    } else if (d.matches()) {
      final int y = year(d.group(1), epoch);
      final int doy = Integer.parseInt(d.group(2));
      final int len = Year.of(y).length();
      if (doy < 1 || doy > len) {
        throw new Refusal("no such day of the year", "day " + doy + " in '" + epoch + "'", "001 .. " + len);
      }
      date = LocalDate.ofYearDay(y, doy);
      h = Integer.parseInt(d.group(3));
      mi = Integer.parseInt(d.group(4));
      s = Integer.parseInt(d.group(5));
    } else {
      throw new Refusal("not an epoch", "'" + YamlTree.clip(epoch) + "'", FORMS);
    }
    if (h > 23 || mi > 59 || s > 59) {
      throw new Refusal("no such time of day", String.format(Locale.ROOT, "%02d:%02d:%02d in '%s'", h, mi, s, epoch),
          "00:00:00 .. 23:59:59");
    }
    final long jdn = date.toEpochDay() + 2_440_588L;
    final long label = (jdn - 2_451_545L) * 86_400L - 43_200L + h * 3600L + mi * 60L + s;
    if ("UTC".equals(scale)) {
      final long end = label + (long) Math.ceil(spanS);
      if (end >= LEAPS.expiryUtcS()) {
        throw new Refusal("the run ends after the leap-second table expires (TAI - UTC unknown then)",
            "a UTC run from " + epoch + " to " + iso(end), "UTC runs ending before " + iso(LEAPS.expiryUtcS())
                + ", or the epoch in TT, TAI or GPS");
      }
      final SplitTime tai = new SplitTime();
      if (LEAPS.utcToTai(SplitTime.of(label, 0), tai) != Status.OK) {
        throw new Refusal("before the leap-second table's first entry", "'" + epoch + "' UTC", "UTC from 1972-01-01");
      }
    }
    return label;
  }

  private static int year(String text, String epoch) {
    final int y = Integer.parseInt(text);
    if (y < 1972 || y > 2100) {
      throw new Refusal("year outside the supported span", "year " + y + " in '" + epoch + "'", "1972 .. 2100");
    }
    return y;
  }

  /**
   * TAI - UTC at an instant given in the labels of a scale close to UTC (within about a minute).
   *
   * @param labelS whole seconds since J2000.0
   * @return TAI - UTC, s (the last entry's value after the table's expiry)
   */
  static int taiMinusUtcS(long labelS) {
    final SplitTime tai = new SplitTime();
    if (!Status.isUsable(LEAPS.utcToTai(SplitTime.of(labelS, 0), tai))) {
      return 10;
    }
    return (int) (tai.wholeSeconds() - labelS);
  }

  static String iso(long labelS) {
    final long days = Math.floorDiv(labelS + 43_200L, 86_400L);
    final long rem = labelS + 43_200L - days * 86_400L;
    final LocalDate date = LocalDate.ofEpochDay(days + 2_451_545L - 2_440_588L);
    return String.format(Locale.ROOT, "%sT%02d:%02d:%02d", date, rem / 3600, rem / 60 % 60, rem % 60);
  }

  /** @return the expiry of the shipped leap-second table, whole UTC seconds since J2000.0 */
  static long leapTableExpiryUtcS() {
    return LEAPS.expiryUtcS();
  }
}
