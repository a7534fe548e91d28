package org.eigenzeit.ground.stats;

/**
 * Frequency-stability statistics from phase (time-error) data x_i sampled every tau0, as defined
 * in IEEE Std 1139-2008 and computed as in Riley, "Handbook of Frequency Stability Analysis", NIST
 * Special Publication 1065 (2008), sections 5.2.2-5.2.6:
 *
 * <pre>
 *   overlapping Allan variance  sigma_y^2(m tau0) = sum_{i}^{N-2m} (x_{i+2m} - 2 x_{i+m} + x_i)^2
 *                                                   / (2 (m tau0)^2 (N - 2m))
 *   modified Allan variance     Mod sigma_y^2 = sum_{j=1}^{N-3m+1} [sum_{i=j}^{j+m-1}
 *                                 (x_{i+2m} - 2 x_{i+m} + x_i)]^2 / (2 m^2 (m tau0)^2 (N - 3m + 1))
 *   time deviation              sigma_x(tau) = tau / sqrt(3) Mod sigma_y(tau)
 * </pre>
 *
 * Stateless.
 */
public final class Stability {
  private Stability() {}

  /**
   * Overlapping Allan deviation.
   *
   * @param x phase data, s
   * @param tau0 sample interval, s
   * @param m averaging factor (tau = m tau0)
   * @return sigma_y(tau), or NaN when the data are too short
   */
  public static double adev(double[] x, double tau0, int m) {
    final int n = x.length;
    if (m < 1 || n - 2 * m < 1) {
      return Double.NaN;
    }
    double sum = 0;
    for (int i = 0; i < n - 2 * m; i++) {
      final double d = x[i + 2 * m] - 2 * x[i + m] + x[i];
      sum += d * d;
    }
    final double tau = m * tau0;
    return Math.sqrt(sum / (2.0 * tau * tau * (n - 2 * m)));
  }

  /**
   * Modified Allan deviation, with a running sum (O(N) per tau).
   *
   * @param x phase data, s
   * @param tau0 sample interval, s
   * @param m averaging factor
   * @return Mod sigma_y(tau), or NaN when the data are too short
   */
  public static double mdev(double[] x, double tau0, int m) {
    final int n = x.length;
    if (m < 1 || n - 3 * m + 1 < 1) {
      return Double.NaN;
    }
    double inner = 0;
    for (int i = 0; i < m; i++) {
      inner += x[i + 2 * m] - 2 * x[i + m] + x[i];
    }
    double sum = inner * inner;
    for (int j = 1; j <= n - 3 * m; j++) {
      inner += (x[j + 3 * m - 1] - 2 * x[j + 2 * m - 1] + x[j + m - 1]) - (x[j + 2 * m - 1] - 2 * x[j + m - 1] + x[j - 1]);
      sum += inner * inner;
    }
    final double tau = m * tau0;
    return Math.sqrt(sum / (2.0 * m * m * tau * tau * (n - 3 * m + 1)));
  }

  /**
   * Time deviation.
   *
   * @param x phase data, s
   * @param tau0 sample interval, s
   * @param m averaging factor
   * @return sigma_x(tau), s
   */
  public static double tdev(double[] x, double tau0, int m) {
    return m * tau0 / Math.sqrt(3.0) * mdev(x, tau0, m);
  }

  /**
   * The standard averaging times 1, 10, 100, ... up to a third of the data (Riley 2008 uses
   * octave or decade spacing; decades here).
   *
   * @param n number of phase points
   * @param tau0 sample interval, s
   * @return averaging factors m
   */
  public static int[] decadeFactors(int n, double tau0) {
    int count = 0;
    for (long m = 1; m <= n / 3; m *= 10) {
      count++;
    }
    final int[] out = new int[count];
    long m = 1;
    for (int i = 0; i < count; i++, m *= 10) {
      out[i] = (int) m;
    }
    return out;
  }
}
