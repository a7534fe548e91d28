package org.eigenzeit.ground.trajectory;

import static org.eigenzeit.ground.input.TextFields.columns;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.input.TextFiles;

/**
 * Reader of SP3-c and SP3-d precise orbit files (Hilla, "The Extended Standard Product 3 Orbit
 * Format (SP3-c)", IGS, 2010; Hilla, "The Extended Standard Product 3 Orbit Format (SP3-d)", IGS,
 * 2016): header, epoch lines ({@code *}), position and clock records ({@code P}, km and
 * microseconds), optional velocity records ({@code V}, dm/s and 1e-4 microseconds/s) and
 * correlation records ({@code EP}, {@code EV}), then {@code EOF}.
 *
 * <p>Every field is checked, at its fixed columns: header line 1 (version, P/V flag, start epoch,
 * number of epochs, coordinate system, orbit type), line 2 (GPS week and seconds of week, epoch
 * interval, MJD and fraction of day, each consistent with line 1), the satellite list and its
 * accuracy exponents, the {@code %c} time system (SP3-c: GPS, GLO, GAL, TAI, UTC; SP3-d also QZS,
 * BDT, IRN), the {@code %f} and {@code %i} lines; every epoch (a calendar date that exists,
 * increasing, on the header's interval grid, as many as the header says, the first equal to the
 * header's start); every record (a satellite of the header list, once per epoch, every listed
 * satellite at every epoch, numbers finite and in range, flags from their allowed sets). Positions
 * of 0.000000 (all three) and clocks of 999999.999999 are "no value" by the format's convention;
 * other clocks must lie within +-999999 microseconds. Each refusal names the file and the line.
 *
 * <p>Times are kept as the file gives them (its {@link #timeSystem()}; GPS time for IGS products)
 * in seconds since the first epoch; converting them is the caller's business.
 *
 * <p>Immutable after parsing.
 */
public final class Sp3File {
  /** The time systems an SP3 file may name in its first {@code %c} line. */
  public enum TimeSystem {
    /** GPS time. */
    GPS,
    /** GLONASS time (UTC(SU) + 3 h). */
    GLO,
    /** Galileo system time. */
    GAL,
    /** International Atomic Time. */
    TAI,
    /** Coordinated Universal Time. */
    UTC,
    /** QZSS time (SP3-d). */
    QZS,
    /** BeiDou time (SP3-d). */
    BDT,
    /** NavIC/IRNSS time (SP3-d). */
    IRN;

    /**
     * Whether the SP3 version allows this system.
     *
     * @param version 'c' or 'd'
     * @return true when allowed
     */
    boolean allowedIn(char version) {
      return version == 'd' || ordinal() <= UTC.ordinal();
    }
  }

  /** One satellite's samples. */
  public static final class Satellite {
    final List<double[]> samples = new ArrayList<>();
    final List<Integer> lines = new ArrayList<>();

    /**
     * The samples, in epoch order.
     *
     * @return {t (s since the first epoch), x, y, z (m, the file's Earth-fixed frame), clock (s, NaN
     *     when absent), vx, vy, vz (m/s, NaN when absent), clock rate (s/s, NaN when absent)}
     */
    public List<double[]> samples() {
      final List<double[]> out = new ArrayList<>(samples.size());
      for (double[] s : samples) {
        out.add(s.clone());
      }
      return out;
    }

    /**
     * The line of the position record of a sample, for messages.
     *
     * @param k sample index
     * @return the 1-based line number
     */
    public int line(int k) {
      return lines.get(k);
    }
  }

  private static final String TIME_SYSTEMS_C = "GPS, GLO, GAL, TAI, UTC";
  private static final String TIME_SYSTEMS_D = "GPS, GLO, GAL, TAI, UTC, QZS, BDT, IRN";
  private static final Pattern SAT_ID = Pattern.compile("[GRELCJSI][ 0-9][0-9]");
  private static final Pattern TERRESTRIAL = Pattern.compile("(ITR|IGS|IGB|WGS|PZ|PE9|GTR|SLR).*");
  private static final List<String> ORBIT_TYPES = List.of("FIT", "EXT", "BCT", "BHN", "HLM");
  /** The "no value" clock of the format. */
  private static final String NO_CLOCK = "999999.999999";
  private static final double MIN_RADIUS_KM = 6_000.0;
  private static final double MAX_RADIUS_KM = 2.0e6;
  private static final double C_DM_PER_S = 2.99792458e9;

