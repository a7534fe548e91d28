package org.eigenzeit.ground.timescale;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealVector;

/**
 * Linear least-squares fit of a constant, optionally a rate, and sinusoids of given frequencies:
 *
 * <pre>
 *   y(t) = a + b (t - origin) + sum_k [c_k cos(omega_k t) + s_k sin(omega_k t)] + residual
 * </pre>
 *
 * solved by Householder QR (Hipparchus {@link QRDecomposition}) with the rate column scaled to
 * 1e9 s. Used to separate the secular and periodic parts of the numerical time relations: the
 * frequencies are those of the solar-system arguments ({@link Frequencies}); whatever the fit
 * leaves is kept in the residual, so the fit only decides the constant, the rate and the listed
 * amplitudes.
 */
final class HarmonicFit {
  private static final double RATE_SCALE_S = 1.0e9;

  /**
   * A fitted model.
   *
   * @param constant a, in the unit of y
   * @param rate b, per second (0 when not fitted)
   * @param cosine c_k
   * @param sine s_k
   * @param rmsResidual root mean square of the residual
   * @param maxResidual largest |residual|
   */
  record Result(double constant, double rate, double[] cosine, double[] sine, double rmsResidual,
      double maxResidual) {
    /** Defensive copies. */
    Result {
      cosine = cosine.clone();
      sine = sine.clone();
    }

    @Override
    public double[] cosine() {
      return cosine.clone();
    }

    @Override
    public double[] sine() {
      return sine.clone();
    }

    /**
     * Amplitude of one sinusoid.
     *
     * @param k index in the frequency list
     * @return sqrt(c_k^2 + s_k^2)
     */
    double amplitude(int k) {
      return Math.hypot(cosine[k], sine[k]);
    }
  }

  private HarmonicFit() {}

  /**
   * Fits the model.
   *
   * @param tS sample times, s (the sinusoids' phase origin is t = 0)
   * @param y samples
   * @param originS origin of the rate term, s
   * @param withRate whether b is fitted (else b = 0)
   * @param omegaRadPerS angular frequencies, rad/s
   * @return the fit
   */
  static Result fit(double[] tS, double[] y, double originS, boolean withRate, double[] omegaRadPerS) {
    final int n = tS.length;
    final int base = withRate ? 2 : 1;
    final int p = base + 2 * omegaRadPerS.length;
    final double[][] a = new double[n][p];
    for (int i = 0; i < n; i++) {
      a[i][0] = 1.0;
      if (withRate) {
        a[i][1] = (tS[i] - originS) / RATE_SCALE_S;
      }
      for (int k = 0; k < omegaRadPerS.length; k++) {
        final double phase = omegaRadPerS[k] * tS[i];
        a[i][base + 2 * k] = Math.cos(phase);
        a[i][base + 2 * k + 1] = Math.sin(phase);
      }
    }
    final RealVector sol = new QRDecomposition(new Array2DRowRealMatrix(a, false)).getSolver()
        .solve(new ArrayRealVector(y, false));
    final double[] c = new double[omegaRadPerS.length];
    final double[] s = new double[omegaRadPerS.length];
    for (int k = 0; k < c.length; k++) {
      c[k] = sol.getEntry(base + 2 * k);
      s[k] = sol.getEntry(base + 2 * k + 1);
    }
    double ss = 0.0;
    double max = 0.0;
    for (int i = 0; i < n; i++) {
      double model = 0.0;
      for (int j = 0; j < p; j++) {
        model += a[i][j] * sol.getEntry(j);
      }
      final double r = y[i] - model;
      ss += r * r;
      max = Math.max(max, Math.abs(r));
    }
    return new Result(sol.getEntry(0), withRate ? sol.getEntry(1) / RATE_SCALE_S : 0.0, c, s, Math.sqrt(ss / n), max);
  }
}
