package org.eigenzeit.ground.trajectory;

import static org.eigenzeit.ground.input.TextFields.columns;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.input.TextFiles;

/**
 * Reader of RINEX 2 GPS navigation files (Gurtner and Estey, "RINEX: The Receiver Independent
 * Exchange Format Version 2.11", 2007, Tables A3 and A4): header up to "END OF HEADER", then
 * 8-line records of the PRN, the clock epoch and 29 broadcast parameters in D-exponent fields of
 * 19 characters.
 *
 * <p>Every field is checked. Header: version 2.x, type N, each label known and its numbers
 * finite. Records: all 8 lines present and no longer than 80 columns, every field present (only
 * the two spares of the last line may be blank), every number finite and within the range its
 * IS-GPS-200 broadcast field can hold (IS-GPS-200, Table 20-III, bit counts and scale factors,
 * from memory; see {@link #RANGES}): sqrt(A) 2530-8192 sqrt(m), e in [0, 0.5), angles within
 * +-pi, rates and harmonic corrections within their field ranges; codes, flags, health (0-63), IODE
 * (0-255), IODC (0-1023) and the GPS week whole numbers, health 0.5 or NaN refused, never
 * truncated; IODE equal to the 8 low bits of IODC (IS-GPS-200 20.3.4.4); toc and toe multiples of
 * 16 s (their scale factor) and toe within half a week of toc; the fit interval 0 (unknown) or one
 * of IS-GPS-200's values. A second record of the same PRN and toc is dropped and listed in
 * {@link #duplicates()} when its ephemeris equals the first (only the transmission time may
 * differ), and refused when it differs. Refusals name the file and the line.
 *
 * <p>Immutable after parsing.
 */
public final class RinexNavFile {
  /**
   * One navigation record as read.
   *
   * @param ephemeris the broadcast elements
   * @param line 1-based line of the record's first line
   * @param af0S clock bias, s
   * @param af1 clock drift, s/s
   * @param af2 clock drift rate, s/s^2
   * @param iode issue of data, ephemeris
   * @param iodc issue of data, clock
   * @param tgdS group delay, s
   * @param accuracyM user range accuracy, m
   * @param transmissionSow transmission time of the message, GPS seconds of week
   * @param fitIntervalH fit interval, hours (0 when not known)
   */
  public record Entry(BroadcastEphemeris ephemeris, int line, double af0S, double af1, double af2, int iode,
      int iodc, double tgdS, double accuracyM, double transmissionSow, double fitIntervalH) {}

  /**
   * Allowed magnitude of each orbit parameter p[0..27] of lines 2-8 (NaN: checked separately), from
   * the IS-GPS-200 Table 20-III field sizes: a signed field of n bits with scale 2^-s holds up to
   * 2^(n-1-s); angles in semicircles are converted to radians.
   */
  static final double[] RANGES = {
    Double.NaN, 1024.0, Math.PI * 0x1p-28, Math.PI, // IODE, Crs (m), delta n (rad/s), M0 (rad)
    0x1p-14, Double.NaN, 0x1p-14, Double.NaN, // Cuc (rad), e, Cus (rad), sqrt(A)
    Double.NaN, 0x1p-14, Math.PI, 0x1p-14, // toe, Cic (rad), OMEGA0 (rad), Cis (rad)
    Math.PI, 1024.0, Math.PI, Math.PI * 0x1p-20, // i0 (rad), Crc (m), omega (rad), OMEGA DOT (rad/s)
    Math.PI * 0x1p-30, Double.NaN, Double.NaN, Double.NaN, // IDOT (rad/s), L2 codes, week, L2 P flag
    Double.NaN, Double.NaN, 0x1p-24, Double.NaN, // accuracy, health, TGD (s), IODC
    Double.NaN, Double.NaN, Double.NaN, Double.NaN}; // transmission time, fit interval, spares
  private static final String[] NAMES = {"IODE", "Crs (m)", "delta n (rad/s)", "M0 (rad)", "Cuc (rad)",
    "e", "Cus (rad)", "sqrt(A) (sqrt(m))", "toe (s of week)", "Cic (rad)", "OMEGA0 (rad)", "Cis (rad)",
    "i0 (rad)", "Crc (m)", "omega (rad)", "OMEGA DOT (rad/s)", "IDOT (rad/s)", "codes on L2",
    "GPS week", "L2 P data flag", "SV accuracy (m)", "SV health", "TGD (s)", "IODC",
    "transmission time (s of week)", "fit interval (h)", "spare", "spare"};
  private static final List<Double> FIT_INTERVALS_H =
      List.of(0.0, 4.0, 6.0, 8.0, 14.0, 26.0, 50.0, 74.0, 98.0, 122.0, 146.0);
  /** Relative margin on the field ranges, for the last digit of the printed value. */
  private static final double MARGIN = 1 + 1e-9;
  private static final double WEEK_S = 604_800.0;

