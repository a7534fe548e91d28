package org.eigenzeit.ground.fuzz;

import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.cols;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.crlf;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.insert;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.remove;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.set;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.withByte;

import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.Bases;
import org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.Dir;
import org.eigenzeit.ground.trajectory.Fixtures;

/**
 * SP3 cases. The base is the IGS final orbit of 2010-07-01 cut to 12 epochs of G02, G05 and G07:
 * header lines 1-22 (line 13 the time system), epoch k (from 0) at line 23 + 4k with the records
 * of G02, G05, G07 on the next three lines, EOF at line 71.
 */
final class FuzzSp3Cases {
  private FuzzSp3Cases() {}

  static int epoch(int k) {
    return 23 + 4 * k;
  }

  static int record(int k, int sat) {
    return 24 + 4 * k + sat;
  }

  static Dir make() {
    final Dir d = new Dir("sp3", "sp3");
    final List<String> b = Bases.sp3();
    accepted(d, b);
    numbers(d, b);
    header(d, b);
    epochs(d, b);
    records(d, b);
    plausibility(d, b);
    velocities(d);
    bytes(d, b);
    return d;
  }

  private static void accepted(Dir d, List<String> b) {
    d.accept("base", b, "valid IGS final orbit, 12 epochs, 3 satellites");
    d.acceptBytes("crlf", crlf(b), "CR LF line ends");
    d.accept("no-clock", cols(b, record(3, 1), 47, " 999999.999999"), "clock 999999.999999 = no value");
    d.accept("no-position", cols(b, record(4, 2), 5, "      0.000000      0.000000      0.000000"),
        "position 0,0,0 = no value (G07 keeps 11 samples)");
    for (String ts : new String[] {"GLO", "GAL", "TAI", "UTC"}) {
      d.accept("c-" + ts.toLowerCase(Locale.ROOT), cols(b, 13, 10, ts), "SP3-c time system " + ts);
    }
    for (String ts : new String[] {"GPS", "BDT", "QZS", "IRN"}) {
      d.accept("d-" + ts.toLowerCase(Locale.ROOT), cols(cols(b, 1, 2, "d"), 13, 10, ts), "SP3-d time system " + ts);
    }
    d.accept("flags", cols(b, record(2, 0), 75, "EP  MP"), "clock event, clock prediction, manoeuvre, orbit "
        + "prediction flags");
    d.accept("ep-record", insert(b, record(2, 0) + 1, "EP     1    1    1      10        0        0        0        0"
        + "        0        0"), "correlation record after a position record");
    d.accept("comment", insert(b, 22, "/* one more comment line"), "five comment lines");
    d.accept("sdev-blank", cols(b, record(1, 1), 62, "            "), "blank standard deviations");
  }

  private static void numbers(Dir d, List<String> b) {
    final String[] bad = {"NaN", "Infinity", "-Infinity", "1e400", "0x1p14", "1.5d", "", "1.2.3", "--5", "+-1", "1,5"};
    for (int i = 0; i < bad.length; i++) {
      final int line = record(i % 12, i % 3);
      d.refuse("x-" + slug(bad[i]), cols(b, line, 5, String.format("%14s", bad[i])), line, "x field '" + bad[i] + "'");
    }
    final String[] few = {"NaN", "Infinity", "1e400", "0X1P3", "abc"};
    for (int i = 0; i < few.length; i++) {
      final int line = record((i + 5) % 12, (i + 1) % 3);
      d.refuse("y-" + slug(few[i]), cols(b, line, 19, String.format("%14s", few[i])), line, "y field '" + few[i] + "'");
      final int line2 = record((i + 7) % 12, (i + 2) % 3);
      d.refuse("z-" + slug(few[i]), cols(b, line2, 33, String.format("%14s", few[i])), line2, "z field '" + few[i] + "'");
    }
    final String[] clocks = {"NaN", "Infinity", "1e400", "0x1p3", "abc", "999999.5", "-999999.5", "9999999.999999"};
    for (int i = 0; i < clocks.length; i++) {
      final int line = record(i % 12, 1);
      d.refuse("clock-" + slug(clocks[i]), cols(b, line, 47, String.format("%14s", clocks[i])), line, "clock '"
          + clocks[i] + "'");
    }
  }

