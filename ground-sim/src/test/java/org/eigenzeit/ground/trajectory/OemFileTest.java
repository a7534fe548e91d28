package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.input.InputException;
import org.junit.jupiter.api.Test;

/**
 * CCSDS OEM reading against CCSDS 502.0-B-2 section 5 (keywords, mandatory metadata, segments,
 * covariance blocks) on OEMs of a real GPS orbit (IGS final, G05, 2010-07-01; {@link Fixtures#oem}).
 * In those files line 8 is CENTER_NAME, 9 REF_FRAME, 10 TIME_SYSTEM, 11 START_TIME, 12
 * STOP_TIME, 13 META_STOP, and ephemeris line k (from 0) is line 14 + k.
 */
class OemFileTest {
  private static List<String> itrf() {
    return new ArrayList<>(Fixtures.oem("ITRF2005", 24));
  }

  private static String refusal(List<String> lines) {
    return assertThrows(InputException.class, () -> OemFile.parse("t.oem", lines)).getMessage();
  }

  private static void starts(String prefix, List<String> lines) {
    final String m = refusal(lines);
    assertTrue(m.startsWith(prefix), m);
  }

  private static List<String> set(List<String> lines, int lineNo, String text) {
    lines.set(lineNo - 1, text);
    return lines;
  }

  private static List<String> withFrame(String frame) {
    return set(itrf(), 9, "REF_FRAME = " + frame);
  }

  @Test
  void acceptedFramesGiveTheSameInertialOrbit() {
    final ExternalTrajectory e = ExternalTrajectory.fromOem(OemFile.parse("e.oem", itrf()), -66.25);
    final ExternalTrajectory g = ExternalTrajectory.fromOem(OemFile.parse("g.oem", Fixtures.oem("GCRF", 24)), -66.25);
    final ExternalTrajectory j = ExternalTrajectory.fromOem(OemFile.parse("j.oem", Fixtures.oem("EME2000", 24)), -66.25);
    final double[][] r = new double[3][3];
    final double[][] v = new double[3][3];
    double worst = 0;
    for (double t = 0; t <= 23 * 900; t += 900) {
      e.inertialState(t, r[0], v[0]);
      g.inertialState(t, r[1], v[1]);
      j.inertialState(t, r[2], v[2]);
      for (int c = 0; c < 3; c++) {
        worst = Math.max(worst, Math.max(Math.abs(r[0][c] - r[1][c]), Math.abs(r[2][c] - r[1][c])));
        assertEquals(v[1][c], v[0][c], 1e-5);
        assertEquals(v[1][c], v[2][c], 1e-5);
      }
    }
    // Written with 1 mm resolution; the frame bias alone would leave about 3 m at GPS altitude.
    assertTrue(worst < 2e-3, "worst " + worst);
    final OemFile f = OemFile.parse("t.oem", itrf());
    assertEquals(OemFile.Frame.EARTH_FIXED, f.segments().get(0).frame());
    assertEquals("ITRF2005", f.metadata("REF_FRAME"));
    assertEquals(24, f.samples().size());
    assertEquals(14, f.samples().get(0).line());
    for (String ok : new String[] {"ITRF", "ITRF-93", "ITRF-97", "ITRF2000", "ITRF2008", "ITRF2014", "ITRF2020"}) {
      assertEquals(OemFile.Frame.EARTH_FIXED, OemFile.parse("t.oem", withFrame(ok)).segments().get(0).frame());
    }
    assertEquals(OemFile.Frame.GCRS, OemFile.parse("t.oem", withFrame("ICRF")).segments().get(0).frame());
    assertEquals(OemFile.Frame.EME2000, OemFile.parse("t.oem", withFrame("EME2000")).segments().get(0).frame());
  }

  @Test
  void framesWeCannotTransformAreRefusedByName() {
    for (String bad : new String[] {"TEME", "TOD", "MOD", "J2000", "ITRF2099", "ITRF-2000", "EME2000X", "TDR", "GRC"}) {
      starts("t.oem:9: REF_FRAME " + bad + " not supported (Eigenzeit does not transform it), allowed ITRF",
          withFrame(bad));
    }
  }

