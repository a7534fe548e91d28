package org.eigenzeit.ground.gnss;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.input.TextFiles;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;

/**
 * What an SP3-c/d file says beyond positions and clocks (Hilla 2010, "The Extended Standard
 * Product 3 Orbit Format (SP3-c)", and Hilla 2016, SP3-d): the header lines 1 and 2 (start epoch,
 * number of epochs, coordinate system, orbit type, agency; GPS week, seconds of week, interval,
 * MJD), the satellite list and accuracy exponents ({@code +}, {@code ++}), the file type of the
 * {@code %c} line, the comment lines ({@code /*}) with the contributing analysis centres of a
 * combined product, and the flags of every position record (columns 75-80: clock event E, clock
 * prediction P, manoeuvre M, orbit prediction P).
 *
 * <p>Every field is checked: line 2 must agree with the start epoch of line 1 (the GPS week and
 * seconds are computed from the epoch, never taken on trust), every epoch must lie on the
 * header's interval grid, every satellite of a record must be in the header list. A file with
 * more epochs than line 1 announces is refused; one with fewer, or whose first epoch is later than
 * the start of line 1 (a product cut out of a longer one, as IGS's predicted halves of the
 * ultra-rapid orbits are), is used and carries a warning. Positions and
 * clocks themselves are read by {@link org.eigenzeit.ground.trajectory.Sp3File}; the time system
 * of the {@code %c} line is its {@code timeSystem()}. Immutable.
 */
public final class Sp3Header {
  private static final Set<String> ORBIT_TYPES = Set.of("FIT", "EXT", "BCT", "BHN", "HLM");
  private static final String FILE_TYPES = "GREJCMLI";
  private static final java.util.regex.Pattern BLANKS = java.util.regex.Pattern.compile("\\s+");

  private final String name;
  private final char version;
  private final String coordinateSystem;
  private final String orbitType;
  private final String agency;
  private final String dataUsed;
  private final int epochCount;
  private final double intervalS;
  private final int headerWeek;
  private final double headerSecondsOfWeek;
  private final String fileType;
  private final int timeSystemLine;
  private final List<String> satellites;
  private final Map<String, Integer> accuracyExponents;
  private final List<String> comments;
  private final List<String> analysisCentres;
  private final Map<String, List<Integer>> predictedEpochs;
  private final Map<String, List<Integer>> manoeuvreEpochs;
  private final List<String> warnings;

  private Sp3Header(Builder b) {
    this.name = b.name;
    this.version = b.version;
    this.coordinateSystem = b.coordinateSystem;
    this.orbitType = b.orbitType;
    this.agency = b.agency;
    this.dataUsed = b.dataUsed;
    this.epochCount = b.epochCount;
    this.intervalS = b.intervalS;
    this.headerWeek = b.week;
    this.headerSecondsOfWeek = b.sow;
    this.fileType = b.fileType;
    this.timeSystemLine = b.timeSystemLine;
    this.satellites = List.copyOf(b.satellites);
    this.accuracyExponents = Collections.unmodifiableMap(new LinkedHashMap<>(b.accuracy));
    this.comments = List.copyOf(b.comments);
    this.analysisCentres = List.copyOf(b.centres);
    this.predictedEpochs = freeze(b.predicted);
    this.manoeuvreEpochs = freeze(b.manoeuvre);
    this.warnings = List.copyOf(b.warnings);
  }

  private static Map<String, List<Integer>> freeze(Map<String, List<Integer>> m) {
    final Map<String, List<Integer>> out = new LinkedHashMap<>();
    m.forEach((k, v) -> out.put(k, List.copyOf(v)));
    return Collections.unmodifiableMap(out);
  }

