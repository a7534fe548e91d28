package org.eigenzeit.ground.gnss;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Broadcast-record validation on real files. The defects are real where the files have them
 * (2010-07-01: G23's 06:00 record filed also under G01, G25 unhealthy all day; 2012-10-31: G24
 * and G27 unhealthy all day, a GLONASS frequency number 254 and a health flag 14); the others are
 * made by editing one real record (a copy under another PRN, a record left alone for a day, a
 * changed IODC, a repeat, an eccentricity out of range).
 */
class BroadcastCheckTest {
  private static final String DAY = "2010-07-01";
  private static PreciseOrbit igs;

  @BeforeAll
  static void orbit() {
    igs = PreciseOrbit.read(GnssFixtures.day(DAY).resolve("igs15904.sp3.gz"));
  }

  private static List<String> brdc() {
    return GnssFixtures.lines(DAY, "brdc1820.10n.gz");
  }

  /** Index of the first line of the record of a PRN whose epoch starts with the given hour. */
  private static int record(List<String> lines, int prn, int hour) {
    final String head = String.format(java.util.Locale.ROOT, "%2d 10  7  1 %2d", prn, hour);
    for (int i = 0; i < lines.size(); i++) {
      if (lines.get(i).startsWith(head)) {
        return i;
      }
    }
    throw new IllegalStateException("no record " + head);
  }

  private static BroadcastCheck.Verdict at(List<BroadcastCheck.Verdict> all, String where) {
    return all.stream().filter(v -> v.where().equals(where)).findFirst().orElseThrow();
  }

  @Test
  void theRecordFiledUnderTheWrongSatelliteInTheRealFileIsFound() {
    final List<BroadcastCheck.Verdict> all = BroadcastCheck.check(List.of(NavFile.parse("brdc1820.10n", brdc())), igs);
    final BroadcastCheck.Verdict g01 = at(all, "brdc1820.10n:937");
    final BroadcastCheck.Verdict g23 = at(all, "brdc1820.10n:1089");
    System.out.println(g01.id() + " " + g01.outcome() + " " + g01.reasons() + " " + g01.positionErrorM() + " m");
    System.out.println(g23.id() + " " + g23.outcome() + " " + g23.notes() + " " + g23.positionErrorM() + " m");
    assertEquals(BroadcastCheck.Outcome.REJECTED, g01.outcome());
    assertTrue(g01.reasons().get(0).startsWith("filed under the wrong satellite: the same data, field for field, as "
        + "G23's record at brdc1820.10n:1089"), g01.reasons().toString());
    assertTrue(g01.positionErrorM() > 1e6, "G01 at G23's place: " + g01.positionErrorM());
    assertEquals(BroadcastCheck.Outcome.ACCEPTED, g23.outcome());
    assertTrue(g23.notes().toString().contains("the precise orbit confirms it belongs to G23"), g23.notes().toString());
    assertTrue(g23.positionErrorM() <= BroadcastCheck.POSITION_THRESHOLD_M);
  }

  @Test
  void aRealRecordCopiedUnderAnotherNumberIsRejectedAndTheOriginalKept() {
    final List<String> lines = brdc();
    final int g05 = record(lines, 5, 14);
    final List<String> copy = new ArrayList<>(lines.subList(g05, g05 + 8));
    copy.set(0, " 7" + copy.get(0).substring(2));
    final int copyLine = lines.size() + 1;
    lines.addAll(copy);
    final NavFile nav = NavFile.parse("edited.10n", lines);
    final List<BroadcastCheck.Verdict> all = BroadcastCheck.check(List.of(nav), igs);
    final BroadcastCheck.Verdict wrong = at(all, "edited.10n:" + copyLine);
    final BroadcastCheck.Verdict right = at(all, "edited.10n:" + (g05 + 1));
    assertEquals("G07", wrong.id());
    assertEquals(BroadcastCheck.Outcome.REJECTED, wrong.outcome());
    assertTrue(wrong.reasons().get(0).contains("as G05's record at edited.10n:" + (g05 + 1)), wrong.reasons().toString());
    assertEquals(BroadcastCheck.Outcome.ACCEPTED, right.outcome());
    // Without a precise orbit nothing tells which copy is right: both go.
    final List<BroadcastCheck.Verdict> blind = BroadcastCheck.check(List.of(nav), null);
    assertEquals(BroadcastCheck.Outcome.REJECTED, at(blind, "edited.10n:" + copyLine).outcome());
    assertEquals(BroadcastCheck.Outcome.REJECTED, at(blind, "edited.10n:" + (g05 + 1)).outcome());
    assertTrue(at(blind, "edited.10n:" + (g05 + 1)).reasons().get(0).contains("no precise orbit"));
  }

