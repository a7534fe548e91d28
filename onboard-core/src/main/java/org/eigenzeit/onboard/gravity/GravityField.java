package org.eigenzeit.onboard.gravity;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.StringTokenizer;

/**
 * An immutable set of fully normalised spherical-harmonic coefficients C_nm, S_nm (degree 2 to
 * {@link #degree()}) with its GM and reference radius: the field a configuration starts with, the
 * ground reference's field, and the content of a gravity uplink image ({@link GravityTable}).
 * Built at construction time only, by {@link #builder} or {@link #egm96}; both refuse a
 * coefficient that is not finite, larger than {@value #MAX_ABS_COEFFICIENT} in magnitude, or an
 * S_n0 other than zero.
 *
 * <p>Normalisation: the geodesy convention (Heiskanen and Moritz 1967, eq. 1-73; EGM96 and
 * EGM2008 use it), so that C20 = -J2/sqrt(5).
 *
 * <p>Immutable; safe to share between threads.
 */
public final class GravityField {
  /** Largest degree a field may have. */
  public static final int MAX_CAPACITY_DEGREE = 90;
  /** Largest |coefficient| accepted (C20 of any planet is far smaller). */
  public static final double MAX_ABS_COEFFICIENT = 1.0e-2;

  private final int degree;
  private final double gm;
  private final double radius;
  private final double[] c;
  private final double[] s;

  private GravityField(Builder b) {
    this.degree = b.degree;
    this.gm = b.gm;
    this.radius = b.radius;
    this.c = b.c.clone();
    this.s = b.s.clone();
  }

  /**
   * Starts a field (construction time; every coefficient starts at zero).
   *
   * @param gmM3PerS2 GM of the field, m^3/s^2 (positive, finite)
   * @param radiusM reference radius, m (positive, finite)
   * @param degree largest degree, 2 to {@value #MAX_CAPACITY_DEGREE}
   * @return a builder
   * @throws IllegalArgumentException for a value out of range
   */
  public static Builder builder(double gmM3PerS2, double radiusM, int degree) {
    return new Builder(gmM3PerS2, radiusM, degree);
  }

  /**
   * The EGM96 table shipped with the core (degree 36, see PROVENANCE.md beside the resource), to
   * the given degree: an init-only decoder of the resource text, for construction time (reads a
   * resource and allocates). Fields uplinked in flight come as binary images ({@link
   * GravityTable}); the ground decodes other coefficient files.
   *
   * @param degree largest degree to load, 2 to 36
   * @return the field
   * @throws IllegalArgumentException when the degree is out of range
   * @throws UncheckedIOException when the resource cannot be read
   */
  public static GravityField egm96(int degree) {
    if (degree < 2 || degree > 36) {
      throw new IllegalArgumentException("EGM96 is shipped to degree 36");
    }
    final Builder b = builder(3.986004415e14, 6_378_136.3, degree);
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
        final double cnm = Double.parseDouble(f.nextToken());
        final double snm = Double.parseDouble(f.nextToken());
        if (n <= degree) {
          b.set(n, m, cnm, snm);
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return b.build();
  }

  /**
   * The same field cut at a lower degree (construction time).
   *
   * @param maxDegree the new largest degree, 2 to this field's degree (a larger value keeps all)
   * @return this field when nothing is cut, else a new field
   * @throws IllegalArgumentException when the degree is below 2
   */
  public GravityField truncated(int maxDegree) {
    if (maxDegree >= degree) {
      return this;
    }
    final Builder b = builder(gm, radius, maxDegree);
    for (int n = 2; n <= maxDegree; n++) {
      for (int m = 0; m <= n; m++) {
        b.set(n, m, c(n, m), s(n, m));
      }
    }
    return b.build();
  }

  /**
   * Index of (n, m) in the packed triangular arrays.
   *
   * @param n degree
   * @param m order
   * @return n (n + 1) / 2 + m
   */
  static int index(int n, int m) {
    return n * (n + 1) / 2 + m;
  }

  /**
   * Returns the largest degree.
   *
   * @return the degree
   */
  public int degree() {
    return degree;
  }

  /**
   * Returns GM of the field, m^3/s^2.
   *
   * @return GM
   */
  public double gmM3PerS2() {
    return gm;
  }

  /**
   * Returns the reference radius, m.
   *
   * @return the radius
   */
  public double radiusM() {
    return radius;
  }

  /**
   * Normalised C_nm.
   *
   * @param n degree
   * @param m order
   * @return the coefficient (0 outside the field)
   */
  public double c(int n, int m) {
    return (n >= 2 && n <= degree && m >= 0 && m <= n) ? c[index(n, m)] : 0.0;
  }

  /**
   * Normalised S_nm.
   *
   * @param n degree
   * @param m order
   * @return the coefficient (0 outside the field)
   */
  public double s(int n, int m) {
    return (n >= 2 && n <= degree && m >= 0 && m <= n) ? s[index(n, m)] : 0.0;
  }

  /** Mutable builder of a field; construction time only; not thread-safe. */
  public static final class Builder {
    private final int degree;
    private final double gm;
    private final double radius;
    private final double[] c;
    private final double[] s;

    private Builder(double gm, double radius, int degree) {
      if (!(gm > 0 && radius > 0) || !Double.isFinite(gm) || !Double.isFinite(radius)) {
        throw new IllegalArgumentException("GM and radius must be positive and finite");
      }
      if (degree < 2 || degree > MAX_CAPACITY_DEGREE) {
        throw new IllegalArgumentException("degree must be 2.." + MAX_CAPACITY_DEGREE + ", found " + degree);
      }
      this.degree = degree;
      this.gm = gm;
      this.radius = radius;
      this.c = new double[index(degree, degree) + 1];
      this.s = new double[index(degree, degree) + 1];
    }

    /**
     * Sets one coefficient pair.
     *
     * @param n degree, 2 to the field's degree
     * @param m order, 0 to n
     * @param cnm normalised C_nm
     * @param snm normalised S_nm (zero for m = 0)
     * @return this
     * @throws IllegalArgumentException for an index or value out of range
     */
    public Builder set(int n, int m, double cnm, double snm) {
      if (n < 2 || n > degree || m < 0 || m > n) {
        throw new IllegalArgumentException("coefficient (" + n + ", " + m + ") outside degree 2.." + degree);
      }
      if (!(Math.abs(cnm) <= MAX_ABS_COEFFICIENT) || !(Math.abs(snm) <= MAX_ABS_COEFFICIENT) || (m == 0 && snm != 0)) {
        throw new IllegalArgumentException("coefficient (" + n + ", " + m + ") refused: C " + cnm + ", S " + snm
            + "; allowed finite, |value| <= " + MAX_ABS_COEFFICIENT + ", S = 0 for m = 0");
      }
      c[index(n, m)] = cnm;
      s[index(n, m)] = snm;
      return this;
    }

    /**
     * Builds the immutable field.
     *
     * @return the field
     */
    public GravityField build() {
      return new GravityField(this);
    }
  }
}