  @Test
  void theCentreMustBeTheBodyAnalysed() {
    starts("t.oem:8: CENTER_NAME MARS with the Earth-fixed REF_FRAME ITRF2005, allowed only EARTH",
        set(itrf(), 8, "CENTER_NAME = MARS"));
    final OemFile moon = OemFile.parse("t.oem", set(new ArrayList<>(Fixtures.oem("GCRF", 24)), 8, "CENTER_NAME = MOON"));
    assertEquals("t.oem:8: CENTER_NAME MOON: the trajectory must be about the body analysed, allowed EARTH",
        assertThrows(InputException.class, () -> ExternalTrajectory.fromOem(moon, -66.25)).getMessage());
  }

  @Test
  void segmentsKeepTheirOwnMetadataAndAreInterpolatedApart() {
    final OemFile two = OemFile.parse("t.oem", Fixtures.oemTwoSegments(false));
    assertEquals(2, two.segments().size());
    assertEquals("ITRF2005", two.segments().get(0).metadata("REF_FRAME"));
    assertEquals("GCRF", two.segments().get(1).metadata("REF_FRAME"));
    assertEquals(OemFile.Frame.EARTH_FIXED, two.segments().get(0).frame());
    assertEquals(OemFile.Frame.GCRS, two.segments().get(1).frame());
    assertEquals(12, two.segments().get(1).samples().size());
    assertEquals(26, two.segments().get(1).metaStartLine());
    assertEquals(32, two.segments().get(1).metadataLine("START_TIME"));
    assertEquals("t.oem:26: the file has 2 segments, this use needs exactly one (see segments())",
        assertThrows(InputException.class, two::samples).getMessage());
    // The first segment ends at 02:45, the second starts at 03:00: nothing covers the 900 s between.
    assertEquals("t.oem:35: gap of 900.000 s between this segment and the previous one, allowed none (a trajectory "
        + "must be continuous)", assertThrows(InputException.class, () -> ExternalTrajectory.fromOem(two, -66.25))
        .getMessage());
    // A shared boundary epoch (as at a manoeuvre) joins the segments; each is interpolated on its own.
    final ExternalTrajectory split = ExternalTrajectory.fromOem(OemFile.parse("t.oem", Fixtures.oemTwoSegments(true)), -66.25);
    final ExternalTrajectory whole = ExternalTrajectory.fromOem(OemFile.parse("w.oem", itrf()), -66.25);
    final double[] r1 = new double[3];
    final double[] v1 = new double[3];
    final double[] r2 = new double[3];
    final double[] v2 = new double[3];
    for (double t = 0; t <= 23 * 900; t += 900) {
      split.inertialState(t, r1, v1);
      whole.inertialState(t, r2, v2);
      for (int c = 0; c < 3; c++) {
        assertEquals(r2[c], r1[c], 2e-3, "t = " + t);
      }
    }
    final List<String> overlap = Fixtures.oemTwoSegments(true);
    overlap.set(32, "START_TIME = 2010-07-01T02:00:00");
    starts("t.oem:33: START_TIME 2010-07-01T02:00:00 before the STOP_TIME of the previous segment (line 12)", overlap);
    final List<String> early = Fixtures.oemTwoSegments(true);
    early.set(35, early.get(25).replace("03:00:00", "02:30:00"));
    early.set(32, "START_TIME = 2010-07-01T03:00:00");
    starts("t.oem:36: epoch 2010-07-01T02:30:00.000 outside the segment's START_TIME", early);
  }

  private static final List<String> ROWS = Fixtures.COVARIANCE_ROWS;

  private static List<String> cov(List<String> rows, boolean terminated) {
    return Fixtures.oemWithCovariance(rows, terminated);
  }

