package org.eigenzeit.ground.gnss;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Reader of RINEX 2 navigation files: GPS (type N, version 2.x, Gurtner and Estey 2007 Table A4),
 * QZSS (version 2.12 type N with system J in column 41: records start with 'J' and the PRN,
 * fields in the 4X,4D19.12 layout of RINEX 3) and GLONASS (type G, Table A11). Every field is
 * parsed by {@link TextFields} (decimal with D or E exponents, finite, calendar checked); a file
 * whose layout is broken is refused with {@code file:line: what, found, allowed}. Whether the
 * values of a well-formed record make sense is {@link BroadcastCheck}'s business, so a bad record
 * is reported and rejected rather than taking the whole file down.
 *
 * <p>Two-digit years: 80-99 are 19xx, 00-79 are 20xx (RINEX 2). GPS and QZSS epochs are GPS time
 * (QZSS time is aligned with it); GLONASS epochs are UTC and are converted through the shipped
 * leap-second table. The two spare fields of a GPS record's last line are not interpreted (real
 * files carry unreadable text there, e.g. a FORTRAN exponent overflow "0.499063314480-269").
 * Immutable.
 */
public final class NavFile {
  private final String name;
  private final Constellation system;
  private final String version;
  private final int leapSeconds;
  private final int leapSecondsLine;
  private final List<KeplerRecord> kepler;
  private final List<GlonassRecord> glonass;

  private NavFile(String name, Constellation system, String version, int leapSeconds, int leapSecondsLine,
      List<KeplerRecord> kepler, List<GlonassRecord> glonass) {
    this.name = name;
    this.leapSecondsLine = leapSecondsLine;
    this.system = system;
    this.version = version;
    this.leapSeconds = leapSeconds;
    this.kepler = List.copyOf(kepler);
    this.glonass = List.copyOf(glonass);
  }

  /**
   * Reads a file (plain or ".gz").
   *
   * @param path the file
   * @return the records
   * @throws InputException when unreadable or malformed
   */
  public static NavFile read(Path path) {
    return parse(GnssFiles.displayName(path), GnssFiles.lines(path));
  }

  /**
   * Parses lines.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the records
   * @throws InputException with the line of the first defect
   */
  public static NavFile parse(String name, List<String> lines) {
    if (lines.isEmpty() || !Columns.of(lines.get(0), 61, 80).startsWith("RINEX VERSION / TYPE")) {
      throw new InputException(name, 1, "not a RINEX file: 'RINEX VERSION / TYPE' expected in columns 61-80");
    }
    final String first = lines.get(0);
    final String version = Columns.of(first, 1, 9).strip();
    final double v = TextFields.decimal(name, 1, "RINEX version (columns 1-9)", version, 2.0, 2.99);
    final char type = Columns.of(first, 21, 21).charAt(0);
    final char sys = Columns.of(first, 41, 41).charAt(0);
    final Constellation system;
    if (type == 'G') {
      system = Constellation.GLONASS;
    } else if (type == 'N' && (sys == ' ' || sys == 'G')) {
      system = Constellation.GPS;
    } else if (type == 'N' && sys == 'J' && v >= 2.12 - 1e-9) {
      system = Constellation.QZSS;
    } else {
      throw new InputException(name, 1, "file type (column 21) and system (column 41): found '" + type + "' '" + sys
          + "', allowed N (GPS), N with J (QZSS, version 2.12) or G (GLONASS)");
    }
    int i = 1;
    int leap = -1;
    int leapLine = 0;
    while (i < lines.size() && !Columns.of(lines.get(i), 61, 80).startsWith("END OF HEADER")) {
      if (Columns.of(lines.get(i), 61, 80).startsWith("LEAP SECONDS")) {
        leap = TextFields.integer(name, i + 1, "leap seconds (columns 1-6)", Columns.of(lines.get(i), 1, 6), 0, 99);
        leapLine = i + 1;
      }
      i++;
    }
    if (i == lines.size()) {
      throw new InputException(name, lines.size(), "no 'END OF HEADER' line");
    }
    i++;
    final List<KeplerRecord> kep = new ArrayList<>();
    final List<GlonassRecord> glo = new ArrayList<>();
    final int size = system == Constellation.GLONASS ? 4 : 8;
    while (i < lines.size()) {
      if (lines.get(i).isBlank()) {
        i++;
        continue;
      }
      if (i + size > lines.size()) {
        throw new InputException(name, i + 1, "incomplete navigation record: " + size + " lines expected, found "
            + (lines.size() - i));
      }
      if (system == Constellation.GLONASS) {
        glo.add(glonass(name, lines, i));
      } else {
        kep.add(kepler(name, lines, i, system));
      }
      i += size;
    }
    return new NavFile(name, system, version, leap, leapLine, kep, glo);
  }

