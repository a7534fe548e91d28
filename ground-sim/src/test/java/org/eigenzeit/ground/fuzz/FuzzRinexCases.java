package org.eigenzeit.ground.fuzz;

import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.cols;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.crlf;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.insert;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.remove;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.set;
import static org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.withByte;
import static org.eigenzeit.ground.fuzz.FuzzSp3Cases.slug;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.Bases;
import org.eigenzeit.ground.fuzz.FuzzCorpusGenerator.Dir;

/**
 * RINEX 2 GPS navigation cases. The base is the real broadcast file of 2010-07-01 cut to its
 * header (lines 1-8) and six records (PRN 1-6 at 00:00): record r (from 0) starts at line 9 + 8r;
 * orbit parameter p (0 = IODE .. 25 = fit interval, 26-27 spares) is on line 10 + 8r + p / 4, field
 * p % 4 at columns 4 + 19 (p % 4).
 */
final class FuzzRinexCases {
  private FuzzRinexCases() {}

  static final String[] NAMES = {"iode", "crs", "delta-n", "m0", "cuc", "e", "cus", "sqrt-a", "toe", "cic",
    "omega0", "cis", "i0", "crc", "omega", "omega-dot", "idot", "l2-codes", "week", "l2p-flag", "accuracy",
    "health", "tgd", "iodc", "transmission-time", "fit-interval", "spare-1", "spare-2"};

  static int start(int r) {
    return 9 + 8 * r;
  }

  static int line(int r, int p) {
    return start(r) + 1 + p / 4;
  }

  static List<String> param(List<String> b, int r, int p, String text) {
    return cols(b, line(r, p), 4 + 19 * (p % 4), String.format("%19s", text));
  }

  static List<String> clock(List<String> b, int r, int k, String text) {
    return cols(b, start(r), 23 + 19 * k, String.format("%19s", text));
  }

  static String d(double v) {
    return String.format(Locale.ROOT, "%19.12E", v).replace('E', 'D');
  }

  static Dir make() {
    final Dir dir = new Dir("rinex-nav", "10n");
    final List<String> b = Bases.rinex();
    accepted(dir, b);
    everyFieldNaN(dir, b);
    ranges(dir, b);
    wholes(dir, b);
    epochs(dir, b);
    structure(dir, b);
    header(dir, b);
    bytes(dir, b);
    return dir;
  }

  private static void accepted(Dir dir, List<String> b) {
    dir.accept("base", b, "real broadcast file, 6 records");
    dir.acceptBytes("crlf", crlf(b), "CR LF line ends");
    dir.accept("spares-blank", param(param(b, 1, 26, ""), 1, 27, ""), "blank spares");
    dir.accept("spares-wide-exponent", param(param(b, 2, 26, "0.499063314480-269"), 2, 27, "0.664593648549-315"),
        "spares with FORTRAN three-digit exponents (as in a real 2012 file)");
    final List<String> dup = new ArrayList<>(b);
    dup.addAll(b.subList(start(1) - 1, start(1) + 7));
    dir.accept("duplicate-identical", dup, "an identical second record of PRN 2 (dropped and reported)");
    final List<String> later = new ArrayList<>(dup);
    dir.accept("duplicate-later", param(later, 6, 24, d(341_700.0)), "a duplicate received later (transmission time "
        + "differs only)");
    dir.accept("fit-4", param(b, 3, 25, d(4.0)), "fit interval 4 h");
    dir.accept("health-bad", param(b, 4, 21, d(63.0)), "unhealthy satellite (health 63) read, not used");
  }

  private static void everyFieldNaN(Dir dir, List<String> b) {
    for (int p = 0; p < 28; p++) {
      final int r = p % 6;
      dir.refuse("nan-" + NAMES[p], param(b, r, p, "NaN"), line(r, p), NAMES[p] + " NaN");
    }
    final String[] clock = {"af0", "af1", "af2"};
    for (int k = 0; k < 3; k++) {
      dir.refuse("nan-" + clock[k], clock(b, k, k, "NaN"), start(k), clock[k] + " NaN");
    }
    final String[] bad = {"Infinity", "-Infinity", "1e400", "0x1p3", "", "1.0D+02.5", "--1", "0.5D", "1.5-12"};
    final int[] params = {3, 5, 7, 10, 12, 14, 15, 16, 1};
    for (int i = 0; i < bad.length; i++) {
      final int r = (i + 2) % 6;
      final int p = params[i];
      dir.refuse(NAMES[p] + "-" + slug(bad[i]), param(b, r, p, bad[i]), line(r, p), NAMES[p] + " '" + bad[i] + "'");
    }
  }

