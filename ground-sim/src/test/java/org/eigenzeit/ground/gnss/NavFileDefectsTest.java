package org.eigenzeit.ground.gnss;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.input.InputException;
import org.junit.jupiter.api.Test;

/**
 * Every field of a RINEX 2 navigation record, broken one at a time in a real IGS file, must be
 * refused at its own line with its own name and columns. The layout is the RINEX 2.11 one (common
 * practice): the first line holds the satellite, the epoch and three D19.12 fields from column 23
 * (column 24 for QZSS in RINEX 2.12, one column more for the 'J'); each further line holds four
 * D19.12 fields from column 4 (5 for QZSS). Field order and names follow the format's table for
 * GPS (29 values) and GLONASS (3 + 12 values). Values the reader returns are compared with the
 * digits in the file.
 */
class NavFileDefectsTest {
  private static final String[] GPS_FIELDS = {"SV clock bias", "SV clock drift", "SV clock drift rate", "IODE", "Crs",
    "Delta n", "M0", "Cuc", "e", "Cus", "sqrt(A)", "toe", "Cic", "OMEGA0", "Cis", "i0", "Crc", "omega", "OMEGA DOT",
    "IDOT", "codes on L2", "GPS week", "L2 P flag", "SV accuracy", "SV health", "TGD", "IODC", "transmission time",
    "fit interval"};
  private static final String[] GLONASS_FIELDS = {"SV clock bias -TauN", "relative frequency bias GammaN",
    "message frame time", "satellite position X, km", "velocity X, km/s", "acceleration X, km/s^2", "health",
    "satellite position Y, km", "velocity Y, km/s", "acceleration Y, km/s^2", "frequency number",
    "satellite position Z, km", "velocity Z, km/s", "acceleration Z, km/s^2", "age of operational information"};

  private static String refused(String name, List<String> lines) {
    return assertThrows(InputException.class, () -> NavFile.parse(name, lines)).getMessage();
  }

  private static List<String> withField(List<String> ok, int index, int start, String text) {
    final List<String> copy = new ArrayList<>(ok);
    final String l = String.format("%-80s", copy.get(index));
    copy.set(index, l.substring(0, start - 1) + text + l.substring(start + 18));
    return copy;
  }

  /** Line index and first column of field k of a record whose first line is at index first. */
  private static int[] where(int first, int k, int firstLineStart, int indent) {
    return k < 3 ? new int[] {first, firstLineStart + 19 * k}
        : new int[] {first + 1 + (k - 3) / 4, indent + 19 * ((k - 3) % 4)};
  }

  /** Breaks each field of the record at index first in turn; each must be refused at its line and columns. */
  private static void everyFieldIsRefused(String name, List<String> ok, int first, String[] fields, int firstLineStart,
      int indent) {
    for (int k = 0; k < fields.length; k++) {
      final int[] at = where(first, k, firstLineStart, indent);
      final String m = refused(name, withField(ok, at[0], at[1], "    0.1234567890Q+00"));
      final String expected = name + ":" + (at[0] + 1) + ": " + fields[k] + " (columns " + at[1] + "-" + (at[1] + 18)
          + "): not a decimal number";
      assertTrue(m.startsWith(expected), k + ": " + m + " / expected " + expected);
    }
  }

  @Test
  void everyGpsFieldIsRefusedAtItsLineAndColumns() {
    final List<String> ok = GnssFixtures.lines("2010-07-01", "brdc1820.10n.gz");
    final int first = 8; // line 9, after END OF HEADER on line 8
    everyFieldIsRefused("n.10n", ok, first, GPS_FIELDS, 23, 4);
  }

  @Test
  void everyQzssFieldIsRefusedAtItsLineAndColumns() {
    final List<String> ok = GnssFixtures.lines("2012-10-31", "brdc3050.12q.gz");
    int first = 0;
    while (!ok.get(first).contains("END OF HEADER")) {
      first++;
    }
    first++;
    everyFieldIsRefused("q.12q", ok, first, GPS_FIELDS, 24, 5);
    final List<String> prn = new ArrayList<>(ok);
    prn.set(first, "J0x" + ok.get(first).substring(3));
    assertTrue(refused("q.12q", prn).startsWith("q.12q:" + (first + 1) + ": QZSS PRN (columns 2-3)"));
  }