  private static void header(Dir d, List<String> b) {
    d.refuse("version-e", cols(b, 1, 2, "e"), 1, "SP3 version e");
    d.refuse("version-missing", set(b, 1, "cP2010  7  1  0  0  0.00000000      12 ORBIT IGS05 HLM  IGS"), 1,
        "first line without #");
    d.refuse("pv-flag", cols(b, 1, 3, "X"), 1, "P/V flag X");
    d.refuse("year", cols(b, 1, 4, "20x0"), 1, "start year 20x0");
    d.refuse("month-13", cols(b, 1, 9, "13"), 1, "start month 13");
    d.refuse("day-45", cols(b, 1, 12, "45"), 1, "start day 45");
    d.refuse("hour-25", cols(b, 1, 15, "25"), 1, "start hour 25");
    d.refuse("minute-61", cols(b, 1, 18, "61"), 1, "start minute 61");
    d.refuse("second-75", cols(b, 1, 21, "75.00000000"), 1, "start seconds 75");
    d.refuse("start-day-2", cols(b, 1, 12, " 2"), 2, "start date moved: MJD of line 2 disagrees");
    d.refuse("epochs-11", cols(b, 1, 33, "     11"), epoch(11), "11 epochs announced, 12 present");
    d.refuse("epochs-13", cols(b, 1, 33, "     13"), 71, "13 epochs announced, 12 present");
    d.refuse("epochs-abc", cols(b, 1, 33, "    abc"), 1, "epoch count abc");
    d.refuse("epochs-0", cols(b, 1, 33, "      0"), 1, "epoch count 0");
    d.refuse("frame-gcrf", cols(b, 1, 47, "GCRF "), 1, "coordinate system GCRF (inertial)");
    d.refuse("frame-teme", cols(b, 1, 47, "TEME "), 1, "coordinate system TEME");
    d.refuse("frame-blank", cols(b, 1, 47, "     "), 1, "coordinate system blank");
    d.refuse("orbit-type", cols(b, 1, 53, "XYZ"), 1, "orbit type XYZ");
    d.refuse("line1-short", set(b, 1, b.get(0).substring(0, 31)), 1, "line 1 cut after the seconds");
    d.refuse("week", cols(b, 2, 4, "1591"), 2, "GPS week 1591");
    d.refuse("sow", cols(b, 2, 9, "345601.00000000"), 2, "seconds of week off by 1 s");
    d.refuse("interval-0", cols(b, 2, 25, "    0.00000000"), 2, "epoch interval 0");
    d.refuse("interval-nan", cols(b, 2, 25, "           NaN"), 2, "epoch interval NaN");
    d.refuse("interval-neg", cols(b, 2, 25, " -900.00000000"), 2, "epoch interval -900");
    d.refuse("interval-600", cols(b, 2, 25, "  600.00000000"), epoch(1), "interval 600 s: second epoch off the grid");
    d.refuse("mjd", cols(b, 2, 40, "55379"), 2, "MJD one day late");
    d.refuse("fraction", cols(b, 2, 46, "0.5000000000000"), 2, "fraction of day 0.5");
    d.refuse("line2-prefix", cols(b, 2, 1, "#x"), 2, "second line without ##");
    d.refuse("sats-4", cols(b, 3, 5, " 4"), 3, "4 satellites announced, 3 listed");
    d.refuse("sats-2", cols(b, 3, 5, " 2"), 3, "2 satellites announced, 3 listed");
    d.refuse("sats-xx", cols(b, 3, 5, "xx"), 3, "satellite count xx");
    d.refuse("sats-0", cols(b, 3, 5, " 0"), 3, "satellite count 0");
    d.refuse("sats-dup", cols(b, 3, 13, "G02"), 3, "G02 listed twice");
    d.refuse("sats-id", cols(b, 3, 13, "X05"), 3, "satellite id X05");
    d.refuse("sats-g00", cols(b, 3, 13, "G00"), 3, "satellite id G00");
    d.refuse("plus-missing", remove(b, 7), 7, "one '+' line missing");
    d.refuse("accuracy-x", cols(b, 8, 10, "  x"), 8, "accuracy exponent x");
    d.refuse("accuracy-100", cols(b, 8, 10, "100"), 8, "accuracy exponent 100");
    for (String ts : new String[] {"XYZ", "ccc", "TT ", "BDT", "gps", "   "}) {
      d.refuse("ts-" + slug(ts), cols(b, 13, 10, ts), 13, "SP3-c time system '" + ts + "'");
    }
    d.refuse("ts-d-xyz", cols(cols(b, 1, 2, "d"), 13, 10, "XYZ"), 13, "SP3-d time system XYZ");
    d.refuse("c-missing", remove(b, 13), 13, "first %c line missing (the second names no time system)");
    d.refuse("f-nan", cols(b, 15, 4, "       NaN"), 15, "%f base NaN");
    d.refuse("f-prefix", cols(b, 15, 1, "%x"), 15, "%f line missing");
    d.refuse("i-garbage", cols(b, 17, 4, "   x"), 17, "%i field x");
  }