  private static final class Builder {
    String name;
    char version;
    String coordinateSystem;
    String orbitType;
    String agency;
    String dataUsed;
    int epochCount;
    double intervalS;
    int week;
    double sow;
    String fileType = "";
    int timeSystemLine;
    final List<String> satellites = new ArrayList<>();
    final Map<String, Integer> accuracy = new LinkedHashMap<>();
    final List<String> comments = new ArrayList<>();
    final List<String> centres = new ArrayList<>();
    final Map<String, List<Integer>> predicted = new LinkedHashMap<>();
    final Map<String, List<Integer>> manoeuvre = new LinkedHashMap<>();
    final List<String> warnings = new ArrayList<>();
    long startLabels;
    double startSecond;
  }

  /**
   * Parses the header and the record flags of an SP3 file.
   *
   * @param name file name for messages
   * @param lines all lines of the file
   * @return the header
   * @throws InputException with the file and line of the first defect
   */
  public static Sp3Header parse(String name, List<String> lines) {
    final Builder b = new Builder();
    b.name = name;
    if (lines.size() < 3) {
      throw new InputException(name, Math.max(1, lines.size()), "SP3 header: too short, found " + lines.size()
          + " lines, allowed at least the two header lines and one satellite line");
    }
    final long startLabels = lineOne(name, lines.get(0), b);
    b.startLabels = startLabels;
    lineTwo(name, lines.get(1), b, startLabels);
    int i = 2;
    int declared = -1;
    final List<String> ids = new ArrayList<>();
    while (i < lines.size() && lines.get(i).startsWith("+ ")) {
      final String l = lines.get(i);
      if (declared < 0) {
        declared = TextFields.integer(name, i + 1, "number of satellites (columns 4-6)", Columns.of(l, 4, 6), 1, 999);
      }
      for (int k = 0; k < 17; k++) {
        final String id = Columns.of(l, 10 + 3 * k, 12 + 3 * k);
        if (!id.isBlank() && !id.equals("  0")) {
          ids.add(satelliteId(name, i + 1, id));
        }
      }
      i++;
    }
    if (declared < 0) {
      throw new InputException(name, i + 1, "SP3 header: satellite list line ('+ ') expected, found '"
          + Columns.of(lines.get(i), 1, 2) + "'");
    }
    if (ids.size() != declared) {
      throw new InputException(name, 3, "number of satellites: the header says " + declared + ", the list holds "
          + ids.size());
    }
    if (ids.stream().distinct().count() != ids.size()) {
      throw new InputException(name, 3, "satellite list: a satellite is listed twice, found " + ids);
    }
    b.satellites.addAll(ids);
    int acc = 0;
    while (i < lines.size() && lines.get(i).startsWith("++")) {
      for (int k = 0; k < 17 && acc < ids.size(); k++, acc++) {
        b.accuracy.put(ids.get(acc), TextFields.integer(name, i + 1, "accuracy exponent of " + ids.get(acc),
            Columns.of(lines.get(i), 10 + 3 * k, 12 + 3 * k), 0, 99));
      }
      i++;
    }
    boolean firstPercentC = true;
    while (i < lines.size() && (lines.get(i).startsWith("%") || lines.get(i).startsWith("/*"))) {
      final String l = lines.get(i);
      if (l.startsWith("%c") && firstPercentC) {
        firstPercentC = false;
        b.fileType = Columns.of(l, 4, 5).strip();
        if (b.fileType.length() != 1 || FILE_TYPES.indexOf(b.fileType.charAt(0)) < 0) {
          throw new InputException(name, i + 1, "file type (%c columns 4-5): not supported, found '" + b.fileType
              + "', allowed one of G, R, E, J, C, M, L, I");
        }
        b.timeSystemLine = i + 1;
      } else if (l.startsWith("/*")) {
        final String text = l.substring(2).strip();
        b.comments.add(text);
        centres(text, b.centres);
      }
      i++;
    }
    if (b.timeSystemLine == 0) {
      throw new InputException(name, i + 1, "SP3 header: no file-type line (starting with per cent and c) with the file type and time system");
    }
    body(name, lines, i, b);
    return new Sp3Header(b);
  }