  private final String name;
  private final char version;
  private final boolean velocities;
  private final TimeSystem timeSystem;
  private final int timeSystemLine;
  private final String coordinateSystem;
  private final int[] firstEpoch;
  private final double firstEpochSeconds;
  private final double intervalS;
  private final Map<String, Satellite> satellites;

  private Sp3File(Header h, Map<String, Satellite> satellites) {
    this.name = h.name;
    this.version = h.version;
    this.velocities = h.velocities;
    this.timeSystem = h.timeSystem;
    this.timeSystemLine = h.timeSystemLine;
    this.coordinateSystem = h.coordinateSystem;
    this.firstEpoch = h.startCalendar.clone();
    this.firstEpochSeconds = h.startSeconds;
    this.intervalS = h.intervalS;
    this.satellites = satellites;
  }

  /**
   * Reads a file.
   *
   * @param path the file
   * @return the parsed file
   * @throws IOException never (kept for callers written against earlier versions); an unreadable
   *     file is an {@link org.eigenzeit.ground.input.InputException}
   * @throws TrajectoryFormatException with the line number when malformed
   */
  public static Sp3File read(Path path) throws IOException {
    return parse(String.valueOf(path.getFileName()), TextFiles.readAsciiLines(path));
  }

  /**
   * Parses lines.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the parsed file
   * @throws TrajectoryFormatException naming the line of the first defect
   */
  public static Sp3File parse(String name, List<String> lines) {
    final Header h = Header.parse(name, lines);
    final Body body = new Body(h);
    int i = h.firstDataLine;
    for (; i < lines.size(); i++) {
      if (body.line(lines.get(i), i + 1)) {
        break;
      }
    }
    body.finish(lines.size());
    final int after = TextFiles.firstNonBlank(lines, i + 1);
    if (after >= 0) {
      throw new TrajectoryFormatException(name, after + 1, "text after the EOF line, found '"
          + lines.get(after).strip() + "', allowed nothing");
    }
    return new Sp3File(h, body.sats);
  }

  /** Header lines 1 to the last comment. */
  private static final class Header {
    final String name;
    char version;
    boolean velocities;
    int[] startCalendar;
    double startSecondOfMinute;
    double startSeconds;
    int epochCount;
    String coordinateSystem;
    double intervalS;
    final List<String> ids = new ArrayList<>();
    TimeSystem timeSystem;
    int timeSystemLine;
    int firstDataLine;

    private Header(String name) {
      this.name = name;
    }

    static Header parse(String name, List<String> lines) {
      final Header h = new Header(name);
      h.line1(lines.isEmpty() ? "" : lines.get(0));
      int i = 1;
      h.line2(lineOrMissing(name, lines, i, "##"), i + 1);
      i = h.satelliteLines(lines, 2);
      i = h.descriptorLines(lines, i);
      while (i < lines.size() && lines.get(i).startsWith("/*")) {
        i++;
      }
      h.firstDataLine = i;
      return h;
    }

    private static String lineOrMissing(String name, List<String> lines, int i, String prefix) {
      if (i >= lines.size()) {
        throw new TrajectoryFormatException(name, lines.size(), "file ends inside the header, '" + prefix
            + "' line expected");
      }
      return lines.get(i);
    }