  private final List<Entry> entries;
  private final List<String> duplicates;

  private RinexNavFile(List<Entry> entries, List<String> duplicates) {
    this.entries = List.copyOf(entries);
    this.duplicates = List.copyOf(duplicates);
  }

  /**
   * Reads a file.
   *
   * @param path the file
   * @return the parsed records
   * @throws IOException never (kept for callers written against earlier versions); an unreadable
   *     file is an {@link org.eigenzeit.ground.input.InputException}
   * @throws TrajectoryFormatException with the line number when malformed
   */
  public static RinexNavFile read(Path path) throws IOException {
    return parse(String.valueOf(path.getFileName()), TextFiles.readAsciiLines(path));
  }

  /**
   * Parses lines.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the parsed records
   * @throws TrajectoryFormatException naming the line of the first defect
   */
  public static RinexNavFile parse(String name, List<String> lines) {
    int i = header(name, lines);
    int end = lines.size();
    while (end > i && lines.get(end - 1).isBlank()) {
      end--;
    }
    final Map<String, Parsed> byKey = new LinkedHashMap<>();
    final List<String> dups = new ArrayList<>();
    while (i < end) {
      if (i + 8 > end) {
        throw new TrajectoryFormatException(name, i + 1, "incomplete navigation record: found " + (end - i)
            + " lines, allowed 8");
      }
      final Parsed r = record(name, lines, i);
      final Parsed first = byKey.putIfAbsent(r.key(), r);
      if (first != null) {
        final String diff = difference(first, r);
        if (diff != null) {
          throw new TrajectoryFormatException(name, i + 1, "second record of PRN " + r.entry().ephemeris().prn()
              + " with the clock epoch of the record at line " + first.entry().line() + " differs in " + diff
              + "; allowed only identical duplicates (the transmission time may differ)");
        }
        dups.add(name + ":" + (i + 1) + ": duplicate of the record at line " + first.entry().line() + " (PRN "
            + r.entry().ephemeris().prn() + "), dropped");
      }
      i += 8;
    }
    final List<Entry> out = new ArrayList<>(byKey.size());
    for (Parsed r : byKey.values()) {
      out.add(r.entry());
    }
    return new RinexNavFile(out, dups);
  }

  /** A record with its raw parameters: clock (af0, af1, af2) and p[0..27] of lines 2-8. */
  private record Parsed(Entry entry, double[] clock, double[] p, String key) {}

