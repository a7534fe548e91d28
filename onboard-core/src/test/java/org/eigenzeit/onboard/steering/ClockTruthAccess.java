package org.eigenzeit.onboard.steering;

/** Test helper: public access to {@link ClockTruth} for tests in other packages. */
public final class ClockTruthAccess {
  private final ClockTruth truth;

  /**
   * Creates the clock.
   *
   * @param sWfm white FM sigma_y(1 s)
   * @param sRw random-walk FM sigma_y(1 s)
   * @param sRr random-run sigma_y(1 s)
   * @param freq0 initial frequency error
   * @param drift0 initial drift, 1/s
   * @param seed random seed
   */
  public ClockTruthAccess(double sWfm, double sRw, double sRr, double freq0, double drift0, long seed) {
    truth = new ClockTruth(sWfm, sRw, sRr, freq0, drift0, seed);
  }

  /** @param p initial phase, s */
  public void setPhase(double p) {
    truth.phase = p;
  }

  /**
   * Advances.
   *
   * @param tau seconds
   * @param u steering applied to the physical oscillator (0 when steering is in software)
   */
  public void step(double tau, double u) {
    truth.step(tau, u);
  }

  /** @return the free-running phase, s */
  public double phase() {
    return truth.phase;
  }
}