    private void line1(String l) {
      if (l.length() < 2 || l.charAt(0) != '#') {
        throw new TrajectoryFormatException(name, 1, "not an SP3 file, found '" + abbreviate(l)
            + "', allowed a first line starting with '#c' or '#d'");
      }
      version = l.charAt(1);
      if (version != 'c' && version != 'd') {
        throw new TrajectoryFormatException(name, 1, "SP3 version '" + version + "' not supported, allowed c or d");
      }
      final char pv = columns(l, 3, 3).charAt(0);
      if (pv != 'P' && pv != 'V') {
        throw new TrajectoryFormatException(name, 1, "position/velocity flag (column 3): found '" + pv
            + "', allowed P or V");
      }
      velocities = pv == 'V';
      startCalendar = calendar(name, 1, l, 4);
      startSecondOfMinute = TextFields.decimal(name, 1, "start seconds (columns 21-31)", columns(l, 21, 31));
      TextFields.checkCalendar(name, 1, startCalendar[0], startCalendar[1], startCalendar[2], startCalendar[3],
          startCalendar[4], startSecondOfMinute, false);
      startSeconds = secondsOf(startCalendar) + startSecondOfMinute;
      epochCount = TextFields.integer(name, 1, "number of epochs (columns 33-39)", columns(l, 33, 39), 1, 9_999_999);
      coordinateSystem = columns(l, 47, 51).strip();
      if (!TERRESTRIAL.matcher(coordinateSystem.toUpperCase(Locale.ROOT)).matches()) {
        throw new TrajectoryFormatException(name, 1, "coordinate system (columns 47-51): found '" + coordinateSystem
            + "', allowed an Earth-fixed frame (ITRxx, IGSxx, IGbxx, WGS84, PZ-90, SLRxx)");
      }
      final String orbitType = columns(l, 53, 55);
      if (!ORBIT_TYPES.contains(orbitType)) {
        throw new TrajectoryFormatException(name, 1, "orbit type (columns 53-55): found '" + orbitType
            + "', allowed " + String.join(", ", ORBIT_TYPES));
      }
    }

    private void line2(String l, int lineNo) {
      if (!l.startsWith("## ")) {
        throw new TrajectoryFormatException(name, lineNo, "second header line must start with '## ', found '"
            + abbreviate(l) + "'");
      }
      final int week = TextFields.integer(name, lineNo, "GPS week (columns 4-7)", columns(l, 4, 7), 0, 9999);
      final double sow = TextFields.decimal(name, lineNo, "seconds of week (columns 9-23)", columns(l, 9, 23), 0,
          604_799.99999999);
      intervalS = TextFields.decimal(name, lineNo, "epoch interval, s (columns 25-38)", columns(l, 25, 38), 1e-3,
          86_400);
      final int mjd = TextFields.integer(name, lineNo, "modified Julian day (columns 40-44)", columns(l, 40, 44),
          15_021, 88_069);
      final double frac = TextFields.decimal(name, lineNo, "fraction of day (columns 46-60)", columns(l, 46, 60), 0,
          0.99999999999999);
      final long jdn = CalendarMath.julianDayNumber(startCalendar[0], startCalendar[1], startCalendar[2]);
      final double secOfDay = startCalendar[3] * 3600.0 + startCalendar[4] * 60.0 + startSecondOfMinute;
      if (mjd != jdn - 2_400_001L || Math.abs(frac * 86_400.0 - secOfDay) > 1e-6) {
        throw new TrajectoryFormatException(name, lineNo, String.format(Locale.ROOT,
            "MJD and fraction of day disagree with the start epoch of line 1, found %d %.13f, allowed %d %.13f", mjd,
            frac, jdn - 2_400_001L, secOfDay / 86_400.0));
      }
      final long days = jdn - CalendarMath.julianDayNumber(1980, 1, 6);
      final double expectedSow = (days % 7) * 86_400.0 + secOfDay;
      if (week != days / 7 || Math.abs(sow - expectedSow) > 1e-6) {
        throw new TrajectoryFormatException(name, lineNo, String.format(Locale.ROOT,
            "GPS week and seconds of week disagree with the start epoch of line 1, found %d %.8f, allowed %d %.8f",
            week, sow, days / 7, expectedSow));
      }
    }

