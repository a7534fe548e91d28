package org.eigenzeit.onboard.gravity;

/**
 * The non-spherical part of a body's gravitational potential from the active field of a {@link
 * GravityTable}, in the
 * body-fixed frame, with the potential taken positive (U = GM/r + ...), as in IERS Conventions
 * (2010) chapter 10:
 *
 * <pre>
 *   U_h(r, phi, lambda) = sum_{n=2..N} U_n,
 *   U_n = (GM/r) (R/r)^n sum_{m=0..n} Pbar_nm(sin phi) (Cbar_nm cos m lambda + Sbar_nm sin m lambda)
 * </pre>
 *
 * <p>Legendre functions: fully normalised, by the standard forward column recursion (Holmes and
 * Featherstone 2002, J. Geodesy 76:279-299, eqs. 11-13): Pbar_mm from the sectoral recursion,
 * then Pbar_nm = a_nm t Pbar_{n-1,m} - b_nm Pbar_{n-2,m}. It is stable to degree and order of
 * several hundred without scaling, far beyond the degree 36 used here. cos m lambda and sin m
 * lambda come from the angle-addition recursion, so the evaluation needs no trigonometric call.
 *
 * <p>It also returns {@code sum (n+1) U_n}: since U_n is proportional to r^-(n+1), the radial
 * derivative satisfies r . grad U_n = -(n+1) U_n exactly, which the offset integrator uses.
 *
 * <p>Cost: (N+1)(N+2)/2 recursion steps, each about 10 floating-point operations; loops are
 * bounded by the degree fixed at construction. Accuracy: rounding only, below 1e-15 relative to
 * GM/r (checked against an independent algorithm, the Cunningham recursion of the ground
 * reference, in the verification module).
 *
 * <p>Mutable scratch arrays: not thread-safe; one owner. Nothing allocates after construction.
 */
public final class Geopotential {
  private final GravityTable field;
  private final int maxDegree;
  private final double[] aCoef;
  private final double[] bCoef;
  private final double[] sectoral;
  /** sqrt((2m+1)/(2m)) of the sectoral recursion (index m; sqrt(3) at m = 1), fixed at construction. */
  private final double[] sectoralCoef;
  private final double[] cosM;
  private final double[] sinM;
  private final double[] degreeSum;
  private double potentialM2PerS2;
  private double radialSumM2PerS2;

  /**
   * Creates an evaluator of a fixed field (ground tools, tests).
   *
   * @param field the field
   * @param maxDegree largest degree to evaluate (2 to the field's degree)
   * @throws IllegalArgumentException when the degree is out of range
   */
  public Geopotential(GravityField field, int maxDegree) {
    this(GravityTable.of(field), maxDegree);
  }

  /**
   * Creates an evaluator of a table's active field: a field activated later (explicitly, through
   * the uplink mechanism) is evaluated from the next evaluation on.
   *
   * @param field the coefficient table
   * @param maxDegree largest degree to evaluate (2 to the table's capacity)
   * @throws IllegalArgumentException when the degree is out of range
   */
  public Geopotential(GravityTable field, int maxDegree) {
    if (maxDegree < 2 || maxDegree > field.capacityDegree()) {
      throw new IllegalArgumentException("degree must be 2.." + field.capacityDegree());
    }
    this.field = field;
    this.maxDegree = maxDegree;
    final int size = GravityField.index(maxDegree, maxDegree) + 1;
    aCoef = new double[size];
    bCoef = new double[size];
    sectoral = new double[maxDegree + 1];
    sectoralCoef = new double[maxDegree + 1];
    sectoralCoef[1] = Math.sqrt(3.0);
    for (int m = 2; m <= maxDegree; m++) {
      sectoralCoef[m] = Math.sqrt((2.0 * m + 1.0) / (2.0 * m));
    }
    cosM = new double[maxDegree + 1];
    sinM = new double[maxDegree + 1];
    degreeSum = new double[maxDegree + 1];
    for (int n = 1; n <= maxDegree; n++) {
      for (int m = 0; m < n; m++) {
        final double nm = (double) (n - m) * (n + m);
        aCoef[GravityField.index(n, m)] = Math.sqrt((2.0 * n - 1.0) * (2.0 * n + 1.0) / nm);
        bCoef[GravityField.index(n, m)] = n - m >= 2
            ? Math.sqrt((2.0 * n + 1.0) * (n + m - 1.0) * (n - m - 1.0) / (nm * (2.0 * n - 3.0)))
            : 0.0;
      }
    }
    sectoral[0] = 1.0;
  }

  /**
   * Evaluates the harmonic potential at a body-fixed position. Results are read with {@link
   * #potentialM2PerS2()} and {@link #radialSumM2PerS2()}.
   *
   * @param xM body-fixed x, m
   * @param yM body-fixed y, m
   * @param zM body-fixed z, m (r must be positive and finite: validated by the caller)
   */
  public void evaluate(double xM, double yM, double zM) {
    final int degree = Math.min(maxDegree, field.degree());
    final double rho2 = xM * xM + yM * yM;
    final double r = Math.sqrt(rho2 + zM * zM);
    final double rho = Math.sqrt(rho2);
    final double t = zM / r;
    final double u = rho / r;
    final double cl = rho > 0 ? xM / rho : 1.0;
    final double sl = rho > 0 ? yM / rho : 0.0;
    cosM[0] = 1.0;
    sinM[0] = 0.0;
    for (int m = 1; m <= degree; m++) {
      cosM[m] = cosM[m - 1] * cl - sinM[m - 1] * sl;
      sinM[m] = sinM[m - 1] * cl + cosM[m - 1] * sl;
    }
    for (int n = 0; n <= degree; n++) {
      degreeSum[n] = 0.0;
    }
    for (int m = 0; m <= degree; m++) {
      if (m == 1) {
        sectoral[1] = sectoralCoef[1] * u;
      } else if (m >= 2) {
        sectoral[m] = u * sectoralCoef[m] * sectoral[m - 1];
      }
      double pPrev = 0.0;
      double p = sectoral[m];
      for (int n = m; n <= degree; n++) {
        if (n > m) {
          final int k = GravityField.index(n, m);
          final double next = aCoef[k] * t * p - bCoef[k] * pPrev;
          pPrev = p;
          p = next;
        }
        if (n >= 2) {
          final int k = GravityField.index(n, m);
          degreeSum[n] += p * (field.cPacked(k) * cosM[m] + field.sPacked(k) * sinM[m]);
        }
      }
    }
    final double ratio = field.radiusM() / r;
    double ratioPower = ratio;
    double potential = 0.0;
    double radial = 0.0;
    for (int n = 2; n <= degree; n++) {
      ratioPower *= ratio;
      final double un = ratioPower * degreeSum[n];
      potential += un;
      radial += (n + 1) * un;
    }
    final double gmOverR = field.gmM3PerS2() / r;
    potentialM2PerS2 = gmOverR * potential;
    radialSumM2PerS2 = gmOverR * radial;
  }

  /**
   * Returns u_h of the last evaluation, m^2/s^2 (positive convention).
   *
   * @return U_h of the last evaluation, m^2/s^2 (positive convention)
   */
  public double potentialM2PerS2() {
    return potentialM2PerS2;
  }

  /**
   * Returns sum over n of (n+1) U_n of the last evaluation, m^2/s^2; r . grad U_h = minus this.
   *
   * @return sum over n of (n+1) U_n of the last evaluation, m^2/s^2; r . grad U_h = minus this
   */
  public double radialSumM2PerS2() {
    return radialSumM2PerS2;
  }

}
