package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.onboard.time.SplitTime;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/**
 * CCSDS ASCII epochs (CCSDS 301.0-B-4 section 3.5, codes A and B): the conversion to TT against
 * SOFA (jsofa's {@code jauDtf2d}, {@code jauUtctai}, {@code jauTaitt}, an independent
 * implementation of the IAU's routines), and the refusal of every calendar field that does not
 * exist (the Gregorian calendar's rules, common practice) instead of rolling it over.
 */
class EpochsTest {
  private static String refusal(String iso, String ts) {
    return assertThrows(InputException.class, () -> Epochs.toTt("f.oem", 7, iso, ts)).getMessage();
  }

  /** TT seconds since J2000.0 of a UTC calendar epoch, by SOFA. */
  private static double sofaTtFromUtc(int y, int mo, int d, int h, int mi, double s) throws Exception {
    final JSOFA.JulianDate utc = JSOFA.jauDtf2d("UTC", y, mo, d, h, mi, s);
    final JSOFA.JulianDate tai = JSOFA.jauUtctai(utc.djm0, utc.djm1);
    final JSOFA.JulianDate tt = JSOFA.jauTaitt(tai.djm0, tai.djm1);
    return ((tt.djm0 - 2_451_545.0) + tt.djm1) * 86_400.0;
  }

  private static double seconds(SplitTime t) {
    return t.wholeSeconds() + t.fractionS();
  }

  @Test
  void utcEpochsAgreeWithSofaAcrossTheLeapSecondOf2016() throws Exception {
    // IERS Bulletin C 52: a positive leap second at the end of 2016-12-31 (common practice).
    final double[][] cases = {{2016, 12, 31, 23, 59, 59.5}, {2016, 12, 31, 23, 59, 60.5}, {2017, 1, 1, 0, 0, 0.5},
      {2026, 10, 1, 0, 0, 0}, {1972, 1, 1, 0, 0, 0}};
    final String[] texts = {"2016-12-31T23:59:59.5", "2016-12-31T23:59:60.5", "2017-001T00:00:00.5",
      "2026-10-01T00:00:00Z", "1972-01-01T00:00:00"};
    for (int k = 0; k < cases.length; k++) {
      final double[] c = cases[k];
      final double sofa = sofaTtFromUtc((int) c[0], (int) c[1], (int) c[2], (int) c[3], (int) c[4], c[5]);
      assertEquals(sofa, seconds(Epochs.toTt("f", 1, texts[k], "UTC")), 2e-6, texts[k]);
    }
    // The leap second itself lasts one second: 59.5 -> 60.5 -> 00.5 are one second apart each.
    final SplitTime a = Epochs.toTt("f", 1, "2016-12-31T23:59:59.5", "UTC");
    final SplitTime b = Epochs.toTt("f", 1, "2016-12-31T23:59:60.5", "UTC");
    final SplitTime c = Epochs.toTt("f", 1, "2017-01-01T00:00:00.5", "UTC");
    assertEquals(1.0, b.secondsSince(a), 1e-9);
    assertEquals(1.0, c.secondsSince(b), 1e-9);
  }

  @Test
  void scalesDifferByTheirDefinedOffsets() {
    // TT = TAI + 32.184 s; TAI = GPS + 19 s (IS-GPS-200; IERS Conventions 2010 ch. 10).
    final SplitTime tt = Epochs.toTt("f", 1, "2026-10-01T00:00:00", "TT");
    assertEquals(32.184, Epochs.toTt("f", 1, "2026-10-01T00:00:00", "TAI").secondsSince(tt), 1e-9);
    assertEquals(51.184, Epochs.toTt("f", 1, "2026-10-01T00:00:00", "gps").secondsSince(tt), 1e-9);
    // J2000.0 is 2000-01-01T12:00:00 TT (IAU 1991 definition): zero seconds.
    assertEquals(0.0, seconds(Epochs.toTt("f", 1, "2000-01-01T12:00:00", "TT")), 0.0);
    assertEquals(0.0, Epochs.toTt("f", 1, "2000-001T12:00:00.000000", "TT").secondsSince(
        Epochs.toTt("f", 1, "2000-01-01T12:00:00", "TT")), 0.0);
    // Day of year 366 exists in leap years only: 2016-366 = 2016-12-31.
    assertEquals(0.0, Epochs.toTt("f", 1, "2016-366T00:00:00", "TT").secondsSince(
        Epochs.toTt("f", 1, "2016-12-31T00:00:00", "TT")), 0.0);
    assertEquals(0.25, Epochs.toTt("f", 1, "2026-10-01T00:00:00.25", "TT").secondsSince(tt), 1e-12);
  }