    private int satelliteLines(List<String> lines, int from) {
      int i = from;
      final String first = lineOrMissing(name, lines, i, "+");
      if (!first.startsWith("+ ")) {
        throw new TrajectoryFormatException(name, i + 1, "satellite list line '+' expected, found '"
            + abbreviate(first) + "'");
      }
      final int count = version == 'c'
          ? TextFields.integer(name, i + 1, "number of satellites (columns 5-6)", columns(first, 5, 6), 1, 85)
          : TextFields.integer(name, i + 1, "number of satellites (columns 4-6)", columns(first, 4, 6), 1, 999);
      final int plusLines = Math.max(5, (count + 16) / 17);
      for (int k = 0; k < plusLines; k++, i++) {
        final String l = lineOrMissing(name, lines, i, "+");
        if (!l.startsWith("+ ")) {
          throw new TrajectoryFormatException(name, i + 1, "satellite list line '+' expected (" + plusLines
              + " for " + count + " satellites), found '" + abbreviate(l) + "'");
        }
        for (int s = 0; s < 17; s++) {
          satelliteSlot(i + 1, l, 10 + 3 * s, 17 * k + s < count);
        }
      }
      for (int k = 0; k < plusLines; k++, i++) {
        final String l = lineOrMissing(name, lines, i, "++");
        if (!l.startsWith("++")) {
          throw new TrajectoryFormatException(name, i + 1, "accuracy line '++' expected (" + plusLines
              + " for " + count + " satellites), found '" + abbreviate(l) + "'");
        }
        for (int s = 0; s < 17; s++) {
          final int c = 10 + 3 * s;
          TextFields.integer(name, i + 1, "accuracy exponent (columns " + c + "-" + (c + 2) + ")",
              columns(l, c, c + 2), 0, 99);
        }
      }
      return i;
    }

    private void satelliteSlot(int lineNo, String l, int c, boolean used) {
      final String slot = columns(l, c, c + 2);
      final String where = "satellite (columns " + c + "-" + (c + 2) + ")";
      if (!used) {
        if (!slot.equals("  0") && !slot.equals("000") && !slot.isBlank()) {
          throw new TrajectoryFormatException(name, lineNo, where + ": found '" + slot
              + "' beyond the header's satellite count, allowed '  0'");
        }
        return;
      }
      if (!SAT_ID.matcher(slot).matches() || slot.substring(1).equals(" 0") || slot.substring(1).equals("00")) {
        throw new TrajectoryFormatException(name, lineNo, where + ": found '" + slot
            + "', allowed a system letter (G, R, E, C, J, L, S, I) and a number 01-99");
      }
      final String id = slot.replace(' ', '0');
      if (ids.contains(id)) {
        throw new TrajectoryFormatException(name, lineNo, where + ": satellite " + id + " listed twice");
      }
      ids.add(id);
    }

    private int descriptorLines(List<String> lines, int from) {
      int i = from;
      for (int k = 0; k < 2; k++, i++) {
        final String l = expect(lines, i, "%c");
        if (k == 0) {
          timeSystem(l, i + 1);
        }
      }
      for (int k = 0; k < 2; k++, i++) {
        final String l = expect(lines, i, "%f");
        TextFields.decimal(name, i + 1, "base for position/velocity (columns 4-13)", columns(l, 4, 13), 0, 100);
        TextFields.decimal(name, i + 1, "base for clock/rate (columns 15-26)", columns(l, 15, 26), 0, 100);
      }
      for (int k = 0; k < 2; k++, i++) {
        final String l = expect(lines, i, "%i");
        for (String t : l.substring(2).strip().split("\\s+")) {
          TextFields.whole(name, i + 1, "%i field", t, -999_999_999L, 999_999_999L);
        }
      }
      return i;
    }

    private String expect(List<String> lines, int i, String prefix) {
      final String l = lineOrMissing(name, lines, i, prefix);
      if (!l.startsWith(prefix)) {
        throw new TrajectoryFormatException(name, i + 1, "header line '" + prefix + "' expected, found '"
            + abbreviate(l) + "'");
      }
      return l;
    }

