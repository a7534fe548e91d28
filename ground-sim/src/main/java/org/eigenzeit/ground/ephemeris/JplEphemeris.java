package org.eigenzeit.ground.ephemeris;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.zip.GZIPInputStream;

/**
 * Reader and evaluator of a JPL planetary and lunar ephemeris in its original ASCII form (header
 * file with groups 1010-1070, data file of fixed-length Chebyshev records), as documented by JPL
 * with the ephemeris files ("README" of the DE ASCII distribution; Standish 1998, JPL IOM
 * 312.F-98-048 for DE405).
 *
 * <p>Each record spans {@code 32} days and holds, for each item i of group 1050 (start index,
 * coefficients per component, sub-intervals), Chebyshev coefficients of the position components.
 * Position at time t in sub-interval k of [a, b]: x = sum_j c_j T_j(s), s = 2 (t - a_k)/(b_k - a_k)
 * - 1. Units: km for positions, radians for librations; time argument TDB (taken equal to TT
 * here: |TDB - TT| &lt; 2 ms moves the Moon by &lt; 2 m, below 1e-20 in any clock rate).
 *
 * <p>Items used: 2 (Earth-Moon barycentre, SSB-centred), 9 (Moon, geocentric), 10 (Sun,
 * SSB-centred), 12 (lunar libration Euler angles phi, theta, psi). Geocentric Sun =
 * Sun - (EMB - Moon/(1 + EMRAT)).
 *
 * <p>Immutable after loading; thread-safe.
 */
public final class JplEphemeris {
  /** Item index (0-based) of the Earth-Moon barycentre. */
  public static final int EMB = 2;
  /** Item index of the geocentric Moon. */
  public static final int MOON = 9;
  /** Item index of the Sun. */
  public static final int SUN = 10;
  /** Item index of the lunar libration angles. */
  public static final int LIBRATION = 12;

  private final double[][] records;
  private final double[] recordStartJd;
  private final int[][] layout;
  private final Map<String, Double> constants;
  private final double recordSpanDays;

  private JplEphemeris(double[][] records, double[] recordStartJd, int[][] layout,
      Map<String, Double> constants, double recordSpanDays) {
    this.records = records;
    this.recordStartJd = recordStartJd;
    this.layout = layout;
    this.constants = constants;
    this.recordSpanDays = recordSpanDays;
  }

  /** The DE405 data blocks shipped with the ground module (gzip of the JPL ASCII files, unchanged). */
  private static final String[] DE405_BLOCKS = {"ascp2000.405.gz", "ascp2020.405.gz"};

