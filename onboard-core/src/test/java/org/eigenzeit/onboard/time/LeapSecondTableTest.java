package org.eigenzeit.onboard.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.UplinkTable;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/**
 * The leap-second table, uplinked as the image of the real IERS/NIST file (tzdata 2026f), against
 * the SOFA worked examples and jsofa's own table; each content rule refuses its own fault.
 */
class LeapSecondTableTest {
  private LeapSecondTable table;
  private UplinkTable uplink;

  @BeforeEach
  void load() {
    table = new LeapSecondTable();
    uplink = new UplinkTable(table);
    final byte[] image = LeapImages.real();
    assertEquals(Status.OK, uplink.load(image, 0, image.length));
    assertEquals(Status.OK, uplink.activate());
  }

  private static SplitTime utcOf(int year, int month, int day) {
    final JSOFA.JulianDate jd;
    try {
      jd = JSOFA.jauCal2jd(year, month, day);
    } catch (Exception e) {
      throw new IllegalStateException(e);
    }
    final SplitTime t = new SplitTime();
    assertEquals(Status.OK, t.setJulianDate(jd.djm0, jd.djm1));
    return t;
  }

  @Test
  void realFileHas28Rows() {
    assertTrue(table.isActive());
    assertEquals(28, table.size());
    // #@ 4023129600 NTP = 2027-06-28T00:00 UTC
    final SplitTime expiry = utcOf(2027, 6, 28);
    assertEquals(expiry.wholeSeconds(), table.expiryUtcS());
  }

  @Test
  void sofaExamplesOfTaiMinusUtc() {
    // REFERENCE-VALUES (SOFA t_dat): 2003-06-01 -> 32 s, 2008-01-17 -> 33 s, 2017-09-01 -> 37 s.
    final SplitTime tai = new SplitTime();
    for (int[] c : new int[][] {{2003, 6, 1, 32}, {2008, 1, 17, 33}, {2017, 9, 1, 37}}) {
      final SplitTime utc = utcOf(c[0], c[1], c[2]);
      assertEquals(Status.OK, table.utcToTai(utc, tai));
      assertEquals(c[3], tai.secondsSince(utc), 0.0);
    }
  }

  @Test
  void sofaExampleTaiToUtc() {
    // IAU SOFA test suite (t_taiutc): 2453750.5 + 0.892482639 -> 0.8921006945555555556
    final SplitTime tai = new SplitTime();
    assertEquals(Status.OK, tai.setJulianDate(2453750.5, 0.892482639));
    final SplitTime utc = new SplitTime();
    assertEquals(Status.OK, table.taiToUtc(tai, utc));
    final SplitTime expected = new SplitTime();
    assertEquals(Status.OK, expected.setJulianDate(2453750.5, 0.8921006945555555556));
    assertEquals(0.0, utc.secondsSince(expected), 1e-9);
  }

  @Test
  void agreesWithJsofaEveryTenDaysFrom1972To2026() throws Exception {
    final SplitTime utc = utcOf(1972, 1, 1);
    final SplitTime tai = new SplitTime();
    double worst = 0;
    for (int i = 0; i < 2000; i++) {
      final double[] jd = new double[2];
      utc.toJulianDate(jd);
      final JSOFA.JulianDate ref = JSOFA.jauUtctai(jd[0], jd[1]);
      final SplitTime refTai = new SplitTime();
      assertEquals(Status.OK, refTai.setJulianDate(ref.djm0, ref.djm1));
      assertEquals(Status.OK, table.utcToTai(utc, tai));
      worst = Math.max(worst, Math.abs(tai.secondsSince(refTai)));
      assertEquals(0.0, tai.secondsSince(refTai), 1e-6, "at " + i);
      utc.addWholeSeconds(10 * 86_400L);
    }
    System.out.printf("UTC->TAI vs jsofa utctai, 2000 dates 1972-2026: worst %.2e s%n", worst);
    System.out.printf("evidence: time.utc_tai_vs_jsofa_s = %.3e%n", worst);
  }