    private void timeSystem(String l, int lineNo) {
      final String ts = columns(l, 10, 12);
      final String allowed = version == 'c' ? TIME_SYSTEMS_C : TIME_SYSTEMS_D;
      TimeSystem found = null;
      for (TimeSystem t : TimeSystem.values()) {
        if (t.name().equals(ts) && t.allowedIn(version)) {
          found = t;
        }
      }
      if (found == null) {
        throw new TrajectoryFormatException(name, lineNo, "time system (columns 10-12): found '" + ts
            + "', allowed in SP3-" + version + ": " + allowed);
      }
      timeSystem = found;
      timeSystemLine = lineNo;
    }
  }

  /** Epoch and record lines. */
  private static final class Body {
    final Header h;
    final String name;
    final Map<String, Satellite> sats = new LinkedHashMap<>();
    final Map<String, Integer> seenAtEpoch = new LinkedHashMap<>();
    double t = Double.NaN;
    int epochs;
    int epochLine;
    String lastPositionId;
    char last = ' ';
    boolean eof;

    Body(Header h) {
      this.h = h;
      this.name = h.name;
      for (String id : h.ids) {
        sats.put(id, new Satellite());
      }
    }

    /** Returns true at the EOF line. */
    boolean line(String l, int lineNo) {
      if (l.startsWith("*  ")) {
        closeEpoch();
        epoch(l, lineNo);
        last = '*';
      } else if (l.startsWith("EOF") && l.strip().equals("EOF")) {
        eof = true;
        return true;
      } else if (l.startsWith("EP")) {
        follows(lineNo, 'P', "EP");
        correlation(l, lineNo);
        last = 'e';
      } else if (l.startsWith("EV")) {
        follows(lineNo, 'V', "EV");
        correlation(l, lineNo);
        last = 'f';
      } else if (l.startsWith("P")) {
        if (Double.isNaN(t)) {
          throw new TrajectoryFormatException(name, lineNo, "position record before the first epoch line");
        }
        checkVelocityClosed(lineNo);
        position(l, lineNo);
        last = 'P';
      } else if (l.startsWith("V")) {
        if (!h.velocities) {
          throw new TrajectoryFormatException(name, lineNo, "velocity record in a file whose line 1 flag is P, "
              + "allowed only with flag V");
        }
        if (last != 'P' && last != 'e') {
          throw new TrajectoryFormatException(name, lineNo, "velocity record not after a position record");
        }
        velocity(l, lineNo);
        last = 'V';
      } else {
        throw new TrajectoryFormatException(name, lineNo, "unknown record, found '" + abbreviate(l)
            + "', allowed lines starting with '*  ', 'P', 'EP', 'V', 'EV' or 'EOF'");
      }
      return false;
    }

    private void follows(int lineNo, char record, String what) {
      final boolean ok = record == 'P' ? last == 'P' : last == 'V';
      if (!ok) {
        throw new TrajectoryFormatException(name, lineNo, what + " record not directly after a " + record + " record");
      }
    }

    private void checkVelocityClosed(int lineNo) {
      if (h.velocities && (last == 'P' || last == 'e')) {
        throw new TrajectoryFormatException(name, lineNo, "position record of " + lastPositionId
            + " has no velocity record, required when the line 1 flag is V");
      }
    }

