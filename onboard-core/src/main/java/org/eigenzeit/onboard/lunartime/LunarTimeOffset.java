package org.eigenzeit.onboard.lunartime;

/**
 * Caller-owned result of {@link LunarTimeTable#evaluate}: TL - TT for an event at a clock.
 *
 * <p>Mutable, one owner; written only by a successful evaluation. No allocation.
 */
public final class LunarTimeOffset {
  double tlMinusTtS;
  double centreTlMinusTtS;
  double positionTermS;
  double rate;
  double centreRate;
  long tableId;

  /** Creates an empty holder (all zero). */
  public LunarTimeOffset() {
    // zero
  }

  /**
   * Returns TL - TT for the event at the clock: the centre value plus the position term, s.
   *
   * @return TL - TT at the clock, s
   */
  public double tlMinusTtS() {
    return tlMinusTtS;
  }

  /**
   * Returns TL - TT for an event at the Moon's centre, s.
   *
   * @return TL - TT at the selenocentre, s
   */
  public double centreTlMinusTtS() {
    return centreTlMinusTtS;
  }

  /**
   * Returns the position term -(v_M - v_E) . r / c^2, s (r the clock's selenocentric position).
   *
   * @return the position term, s
   */
  public double positionTermS() {
    return positionTermS;
  }

  /**
   * Returns d(TL - TT)/dTT for the moving clock (centre rate plus the position term's rate).
   *
   * @return the rate at the clock
   */
  public double rate() {
    return rate;
  }

  /**
   * Returns d(TL - TT)/dTT at the Moon's centre.
   *
   * @return the rate at the selenocentre
   */
  public double centreRate() {
    return centreRate;
  }

  /**
   * Returns the identifier of the table that produced the values.
   *
   * @return the table identifier (unsigned 32-bit value)
   */
  public long tableId() {
    return tableId;
  }
}