  private static void ranges(Dir dir, List<String> b) {
    final Object[][] cases = {{5, 0.6, "e 0.6"}, {5, -0.01, "e negative"}, {7, 1000.0, "sqrt(A) 1000"},
      {7, 9000.0, "sqrt(A) 9000"}, {3, 4.0, "M0 4 rad"}, {12, -4.0, "i0 -4 rad"}, {14, 3.2, "omega 3.2 rad"},
      {10, 10.0, "OMEGA0 10 rad"}, {15, -1e-5, "OMEGA DOT -1e-5 rad/s"}, {16, 1e-8, "IDOT 1e-8 rad/s"},
      {1, 2000.0, "Crs 2000 m"}, {13, -2000.0, "Crc -2000 m"}, {4, 1e-3, "Cuc 1e-3 rad"}, {6, -1e-3, "Cus"},
      {9, 1e-3, "Cic"}, {11, -1e-3, "Cis"}, {2, 1e-7, "delta n 1e-7 rad/s"}, {8, 700_000.0, "toe 700000 s"},
      {8, 345_601.0, "toe not a multiple of 16 s"}, {22, 1e-6, "TGD 1e-6 s"}, {20, -2.0, "accuracy -2 m"},
      {20, 1e5, "accuracy 1e5 m"}, {24, 2.0e6, "transmission time 2e6 s"}, {25, 5.0, "fit interval 5 h"},
      {25, -4.0, "fit interval -4 h"}};
    for (int i = 0; i < cases.length; i++) {
      final int p = (Integer) cases[i][0];
      final int r = i % 6;
      dir.refuse("range-" + slug((String) cases[i][2]), param(b, r, p, d((Double) cases[i][1])), line(r, p),
          (String) cases[i][2]);
    }
    dir.refuse("af0-range", clock(b, 1, 0, d(0.1)), start(1), "af0 0.1 s");
    dir.refuse("af1-range", clock(b, 2, 1, d(1e-6)), start(2), "af1 1e-6");
    dir.refuse("af2-range", clock(b, 3, 2, d(1e-12)), start(3), "af2 1e-12");
  }

  private static void wholes(Dir dir, List<String> b) {
    final Object[][] cases = {{21, 0.5, "health 0.5"}, {21, 64.0, "health 64"}, {21, -1.0, "health -1"},
      {0, 63.5, "IODE 63.5"}, {0, 256.0, "IODE 256"}, {23, 1024.0, "IODC 1024"}, {23, 62.5, "IODC 62.5"},
      {17, 4.0, "codes on L2 4"}, {19, 2.0, "L2 P flag 2"}, {18, 1590.5, "week 1590.5"}};
    for (int i = 0; i < cases.length; i++) {
      final int p = (Integer) cases[i][0];
      final int r = i % 6;
      dir.refuse("whole-" + slug((String) cases[i][2]), param(b, r, p, d((Double) cases[i][1])), line(r, p),
          (String) cases[i][2]);
    }
    dir.refuse("iode-iodc", param(b, 2, 23, d(7.0)), line(2, 23), "IODC disagrees with IODE");
    dir.refuse("week-1591", param(b, 3, 18, d(1591.0)), line(3, 18), "GPS week one too many: toe a week from toc");
  }

