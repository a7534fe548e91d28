package org.eigenzeit.ground.gnss;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The new readers on real files, and each refusing a malformed file with {@code file:line:}.
 * Expected header values are those the IGS files themselves state (line 2 of the SP3, the
 * RINEX headers); the readers compute week and seconds from the epochs and must agree.
 */
class GnssReadersTest {
  private static String refused(Executable e) {
    return assertThrows(InputException.class, e).getMessage();
  }

  @Test
  void sp3HeadersOfRealProducts() {
    final Sp3Header igs = Sp3Header.parse("igs15904.sp3", GnssFixtures.lines("2010-07-01", "igs15904.sp3.gz"));
    assertEquals(1590, igs.headerWeek());
    assertEquals(345_600.0, igs.headerSecondsOfWeek());
    assertEquals(96, igs.epochCount());
    assertEquals(900.0, igs.intervalS());
    assertEquals("IGS", igs.agency());
    assertEquals("IGS05", igs.coordinateSystem());
    assertEquals("G", igs.fileType());
    assertEquals(List.of("cod", "emr", "esa", "gfz", "grg", "jpl", "mit", "ngs", "sio"), igs.analysisCentres());
    assertEquals(32, igs.satellites().size());
    final Sp3Header glo = Sp3Header.parse("igl16295.sp3", GnssFixtures.lines("2011-04-01", "igl16295.sp3.gz"));
    assertEquals("R", glo.fileType());
    assertEquals(22, glo.satellites().size());
    // The ultra-rapid product: 96 observed epochs, then 96 with the orbit-prediction flag.
    final Sp3Header igu = Sp3Header.parse("igu16295_00.sp3", GnssFixtures.lines("2011-04-01", "igu16295_00.sp3.gz"));
    assertEquals(192, igu.epochCount());
    for (String id : igu.satellites()) {
      final List<Integer> p = igu.predictedEpochs(id);
      assertEquals(96, p.size(), id);
      assertEquals(96, (int) p.get(0), id);
    }
    final PreciseOrbit orbit = PreciseOrbit.read(GnssFixtures.day("2011-04-01").resolve("igu16295_00.sp3.gz"));
    final double first = orbit.firstGpsS();
    assertEquals(1629, GnssTimeSystem.gpsWeek(first));
    assertEquals(345_600.0, GnssTimeSystem.secondsOfWeek(first));
    assertTrue(!orbit.predicted("G05", first + 12 * 3600) && orbit.predicted("G05", first + 36 * 3600));
  }

  @Test
  void sp3DefectsAreRefusedWithFileAndLine() {
    final List<String> ok = GnssFixtures.lines("2010-07-01", "igs15904.sp3.gz");
    final List<String> week = new java.util.ArrayList<>(ok);
    week.set(1, "## 1591" + ok.get(1).substring(7));
    assertTrue(refused(() -> Sp3Header.parse("w.sp3", week)).startsWith("w.sp3:2: GPS week and seconds disagree"));
    final List<String> ts = new java.util.ArrayList<>(ok);
    ts.set(12, ts.get(12).substring(0, 9) + "XYZ" + ts.get(12).substring(12));
    final String tsMsg = refused(() -> PreciseOrbit.parse("t.sp3", ts));
    assertTrue(tsMsg.startsWith("t.sp3:13: time system: not supported, found 'XYZ'"), tsMsg);
    final List<String> flag = new java.util.ArrayList<>(ok);
    final int p = 23;
    flag.set(p, String.format("%-79sX", flag.get(p)));
    assertTrue(refused(() -> Sp3Header.parse("f.sp3", flag)).startsWith("f.sp3:24: orbit prediction flag (column 80): found 'X'"));
    final List<String> sat = new java.util.ArrayList<>(ok);
    sat.set(p, "PG33" + sat.get(p).substring(4));
    assertTrue(refused(() -> Sp3Header.parse("s.sp3", sat)).startsWith("s.sp3:24: satellite G33 is not in the header"));
    final List<String> month = new java.util.ArrayList<>(ok);
    month.set(0, month.get(0).substring(0, 8) + "13" + month.get(0).substring(10));
    assertTrue(refused(() -> Sp3Header.parse("m.sp3", month)).startsWith("m.sp3:1: month (columns 9-10): out of range"));
  }

