package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.input.InputException;
import org.junit.jupiter.api.Test;

/**
 * RINEX 2 GPS navigation reading against the format (Gurtner and Estey 2007, Tables A3/A4: field
 * columns) and the IS-GPS-200 field ranges (Table 20-III, from memory), on the real broadcast file
 * of 2010-07-01. Its first record (PRN 1, lines 9-16) has IODE 63 on line 10, e on line 11, toe on
 * line 12, the GPS week on line 14, health 63 and IODC 63 on line 15, the fit interval on line 16.
 */
class RinexNavFileTest {
  private static List<String> real() {
    return new ArrayList<>(Fixtures.rinexLines());
  }

  /** Overwrites one 19-column field k (0-3) of a broadcast orbit line (1-based line number). */
  private static List<String> field(List<String> lines, int lineNo, int k, String text) {
    final String l = lines.get(lineNo - 1);
    final int from = 3 + 19 * k;
    final String padded = String.format("%19s", text);
    lines.set(lineNo - 1, l.substring(0, from) + padded + (l.length() > from + 19 ? l.substring(from + 19) : ""));
    return lines;
  }

  private static String refusal(List<String> lines) {
    return assertThrows(InputException.class, () -> RinexNavFile.parse("t.n", lines)).getMessage();
  }

  private static void starts(String prefix, List<String> lines) {
    final String m = refusal(lines);
    assertTrue(m.startsWith(prefix), m);
  }

  @Test
  void theRealFileIsReadCompletely() {
    final RinexNavFile f = RinexNavFile.parse("brdc1820.10n", real());
    assertEquals(421, f.records().size());
    assertEquals(0, f.duplicates().size());
    final RinexNavFile.Entry e = f.entries().get(0);
    assertEquals(9, e.line());
    assertEquals(63, e.iode());
    assertEquals(63, e.iodc());
    assertEquals(63, e.ephemeris().health());
    assertEquals(-0.136290676892e-3, e.af0S(), 1e-18);
    assertEquals(-0.190921127796e-7, e.tgdS(), 1e-22);
    assertEquals(1590, e.ephemeris().week());
    assertEquals(0.515480139732e4, e.ephemeris().sqrtA(), 1e-9);
    assertEquals(345_600.0, e.ephemeris().tocSecondsOfWeek(), 0.0); // 2010-07-01 00:00 = day 4 of week 1590
    assertEquals(2.0, e.accuracyM(), 0.0);
  }

  @Test
  void healthAndCountersMustBeWholeNumbersInRange() {
    starts("t.n:15: SV health (columns 23-41): not a decimal number, found 'NaN'", field(real(), 15, 1, "NaN"));
    starts("t.n:15: SV health: not a whole number, found 0.5", field(real(), 15, 1, "0.500000000000D+00"));
    starts("t.n:15: SV health: out of range, found 64, allowed 0 to 63", field(real(), 15, 1, "0.640000000000D+02"));
    starts("t.n:15: SV health: out of range, found -1", field(real(), 15, 1, "-.100000000000D+01"));
    starts("t.n:10: IODE: not a whole number, found 63.5", field(real(), 10, 0, "0.635000000000D+02"));
    starts("t.n:15: IODC 62 disagrees with IODE 63", field(real(), 15, 3, "0.620000000000D+02"));
    starts("t.n:15: IODC: out of range, found 1024", field(real(), 15, 3, "0.102400000000D+04"));
    starts("t.n:14: codes on L2: out of range, found 4", field(real(), 14, 1, "0.400000000000D+01"));
    starts("t.n:14: L2 P data flag: out of range, found 2", field(real(), 14, 3, "0.200000000000D+01"));
    starts("t.n:15: SV accuracy (m): out of range, found -2.0", field(real(), 15, 0, "-.200000000000D+01"));
    starts("t.n:16: fit interval (h): found 5.0, allowed 0 (not known) or [4.0, 6.0",
        field(real(), 16, 1, "0.500000000000D+01"));
    RinexNavFile.parse("t.n", field(real(), 16, 1, "0.400000000000D+01"));
  }

