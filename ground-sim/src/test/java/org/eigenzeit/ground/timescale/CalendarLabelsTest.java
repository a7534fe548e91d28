package org.eigenzeit.ground.timescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** Epoch labels: the CCSDS ASCII forms and Julian dates, against java.time's calendar. */
class CalendarLabelsTest {
  @Test
  void calendarArithmeticAgreesWithJavaTime() {
    // Independent reference: java.time.LocalDate (proleptic ISO calendar); JDN 2440588 = 1970-01-01.
    for (long jdn = 2_415_021; jdn < 2_488_070; jdn += 13) {
      final int[] ymd = CalendarLabels.civil(jdn);
      final LocalDate d = LocalDate.ofEpochDay(jdn - 2_440_588L);
      assertEquals(d.getYear(), ymd[0]);
      assertEquals(d.getMonthValue(), ymd[1]);
      assertEquals(d.getDayOfMonth(), ymd[2]);
    }
  }

  @Test
  void theThreeFormsNameTheSameInstant() {
    final CalendarLabels.Parsed iso = CalendarLabels.parse("--epoch", "2026-10-01T06:30:15.25", false);
    final CalendarLabels.Parsed doy = CalendarLabels.parse("--epoch", "2026-274T06:30:15.25Z", false);
    assertEquals(iso.labels(), doy.labels());
    // 2026-10-01 is JDN 2461315 (java.time above); 06:30:15.25 is 0.271009837963 of a day after midnight.
    final SplitTime expected = SplitTime.of((2_461_315L - 2_451_545L) * 86_400L - 43_200L + 6 * 3600 + 30 * 60 + 15, 0.25);
    assertEquals(expected, iso.labels());
    assertEquals(SplitTime.of(0, 0.0), CalendarLabels.parse("--epoch", "JD2451545.0", false).labels());
    assertEquals(SplitTime.of(-43_200, 0.0), CalendarLabels.parse("--epoch", "JD 2451544.5", false).labels());
    assertEquals("2026-10-01T06:30:15.250000000000", CalendarLabels.format(iso.labels(), 12, false));
    assertEquals("2026-10-01T06:30:15", CalendarLabels.format(iso.labels(), 0, false));
    assertEquals("2026-10-01T06:30:15.3", CalendarLabels.format(iso.labels(), 1, false));
    assertEquals("JD2461314.771009837963", CalendarLabels.julianDate(iso.labels()));
    assertFalse(iso.leapSecond());
  }

  @Test
  void roundingCarriesIntoTheNextSecond() {
    final SplitTime t = SplitTime.of(0, 0.9999999999996);
    assertEquals("2000-01-01T12:00:01.000000000000", CalendarLabels.format(t, 12, false));
  }

  @Test
  void aLeapSecondIsReadAndWrittenAsSecond60() {
    final CalendarLabels.Parsed p = CalendarLabels.parse("--epoch", "2016-12-31T23:59:60.5", true);
    assertTrue(p.leapSecond());
    assertEquals("2016-12-31T23:59:59.500", CalendarLabels.format(p.labels(), 3, false));
    assertEquals("2016-12-31T23:59:60.500", CalendarLabels.format(p.labels(), 3, true));
  }

  @Test
  void badEpochsAreRefusedWithTheOptionAndTheRange() {
    assertTrue(refusal("2026-02-29T00:00:00").contains("day of month"));
    assertTrue(refusal("2026-13-01T00:00:00").contains("month"));
    assertTrue(refusal("2026-10-01T24:00:00").contains("hour"));
    assertTrue(refusal("2026-10-01T23:59:60").contains("60.x only at 23:59"));
    assertTrue(refusal("2026-366T00:00:00").contains("day of year"));
    assertTrue(refusal("JD1000000.5").contains("Julian date"));
    assertTrue(refusal("yesterday").contains("allowed YYYY-MM-DDThh:mm:ss"));
    assertTrue(refusal("2026-10-01T00:00:00.1234567890123456").contains("not an epoch"));
    assertTrue(refusal("2026-10-01").startsWith("--epoch: "));
  }

  private static String refusal(String text) {
    return assertThrows(InputException.class, () -> CalendarLabels.parse("--epoch", text, false)).getMessage();
  }
}