    private void epoch(String l, int lineNo) {
      final int[] cal = calendar(name, lineNo, l, 4);
      final double sec = TextFields.decimal(name, lineNo, "seconds (columns 21-31)", columns(l, 21, 31));
      TextFields.checkCalendar(name, lineNo, cal[0], cal[1], cal[2], cal[3], cal[4], sec,
          h.timeSystem == TimeSystem.UTC || h.timeSystem == TimeSystem.GLO);
      if (!columns(l, 32, Math.max(32, l.length())).isBlank()) {
        throw new TrajectoryFormatException(name, lineNo, "text after the seconds (column 32 on), found '"
            + l.substring(31).strip() + "', allowed nothing");
      }
      final double next = secondsOf(cal) + sec - h.startSeconds;
      if (epochs == 0 && Math.abs(next) > 1e-6) {
        throw new TrajectoryFormatException(name, lineNo, "first epoch differs from the header's start epoch by "
            + next + " s");
      }
      if (!Double.isNaN(t) && !(next > t)) {
        throw new TrajectoryFormatException(name, lineNo, "epochs must increase, found " + fmt(next)
            + " s after the start, allowed after " + fmt(t) + " s (the epoch at line " + epochLine + ")");
      }
      final double k = Math.rint(next / h.intervalS);
      if (Math.abs(next - k * h.intervalS) > 1e-6) {
        throw new TrajectoryFormatException(name, lineNo, "epoch " + fmt(next) + " s after the start is not on the "
            + "header's interval grid of " + fmt(h.intervalS) + " s");
      }
      epochs++;
      if (epochs > h.epochCount) {
        throw new TrajectoryFormatException(name, lineNo, "more epochs than line 1 announces, found epoch "
            + epochs + ", allowed " + h.epochCount);
      }
      t = next;
      epochLine = lineNo;
    }

    private void closeEpoch() {
      if (h.velocities && (last == 'P' || last == 'e')) {
        throw new TrajectoryFormatException(name, epochLine, "position record of " + lastPositionId
            + " has no velocity record, required when the line 1 flag is V");
      }
      if (epochs > 0 && seenAtEpoch.size() != h.ids.size()) {
        final List<String> missing = new ArrayList<>(h.ids);
        missing.removeAll(seenAtEpoch.keySet());
        throw new TrajectoryFormatException(name, epochLine, "epoch without a record of " + String.join(", ", missing)
            + ", allowed only epochs with a record of every satellite of the header (" + h.ids.size() + ")");
      }
      seenAtEpoch.clear();
    }

    void finish(int lineCount) {
      if (epochs == 0) {
        throw new TrajectoryFormatException(name, lineCount, "no epoch lines ('*') found");
      }
      if (!eof) {
        throw new TrajectoryFormatException(name, lineCount, "missing EOF line (file truncated?)");
      }
      closeEpoch();
      if (epochs != h.epochCount) {
        throw new TrajectoryFormatException(name, lineCount, "the file has " + epochs
            + " epochs, line 1 announces " + h.epochCount);
      }
    }

    private String satellite(String l, int lineNo) {
      final String slot = columns(l, 2, 4);
      final String id = slot.replace(' ', '0');
      if (!SAT_ID.matcher(slot).matches() || !sats.containsKey(id)) {
        throw new TrajectoryFormatException(name, lineNo, "satellite (columns 2-4): found '" + slot
            + "', allowed the satellites of the header (" + String.join(" ", h.ids) + ")");
      }
      return id;
    }

    private void position(String l, int lineNo) {
      final String id = satellite(l, lineNo);
      final Integer before = seenAtEpoch.putIfAbsent(id, lineNo);
      if (before != null) {
        throw new TrajectoryFormatException(name, lineNo, "second record of " + id + " at the epoch of line "
            + epochLine + ", the first is at line " + before + "; allowed one record per satellite and epoch");
      }
      if (l.length() < 60) {
        throw new TrajectoryFormatException(name, lineNo, "position record too short (" + l.length()
            + " chars), allowed 60 to 80 with x, y, z and clock");
      }
      final double[] xyz = new double[3];
      for (int c = 0; c < 3; c++) {
        final int from = 5 + 14 * c;
        xyz[c] = TextFields.decimal(name, lineNo, "xyz".charAt(c) + " (km, columns " + from + "-" + (from + 13) + ")",
            columns(l, from, from + 13), -MAX_RADIUS_KM, MAX_RADIUS_KM);
      }
      final double clock = clock(l, lineNo, "clock (microseconds, columns 47-60)");
      recordTail(l, lineNo, true);
      lastPositionId = id;
      final boolean noPosition = xyz[0] == 0.0 && xyz[1] == 0.0 && xyz[2] == 0.0;
      if (noPosition) {
        return; // no position: format convention
      }
      final double r = Math.sqrt(xyz[0] * xyz[0] + xyz[1] * xyz[1] + xyz[2] * xyz[2]);
      if (!(r >= MIN_RADIUS_KM)) {
        throw new TrajectoryFormatException(name, lineNo, String.format(Locale.ROOT, "position of %s inside the "
            + "Earth, found radius %.3f km, allowed %.0f to %.0f km (or 0, 0, 0 for no value)", id, r, MIN_RADIUS_KM,
            MAX_RADIUS_KM));
      }
      final Satellite s = sats.get(id);
      final double[] sample = new double[9];
      Arrays.fill(sample, Double.NaN);
      sample[0] = t;
      sample[1] = xyz[0] * 1e3;
      sample[2] = xyz[1] * 1e3;
      sample[3] = xyz[2] * 1e3;
      sample[4] = clock * 1e-6;
      s.samples.add(sample);
      s.lines.add(lineNo);
    }

