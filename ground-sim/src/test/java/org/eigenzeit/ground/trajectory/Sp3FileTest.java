package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.input.InputException;
import org.junit.jupiter.api.Test;

/**
 * SP3-c/d reading against the format documents (Hilla 2010, 2016: field columns, the "no value"
 * conventions, the allowed time systems) and the real IGS final orbit of 2010-07-01 (line 23 is
 * its first epoch, line 24 the record of G01, line 56 the second epoch). Each malformed field is
 * refused with the file, the line and the field.
 */
class Sp3FileTest {
  private static List<String> real() {
    return new ArrayList<>(Fixtures.sp3Lines());
  }

  /** A copy with columns (1-based) of a line (1-based) overwritten. */
  private static List<String> set(List<String> lines, int lineNo, int column, String text) {
    return Fixtures.overwrite(lines, lineNo, column, text);
  }

  private static void starts(String prefix, String message) {
    assertTrue(message.startsWith(prefix), message);
  }

  private static void contains(String part, String message) {
    assertTrue(message.contains(part), message);
  }

  private static String refusal(List<String> lines) {
    return assertThrows(InputException.class, () -> Sp3File.parse("t.sp3", lines)).getMessage();
  }

  @Test
  void theRealFileIsReadWithItsConventions() {
    final Sp3File f = Sp3File.parse("igs15904.sp3", real());
    assertEquals(32, f.satelliteIds().size());
    assertEquals("GPS", f.timeSystem());
    assertEquals(Sp3File.TimeSystem.GPS, f.timeSystemCode());
    assertEquals('c', f.version());
    assertEquals(900.0, f.epochIntervalS(), 0.0);
    assertEquals("IGS05", f.coordinateSystem());
    assertFalse(f.hasVelocities());
    // G01 has no clock all day (999999.999999 = no value); G02's first clock is 269.108429 us.
    assertTrue(Double.isNaN(f.satellite("G01").samples().get(0)[4]));
    assertEquals(269.108429e-6, f.satellite("G02").samples().get(0)[4], 1e-15);
    assertEquals(-14_889_160.729, f.satellite("G02").samples().get(0)[1], 1e-6);
    assertEquals(96, f.satellite("G02").samples().size());
    assertEquals(25, f.satellite("G02").line(0));
    assertEquals(2010, f.firstEpochCalendar()[0]);
    assertEquals(900.0, f.satellite("G02").samples().get(1)[0], 0.0);
  }

  @Test
  void noValuePositionsAreSkippedNoValueClocksAreNaN() {
    final List<String> l = set(real(), 25, 5, "      0.000000      0.000000      0.000000");
    final Sp3File f = Sp3File.parse("t.sp3", l);
    assertEquals(95, f.satellite("G02").samples().size());
    assertEquals(900.0, f.satellite("G02").samples().get(0)[0], 0.0);
    starts(
        "t.sp3:25: clock (microseconds, columns 47-60): out of range, found 999999.500000", refusal(set(real(), 25, 47, " 999999.500000")));
    // One zero coordinate alone is a position, here one inside the Earth.
    contains(
        "t.sp3:25: position of G02 inside the Earth, found radius 5000.000 km", refusal(set(real(), 25, 5, "      0.000000      0.000000   5000.000000")));
  }

  @Test
  void everyNumberMustBeAFiniteDecimal() {
    for (String bad : new String[] {"           NaN", "      Infinity", "        1e400", "       0x1p14",
      "  12345.67890d", "              ", "  -1234.5.6789"}) {
      starts("t.sp3:24: x (km, columns 5-18): ", refusal(set(real(), 24, 5, bad)));
    }
    starts("t.sp3:24: y (km, columns 19-32): ", refusal(set(real(), 24, 19, "           NaN")));
    starts("t.sp3:24: z (km, columns 33-46): ", refusal(set(real(), 24, 33, "           NaN")));
    starts("t.sp3:25: clock (microseconds", refusal(set(real(), 25, 47, "           NaN")));
    starts("t.sp3:25: standard deviation exponent (columns 62-63)", refusal(set(real(), 25, 62, " x")));
    starts("t.sp3:25: clock event flag (column 75): found 'X'", refusal(set(real(), 25, 75, "X")));
    starts("t.sp3:25: manoeuvre flag (column 79)", refusal(set(real(), 25, 79, "Q")));
    starts("t.sp3:25: column 61 must be blank", refusal(set(real(), 25, 61, "7")));
    final List<String> shortRec = real();
    shortRec.set(23, "PG01  1.0");
    starts("t.sp3:24: position record too short (9 chars)", refusal(shortRec));
    Sp3File.parse("t.sp3", set(real(), 25, 75, "E"));
  }

