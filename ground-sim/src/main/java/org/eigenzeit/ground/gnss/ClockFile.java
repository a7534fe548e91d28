package org.eigenzeit.ground.gnss;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;

/**
 * Reader of RINEX clock files, versions 2.00 to 3.0x (Ray and Gurtner, "RINEX Extensions to
 * Handle Clock Information", version 3.00 of 2010 and its successors): the header up to
 * {@code END OF HEADER} (version and type C, {@code TIME SYSTEM ID} when present, otherwise GPS
 * time), then data records {@code TT NAME yyyy mm dd hh mm ss.ssssss n v1 v2 [v3..v6]}: the
 * satellite records ({@code AS}) are kept, the receiver and other records are counted. By IGS
 * convention the satellite clocks exclude the periodic relativistic term -2 r.v/c^2.
 *
 * <p>Columns 1-37 are read by position; the values after column 37 are read as blank-separated
 * numbers (real files put them one column later than the format's 2X,2E19.12 says), the third
 * to sixth on a continuation line. Immutable.
 */
public final class ClockFile {
  private static final java.util.regex.Pattern BLANKS = java.util.regex.Pattern.compile("\\s+");

  /** One satellite clock value. */
  public record Sample(double gpsS, double biasS, double sigmaS) {}

  private final String name;
  private final String version;
  private final GnssTimeSystem timeSystem;
  private final Map<String, List<Sample>> satellites;
  private final int otherRecords;

  private ClockFile(String name, String version, GnssTimeSystem ts, Map<String, List<Sample>> sats, int others) {
    this.name = name;
    this.version = version;
    this.timeSystem = ts;
    final Map<String, List<Sample>> copy = new LinkedHashMap<>();
    sats.forEach((k, v) -> copy.put(k, List.copyOf(v)));
    this.satellites = java.util.Collections.unmodifiableMap(copy);
    this.otherRecords = others;
  }

  /**
   * Reads a file (plain or ".gz").
   *
   * @param path the file
   * @return the clocks
   * @throws InputException when unreadable or malformed
   */
  public static ClockFile read(Path path) {
    return parse(GnssFiles.displayName(path), GnssFiles.lines(path));
  }

  /**
   * Parses lines.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the clocks
   * @throws InputException with the line of the first defect
   */
  public static ClockFile parse(String name, List<String> lines) {
    if (lines.isEmpty() || !Columns.of(lines.get(0), 61, 80).startsWith("RINEX VERSION / TYPE")) {
      throw new InputException(name, 1, "not a RINEX file: 'RINEX VERSION / TYPE' expected in columns 61-80");
    }
    final String version = Columns.of(lines.get(0), 1, 9).strip();
    TextFields.decimal(name, 1, "RINEX clock version (columns 1-9)", version, 2.0, 3.99);
    if (Columns.of(lines.get(0), 21, 21).charAt(0) != 'C') {
      throw new InputException(name, 1, "file type (column 21): found '" + Columns.of(lines.get(0), 21, 21)
          + "', allowed C (clock data)");
    }
    int i = 1;
    GnssTimeSystem ts = GnssTimeSystem.GPS;
    while (i < lines.size() && !Columns.of(lines.get(i), 61, 80).startsWith("END OF HEADER")) {
      if (Columns.of(lines.get(i), 61, 80).startsWith("TIME SYSTEM ID")) {
        ts = GnssTimeSystem.of(Columns.of(lines.get(i), 4, 6), name, i + 1);
      }
      i++;
    }
    if (i == lines.size()) {
      throw new InputException(name, lines.size(), "no 'END OF HEADER' line");
    }
    i++;
    final Map<String, List<Sample>> sats = new LinkedHashMap<>();
    int others = 0;
    while (i < lines.size()) {
      final String l = lines.get(i);
      if (l.isBlank()) {
        i++;
        continue;
      }
      final String type = Columns.of(l, 1, 2);
      if (!List.of("AR", "AS", "CR", "DR", "MS").contains(type)) {
        throw new InputException(name, i + 1, "record type (columns 1-2): found '" + type
            + "', allowed AR, AS, CR, DR, MS");
      }
      final int n = TextFields.integer(name, i + 1, "number of values (columns 35-37)", Columns.of(l, 35, 37), 1, 6);
      final double[] values = new double[n];
      final int onFirst = Math.min(n, 2);
      readValues(name, i + 1, Columns.blankFrom(l, 38) ? "" : l.substring(37), values, 0, onFirst);
      if (n > 2) {
        if (i + 1 >= lines.size()) {
          throw new InputException(name, i + 1, "continuation line with values 3 to " + n + " missing");
        }
        i++;
        readValues(name, i + 1, lines.get(i), values, 2, n - 2);
      }
      if (type.equals("AS")) {
        final String id = satellite(name, i + 1 - (n > 2 ? 1 : 0), Columns.of(l, 4, 7));
        final double t = epoch(name, i + 1 - (n > 2 ? 1 : 0), l, ts);
        final List<Sample> list = sats.computeIfAbsent(id, k -> new ArrayList<>());
        if (!list.isEmpty() && t <= list.get(list.size() - 1).gpsS()) {
          throw new InputException(name, i + 1, "epochs of " + id + " must increase");
        }
        list.add(new Sample(t, values[0], n > 1 ? values[1] : Double.NaN));
      } else {
        others++;
      }
      i++;
    }
    return new ClockFile(name, version, ts, sats, others);
  }

  private static void readValues(String name, int line, String text, double[] out, int from, int count) {
    final String t = text.strip();
    final String[] tokens = t.isEmpty() ? new String[0] : BLANKS.split(t, -1);
    if (tokens.length != count) {
      throw new InputException(name, line, "clock values: " + count + " expected, found " + tokens.length);
    }
    for (int k = 0; k < count; k++) {
      out[from + k] = TextFields.decimal(name, line, "clock value " + (from + k + 1), tokens[k]);
    }
  }

  private static String satellite(String name, int line, String raw) {
    final Constellation sys = Constellation.of(raw.charAt(0), name, line);
    final int n = TextFields.integer(name, line, "satellite number (columns 5-7)", raw.substring(1), 1, 99);
    return sys.id(n);
  }

  private static final int[] EPOCH_COLUMNS = {9, 12, 13, 15, 16, 18, 19, 21, 22, 24, 25, 34};

  private static double epoch(String name, int line, String l, GnssTimeSystem ts) {
    final double label = Columns.labels(Columns.epoch(name, line, l, EPOCH_COLUMNS, false));
    final double whole = Math.floor(label);
    return GnssTimeSystem.gpsSeconds(ts.toTt((long) whole, label - whole, name, line));
  }

  /** @return the file name */
  public String name() {
    return name;
  }

  /** @return the version as written */
  public String version() {
    return version;
  }

  /** @return the time system of the epochs */
  public GnssTimeSystem timeSystem() {
    return timeSystem;
  }

  /** @return the satellites with clock records */
  public List<String> satellites() {
    return List.copyOf(satellites.keySet());
  }

  /**
   * A satellite's clock samples.
   *
   * @param id satellite
   * @return the samples, increasing epochs (empty when none)
   */
  public List<Sample> samples(String id) {
    return satellites.getOrDefault(id, List.of());
  }

  /** @return the number of receiver and other non-satellite records */
  public int otherRecords() {
    return otherRecords;
  }
}
