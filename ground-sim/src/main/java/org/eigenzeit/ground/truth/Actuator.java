package org.eigenzeit.ground.truth;

/**
 * The synthesizer that applies the core's frequency commands to the oscillator's counter: with a
 * delay of whole cycles and a hardware quantum (for example a DDS tuning-word LSB). Integrates the
 * applied frequency into the steering phase that the counter then contains. Mutable; one per run.
 */
public final class Actuator {
  private final double quantum;
  private final double[] pipeline;
  private int head;
  private double phaseS;
  private double applied;

  /**
   * Creates an actuator.
   *
   * @param quantum hardware frequency resolution (0 for none)
   * @param delayCycles cycles between a command and its effect (0 or more)
   */
  public Actuator(double quantum, int delayCycles) {
    if (!(quantum >= 0) || delayCycles < 0 || delayCycles > 1000) {
      throw new IllegalArgumentException("actuator quantum must be >= 0 and delay 0..1000 cycles");
    }
    this.quantum = quantum;
    this.pipeline = new double[delayCycles + 1];
  }

  /**
   * Advances one cycle: the frequency applied during the interval is the command given
   * {@code delayCycles} cycles earlier, quantised.
   *
   * @param command the command issued at the start of this interval
   * @param dtS interval, s
   */
  public void step(double command, double dtS) {
    pipeline[head] = command;
    head = (head + 1) % pipeline.length;
    final double due = pipeline[head];
    applied = quantum > 0 ? Math.rint(due / quantum) * quantum : due;
    phaseS += applied * dtS;
  }

  /** @return the steering phase the counter contains, s */
  public double phaseS() {
    return phaseS;
  }

  /** @return the frequency applied during the last interval */
  public double applied() {
    return applied;
  }
}
