package org.eigenzeit.onboard.math;

/**
 * Three-vector and 3x3-matrix operations on caller-owned {@code double[]} arrays. Nothing here
 * allocates. Matrices are row-major {@code double[9]}.
 *
 * <p>Stateless; safe from any thread as long as callers do not share output arrays.
 */
public final class Vec3 {
  private Vec3() {}

  /**
   * Dot product.
   *
   * @param a first vector (length 3)
   * @param b second vector (length 3)
   * @return a.b
   */
  public static double dot(double[] a, double[] b) {
    return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  }

  /**
   * Euclidean norm, computed as sqrt(a.a) (no overflow protection: inputs are validated first).
   *
   * @param a vector (length 3)
   * @return |a|
   */
  public static double norm(double[] a) {
    return Math.sqrt(dot(a, a));
  }

  /**
   * Matrix times vector: out = m a. {@code out} must not alias {@code a}.
   *
   * @param m row-major 3x3 matrix (length 9)
   * @param a vector (length 3)
   * @param out result (length 3)
   */
  public static void mul(double[] m, double[] a, double[] out) {
    out[0] = m[0] * a[0] + m[1] * a[1] + m[2] * a[2];
    out[1] = m[3] * a[0] + m[4] * a[1] + m[5] * a[2];
    out[2] = m[6] * a[0] + m[7] * a[1] + m[8] * a[2];
  }

  /**
   * Transposed matrix times vector: out = m^T a. {@code out} must not alias {@code a}.
   *
   * @param m row-major 3x3 matrix (length 9)
   * @param a vector (length 3)
   * @param out result (length 3)
   */
  public static void mulTransposed(double[] m, double[] a, double[] out) {
    out[0] = m[0] * a[0] + m[3] * a[1] + m[6] * a[2];
    out[1] = m[1] * a[0] + m[4] * a[1] + m[7] * a[2];
    out[2] = m[2] * a[0] + m[5] * a[1] + m[8] * a[2];
  }

  /**
   * Matrix product: out = a b. {@code out} must alias neither input.
   *
   * @param a row-major 3x3 matrix
   * @param b row-major 3x3 matrix
   * @param out result, row-major 3x3
   */
  public static void matMul(double[] a, double[] b, double[] out) {
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        out[3 * i + j] = a[3 * i] * b[j] + a[3 * i + 1] * b[3 + j] + a[3 * i + 2] * b[6 + j];
      }
    }
  }

  /**
   * Copies a 3-vector.
   *
   * @param src source (length 3)
   * @param dst destination (length 3)
   */
  public static void copy(double[] src, double[] dst) {
    dst[0] = src[0];
    dst[1] = src[1];
    dst[2] = src[2];
  }

  /**
   * Tells whether all three components are finite.
   *
   * @param a vector (length 3)
   * @return true when no component is NaN or infinite
   */
  public static boolean isFinite(double[] a) {
    return Double.isFinite(a[0]) && Double.isFinite(a[1]) && Double.isFinite(a[2]);
  }
}