  @Test
  void orbitParametersMustBeFiniteAndPhysical() {
    starts("t.n:11: e: out of range, found 0.6", field(real(), 11, 1, "0.600000000000D+00"));
    starts("t.n:11: e: out of range, found -0.001", field(real(), 11, 1, "-.100000000000D-02"));
    starts("t.n:11: sqrt(A) (sqrt(m)): out of range, found 1000.0", field(real(), 11, 3, "0.100000000000D+04"));
    starts("t.n:10: M0 (rad) (columns 61-79): out of range, found 0.400000000000D+01",
        field(real(), 10, 3, "0.400000000000D+01"));
    starts("t.n:13: OMEGA DOT (rad/s) (columns 61-79): out of range", field(real(), 13, 3, "-.100000000000D-04"));
    starts("t.n:10: Crs (m) (columns 23-41): out of range", field(real(), 10, 1, "0.200000000000D+04"));
    starts("t.n:12: toe (s of week): found 345601.0, allowed whole multiples of 16 s",
        field(real(), 12, 0, "0.345601000000D+06"));
    starts("t.n:12: toe (s of week): out of range, found 700000.0", field(real(), 12, 0, "0.700000000000D+06"));
    starts("t.n:14: GPS week 1591 with toe 345600 s lies 604800 s from the clock epoch of line 9",
        field(real(), 14, 2, "0.159100000000D+04"));
    starts("t.n:9: af0 (s) (columns 23-41): out of range", field(real(), 9, 1, "0.100000000000D+00"));
    for (String bad : new String[] {"Infinity", "1e400", "0x1p3", "NaN", "", "0.1D+02.5", "--1"}) {
      starts("t.n:13: i0 (rad) (columns 4-22): ", field(real(), 13, 0, bad));
    }
    starts("t.n:13: i0 (rad) (columns 4-22): number out of the double range", field(real(), 13, 0, "0.1D+999"));
    // Spares may be blank or any number, including FORTRAN's three-digit exponent form.
    RinexNavFile.parse("t.n", field(field(real(), 16, 2, ""), 16, 3, "0.664593648549-315"));
    starts("t.n:16: spare (columns 42-60): not a decimal number", field(real(), 16, 2, "x"));
  }

  @Test
  void recordsMustBeCompleteAndEpochsMustExist() {
    final List<String> cut = new ArrayList<>(real().subList(0, real().size() - 3));
    assertTrue(refusal(cut).contains("incomplete navigation record: found 5 lines, allowed 8"));
    final List<String> blank = real();
    blank.set(12, "");
    starts("t.n:13: blank line inside a navigation record", blank);
    final List<String> shortLine = real();
    shortLine.set(13, shortLine.get(13).substring(0, 41));
    starts("t.n:14: GPS week (columns 42-60): not a decimal number, found ''", shortLine);
    final List<String> longLine = real();
    longLine.set(13, longLine.get(13) + "  x");
    starts("t.n:14: record line longer than 80 columns (82)", longLine);
    final List<String> lead = real();
    lead.set(13, "  1" + lead.get(13).substring(3));
    starts("t.n:14: columns 1-3 of a broadcast orbit line must be blank", lead);
    starts("t.n:9: month (columns 6-8): out of range, found 13", epoch(real(), " 1 10 13  1  0  0  0.0"));
    starts("t.n:9: day of month 2010-6: out of range, found 31", epoch(real(), " 1 10  6 31  0  0  0.0"));
    starts("t.n:9: hour (columns 12-14): out of range, found 25", epoch(real(), " 1 10  7  1 25  0  0.0"));
    starts("t.n:9: seconds: out of range, found 75", epoch(real(), " 1 10  7  1  0  0 75.0"));
    starts("t.n:9: toc (s of week): found 345600.5", epoch(real(), " 1 10  7  1  0  0  0.5"));
    starts("t.n:9: PRN (columns 1-2): out of range, found 0", epoch(real(), " 0 10  7  1  0  0  0.0"));
    starts("t.n:9: PRN (columns 1-2): not a whole number", epoch(real(), " x 10  7  1  0  0  0.0"));
  }