  /** An IGS combination comment lists its centres as three-letter lower-case codes. */
  private static void centres(String text, List<String> out) {
    final String[] words = BLANKS.split(text, -1);
    if (words.length == 0 || words[0].isEmpty()) {
      return;
    }
    for (String w : words) {
      if (!w.matches("[a-z][a-z0-9]{2}")) {
        return;
      }
    }
    for (String w : words) {
      if (!out.contains(w)) {
        out.add(w);
      }
    }
  }

  private static long lineOne(String name, String l, Builder b) {
    if (!(l.startsWith("#c") || l.startsWith("#d"))) {
      throw new InputException(name, 1, "not an SP3 file: line 1 must start with '#c' or '#d', found '"
          + Columns.of(l, 1, 2) + "'");
    }
    b.version = l.charAt(1);
    final char pv = Columns.of(l, 3, 3).charAt(0);
    if (pv != 'P' && pv != 'V') {
      throw new InputException(name, 1, "position/velocity flag (column 3): found '" + pv + "', allowed P or V");
    }
    final double[] start = Columns.epoch(name, 1, l, EPOCH_COLUMNS, false);
    final double second = start[5];
    b.epochCount = TextFields.integer(name, 1, "number of epochs (columns 33-39)", Columns.of(l, 33, 39), 1, 9_999_999);
    b.startSecond = second - Math.floor(second);
    b.dataUsed = Columns.of(l, 41, 45).strip();
    b.coordinateSystem = Columns.of(l, 47, 51).strip();
    b.orbitType = Columns.of(l, 53, 55).strip();
    b.agency = Columns.of(l, 57, 60).strip();
    if (b.coordinateSystem.isEmpty()) {
      throw new InputException(name, 1, "coordinate system (columns 47-51): blank, allowed a frame name such as IGS05 or ITR08");
    }
    if (!ORBIT_TYPES.contains(b.orbitType)) {
      throw new InputException(name, 1, "orbit type (columns 53-55): found '" + b.orbitType
          + "', allowed FIT, EXT, BCT, BHN, HLM");
    }
    if (b.agency.isEmpty()) {
      throw new InputException(name, 1, "agency (columns 57-60): blank");
    }
    return (long) Math.floor(Columns.labels(start));
  }

  private static void lineTwo(String name, String l, Builder b, long startLabels) {
    if (!l.startsWith("##")) {
      throw new InputException(name, 2, "SP3 line 2 must start with '##', found '" + Columns.of(l, 1, 2) + "'");
    }
    b.week = TextFields.integer(name, 2, "GPS week (columns 4-7)", Columns.of(l, 4, 7), 0, 9999);
    b.sow = TextFields.decimal(name, 2, "seconds of week (columns 9-23)", Columns.of(l, 9, 23), 0, 604_799.999_999_99);
    b.intervalS = TextFields.decimal(name, 2, "epoch interval, s (columns 25-38)", Columns.of(l, 25, 38), 1e-3, 86_400);
    final int mjd = TextFields.integer(name, 2, "modified Julian day (columns 40-44)", Columns.of(l, 40, 44), 15_021, 88_069);
    final double frac = TextFields.decimal(name, 2, "fraction of day (columns 46-60)", Columns.of(l, 46, 60), 0, 0.999_999_999_999_9);
    // The week and seconds count the labels of line 1 from 1980-01-06 (any time system's labels).
    final long sinceGpsEpoch = startLabels + GnssTimeSystem.GPS_EPOCH_TO_J2000_S;
    final long week = Math.floorDiv(sinceGpsEpoch, GnssTimeSystem.WEEK_S);
    final long sow = sinceGpsEpoch - week * GnssTimeSystem.WEEK_S;
    if (week != b.week || Math.abs(sow - Math.floor(b.sow)) > 0) {
      throw new InputException(name, 2, String.format(Locale.ROOT,
          "GPS week and seconds disagree with the start epoch of line 1: found %d %.8f, the epoch gives %d %d",
          b.week, b.sow, week, sow));
    }
    final long mjdOfStart = Math.floorDiv(startLabels + 43_200L, 86_400L) + 51_544L;
    if (mjd != mjdOfStart) {
      throw new InputException(name, 2, "modified Julian day disagrees with the start epoch of line 1: found " + mjd
          + ", the epoch gives " + mjdOfStart);
    }
    final double fracOfStart = Math.floorMod(startLabels + 43_200L, 86_400L) / 86_400.0;
    if (Math.abs(frac - fracOfStart) > 1e-6) {
      throw new InputException(name, 2, String.format(Locale.ROOT,
          "fraction of day disagrees with the start epoch of line 1: found %.13f, the epoch gives %.13f", frac, fracOfStart));
    }
  }