  @Test
  void everyGlonassFieldIsRefusedAtItsLineAndColumns() {
    final List<String> ok = GnssFixtures.lines("2012-10-31", "brdc3050.12g.gz");
    final int first = 5; // line 6, after END OF HEADER on line 5
    everyFieldIsRefused("g.12g", ok, first, GLONASS_FIELDS, 23, 4);
    for (int c = 0; c < 3; c++) {
      final List<String> shifted = new ArrayList<>(ok);
      shifted.set(first + 1 + c, "x" + ok.get(first + 1 + c).substring(1));
      assertTrue(refused("g.12g", shifted).startsWith("g.12g:" + (first + 2 + c) + ": broadcast orbit line " + (c + 1)
          + ": columns 1-3 must be blank"));
    }
    final List<String> slot = new ArrayList<>(ok);
    slot.set(first, " x" + ok.get(first).substring(2));
    assertTrue(refused("g.12g", slot).startsWith("g.12g:6: slot number (columns 1-2)"));
    final List<String> leap = new ArrayList<>(ok);
    leap.set(2, "    xx" + ok.get(2).substring(6));
    assertTrue(refused("g.12g", leap).startsWith("g.12g:3: leap seconds (columns 1-6)"));
  }

  @Test
  void glonassValuesAreTheFilesInSiUnits() {
    // record R03, 2012-10-31 00:15: lines 7-9 hold X, Y, Z (km, km/s, km/s^2) and health, frequency, age
    final GlonassRecord r = NavFile.parse("g.12g", GnssFixtures.lines("2012-10-31", "brdc3050.12g.gz")).glonassRecords().get(0);
    assertEquals(3, r.slot());
    assertEquals(6, r.line());
    assertEquals(-1.236097887158e-4, r.minusTauN());
    assertEquals(0.0, r.gammaN());
    assertEquals(1.077e4, r.frameTimeS());
    assertEquals(0.2289457321167e3, r.velocityMPerS()[0], 1e-9);
    assertEquals(-3.725290298462e-9 * 1e3, r.accelerationMPerS2()[0], 1e-18);
    assertEquals(9.313225746155e-10 * 1e3, r.accelerationMPerS2()[1], 1e-18);
    assertEquals(-1.862645149231e-9 * 1e3, r.accelerationMPerS2()[2], 1e-18);
    assertEquals(3.556049346924e3, r.velocityMPerS()[2], 1e-9);
    assertEquals(2.209434082031e6, r.positionM()[2], 1e-6);
    assertEquals(0.0, r.health());
    assertEquals(5.0, r.frequencyNumber());
    assertEquals(0.0, r.ageDays());
  }

  @Test
  void blankFieldsAreZeroOnlyWhereTheFormatAllowsIt() {
    final List<String> ok = GnssFixtures.lines("2010-07-01", "brdc1820.10n.gz");
    final int first = 8;
    for (int k = 0; k < GPS_FIELDS.length; k++) {
      final int[] at = where(first, k, 23, 4);
      final List<String> blank = withField(ok, at[0], at[1], " ".repeat(19));
      final boolean optional = k == KeplerRecord.L2_CODES || k == KeplerRecord.L2P || k == KeplerRecord.FIT;
      if (optional) {
        assertEquals(0.0, NavFile.parse("b.10n", blank).keplerRecords().get(0).get(k), GPS_FIELDS[k]);
      } else {
        final String m = refused("b.10n", blank);
        assertTrue(m.startsWith("b.10n:" + (at[0] + 1) + ": " + GPS_FIELDS[k] + " (columns " + at[1] + "-"
            + (at[1] + 18) + "): blank, allowed a number"), k + ": " + m);
      }
    }
    // the GLONASS age of operational information (the last field) may be blank, the others not
    final List<String> glo = GnssFixtures.lines("2012-10-31", "brdc3050.12g.gz");
    assertEquals(0.0, NavFile.parse("g.12g", withField(glo, 8, 61, " ".repeat(19))).glonassRecords().get(0).ageDays());
    assertTrue(refused("g.12g", withField(glo, 7, 61, " ".repeat(19)))
        .startsWith("g.12g:8: frequency number (columns 61-79): blank, allowed a number"));
  }

  @Test
  void aCutRecordIsRefusedAtItsFirstLine() {
    final List<String> ok = GnssFixtures.lines("2010-07-01", "brdc1820.10n.gz");
    int end = ok.size();
    while (ok.get(end - 1).isBlank()) {
      end--;
    }
    final List<String> cut = new ArrayList<>(ok.subList(0, end - 3));
    // the last record's first line is line end - 7; five of its eight lines are left
    assertTrue(refused("c.10n", cut).startsWith("c.10n:" + (end - 7) + ": incomplete navigation record: 8 lines"
        + " expected, found 5"), refused("c.10n", cut));
  }
}
