package org.eigenzeit.ground.trajectory;

import org.eigenzeit.ground.instant.Instants;
import java.util.Locale;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.time.TimeScales;

/**
 * The time systems a GNSS product file may label its epochs in (SP3-c/d {@code %c} line, RINEX
 * clock {@code TIME SYSTEM ID}), and their conversion to TT and to GPS time.
 *
 * <ul>
 *   <li>GPS, QZS (QZSS time) and GAL (Galileo System Time): TAI - 19 s. QZSS time and GST are
 *       steered to GPS time; their residual offsets (a few tens of nanoseconds, broadcast as
 *       GGTO for Galileo) are below what a label conversion carries and are not applied.
 *       Sources: IS-GPS-200 section 3.3.4; Galileo OS SIS ICD section 5.1.2; IS-QZSS section 3.2.2
 *       (common practice).
 *   <li>BDT (BeiDou time): TAI - 33 s (BDT started at 2006-01-01 UTC, TAI - UTC = 33 s then; BDS
 *       SIS ICD, from memory).
 *   <li>TAI.
 *   <li>UTC: through the shipped leap-second table (IERS), refused outside it.
 *   <li>GLO (GLONASS time): UTC(SU) + 3 h (GLONASS ICD edition 5.1, section 3.3.3), then as UTC.
 * </ul>
 *
 * <p>Labels are seconds since 2000-01-01T12:00:00 counted in the system's own labels (so a UTC
 * label is the calendar reading, leap seconds not counted).
 */
public enum GnssTimeSystem {
  /** GPS time. */
  GPS,
  /** QZSS time (aligned with GPS time). */
  QZS,
  /** Galileo System Time (aligned with GPS time). */
  GAL,
  /** BeiDou time. */
  BDT,
  /** International Atomic Time. */
  TAI,
  /** Coordinated Universal Time. */
  UTC,
  /** GLONASS time, UTC(SU) + 3 h. */
  GLO;

  /** Seconds from the GPS epoch 1980-01-06T00:00:00 to 2000-01-01T12:00:00, in GPS labels. */
  public static final long GPS_EPOCH_TO_J2000_S = 630_763_200L;
  /** Seconds of a GPS week. */
  public static final long WEEK_S = 604_800L;

  /**
   * The system named by a file.
   *
   * @param code the code as written (GPS, QZS, GAL, BDT, TAI, UTC, GLO; case and surrounding blanks ignored)
   * @param source file name for messages
   * @param line line of the code (0 when none applies)
   * @return the system
   * @throws InputException when the code names no supported system
   */
  public static GnssTimeSystem of(String code, String source, int line) {
    final String c = code == null ? "" : code.strip().toUpperCase(Locale.ROOT);
    for (GnssTimeSystem s : values()) {
      if (s.name().equals(c)) {
        return s;
      }
    }
    throw new InputException(source, line, "time system: not supported, found '" + (code == null ? "" : code.strip())
        + "', allowed GPS, QZS, GAL, BDT, TAI, UTC, GLO");
  }

  /**
   * Converts labels of this system to TT.
   *
   * @param labelsJ2000S seconds since 2000-01-01T12:00 in this system's labels (whole part)
   * @param fractionS the fraction of a second, [0, 1)
   * @param source file name for messages
   * @param line line for messages
   * @return the instant, TT
   * @throws InputException when a UTC or GLONASS label lies outside the leap-second table
   */
  public SplitTime toTt(long labelsJ2000S, double fractionS, String source, int line) {
    final SplitTime labels = SplitTime.of(labelsJ2000S, fractionS);
    final SplitTime tai = new SplitTime();
    switch (this) {
      case GPS, QZS, GAL -> TimeScales.systemToTai(labels, TimeScales.TAI_MINUS_GPS_S, tai);
      case BDT -> TimeScales.systemToTai(labels, TimeScales.TAI_MINUS_GPS_S + 14, tai);
      case TAI -> tai.setTo(labels);
      case UTC, GLO -> {
        if (this == GLO) {
          labels.addWholeSeconds(-3 * 3600L);
        }
        final int st = Epochs.utcToTai(labels, tai);
        if (!Status.isUsable(st)) {
          throw new InputException(source, line, "epoch in " + name() + " outside the leap-second table ("
              + Status.name(st) + ")");
        }
      }
      default -> throw new IllegalStateException(name());
    }
    final SplitTime tt = new SplitTime();
    TimeScales.taiToTt(tai, tt);
    return tt;
  }