  private static String satelliteId(String name, int line, String raw) {
    final char sys = raw.charAt(0) == ' ' ? 'G' : raw.charAt(0);
    Constellation.of(sys, name, line);
    final int n = TextFields.integer(name, line, "satellite number of '" + raw + "'", raw.substring(1), 1, 99);
    return sys + String.format(Locale.ROOT, "%02d", n);
  }

  private static void body(String name, List<String> lines, int from, Builder b) {
    int epochs = 0;
    double firstLabel = Double.NaN;
    for (int i = from; i < lines.size(); i++) {
      final String l = lines.get(i);
      if (l.startsWith("*")) {
        final double label = epochLabel(name, i + 1, l);
        if (epochs == 0) {
          firstLabel = label;
        } else {
          final double steps = (label - firstLabel) / b.intervalS;
          if (Math.abs(steps - Math.rint(steps)) > 1e-6 || Math.rint(steps) < epochs) {
            throw new InputException(name, i + 1, String.format(Locale.ROOT,
                "epoch not on the header's %.3f s grid after epoch %d (%.3f s from the first epoch)", b.intervalS,
                epochs, label - firstLabel));
          }
        }
        epochs++;
      } else if (l.startsWith("P")) {
        if (epochs == 0) {
          throw new InputException(name, i + 1, "position record before the first epoch line");
        }
        record(name, i + 1, l, epochs - 1, b);
      } else if (l.startsWith("EOF")) {
        final int after = TextFiles.firstNonBlank(lines, i + 1);
        if (after >= 0) {
          throw new InputException(name, after + 1, "text after the EOF line, found '" + lines.get(after).strip()
              + "', allowed nothing");
        }
        break;
      }
    }
    if (epochs > b.epochCount) {
      throw new InputException(name, 1, "number of epochs: line 1 says " + b.epochCount + ", the file holds " + epochs);
    }
    if (epochs < b.epochCount) {
      b.warnings.add(name + ":1: line 1 announces " + b.epochCount + " epochs, the file holds " + epochs
          + " (a cut product; its epochs are used as they are)");
    }
    final double start = b.startLabels + b.startSecond;
    if (Math.abs(firstLabel - start) > 1e-6) {
      b.warnings.add(String.format(Locale.ROOT, "%s:1: the first epoch is %.0f s after the start of line 1 (a cut product)",
          name, firstLabel - start));
    }
  }

  private static final int[] EPOCH_COLUMNS = {4, 7, 9, 10, 12, 13, 15, 16, 18, 19, 21, 31};

  private static double epochLabel(String name, int line, String l) {
    return Columns.labels(Columns.epoch(name, line, l, EPOCH_COLUMNS, false));
  }