  private static void epochs(Dir d, List<String> b) {
    final int e = epoch(3);
    d.refuse("epoch-month-13", cols(b, e, 9, "13"), e, "epoch month 13");
    d.refuse("epoch-day-45", cols(b, e, 12, "45"), e, "epoch day 45");
    d.refuse("epoch-june-31", cols(b, e, 9, " 6 31"), e, "epoch 2010-06-31");
    d.refuse("epoch-hour-25", cols(b, e, 15, "25"), e, "epoch hour 25");
    d.refuse("epoch-minute-60", cols(b, e, 18, "60"), e, "epoch minute 60");
    d.refuse("epoch-second-75", cols(b, e, 21, "75.00000000"), e, "epoch seconds 75");
    d.refuse("epoch-second-60", cols(b, e, 18, "59 60.00000000"), e, "epoch 00:59:60 in GPS time");
    d.refuse("epoch-year", cols(b, e, 4, "2x10"), e, "epoch year 2x10");
    d.refuse("epoch-text", cols(b, e, 33, "x"), e, "text after the epoch seconds");
    d.refuse("epoch-offgrid", cols(b, e, 21, " 0.50000000"), e, "epoch 0.5 s off the 900 s grid");
    d.refuse("epoch-repeat", set(b, e, b.get(epoch(2) - 1)), e, "epoch equal to the previous one");
    d.refuse("epoch-back", cols(b, e, 4, "2009"), e, "epoch a year back");
    d.refuse("epoch-first", cols(b, epoch(0), 18, "15"), epoch(0), "first epoch differs from the header");
    d.refuse("epoch-nan", cols(b, e, 21, "        NaN"), e, "epoch seconds NaN");
  }

