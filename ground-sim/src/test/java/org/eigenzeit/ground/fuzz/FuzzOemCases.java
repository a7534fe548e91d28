package org.eigenzeit.ground.fuzz;

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
import org.eigenzeit.ground.trajectory.Fixtures;

/**
 * CCSDS OEM cases. The bases are OEMs of the real orbit of GPS G05 (IGS final, 2010-07-01), 24
 * samples at 900 s: line 3 CREATION_DATE, 5 META_START, 6 OBJECT_NAME, 7 OBJECT_ID, 8
 * CENTER_NAME, 9 REF_FRAME, 10 TIME_SYSTEM, 11 START_TIME, 12 STOP_TIME, 13 META_STOP, ephemeris
 * line k (from 0) at line 14 + k, the last at line 37.
 */
final class FuzzOemCases {
  private FuzzOemCases() {}

  static int data(int k) {
    return 14 + k;
  }

  /** The base with field f (0 = epoch, 1-6 = x..vz) of ephemeris line k replaced. */
  static List<String> field(List<String> b, int k, int f, String text) {
    final String[] p = b.get(data(k) - 1).split(" ");
    p[f] = text;
    return set(b, data(k), String.join(" ", p));
  }

  /** The base with a number added to field f of ephemeris line k. */
  static List<String> shift(List<String> b, int k, int f, double by) {
    final String[] p = b.get(data(k) - 1).split(" ");
    return field(b, k, f, String.format(Locale.ROOT, "%.9f", Double.parseDouble(p[f]) + by));
  }

  static Dir make() {
    final Dir d = new Dir("oem", "oem");
    final List<String> b = Bases.oem("ITRF2005");
    final List<String> g = Bases.oem("GCRF");
    accepted(d, b, g);
    metadata(d, b, g);
    data(d, b, g);
    covariance(d, b);
    segments(d, b, g);
    plausibility(d, g);
    bytes(d, b);
    return d;
  }

  private static void accepted(Dir d, List<String> b, List<String> g) {
    d.accept("itrf2005", b, "real GPS orbit in ITRF2005, GPS time");
    d.accept("gcrf", g, "the same orbit in GCRF");
    d.accept("eme2000", Bases.oem("EME2000"), "the same orbit in EME2000 (frame bias applied)");
    for (String f : new String[] {"ITRF", "ITRF-97", "ITRF2014", "ITRF2020", "itrf2008"}) {
      d.accept("frame-" + slug(f), set(b, 9, "REF_FRAME = " + f), "ITRF-family frame " + f);
    }
    d.accept("icrf", set(g, 9, "REF_FRAME = ICRF"), "ICRF axes about the Earth");
    d.acceptBytes("crlf-bytes", crlf(b), "CR LF line ends");
    d.accept("two-segments", Fixtures.oemTwoSegments(true), "two segments (ITRF2005 then GCRF) sharing the boundary epoch");
    d.accept("covariance", cov(ROWS, true), "a complete covariance block");
    d.accept("interpolation", insert(insert(b, 13, "INTERPOLATION = LAGRANGE"), 14, "INTERPOLATION_DEGREE = 9"),
        "INTERPOLATION and its degree");
    d.accept("comments", insert(insert(b, 14, "COMMENT data from the IGS final orbit"), 6, "COMMENT metadata"),
        "comments at the start of the metadata and data blocks");
    d.accept("useable", insert(insert(b, 12, "USEABLE_START_TIME = 2010-07-01T01:00:00"), 13,
        "USEABLE_STOP_TIME = 2010-07-01T04:00:00"), "useable start and stop inside the segment");
    d.accept("accelerations", accelerations(b), "ephemeris lines with accelerations");
  }

  private static List<String> accelerations(List<String> b) {
    final List<String> l = new ArrayList<>(b);
    for (int k = 0; k < 24; k++) {
      l.set(data(k) - 1, l.get(data(k) - 1) + " 0.0 0.0 0.0");
    }
    return l;
  }