  private static int header(String name, List<String> lines) {
    final String first = lines.isEmpty() ? "" : lines.get(0);
    if (!columns(first, 61, 80).strip().equals("RINEX VERSION / TYPE")) {
      throw new TrajectoryFormatException(name, 1, "not a RINEX file: 'RINEX VERSION / TYPE' expected in columns "
          + "61-80, found '" + columns(first, 61, 80).strip() + "'");
    }
    final double version = TextFields.decimal(name, 1, "RINEX version (columns 1-9)", columns(first, 1, 9));
    if (!(version >= 2.0 && version < 3.0)) {
      throw new TrajectoryFormatException(name, 1, "RINEX version " + columns(first, 1, 9).strip()
          + " not supported, allowed 2.x");
    }
    if (columns(first, 21, 21).charAt(0) != 'N') {
      throw new TrajectoryFormatException(name, 1, "file type (column 21): found '" + columns(first, 21, 21)
          + "', allowed N (GPS navigation)");
    }
    for (int i = 1; i < lines.size(); i++) {
      final String l = lines.get(i);
      final int lineNo = i + 1;
      if (l.length() > 80) {
        throw new TrajectoryFormatException(name, lineNo, "header line longer than 80 columns (" + l.length() + ")");
      }
      final String label = columns(l, 61, 80).strip();
      switch (label) {
        case "END OF HEADER" -> {
          return i + 1;
        }
        case "PGM / RUN BY / DATE", "COMMENT" -> { }
        case "ION ALPHA", "ION BETA" -> {
          for (int k = 0; k < 4; k++) {
            TextFields.fortranDecimal(name, lineNo, label + " " + (k + 1) + " (columns " + (3 + 12 * k) + "-"
                + (14 + 12 * k) + ")", columns(l, 3 + 12 * k, 14 + 12 * k));
          }
        }
        case "DELTA-UTC: A0,A1,T,W" -> {
          TextFields.checkRange(name, lineNo, "A0 (s)", TextFields.fortranDecimal(name, lineNo, "A0 (s, columns 4-22)",
              columns(l, 4, 22)), columns(l, 4, 22).strip(), -1.0, 1.0);
          TextFields.checkRange(name, lineNo, "A1 (s/s)", TextFields.fortranDecimal(name, lineNo,
              "A1 (s/s, columns 23-41)", columns(l, 23, 41)), columns(l, 23, 41).strip(), -1e-6, 1e-6);
          TextFields.integer(name, lineNo, "T (s of week, columns 42-50)", columns(l, 42, 50), 0, 604_800);
          TextFields.integer(name, lineNo, "W (GPS week, columns 51-59)", columns(l, 51, 59), 0, 9999);
        }
        case "LEAP SECONDS" -> TextFields.integer(name, lineNo, "leap seconds (columns 1-6)", columns(l, 1, 6), 0, 99);
        default -> throw new TrajectoryFormatException(name, lineNo, "unknown header label (columns 61-80), found '"
            + label + "', allowed PGM / RUN BY / DATE, COMMENT, ION ALPHA, ION BETA, DELTA-UTC: A0,A1,T,W, "
            + "LEAP SECONDS, END OF HEADER");
      }
    }
    throw new TrajectoryFormatException(name, lines.size(), "no 'END OF HEADER' line");
  }