  @Test
  void aCutProductIsUsedWithAWarningAndALongerOneRefused() {
    // IGS's predicted half of an ultra-rapid orbit: line 1 of the 48 h file kept over 24 h of epochs.
    final List<String> full = GnssFixtures.lines("2011-04-01", "igu16295_00.sp3.gz");
    int second = -1;
    int count = 0;
    for (int i = 0; i < full.size(); i++) {
      if (full.get(i).startsWith("*") && ++count == 97) {
        second = i;
      }
    }
    final int header = 22;
    final List<String> cut = new java.util.ArrayList<>(full.subList(0, header));
    cut.addAll(full.subList(second, full.size()));
    final Sp3Header h = Sp3Header.parse("cut.sp3", cut);
    assertEquals(List.of("cut.sp3:1: line 1 announces 192 epochs, the file holds 96 (a cut product; its epochs are used as they are)",
        "cut.sp3:1: the first epoch is 86400 s after the start of line 1 (a cut product)"), h.warnings());
    assertEquals(List.of(), Sp3Header.parse("igu.sp3", full).warnings());
    final List<String> longer = new java.util.ArrayList<>(full);
    longer.set(0, longer.get(0).substring(0, 32) + "    191" + longer.get(0).substring(39));
    assertTrue(refused(() -> Sp3Header.parse("l.sp3", longer)).startsWith("l.sp3:1: number of epochs: line 1 says 191, the file holds 192"));
  }

  @Test
  void navigationFilesOfThreeSystems() {
    final NavFile gps = NavFile.parse("brdc1820.10n", GnssFixtures.lines("2010-07-01", "brdc1820.10n.gz"));
    assertEquals(Constellation.GPS, gps.system());
    assertEquals(421, gps.keplerRecords().size());
    final KeplerRecord first = gps.keplerRecords().get(0);
    assertEquals("G01", first.id());
    assertEquals(63, first.health());
    assertEquals(1590 * 604_800.0 + 345_600.0, first.toeGpsS());
    assertEquals(first.toeGpsS(), first.tocGpsS());
    final NavFile qzs = NavFile.read(GnssFixtures.day("2012-10-31").resolve("brdc3050.12q.gz"));
    assertEquals(Constellation.QZSS, qzs.system());
    assertEquals("J01", qzs.keplerRecords().get(0).id());
    assertEquals(6493.972862244, qzs.keplerRecords().get(0).get(KeplerRecord.SQRT_A), 1e-9);
    final NavFile glo = NavFile.read(GnssFixtures.day("2012-10-31").resolve("brdc3050.12g.gz"));
    assertEquals(Constellation.GLONASS, glo.system());
    assertEquals(16, glo.leapSeconds());
    assertEquals(null, glo.leapSecondsNote(), "GPS - UTC = 16 s on 2012-10-31 (SOFA dat 35 - 19)");
    final List<String> wrongLeap = GnssFixtures.lines("2012-10-31", "brdc3050.12g.gz");
    wrongLeap.set(2, "    15" + wrongLeap.get(2).substring(6));
    assertEquals("l.12g:3: LEAP SECONDS says 15 s, the leap-second table gives GPS - UTC = 16 s at the first record;"
        + " the table is used", NavFile.parse("l.12g", wrongLeap).leapSecondsNote());
    final GlonassRecord r03 = glo.glonassRecords().get(0);
    assertEquals("R03", r03.id());
    assertEquals(-23_809_821.28906, r03.positionM()[0], 1e-3);
    // 2012-10-31 00:15:00 UTC = 00:15:16 GPS (GPS - UTC = 16 s, the file's own LEAP SECONDS line)
    assertEquals("2012-10-31T00:15:16.000", GnssTimeSystem.gpsCalendar(r03.tbGpsS()));
  }

