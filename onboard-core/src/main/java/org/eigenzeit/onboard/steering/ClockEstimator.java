package org.eigenzeit.onboard.steering;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;

/**
 * Kalman filter of the steered clock's phase error x (s), the free oscillator's frequency error y
 * and drift d (1/s), all against the target scale after the relativistic model is removed:
 *
 * <pre>
 *   x' = x + tau (y + u) + tau^2/2 d,   y' = y + tau d,   d' = d        (u: applied steering)
 *   z  = x + v,  v ~ N(0, R_source)
 *   Q(tau) = [ q1 tau + q2 tau^3/3 + q3 tau^5/20,  q2 tau^2/2 + q3 tau^4/8,  q3 tau^3/6 ]
 *            [ sym,                               q2 tau + q3 tau^3/3,      q3 tau^2/2 ]
 *            [ sym,                               sym,                      q3 tau     ]
 * </pre>
 *
 * The process noise of the three-state clock model follows Zucca and Tavella (2005), "The clock
 * model and its relationship with the Allan and related variances", IEEE Trans. UFFC 52(2):289-296:
 * white FM sigma_y^2(tau) = q1/tau, random-walk FM q2 tau/3, random run q3 tau^3/20. Flicker FM has
 * no finite-state model; a mission folds it into q1 and q2 at the loop's time constant.
 *
 * <p>The update uses the Joseph form, P = (I - KH) P (I - KH)^T + K R K^T, which keeps P
 * symmetric and positive under rounding. Innovation gating: |nu| &gt; g sqrt(S) is an outlier.
 *
 * <p>Mutable; one owner. No allocation after construction.
 */
public final class ClockEstimator {
  private final double[] x = new double[3];
  private final double[] p = new double[9];
  private final double[] tmp = new double[9];
  private double q1;
  private double q2;
  private double q3;
  /** Cached process-noise increments and the step they were made for (NaN: none; configure() clears it). */
  private double qTau = Double.NaN;
  private double qPhase;
  private double qPhaseFreq;
  private double qPhaseDrift;
  private double qFreq;
  private double qFreqDrift;
  private double qDrift;
  private double lastInnovation;
  private double lastInnovationVariance;

  /** Creates an estimator with zero state. */
  public ClockEstimator() {
    // zero
  }

  /**
   * Sets the noise model from Allan-deviation parameters at 1 s.
   *
   * @param sigmaWhiteFm sigma_y(1 s) of white FM
   * @param sigmaRandomWalkFm sigma_y(1 s) of random-walk FM
   * @param sigmaRandomRun sigma_y(1 s) of random run
   */
  public void configure(double sigmaWhiteFm, double sigmaRandomWalkFm, double sigmaRandomRun) {
    q1 = sigmaWhiteFm * sigmaWhiteFm;
    q2 = 3.0 * sigmaRandomWalkFm * sigmaRandomWalkFm;
    q3 = 20.0 * sigmaRandomRun * sigmaRandomRun;
    qTau = Double.NaN; // new densities: the cached process noise is stale
  }

  /**
   * Starts from a measured phase, keeping the frequency and drift estimates.
   *
   * @param phaseS initial phase, s
   * @param sigmaPhaseS its uncertainty, s
   * @param sigmaFrequency frequency uncertainty
   * @param sigmaDrift drift uncertainty, 1/s
   * @param resetFrequency whether to zero the frequency and drift estimates too
   */
  public void initialize(double phaseS, double sigmaPhaseS, double sigmaFrequency, double sigmaDrift,
      boolean resetFrequency) {
    x[0] = phaseS;
    if (resetFrequency) {
      x[1] = 0.0;
      x[2] = 0.0;
    }
    for (int i = 0; i < 9; i++) {
      p[i] = 0.0;
    }
    p[0] = sigmaPhaseS * sigmaPhaseS;
    p[4] = sigmaFrequency * sigmaFrequency;
    p[8] = sigmaDrift * sigmaDrift;
  }

  /**
   * Propagates over tau seconds with the applied steering u.
   *
   * @param tau interval, s (non-negative)
   * @param u fractional frequency correction applied over the interval
   */
  public void predict(double tau, double u) {
    if (!(tau > 0)) {
      return;
    }
    final double t2 = tau * tau;
    x[0] += tau * (x[1] + u) + 0.5 * t2 * x[2];
    x[1] += tau * x[2];
    // P = F P F^T with F = [[1, tau, tau^2/2], [0, 1, tau], [0, 0, 1]], written out for the
    // symmetric P (the same operations, in the same order, as the two matrix products).
    final double h = 0.5 * t2;
    final double a = p[0];
    final double b = p[1];
    final double c = p[2];
    final double d = p[4];
    final double e = p[5];
    final double f = p[8];
    final double r0 = a + tau * b + h * c;
    final double r1 = b + tau * d + h * e;
    final double r2 = c + tau * e + h * f;
    final double s1 = d + tau * e;
    final double s2 = e + tau * f;
    if (Double.compare(tau, qTau) != 0) {
      // Process noise of the step (Zucca and Tavella 2005); steps are usually equal, so cache it.
      final double t3 = t2 * tau;
      final double t4 = t3 * tau;
      final double t5 = t4 * tau;
      qPhase = q1 * tau + q2 * t3 / 3.0 + q3 * t5 / 20.0;
      qPhaseFreq = q2 * t2 / 2.0 + q3 * t4 / 8.0;
      qPhaseDrift = q3 * t3 / 6.0;
      qFreq = q2 * tau + q3 * t3 / 3.0;
      qFreqDrift = q3 * t2 / 2.0;
      qDrift = q3 * tau;
      qTau = tau;
    }
    p[0] = r0 + tau * r1 + h * r2 + qPhase;
    p[1] = r1 + tau * r2 + qPhaseFreq;
    p[2] = r2 + qPhaseDrift;
    p[4] = s1 + tau * s2 + qFreq;
    p[5] = s2 + qFreqDrift;
    p[8] = f + qDrift;
    p[3] = p[1];
    p[6] = p[2];
    p[7] = p[5];
  }