  /** TAI seconds since J2000.0 of a jsofa JulianDate (two parts), rounded to the microsecond. */
  private static double taiSeconds(JSOFA.JulianDate jd) {
    return Math.rint(((jd.djm0 - 2451545.0) + jd.djm1) * 86_400.0 * 1e6) / 1e6;
  }

  @Test
  void everyLeapSecondSecondBySecondAgainstJsofa() throws Exception {
    // Outside reference: IAU SOFA's utctai, taiutc and d2dtf (jsofa 20210512, with its own leap
    // table), which spell the inserted second as 23:59:60. Around every 1 January and 1 July from
    // 1972 to 2017, six TAI seconds (fraction 0.5) and six UTC labels each way; the leap seconds
    // found must be the 27 of IERS Bulletin C (1972-06-30 to 2016-12-31; common practice).
    int leaps = 0;
    int checked = 0;
    final SplitTime utc = new SplitTime();
    final SplitTime tai = new SplitTime();
    for (int year = 1972; year <= 2017; year++) {
      for (int month : new int[] {1, 7}) {
        if (year == 1972 && month == 1) {
          continue; // the table starts here: checked below
        }
        final SplitTime midnight = utcOf(year, month, 1);
        final JSOFA.JulianDate cal = JSOFA.jauCal2jd(year, month, 1);
        final long taiMidnight = Math.round(taiSeconds(JSOFA.jauUtctai(cal.djm0, cal.djm1)));
        for (long d = -3; d <= 2; d++) {
          final long w = taiMidnight + d;
          final JSOFA.JulianDate u = JSOFA.jauTaiutc(2451545.0, (w + 0.5) / 86_400.0);
          final JSOFA.CalendarHMS f = JSOFA.jauD2dtf("UTC", 3, u.djm0, u.djm1);
          final boolean leap = f.ihmsf[2] == 60;
          final long label = utcOf(f.iy, f.im, f.id).wholeSeconds() + f.ihmsf[0] * 3600L + f.ihmsf[1] * 60L
              + Math.min(f.ihmsf[2], 59);
          final int st = table.taiToUtc(SplitTime.of(w, 0.5), utc);
          assertEquals(leap ? Status.LEAP_SECOND_IN_PROGRESS : Status.OK, st, year + "-" + month + " TAI " + d);
          assertEquals(label, utc.wholeSeconds(), year + "-" + month + " TAI " + d);
          assertEquals(f.ihmsf[3] / 1000.0, utc.fractionS(), 0.0);
          leaps += leap ? 1 : 0;
          // UTC labels to TAI (the inserted second has no label of its own: it is held at :59)
          final long lab = midnight.wholeSeconds() + d;
          final JSOFA.Calendar c = JSOFA.jauJd2cal(2451545.0, (lab + 0.25) / 86_400.0);
          final long secOfDay = Math.floorMod(lab + 43_200L, 86_400L);
          final JSOFA.JulianDate dtf = JSOFA.jauDtf2d("UTC", c.iy, c.im, c.id, (int) (secOfDay / 3600),
              (int) (secOfDay / 60 % 60), secOfDay % 60 + 0.25);
          assertEquals(Status.OK, table.utcToTai(SplitTime.of(lab, 0.25), tai));
          assertEquals(taiSeconds(JSOFA.jauUtctai(dtf.djm0, dtf.djm1)), tai.wholeSeconds() + tai.fractionS(), 1e-6,
              year + "-" + month + " UTC " + d);
          checked++;
        }
      }
    }
    assertEquals(27, leaps, "leap seconds 1972-2016");
    assertEquals(91 * 6, checked);
    // The first entry: 1972-01-01T00:00:00 UTC = 00:00:10 TAI; a second earlier is before the table.
    final long first = utcOf(1972, 1, 1).wholeSeconds();
    assertEquals(Status.OK, table.taiToUtc(SplitTime.of(first + 10, 0.0), utc));
    assertEquals(first, utc.wholeSeconds());
    assertEquals(Status.OUT_OF_RANGE, table.taiToUtc(SplitTime.of(first + 9, 0.999), utc));
    assertEquals(Status.OK, table.utcToTai(SplitTime.of(first, 0.0), tai));
    assertEquals(Status.OUT_OF_RANGE, table.utcToTai(SplitTime.of(first - 1, 0.999), tai));
    // The expiry (2027-06-28T00:00 UTC in this file): the last second before it is valid, it is not.
    final long expiry = table.expiryUtcS();
    assertEquals(Status.OK, table.utcToTai(SplitTime.of(expiry - 1, 0.999), tai));
    assertEquals(Status.LEAP_TABLE_EXPIRED, table.utcToTai(SplitTime.of(expiry, 0.0), tai));
    assertEquals(Status.OK, table.taiToUtc(SplitTime.of(expiry - 1 + 37, 0.999), utc));
    assertEquals(Status.LEAP_TABLE_EXPIRED, table.taiToUtc(SplitTime.of(expiry + 37, 0.0), utc));
  }