  @Test
  void navigationDefectsAreRefusedWithFileAndLine() {
    final List<String> ok = GnssFixtures.lines("2010-07-01", "brdc1820.10n.gz");
    final List<String> num = new java.util.ArrayList<>(ok);
    num.set(9, num.get(9).substring(0, 3) + "   0.9000000000Q+02" + num.get(9).substring(22));
    assertTrue(refused(() -> NavFile.parse("n.10n", num)).startsWith("n.10n:10: IODE (columns 4-22): not a decimal number"));
    final List<String> nan = new java.util.ArrayList<>(ok);
    nan.set(10, nan.get(10).substring(0, 3) + "                NaN" + nan.get(10).substring(22));
    assertTrue(refused(() -> NavFile.parse("x.10n", nan)).startsWith("x.10n:11: Cuc (columns 4-22): not a decimal number, found 'NaN'"));
    final List<String> cut = new java.util.ArrayList<>(ok.subList(0, ok.size() - 3));
    assertTrue(refused(() -> NavFile.parse("c.10n", cut)).contains("incomplete navigation record"));
    final List<String> day = new java.util.ArrayList<>(ok);
    day.set(8, " 1 10  6 31" + ok.get(8).substring(11));
    assertTrue(refused(() -> NavFile.parse("d.10n", day)).startsWith("d.10n:9: day of month 2010-6: out of range"));
    final List<String> shifted = new java.util.ArrayList<>(ok);
    shifted.set(10, "x" + shifted.get(10).substring(1));
    assertTrue(refused(() -> NavFile.parse("s.10n", shifted)).startsWith("s.10n:11: broadcast orbit line 2: columns 1-3 must be blank"));
    final List<String> qzs = GnssFixtures.lines("2012-10-31", "brdc3050.12q.gz");
    qzs.set(7, "G" + qzs.get(7).substring(1));
    assertTrue(refused(() -> NavFile.parse("q.12q", qzs)).startsWith("q.12q:8: QZSS record must start with 'J'"));
    final List<String> glo = GnssFixtures.lines("2012-10-31", "brdc3050.12g.gz");
    glo.set(6, glo.get(6).substring(0, 3) + "     -2.380982Z+04" + glo.get(6).substring(22));
    assertTrue(refused(() -> NavFile.parse("g.12g", glo)).startsWith("g.12g:7: satellite position X, km (columns 4-22)"));
    assertTrue(refused(() -> NavFile.parse("h.n", List.of("hello"))).startsWith("h.n:1: not a RINEX file"));
  }

  @Test
  void clockFilesAndTheirDefects() {
    final ClockFile clk = ClockFile.parse("igs15904.clk", GnssFixtures.lines("2010-07-01", "igs15904.clk.gz"));
    assertEquals(GnssTimeSystem.GPS, clk.timeSystem());
    assertEquals(30, clk.satellites().size(), clk.satellites().toString());
    assertEquals(12, clk.samples("G02").size());
    assertEquals(2.691084288582e-04, clk.samples("G02").get(0).biasS());
    assertEquals(1590 * 604_800.0 + 345_600.0, clk.samples("G02").get(0).gpsS());
    assertEquals(2056, clk.otherRecords());
    final List<String> ok = GnssFixtures.lines("2010-07-01", "igs15904.clk.gz");
    final List<String> type = new java.util.ArrayList<>(ok);
    type.set(177, "XS" + type.get(177).substring(2));
    assertTrue(refused(() -> ClockFile.parse("t.clk", type)).startsWith("t.clk:178: record type (columns 1-2): found 'XS'"));
    final List<String> count = new java.util.ArrayList<>(ok);
    count.set(177, count.get(177).substring(0, 34) + "  3" + count.get(177).substring(37));
    // three values announced: the next record is read as the continuation line and refused there
    assertTrue(refused(() -> ClockFile.parse("n.clk", count)).startsWith("n.clk:179: clock values: 1 expected, found 11"));
    final List<String> hour = new java.util.ArrayList<>(ok);
    hour.set(177, hour.get(177).substring(0, 18) + " 24" + hour.get(177).substring(21));
    assertTrue(refused(() -> ClockFile.parse("h.clk", hour)).startsWith("h.clk:178: hour (columns 19-21): out of range"));
  }
}
