package org.eigenzeit.onboard.math;

/**
 * Chooses between {@link Math} (fast, may use platform intrinsics whose last bit can differ
 * between JVMs) and {@link StrictMath} (the fdlibm algorithms, bit-identical on every compliant
 * JVM). Since Java 17 all floating-point arithmetic is strict (JEP 306), so with {@link #STRICT}
 * every result of the core is bit-identical across JDKs and machines; golden-vector tests prove it
 * on JDK 17 and JDK 25.
 *
 * <p>Only transcendental functions differ between the two; {@code sqrt} is correctly rounded in
 * both and is routed to {@link Math#sqrt}.
 *
 * <p>Immutable; safe to share between threads.
 */
public final class MathMode {
  /** Fast mode: {@link Math}. */
  public static final MathMode FAST = new MathMode(false);
  /** Bit-reproducible mode: {@link StrictMath}. */
  public static final MathMode STRICT = new MathMode(true);

  private final boolean strict;

  private MathMode(boolean strict) {
    this.strict = strict;
  }

  /**
   * Tells which mode this is.
   *
   * @return true for {@link #STRICT}
   */
  public boolean isStrict() {
    return strict;
  }

  /**
   * Sine.
   *
   * @param angleRad angle in radians
   * @return sin(angle)
   */
  public double sin(double angleRad) {
    return strict ? StrictMath.sin(angleRad) : Math.sin(angleRad);
  }

  /**
   * Cosine.
   *
   * @param angleRad angle in radians
   * @return cos(angle)
   */
  public double cos(double angleRad) {
    return strict ? StrictMath.cos(angleRad) : Math.cos(angleRad);
  }

  /**
   * Two-argument arc tangent.
   *
   * @param y ordinate
   * @param x abscissa
   * @return the angle in radians in [-pi, pi]
   */
  public double atan2(double y, double x) {
    return strict ? StrictMath.atan2(y, x) : Math.atan2(y, x);
  }

  /**
   * Square root (correctly rounded in both modes).
   *
   * @param x argument
   * @return sqrt(x)
   */
  public double sqrt(double x) {
    return Math.sqrt(x);
  }

  @Override
  public String toString() {
    return strict ? "STRICT" : "FAST";
  }
}
