package org.eigenzeit.ground.trajectory;

/**
 * Lagrange polynomial interpolation and its derivative on a window of nodes (the standard method
 * for precise GNSS orbits: Schenewerk 2003, "A brief review of basic GPS orbit interpolation
 * strategies", GPS Solutions 6:265-267, which finds millimetre-level error for 10 nodes at 15 min
 * spacing). Stateless.
 */
public final class Lagrange {
  private Lagrange() {}

  /**
   * Value and derivative of the interpolating polynomial at x.
   *
   * @param xs nodes (distinct)
   * @param ys values at the nodes
   * @param from first node of the window
   * @param count number of nodes in the window
   * @param x where to evaluate
   * @return {value, derivative}
   */
  public static double[] valueAndDerivative(double[] xs, double[] ys, int from, int count, double x) {
    double value = 0.0;
    double deriv = 0.0;
    for (int j = from; j < from + count; j++) {
      double lj = 1.0;
      double dlj = 0.0;
      for (int m = from; m < from + count; m++) {
        if (m == j) {
          continue;
        }
        final double denom = xs[j] - xs[m];
        dlj = dlj * (x - xs[m]) / denom + lj / denom;
        lj *= (x - xs[m]) / denom;
      }
      value += ys[j] * lj;
      deriv += ys[j] * dlj;
    }
    return new double[] {value, deriv};
  }

  /**
   * First index of a window of {@code count} nodes centred on x, clamped to the data.
   *
   * @param xs nodes, increasing
   * @param count window size
   * @param x abscissa
   * @return the first index
   */
  public static int window(double[] xs, int count, double x) {
    int lo = 0;
    int hi = xs.length - 1;
    while (hi - lo > 1) {
      final int mid = (lo + hi) >>> 1;
      if (xs[mid] <= x) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    int from = lo - (count / 2 - 1);
    from = Math.max(0, Math.min(xs.length - count, from));
    return from;
  }
}
