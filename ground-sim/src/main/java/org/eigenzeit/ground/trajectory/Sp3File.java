package org.eigenzeit.ground.trajectory;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reader of SP3-c and SP3-d precise orbit files (IGS, "The Extended Standard Product 3 Orbit
 * Format (SP3-c)", Hilla 2010; SP3-d, Hilla 2016): header, epoch lines ({@code *}), position and
 * clock lines ({@code P}, km and microseconds), optional velocity lines ({@code V}, dm/s).
 * Positions of 0.000000 and clocks of 999999.999999 are "no value" by the format's convention.
 *
 * <p>Times are kept as the file gives them (GPS time for IGS products) in seconds since the first
 * epoch; {@link #firstEpochCalendar()} gives the first epoch's calendar fields.
 *
 * <p>Immutable after parsing.
 */
public final class Sp3File {
  /** One satellite's samples. */
  public static final class Satellite {
    final List<double[]> samples = new ArrayList<>();

    /** @return the samples: {t, x, y, z (m, ITRF), clock (s, NaN when absent)} */
    public List<double[]> samples() {
      return List.copyOf(samples);
    }
  }

  private final String name;
  private final char version;
  private final String timeSystem;
  private final int[] firstEpoch;
  private final double firstEpochSeconds;
  private final Map<String, Satellite> satellites;

  private Sp3File(String name, char version, String timeSystem, int[] firstEpoch, double firstSeconds,
      Map<String, Satellite> satellites) {
    this.name = name;
    this.version = version;
    this.timeSystem = timeSystem;
    this.firstEpoch = firstEpoch.clone();
    this.firstEpochSeconds = firstSeconds;
    this.satellites = satellites;
  }

  /**
   * Reads a file.
   *
   * @param path the file
   * @return the parsed file
   * @throws IOException when it cannot be read
   * @throws TrajectoryFormatException with the line number when malformed
   */
  public static Sp3File read(Path path) throws IOException {
    return parse(String.valueOf(path.getFileName()), Files.readAllLines(path, StandardCharsets.US_ASCII));
  }

  /**
   * Parses lines.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the parsed file
   */
  public static Sp3File parse(String name, List<String> lines) {
    if (lines.isEmpty() || lines.get(0).length() < 2 || lines.get(0).charAt(0) != '#') {
      throw new TrajectoryFormatException(name, 1, "not an SP3 file: first line must start with '#c' or '#d'");
    }
    final char version = lines.get(0).charAt(1);
    if (version != 'c' && version != 'd') {
      throw new TrajectoryFormatException(name, 1, "SP3 version '" + version + "' not supported (c or d)");
    }
    String timeSystem = "GPS";
    int[] first = null;
    double firstSeconds = 0;
    final Map<String, Satellite> sats = new LinkedHashMap<>();
    double t = Double.NaN;
    boolean sawEof = false;
    for (int i = 1; i < lines.size(); i++) {
      final String line = lines.get(i);
      final int lineNo = i + 1;
      if (line.startsWith("%c") && i < 20 && line.length() >= 12) {
        final String ts = line.substring(9, 12).trim();
        if (!ts.isEmpty() && !ts.startsWith("c")) {
          timeSystem = ts;
        }
      } else if (line.startsWith("* ")) {
        final int[] cal = epoch(name, lineNo, line);
        final double secs = secondsOf(cal) + fraction(name, lineNo, line);
        if (first == null) {
          first = cal;
          firstSeconds = secs;
        }
        final double next = secs - firstSeconds;
        if (!Double.isNaN(t) && next <= t) {
          throw new TrajectoryFormatException(name, lineNo, "epochs must increase");
        }
        t = next;
      } else if (line.startsWith("P")) {
        if (Double.isNaN(t)) {
          throw new TrajectoryFormatException(name, lineNo, "position record before the first epoch line");
        }
        position(name, lineNo, line, t, sats);
      } else if (line.startsWith("EOF")) {
        sawEof = true;
        break;
      }
    }
    if (first == null) {
      throw new TrajectoryFormatException(name, lines.size(), "no epoch lines ('*') found");
    }
    if (!sawEof) {
      throw new TrajectoryFormatException(name, lines.size(), "missing EOF line (file truncated?)");
    }
    return new Sp3File(name, version, timeSystem, first, firstSeconds, sats);
  }

  private static void position(String name, int lineNo, String line, double t, Map<String, Satellite> sats) {
    if (line.length() < 46) {
      throw new TrajectoryFormatException(name, lineNo, "position record too short (" + line.length() + " chars)");
    }
    final String id = line.substring(1, 4).replace(' ', '0');
    final double x;
    final double y;
    final double z;
    double clk = Double.NaN;
    try {
      x = Double.parseDouble(line.substring(4, 18).trim());
      y = Double.parseDouble(line.substring(18, 32).trim());
      z = Double.parseDouble(line.substring(32, 46).trim());
      if (line.length() >= 60) {
        clk = Double.parseDouble(line.substring(46, 60).trim());
      }
    } catch (NumberFormatException e) {
      throw new TrajectoryFormatException(name, lineNo, "unreadable number in position record: " + e.getMessage());
    }
    if (x == 0.0 && y == 0.0 && z == 0.0) {
      return; // no position: format convention
    }
    final double clock = (Double.isNaN(clk) || clk >= 999999.0) ? Double.NaN : clk * 1e-6;
    sats.computeIfAbsent(id, k -> new Satellite()).samples.add(new double[] {t, x * 1e3, y * 1e3, z * 1e3, clock});
  }

  private static int[] epoch(String name, int lineNo, String line) {
    try {
      final String[] f = line.substring(1).trim().split("\\s+");
      return new int[] {Integer.parseInt(f[0]), Integer.parseInt(f[1]), Integer.parseInt(f[2]),
          Integer.parseInt(f[3]), Integer.parseInt(f[4])};
    } catch (RuntimeException e) {
      throw new TrajectoryFormatException(name, lineNo, "unreadable epoch line");
    }
  }

  private static double fraction(String name, int lineNo, String line) {
    try {
      final String[] f = line.substring(1).trim().split("\\s+");
      return Double.parseDouble(f[5]);
    } catch (RuntimeException e) {
      throw new TrajectoryFormatException(name, lineNo, "unreadable seconds in epoch line");
    }
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

  /** @return the time system named in the header (GPS for IGS products) */
  public String timeSystem() {
    return timeSystem;
  }

  /** @return year, month, day, hour, minute of the first epoch */
  public int[] firstEpochCalendar() {
    return firstEpoch.clone();
  }

  /** @return seconds from J2000.0 (in the file's time labels) to the first epoch */
  public double firstEpochSecondsJ2000() {
    return firstEpochSeconds;
  }

  /** @return the satellite identifiers, in file order */
  public List<String> satelliteIds() {
    return List.copyOf(satellites.keySet());
  }

  /**
   * One satellite.
   *
   * @param id identifier such as "G05"
   * @return its samples
   * @throws IllegalArgumentException when absent
   */
  public Satellite satellite(String id) {
    final Satellite s = satellites.get(id);
    if (s == null) {
      throw new IllegalArgumentException("no satellite " + id + " in " + name);
    }
    return s;
  }
}
