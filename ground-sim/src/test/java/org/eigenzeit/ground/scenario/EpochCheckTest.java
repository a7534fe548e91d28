package org.eigenzeit.ground.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.LocalDateTime;
import org.junit.jupiter.api.Test;

/**
 * Scenario epochs to labels (seconds from 2000-01-01T12:00:00 in the epoch's own scale) against
 * java.time's calendar arithmetic, the calendar limits, and TAI - UTC against IERS Bulletin C.
 */
class EpochCheckTest {
  private static final LocalDateTime J2000 = LocalDateTime.of(2000, 1, 1, 12, 0, 0);

  private static long javaTime(String iso) {
    return Duration.between(J2000, LocalDateTime.parse(iso)).getSeconds();
  }

  private static String refused(String epoch, String scale, double spanS) {
    final EpochCheck.Refusal r = assertThrows(EpochCheck.Refusal.class, () -> EpochCheck.check(epoch, scale, spanS));
    return r.what + " | " + r.found + " | " + r.allowed;
  }

  @Test
  void labelsAgreeWithJavaTime() {
    for (String iso : new String[] {"2000-01-01T12:00:00", "1972-01-01T00:00:00", "2016-12-31T23:59:59",
        "2024-02-29T06:07:08", "2026-10-01T00:00:00", "2099-12-31T23:59:59"}) {
      assertEquals(javaTime(iso), EpochCheck.check(iso, "TT", 3600), iso);
      assertEquals(iso, EpochCheck.iso(javaTime(iso)), iso);
    }
    // day of year: 2024-060 is 29 February of the leap year 2024, 2023-365 the last day of 2023
    assertEquals(javaTime("2024-02-29T01:02:03"), EpochCheck.check("2024-060T01:02:03", "GPS", 60));
    assertEquals(javaTime("2023-12-31T00:00:00"), EpochCheck.check("2023-365T00:00:00", "TAI", 60));
    assertEquals(javaTime("2024-12-31T00:00:00"), EpochCheck.check("2024-366T00:00:00", "TAI", 60));
  }

  @Test
  void calendarLimitsAreTheCalendarsOwn() {
    assertTrue(refused("2023-366T00:00:00", "TT", 60).startsWith("no such day of the year | day 366"));
    assertTrue(refused("2024-000T00:00:00", "TT", 60).startsWith("no such day of the year | day 0"));
    assertTrue(refused("2024-367T00:00:00", "TT", 60).startsWith("no such day of the year"));
    for (String bad : new String[] {"2024-13-01T00:00:00", "2024-00-01T00:00:00", "2023-02-29T00:00:00",
        "2024-04-31T00:00:00", "2024-01-00T00:00:00"}) {
      assertThrows(EpochCheck.Refusal.class, () -> EpochCheck.check(bad, "TT", 60), bad);
    }
    assertEquals(javaTime("2024-12-01T00:00:00"), EpochCheck.check("2024-12-01T00:00:00", "TT", 60));
    assertEquals(javaTime("2024-01-31T00:00:00"), EpochCheck.check("2024-01-31T00:00:00", "TT", 60));
    for (String bad : new String[] {"2024-01-01T24:00:00", "2024-01-01T00:60:00", "2024-01-01T00:00:60"}) {
      assertTrue(refused(bad, "TT", 60).startsWith("no such time of day"), bad);
    }
    assertEquals(javaTime("2024-01-01T23:59:59"), EpochCheck.check("2024-01-01T23:59:59", "TT", 60));
    assertTrue(refused("1971-12-31T00:00:00", "TT", 60).startsWith("year outside the supported span | year 1971"));
    assertTrue(refused("2101-01-01T00:00:00", "TT", 60).startsWith("year outside the supported span | year 2101"));
    assertEquals(javaTime("2100-01-01T00:00:00"), EpochCheck.check("2100-01-01T00:00:00", "TT", 60));
    assertTrue(refused("2024-1-01T00:00:00", "TT", 60).startsWith("not an epoch"));
  }

  @Test
  void utcRunsMustEndBeforeTheLeapTableExpires() {
    final long expiry = EpochCheck.leapTableExpiryUtcS();
    final String last = EpochCheck.iso(expiry - 3600);
    assertEquals(expiry - 3600, EpochCheck.check(last, "UTC", 3599));
    assertTrue(refused(last, "UTC", 3600).startsWith("the run ends after the leap-second table expires"));
    assertEquals(expiry - 3600, EpochCheck.check(last, "TT", 1e6), "TT runs do not need TAI - UTC");
  }

  @Test
  void taiMinusUtcIsBulletinCs() {
    // IERS Bulletin C: 10 s from 1972-01-01, 32 s from 1999-01-01, 36 s from 2015-07-01, 37 s from 2017-01-01
    assertEquals(10, EpochCheck.taiMinusUtcS(javaTime("1972-01-01T00:00:00")));
    assertEquals(32, EpochCheck.taiMinusUtcS(javaTime("1999-01-01T00:00:00")));
    assertEquals(31, EpochCheck.taiMinusUtcS(javaTime("1998-12-31T23:59:59")));
    assertEquals(36, EpochCheck.taiMinusUtcS(javaTime("2016-12-31T23:59:59")));
    assertEquals(37, EpochCheck.taiMinusUtcS(javaTime("2017-01-01T00:00:00")));
  }
}
