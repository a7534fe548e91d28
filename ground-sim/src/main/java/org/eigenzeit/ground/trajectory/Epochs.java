package org.eigenzeit.ground.trajectory;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Locale;
import org.eigenzeit.ground.uplink.LeapSecondsList;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.LeapSecondTable;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.time.TimeScales;

/**
 * Calendar epochs in CCSDS ASCII form (YYYY-MM-DDThh:mm:ss[.s] or YYYY-DDDThh:mm:ss[.s], CCSDS
 * 301.0-B-4 section 3.5) in TT, TAI, GPS or UTC, converted to TT. UTC goes through the shipped
 * leap-second list, decoded and checked by {@link LeapSecondsList} (hash, structure, content) into
 * the onboard core's table. A UTC epoch at or after the table's expiry is refused: the offset
 * there is not known (a leap second may have been announced since).
 */
public final class Epochs {
  private Epochs() {}

  private static LeapSecondTable leapTable() {
    try (InputStream in = Epochs.class.getResourceAsStream("leap-seconds.list")) {
      return LeapSecondsList.read("leap-seconds.list (shipped)", in.readAllBytes()).activeTable();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * Converts an epoch to TT.
   *
   * @param name source name for messages
   * @param lineNo line number for messages
   * @param iso the epoch text
   * @param timeSystem TT, TAI, GPS or UTC
   * @return the instant in TT
   * @throws TrajectoryFormatException when unreadable or unsupported
   */
  public static SplitTime toTt(String name, int lineNo, String iso, String timeSystem) {
    final SplitTime labels;
    try {
      final String[] dt = iso.split("T");
      final String[] d = dt[0].split("-");
      final String[] hms = dt[1].split(":");
      final int year = Integer.parseInt(d[0]);
      final long jdn = d.length == 3
          ? CalendarMath.julianDayNumber(year, Integer.parseInt(d[1]), Integer.parseInt(d[2]))
          : CalendarMath.julianDayNumber(year, 1, 1) + Integer.parseInt(d[1]) - 1;
      final double sec = Double.parseDouble(hms[2]);
      final long whole = (jdn - 2_451_545L) * 86_400L - 43_200L + Integer.parseInt(hms[0]) * 3600L
          + Integer.parseInt(hms[1]) * 60L + (long) Math.floor(sec);
      labels = SplitTime.of(whole, sec - Math.floor(sec));
    } catch (RuntimeException e) {
      throw new TrajectoryFormatException(name, lineNo, "unreadable epoch '" + iso + "'");
    }
    final SplitTime tt = new SplitTime();
    switch (timeSystem.toUpperCase(Locale.ROOT)) {
      case "TT" -> tt.setTo(labels);
      case "TAI" -> TimeScales.taiToTt(labels, tt);
      case "GPS" -> {
        TimeScales.systemToTai(labels, TimeScales.TAI_MINUS_GPS_S, tt);
        TimeScales.taiToTt(tt, tt);
      }
      case "UTC" -> {
        final int st = LEAPS.utcToTai(labels, tt);
        if (st == Status.LEAP_TABLE_EXPIRED) {
          throw new TrajectoryFormatException(name, lineNo, "UTC epoch '" + iso + "' at or after the leap-second "
              + "table's expiry (" + expiryText() + "), allowed earlier UTC epochs: use a current leap-seconds.list, "
              + "or give the epoch in TT, TAI or GPS time");
        }
        if (!Status.isUsable(st)) {
          throw new TrajectoryFormatException(name, lineNo, "UTC epoch '" + iso + "' outside the leap-second table ("
              + Status.name(st) + "), allowed 1972-01-01 to " + expiryText());
        }
        TimeScales.taiToTt(tt, tt);
      }
      default -> throw new TrajectoryFormatException(name, lineNo, "TIME_SYSTEM " + timeSystem + " not supported (TT, TAI, GPS, UTC)");
    }
    return tt;
  }

  private static final LeapSecondTable LEAPS = leapTable();

  /** The table's expiry as an ISO date (UTC). */
  private static String expiryText() {
    return java.time.LocalDate.of(2000, 1, 1).plusDays(Math.floorDiv(LEAPS.expiryUtcS() + 43_200L, 86_400L)).toString();
  }


  /**
   * Converts an epoch given on a command line or in a scenario.
   *
   * @param iso the epoch text
   * @param timeSystem TT, TAI, GPS or UTC
   * @return the instant in TT
   * @throws IllegalArgumentException when unreadable
   */
  public static SplitTime parse(String iso, String timeSystem) {
    try {
      return toTt("epoch", 1, iso, timeSystem);
    } catch (TrajectoryFormatException e) {
      throw new IllegalArgumentException("epoch '" + iso + "' (" + timeSystem + "): " + e.getMessage(), e);
    }
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
