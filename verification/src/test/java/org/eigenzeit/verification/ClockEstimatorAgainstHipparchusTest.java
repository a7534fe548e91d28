package org.eigenzeit.verification;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.hipparchus.filtering.kalman.Measurement;
import org.hipparchus.filtering.kalman.ProcessEstimate;
import org.hipparchus.filtering.kalman.linear.LinearEvolution;
import org.hipparchus.filtering.kalman.linear.LinearKalmanFilter;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.QRDecomposer;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.junit.jupiter.api.Test;

/**
 * The onboard clock estimator against an independent Kalman filter: Hipparchus 4
 * {@code LinearKalmanFilter} (general-purpose library, test scope) given the same three-state clock
 * model (phase, frequency, drift; transition [[1, tau, tau^2/2], [0, 1, tau], [0, 0, 1]], control
 * u over tau, the process noise of Zucca and Tavella 2005 written out here from the paper), the
 * same phase measurements and the same steering commands. Steps of 1 to 30 s, noise densities
 * changed midway. States and covariances must agree step by step to rounding.
 */
class ClockEstimatorAgainstHipparchusTest {
  /** 10x the measured worst state difference (3.0e-12), in units of the filter's own sigma. */
  private static final double STATE_BOUND_SIGMA = 3e-11;
  /** 10x the measured worst relative difference of the covariance diagonal (9.9e-15). */
  private static final double COVARIANCE_BOUND_REL = 1e-13;

  private record Phase(double time, RealVector value, RealMatrix covariance) implements Measurement {
    @Override
    public double getTime() {
      return time;
    }

    @Override
    public RealVector getValue() {
      return value;
    }

    @Override
    public RealMatrix getCovariance() {
      return covariance;
    }
  }

  /** Process noise of the three-state clock model (Zucca and Tavella 2005, eq. 27). */
  private static RealMatrix q(double sWfm, double sRw, double sRr, double t) {
    final double q1 = sWfm * sWfm;
    final double q2 = 3 * sRw * sRw;
    final double q3 = 20 * sRr * sRr;
    return MatrixUtils.createRealMatrix(new double[][] {
      {q1 * t + q2 * t * t * t / 3 + q3 * Math.pow(t, 5) / 20, q2 * t * t / 2 + q3 * Math.pow(t, 4) / 8, q3 * t * t * t / 6},
      {q2 * t * t / 2 + q3 * Math.pow(t, 4) / 8, q2 * t + q3 * t * t * t / 3, q3 * t * t / 2},
      {q3 * t * t * t / 6, q3 * t * t / 2, q3 * t}});
  }

  @Test
  void statesAndCovariancesAgreeWithHipparchusLinearKalmanFilter() {
    final double[] sigma = {3e-12, 1e-15, 1e-19};
    final double sigmaMeas = 5e-9;
    final int steps = 2000;
    final double[] taus = new double[steps];
    final double[] commands = new double[steps];
    final double[] z = new double[steps];
    final SplittableRandom rnd = new SplittableRandom(1401L);
    double truePhase = 2e-7;
    double trueFreq = 3e-11;
    final double trueDrift = 2e-16;
    for (int k = 0; k < steps; k++) {
      taus[k] = 1 + rnd.nextInt(30);
      commands[k] = (rnd.nextDouble() - 0.5) * 1e-10;
      truePhase += taus[k] * (trueFreq + commands[k]) + 0.5 * taus[k] * taus[k] * trueDrift;
      trueFreq += taus[k] * trueDrift;
      z[k] = truePhase + sigmaMeas * gaussian(rnd);
    }
    final ClockEstimator ours = new ClockEstimator();
    ours.configure(sigma[0], sigma[1], sigma[2]);
    ours.initialize(1e-7, 1e-6, 1e-9, 1e-14, true);
    final double[] time = new double[steps + 1];
    for (int k = 0; k < steps; k++) {
      time[k + 1] = time[k] + taus[k];
    }
    final double[][] densities = {sigma.clone()};
    final LinearKalmanFilter<Phase> theirs = new LinearKalmanFilter<>(new QRDecomposer(1e-60), m -> {
      final int k = (int) Math.round(m.getTime());
      final double t = taus[k];
      final double[] s = densities[0];
      return new LinearEvolution(MatrixUtils.createRealMatrix(new double[][] {{1, t, t * t / 2}, {0, 1, t}, {0, 0, 1}}),
          MatrixUtils.createColumnRealMatrix(new double[] {t, 0, 0}), MatrixUtils.createRealVector(new double[] {commands[k]}),
          q(s[0], s[1], s[2], t), MatrixUtils.createRowRealMatrix(new double[] {1, 0, 0}));
    }, new ProcessEstimate(-1, MatrixUtils.createRealVector(new double[] {1e-7, 0, 0}),
        MatrixUtils.createRealDiagonalMatrix(new double[] {1e-12, 1e-18, 1e-28})));
    double worstState = 0;
    double worstCov = 0;
    final double r = sigmaMeas * sigmaMeas;
    for (int k = 0; k < steps; k++) {
      if (k == steps / 2) { // new noise densities halfway: both filters must follow
        densities[0] = new double[] {1e-12, 4e-15, 3e-19};
        ours.configure(densities[0][0], densities[0][1], densities[0][2]);
      }
      ours.predict(taus[k], commands[k]);
      ours.innovate(z[k], r);
      ours.update(r);
      // The measurement's "time" carries the step index for the process model above.
      final ProcessEstimate e = theirs.estimationStep(new Phase(k, MatrixUtils.createRealVector(new double[] {z[k]}),
          MatrixUtils.createRealMatrix(new double[][] {{r}})));
      final double[] mine = {ours.phaseS(), ours.frequency(), ours.driftPerS()};
      for (int i = 0; i < 3; i++) {
        final double p = e.getCovariance().getEntry(i, i);
        worstState = Math.max(worstState, Math.abs(mine[i] - e.getState().getEntry(i)) / Math.sqrt(p));
        worstCov = Math.max(worstCov, Math.abs(ours.covariance(i, i) / p - 1));
      }
    }
    System.out.printf("clock estimator vs Hipparchus LinearKalmanFilter, %d steps: worst state %.2e sigma, covariance %.2e%n",
        steps, worstState, worstCov);
    System.out.printf("evidence: servo.estimator_vs_hipparchus_sigma = %.3e bound %.1e%n", worstState, STATE_BOUND_SIGMA);
    System.out.printf("evidence: servo.estimator_covariance_vs_hipparchus_rel = %.3e bound %.1e%n", worstCov,
        COVARIANCE_BOUND_REL);
    assertTrue(worstState < STATE_BOUND_SIGMA, "state differs by " + worstState + " sigma");
    assertTrue(worstCov < COVARIANCE_BOUND_REL, "covariance differs by " + worstCov);
  }

  private static double gaussian(SplittableRandom rnd) {
    // Box-Muller from the fixed-seed generator (deterministic).
    return Math.sqrt(-2 * Math.log(1 - rnd.nextDouble())) * Math.cos(2 * Math.PI * rnd.nextDouble());
  }
}
