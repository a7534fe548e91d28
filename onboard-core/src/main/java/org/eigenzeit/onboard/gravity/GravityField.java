package org.eigenzeit.onboard.gravity;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.StringTokenizer;
import org.eigenzeit.onboard.status.Status;

/**
 * A table of fully normalised spherical-harmonic coefficients C_nm, S_nm (degree 2 to a maximum
 * fixed at construction) with its GM and reference radius.
 *
 * <p>Life cycle: {@link #beginStaging} and {@link #stage} fill an inactive buffer; {@link
 * #validate} range-checks it; {@link #activate} makes it the table in use. Readers see only the
 * active table. Capacity is fixed at construction; nothing allocates afterwards.
 *
 * <p>Normalisation: the geodesy convention (Heiskanen and Moritz 1967, eq. 1-73; EGM96 and
 * EGM2008 use it), so that C20 = -J2/sqrt(5).
 *
 * <p>Mutable, not thread-safe: stage, activate and evaluate from one thread.
 */
public final class GravityField {
  /** Largest degree a table may be built for. */
  public static final int MAX_CAPACITY_DEGREE = 90;
  /** Largest |coefficient| accepted by {@link #validate} (C20 of any planet is far smaller). */
  public static final double MAX_ABS_COEFFICIENT = 1.0e-2;

  private final int capacityDegree;
  private final double[] activeC;
  private final double[] activeS;
  private final double[] stagedC;
  private final double[] stagedS;
  private int activeDegree;
  private double activeGm;
  private double activeRadius;
  private int stagedDegree;
  private double stagedGm;
  private double stagedRadius;
  private boolean stagedValid;

  /**
   * Creates an empty table.
   *
   * @param capacityDegree largest degree the table can hold (2 to {@value #MAX_CAPACITY_DEGREE})
   * @throws IllegalArgumentException when the capacity is out of range
   */
  public GravityField(int capacityDegree) {
    if (capacityDegree < 2 || capacityDegree > MAX_CAPACITY_DEGREE) {
      throw new IllegalArgumentException("capacity degree must be 2.." + MAX_CAPACITY_DEGREE);
    }
    this.capacityDegree = capacityDegree;
    final int n = index(capacityDegree, capacityDegree) + 1;
    activeC = new double[n];
    activeS = new double[n];
    stagedC = new double[n];
    stagedS = new double[n];
  }