  private static Parsed record(String name, List<String> lines, int i) {
    final double[] p = new double[28];
    final String first = lines.get(i);
    final int lineNo = i + 1;
    for (int l = 0; l < 8; l++) {
      if (lines.get(i + l).length() > 80) {
        throw new TrajectoryFormatException(name, lineNo + l, "record line longer than 80 columns ("
            + lines.get(i + l).length() + ")");
      }
      if (lines.get(i + l).isBlank()) {
        throw new TrajectoryFormatException(name, lineNo + l, "blank line inside a navigation record (line " + (l + 1)
            + " of 8)");
      }
    }
    final int prn = TextFields.integer(name, lineNo, "PRN (columns 1-2)", columns(first, 1, 2), 1, 63);
    final int yy = TextFields.integer(name, lineNo, "year (columns 3-5)", columns(first, 3, 5), 0, 99);
    final int year = yy < 80 ? 2000 + yy : 1900 + yy;
    final int month = TextFields.integer(name, lineNo, "month (columns 6-8)", columns(first, 6, 8), 1, 12);
    final int day = TextFields.integer(name, lineNo, "day (columns 9-11)", columns(first, 9, 11), 1, 31);
    final int hour = TextFields.integer(name, lineNo, "hour (columns 12-14)", columns(first, 12, 14), 0, 23);
    final int minute = TextFields.integer(name, lineNo, "minute (columns 15-17)", columns(first, 15, 17), 0, 59);
    final double sec = TextFields.decimal(name, lineNo, "seconds (columns 18-22)", columns(first, 18, 22));
    TextFields.checkCalendar(name, lineNo, year, month, day, hour, minute, sec, false);
    final double af0 = orbitField(name, lineNo, first, 23, "af0 (s)", 0x1p-10);
    final double af1 = orbitField(name, lineNo, first, 42, "af1 (s/s)", 0x1p-28);
    final double af2 = orbitField(name, lineNo, first, 61, "af2 (s/s^2)", 0x1p-48);
    final long days = CalendarMath.julianDayNumber(year, month, day) - CalendarMath.julianDayNumber(1980, 1, 6);
    final double toc = (days % 7) * 86_400.0 + hour * 3600.0 + minute * 60.0 + sec;
    multipleOf16(name, lineNo, "toc (s of week)", toc);
    for (int l = 1; l <= 7; l++) {
      final String line = lines.get(i + l);
      if (!columns(line, 1, 3).isBlank()) {
        throw new TrajectoryFormatException(name, lineNo + l, "columns 1-3 of a broadcast orbit line must be blank, "
            + "found '" + columns(line, 1, 3) + "'");
      }
      for (int k = 0; k < 4; k++) {
        final int idx = 4 * (l - 1) + k;
        final int col = 4 + 19 * k;
        final String text = columns(line, col, col + 18);
        if (idx >= 26 && text.isBlank()) {
          p[idx] = 0.0; // spare
          continue;
        }
        p[idx] = Double.isNaN(RANGES[idx])
            ? TextFields.fortranDecimal(name, lineNo + l, NAMES[idx] + " (columns " + col + "-" + (col + 18) + ")", text)
            : orbitField(name, lineNo + l, line, col, NAMES[idx], RANGES[idx]);
      }
    }
    final Entry entry = entry(name, lineNo, prn, toc, days / 7, p, af0, af1, af2);
    return new Parsed(entry, new double[] {af0, af1, af2}, p, prn + "@" + (days / 7) + ":" + toc);
  }

  private static double orbitField(String name, int lineNo, String line, int col, String what, double bound) {
    final String text = columns(line, col, col + 18);
    final String field = what + " (columns " + col + "-" + (col + 18) + ")";
    final double v = TextFields.fortranDecimal(name, lineNo, field, text);
    return TextFields.checkRange(name, lineNo, field, v, text.strip(), -bound * MARGIN, bound * MARGIN);
  }