  /**
   * GPS time of an instant, as seconds since the GPS epoch 1980-01-06T00:00:00 GPS.
   *
   * @param tt the instant, TT
   * @return GPS seconds since the GPS epoch
   */
  public static double gpsSeconds(SplitTime tt) {
    final double gpsLabelsJ2000 = (tt.wholeSeconds() - TimeScales.TAI_MINUS_GPS_S) - TimeScales.TT_MINUS_TAI_S
        + tt.fractionS();
    return gpsLabelsJ2000 + GPS_EPOCH_TO_J2000_S;
  }

  /**
   * The instant of a GPS time.
   *
   * @param gpsSeconds GPS seconds since the GPS epoch
   * @return the instant, TT
   */
  public static SplitTime ttOfGps(double gpsSeconds) {
    final double whole = Math.floor(gpsSeconds);
    final SplitTime tt = SplitTime.of((long) whole - GPS_EPOCH_TO_J2000_S + TimeScales.TAI_MINUS_GPS_S,
        gpsSeconds - whole);
    Instants.shift(tt, TimeScales.TT_MINUS_TAI_S);
    return tt;
  }

  /**
   * GPS week (continuous count, not modulo 1024) of a GPS time.
   *
   * @param gpsSeconds GPS seconds since the GPS epoch
   * @return the week
   */
  public static int gpsWeek(double gpsSeconds) {
    return (int) Math.floor(gpsSeconds / WEEK_S);
  }

  /**
   * Seconds of the GPS week of a GPS time.
   *
   * @param gpsSeconds GPS seconds since the GPS epoch
   * @return seconds of week, [0, 604800)
   */
  public static double secondsOfWeek(double gpsSeconds) {
    return gpsSeconds - gpsWeek(gpsSeconds) * (double) WEEK_S;
  }

  /**
   * Seconds since 2000-01-01T12:00 of calendar labels (any system's labels).
   *
   * @param year year
   * @param month month
   * @param day day
   * @param hour hour
   * @param minute minute
   * @param wholeSecond whole seconds
   * @return label seconds since J2000 noon
   */
  public static long labelsJ2000(int year, int month, int day, int hour, int minute, int wholeSecond) {
    return (CalendarMath.julianDayNumber(year, month, day) - 2_451_545L) * 86_400L - 43_200L + hour * 3600L
        + minute * 60L + wholeSecond;
  }

  /**
   * TAI - UTC at an instant, from the shipped leap-second table.
   *
   * @param tt the instant, TT
   * @return TAI - UTC, s (whole)
   * @throws IllegalArgumentException outside the table
   */
  public static double taiMinusUtcS(SplitTime tt) {
    final SplitTime tai = new SplitTime();
    TimeScales.ttToTai(tt, tai);
    double offset = 37.0;
    for (int pass = 0; pass < 3; pass++) {
      final SplitTime utc = SplitTime.of(tai.wholeSeconds() - (long) offset, tai.fractionS());
      final SplitTime back = new SplitTime();
      final int st = Epochs.utcToTai(utc, back);
      if (!Status.isUsable(st)) {
        throw new IllegalArgumentException("instant outside the leap-second table: " + Status.name(st));
      }
      offset = back.secondsSince(utc);
    }
    return offset;
  }

  /**
   * The GPS calendar reading of a GPS time, ISO 8601 ("2010-07-01T00:15:00.000").
   *
   * @param gpsSeconds GPS seconds since the GPS epoch
   * @return the reading (GPS time, no leap seconds)
   */
  public static String gpsCalendar(double gpsSeconds) {
    final long whole = (long) Math.floor(gpsSeconds);
    final long millis = Math.round((gpsSeconds - whole) * 1000);
    return java.time.LocalDateTime.of(1980, 1, 6, 0, 0).plusSeconds(whole).plusNanos(millis * 1_000_000L)
        .format(java.time.format.DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSS", Locale.ROOT));
  }
}
