package org.eigenzeit.onboard.steering;

import java.util.Random;

/**
 * Test helper: a free-running clock that follows the three-state model exactly (phase, frequency,
 * drift driven by the discrete process noise of Zucca and Tavella 2005, via its Cholesky factor).
 * Invented data for tests; typical-value presets only.
 */
final class ClockTruth {
  final double q1;
  final double q2;
  final double q3;
  final Random rnd;
  double phase;
  double freq;
  double drift;

  ClockTruth(double sWfm, double sRwfm, double sRr, double freq0, double drift0, long seed) {
    q1 = sWfm * sWfm;
    q2 = 3 * sRwfm * sRwfm;
    q3 = 20 * sRr * sRr;
    freq = freq0;
    drift = drift0;
    rnd = new Random(seed);
  }

  /** Advances by tau with an applied steering u (fractional frequency). */
  void step(double tau, double u) {
    final double t2 = tau * tau;
    final double t3 = t2 * tau;
    final double t4 = t3 * tau;
    final double t5 = t4 * tau;
    final double[][] q = {
      {q1 * tau + q2 * t3 / 3 + q3 * t5 / 20, q2 * t2 / 2 + q3 * t4 / 8, q3 * t3 / 6},
      {q2 * t2 / 2 + q3 * t4 / 8, q2 * tau + q3 * t3 / 3, q3 * t2 / 2},
      {q3 * t3 / 6, q3 * t2 / 2, q3 * tau}};
    final double[][] l = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j <= i; j++) {
        double s = q[i][j];
        for (int k = 0; k < j; k++) {
          s -= l[i][k] * l[j][k];
        }
        l[i][j] = i == j ? Math.sqrt(Math.max(s, 0)) : (l[j][j] > 0 ? s / l[j][j] : 0);
      }
    }
    final double[] g = {rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()};
    phase += tau * (freq + u) + t2 / 2 * drift + l[0][0] * g[0];
    freq += tau * drift + l[1][0] * g[0] + l[1][1] * g[1];
    drift += l[2][0] * g[0] + l[2][1] * g[1] + l[2][2] * g[2];
  }
}