  private static Entry entry(String name, int lineNo, int prn, double toc, long tocWeek, double[] p, double af0,
      double af1, double af2) {
    final int iode = (int) whole(name, lineNo + 1, 0, p, 0, 255);
    final double e = TextFields.checkRange(name, lineNo + 2, NAMES[5], p[5], Double.toString(p[5]), 0.0,
        0.5 - 0x1p-33);
    final double sqrtA = TextFields.checkRange(name, lineNo + 2, NAMES[7], p[7], Double.toString(p[7]), 2530.0,
        8192.0 - 0x1p-19);
    final double toe = TextFields.checkRange(name, lineNo + 3, NAMES[8], p[8], Double.toString(p[8]), 0.0,
        604_784.0);
    multipleOf16(name, lineNo + 3, NAMES[8], toe);
    whole(name, lineNo + 5, 17, p, 0, 3);
    final int week = (int) whole(name, lineNo + 5, 18, p, 0, 9999);
    whole(name, lineNo + 5, 19, p, 0, 1);
    final double accuracy = TextFields.checkRange(name, lineNo + 6, NAMES[20], p[20], Double.toString(p[20]), 0.0,
        8192.0);
    final int health = (int) whole(name, lineNo + 6, 21, p, 0, 63);
    final int iodc = (int) whole(name, lineNo + 6, 23, p, 0, 1023);
    if ((iodc & 0xFF) != iode) {
      throw new TrajectoryFormatException(name, lineNo + 6, "IODC " + iodc + " disagrees with IODE " + iode
          + " (line " + (lineNo + 1) + "), allowed IODE = IODC mod 256 (IS-GPS-200 20.3.4.4)");
    }
    final double ttm = TextFields.checkRange(name, lineNo + 7, NAMES[24], p[24], Double.toString(p[24]), -WEEK_S,
        2 * WEEK_S);
    if (!FIT_INTERVALS_H.contains(p[25])) {
      throw new TrajectoryFormatException(name, lineNo + 7, "fit interval (h): found " + p[25]
          + ", allowed 0 (not known) or " + FIT_INTERVALS_H.subList(1, FIT_INTERVALS_H.size()));
    }
    final double toeMinusToc = (week - tocWeek) * WEEK_S + toe - toc;
    if (Math.abs(toeMinusToc) > WEEK_S / 2) {
      throw new TrajectoryFormatException(name, lineNo + 5, String.format(Locale.ROOT, "GPS week %d with toe %.0f s "
          + "lies %.0f s from the clock epoch of line %d, allowed within half a week", week, toe, toeMinusToc,
          lineNo));
    }
    final BroadcastEphemeris eph = new BroadcastEphemeris(prn, toc, toe, week, sqrtA, e, p[3], p[2], p[10], p[12],
        p[14], p[15], p[16], p[4], p[6], p[13], p[1], p[9], p[11], health);
    return new Entry(eph, lineNo, af0, af1, af2, iode, iodc, p[22], accuracy, ttm, p[25]);
  }

  private static long whole(String name, int lineNo, int idx, double[] p, long min, long max) {
    final double v = p[idx];
    if (Double.compare(v, Math.rint(v)) != 0) {
      throw new TrajectoryFormatException(name, lineNo, NAMES[idx] + ": not a whole number, found " + v
          + ", allowed whole numbers " + min + " to " + max);
    }
    TextFields.checkRange(name, lineNo, NAMES[idx], v, Long.toString((long) v), min, max);
    return (long) v;
  }

  private static void multipleOf16(String name, int lineNo, String what, double seconds) {
    if (Double.compare(seconds / 16.0, Math.rint(seconds / 16.0)) != 0) {
      throw new TrajectoryFormatException(name, lineNo, what + ": found " + seconds
          + ", allowed whole multiples of 16 s (the broadcast field's scale factor)");
    }
  }

  /** The first parameter in which two records of the same PRN and toc differ, or null. */
  private static String difference(Parsed a, Parsed b) {
    final String[] clockNames = {"af0 (s)", "af1 (s/s)", "af2 (s/s^2)"};
    for (int k = 0; k < 3; k++) {
      if (Double.compare(a.clock()[k], b.clock()[k]) != 0) {
        return clockNames[k] + " (found " + b.clock()[k] + ", first " + a.clock()[k] + ")";
      }
    }
    for (int k = 0; k < 26; k++) {
      if (k != 24 && Double.compare(a.p()[k], b.p()[k]) != 0) {
        return NAMES[k] + " (found " + b.p()[k] + ", first " + a.p()[k] + ")";
      }
    }
    return null;
  }

  /** @return all records, in file order (duplicates dropped) */
  public List<BroadcastEphemeris> records() {
    final List<BroadcastEphemeris> out = new ArrayList<>(entries.size());
    for (Entry e : entries) {
      out.add(e.ephemeris());
    }
    return out;
  }

  /** @return all records with their clock parameters and lines, in file order */
  public List<Entry> entries() {
    return entries;
  }

  /** @return one line per dropped identical duplicate record ({@code file:line: ...}) */
  public List<String> duplicates() {
    return duplicates;
  }
}