  @Test
  void epochLinesMustExistIncreaseAndLieOnTheGrid() {
    starts("t.sp3:56: month (columns 9-10): out of range, found 13", refusal(set(real(), 56, 9, "13")));
    starts("t.sp3:56: day (columns 12-13): out of range, found 45", refusal(set(real(), 56, 12, "45")));
    starts("t.sp3:56: day of month 2010-6: out of range", refusal(set(real(), 56, 9, " 6 31")));
    starts("t.sp3:56: hour (columns 15-16): out of range, found 25", refusal(set(real(), 56, 15, "25")));
    starts("t.sp3:56: seconds: out of range, found 75", refusal(set(real(), 56, 21, "75.00000000")));
    starts("t.sp3:56: epoch 900.500000 s after the start is "
        + "not on the header's interval grid of 900.000000 s", refusal(set(real(), 56, 21, " 0.50000000")));
    starts("t.sp3:56: epochs must increase, found 0.000000 s", refusal(set(real(), 56, 18, " 0")));
    starts("t.sp3:56: text after the seconds", refusal(set(real(), 56, 32, " x")));
    final List<String> back = real();
    back.add(88, "*  2009  7  1  0  0  0.00000000");
    starts("t.sp3:89: epochs must increase", refusal(back));
    starts("t.sp3:23: first epoch differs from the header's start", refusal(set(real(), 23, 18, "15")));
  }

  @Test
  void everySatelliteOncePerEpoch() {
    final List<String> dup = real();
    dup.set(25, dup.get(24));
    assertEquals("t.sp3:26: second record of G02 at the epoch of line 23, the first is at line 25; allowed one "
        + "record per satellite and epoch", refusal(dup));
    final List<String> missing = real();
    missing.remove(24);
    starts("t.sp3:23: epoch without a record of G02, allowed only epochs with a "
        + "record of every satellite of the header (32)", refusal(missing));
    starts("t.sp3:25: satellite (columns 2-4): found 'G33', allowed "
        + "the satellites of the header", refusal(set(real(), 25, 2, "G33")));
    starts("t.sp3:25: satellite (columns 2-4): found 'X02'", refusal(set(real(), 25, 2, "X02")));
  }