  @Test
  void covarianceBlocksMustBeCompleteAndTerminated() {
    assertEquals(24, OemFile.parse("t.oem", cov(ROWS, true)).samples().size());
    assertEquals("t.oem:38: COVARIANCE_START without COVARIANCE_STOP before the end of the file",
        refusal(cov(ROWS, false)));
    final List<String> next = cov(ROWS, false);
    next.addAll(itrf().subList(4, 13));
    starts("t.oem:38: COVARIANCE_START without COVARIANCE_STOP before META_START at line 47", next);
    starts("t.oem:46: covariance matrix incomplete: found 5 rows, allowed 6", cov(ROWS.subList(0, 5), true));
    final List<String> neg = new ArrayList<>(ROWS);
    neg.set(2, "0 0 -1.0e-3");
    starts("t.oem:43: covariance variance (diagonal): found -1.0e-3, allowed 0 or more", cov(neg, true));
    final List<String> wide = new ArrayList<>(ROWS);
    wide.set(1, "1 2 3");
    starts("t.oem:42: covariance row 2: found 3 numbers, allowed 2 (lower triangle)", cov(wide, true));
    final List<String> nan = new ArrayList<>(ROWS);
    nan.set(0, "NaN");
    starts("t.oem:41: covariance element: not a decimal number, found 'NaN'", cov(nan, true));
    final List<String> after = cov(ROWS, true);
    after.add(itrf().get(20));
    starts("t.oem:48: ephemeris line after the segment's covariance block (line 38)", after);
    final List<String> frame = cov(ROWS, true);
    frame.set(39, "COV_REF_FRAME = TEME");
    starts("t.oem:40: REF_FRAME TEME not supported", frame);
  }

  @Test
  void epochsMustIncreaseAndTheOffendingLineIsNamed() {
    final List<String> swapped = itrf();
    final String a = swapped.get(19);
    swapped.set(19, swapped.get(20));
    swapped.set(20, a);
    starts("t.oem:21: epochs must increase, found 2010-07-01T01:30:00.000, allowed after the epoch of line 20", swapped);
    final List<String> same = itrf();
    same.set(20, same.get(19));
    starts("t.oem:21: epochs must increase", same);
    starts("t.oem:14: epoch 2010-07-01T00:00:00.000 outside the segment's START_TIME",
        set(itrf(), 11, "START_TIME = 2010-07-01T00:16:00"));
    starts("t.oem:12: STOP_TIME 2010-06-30T00:00:00 before START_TIME", set(itrf(), 12, "STOP_TIME = 2010-06-30T00:00:00"));
    // USEABLE_START_TIME and USEABLE_STOP_TIME inside START..STOP and in order.
    final List<String> useable = insert(insert(itrf(), 12, "USEABLE_START_TIME = 2010-07-01T01:00:00"), 13,
        "USEABLE_STOP_TIME = 2010-07-01T04:00:00");
    OemFile.parse("t.oem", useable);
    starts("t.oem:13: USEABLE_START_TIME 2010-06-30T01:00:00 before START_TIME",
        set(new ArrayList<>(useable), 13, "USEABLE_START_TIME = 2010-06-30T01:00:00"));
    starts("t.oem:12: STOP_TIME 2010-07-01T05:45:00 before USEABLE_STOP_TIME",
        set(new ArrayList<>(useable), 14, "USEABLE_STOP_TIME = 2010-07-01T06:00:00"));
    starts("t.oem:14: USEABLE_STOP_TIME 2010-07-01T00:30:00 before USEABLE_START_TIME",
        set(new ArrayList<>(useable), 14, "USEABLE_STOP_TIME = 2010-07-01T00:30:00"));
  }

  @Test
  void everyNumberAndEpochIsChecked() {
    for (String bad : new String[] {"NaN", "Infinity", "1e400", "0x1p12", "1.0d", "-", "1,5"}) {
      final List<String> l = itrf();
      final String[] f = l.get(14).split(" ");
      f[1] = bad;
      starts("t.oem:15: x (km): ", set(l, 15, String.join(" ", f)));
    }
    final List<String> v = itrf();
    final String[] f = v.get(14).split(" ");
    f[5] = "NaN";
    starts("t.oem:15: vy (km/s): not a decimal number", set(v, 15, String.join(" ", f)));
    starts("t.oem:15: month: out of range, found 13", set(itrf(), 15, itrf().get(14).replace("2010-07-01", "2010-13-01")));
    starts("t.oem:15: ephemeris line needs an epoch and 6 (or 9) numbers, found 7",
        set(itrf(), 15, itrf().get(14) + " 0.0"));
    final List<String> acc = itrf();
    acc.set(14, acc.get(14) + " 0 0 NaN");
    starts("t.oem:15: az (km/s^2): not a decimal number", acc);
    acc.set(14, itrf().get(14) + " 0 0 0");
    OemFile.parse("t.oem", acc);
  }