  @Test
  void aRecordIsUsedOnlyWithinItsFitInterval() {
    // Keep one G05 record (toe 14:00, fit interval 4 h in the file): it may serve 12:00-16:00 only.
    final List<String> lines = brdc();
    final int keep = record(lines, 5, 14);
    final List<String> edited = new ArrayList<>();
    for (int i = 0; i < lines.size(); i++) {
      final boolean g05 = lines.get(i).startsWith(" 5 10  7  1") && i != keep;
      if (g05) {
        i += 7;
        continue;
      }
      edited.add(lines.get(i));
    }
    final NavFile nav = NavFile.parse("one-g05.10n", edited);
    assertEquals(1, nav.keplerRecords().stream().filter(k -> k.number() == 5).count());
    final TermSurvey.Result r = new TermSurvey(igs, List.of(nav), List.of(), 0, 0).run();
    final TermSurvey.Satellite s = r.satellites().stream().filter(x -> x.id().equals("G05")).findFirst().orElseThrow();
    System.out.println("G05 with one record: " + s.compared() + " epochs compared; " + s.notes());
    assertEquals(17, s.compared(), "15-min epochs within toe +- 2 h");
    assertTrue(s.notes().stream().anyMatch(n -> n.contains("no accepted record within its fit interval")
        && n.contains("fit interval +-2.00 h")), s.notes().toString());
    for (TermSurvey.Row row : r.rows()) {
      if (row.id().equals("G05") && Double.isFinite(row.broadcastTermS())) {
        assertTrue(Math.abs(row.gpsS() - nav.keplerRecords().stream().filter(k -> k.number() == 5).findFirst()
            .orElseThrow().toeGpsS()) <= 7200, row.gpsTime());
      }
    }
  }

  @Test
  void satellitesUnhealthyAllDayAreReportedNotSkipped() {
    final TermSurvey.Result r = new TermSurvey(igs, List.of(NavFile.parse("brdc1820.10n", brdc())), List.of(), 0, 0).run();
    final TermSurvey.Satellite g25 = r.satellites().stream().filter(x -> x.id().equals("G25")).findFirst().orElseThrow();
    System.out.println("G25: " + g25.exclusion());
    assertEquals("all 13 broadcast records rejected: 13 x unhealthy: health 63", g25.exclusion());
    assertTrue(g25.epochs() > 0, "its precise-orbit terms are still given");
    final NavFile gps2012 = NavFile.read(GnssFixtures.day("2012-10-31").resolve("brdc3050.12n.gz"));
    final TermSurvey.Result b = new TermSurvey(null, List.of(gps2012), List.of(), 0, 0).run();
    for (String id : List.of("G24", "G27")) {
      final TermSurvey.Satellite s = b.satellites().stream().filter(x -> x.id().equals(id)).findFirst().orElseThrow();
      System.out.println(id + " (2012-10-31): " + s.exclusion());
      assertTrue(s.exclusion().startsWith("all 13 broadcast records rejected: 13 x unhealthy: health 63"), s.exclusion());
    }
  }

  @Test
  void otherDefectsOfRealAndEditedRecords() {
    final List<String> lines = brdc();
    final int g05 = record(lines, 5, 14);
    final List<String> rec = new ArrayList<>(lines.subList(g05, g05 + 8));
    // a repeat of G05's record; the same with another IODC; the same with e = 0.5
    final List<String> repeat = new ArrayList<>(rec);
    final List<String> iodc = new ArrayList<>(rec);
    iodc.set(6, iodc.get(6).substring(0, 60) + " 0.100000000000D+04");
    final List<String> ecc = new ArrayList<>(rec);
    ecc.set(2, ecc.get(2).substring(0, 22) + " 0.500000000000D+00" + ecc.get(2).substring(41));
    final int base = lines.size();
    lines.addAll(repeat);
    lines.addAll(iodc);
    lines.addAll(ecc);
    final List<BroadcastCheck.Verdict> all = BroadcastCheck.check(List.of(NavFile.parse("e.10n", lines)), igs);
    final BroadcastCheck.Verdict rep = at(all, "e.10n:" + (base + 1));
    assertEquals(BroadcastCheck.Outcome.REPEAT, rep.outcome());
    assertTrue(rep.reasons().get(0).startsWith("same data as the accepted record at e.10n:" + (g05 + 1)));
    final BroadcastCheck.Verdict io = at(all, "e.10n:" + (base + 9));
    assertTrue(io.reasons().toString().contains("is not the 8 low bits of IODC 1000"), io.reasons().toString());
    final BroadcastCheck.Verdict e = at(all, "e.10n:" + (base + 17));
    assertTrue(e.reasons().toString().contains("eccentricity: found 0.5, allowed 0 to 0.03"), e.reasons().toString());
    // Real 2012 files: a GLONASS frequency number 254, a GLONASS health 14, QZS-1's L6 health bit.
    final java.nio.file.Path d = GnssFixtures.day("2012-10-31");
    final List<BroadcastCheck.Verdict> glo = BroadcastCheck.check(List.of(NavFile.read(d.resolve("brdc3050.12g.gz"))), null);
    assertTrue(glo.stream().anyMatch(v -> v.id().equals("R13") && v.reasons().toString().contains("frequency number: found 254")));
    assertTrue(glo.stream().anyMatch(v -> v.id().equals("R22") && v.reasons().toString().contains("unhealthy: health 14")));
    final List<BroadcastCheck.Verdict> qzs = BroadcastCheck.check(List.of(NavFile.read(d.resolve("brdc3050.12q.gz"))), null);
    assertTrue(qzs.stream().allMatch(v -> v.outcome() == BroadcastCheck.Outcome.ACCEPTED && v.health() == 1
        && v.notes().toString().contains("L6 (LEX)")));
  }

}