  /**
   * The EGM96 table shipped with the core (degree 36, see PROVENANCE.md beside the resource),
   * loaded and activated up to the given degree. Construction-time only: reads a resource and
   * allocates.
   *
   * @param degree largest degree to load, 2 to 36
   * @return an active table
   * @throws IllegalArgumentException when the degree is out of range
   * @throws UncheckedIOException when the resource cannot be read
   */
  public static GravityField egm96(int degree) {
    if (degree < 2 || degree > 36) {
      throw new IllegalArgumentException("EGM96 is shipped to degree 36");
    }
    final GravityField field = new GravityField(degree);
    field.beginStaging(3.986004415e14, 6_378_136.3, degree);
    final InputStream in = GravityField.class.getResourceAsStream("egm96-normalized-deg36.txt");
    if (in == null) {
      throw new UncheckedIOException(new IOException("EGM96 resource missing"));
    }
    try (BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.US_ASCII))) {
      String line;
      while ((line = reader.readLine()) != null) {
        final String trimmed = line.trim();
        if (trimmed.isEmpty() || trimmed.charAt(0) == '#') {
          continue;
        }
        final StringTokenizer f = new StringTokenizer(trimmed);
        final int n = Integer.parseInt(f.nextToken());
        final int m = Integer.parseInt(f.nextToken());
        final double c = Double.parseDouble(f.nextToken());
        final double s = Double.parseDouble(f.nextToken());
        if (n <= degree && field.stage(n, m, c, s) != Status.OK) {
          throw new IllegalStateException("bad EGM96 row: " + trimmed);
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    if (field.validate() != Status.OK || field.activate() != Status.OK) {
      throw new IllegalStateException("shipped EGM96 table failed validation");
    }
    return field;
  }

  static int index(int n, int m) {
    return n * (n + 1) / 2 + m;
  }

  /**
   * Starts a new staged table (clears the inactive buffer).
   *
   * @param gmM3PerS2 GM of the table, m^3/s^2
   * @param radiusM reference radius of the table, m
   * @param degree largest degree the staged table will hold (2 to capacity)
   * @return {@link Status#OK}, or {@link Status#OUT_OF_RANGE} / {@link Status#NOT_FINITE}
   */
  public int beginStaging(double gmM3PerS2, double radiusM, int degree) {
    stagedValid = false;
    if (!Double.isFinite(gmM3PerS2) || !Double.isFinite(radiusM)) {
      return Status.NOT_FINITE;
    }
    if (degree < 2 || degree > capacityDegree || !(gmM3PerS2 > 0) || !(radiusM > 0)) {
      return Status.OUT_OF_RANGE;
    }
    java.util.Arrays.fill(stagedC, 0.0);
    java.util.Arrays.fill(stagedS, 0.0);
    stagedDegree = degree;
    stagedGm = gmM3PerS2;
    stagedRadius = radiusM;
    return Status.OK;
  }

  /**
   * Writes one coefficient pair into the staged table.
   *
   * @param n degree, 2 to the staged degree
   * @param m order, 0 to n
   * @param c normalised C_nm
   * @param s normalised S_nm (must be 0 for m = 0)
   * @return {@link Status#OK}, {@link Status#OUT_OF_RANGE} or {@link Status#NOT_FINITE}
   */
  public int stage(int n, int m, double c, double s) {
    stagedValid = false;
    if (!Double.isFinite(c) || !Double.isFinite(s)) {
      return Status.NOT_FINITE;
    }
    if (n < 2 || n > stagedDegree || m < 0 || m > n) {
      return Status.OUT_OF_RANGE;
    }
    stagedC[index(n, m)] = c;
    stagedS[index(n, m)] = s;
    return Status.OK;
  }

  /**
   * Range-checks the staged table.
   *
   * @return {@link Status#OK}, or {@link Status#OUT_OF_RANGE} (a coefficient above {@value
   *     #MAX_ABS_COEFFICIENT}, a nonzero S_n0, or no staging begun)
   */
  public int validate() {
    if (stagedDegree < 2) {
      return Status.OUT_OF_RANGE;
    }
    for (int n = 2; n <= stagedDegree; n++) {
      for (int m = 0; m <= n; m++) {
        final int i = index(n, m);
        if (Math.abs(stagedC[i]) > MAX_ABS_COEFFICIENT || Math.abs(stagedS[i]) > MAX_ABS_COEFFICIENT
            || (m == 0 && stagedS[i] != 0.0)) {
          return Status.OUT_OF_RANGE;
        }
      }
    }
    stagedValid = true;
    return Status.OK;
  }

  /**
   * Makes the validated staged table the active one.
   *
   * @return {@link Status#OK}, or {@link Status#NOT_READY} when the staged table was not validated
   */
  public int activate() {
    if (!stagedValid) {
      return Status.NOT_READY;
    }
    final int n = index(stagedDegree, stagedDegree) + 1;
    System.arraycopy(stagedC, 0, activeC, 0, n);
    System.arraycopy(stagedS, 0, activeS, 0, n);
    java.util.Arrays.fill(activeC, n, activeC.length, 0.0);
    java.util.Arrays.fill(activeS, n, activeS.length, 0.0);
    activeDegree = stagedDegree;
    activeGm = stagedGm;
    activeRadius = stagedRadius;
    stagedValid = false;
    return Status.OK;
  }

  /**
   * Returns the largest degree this table can hold.
   *
   * @return the largest degree this table can hold
   */
  public int capacityDegree() {
    return capacityDegree;
  }

  /**
   * Returns the degree of the active table (0 when none is active).
   *
   * @return the degree of the active table (0 when none is active)
   */
  public int degree() {
    return activeDegree;
  }

  /**
   * Returns gM of the active table, m^3/s^2.
   *
   * @return GM of the active table, m^3/s^2
   */
  public double gmM3PerS2() {
    return activeGm;
  }

  /**
   * Returns reference radius of the active table, m.
   *
   * @return reference radius of the active table, m
   */
  public double radiusM() {
    return activeRadius;
  }

  /**
   * Active normalised C_nm.
   *
   * @param n degree
   * @param m order
   * @return the coefficient (0 outside the active table)
   */
  public double c(int n, int m) {
    return (n >= 2 && n <= activeDegree && m >= 0 && m <= n) ? activeC[index(n, m)] : 0.0;
  }

  /**
   * Active normalised S_nm.
   *
   * @param n degree
   * @param m order
   * @return the coefficient (0 outside the active table)
   */
  public double s(int n, int m) {
    return (n >= 2 && n <= activeDegree && m >= 0 && m <= n) ? activeS[index(n, m)] : 0.0;
  }

  /** Active C by packed index (no checks; for the evaluator's inner loop). */
  double cPacked(int i) {
    return activeC[i];
  }

  /** Active S by packed index (no checks; for the evaluator's inner loop). */
  double sPacked(int i) {
    return activeS[i];
  }
}