  private static List<String> epoch(List<String> lines, String first22) {
    lines.set(8, first22 + lines.get(8).substring(22));
    return lines;
  }

  @Test
  void duplicatesAreDroppedWhenIdenticalAndRefusedWhenNot() {
    final List<String> same = real();
    same.addAll(16, real().subList(8, 16));
    final RinexNavFile f = RinexNavFile.parse("t.n", same);
    assertEquals(421, f.records().size());
    assertEquals(List.of("t.n:17: duplicate of the record at line 9 (PRN 1), dropped"), f.duplicates());
    // Received later by another station: only the transmission time differs, still a duplicate.
    final List<String> later = real();
    later.addAll(16, real().subList(8, 16));
    field(later, 24, 0, "0.341700000000D+06");
    assertEquals(1, RinexNavFile.parse("t.n", later).duplicates().size());
    final List<String> other = real();
    other.addAll(16, real().subList(8, 16));
    field(other, 18, 1, "-.897600000000D+02");
    assertEquals("t.n:17: second record of PRN 1 with the clock epoch of the record at line 9 differs in Crs (m) "
        + "(found -89.76, first -89.75); allowed only identical duplicates (the transmission time may differ)",
        refusal(other));
    final List<String> clock = real();
    clock.addAll(16, real().subList(8, 16));
    clock.set(16, clock.get(16).substring(0, 22) + "-0.136290676893D-03" + clock.get(16).substring(41));
    assertTrue(refusal(clock).contains("differs in af0 (s)"));
  }

  @Test
  void headerLinesAreChecked() {
    final List<String> label = real();
    label.set(2, label.get(2).substring(0, 60) + "MARKER NAME");
    starts("t.n:3: unknown header label (columns 61-80), found 'MARKER NAME'", label);
    final List<String> ion = real();
    ion.set(3, "    NaN       " + ion.get(3).substring(14));
    starts("t.n:4: ION ALPHA 1 (columns 3-14): not a decimal number", ion);
    final List<String> leap = real();
    leap.set(6, "    1.5" + leap.get(6).substring(7));
    starts("t.n:7: leap seconds (columns 1-6): not a whole number", leap);
    final List<String> v3 = real();
    v3.set(0, "     3.02" + v3.get(0).substring(9));
    starts("t.n:1: RINEX version 3.02 not supported, allowed 2.x", v3);
    final List<String> glo = real();
    glo.set(0, glo.get(0).substring(0, 20) + "G" + glo.get(0).substring(21));
    starts("t.n:1: file type (column 21): found 'G', allowed N", glo);
    final List<String> noEnd = new ArrayList<>(real().subList(0, 7));
    starts("t.n:7: no 'END OF HEADER' line", noEnd);
    assertTrue(refusal(List.of("hello")).contains("not a RINEX file"));
    final List<String> utc = real();
    utc.set(5, "   -0.838190317154D-08-0.213162820728D-13   503808    99999 DELTA-UTC: A0,A1,T,W");
    starts("t.n:6: W (GPS week, columns 51-59): out of range, found 99999", utc);
  }

  @Test
  void nonAsciiBytesNameLineAndColumn(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
    final java.nio.file.Path p = dir.resolve("u.n");
    final byte[] text = (String.join("\n", real()) + "\n").getBytes(java.nio.charset.StandardCharsets.US_ASCII);
    text[text.length - 30] = (byte) 0xFF;
    java.nio.file.Files.write(p, text);
    final String m = assertThrows(InputException.class, () -> RinexNavFile.read(p)).getMessage();
    assertTrue(m.matches("u\\.n:\\d+: column \\d+: byte 0xFF is not printable ASCII, allowed ASCII text only"), m);
  }
}
