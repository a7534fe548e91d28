package org.eigenzeit.ground.gnss;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.eigenzeit.ground.input.InputException;
import org.junit.jupiter.api.Test;

/**
 * The SP3 header reader on one real IGS final orbit (igs15904.sp3, 2010-07-01) and on copies of it
 * with one defect each: every refusal must name the line that carries the defect, and every value
 * the reader returns must be the one the file states. Expected values are read off the file itself
 * (its header lines are quoted in the comments) and the SP3-c layout (columns as the format
 * description gives them, common practice).
 */
class Sp3HeaderDefectsTest {
  private static final List<String> OK = GnssFixtures.lines("2010-07-01", "igs15904.sp3.gz");

  private static List<String> with(int line, UnaryOperator<String> change) {
    final List<String> copy = new ArrayList<>(OK);
    copy.set(line - 1, change.apply(copy.get(line - 1)));
    return copy;
  }

  private static String column(String l, int col, char c) {
    final String padded = String.format("%-80s", l);
    return padded.substring(0, col - 1) + c + padded.substring(col);
  }

  private static String refused(List<String> lines) {
    return assertThrows(InputException.class, () -> Sp3Header.parse("x.sp3", lines)).getMessage();
  }

  private static void refusedAt(int line, String start, List<String> lines) {
    final String m = refused(lines);
    assertTrue(m.startsWith("x.sp3:" + line + ": " + start), m);
  }

  @Test
  void everyValueIsTheFilesOwn() {
    final Sp3Header h = Sp3Header.parse("igs15904.sp3", OK);
    // line 1: "#cP2010  7  1  0  0  0.00000000      96 ORBIT IGS05 HLM  IGS"
    assertEquals('c', h.version());
    assertEquals("ORBIT", h.dataUsed());
    assertEquals("HLM", h.orbitType());
    assertEquals("igs15904.sp3", h.name());
    // line 13 is the first "%c" line, "%c G  cc GPS ..."
    assertEquals(13, h.timeSystemLine());
    // the "++" lines: G01 0, G02 2, G11 3, G25 6 (columns 10-12 onwards, one satellite per 3 columns)
    assertEquals(0, h.accuracyExponent("G01"));
    assertEquals(2, h.accuracyExponent("G02"));
    assertEquals(3, h.accuracyExponent("G11"));
    assertEquals(6, h.accuracyExponent("G25"));
    assertEquals(-1, h.accuracyExponent("G33"));
    assertEquals(List.of("FINAL ORBIT COMBINATION FROM WEIGHTED AVERAGE OF:", "cod emr esa gfz grg jpl mit ngs sio",
        "REFERENCED TO IGS TIME (IGST) AND TO WEIGHTED MEAN POLE:", "PCV:IGS05_1585 OL/AL:FES2004  NONE     Y  ORB:CMB CLK:CMB"),
        h.comments());
    assertEquals(List.of(), h.manoeuvreEpochs("G01"));
    assertEquals(List.of(), h.predictedEpochs("G01"));
    assertEquals(List.of(), h.warnings());
  }

  @Test
  void flagsAreRecordedPerEpoch() {
    // line 24 is G01 at the first epoch (line 23), line 57 G01 at the second (line 56)
    final List<String> m = new ArrayList<>(OK);
    m.set(23, column(column(m.get(23), 79, 'M'), 75, 'E'));
    m.set(56, column(column(m.get(56), 79, 'M'), 76, 'P'));
    final Sp3Header h = Sp3Header.parse("m.sp3", m);
    assertEquals(List.of(0, 1), h.manoeuvreEpochs("G01"));
    assertEquals(List.of(), h.manoeuvreEpochs("G02"));
    assertEquals(List.of(), h.predictedEpochs("G01"));
  }

  @Test
  void eachRecordFlagIsCheckedAtItsLine() {
    refusedAt(24, "clock event flag (column 75): found 'X'", with(24, l -> column(l, 75, 'X')));
    refusedAt(57, "clock prediction flag (column 76): found 'X'", with(57, l -> column(l, 76, 'X')));
    refusedAt(24, "manoeuvre flag (column 79): found 'P'", with(24, l -> column(l, 79, 'P')));
    refusedAt(24, "columns 77-78 must be blank", with(24, l -> column(l, 77, 'x')));
    refusedAt(24, "columns 77-78 must be blank", with(24, l -> column(l, 78, 'x')));
  }

  @Test
  void headerDefectsAreRefusedAtTheirLine() {
    refusedAt(1, "not an SP3 file", with(1, l -> "#a" + l.substring(2)));
    refusedAt(1, "position/velocity flag (column 3): found 'X'", with(1, l -> column(l, 3, 'X')));
    refusedAt(1, "orbit type (columns 53-55): found 'ABC'", with(1, l -> l.substring(0, 52) + "ABC" + l.substring(55)));
    refusedAt(2, "modified Julian day disagrees", with(2, l -> l.replace("55378", "55379")));
    refusedAt(2, "fraction of day disagrees", with(2, l -> l.replace("55378 0.0000000000000", "55378 0.5000000000000")));
    refusedAt(3, "number of satellites: the header says 31, the list holds 32", with(3, l -> l.replace("+   32", "+   31")));
    refusedAt(4, "", with(4, l -> l.replace("G18", "X18")));
    refusedAt(9, "accuracy exponent of G18", with(9, l -> "++        xx" + l.substring(12)));
    refusedAt(13, "file type (%c columns 4-5): not supported, found 'Q'", with(13, l -> column(l, 4, 'Q')));
    // no "+ " line where the satellite list belongs (line 3)
    refusedAt(3, "SP3 header: satellite list line ('+ ') expected", with(3, l -> "x" + l));
    // both "%c" lines gone: the first epoch line (now line 21) is where the file type was due
    final List<String> noType = new ArrayList<>(OK);
    noType.remove(12);
    noType.remove(12);
    refusedAt(21, "SP3 header: no file-type line", noType);
    refusedAt(2, "SP3 header: too short", OK.subList(0, 2));
    refusedAt(1, "SP3 header: too short", List.of());
  }

  @Test
  void bodyDefectsAreRefusedAtTheirLine() {
    // the second epoch (line 56) one minute off the 900 s grid, then on the first epoch again
    refusedAt(56, "epoch not on the header's 900.000 s grid after epoch 1",
        with(56, l -> l.replace("0 15  0.0", "0 16  0.0")));
    refusedAt(56, "epoch not on the header's 900.000 s grid after epoch 1",
        with(56, l -> l.replace("0 15  0.0", "0  0  0.0")));
    final List<String> early = new ArrayList<>(OK);
    early.add(22, OK.get(23));
    refusedAt(23, "position record before the first epoch line", early);
    final List<String> after = new ArrayList<>(OK);
    after.add("");
    after.add(OK.get(22));
    refusedAt(after.size(), "text after the EOF line", after);
    // a correlation record ("EP", SP3-c) inside the body is neither an epoch nor the end
    final List<String> correlation = new ArrayList<>(OK);
    correlation.add(24, "EP  " + " ".repeat(76));
    assertEquals(96, Sp3Header.parse("c.sp3", correlation).epochCount());
    final List<String> blankAfter = new ArrayList<>(OK);
    blankAfter.add("  ");
    assertEquals(96, Sp3Header.parse("b.sp3", blankAfter).epochCount());
  }
}
