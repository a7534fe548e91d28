package org.eigenzeit.onboard.steering;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The covariance prediction against the closed-form process noise of the three-state clock model
 * (Zucca and Tavella 2005, IEEE Trans. UFFC 52(2):289-296, with q1 = sigma_wfm^2, q2 = 3
 * sigma_rw^2, q3 = 20 sigma_rr^2 from the Allan-variance relations) and the transition F P F^T,
 * evaluated here with plain matrices. The sequence changes the step and each noise density in
 * turn, so a stale cached noise term would show.
 */
class ProcessNoiseTest {
  private static double[][] q(double sW, double sRw, double sRr, double t) {
    final double q1 = sW * sW;
    final double q2 = 3 * sRw * sRw;
    final double q3 = 20 * sRr * sRr;
    final double q11 = q1 * t + q2 * Math.pow(t, 3) / 3 + q3 * Math.pow(t, 5) / 20;
    final double q12 = q2 * t * t / 2 + q3 * Math.pow(t, 4) / 8;
    final double q13 = q3 * Math.pow(t, 3) / 6;
    final double q22 = q2 * t + q3 * Math.pow(t, 3) / 3;
    final double q23 = q3 * t * t / 2;
    return new double[][] {{q11, q12, q13}, {q12, q22, q23}, {q13, q23, q3 * t}};
  }

  private static double[][] predict(double[][] p, double[][] qm, double t) {
    final double[][] f = {{1, t, t * t / 2}, {0, 1, t}, {0, 0, 1}};
    final double[][] out = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        double s = qm[i][j];
        for (int k = 0; k < 3; k++) {
          for (int l = 0; l < 3; l++) {
            s += f[i][k] * p[k][l] * f[j][l];
          }
        }
        out[i][j] = s;
      }
    }
    return out;
  }

  private static void same(double[][] want, ClockEstimator est, String step) {
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        assertEquals(want[i][j], est.covariance(i, j), 1e-12 * Math.abs(want[i][j]) + 1e-40,
            step + " P[" + i + "][" + j + "]");
      }
    }
  }

  @Test
  void predictionFollowsTheClosedFormAcrossStepAndNoiseChanges() {
    final ClockEstimator est = new ClockEstimator();
    double[] sigma = {3e-12, 1e-15, 1e-19};
    est.configure(sigma[0], sigma[1], sigma[2]);
    est.initialize(0, 1e-8, 1e-11, 1e-17, true);
    double[][] p = {{1e-16, 0, 0}, {0, 1e-22, 0}, {0, 0, 1e-34}};
    final double[] steps = {1, 1, 2, 2, 0.5, 0.5, 10, 10, 10, 10};
    final double[][] sigmas = {null, {5e-12, 1e-15, 1e-19}, null, {5e-12, 4e-15, 1e-19}, null,
        {5e-12, 4e-15, 3e-19}, null, {1e-12, 4e-15, 3e-19}, null, null};
    for (int k = 0; k < steps.length; k++) {
      if (sigmas[k] != null) {
        sigma = sigmas[k];
        est.configure(sigma[0], sigma[1], sigma[2]);
      }
      est.predict(steps[k], 0.0);
      p = predict(p, q(sigma[0], sigma[1], sigma[2], steps[k]), steps[k]);
      same(p, est, "step " + k);
    }
    // From zero covariance one step gives Q itself, term by term.
    est.initialize(0, 0, 0, 0, true);
    est.predict(100, 0.0);
    same(q(sigma[0], sigma[1], sigma[2], 100), est, "Q(100 s)");
  }
}
