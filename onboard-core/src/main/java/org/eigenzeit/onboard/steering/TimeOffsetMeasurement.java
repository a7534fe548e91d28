package org.eigenzeit.onboard.steering;

import org.eigenzeit.onboard.time.SplitTime;

/**
 * Caller-owned holder of one measured time offset: the corrected onboard time minus the reference
 * time scale, as a timing receiver, a ground time transfer or a crosslink reports it.
 *
 * <p>Mutable; one owner; reused every cycle.
 */
public final class TimeOffsetMeasurement {
  /** Number of measurement sources the parameter table describes. */
  public static final int SOURCES = 4;

  private final SplitTime epoch = new SplitTime();
  private int source;
  private double offsetS;
  private boolean valid;

  /** Creates an empty, invalid measurement. */
  public TimeOffsetMeasurement() {
    // empty
  }

  /**
   * Sets the measurement.
   *
   * @param epochCorrected the epoch on the corrected onboard time scale (copied)
   * @param sourceIndex 0 to {@link #SOURCES} - 1 (its noise is in the parameter table)
   * @param offsetSeconds corrected onboard time minus reference time, s
   * @param validFlag the producer's validity flag
   */
  public void set(SplitTime epochCorrected, int sourceIndex, double offsetSeconds, boolean validFlag) {
    epoch.setTo(epochCorrected);
    source = sourceIndex;
    offsetS = offsetSeconds;
    valid = validFlag;
  }

  /**
   * Copies the epoch.
   *
   * @param out receives the epoch
   */
  public void epoch(SplitTime out) {
    out.setTo(epoch);
  }

  SplitTime epochRef() {
    return epoch;
  }

  /**
   * Returns the source index.
   *
   * @return the source index
   */
  public int source() {
    return source;
  }

  /**
   * Returns the offset, s.
   *
   * @return the offset, s
   */
  public double offsetS() {
    return offsetS;
  }

  /**
   * Returns the producer's validity flag.
   *
   * @return the producer's validity flag
   */
  public boolean valid() {
    return valid;
  }
}