  private static void metadata(Dir d, List<String> b, List<String> g) {
    for (String f : new String[] {"TEME", "TOD", "MOD", "J2000", "TDR", "EME2000X", "ITRF2099", "GRC", "ITRF-2000",
      "RTN"}) {
      d.refuse("frame-" + slug(f), set(b, 9, "REF_FRAME = " + f), 9, "REF_FRAME " + f + " (not transformed)");
    }
    d.refuse("centre-mars", set(b, 8, "CENTER_NAME = MARS"), 8, "CENTER_NAME MARS with ITRF");
    d.refuse("centre-moon", set(g, 8, "CENTER_NAME = MOON"), 8, "CENTER_NAME MOON: not the body analysed");
    d.refuse("centre-sun", set(g, 8, "CENTER_NAME = SUN"), 8, "CENTER_NAME SUN");
    d.refuse("centre-emb", set(g, 8, "CENTER_NAME = EARTH BARYCENTER"), 8, "CENTER_NAME EARTH BARYCENTER");
    for (String ts : new String[] {"TDB", "TCB", "UT1", "MET", "GPST", "TCG"}) {
      d.refuse("ts-" + slug(ts), set(b, 10, "TIME_SYSTEM = " + ts), 10, "TIME_SYSTEM " + ts);
    }
    final String[] required = {"OBJECT_NAME", "OBJECT_ID", "CENTER_NAME", "REF_FRAME", "TIME_SYSTEM", "START_TIME",
      "STOP_TIME"};
    for (int k = 0; k < required.length; k++) {
      d.refuse("missing-" + slug(required[k]), remove(b, 6 + k), 12, "metadata without " + required[k]);
    }
    d.refuse("missing-creation", remove(b, 3), 4, "header without CREATION_DATE");
    d.refuse("missing-originator", remove(b, 4), 4, "header without ORIGINATOR");
    d.refuse("duplicate-key", set(b, 8, "REF_FRAME = ITRF2005"), 9, "REF_FRAME twice");
    d.refuse("unknown-key", set(b, 7, "FOO = 1"), 7, "unknown metadata keyword");
    d.refuse("empty-value", set(b, 6, "OBJECT_NAME ="), 6, "empty value");
    d.refuse("lower-key", set(b, 6, "object_name = X"), 6, "lower-case keyword");
    d.refuse("no-equals", set(b, 6, "OBJECT_NAME GPS"), 6, "keyword line without =");
    d.refuse("version-4", set(b, 1, "CCSDS_OEM_VERS = 4.0"), 1, "CCSDS_OEM_VERS 4.0");
    d.refuse("version-missing", remove(b, 1), 2, "no CCSDS_OEM_VERS line");
    d.refuse("message-id-v2", insert(b, 4, "MESSAGE_ID = 1"), 4, "MESSAGE_ID in version 2.0");
    d.refuse("creation-month-13", set(b, 3, "CREATION_DATE = 2026-13-01T00:00:00"), 3, "CREATION_DATE month 13");
    d.refuse("start-day-45", set(b, 11, "START_TIME = 2010-07-45T00:00:00"), 11, "START_TIME day 45");
    d.refuse("stop-hour-25", set(b, 12, "STOP_TIME = 2010-07-01T25:00:00"), 12, "STOP_TIME hour 25");
    d.refuse("stop-before-start", set(b, 12, "STOP_TIME = 2010-06-30T00:00:00"), 12, "STOP_TIME before START_TIME");
    d.refuse("useable-before-start", insert(b, 12, "USEABLE_START_TIME = 2010-06-30T00:00:00"), 12,
        "USEABLE_START_TIME before START_TIME");
    d.refuse("start-late", set(b, 11, "START_TIME = 2010-07-01T00:16:00"), data(0), "first epoch before START_TIME");
    d.refuse("stop-early", set(b, 12, "STOP_TIME = 2010-07-01T05:30:00"), data(23), "last epoch after STOP_TIME");
    d.refuse("interpolation", insert(b, 13, "INTERPOLATION = SPLINE"), 13, "INTERPOLATION SPLINE");
    d.refuse("interpolation-degree", insert(b, 13, "INTERPOLATION_DEGREE = 1.5"), 13, "INTERPOLATION_DEGREE 1.5");
    d.refuse("ref-frame-epoch", insert(b, 10, "REF_FRAME_EPOCH = 2000-13-01T00:00:00"), 10, "REF_FRAME_EPOCH month 13");
    d.refuse("meta-no-stop", remove(b, 13), 13, "META_STOP missing: the first ephemeris line is read as metadata");
  }