  @Test
  void nonexistentCalendarFieldsAreRefusedNotRolledOver() {
    assertEquals("f.oem:7: month: out of range, found 13, allowed 1 to 12", refusal("2026-13-01T00:00:00", "TT"));
    assertEquals("f.oem:7: day of month 2026-1: out of range, found 45, allowed 1 to 31",
        refusal("2026-01-45T00:00:00", "TT"));
    assertTrue(refusal("2015-02-29T00:00:00", "TT").contains("day of month 2015-2: out of range, found 29"));
    assertTrue(refusal("2015-366T00:00:00", "TT").contains("day of year 2015: out of range, found 366, allowed 1 to 365"));
    assertTrue(refusal("2015-000T00:00:00", "TT").contains("day of year 2015: out of range, found 0"));
    assertEquals("f.oem:7: hour: out of range, found 25, allowed 0 to 23", refusal("2026-10-01T25:00:00", "TT"));
    assertTrue(refusal("2026-10-01T00:60:00", "TT").contains("minute: out of range, found 60"));
    assertTrue(refusal("2026-10-01T00:00:75", "TT").startsWith("f.oem:7: seconds: out of range, found 75"));
    assertTrue(refusal("2026-10-01T23:59:60", "TT").contains("seconds: out of range, found 60"));
    assertTrue(refusal("0999-10-01T00:00:00", "TT").contains("year: out of range, found 999"));
  }

  @Test
  void leapSecondsOnlyInUtcOnDaysThatHaveOne() {
    assertTrue(refusal("2015-12-31T23:59:60", "UTC").contains("does not end with a leap second"));
    assertTrue(refusal("2016-12-31T23:58:60", "UTC").contains("seconds: out of range"));
    assertTrue(refusal("2016-12-31T23:59:60", "GPS").contains("seconds: out of range"));
    Epochs.toTt("f", 1, "2016-12-31T23:59:60.999", "UTC");
  }

  @Test
  void malformedTextAndUnsupportedScalesAreRefused() {
    for (String bad : new String[] {"2026-10-01 00:00:00", "2026-10-1T00:00:00", "2026-10-01T00:00:00.", "NaN",
      "2026-10-01T00:00", "2026-10-01T00:00:00.5e3", "+2026-10-01T00:00:00", "2026-10-01T00:00:00ZZ",
      "2026-10-01T0x1:00:00", "", "2026-10-01T00:00:00 "}) {
      assertTrue(refusal(bad, "TT").startsWith("f.oem:7: unreadable epoch, found '" + bad + "'"), bad);
    }
    assertTrue(refusal("2026-10-01T00:00:00Z", "TT").contains("terminator Z (UTC) in time system TT"));
    assertEquals("f.oem:7: time system not supported, found 'TCB', allowed TT, TAI, GPS, UTC",
        refusal("2026-10-01T00:00:00", "TCB"));
    assertTrue(refusal("1960-01-01T00:00:00", "UTC").contains("before the leap-second table"));
    // The shipped table expires 2027-06-28 (its #@ line): TAI - UTC later is not known.
    assertTrue(refusal("2030-01-01T00:00:00", "UTC").contains("expiry of the leap-second table"));
    assertTrue(refusal("2030-01-01T00:00:00", "UTC").contains("2027-06-28"));
    Epochs.toTt("f", 1, "2030-01-01T00:00:00", "TT");
    assertEquals("--epoch: month: out of range, found 13, allowed 1 to 12",
        assertThrows(InputException.class, () -> Epochs.parse("--epoch", "2026-13-01T00:00:00", "TT")).getMessage());
  }

  @Test
  void calendarInverseMatchesSofa() throws Exception {
    // Fliegel and van Flandern's inverse against SOFA's jauCal2jd, over 300 years.
    for (int y = 1900; y <= 2200; y += 7) {
      for (int m = 1; m <= 12; m += 5) {
        final JSOFA.JulianDate jd = JSOFA.jauCal2jd(y, m, 28);
        final long jdn = (long) (jd.djm0 + jd.djm1 + 0.5);
        assertEquals(jdn, CalendarMath.julianDayNumber(y, m, 28));
        assertEquals(java.util.List.of(y, m, 28), java.util.Arrays.stream(CalendarMath.calendarOf(jdn)).boxed().toList());
      }
    }
  }
}
