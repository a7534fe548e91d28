package org.eigenzeit.ground.trajectory;

import org.eigenzeit.ground.instant.Instants;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** An OEM round trip keeps the proper time (the reader tests are Sp3FileTest, OemFileTest, RinexNavFileTest). */
class ReadersTest {
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
    l.add("START_TIME = " + calendar(tr.t0(), 0));
    l.add("STOP_TIME = " + calendar(tr.t0(), tr.spanS()));
    l.add("META_STOP");
    final double[] r = new double[3];
    final double[] v = new double[3];
    for (double t = 0; t <= tr.spanS(); t += step) {
      tr.state(t, r, v);
      l.add(String.format(Locale.ROOT, "%s %.9f %.9f %.9f %.12f %.12f %.12f", calendar(tr.t0(), t),
          r[0] / 1e3, r[1] / 1e3, r[2] / 1e3, v[0] / 1e3, v[1] / 1e3, v[2] / 1e3));
    }
    return l;
  }

  /** The CCSDS calendar form of t0 + t (TT labels). */
  static String calendar(SplitTime t0, double t) {
    final SplitTime e = SplitTime.of(t0.wholeSeconds(), t0.fractionS());
    Instants.shift(e, t);
    final double secOfDay = (e.wholeSeconds() + 43_200L) % 86_400L + e.fractionS();
    final long day = Math.floorDiv(e.wholeSeconds() + 43_200L, 86_400L);
    final int[] ymd = CalendarMath.calendarOf(2_451_545L + day);
    final int h = (int) (secOfDay / 3600);
    final int mi = (int) ((secOfDay - h * 3600) / 60);
    final double s = secOfDay - h * 3600 - mi * 60;
    return String.format(Locale.ROOT, "%04d-%02d-%02dT%02d:%02d:%012.9f", ymd[0], ymd[1], ymd[2], h, mi, s);
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
}
