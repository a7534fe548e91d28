package org.eigenzeit.ground.trajectory;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Valid input files derived from the shipped real data (IGS final orbit igs15904.sp3 and
 * broadcast file brdc1820.10n of 2010-07-01; see src/test/resources/gnss/PROVENANCE.md): trimmed
 * copies with consistent headers, an SP3 with velocity records, and CCSDS OEMs of a real GPS orbit.
 * Used by the reader tests and by the fuzz-corpus generator.
 */
public final class Fixtures {
  private Fixtures() {}

  /**
   * The real SP3 file's lines.
   *
   * @return the lines of igs15904.sp3
   */
  public static List<String> sp3Lines() {
    return read("igs15904.sp3");
  }

  /**
   * The real broadcast file's lines.
   *
   * @return the lines of brdc1820.10n
   */
  public static List<String> rinexLines() {
    return read("brdc1820.10n");
  }

  private static List<String> read(String name) {
    try {
      return Files.readAllLines(RealSatelliteCheckTest.resource(name), StandardCharsets.US_ASCII);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * The real SP3 file cut to its first epochs and some satellites, header rewritten to match.
   *
   * @param epochs number of epochs kept
   * @param sats satellites kept, in header order (such as "G02")
   * @return the lines
   */
  public static List<String> sp3Trimmed(int epochs, List<String> sats) {
    final List<String> in = sp3Lines();
    final List<String> out = new ArrayList<>();
    final String l1 = in.get(0);
    out.add(l1.substring(0, 32) + String.format(Locale.ROOT, "%7d", epochs) + l1.substring(39));
    out.add(in.get(1));
    for (int k = 0; k < 5; k++) {
      final StringBuilder b = new StringBuilder(k == 0 ? String.format(Locale.ROOT, "+   %2d   ", sats.size()) : "+        ");
      for (int s = 0; s < 17; s++) {
        b.append(17 * k + s < sats.size() ? sats.get(17 * k + s) : "  0");
      }
      out.add(b.toString());
    }
    final String[] acc = accuracies(in);
    for (int k = 0; k < 5; k++) {
      final StringBuilder b = new StringBuilder("++       ");
      for (int s = 0; s < 17; s++) {
        final int idx = 17 * k + s;
        b.append(idx < sats.size() ? acc[Integer.parseInt(sats.get(idx).substring(1)) - 1] : "  0");
      }
      out.add(b.toString());
    }
    int i = 12;
    while (!in.get(i).startsWith("*")) {
      out.add(in.get(i));
      i++;
    }
    int seen = 0;
    for (; i < in.size() && !in.get(i).startsWith("EOF"); i++) {
      final String l = in.get(i);
      if (l.startsWith("*")) {
        seen++;
        if (seen > epochs) {
          break;
        }
        out.add(l);
      } else if (sats.contains(l.substring(1, 4))) {
        out.add(l);
      }
    }
    out.add("EOF");
    return out;
  }

  private static String[] accuracies(List<String> in) {
    final String[] acc = new String[85];
    for (int k = 0; k < 5; k++) {
      for (int s = 0; s < 17; s++) {
        acc[17 * k + s] = in.get(7 + k).substring(9 + 3 * s, 12 + 3 * s);
      }
    }
    return acc;
  }

  /**
   * A trimmed SP3 with the line 1 flag V and a velocity record after every position record: the
   * velocity is the derivative of the Lagrange polynomial through the real positions (dm/s).
   *
   * @param epochs number of epochs kept
   * @param sats satellites kept
   * @return the lines
   */
  public static List<String> sp3WithVelocities(int epochs, List<String> sats) {
    final List<String> base = sp3Trimmed(epochs, sats);
    final Sp3File f = Sp3File.parse("base.sp3", base);
    final List<String> out = new ArrayList<>();
    out.add(base.get(0).substring(0, 2) + "V" + base.get(0).substring(3));
    int epoch = -1;
    for (int i = 1; i < base.size(); i++) {
      final String l = base.get(i);
      out.add(l);
      if (l.startsWith("*  ")) {
        epoch++;
      } else if (l.startsWith("P")) {
        final String id = l.substring(1, 4);
        final ExternalTrajectory tr = ExternalTrajectory.fromSp3(f, id, -66.25);
        final double[] r = new double[3];
        final double[] v = new double[3];
        tr.fileFrameState(epoch * f.epochIntervalS(), r, v);
        out.add(String.format(Locale.ROOT, "V%s%14.6f%14.6f%14.6f%14.6f", id, v[0] * 10, v[1] * 10, v[2] * 10,
            999999.999999));
      }
    }
    return out;
  }

  /**
   * The real broadcast file cut to its header and first records.
   *
   * @param records number of 8-line records kept
   * @return the lines
   */
  public static List<String> rinexTrimmed(int records) {
    final List<String> in = rinexLines();
    int h = 0;
    while (!in.get(h).contains("END OF HEADER")) {
      h++;
    }
    return new ArrayList<>(in.subList(0, h + 1 + 8 * records));
  }

  /**
   * A CCSDS OEM of the real GPS orbit of G05 (IGS final, 2010-07-01), 900 s samples, in the given
   * frame and time system: ITRF2005 (the file's IGS05 realisation) with Earth-fixed velocities, or
   * GCRF / EME2000 with the inertial state.
   *
   * @param frame REF_FRAME to write: ITRF2005, GCRF or EME2000
   * @param samples number of ephemeris lines
   * @return the lines
   */
  public static List<String> oem(String frame, int samples) {
    final Sp3File f = Sp3File.parse("igs15904.sp3", sp3Lines());
    final ExternalTrajectory tr = ExternalTrajectory.fromSp3(f, "G05", -66.25);
    final List<String> l = new ArrayList<>();
    l.add("CCSDS_OEM_VERS = 2.0");
    l.add("COMMENT IGS final orbit of GPS G05, 2010-07-01, Lagrange velocities (Eigenzeit test fixture)");
    l.add("CREATION_DATE = 2026-12-01T00:00:00");
    l.add("ORIGINATOR = EIGENZEIT");
    l.add("META_START");
    l.add("OBJECT_NAME = GPS G05");
    l.add("OBJECT_ID = 2008-012A");
    l.add("CENTER_NAME = EARTH");
    l.add("REF_FRAME = " + frame);
    l.add("TIME_SYSTEM = GPS");
    l.add("START_TIME = 2010-07-01T00:00:00");
    l.add(String.format(Locale.ROOT, "STOP_TIME = 2010-07-01T%02d:%02d:00", (samples - 1) * 15 / 60,
        (samples - 1) * 15 % 60));
    l.add("META_STOP");
    final double[] r = new double[3];
    final double[] v = new double[3];
    final double[] x = new double[3];
    final double[] y = new double[3];
    for (int k = 0; k < samples; k++) {
      final double t = 900.0 * k;
      if (frame.startsWith("ITRF")) {
        tr.fileFrameState(t, r, v);
      } else {
        tr.inertialState(t, r, v);
        if (frame.equals("EME2000")) {
          final double[][] b = FrameBias.matrix();
          for (int c = 0; c < 3; c++) {
            x[c] = b[c][0] * r[0] + b[c][1] * r[1] + b[c][2] * r[2];
            y[c] = b[c][0] * v[0] + b[c][1] * v[1] + b[c][2] * v[2];
          }
          System.arraycopy(x, 0, r, 0, 3);
          System.arraycopy(y, 0, v, 0, 3);
        }
      }
      l.add(String.format(Locale.ROOT, "2010-07-01T%02d:%02d:00.000 %.6f %.6f %.6f %.9f %.9f %.9f", k * 15 / 60,
          k * 15 % 60, r[0] / 1e3, r[1] / 1e3, r[2] / 1e3, v[0] / 1e3, v[1] / 1e3, v[2] / 1e3));
    }
    return l;
  }

  /**
   * A copy of the lines with columns of one line overwritten (1-based line and column; the line
   * is padded with blanks where it is shorter).
   *
   * @param lines the lines
   * @param lineNo the line, 1-based
   * @param column the first column, 1-based
   * @param text the text written from that column
   * @return the changed copy
   */
  public static List<String> overwrite(List<String> lines, int lineNo, int column, String text) {
    final List<String> l = new ArrayList<>(lines);
    final StringBuilder b = new StringBuilder(l.get(lineNo - 1));
    while (b.length() < column - 1 + text.length()) {
      b.append(' ');
    }
    b.replace(column - 1, column - 1 + text.length(), text);
    l.set(lineNo - 1, b.toString());
    return l;
  }

  /** A complete covariance matrix (lower triangle, 6 rows) for {@link #oemWithCovariance}. */
  public static final List<String> COVARIANCE_ROWS = List.of("1.0e-3", "1.0e-5 1.0e-3", "0 0 1.0e-3",
      "0 0 0 1.0e-9", "0 0 0 0 1.0e-9", "0 0 0 0 0 1.0e-9");

  /**
   * The ITRF2005 OEM of {@link #oem} (24 samples) followed by a covariance block: COVARIANCE_START
   * at line 38, EPOCH 39, COV_REF_FRAME 40, the rows from line 41.
   *
   * @param rows the matrix rows
   * @param terminated whether COVARIANCE_STOP follows
   * @return the lines
   */
  public static List<String> oemWithCovariance(List<String> rows, boolean terminated) {
    final List<String> l = oem("ITRF2005", 24);
    l.add("COVARIANCE_START");
    l.add("EPOCH = 2010-07-01T05:45:00");
    l.add("COV_REF_FRAME = RTN");
    l.addAll(rows);
    if (terminated) {
      l.add("COVARIANCE_STOP");
    }
    return l;
  }

  /**
   * The ITRF2005 OEM of {@link #oem} (24 samples) cut after its 12th ephemeris line (13th when
   * sharing the boundary) and continued by a GCRF segment of the same orbit: the second
   * META_START at line 26 (27), its START_TIME at 32 (33), its first ephemeris line at 35 (36).
   *
   * @param shareBoundary whether the second segment starts at the first one's last epoch
   * @return the lines
   */
  public static List<String> oemTwoSegments(boolean shareBoundary) {
    final List<String> a = oem("ITRF2005", 24);
    final List<String> g = oem("GCRF", 24);
    final int first = 12;
    final List<String> out = new ArrayList<>(a.subList(0, 13 + first + (shareBoundary ? 1 : 0)));
    out.set(11, "STOP_TIME = " + out.get(out.size() - 1).split(" ")[0]);
    out.add("META_START");
    out.addAll(g.subList(5, 10));
    out.add("START_TIME = " + g.get(13 + first).split(" ")[0]);
    out.add(g.get(11));
    out.add("META_STOP");
    out.addAll(g.subList(13 + first, g.size()));
    return out;
  }
}