    private double clock(String l, int lineNo, String field) {
      final String text = columns(l, 47, 60);
      if (text.strip().equals(NO_CLOCK)) {
        return Double.NaN;
      }
      return TextFields.decimal(name, lineNo, field, text, -999_999.0, 999_999.0);
    }

    private void recordTail(String l, int lineNo, boolean position) {
      if (l.length() > 80) {
        throw new TrajectoryFormatException(name, lineNo, "record longer than 80 columns (" + l.length() + ")");
      }
      final int[][] sdev = {{62, 63}, {65, 66}, {68, 69}, {71, 73}};
      for (int[] f : sdev) {
        final String text = columns(l, f[0], f[1]);
        if (!text.isBlank()) {
          TextFields.integer(name, lineNo, "standard deviation exponent (columns " + f[0] + "-" + f[1] + ")", text, 0,
              999);
        }
      }
      for (int c : new int[] {61, 64, 67, 70, 74, 77, 78}) {
        if (columns(l, c, c).charAt(0) != ' ') {
          throw new TrajectoryFormatException(name, lineNo, "column " + c + " must be blank, found '"
              + columns(l, c, c) + "'");
        }
      }
      flag(l, lineNo, 75, position ? 'E' : ' ', "clock event flag");
      flag(l, lineNo, 76, position ? 'P' : ' ', "clock prediction flag");
      flag(l, lineNo, 79, position ? 'M' : ' ', "manoeuvre flag");
      flag(l, lineNo, 80, position ? 'P' : ' ', "orbit prediction flag");
    }

    private void flag(String l, int lineNo, int column, char allowed, String what) {
      final char f = columns(l, column, column).charAt(0);
      if (f != ' ' && f != allowed) {
        throw new TrajectoryFormatException(name, lineNo, what + " (column " + column + "): found '" + f
            + "', allowed " + (allowed == ' ' ? "blank" : "'" + allowed + "' or blank"));
      }
    }

    private void velocity(String l, int lineNo) {
      final String id = satellite(l, lineNo);
      if (!id.equals(lastPositionId)) {
        throw new TrajectoryFormatException(name, lineNo, "velocity record of " + id + " after the position record of "
            + lastPositionId + ", allowed only the same satellite");
      }
      if (l.length() < 60) {
        throw new TrajectoryFormatException(name, lineNo, "velocity record too short (" + l.length()
            + " chars), allowed 60 to 80 with vx, vy, vz and clock rate");
      }
      final double[] v = new double[3];
      for (int c = 0; c < 3; c++) {
        final int from = 5 + 14 * c;
        v[c] = TextFields.decimal(name, lineNo, "v" + "xyz".charAt(c) + " (dm/s, columns " + from + "-" + (from + 13)
            + ")", columns(l, from, from + 13), -C_DM_PER_S, C_DM_PER_S);
      }
      final double rate = clock(l, lineNo, "clock rate (1e-4 microseconds/s, columns 47-60)");
      recordTail(l, lineNo, false);
      final Satellite s = sats.get(id);
      final int lastSample = s.samples.size() - 1;
      final boolean noVelocity = v[0] == 0.0 && v[1] == 0.0 && v[2] == 0.0;
      if (lastSample < 0 || noVelocity || s.lines.get(lastSample).intValue() != seenAtEpoch.get(id).intValue()) {
        return; // the position at this epoch had no value, or the velocity has none
      }
      final double[] sample = s.samples.get(lastSample);
      for (int c = 0; c < 3; c++) {
        sample[5 + c] = v[c] * 0.1;
      }
      sample[8] = rate * 1e-10;
    }