  /** Epoch fields of a record's first line starting at a column: {year, month, day, hour, minute, second}. */
  private static double[] epoch(String name, int line, String l, int col) {
    return Columns.epoch(name, line, l, new int[] {col, col + 2, col + 3, col + 5, col + 6, col + 8, col + 9, col + 11,
      col + 12, col + 14, col + 15, col + 19}, true);
  }

  private static double gpsSeconds(double[] e) {
    return Columns.labels(e) + GnssTimeSystem.GPS_EPOCH_TO_J2000_S;
  }

  private static double field(String name, int line, String l, int start, String what, boolean blankIsZero) {
    final String text = Columns.of(l, start, start + 18);
    if (text.isBlank()) {
      if (blankIsZero) {
        return 0.0;
      }
      throw new InputException(name, line, what + " (columns " + start + "-" + (start + 18) + "): blank, allowed a number");
    }
    return TextFields.decimal(name, line, what + " (columns " + start + "-" + (start + 18) + ")", text);
  }

  private static final String[] KEPLER_NAMES = {"SV clock bias", "SV clock drift", "SV clock drift rate", "IODE",
    "Crs", "Delta n", "M0", "Cuc", "e", "Cus", "sqrt(A)", "toe", "Cic", "OMEGA0", "Cis", "i0", "Crc", "omega",
    "OMEGA DOT", "IDOT", "codes on L2", "GPS week", "L2 P flag", "SV accuracy", "SV health", "TGD", "IODC",
    "transmission time", "fit interval"};

  private static KeplerRecord kepler(String name, List<String> lines, int i, Constellation system) {
    final String first = lines.get(i);
    final int number;
    final double[] ep;
    final int indent;
    if (system == Constellation.QZSS) {
      if (first.charAt(0) != 'J') {
        throw new InputException(name, i + 1, "QZSS record must start with 'J', found '" + first.charAt(0) + "'");
      }
      number = TextFields.integer(name, i + 1, "QZSS PRN (columns 2-3)", Columns.of(first, 2, 3), 1, 10);
      ep = epoch(name, i + 1, first, 4);
      indent = 5;
    } else {
      number = TextFields.integer(name, i + 1, "PRN (columns 1-2)", Columns.of(first, 1, 2), 1, 32);
      ep = epoch(name, i + 1, first, 3);
      indent = 4;
    }
    final double[] p = new double[KeplerRecord.COUNT];
    for (int k = 0; k < 3; k++) {
      p[k] = field(name, i + 1, first, indent + 19 + 19 * k, KEPLER_NAMES[k], false);
    }
    for (int l = 1; l <= 7; l++) {
      final String text = lines.get(i + l);
      if (!Columns.of(text, 1, indent - 1).isBlank()) {
        throw new InputException(name, i + l + 1, "broadcast orbit line " + l + ": columns 1-" + (indent - 1)
            + " must be blank, found '" + Columns.of(text, 1, indent - 1) + "' (a record of " + l + " lines?)");
      }
      for (int k = 0; k < 4; k++) {
        final int idx = 3 + 4 * (l - 1) + k;
        if (idx >= KeplerRecord.COUNT) {
          break; // the last line's spares are not interpreted
        }
        final boolean optional = idx == KeplerRecord.L2_CODES || idx == KeplerRecord.L2P || idx == KeplerRecord.FIT;
        p[idx] = field(name, i + l + 1, text, indent + 19 * k, KEPLER_NAMES[idx], optional);
      }
    }
    return new KeplerRecord(system, number, name, i + 1, gpsSeconds(ep), p);
  }