  @Test
  void headerFieldsAreCheckedAgainstEachOther() {
    starts("t.sp3:3158: more epochs than line 1 announces, "
        + "found epoch 96, allowed 95", refusal(set(real(), 1, 33, "     95")));
    starts("t.sp3:3191: the file has 96 epochs, line 1 "
        + "announces 97", refusal(set(real(), 1, 33, "     97")));
    starts("t.sp3:1: position/velocity flag (column 3): found 'X'", refusal(set(real(), 1, 3, "X")));
    starts("t.sp3:1: coordinate system (columns 47-51): found "
        + "'GCRF'", refusal(set(real(), 1, 47, "GCRF ")));
    starts("t.sp3:1: orbit type (columns 53-55): found 'XYZ'", refusal(set(real(), 1, 53, "XYZ")));
    starts("t.sp3:2: MJD and fraction of day disagree", refusal(set(real(), 1, 9, " 8")));
    starts("t.sp3:2: GPS week and seconds of week disagree", refusal(set(real(), 2, 4, "1591")));
    starts("t.sp3:2: GPS week and seconds of week", refusal(set(real(), 2, 9, "345601.00000000")));
    starts("t.sp3:2: epoch interval, s (columns 25-38): "
        + "out of range, found 0.00000000", refusal(set(real(), 2, 25, "    0.00000000")));
    starts("t.sp3:4: satellite (columns 55-57): found '  0'", refusal(set(real(), 3, 5, "33")));
    starts("t.sp3:3: satellite (columns 13-15): satellite G02 "
        + "listed twice", refusal(set(real(), 3, 10, "G02")));
    starts("t.sp3:4: satellite (columns 58-60): found 'G33' beyond "
        + "the header's satellite count", refusal(set(real(), 4, 58, "G33")));
    starts("t.sp3:8: accuracy exponent (columns 10-12)", refusal(set(real(), 8, 10, "  x")));
    starts("t.sp3:15: base for position/velocity", refusal(set(real(), 15, 4, " NaN      ")));
    starts("t.sp3:17: %i field", refusal(set(real(), 17, 4, "   x")));
    final List<String> noDescriptor = real();
    noDescriptor.remove(13);
    starts("t.sp3:14: header line '%c' expected, found '%f", refusal(noDescriptor));
    contains("version 'a' not supported, allowed c or d", refusal(List.of("#a")));
    starts("t.sp3:1: not an SP3 file", refusal(List.of()));
    starts("t.sp3:1: file ends inside the header", refusal(new ArrayList<>(real().subList(0, 1))));
  }

  @Test
  void timeSystemMustBeOneTheVersionAllows() {
    final Sp3File utc = Sp3File.parse("t.sp3", set(real(), 13, 10, "UTC"));
    assertEquals(Sp3File.TimeSystem.UTC, utc.timeSystemCode());
    assertEquals("t.sp3:13: time system (columns 10-12): found 'XYZ', allowed in SP3-c: GPS, GLO, GAL, TAI, UTC",
        refusal(set(real(), 13, 10, "XYZ")));
    contains("found 'ccc'", refusal(set(real(), 13, 10, "ccc")));
    contains("found 'BDT', allowed in SP3-c", refusal(set(real(), 13, 10, "BDT")));
    contains("found 'TT '", refusal(set(real(), 13, 10, "TT ")));
    for (String ts : new String[] {"BDT", "QZS", "IRN", "GAL", "GLO", "TAI"}) {
      final Sp3File d = Sp3File.parse("t.sp3", set(set(real(), 1, 2, "d"), 13, 10, ts));
      assertEquals(ts, d.timeSystem());
      assertEquals('d', d.version());
    }
    // A trajectory converts its epochs by GnssTimeSystem (UTC shifted by the day's leap seconds:
    // GnssTimeSystemTest); a system it has no conversion for is refused at the header's line.
    assertEquals(15.0, ExternalTrajectory.fromSp3(utc, "G05", -66.25).t0Tt()
        .secondsSince(ExternalTrajectory.fromSp3(Sp3File.parse("t.sp3", real()), "G05", -66.25).t0Tt()), 1e-6);
    final Sp3File irn = Sp3File.parse("t.sp3", set(set(real(), 1, 2, "d"), 13, 10, "IRN"));
    assertTrue(assertThrows(InputException.class, () -> ExternalTrajectory.fromSp3(irn, "G05", -66.25)).getMessage()
        .startsWith("t.sp3:13: time system: not supported, found 'IRN'"));
  }

  @Test
  void recordsOtherThanThoseOfTheFormatAreRefused() {
    final List<String> junk = real();
    junk.add(30, "hello");
    starts("t.sp3:31: unknown record, found 'hello'", refusal(junk));
    final List<String> blank = real();
    blank.add(30, "");
    starts("t.sp3:31: unknown record", refusal(blank));
    final List<String> after = real();
    after.add("PG01 1 2 3");
    starts("t.sp3:3192: text after the EOF line", refusal(after));
    final List<String> cut = new ArrayList<>(real().subList(0, 200));
    contains("missing EOF", refusal(cut));
    final List<String> before = real();
    before.add(22, "PG01  18392.619117   7490.690408 -17846.346485 999999.999999");
    starts("t.sp3:23: position record before the first epoch line", refusal(before));
    starts("t.sp3:25: velocity record in a file whose line 1 flag is P", refusal(set(real(), 25, 1, "V")));
  }

