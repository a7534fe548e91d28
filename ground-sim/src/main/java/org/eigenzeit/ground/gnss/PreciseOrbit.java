package org.eigenzeit.ground.gnss;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.eigenzeit.ground.trajectory.Lagrange;
import org.eigenzeit.ground.trajectory.Sp3File;

/**
 * A precise orbit product (SP3-c/d) on GPS time: positions from {@link Sp3File}, header and flags
 * from {@link Sp3Header}, every epoch converted from the file's {@code %c} time system to GPS time
 * by {@link GnssTimeSystem} (a system it does not know is refused, naming the {@code %c} line).
 *
 * <p>States are interpolated by Lagrange polynomials on 10 nodes centred on the instant, the
 * velocity from the polynomial's derivative (Schenewerk 2003: millimetre level at 15 min spacing).
 * An instant is served only where the 10 nodes are centred (four before the interval that holds
 * it, five after) and no two consecutive nodes of the window are further apart than 1.5 times the
 * header's interval; elsewhere (the first and last four intervals of a satellite's data, around
 * a gap) the reason is returned instead. Positions are in the file's frame (ITRF for IGS
 * products). Immutable.
 */
public final class PreciseOrbit implements OrbitSource {
  private static final int NODES = 10;
  /** How a refusal near either end of a satellite's data starts. */
  public static final String END_OF_DATA = "within 4 samples of the first or last position";

  private final String name;
  private final Sp3Header header;
  private final GnssTimeSystem timeSystem;
  private final Map<String, double[][]> data;

  private PreciseOrbit(String name, Sp3Header header, GnssTimeSystem ts, Map<String, double[][]> data) {
    this.name = name;
    this.header = header;
    this.timeSystem = ts;
    this.data = data;
  }

  /**
   * Reads a file (plain or ".gz").
   *
   * @param path the file
   * @return the orbit
   * @throws InputException when malformed
   */
  public static PreciseOrbit read(Path path) {
    return parse(GnssFiles.displayName(path), GnssFiles.lines(path));
  }

  /**
   * Parses the lines of a file.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the orbit
   * @throws InputException when malformed
   */
  public static PreciseOrbit parse(String name, List<String> lines) {
    final Sp3Header header = Sp3Header.parse(name, lines);
    final Sp3File sp3 = Sp3File.parse(name, lines);
    final GnssTimeSystem ts = GnssTimeSystem.of(sp3.timeSystem(), name, header.timeSystemLine());
    final Map<String, double[][]> data = new LinkedHashMap<>();
    for (String id : sp3.satelliteIds()) {
      final List<double[]> s = sp3.satellite(id).samples();
      final double[][] d = new double[6][s.size()];
      for (int k = 0; k < s.size(); k++) {
        final double label = sp3.firstEpochSecondsJ2000() + s.get(k)[0];
        final double whole = Math.floor(label);
        d[0][k] = GnssTimeSystem.gpsSeconds(ts.toTt((long) whole, label - whole, name, header.timeSystemLine()));
        d[1][k] = s.get(k)[1];
        d[2][k] = s.get(k)[2];
        d[3][k] = s.get(k)[3];
        d[4][k] = s.get(k)[4];
        d[5][k] = Math.rint(s.get(k)[0] / header.intervalS());
      }
      data.put(id, d);
    }
    return new PreciseOrbit(name, header, ts, data);
  }

  /** @return the file name */
  public String name() {
    return name;
  }

  @Override
  public String describe() {
    return name + " (" + header.agency() + " " + header.orbitType() + ", " + header.coordinateSystem() + ", "
        + timeSystem + " time)";
  }

  /** @return the header */
  public Sp3Header header() {
    return header;
  }

  /** @return the time system of the epochs */
  public GnssTimeSystem timeSystem() {
    return timeSystem;
  }

  @Override
  public List<String> satellites() {
    return List.copyOf(data.keySet());
  }

  /**
   * The epochs of a satellite's samples.
   *
   * @param id satellite
   * @return GPS seconds since the GPS epoch (empty when the satellite has no positions)
   */
  public double[] epochs(String id) {
    final double[][] d = data.get(id);
    return d == null ? new double[0] : d[0].clone();
  }

  /** @return the first epoch of the file, GPS seconds */
  public double firstGpsS() {
    double t = Double.POSITIVE_INFINITY;
    for (double[][] d : data.values()) {
      t = Math.min(t, d[0][0]);
    }
    return t;
  }

  /** @return the last epoch of the file, GPS seconds */
  public double lastGpsS() {
    double t = Double.NEGATIVE_INFINITY;
    for (double[][] d : data.values()) {
      t = Math.max(t, d[0][d[0].length - 1]);
    }
    return t;
  }

  /**
   * Whether the file gives a clock for the satellite at any epoch.
   *
   * @param id satellite
   * @return true when at least one clock value is present
   */
  public boolean hasClock(String id) {
    final double[][] d = data.get(id);
    if (d == null) {
      return false;
    }
    for (double c : d[4]) {
      if (!Double.isNaN(c)) {
        return true;
      }
    }
    return false;
  }

  /**
   * The clock of a satellite at one of its epochs.
   *
   * @param id satellite
   * @param gpsS GPS seconds since the GPS epoch
   * @return the clock, s, or NaN when absent or not at an epoch of the file
   */
  public double clockS(String id, double gpsS) {
    final double[][] d = data.get(id);
    if (d == null) {
      return Double.NaN;
    }
    final int k = java.util.Arrays.binarySearch(d[0], gpsS);
    return k >= 0 ? d[4][k] : Double.NaN;
  }

  /**
   * Whether any node of the interpolation window at an instant is flagged predicted.
   *
   * @param id satellite
   * @param gpsS GPS seconds
   * @return true when the state there rests on predicted positions
   */
  public boolean predicted(String id, double gpsS) {
    final double[][] d = data.get(id);
    if (d == null || d[0].length < NODES) {
      return false;
    }
    final List<Integer> flagged = header.predictedEpochs(id);
    final int from = Lagrange.window(d[0], NODES, gpsS);
    for (int k = from; k < from + NODES; k++) {
      if (flagged.contains((int) d[5][k])) {
        return true;
      }
    }
    return false;
  }

  @Override
  public String state(String id, double gpsS, double[] rE, double[] vE) {
    final double[][] d = data.get(id);
    if (d == null) {
      return "not in " + name;
    }
    final double[] t = d[0];
    final int n = t.length;
    if (n < NODES || gpsS < t[0] || gpsS > t[n - 1]) {
      return "outside the span of " + name;
    }
    int lo = java.util.Arrays.binarySearch(t, gpsS);
    lo = lo >= 0 ? lo : -lo - 2;
    if (lo - (NODES / 2 - 1) < 0 || lo + NODES / 2 > n - 1) {
      return END_OF_DATA + " of " + name + " (interpolation not centred)";
    }
    final int from = lo - (NODES / 2 - 1);
    final double gapLimit = 1.5 * header.intervalS();
    for (int k = from + 1; k < from + NODES; k++) {
      if (t[k] - t[k - 1] > gapLimit) {
        return String.format(Locale.ROOT, "gap of %.0f s in %s near this epoch", t[k] - t[k - 1], name);
      }
    }
    for (int c = 0; c < 3; c++) {
      final double[] pv = Lagrange.valueAndDerivative(t, d[1 + c], from, NODES, gpsS);
      rE[c] = pv[0];
      vE[c] = pv[1];
    }
    return null;
  }
}