  @Test
  void leapSecondIsReportedAndLabelHeld() {
    // 2017-01-01: 36 -> 37 s. TAI at 2016-12-31T23:59:60.5 UTC is (2017-01-01 UTC) + 36 s + 0.5 - 1 + 1.
    final SplitTime newYear = utcOf(2017, 1, 1);
    final SplitTime tai = SplitTime.of(newYear.wholeSeconds() + 36, 0.5);
    final SplitTime utc = new SplitTime();
    assertEquals(Status.LEAP_SECOND_IN_PROGRESS, table.taiToUtc(tai, utc));
    assertEquals(newYear.wholeSeconds() - 1, utc.wholeSeconds());
    tai.addWholeSeconds(1);
    assertEquals(Status.OK, table.taiToUtc(tai, utc));
    assertEquals(newYear.wholeSeconds(), utc.wholeSeconds());
  }

  @Test
  void expiredTableIsReportedNotSilentlyUsed() {
    final SplitTime late = utcOf(2028, 1, 1);
    final SplitTime tai = new SplitTime();
    assertEquals(Status.LEAP_TABLE_EXPIRED, table.utcToTai(late, tai));
    assertEquals(37.0, tai.secondsSince(late), 0.0);
    final SplitTime utc = new SplitTime();
    assertEquals(Status.LEAP_TABLE_EXPIRED, table.taiToUtc(tai, utc));
  }

  @Test
  void beforeFirstEntryIsOutOfRange() {
    final SplitTime early = utcOf(1970, 1, 1);
    final SplitTime out = new SplitTime();
    assertEquals(Status.OUT_OF_RANGE, table.utcToTai(early, out));
    assertEquals(Status.OUT_OF_RANGE, table.taiToUtc(early, out));
  }

  /** Loads a variant of the real table; returns the status, and checks the active table stayed. */
  private int variant(long update, long expiry, long[] starts, int[] offsets) {
    final byte[] image = LeapImages.image(update, expiry, starts, offsets);
    final int st = uplink.load(image, 0, image.length);
    assertEquals(28, table.size(), "the active table is untouched");
    return st;
  }

  private static SplitTime noon(int year, int month, int day) {
    return SplitTime.of(utcOf(year, month, day).wholeSeconds() + 43_200L, 0.0);
  }