  private static GlonassRecord glonass(String name, List<String> lines, int i) {
    final String first = lines.get(i);
    final int slot = TextFields.integer(name, i + 1, "slot number (columns 1-2)", Columns.of(first, 1, 2), 1, 99);
    final double[] ep = epoch(name, i + 1, first, 3);
    final long labels = GnssTimeSystem.labelsJ2000((int) ep[0], (int) ep[1], (int) ep[2], (int) ep[3], (int) ep[4], 0);
    final double whole = Math.floor(ep[5]);
    final SplitTime tt = GnssTimeSystem.UTC.toTt(labels + (long) whole, ep[5] - whole, name, i + 1);
    final double tb = GnssTimeSystem.gpsSeconds(tt);
    final double tauN = field(name, i + 1, first, 23, "SV clock bias -TauN", false);
    final double gammaN = field(name, i + 1, first, 42, "relative frequency bias GammaN", false);
    final double tk = field(name, i + 1, first, 61, "message frame time", false);
    final double[] pos = new double[3];
    final double[] vel = new double[3];
    final double[] acc = new double[3];
    final double[] extra = new double[3];
    final String[] extraNames = {"health", "frequency number", "age of operational information"};
    final String[] axes = {"X", "Y", "Z"};
    for (int c = 0; c < 3; c++) {
      final String text = lines.get(i + 1 + c);
      if (!Columns.of(text, 1, 3).isBlank()) {
        throw new InputException(name, i + c + 2, "broadcast orbit line " + (c + 1) + ": columns 1-3 must be blank, found '"
            + Columns.of(text, 1, 3) + "'");
      }
      pos[c] = field(name, i + c + 2, text, 4, "satellite position " + axes[c] + ", km", false) * 1e3;
      vel[c] = field(name, i + c + 2, text, 23, "velocity " + axes[c] + ", km/s", false) * 1e3;
      acc[c] = field(name, i + c + 2, text, 42, "acceleration " + axes[c] + ", km/s^2", false) * 1e3;
      extra[c] = field(name, i + c + 2, text, 61, extraNames[c], c == 2);
    }
    return new GlonassRecord(slot, name, i + 1, tb, tauN, gammaN, tk, pos, vel, acc, extra[0], extra[1], extra[2]);
  }

  /** @return the file name */
  public String name() {
    return name;
  }

  /** @return the system of the file */
  public Constellation system() {
    return system;
  }

  /** @return the RINEX version as written */
  public String version() {
    return version;
  }

  /** @return the LEAP SECONDS header value, or -1 when absent */
  public int leapSeconds() {
    return leapSeconds;
  }

  /**
   * Whether the header's LEAP SECONDS (GPS - UTC, RINEX 2.11) agrees with the shipped leap-second
   * table at the first record; the table governs the conversions either way.
   *
   * @return null when it agrees or is absent, otherwise a note with file and line
   */
  public String leapSecondsNote() {
    final double first = !kepler.isEmpty() ? kepler.get(0).tocGpsS() : !glonass.isEmpty() ? glonass.get(0).tbGpsS() : Double.NaN;
    if (leapSeconds < 0 || Double.isNaN(first)) {
      return null;
    }
    final double table = GnssTimeSystem.taiMinusUtcS(GnssTimeSystem.ttOfGps(first)) - 19;
    return Math.abs(table - leapSeconds) < 0.5 ? null : name + ":" + leapSecondsLine + ": LEAP SECONDS says " + leapSeconds
        + " s, the leap-second table gives GPS - UTC = " + (long) table + " s at the first record; the table is used";
  }

  /** @return the Keplerian records (GPS, QZSS), in file order */
  public List<KeplerRecord> keplerRecords() {
    return kepler;
  }

  /** @return the GLONASS records, in file order */
  public List<GlonassRecord> glonassRecords() {
    return glonass;
  }

  @Override
  public String toString() {
    return String.format(Locale.ROOT, "%s (RINEX %s %s, %d records)", name, version, system,
        kepler.size() + glonass.size());
  }
}
