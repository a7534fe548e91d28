package org.eigenzeit.onboard.restart;

import org.eigenzeit.onboard.status.Status;

/**
 * Big-endian reader matching {@link StateWriter}; a read past the end latches {@link
 * Status#BUFFER_TOO_SMALL} and returns zeros. The checked readers ({@link #getFinite}, {@link
 * #getDoubleIn}, {@link #getIntIn}, {@link #getLongIn}, {@link #getFlag}) also
 * latch {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE} at the first value outside its
 * range, so a restore reads every field once and asks {@link #status()} at the end; {@link
 * #failedAt()} gives the byte position of the first refused value. No allocation. Mutable; one
 * owner.
 */
public final class StateReader {
  private byte[] buffer = new byte[0];
  private int position;
  private int limit;
  private int status = Status.OK;
  private int failedAt = -1;

  /** Creates a reader with no buffer (call {@link #reset} before use). */
  public StateReader() {
    // empty
  }

  /**
   * Starts reading.
   *
   * @param source the buffer
   * @param offset first byte
   * @param length bytes available
   */
  public void reset(byte[] source, int offset, int length) {
    buffer = source;
    position = offset;
    limit = offset + length;
    status = (offset < 0 || length < 0 || limit > source.length) ? Status.BUFFER_TOO_SMALL : Status.OK;
    failedAt = status == Status.OK ? -1 : offset;
  }

  private boolean available(int n) {
    if (status == Status.BUFFER_TOO_SMALL || position + n > limit) {
      latch(Status.BUFFER_TOO_SMALL, position);
      return false;
    }
    return true;
  }

  /** Latches the first refusal (a later one does not overwrite it). */
  private void latch(int code, int at) {
    if (status == Status.OK) {
      status = code;
      failedAt = at;
    } else if (code == Status.BUFFER_TOO_SMALL) {
      status = code; // an overrun outranks a range refusal: the layout itself is wrong
    }
  }

  /**
   * Returns the next 64-bit integer (0 after an overrun).
   *
   * @return the next 64-bit integer (0 after an overrun)
   */
  public long getLong() {
    if (!available(8)) {
      return 0L;
    }
    long v = 0;
    for (int i = 0; i < 8; i++) {
      v = (v << 8) | (buffer[position++] & 0xFFL);
    }
    return v;
  }

  /**
   * Returns the next 32-bit integer (0 after an overrun).
   *
   * @return the next 32-bit integer (0 after an overrun)
   */
  public int getInt() {
    if (!available(4)) {
      return 0;
    }
    int v = 0;
    for (int i = 0; i < 4; i++) {
      v = (v << 8) | (buffer[position++] & 0xFF);
    }
    return v;
  }

  /**
   * Returns the next double.
   *
   * @return the next double
   */
  public double getDouble() {
    return Double.longBitsToDouble(getLong());
  }

  /**
   * The next double, which must be finite.
   *
   * @return the value (latches {@link Status#NOT_FINITE} when it is not finite)
   */
  public double getFinite() {
    final int at = position;
    final double v = getDouble();
    if (!Double.isFinite(v)) {
      latch(Status.NOT_FINITE, at);
    }
    return v;
  }

  /**
   * The next double, which must be finite and within [min, max].
   *
   * @param min smallest value accepted
   * @param max largest value accepted
   * @return the value (latches {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE})
   */
  public double getDoubleIn(double min, double max) {
    final int at = position;
    final double v = getFinite();
    if (!(v >= min && v <= max)) {
      latch(Status.OUT_OF_RANGE, at);
    }
    return v;
  }

  /**
   * The next 32-bit integer, which must lie within [min, max].
   *
   * @param min smallest value accepted
   * @param max largest value accepted
   * @return the value (latches {@link Status#OUT_OF_RANGE} outside the range)
   */
  public int getIntIn(int min, int max) {
    final int at = position;
    final int v = getInt();
    if (v < min || v > max) {
      latch(Status.OUT_OF_RANGE, at);
    }
    return v;
  }

  /**
   * The next 64-bit integer, which must lie within [min, max].
   *
   * @param min smallest value accepted
   * @param max largest value accepted
   * @return the value (latches {@link Status#OUT_OF_RANGE} outside the range)
   */
  public long getLongIn(long min, long max) {
    final int at = position;
    final long v = getLong();
    if (v < min || v > max) {
      latch(Status.OUT_OF_RANGE, at);
    }
    return v;
  }

  /**
   * The next boolean written by {@link StateWriter#putBoolean}: exactly 0 or 1.
   *
   * @return the value (latches {@link Status#OUT_OF_RANGE} for any other word)
   */
  public boolean getFlag() {
    return getIntIn(0, 1) == 1;
  }

  /**
   * Refuses the state for a rule across several fields (latches {@link Status#OUT_OF_RANGE}).
   *
   * @param at byte position of the first field of the rule
   */
  public void refuse(int at) {
    latch(Status.OUT_OF_RANGE, at);
  }

  /**
   * Position of the first refused value, or -1 when none was refused.
   *
   * @return the byte position
   */
  public int failedAt() {
    return failedAt;
  }

  /**
   * Returns the next position to read.
   *
   * @return the next position to read
   */
  public int position() {
    return position;
  }

  /**
   * The first refusal: {@link Status#OK}, {@link Status#BUFFER_TOO_SMALL} (overrun; it outranks a
   * value refusal), {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE}.
   *
   * @return the status
   */
  public int status() {
    return status;
  }
}