  @Test
  void everyContentRuleRefusesItsFault() {
    final long[] s = LeapImages.STARTS.clone();
    final int[] o = LeapImages.OFFSETS.clone();
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.EXPIRY, LeapImages.UPDATE, s, o), "expiry before update");
    assertEquals(LeapSecondTable.RULE_EXPIRY, table.failedRule());
    final int[] fifteen = o.clone();
    for (int i = 0; i < fifteen.length; i++) {
      fifteen[i] += 5;
    }
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.UPDATE, LeapImages.EXPIRY, s, fifteen), "15 s in 1972");
    assertEquals(LeapSecondTable.RULE_FIRST_ENTRY, table.failedRule());
    assertEquals(0, table.failedItem());
    final long[] atNoon = s.clone();
    atNoon[5] = noon(1976, 1, 1).wholeSeconds();
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.UPDATE, LeapImages.EXPIRY, atNoon, o), "12:00 UTC");
    assertEquals(LeapSecondTable.RULE_MIDNIGHT_FIRST, table.failedRule());
    assertEquals(5, table.failedItem());
    final long[] secondDay = s.clone();
    secondDay[5] += 86_400L;
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.UPDATE, LeapImages.EXPIRY, secondDay, o), "2nd of a month");
    assertEquals(LeapSecondTable.RULE_MIDNIGHT_FIRST, table.failedRule());
    final long[] sameMonth = s.clone();
    sameMonth[6] = sameMonth[5] + 1;
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.UPDATE, LeapImages.EXPIRY, sameMonth, o), "1 s apart");
    assertEquals(LeapSecondTable.RULE_MIDNIGHT_FIRST, table.failedRule(), "1 s after midnight is not midnight");
    final long[] backwards = s.clone();
    backwards[6] = s[4];
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.UPDATE, LeapImages.EXPIRY, backwards, o), "not later");
    assertEquals(LeapSecondTable.RULE_MONTH_ORDER, table.failedRule());
    assertEquals(6, table.failedItem());
    final int[] two = o.clone();
    for (int i = 10; i < two.length; i++) {
      two[i] += 1;
    }
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.UPDATE, LeapImages.EXPIRY, s, two), "a 2 s step");
    assertEquals(LeapSecondTable.RULE_STEP, table.failedRule());
    assertEquals(10, table.failedItem());
    assertEquals(Status.OUT_OF_RANGE, variant(s[26], s[27], s, o), "an entry at the expiry");
    assertEquals(LeapSecondTable.RULE_BEFORE_EXPIRY, table.failedRule());
  }

  @Test
  void frameAndReservedWordAreChecked() {
    final byte[] good = LeapImages.real();
    final byte[] reserved = good.clone();
    reserved[8 + 16 + 16 * 3 + 12] = 1; // entry 3, reserved word
    final java.util.zip.CRC32C crc = new java.util.zip.CRC32C();
    crc.update(reserved, 0, reserved.length - 4);
    final int v = (int) crc.getValue();
    for (int i = 0; i < 4; i++) {
      reserved[reserved.length - 4 + i] = (byte) (v >>> (24 - 8 * i));
    }
    assertEquals(Status.OUT_OF_RANGE, uplink.load(reserved, 0, reserved.length));
    assertEquals(LeapSecondTable.RULE_RESERVED, table.failedRule());
    final byte[] flipped = good.clone();
    flipped[40] ^= 0x04;
    assertEquals(Status.CHECKSUM_MISMATCH, uplink.load(flipped, 0, flipped.length));
    final byte[] none = LeapImages.image(LeapImages.UPDATE, LeapImages.EXPIRY, new long[0], new int[0]);
    assertEquals(Status.MALFORMED, uplink.load(none, 0, none.length), "no entries");
    final long[] many = new long[LeapSecondTable.CAPACITY + 1];
    final byte[] tooMany = LeapImages.image(LeapImages.UPDATE, LeapImages.EXPIRY, many, new int[many.length]);
    assertEquals(Status.CAPACITY_EXCEEDED, uplink.load(tooMany, 0, tooMany.length));
    assertEquals(Status.NOT_READY, uplink.activate(), "nothing validated is staged");
    assertEquals(28, table.size());
  }

  @Test
  void aNegativeLeapSecondIsAcceptedAndItsSecondSkipped() {
    final long[] s = java.util.Arrays.copyOf(LeapImages.STARTS, 29);
    final int[] o = java.util.Arrays.copyOf(LeapImages.OFFSETS, 29);
    s[28] = utcOf(2027, 1, 1).wholeSeconds();
    o[28] = 36;
    assertEquals(Status.OK, variant(LeapImages.UPDATE, LeapImages.EXPIRY, s, o));
    assertEquals(Status.OK, uplink.activate());
    final SplitTime tai = new SplitTime();
    assertEquals(Status.OK, table.utcToTai(utcOf(2027, 2, 1), tai));
    assertEquals(36.0, tai.secondsSince(utcOf(2027, 2, 1)), 0.0);
    // ITU-R TF.460-6 (section 2.2): at a negative leap second 23:59:58 UTC is followed by
    // 00:00:00 of the next day, so 23:59:59 never occurs and no TAI second maps into it.
    final long newYear = utcOf(2027, 1, 1).wholeSeconds();
    final SplitTime utc = new SplitTime();
    assertEquals(Status.OK, table.taiToUtc(SplitTime.of(newYear + 36, 0.5), utc), "the first second of 2027");
    assertEquals(newYear, utc.wholeSeconds());
    assertEquals(0.5, utc.fractionS(), 0.0);
    assertEquals(Status.OK, table.taiToUtc(SplitTime.of(newYear + 35, 0.5), utc), "the TAI second before it");
    assertEquals(newYear - 2, utc.wholeSeconds(), "labelled 23:59:58: 23:59:59 is skipped");
  }

  @Test
  void theFirstEntryMustBe1972WithTenSeconds() {
    // IERS Bulletin C / the leap-seconds.list header: TAI - UTC = 10 s from 1972-01-01 00:00 UTC.
    final long[] s = LeapImages.STARTS.clone();
    s[0] = utcOf(1972, 7, 1).wholeSeconds(); // a valid midnight of a first of a month, but not 1972-01-01
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.UPDATE, LeapImages.EXPIRY, s, LeapImages.OFFSETS.clone()));
    assertEquals(LeapSecondTable.RULE_FIRST_ENTRY, table.failedRule());
    assertEquals(0, table.failedItem());
  }

  @Test
  void encoderAndQueriesAtTheirEdges() {
    assertEquals(Status.OUT_OF_RANGE, LeapSecondTable.encode(0, 1, new long[1], new int[1], 2, new byte[100], 0));
    assertEquals(Status.OUT_OF_RANGE, LeapSecondTable.encode(0, 1, new long[1], new int[1], -1, new byte[100], 0));
    final byte[] untouched = new byte[100];
    assertEquals(Status.OUT_OF_RANGE, LeapSecondTable.encode(0, 1, new long[2], new int[1], 2, untouched, 0),
        "more entries than offsets");
    assertEquals(0, java.util.stream.IntStream.range(0, untouched.length).map(i -> untouched[i]).filter(b -> b != 0)
        .count(), "nothing written on a refusal");
    assertEquals(Status.BUFFER_TOO_SMALL, LeapSecondTable.encode(0, 1, new long[1], new int[1], 1, new byte[10], 0));
    final long[] far = java.util.Arrays.copyOf(LeapImages.STARTS, 29);
    final int[] o = java.util.Arrays.copyOf(LeapImages.OFFSETS, 29);
    far[28] = 86_400L * 200_000_000L - 43_200L; // midnight, but 550 000 years on
    o[28] = 38;
    assertEquals(Status.OUT_OF_RANGE, variant(LeapImages.UPDATE, Long.MAX_VALUE, far, o));
    assertEquals(LeapSecondTable.RULE_MIDNIGHT_FIRST, table.failedRule(), "outside any calendar the table knows");
    final LeapSecondTable empty = new LeapSecondTable();
    assertFalse(empty.isActive());
    final SplitTime t = new SplitTime();
    assertEquals(Status.NOT_READY, empty.utcToTai(t, t));
    assertEquals(Status.NOT_READY, empty.taiToUtc(t, t));
    assertEquals(LeapImages.EXPIRY, table.expiryUtcS());
    final SplitTime utc = new SplitTime();
    final SplitTime tai = SplitTime.of(utcOf(1972, 1, 1).wholeSeconds() + 10, 0.25);
    assertEquals(Status.OK, table.taiToUtc(tai, utc), "the first second of 1972");
    assertEquals(0.25, utc.fractionS(), 0.0);
  }
}