  private static void data(Dir d, List<String> b, List<String> g) {
    final String[] bad = {"NaN", "Infinity", "-Infinity", "1e400", "0x1p12", "1.0d", "1,5", "-", "1e", ".e3"};
    for (int i = 0; i < bad.length; i++) {
      d.refuse("x-" + slug(bad[i]), field(b, i, 1, bad[i]), data(i), "x '" + bad[i] + "'");
    }
    final String[] few = {"NaN", "Infinity", "1e999", "0x10"};
    for (int i = 0; i < few.length; i++) {
      d.refuse("vy-" + slug(few[i]), field(b, i + 10, 5, few[i]), data(i + 10), "vy '" + few[i] + "'");
      d.refuse("z-" + slug(few[i]), field(b, i + 14, 3, few[i]), data(i + 14), "z '" + few[i] + "'");
    }
    d.refuse("fields-5", set(b, data(3), b.get(data(3) - 1).substring(0, b.get(data(3) - 1).lastIndexOf(' '))),
        data(3), "ephemeris line with 5 numbers");
    d.refuse("fields-7", set(b, data(3), b.get(data(3) - 1) + " 0.0"), data(3), "ephemeris line with 7 numbers");
    d.refuse("accel-nan", set(b, data(3), b.get(data(3) - 1) + " 0 0 NaN"), data(3), "acceleration NaN");
    final String e = "2010-07-01T00:45:00.000";
    final String[][] epochs = {{"2010-13-01T00:45:00.000", "month 13"}, {"2010-07-45T00:45:00.000", "day 45"},
      {"2010-06-31T00:45:00.000", "June 31"}, {"2010-07-01T25:45:00.000", "hour 25"},
      {"2010-07-01T00:60:00.000", "minute 60"}, {"2010-07-01T00:45:75.000", "second 75"},
      {"2010-07-01T00:44:60.000", "second 60 in GPS time"}, {e + "Z", "Z terminator in GPS time"},
      {"2010-7-01T00:45:00", "one-digit month"}, {"2010-07-01 00:45:00", "space instead of T"},
      {"2010-07-01T00:45", "no seconds"}, {"2010-182T00:45:00.", "trailing point"}, {"NaN", "NaN epoch"}};
    for (String[] x : epochs) {
      d.refuse("epoch-" + slug(x[1]), field(b, 3, 0, x[0]), data(3), "epoch " + x[1]);
    }
    d.accept("epoch-doy", field(b, 3, 0, "2010-182T00:45:00.000"), "day-of-year epoch (182 = 1 July)");
    final List<String> swapped = new ArrayList<>(b);
    swapped.set(data(5) - 1, b.get(data(6) - 1));
    swapped.set(data(6) - 1, b.get(data(5) - 1));
    d.refuse("epochs-swapped", swapped, data(6), "two ephemeris lines swapped");
    d.refuse("epoch-repeated", set(b, data(6), b.get(data(5) - 1)), data(6), "an epoch repeated");
    d.refuse("comment-in-data", insert(b, data(5), "COMMENT here"), data(5), "COMMENT between ephemeris lines");
    d.refuse("keyword-in-data", insert(b, data(5), "OBJECT_NAME = X"), data(5), "keyword line among ephemeris lines");
    d.refuse("meta-stop-in-data", insert(b, data(5), "META_STOP"), data(5), "META_STOP without META_START");
    d.refuse("data-before-meta", insert(b, 5, b.get(data(0) - 1)), 5, "ephemeris line in the header");
    final List<String> utc = new ArrayList<>(g);
    utc.set(9, "TIME_SYSTEM = UTC");
    final List<String> zulu = new ArrayList<>(utc);
    for (int k = 0; k < 24; k++) {
      final String[] p = zulu.get(data(k) - 1).split(" ", 2);
      zulu.set(data(k) - 1, p[0] + "Z " + p[1]);
    }
    d.accept("utc-zulu", zulu, "UTC epochs with the Z terminator");
    d.refuse("utc-leap-60", field(utc, 3, 0, "2010-07-01T00:44:60.000"), data(3), "23:59:60 only on a leap day: "
        + "00:44:60 UTC refused");
  }

  private static final List<String> ROWS = Fixtures.COVARIANCE_ROWS;

  private static List<String> cov(List<String> rows, boolean terminated) {
    return Fixtures.oemWithCovariance(rows, terminated);
  }