    private void correlation(String l, int lineNo) {
      final String[] f = l.substring(2).strip().split("\\s+");
      if (f.length != 10) {
        throw new TrajectoryFormatException(name, lineNo, "correlation record: found " + f.length
            + " fields, allowed 4 standard deviations and 6 correlations");
      }
      for (int k = 0; k < f.length; k++) {
        TextFields.whole(name, lineNo, k < 4 ? "standard deviation" : "correlation", f[k], k < 4 ? 0 : -9_999_999,
            9_999_999);
      }
    }
  }

  private static int[] calendar(String name, int lineNo, String l, int yearColumn) {
    final int c = yearColumn;
    return new int[] {
      TextFields.integer(name, lineNo, "year (columns " + c + "-" + (c + 3) + ")", columns(l, c, c + 3), 1900, 2200),
      TextFields.integer(name, lineNo, "month (columns 9-10)", columns(l, c + 5, c + 6), 1, 12),
      TextFields.integer(name, lineNo, "day (columns 12-13)", columns(l, c + 8, c + 9), 1, 31),
      TextFields.integer(name, lineNo, "hour (columns 15-16)", columns(l, c + 11, c + 12), 0, 23),
      TextFields.integer(name, lineNo, "minute (columns 18-19)", columns(l, c + 14, c + 15), 0, 59)};
  }

  private static String abbreviate(String l) {
    return l.length() <= 40 ? l : l.substring(0, 40) + "...";
  }

  private static String fmt(double v) {
    return String.format(Locale.ROOT, "%.6f", v);
  }

  /** Seconds since 2000-01-01T12:00 of the calendar fields (year, month, day, hour, minute). */
  static double secondsOf(int[] cal) {
    return (CalendarMath.daysSinceJ2000Midnight(cal[0], cal[1], cal[2]) - 0.5) * 86_400.0
        + cal[3] * 3600.0 + cal[4] * 60.0;
  }

  /** @return the file name */
  public String name() {
    return name;
  }

  /** @return 'c' or 'd' */
  public char version() {
    return version;
  }

  /** @return the time system named in the header (GPS for IGS products), as written */
  public String timeSystem() {
    return timeSystem.name();
  }

  /** @return the time system named in the header */
  public TimeSystem timeSystemCode() {
    return timeSystem;
  }

  /** @return the line of the time system (the first {@code %c} line), for messages */
  public int timeSystemLine() {
    return timeSystemLine;
  }

  /** @return whether the file carries velocity records (line 1 flag V) */
  public boolean hasVelocities() {
    return velocities;
  }

  /** @return the coordinate system of line 1 (an Earth-fixed frame such as IGS05) */
  public String coordinateSystem() {
    return coordinateSystem;
  }

  /** @return the epoch interval of line 2, s */
  public double epochIntervalS() {
    return intervalS;
  }

  /** @return year, month, day, hour, minute of the first epoch */
  public int[] firstEpochCalendar() {
    return firstEpoch.clone();
  }

  /** @return seconds from J2000.0 (in the file's time labels) to the first epoch */
  public double firstEpochSecondsJ2000() {
    return firstEpochSeconds;
  }

  /** @return the satellite identifiers, in header order */
  public List<String> satelliteIds() {
    return List.copyOf(satellites.keySet());
  }

  /**
   * One satellite.
   *
   * @param id identifier such as "G05"
   * @return its samples
   * @throws TrajectoryFormatException when the file has no such satellite
   */
  public Satellite satellite(String id) {
    final Satellite s = satellites.get(id);
    if (s == null) {
      throw new TrajectoryFormatException(name, 0, "no satellite '" + id + "' in the file, allowed "
          + String.join(" ", satellites.keySet()));
    }
    return s;
  }
}
