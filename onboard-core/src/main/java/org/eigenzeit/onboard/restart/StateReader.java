package org.eigenzeit.onboard.restart;

import org.eigenzeit.onboard.status.Status;

/**
 * Big-endian reader matching {@link StateWriter}; a read past the end latches {@link
 * Status#BUFFER_TOO_SMALL} and returns zeros. No allocation. Mutable; one owner.
 */
public final class StateReader {
  private byte[] buffer = new byte[0];
  private int position;
  private int limit;
  private int status = Status.OK;

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
  }

  private boolean available(int n) {
    if (status != Status.OK || position + n > limit) {
      status = Status.BUFFER_TOO_SMALL;
      return false;
    }
    return true;
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
   * Returns the next boolean (any nonzero word is true).
   *
   * @return the next boolean (any nonzero word is true)
   */
  public boolean getBoolean() {
    return getInt() != 0;
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
   * Returns {@link Status#OK} or {@link Status#BUFFER_TOO_SMALL}.
   *
   * @return {@link Status#OK} or {@link Status#BUFFER_TOO_SMALL}
   */
  public int status() {
    return status;
  }
}