  @Test
  void velocityFilesCarryAVelocityAfterEveryPosition() {
    final List<String> v = Fixtures.sp3WithVelocities(12, List.of("G02", "G05", "G07"));
    final Sp3File f = Sp3File.parse("v.sp3", v);
    assertTrue(f.hasVelocities());
    final double[] s = f.satellite("G05").samples().get(3);
    // GPS orbit, Earth-fixed: |v| about 3 km/s (common practice).
    final double speed = Math.sqrt(s[5] * s[5] + s[6] * s[6] + s[7] * s[7]);
    assertTrue(speed > 2500 && speed < 4000, "speed " + speed);
    assertTrue(Double.isNaN(s[8]));
    final int firstV = v.indexOf(v.stream().filter(x -> x.startsWith("V")).findFirst().orElseThrow()) + 1;
    final List<String> missingV = new ArrayList<>(v);
    missingV.remove(firstV - 1);
    starts("t.sp3:" + firstV + ": position record of G02 has no velocity record", refusal(missingV));
    final List<String> wrongSat = set(new ArrayList<>(v), firstV, 2, "G05");
    starts("t.sp3:" + firstV + ": velocity record of G05 after the position record of "
        + "G02", refusal(wrongSat));
    final List<String> nan = set(new ArrayList<>(v), firstV, 5, "           NaN");
    starts("t.sp3:" + firstV + ": vx (dm/s, columns 5-18): not a decimal number", refusal(nan));
    final List<String> ep = new ArrayList<>(v);
    ep.add(firstV - 1, "EP     1    1    1      10        0        0        0        0        0        0");
    Sp3File.parse("t.sp3", ep);
    ep.set(firstV - 1, "EP     1    1    1      10        0        0        0        0        0");
    starts("t.sp3:" + firstV + ": correlation record: found 9 fields", refusal(ep));
    starts("t.sp3:" + firstV + ": column 61 must be blank", refusal(set(new ArrayList<>(v), firstV, 61, "7")));
    starts("t.sp3:" + firstV + ": clock event flag (column 75): found 'E', allowed blank",
        refusal(set(new ArrayList<>(v), firstV, 75, "E")));
    final List<String> epAfterV = new ArrayList<>(v);
    epAfterV.add(firstV, "EP     1    1    1      10        0        0        0        0        0        0");
    starts("t.sp3:" + (firstV + 1) + ": EP record not directly after a P record", refusal(epAfterV));
    final List<String> evOk = new ArrayList<>(v);
    evOk.add(firstV, "EV     1    1    1      10        0        0        0        0        0        0");
    Sp3File.parse("t.sp3", evOk);
    evOk.set(firstV, "EV    -1    1    1      10        0        0        0        0        0        0");
    starts("t.sp3:" + (firstV + 1) + ": standard deviation: out of range, found -1", refusal(evOk));
    final List<String> ev = new ArrayList<>(v);
    ev.add(firstV - 1, "EV     1    1    1      10        0        0        0        0        0        0");
    starts("t.sp3:" + firstV + ": EV record not directly after a V record", refusal(ev));
  }

  @Test
  void nonAsciiBytesNameLineAndColumn(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
    final java.nio.file.Path p = dir.resolve("u.sp3");
    final List<String> l = real();
    l.set(30, l.get(30).substring(0, 10) + "\u00e9" + l.get(30).substring(11));
    java.nio.file.Files.write(p, String.join("\n", l).getBytes(java.nio.charset.StandardCharsets.UTF_8));
    assertEquals("u.sp3:31: column 11: byte 0xC3 is not printable ASCII, allowed ASCII text only",
        assertThrows(InputException.class, () -> Sp3File.read(p)).getMessage());
    assertTrue(assertThrows(InputException.class, () -> Sp3File.read(dir.resolve("none.sp3"))).getMessage()
        .endsWith("none.sp3: no such file"));
  }
}