  private static void records(Dir d, List<String> b) {
    final int k = 5;
    final int r = record(k, 1);
    d.refuse("dup-sat", set(b, record(k, 0), b.get(r - 1)), r, "G05 twice at one epoch");
    d.refuse("missing-sat", remove(b, record(k, 2)), epoch(k), "G07 missing at one epoch");
    d.refuse("unknown-sat", cols(b, r, 2, "G33"), r, "satellite G33 not in the header");
    d.refuse("bad-id", cols(b, r, 2, "X05"), r, "satellite id X05");
    d.refuse("short", set(b, r, b.get(r - 1).substring(0, 40)), r, "record cut at 40 columns");
    d.refuse("long", set(b, r, b.get(r - 1) + "  extra"), r, "record of 87 columns");
    d.refuse("flag-75", cols(b, r, 75, "X"), r, "clock event flag X");
    d.refuse("flag-76", cols(b, r, 76, "Q"), r, "clock prediction flag Q");
    d.refuse("flag-79", cols(b, r, 79, "Z"), r, "manoeuvre flag Z");
    d.refuse("flag-80", cols(b, r, 80, "Y"), r, "orbit prediction flag Y");
    d.refuse("col-61", cols(b, r, 61, "7"), r, "column 61 not blank");
    d.refuse("sdev-xx", cols(b, r, 62, "xx"), r, "x standard deviation xx");
    d.refuse("sdev-clock", cols(b, r, 71, "abc"), r, "clock standard deviation abc");
    d.refuse("unknown-record", insert(b, r, "Q record"), r, "unknown record type");
    d.refuse("blank-line", insert(b, r, ""), r, "blank line among records");
    d.refuse("epoch-one-space", cols(b, epoch(k), 1, "* 2010 "), epoch(k), "epoch line '* 2010'");
    d.refuse("v-in-p-file", cols(b, r, 1, "V"), r, "velocity record in a P file");
    d.refuse("ep-9-fields", insert(b, r + 1, "EP     1    1    1      10        0        0        0        0        0"),
        r + 1, "correlation record with 9 fields");
    d.refuse("ev-after-p", insert(b, r + 1, "EV     1    1    1      10        0        0        0        0        0"
        + "        0"), r + 1, "EV record after a P record");
    d.refuse("no-eof", remove(b, 71), 70, "EOF line missing");
    d.refuse("after-eof", insert(b, 72, "PG02 1 2 3"), 72, "a record after EOF");
    d.refuse("p-before-epoch", insert(b, 23, b.get(record(0, 0) - 1)), 23, "position record before the first epoch");
  }

  private static void plausibility(Dir d, List<String> b) {
    d.refuse("inside-earth", cols(b, record(6, 1), 5, "   1000.000000      0.000000      0.000000"), record(6, 1),
        "position 1000 km from the centre");
    for (double km : new double[] {50.0, 10.0}) {
      final int line = record(6, 1);
      final String l = b.get(line - 1);
      final double x = Double.parseDouble(l.substring(4, 18).strip()) + km;
      d.refuse("jump-" + (int) km + "km", cols(b, line, 5, String.format(Locale.ROOT, "%14.6f", x)), line,
          "G05 moved " + km + " km at one epoch");
    }
    d.refuse("far", cols(b, record(6, 1), 5, " 1900000.000000 1900000.000000      0.000000"), record(6, 1),
        "position 2.7 million km away");
  }

  private static void velocities(Dir d) {
    final List<String> v = Fixtures.sp3WithVelocities(12, List.of("G02", "G05", "G07"));
    d.accept("velocities", v, "line 1 flag V, a velocity record after every position");
    final int firstV = 25;
    d.refuse("v-missing", remove(v, firstV), firstV, "velocity record of G02 missing (found at the next P record)");
    d.refuse("v-wrong-sat", cols(v, firstV, 2, "G05"), firstV, "velocity record of G05 after the position of G02");
    d.refuse("v-nan", cols(v, firstV, 5, "           NaN"), firstV, "vx NaN");
    d.refuse("v-rate", cols(v, firstV, 47, "      1e400   "), firstV, "clock rate 1e400");
    d.refuse("v-faster-than-light", cols(v, firstV, 5, " 3.0e10       "), firstV, "vx 3e10 dm/s");
  }

  private static void bytes(Dir d, List<String> b) {
    d.refuseBytes("utf8-comment", withByte(b, 19, 5, 0xC3), 19, "byte 0xC3 in a comment");
    d.refuseBytes("ff-record", withByte(b, record(2, 1), 20, 0xFF), record(2, 1), "byte 0xFF in a record");
    d.refuseBytes("nul-header", withByte(b, 2, 3, 0x00), 2, "NUL in line 2");
    d.refuseBytes("del-record", withByte(b, record(8, 2), 50, 0x7F), record(8, 2), "DEL in a record");
    d.refuseBytes("high-eof", withByte(b, 71, 4, 0x80), 71, "byte 0x80 after EOF");
    d.refuseBytes("bell", withByte(b, epoch(4), 2, 0x07), epoch(4), "BEL control character in an epoch line");
  }

  static String slug(String s) {
    final String t = s.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
    return t.isEmpty() ? "blank" : t;
  }
}
