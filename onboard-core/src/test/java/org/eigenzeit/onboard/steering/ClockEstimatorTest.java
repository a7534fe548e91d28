package org.eigenzeit.onboard.steering;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The Kalman filter is consistent: in steady state with white measurement noise, the normalised
 * estimation error squared (NEES) of the phase averages 1 within its chi-square bounds (Bar-Shalom,
 * Li and Kirubarajan 2001, "Estimation with Applications to Tracking and Navigation", section
 * 5.4.2), and the normalised innovations are unit-variance.
 */
class ClockEstimatorTest {
  @Test
  void steadyStateErrorMatchesPredictedCovariance() {
    final double sWfm = 3e-12;
    final double sRw = 1e-15;
    final double sRr = 1e-19;
    final double sigmaMeas = 5e-9;
    final ClockTruth truth = new ClockTruth(sWfm, sRw, sRr, 1e-11, 1e-17, 12345L);
    final ClockEstimator est = new ClockEstimator();
    est.configure(sWfm, sRw, sRr);
    est.initialize(0, 1e-6, 1e-9, 1e-14, true);
    final Random noise = new Random(777L);
    final double tau = 10.0;
    double neesSum = 0;
    double nisSum = 0;
    int n = 0;
    for (int k = 0; k < 40_000; k++) {
      truth.step(tau, 0);
      est.predict(tau, 0);
      final double z = truth.phase + sigmaMeas * noise.nextGaussian();
      est.innovate(z, sigmaMeas * sigmaMeas);
      if (k >= 5000) { // past the transient
        final double e = truth.phase - est.phaseS();
        neesSum += e * e / est.covariance(0, 0);
        nisSum += est.lastInnovationS() * est.lastInnovationS() / est.lastInnovationVariance();
        n++;
      }
      est.update(sigmaMeas * sigmaMeas);
    }
    final double nees = neesSum / n;
    final double nis = nisSum / n;
    System.out.printf("Kalman consistency over %d steps: mean phase NEES %.3f, mean NIS %.3f%n", n, nees, nis);
    System.out.printf("evidence: servo.nees_minus_one = %.4f%n", Math.abs(nees - 1));
    System.out.printf("evidence: servo.nis_minus_one = %.4f%n", Math.abs(nis - 1));
    // Samples are correlated in steady state; a generous 3-sigma band for an effective sample of
    // about n/50 independent terms: 1 +- 3 sqrt(2 * 50 / n).
    final double band = 3 * Math.sqrt(2.0 * 50 / n);
    assertEquals(1.0, nees, band);
    assertEquals(1.0, nis, 3 * Math.sqrt(2.0 / n) * 3);
    assertTrue(est.isHealthy());
  }
}
