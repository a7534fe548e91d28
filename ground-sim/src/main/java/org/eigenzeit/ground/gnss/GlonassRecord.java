package org.eigenzeit.ground.gnss;

/**
 * One GLONASS broadcast record of a RINEX 2 GLONASS navigation file (Gurtner and Estey 2007,
 * Table A11): the reference epoch t_b (UTC in the file, kept here as GPS time), the clock terms
 * -tau_n and gamma_n, the message frame time, and the PZ-90 state vector with the luni-solar
 * accelerations, health, frequency number and age of the operational information. Values are
 * not judged here; {@link BroadcastCheck} does that. Immutable.
 *
 * @param slot orbital slot number
 * @param source file name
 * @param line line of the record's first line
 * @param tbGpsS reference epoch, GPS seconds since the GPS epoch
 * @param minusTauN SV clock bias -tau_n, s
 * @param gammaN relative frequency bias gamma_n
 * @param frameTimeS message frame time t_k, s (of the UTC day or week, as written)
 * @param positionM PZ-90 position, m
 * @param velocityMPerS PZ-90 velocity, m/s
 * @param accelerationMPerS2 luni-solar acceleration, m/s^2
 * @param health health flag as written (0 = healthy)
 * @param frequencyNumber frequency channel number as written
 * @param ageDays age of the operational information, days
 */
public record GlonassRecord(int slot, String source, int line, double tbGpsS, double minusTauN, double gammaN,
    double frameTimeS, double[] positionM, double[] velocityMPerS, double[] accelerationMPerS2, double health,
    double frequencyNumber, double ageDays) {
  /** Defensive copies. */
  public GlonassRecord {
    positionM = positionM.clone();
    velocityMPerS = velocityMPerS.clone();
    accelerationMPerS2 = accelerationMPerS2.clone();
  }

  @Override
  public double[] positionM() {
    return positionM.clone();
  }

  @Override
  public double[] velocityMPerS() {
    return velocityMPerS.clone();
  }

  @Override
  public double[] accelerationMPerS2() {
    return accelerationMPerS2.clone();
  }

  /** @return identifier such as R13 */
  public String id() {
    return Constellation.GLONASS.id(slot);
  }

  /** @return "file:line" */
  public String where() {
    return source + ":" + line;
  }

  /**
   * Whether another record carries the same state vector at the same epoch.
   *
   * @param o the other record
   * @return true when equal
   */
  public boolean sameState(GlonassRecord o) {
    return Double.compare(tbGpsS, o.tbGpsS) == 0 && java.util.Arrays.equals(positionM, o.positionM)
        && java.util.Arrays.equals(velocityMPerS, o.velocityMPerS)
        && java.util.Arrays.equals(accelerationMPerS2, o.accelerationMPerS2);
  }
}
