package org.eigenzeit.onboard.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.eigenzeit.onboard.status.Status;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/**
 * The leap-second table, loaded from the real IERS/NIST file (tzdata 2026f), against the SOFA
 * worked examples and jsofa's own table.
 */
class LeapSecondTableTest {
  private byte[] file;
  private LeapSecondTable table;

  static byte[] realFile() throws IOException {
    try (InputStream in = LeapSecondTableTest.class.getResourceAsStream("leap-seconds.list")) {
      return in.readAllBytes();
    }
  }

  @BeforeEach
  void load() throws IOException {
    file = realFile();
    table = new LeapSecondTable();
    assertEquals(Status.OK, table.load(file, file.length));
    assertEquals(Status.OK, table.activate());
  }

  private static SplitTime utcOf(int year, int month, int day) {
    final JSOFA.JulianDate jd;
    try {
      jd = JSOFA.jauCal2jd(year, month, day);
    } catch (Exception e) {
      throw new IllegalStateException(e);
    }
    final SplitTime t = new SplitTime();
    t.setJulianDate(jd.djm0, jd.djm1);
    return t;
  }

  @Test
  void realFileHas28RowsAndVerifiedHash() {
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
    tai.setJulianDate(2453750.5, 0.892482639);
    final SplitTime utc = new SplitTime();
    assertEquals(Status.OK, table.taiToUtc(tai, utc));
    final SplitTime expected = new SplitTime();
    expected.setJulianDate(2453750.5, 0.8921006945555555556);
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
      refTai.setJulianDate(ref.djm0, ref.djm1);
      assertEquals(Status.OK, table.utcToTai(utc, tai));
      worst = Math.max(worst, Math.abs(tai.secondsSince(refTai)));
      assertEquals(0.0, tai.secondsSince(refTai), 1e-6, "at " + i);
      utc.addWholeSeconds(10 * 86_400L);
    }
    System.out.printf("UTC->TAI vs jsofa utctai, 2000 dates 1972-2026: worst %.2e s%n", worst);
    System.out.printf("evidence: time.utc_tai_vs_jsofa_s = %.3e%n", worst);
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

  @Test
  void corruptedRowFailsHashAndKeepsActiveTable() {
    final String text = new String(file, StandardCharsets.US_ASCII).replaceFirst("3692217600", "3692217601");
    final byte[] bad = text.getBytes(StandardCharsets.US_ASCII);
    assertEquals(Status.CHECKSUM_MISMATCH, table.load(bad, bad.length));
    assertEquals(Status.NOT_READY, table.activate());
    assertEquals(28, table.size());
  }

  @Test
  void malformedAndMissingLinesAreRejected() {
    final LeapSecondTable fresh = new LeapSecondTable();
    final byte[] garbage = "2272060800 x10\n".getBytes(StandardCharsets.US_ASCII);
    assertEquals(Status.MALFORMED, fresh.load(garbage, garbage.length));
    final byte[] noHash = "#$ 1\n#@ 2\n2272060800 10\n".getBytes(StandardCharsets.US_ASCII);
    assertEquals(Status.MALFORMED, fresh.load(noHash, noHash.length));
    assertEquals(Status.BUFFER_TOO_SMALL, fresh.load(noHash, noHash.length + 1));
    assertFalse(fresh.isActive());
    final SplitTime t = new SplitTime();
    assertEquals(Status.NOT_READY, fresh.utcToTai(t, t));
    assertEquals(Status.NOT_READY, fresh.taiToUtc(t, t));
  }

  @Test
  void offsetsMustStepByOneSecond() {
    final String text = new String(file, StandardCharsets.US_ASCII).replaceFirst("2287785600(\\s+)11", "2287785600$112");
    final byte[] bad = text.getBytes(StandardCharsets.US_ASCII);
    assertEquals(Status.OUT_OF_RANGE, new LeapSecondTable().load(bad, bad.length));
  }

  @Test
  void everyMissingHeaderAndBadFieldIsRefused() {
    final LeapSecondTable fresh = new LeapSecondTable();
    final String real = new String(file, StandardCharsets.US_ASCII);
    for (String header : new String[] {"#$", "#@", "#h"}) {
      // the file without that header line: refused as MALFORMED (IERS/NIST file layout, the three
      // lines are always present)
      final byte[] without = real.replaceAll("(?m)^" + java.util.regex.Pattern.quote(header) + ".*\n", "")
          .getBytes(StandardCharsets.US_ASCII);
      assertEquals(Status.MALFORMED, fresh.load(without, without.length), header);
    }
    final byte[] noRows = real.replaceAll("(?m)^[0-9].*\n", "").getBytes(StandardCharsets.US_ASCII);
    assertEquals(Status.MALFORMED, fresh.load(noRows, noRows.length));
    final byte[] hugeOffset = "2272060800 999999\n".getBytes(StandardCharsets.US_ASCII);
    assertEquals(Status.OUT_OF_RANGE, fresh.load(hugeOffset, hugeOffset.length));
    final byte[] noDigits = "2272060800 \n".getBytes(StandardCharsets.US_ASCII);
    assertEquals(Status.MALFORMED, fresh.load(noDigits, noDigits.length));
    final byte[] shortHash = real.replaceFirst("(?m)^#h\\s+\\S+", "#h zz").getBytes(StandardCharsets.US_ASCII);
    assertEquals(Status.MALFORMED, fresh.load(shortHash, shortHash.length));
    assertEquals(Status.BUFFER_TOO_SMALL, fresh.load(file, -1));
    assertFalse(fresh.isActive());
  }
}