  private static void covariance(Dir d, List<String> b) {
    d.refuse("cov-unterminated", cov(ROWS, false), 38, "COVARIANCE_START without STOP at the end");
    final List<String> next = cov(ROWS, false);
    next.addAll(b.subList(4, 37));
    d.refuse("cov-before-meta", next, 38, "COVARIANCE_START without STOP before the next segment");
    d.refuse("cov-5-rows", cov(ROWS.subList(0, 5), true), 46, "covariance with 5 rows");
    final List<String> neg = new ArrayList<>(ROWS);
    neg.set(2, "0 0 -1.0e-3");
    d.refuse("cov-negative", cov(neg, true), 43, "negative variance");
    final List<String> wide = new ArrayList<>(ROWS);
    wide.set(1, "1 2 3");
    d.refuse("cov-wide-row", cov(wide, true), 42, "covariance row with 3 numbers for 2");
    final List<String> nan = new ArrayList<>(ROWS);
    nan.set(4, "0 0 NaN 0 1.0e-9");
    d.refuse("cov-nan", cov(nan, true), 45, "covariance element NaN");
    d.refuse("cov-frame", set(cov(ROWS, true), 40, "COV_REF_FRAME = TEME"), 40, "COV_REF_FRAME TEME");
    d.refuse("cov-key", set(cov(ROWS, true), 40, "COV_FRAME = RTN"), 40, "unknown covariance keyword");
    d.refuse("cov-epoch", set(cov(ROWS, true), 39, "EPOCH = 2010-07-01T05:45:75"), 39,
        "covariance EPOCH second 75");
    final List<String> after = cov(ROWS, true);
    after.add(b.get(data(23) - 1));
    d.refuse("cov-data-after", after, 48, "ephemeris line after the covariance block");
    d.refuse("cov-version-1", set(cov(ROWS, true), 1, "CCSDS_OEM_VERS = 1.0"), 38,
        "covariance in an OEM of version 1.0");
    d.refuse("cov-no-epoch", set(cov(ROWS, true), 39, "COMMENT no epoch"), 40,
        "COV_REF_FRAME without EPOCH");
  }

  private static void segments(Dir d, List<String> b, List<String> g) {
    d.refuse("segment-gap", Fixtures.oemTwoSegments(false), 35, "segments leave 900 s uncovered");
    d.refuse("segment-overlap", set(Fixtures.oemTwoSegments(true), 33, "START_TIME = 2010-07-01T02:00:00"), 33,
        "second segment starts before the first ends");
    d.refuse("segment-centre", set(Fixtures.oemTwoSegments(true), 30, "CENTER_NAME = MOON"), 30,
        "second segment about the Moon");
    d.refuse("segment-frame", set(Fixtures.oemTwoSegments(true), 31, "REF_FRAME = TOD"), 31, "second segment in TOD");
    d.refuse("segment-no-stop", remove(Fixtures.oemTwoSegments(true), 35), 35, "second META_STOP missing");
    final List<String> one = new ArrayList<>(b.subList(0, 14));
    d.refuse("segment-one-line", one, 14, "segment with one ephemeris line");
    d.refuse("segment-few", new ArrayList<>(b.subList(0, 22)), 14, "segment of 9 samples (below one window)");
    d.refuse("header-only", new ArrayList<>(b.subList(0, 4)), 4, "header without a segment");
  }

  private static void plausibility(Dir d, List<String> g) {
    d.refuse("inside-earth", field(field(field(g, 8, 1, "3000.0"), 8, 2, "0.0"), 8, 3, "0.0"), data(8),
        "position 3000 km from the centre");
    d.refuse("jump-50km", shift(g, 8, 1, 50.0), data(8), "position 50 km off");
    d.refuse("jump-velocity", shift(g, 8, 5, 0.01), data(8), "velocity 10 m/s off");
    d.refuse("faster-than-light", shift(g, 8, 4, 4.0e5), data(8), "400 000 km/s");
    d.refuse("above-escape", field(field(field(g, 0, 4, "9.0"), 0, 5, "0.0"), 0, 6, "0.0"), data(0),
        "9 km/s at GPS radius (escape 5.5 km/s)");
    d.refuse("far", field(field(g, 8, 1, "3000000.0"), 8, 2, "0.0"), data(8), "3 million km away");
    d.refuse("frame-mislabel", set(Bases.oem("ITRF2005"), 9, "REF_FRAME = GCRF"), data(1),
        "Earth-fixed states labelled GCRF: the energy changes between samples");
  }

  private static void bytes(Dir d, List<String> b) {
    d.refuseBytes("utf8-name", withByte(b, 6, 16, 0xC3), 6, "byte 0xC3 in OBJECT_NAME");
    d.refuseBytes("ff-data", withByte(b, data(4), 30, 0xFF), data(4), "byte 0xFF in an ephemeris line");
    d.refuseBytes("nul-meta", withByte(b, 9, 3, 0x00), 9, "NUL in REF_FRAME");
    d.refuseBytes("esc-comment", withByte(b, 2, 9, 0x1B), 2, "ESC in a comment");
  }
}