  @Test
  void keywordsAreKnownRequiredAndUnique() {
    final List<String> noId = itrf();
    noId.remove(6);
    starts("t.oem:12: metadata lacks OBJECT_ID (required before META_STOP)", noId);
    starts("t.oem:9: REF_FRAME given twice in one metadata block (first at line 8)",
        set(itrf(), 8, "REF_FRAME = ITRF2005"));
    starts("t.oem:7: unknown metadata keyword 'FOO', allowed OBJECT_NAME", set(itrf(), 7, "FOO = 1"));
    starts("t.oem:6: OBJECT_NAME: empty value", set(itrf(), 6, "OBJECT_NAME ="));
    starts("t.oem:6: malformed keyword, found 'object_name'", set(itrf(), 6, "object_name = X"));
    starts("t.oem:6: keyword line without '='", set(itrf(), 6, "OBJECT_NAME GPS"));
    starts("t.oem:10: time system not supported, found 'TDB', allowed TT, TAI, GPS, UTC",
        set(itrf(), 10, "TIME_SYSTEM = TDB"));
    final List<String> noDate = itrf();
    noDate.remove(2);
    starts("t.oem:4: header lacks CREATION_DATE (required before META_START)", noDate);
    starts("t.oem:3: day of month 2026-2: out of range, found 30", set(itrf(), 3, "CREATION_DATE = 2026-02-30T00:00:00"));
    starts("t.oem:4: MESSAGE_ID in an OEM of version 2.0", insert(itrf(), 3, "MESSAGE_ID = 1"));
    starts("t.oem:1: CCSDS_OEM_VERS: found '4.0', allowed 1.0, 2.0 or 3.0", set(itrf(), 1, "CCSDS_OEM_VERS = 4.0"));
    starts("t.oem:1: CCSDS_OEM_VERS must come first", set(itrf(), 1, "ORIGINATOR = X"));
    starts("t.oem:13: INTERPOLATION: found 'SPLINE', allowed HERMITE, LAGRANGE or LINEAR",
        insert(itrf(), 12, "INTERPOLATION = SPLINE"));
    starts("t.oem:13: INTERPOLATION_DEGREE: out of range, found 0", insert(itrf(), 12, "INTERPOLATION_DEGREE = 0"));
    OemFile.parse("t.oem", insert(insert(itrf(), 12, "INTERPOLATION = LAGRANGE"), 13, "INTERPOLATION_DEGREE = 9"));
    starts("t.oem:16: COMMENT between ephemeris lines", insert(itrf(), 15, "COMMENT x"));
    starts("t.oem:16: keyword line among the ephemeris lines", insert(itrf(), 15, "OBJECT_NAME = X"));
    starts("t.oem:16: META_STOP without its start line", insert(itrf(), 15, "META_STOP"));
    final List<String> one = new ArrayList<>(itrf().subList(0, 14));
    starts("t.oem:14: segment of line 5 has 1 ephemeris lines, allowed 2 or more", one);
    starts("t.oem:5: META_START without META_STOP", new ArrayList<>(itrf().subList(0, 12)));
    starts("t.oem:1: not an OEM: no CCSDS_OEM_VERS line", List.of("", "COMMENT only"));
    starts("t.oem:4: no segment (META_START) after the header", new ArrayList<>(itrf().subList(0, 4)));
  }

  private static List<String> insert(List<String> l, int index, String line) {
    l.add(index, line);
    return l;
  }

  @Test
  void utcEpochsWithTheZuluTerminatorAreAccepted() {
    final List<String> l = itrf();
    l.set(9, "TIME_SYSTEM = UTC");
    for (int i = 13; i < l.size(); i++) {
      final String[] f = l.get(i).split(" ", 2);
      l.set(i, f[0] + "Z " + f[1]);
    }
    assertEquals(24, OemFile.parse("t.oem", l).samples().size());
  }
}
