package org.eigenzeit.ground.trajectory;

import org.eigenzeit.ground.instant.Instants;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** Readers: malformed input gives the file and line number; an OEM round trip keeps the proper time. */
class ReadersTest {
  private static List<String> sp3Lines() throws IOException {
    return Files.readAllLines(RealSatelliteCheckTest.resource("igs15904.sp3"), StandardCharsets.US_ASCII);
  }

  private static String message(Runnable r) {
    return assertThrows(TrajectoryFormatException.class, r::run).getMessage();
  }

  @Test
  void sp3ErrorsNameTheLine() throws IOException {
    final List<String> ok = sp3Lines();
    assertEquals(32, Sp3File.parse("ok.sp3", ok).satelliteIds().size());
    final List<String> bad = new ArrayList<>(ok);
    bad.set(23, bad.get(23).substring(0, 20) + "x" + bad.get(23).substring(21));
    assertTrue(message(() -> Sp3File.parse("bad.sp3", bad)).startsWith("bad.sp3:24: unreadable number"));
    final List<String> cut = new ArrayList<>(ok.subList(0, 200));
    assertTrue(message(() -> Sp3File.parse("cut.sp3", cut)).contains("missing EOF"));
    assertTrue(message(() -> Sp3File.parse("v.sp3", List.of("#a"))).contains("version 'a'"));
    assertTrue(message(() -> Sp3File.parse("e.sp3", List.of())).startsWith("e.sp3:1:"));
    final List<String> back = new ArrayList<>(ok);
    back.add(60, "*  2009  7  1  0  0  0.00000000");
    assertTrue(message(() -> Sp3File.parse("b.sp3", back)).contains("epochs must increase"));
    final List<String> shortRec = new ArrayList<>(ok);
    shortRec.set(23, "PG01  1.0");
    assertTrue(message(() -> Sp3File.parse("s.sp3", shortRec)).startsWith("s.sp3:24: position record too short"));
  }

  @Test
  void rinexErrorsNameTheLine() throws IOException {
    final List<String> ok = Files.readAllLines(RealSatelliteCheckTest.resource("brdc1820.10n"), StandardCharsets.US_ASCII);
    assertTrue(RinexNavFile.parse("ok.n", ok).records().size() > 300);
    final List<String> bad = new ArrayList<>(ok);
    bad.set(9, bad.get(9).substring(0, 5) + "abc" + bad.get(9).substring(8));
    assertTrue(message(() -> RinexNavFile.parse("bad.n", bad)).startsWith("bad.n:10: unreadable number"));
    assertTrue(message(() -> RinexNavFile.parse("x.n", List.of("hello"))).contains("not a RINEX file"));
    final List<String> cut = new ArrayList<>(ok.subList(0, ok.size() - 3));
    assertTrue(message(() -> RinexNavFile.parse("cut.n", cut)).contains("incomplete navigation record"));
  }

  static List<String> oemLines(ReferenceTrajectory tr, double step) {
    final List<String> l = new ArrayList<>();
    l.add("CCSDS_OEM_VERS = 2.0");
    l.add("COMMENT Eigenzeit test trajectory (invented scenario)");
    l.add("CREATION_DATE = 2026-12-01T00:00:00");
    l.add("ORIGINATOR = EIGENZEIT");
    l.add("META_START");
    l.add("OBJECT_NAME = TESTSAT");
    l.add("OBJECT_ID = 2026-999A");
    l.add("CENTER_NAME = EARTH");
    l.add("REF_FRAME = GCRF");
    l.add("TIME_SYSTEM = TT");
    l.add("META_STOP");
    final double[] r = new double[3];
    final double[] v = new double[3];
    for (double t = 0; t <= tr.spanS(); t += step) {
      tr.state(t, r, v);
      final SplitTime e = tr.t0();
      Instants.shift(e, t);
      final double secOfDay = (e.wholeSeconds() + 43_200L) % 86_400L + e.fractionS();
      final long day = Math.floorDiv(e.wholeSeconds() + 43_200L, 86_400L);
      final long jdn = 2_451_545L + day;
      // Gregorian date of the JDN (Fliegel and van Flandern 1968, inverse)
      final long a = jdn + 32044;
      final long b = (4 * a + 3) / 146097;
      final long c = a - 146097 * b / 4;
      final long d = (4 * c + 3) / 1461;
      final long ee = c - 1461 * d / 4;
      final long m = (5 * ee + 2) / 153;
      final long dd = ee - (153 * m + 2) / 5 + 1;
      final long mm = m + 3 - 12 * (m / 10);
      final long yy = 100 * b + d - 4800 + m / 10;
      final int h = (int) (secOfDay / 3600);
      final int mi = (int) ((secOfDay - h * 3600) / 60);
      final double s = secOfDay - h * 3600 - mi * 60;
      l.add(String.format(Locale.ROOT, "%04d-%02d-%02dT%02d:%02d:%012.9f %.9f %.9f %.9f %.12f %.12f %.12f",
          yy, mm, dd, h, mi, s, r[0] / 1e3, r[1] / 1e3, r[2] / 1e3, v[0] / 1e3, v[1] / 1e3, v[2] / 1e3));
    }
    return l;
  }

