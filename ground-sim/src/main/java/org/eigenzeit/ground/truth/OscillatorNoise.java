package org.eigenzeit.ground.truth;

import java.util.SplittableRandom;
import org.hipparchus.complex.Complex;
import org.hipparchus.transform.DftNormalization;
import org.hipparchus.transform.FastFourierTransformer;
import org.hipparchus.transform.TransformType;

/**
 * Generates the phase error x_k (s) of a free-running oscillator at tau0 = 1 s from an {@link
 * OscillatorModel}, by the discrete power-law noise method of Kasdin and Walter (1992), "Discrete
 * simulation of power law noise", Proc. IEEE Frequency Control Symposium, pp. 274-283 (and
 * Kasdin 1995, Proc. IEEE 83(5):802): white Gaussian noise of variance Q_d filtered by
 *
 * <pre>
 *   h_0 = 1,  h_k = h_{k-1} (beta/2 + k - 1) / k          (a 1/f^beta process)
 * </pre>
 *
 * applied to the fractional frequency y: beta = 0 white FM, beta = 1 flicker FM (convolution by
 * FFT, Hipparchus), beta = 2 random-walk FM (the filter is a running sum). The variances follow
 * from the Allan-deviation parameters with Q_d = h_alpha / (2 (2 pi)^alpha tau0^(alpha+1)) and the
 * standard relations sigma_y^2 = h_0/(2 tau) (WFM), 2 ln 2 h_-1 (FFM), (2 pi^2/3) h_-2 tau (RWFM):
 * Q_d = sigma_WFM^2 tau0, pi sigma_FFM^2 / (2 ln 2), 3 sigma_RWFM^2 tau0. White PM is added to the
 * phase directly; drift is deterministic. The phase is the running sum of y tau0.
 *
 * <p>Deterministic for a given seed (SplittableRandom). Allocates its output arrays.
 */
public final class OscillatorNoise {
  private OscillatorNoise() {}

  /**
   * Generates n + 1 phase values x_0 = 0, x_1, ..., x_n at 1 s spacing.
   *
   * @param model oscillator model
   * @param n number of 1 s steps
   * @param seed random seed
   * @return phase, s
   */
  public static double[] phase(OscillatorModel model, int n, long seed) {
    final SplittableRandom rnd = new SplittableRandom(seed);
    final double[] y = new double[n];
    final double dPerS = model.driftPerDay() / 86_400.0;
    final double sW = model.whiteFmAdev1s();
    final double sRw = Math.sqrt(3.0) * model.randomWalkFmAdev1s();
    double rw = 0;
    for (int k = 0; k < n; k++) {
      rw += sRw * gaussian(rnd);
      y[k] = model.initialFrequency() + dPerS * (k + 0.5) + sW * gaussian(rnd) + rw;
    }
    if (model.flickerFmFloor() > 0) {
      final double[] f = flicker(n, Math.sqrt(Math.PI / (2 * Math.log(2))) * model.flickerFmFloor(), rnd);
      for (int k = 0; k < n; k++) {
        y[k] += f[k];
      }
    }
    final double[] x = new double[n + 1];
    for (int k = 0; k < n; k++) {
      x[k + 1] = x[k] + y[k];
    }
    final double sPm = model.whitePmSigmaXS();
    if (sPm > 0) {
      for (int k = 0; k <= n; k++) {
        x[k] += sPm * gaussian(rnd);
      }
    }
    return x;
  }

  private static double gaussian(SplittableRandom rnd) {
    // Box-Muller (Box and Muller 1958); SplittableRandom has no nextGaussian before Java 17's RandomGenerator default.
    double u1 = rnd.nextDouble();
    while (u1 <= 0) {
      u1 = rnd.nextDouble();
    }
    final double u2 = rnd.nextDouble();
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
  }

  /** Kasdin-Walter 1/f noise (beta = 1) of n samples, white driving noise of standard deviation q. */
  static double[] flicker(int n, double q, SplittableRandom rnd) {
    int size = 1;
    while (size < 2 * n) {
      size <<= 1;
    }
    final double[] h = new double[size];
    final double[] w = new double[size];
    h[0] = 1.0;
    for (int k = 1; k < n; k++) {
      h[k] = h[k - 1] * (0.5 + k - 1) / k;
    }
    for (int k = 0; k < n; k++) {
      w[k] = q * gaussian(rnd);
    }
    final FastFourierTransformer fft = new FastFourierTransformer(DftNormalization.STANDARD);
    final Complex[] hf = fft.transform(h, TransformType.FORWARD);
    final Complex[] wf = fft.transform(w, TransformType.FORWARD);
    for (int i = 0; i < size; i++) {
      hf[i] = hf[i].multiply(wf[i]);
    }
    final Complex[] conv = fft.transform(hf, TransformType.INVERSE);
    final double[] out = new double[n];
    for (int k = 0; k < n; k++) {
      out[k] = conv[k].getReal();
    }
    return out;
  }
}