  private static void epochs(Dir dir, List<String> b) {
    final String[][] cases = {{" 1 10 13  1  0  0  0.0", "month 13"}, {" 1 10  7 45  0  0  0.0", "day 45"},
      {" 1 10  6 31  0  0  0.0", "June 31"}, {" 1 10  7  1 25  0  0.0", "hour 25"},
      {" 1 10  7  1  0 60  0.0", "minute 60"}, {" 1 10  7  1  0  0 75.0", "second 75"},
      {" 1 10  7  1  0  0  0.5", "toc not a multiple of 16 s"}, {" 0 10  7  1  0  0  0.0", "PRN 0"},
      {"64 10  7  1  0  0  0.0", "PRN 64"}, {" x 10  7  1  0  0  0.0", "PRN x"}, {" 1 1x  7  1  0  0  0.0", "year 1x"},
      {" 1 10  7  1  0  0  NaN", "seconds NaN"}};
    for (int i = 0; i < cases.length; i++) {
      final int r = i % 6;
      final String first = b.get(start(r) - 1);
      dir.refuse("epoch-" + slug(cases[i][1]), set(b, start(r), cases[i][0] + first.substring(22)), start(r),
          "clock epoch " + cases[i][1]);
    }
  }

  private static void structure(Dir dir, List<String> b) {
    dir.refuse("incomplete", new ArrayList<>(b.subList(0, b.size() - 3)), start(5), "last record of 5 lines");
    dir.refuse("blank-inside", set(b, line(2, 8), ""), line(2, 8), "blank line inside a record");
    dir.refuse("long-line", set(b, line(1, 4), b.get(line(1, 4) - 1) + "   x"), line(1, 4), "record line of 83 columns");
    dir.refuse("short-line", set(b, line(3, 16), b.get(line(3, 16) - 1).substring(0, 41)), line(3, 16),
        "record line cut: GPS week missing");
    dir.refuse("lead-columns", cols(b, line(4, 12), 1, "  1"), line(4, 12), "columns 1-3 not blank");
    final List<String> dup = new ArrayList<>(b);
    dup.addAll(b.subList(start(1) - 1, start(1) + 7));
    dir.refuse("duplicate-different", param(dup, 6, 1, d(-89.76)), start(6), "a second record of PRN 2 with the "
        + "same toc and another Crs");
    dir.refuse("duplicate-clock", clock(dup, 6, 0, d(2.691e-4)), start(6), "a second record of PRN 2 with another af0");
    dir.refuse("extra-line", insert(b, start(3), "   junk"), start(3), "a stray line where a record starts");
  }

  private static void header(Dir dir, List<String> b) {
    dir.refuse("label-unknown", cols(b, 3, 61, "MARKER NAME         "), 3, "unknown header label");
    dir.refuse("ion-alpha-nan", cols(b, 4, 3, "         NaN"), 4, "ION ALPHA NaN");
    dir.refuse("ion-beta-x", cols(b, 5, 15, "           x"), 5, "ION BETA x");
    dir.refuse("utc-a0-nan", cols(b, 6, 4, "                NaN"), 6, "DELTA-UTC A0 NaN");
    dir.refuse("utc-w", cols(b, 6, 51, "    99999"), 6, "DELTA-UTC week 99999");
    dir.refuse("utc-t", cols(b, 6, 42, "  1.5e+05"), 6, "DELTA-UTC T 1.5e+05");
    dir.refuse("leap-1-5", cols(b, 7, 1, "   1.5"), 7, "LEAP SECONDS 1.5");
    dir.refuse("version-3", cols(b, 1, 1, "     3.02"), 1, "RINEX version 3.02");
    dir.refuse("version-x", cols(b, 1, 1, "        x"), 1, "RINEX version x");
    dir.refuse("type-g", cols(b, 1, 21, "G"), 1, "file type G");
    dir.refuse("no-end", remove(b, 8), 8, "no END OF HEADER (the first record is read as a header line)");
    dir.refuse("first-line", remove(b, 1), 1, "no RINEX VERSION / TYPE line");
    dir.refuse("header-long", set(b, 3, b.get(2) + "xx"), 3, "header line of 82 columns");
  }

  private static void bytes(Dir dir, List<String> b) {
    dir.refuseBytes("utf8-comment", withByte(b, 3, 10, 0xC3), 3, "byte 0xC3 in a comment");
    dir.refuseBytes("ff-record", withByte(b, line(2, 5), 30, 0xFF), line(2, 5), "byte 0xFF in a record");
    dir.refuseBytes("nul-epoch", withByte(b, start(4), 5, 0x00), start(4), "NUL in a clock epoch");
    dir.refuseBytes("del-end", withByte(b, b.size(), 20, 0x7F), b.size(), "DEL in the last line");
  }
}