  /**
   * Loads the DE405 header and the data shipped with the ground module: JPL's ASCII blocks
   * {@code ascp2000.405} and {@code ascp2020.405}, continuous from JD 2451536.5 (1999-12-24) to
   * JD 2466160.5 (2040-01-25).
   *
   * @return the ephemeris
   */
  public static JplEphemeris de405() {
    final List<InputStream> blocks = new ArrayList<>();
    final List<String> names = new ArrayList<>();
    try {
      for (String block : DE405_BLOCKS) {
        blocks.add(new GZIPInputStream(open(block), 1 << 16));
        names.add(block);
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return load("header.405", open("header.405"), names, blocks);
  }

  private static InputStream open(String name) {
    final InputStream in = JplEphemeris.class.getResourceAsStream(name);
    if (in == null) {
      throw new UncheckedIOException(new IOException("missing ephemeris resource " + name));
    }
    return in;
  }

  static double parseFortran(String s) {
    return Double.parseDouble(s.replace('D', 'E').replace('d', 'e'));
  }

  /**
   * Loads an ephemeris from a header and one data stream (both closed here).
   *
   * @param headerIn the header file
   * @param dataIn the data file
   * @return the ephemeris
   * @throws IllegalArgumentException naming the stream and line when the data are malformed
   */
  public static JplEphemeris load(InputStream headerIn, InputStream dataIn) {
    return load("header", headerIn, List.of("data"), List.of(dataIn));
  }

  /**
   * Loads an ephemeris from a header and several data blocks (all closed here). Records that
   * appear in two blocks (JPL's blocks overlap by one record) must be identical; the records
   * together must be contiguous.
   *
   * @param headerName the header's name for messages
   * @param headerIn the header file
   * @param dataNames the data blocks' names for messages
   * @param dataIn the data blocks
   * @return the ephemeris
   * @throws IllegalArgumentException naming the block and line when the data are malformed,
   *     overlap inconsistently or leave a gap
   */
  public static JplEphemeris load(String headerName, InputStream headerIn, List<String> dataNames,
      List<InputStream> dataIn) {
    try (BufferedReader h = new BufferedReader(new InputStreamReader(headerIn, StandardCharsets.US_ASCII))) {
      final List<String> headerLines = h.lines().toList();
      int ncoeff = 0;
      final List<String> names = new ArrayList<>();
      final List<Double> values = new ArrayList<>();
      final int[][] layout = new int[3][13];
      double span = 32;
      String group = "";
      final List<String> layoutRows = new ArrayList<>();
      for (String line : headerLines) {
        final String t = line.trim();
        if (t.startsWith("KSIZE=")) {
          final String[] f = t.split("\\s+");
          ncoeff = Integer.parseInt(f[f.length - 1]);
        } else if (t.startsWith("GROUP")) {
          group = t.split("\\s+")[1];
        } else if (!t.isEmpty()) {
          switch (group) {
            case "1030" -> span = Double.parseDouble(t.split("\\s+")[2]);
            case "1040" -> {
              final String[] f = t.split("\\s+");
              if (!(f.length == 1 && names.isEmpty())) {
                for (String n : f) {
                  names.add(n);
                }
              }
            }
            case "1041" -> {
              final String[] f = t.split("\\s+");
              if (!(f.length == 1 && values.isEmpty())) {
                for (String v : f) {
                  values.add(parseFortran(v));
                }
              }
            }
            case "1050" -> layoutRows.add(t);
            default -> { }
          }
        }
      }
      for (int r = 0; r < 3; r++) {
        final String[] f = layoutRows.get(r).split("\\s+");
        for (int c = 0; c < 13; c++) {
          layout[r][c] = Integer.parseInt(f[c]);
        }
      }
      final Map<String, Double> constants = new HashMap<>();
      for (int i = 0; i < Math.min(names.size(), values.size()); i++) {
        constants.put(names.get(i), values.get(i));
      }
      final TreeMap<Double, double[]> recs = new TreeMap<>();
      for (int b = 0; b < dataIn.size(); b++) {
        readBlock(dataNames.get(b), dataIn.get(b), ncoeff, recs);
      }
      if (recs.isEmpty()) {
        throw new IllegalArgumentException(headerName + ": no ephemeris records in " + dataNames);
      }
      final double[][] records = recs.values().toArray(new double[0][]);
      final double[] starts = new double[records.length];
      for (int i = 0; i < records.length; i++) {
        starts[i] = records[i][0];
        if (i > 0 && Math.abs(starts[i] - (starts[i - 1] + span)) > 1e-9) {
          throw new IllegalArgumentException(String.format(Locale.ROOT,
              "ephemeris records not contiguous: JD %.1f follows JD %.1f (record span %.1f days) in %s",
              starts[i], starts[i - 1], span, dataNames));
        }
      }
      return new JplEphemeris(records, starts, layout, constants, span);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    } finally {
      for (InputStream in : dataIn) {
        closeQuietly(in);
      }
    }
  }

  private static void closeQuietly(InputStream in) {
    try {
      in.close();
    } catch (IOException e) {
      // nothing to do: the stream was fully read or the load already failed
    }
  }

  /** Reads one data block's records into {@code recs}, keyed by start JD; overlaps must agree. */
  private static void readBlock(String name, InputStream in, int ncoeff, Map<Double, double[]> recs)
      throws IOException {
    final BufferedReader d = new BufferedReader(new InputStreamReader(in, StandardCharsets.US_ASCII));
    String line;
    int lineNo = 0;
    while ((line = d.readLine()) != null) {
      lineNo++;
      final String[] f = line.trim().split("\\s+");
      if (!(f.length == 2 && f[1].equals(Integer.toString(ncoeff)))) {
        if (!line.isBlank()) {
          throw new IllegalArgumentException(name + ":" + lineNo + ": record header '<number> " + ncoeff
              + "' expected, found '" + line.trim() + "'");
        }
        continue;
      }
      final int headerLine = lineNo;
      final double[] rec = new double[ncoeff];
      int n = 0;
      while (n < ncoeff) {
        final String cl = d.readLine();
        lineNo++;
        if (cl == null) {
          throw new IllegalArgumentException(name + ":" + lineNo + ": data ends inside the record of line " + headerLine);
        }
        n = parseCoefficients(name, lineNo, cl, rec, n);
      }
      final double[] earlier = recs.putIfAbsent(rec[0], rec);
      if (earlier != null && !Arrays.equals(earlier, rec)) {
        throw new IllegalArgumentException(name + ":" + headerLine + ": record starting at JD " + rec[0]
            + " differs from the one already read from another block");
      }
    }
  }

  /** Parses the blank-separated numbers of one coefficient line into rec from index n (extra padding ignored). */
  private static int parseCoefficients(String name, int lineNo, String line, double[] rec, int n) {
    int i = 0;
    int next = n;
    final int len = line.length();
    while (i < len) {
      while (i < len && line.charAt(i) == ' ') {
        i++;
      }
      final int start = i;
      while (i < len && line.charAt(i) != ' ') {
        i++;
      }
      if (i > start && next < rec.length) {
        rec[next++] = parseCoefficient(name, lineNo, line.substring(start, i));
      }
    }
    return next;
  }

  private static double parseCoefficient(String name, int lineNo, String v) {
    final double x;
    try {
      x = parseFortran(v);
    } catch (NumberFormatException e) {
      throw new IllegalArgumentException(name + ":" + lineNo + ": coefficient '" + v + "' is not a number", e);
    }
    if (!Double.isFinite(x) || v.indexOf('x') >= 0 || v.indexOf('X') >= 0) {
      throw new IllegalArgumentException(name + ":" + lineNo + ": coefficient '" + v + "' is not a finite decimal number");
    }
    return x;
  }

  /**
   * A header constant (group 1040/1041), for example "AU", "EMRAT", "GMS", "GMB".
   *
   * @param name the constant's name
   * @return its value
   * @throws IllegalArgumentException when absent
   */
  public double constant(String name) {
    final Double v = constants.get(name);
    if (v == null) {
      throw new IllegalArgumentException("no ephemeris constant " + name);
    }
    return v;
  }

  /** @return first Julian date covered */
  public double firstJd() {
    return recordStartJd[0];
  }

  /** @return last Julian date covered */
  public double lastJd() {
    return recordStartJd[recordStartJd.length - 1] + recordSpanDays;
  }

  /**
   * Tells whether an instant is covered.
   *
   * @param jd Julian date (TDB)
   * @return true inside the data span
   */
  public boolean covers(double jd) {
    return jd >= firstJd() && jd <= lastJd();
  }

  /**
   * Evaluates one item's three components.
   *
   * @param item item index (0-based, group 1050 column)
   * @param jd1 Julian date, large part (TDB)
   * @param jd2 Julian date, small part
   * @param out receives the three components (km, or rad for librations)
   */
  public void evaluate(int item, double jd1, double jd2, double[] out) {
    chebyshev(item, jd1, jd2, out, null);
  }

  /**
   * Evaluates one item's three components and their time derivatives, by differentiating the
   * record's Chebyshev series: d/dt sum c_j T_j(s) = (2 / subSpan) sum c_j T'_j(s) with
   * T'_0 = 0, T'_1 = 1, T'_(j+1) = 2 T_j + 2 s T'_j - T'_(j-1) (the standard recurrence; e.g.
   * Press et al., Numerical Recipes, 3rd ed., section 5.9).
   *
   * @param item item index (0-based, group 1050 column)
   * @param jd1 Julian date, large part (TDB)
   * @param jd2 Julian date, small part
   * @param out receives the three components (km, or rad for librations)
   * @param rateOut receives their rates per day (km/day, or rad/day)
   */
  public void evaluateWithRate(int item, double jd1, double jd2, double[] out, double[] rateOut) {
    chebyshev(item, jd1, jd2, out, rateOut);
  }

  private void chebyshev(int item, double jd1, double jd2, double[] out, double[] rateOut) {
    final double jd = jd1 + jd2;
    if (!covers(jd)) {
      throw new IllegalArgumentException(String.format(Locale.ROOT,
          "JD %.3f outside the ephemeris span %.1f..%.1f", jd, firstJd(), lastJd()));
    }
    int r = (int) Math.floor((jd - recordStartJd[0]) / recordSpanDays);
    r = Math.max(0, Math.min(records.length - 1, r));
    final double[] rec = records[r];
    final int start = layout[0][item] - 1;
    final int ncoef = layout[1][item];
    final int nsub = layout[2][item];
    final double subSpan = recordSpanDays / nsub;
    final double dt = (jd1 - rec[0]) + jd2;
    int k = (int) Math.floor(dt / subSpan);
    k = Math.max(0, Math.min(nsub - 1, k));
    final double s = 2.0 * (dt - k * subSpan) / subSpan - 1.0;
    final int base = start + k * 3 * ncoef;
    for (int c = 0; c < 3; c++) {
      final int o = base + c * ncoef;
      out[c] = series(rec, o, ncoef, s);
      if (rateOut != null) {
        rateOut[c] = derivative(rec, o, ncoef, s) * 2.0 / subSpan;
      }
    }
  }

  /** Sum of c_j T_j(s), j = 0..n-1, coefficients from rec[o]. */
  private static double series(double[] rec, int o, int n, double s) {
    double tPrev = 1.0;
    double tCur = s;
    double sum = rec[o] + (n > 1 ? rec[o + 1] * s : 0.0);
    for (int j = 2; j < n; j++) {
      final double tNext = 2.0 * s * tCur - tPrev;
      sum += rec[o + j] * tNext;
      tPrev = tCur;
      tCur = tNext;
    }
    return sum;
  }

  /** Sum of c_j T'_j(s), j = 1..n-1, with T'_(j+1) = 2 T_j + 2 s T'_j - T'_(j-1). */
  private static double derivative(double[] rec, int o, int n, double s) {
    double tPrev = 1.0;
    double tCur = s;
    double dPrev = 0.0;
    double dCur = 1.0;
    double sum = n > 1 ? rec[o + 1] : 0.0;
    for (int j = 2; j < n; j++) {
      final double tNext = 2.0 * s * tCur - tPrev;
      final double dNext = 2.0 * tCur + 2.0 * s * dCur - dPrev;
      sum += rec[o + j] * dNext;
      tPrev = tCur;
      tCur = tNext;
      dPrev = dCur;
      dCur = dNext;
    }
    return sum;
  }
}