  @Test
  void oemRoundTripKeepsTheProperTime() {
    // Reference trajectory written as an OEM at 60 s, read back, interpolated, proper time
    // recomputed along it: agreement with the reference's own integral.
    final SplitTime t0 = SplitTime.of(846_000_000L, 0.0);
    final ReferenceConfig cfg = ReferenceConfig.earth(8);
    final double[] r0 = {2.6e7, 0, 0};
    final double v = Math.sqrt(3.986004415e14 / 2.6e7);
    final double[] v0 = {0, v * 0.6, v * 0.8};
    final ReferenceTrajectory tr = new ReferencePropagator(cfg).propagate(t0, r0, v0, 21_600);
    final OemFile oem = OemFile.parse("t.oem", oemLines(tr, 60));
    assertEquals("GCRF", oem.metadata("REF_FRAME"));
    final ExternalTrajectory ext = ExternalTrajectory.fromOem(oem, -69.2);
    assertEquals(0.0, ext.t0Tt().secondsSince(t0), 1e-6);
    final double along = ext.properTimeOffsetS(cfg, 21_000);
    final double ref = tr.properTimeOffsetS(21_000);
    System.out.printf("OEM round trip (60 s, Lagrange 10): proper time differs by %.2e s over 21000 s%n", along - ref);
    assertEquals(ref, along, 1e-14);
  }

  @Test
  void oemErrorsNameTheLine() {
    final List<String> base = List.of("CCSDS_OEM_VERS = 2.0", "META_START", "CENTER_NAME = EARTH", "REF_FRAME = GCRF",
        "TIME_SYSTEM = UTC", "META_STOP", "2026-10-01T00:00:00 7000 0 0 0 7.5 0",
        "2026-10-01T00:01:00 7000 450 0 -0.5 7.5 0");
    final OemFile ok = OemFile.parse("ok.oem", base);
    assertEquals(2, ok.samples().size());
    assertEquals(60.0, ok.samples().get(1).epochTt().secondsSince(ok.samples().get(0).epochTt()), 1e-9);
    final List<String> few = new ArrayList<>(base);
    few.set(7, "2026-10-01T00:01:00 7000 450 0 -0.5 7.5");
    assertTrue(message(() -> OemFile.parse("few.oem", few)).startsWith("few.oem:8: ephemeris line needs"));
    final List<String> ts = new ArrayList<>(base);
    ts.set(4, "TIME_SYSTEM = TCB");
    assertTrue(message(() -> OemFile.parse("ts.oem", ts)).contains("TIME_SYSTEM TCB not supported"));
    final List<String> noframe = new ArrayList<>(base);
    noframe.remove(3);
    assertTrue(message(() -> OemFile.parse("nf.oem", noframe)).contains("lacks REF_FRAME"));
    final List<String> date = new ArrayList<>(base);
    date.set(6, "2026-13-01T0 7000 0 0 0 7.5 0");
    assertTrue(message(() -> OemFile.parse("d.oem", date)).startsWith("d.oem:7: unreadable epoch"));
    assertTrue(message(() -> OemFile.parse("v.oem", List.of("META_START"))).contains("CCSDS_OEM_VERS must come first"));
    final List<String> doy = new ArrayList<>(base);
    doy.set(6, "2026-274T00:00:00 7000 0 0 0 7.5 0");
    assertEquals(0.0, OemFile.parse("doy.oem", doy).samples().get(0).epochTt()
        .secondsSince(ok.samples().get(0).epochTt()), 1e-9); // day 274 of 2026 = 1 October
  }
}