  /**
   * Computes the innovation of a phase measurement without updating.
   *
   * @param z measured phase, s
   * @param r measurement variance, s^2
   */
  public void innovate(double z, double r) {
    lastInnovation = z - x[0];
    lastInnovationVariance = p[0] + r;
  }

  /**
   * Updates with the measurement last passed to {@link #innovate} (Joseph form).
   *
   * @param r measurement variance, s^2
   */
  public void update(double r) {
    final double invS = 1.0 / lastInnovationVariance;
    final double k0 = p[0] * invS;
    final double k1 = p[3] * invS;
    final double k2 = p[6] * invS;
    final double nu = lastInnovation;
    x[0] += k0 * nu;
    x[1] += k1 * nu;
    x[2] += k2 * nu;
    // A = I - K H, H = [1 0 0]: A = [[1-k0,0,0],[-k1,1,0],[-k2,0,1]]; P = A P A^T + K R K^T
    for (int c = 0; c < 3; c++) {
      tmp[c] = (1 - k0) * p[c];
      tmp[3 + c] = -k1 * p[c] + p[3 + c];
      tmp[6 + c] = -k2 * p[c] + p[6 + c];
    }
    for (int row = 0; row < 3; row++) {
      final double a0 = tmp[3 * row];
      p[3 * row] = a0 * (1 - k0);
      p[3 * row + 1] = -a0 * k1 + tmp[3 * row + 1];
      p[3 * row + 2] = -a0 * k2 + tmp[3 * row + 2];
    }
    p[0] += k0 * k0 * r;
    p[1] += k0 * k1 * r;
    p[2] += k0 * k2 * r;
    p[3] += k1 * k0 * r;
    p[4] += k1 * k1 * r;
    p[5] += k1 * k2 * r;
    p[6] += k2 * k0 * r;
    p[7] += k2 * k1 * r;
    p[8] += k2 * k2 * r;
    symmetrize();
  }

  private void symmetrize() {
    p[1] = p[3] = 0.5 * (p[1] + p[3]);
    p[2] = p[6] = 0.5 * (p[2] + p[6]);
    p[5] = p[7] = 0.5 * (p[5] + p[7]);
  }

  /**
   * Shifts the phase estimate by a known step (a phase step commanded to the clock).
   *
   * @param stepS the step, s
   */
  public void shiftPhase(double stepS) {
    x[0] += stepS;
  }

  /**
   * Returns whether the state and covariance are finite with positive variances.
   *
   * @return whether the state and covariance are finite with positive variances
   */
  public boolean isHealthy() {
    for (int i = 0; i < 3; i++) {
      if (!Double.isFinite(x[i])) {
        return false;
      }
    }
    for (int i = 0; i < 9; i++) {
      if (!Double.isFinite(p[i])) {
        return false;
      }
    }
    return p[0] > 0 && p[4] > 0 && p[8] >= 0;
  }

  /**
   * Returns the phase estimate, s.
   *
   * @return the phase estimate, s
   */
  public double phaseS() {
    return x[0];
  }

  /**
   * Returns the frequency estimate.
   *
   * @return the frequency estimate
   */
  public double frequency() {
    return x[1];
  }

  /**
   * Returns the drift estimate, 1/s.
   *
   * @return the drift estimate, 1/s
   */
  public double driftPerS() {
    return x[2];
  }

  /**
   * One covariance element.
   *
   * @param row 0..2
   * @param col 0..2
   * @return P[row][col]
   */
  public double covariance(int row, int col) {
    return p[3 * row + col];
  }

  /**
   * Returns the last innovation, s.
   *
   * @return the last innovation, s
   */
  public double lastInnovationS() {
    return lastInnovation;
  }

  /**
   * Returns the last innovation variance, s^2.
   *
   * @return the last innovation variance, s^2
   */
  public double lastInnovationVariance() {
    return lastInnovationVariance;
  }

  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 14 * 8;

  /**
   * Writes the estimate, its covariance and the last innovation.
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    for (int i = 0; i < 3; i++) {
      w.putDouble(x[i]);
    }
    for (int i = 0; i < 9; i++) {
      w.putDouble(p[i]);
    }
    w.putDouble(lastInnovation);
    w.putDouble(lastInnovationVariance);
  }

  /**
   * Restores the state: every value finite, the covariance symmetric with non-negative diagonal,
   * the innovation variance not negative. The process-noise cache is kept (it depends only on the
   * table and the step).
   *
   * @param r the reader (refusals latch in it)
   */
  public void restore(StateReader r) {
    for (int i = 0; i < 3; i++) {
      x[i] = r.getFinite();
    }
    final int covarianceAt = r.position();
    for (int i = 0; i < 9; i++) {
      p[i] = r.getFinite();
    }
    if (!(p[0] >= 0 && p[4] >= 0 && p[8] >= 0) || Double.compare(p[1], p[3]) != 0
        || Double.compare(p[2], p[6]) != 0 || Double.compare(p[5], p[7]) != 0) {
      r.refuse(covarianceAt);
    }
    lastInnovation = r.getFinite();
    lastInnovationVariance = r.getDoubleIn(0.0, Double.MAX_VALUE);
  }
}