  private static void record(String name, int line, String l, int epoch, Builder b) {
    final String id = satelliteId(name, line, Columns.of(l, 2, 4));
    if (!b.satellites.contains(id)) {
      throw new InputException(name, line, "satellite " + id + " is not in the header's satellite list");
    }
    final String flags = Columns.of(l, 75, 80);
    check(name, line, "clock event flag (column 75)", flags.charAt(0), 'E');
    check(name, line, "clock prediction flag (column 76)", flags.charAt(1), 'P');
    check(name, line, "manoeuvre flag (column 79)", flags.charAt(4), 'M');
    check(name, line, "orbit prediction flag (column 80)", flags.charAt(5), 'P');
    if (flags.charAt(2) != ' ' || flags.charAt(3) != ' ') {
      throw new InputException(name, line, "columns 77-78 must be blank, found '" + flags.substring(2, 4) + "'");
    }
    if (flags.charAt(5) == 'P') {
      b.predicted.computeIfAbsent(id, k -> new ArrayList<>()).add(epoch);
    }
    if (flags.charAt(4) == 'M') {
      b.manoeuvre.computeIfAbsent(id, k -> new ArrayList<>()).add(epoch);
    }
  }

  private static void check(String name, int line, String field, char found, char allowed) {
    if (found != ' ' && found != allowed) {
      throw new InputException(name, line, field + ": found '" + found + "', allowed blank or '" + allowed + "'");
    }
  }

  /**
   * What is odd about the file without making its data wrong (a cut product whose line 1 still
   * announces the uncut number of epochs or start), each with file and line.
   *
   * @return the warnings (empty for a clean file)
   */
  public List<String> warnings() {
    return warnings;
  }

  /** @return the file name */
  public String name() {
    return name;
  }

  /** @return 'c' or 'd' */
  public char version() {
    return version;
  }

  /** @return the coordinate system of line 1 (e.g. IGS05) */
  public String coordinateSystem() {
    return coordinateSystem;
  }

  /** @return the orbit type of line 1 (FIT, EXT, BCT, BHN, HLM) */
  public String orbitType() {
    return orbitType;
  }

  /** @return the agency of line 1 */
  public String agency() {
    return agency;
  }

  /** @return the data-used descriptor of line 1 */
  public String dataUsed() {
    return dataUsed;
  }

  /** @return the number of epochs */
  public int epochCount() {
    return epochCount;
  }

  /** @return the epoch interval, s */
  public double intervalS() {
    return intervalS;
  }

  /** @return the GPS week of line 2 (checked against the start epoch) */
  public int headerWeek() {
    return headerWeek;
  }

  /** @return the seconds of week of line 2 (checked against the start epoch) */
  public double headerSecondsOfWeek() {
    return headerSecondsOfWeek;
  }

  /** @return the file type letter of the first %c line (G, R, E, J, C, M, L, I) */
  public String fileType() {
    return fileType;
  }

  /** @return the line number of the first %c line (where the time system stands) */
  public int timeSystemLine() {
    return timeSystemLine;
  }

  /** @return the satellites of the header list */
  public List<String> satellites() {
    return satellites;
  }

  /**
   * Accuracy exponent of a satellite (accuracy 2^n mm; 0 = unknown).
   *
   * @param id satellite
   * @return the exponent, or -1 when not listed
   */
  public int accuracyExponent(String id) {
    return accuracyExponents.getOrDefault(id, -1);
  }

  /** @return the comment lines, without the leading slash-star */
  public List<String> comments() {
    return comments;
  }

  /** @return the analysis centres a combined product names in its comments (e.g. cod, emr, esa), in order */
  public List<String> analysisCentres() {
    return analysisCentres;
  }

  /**
   * Epochs (0-based indices) at which a satellite's orbit is flagged predicted.
   *
   * @param id satellite
   * @return the indices (empty when none)
   */
  public List<Integer> predictedEpochs(String id) {
    return predictedEpochs.getOrDefault(id, List.of());
  }

  /**
   * Epochs (0-based indices) with a manoeuvre flag.
   *
   * @param id satellite
   * @return the indices (empty when none)
   */
  public List<Integer> manoeuvreEpochs(String id) {
    return manoeuvreEpochs.getOrDefault(id, List.of());
  }
}
