package org.eigenzeit.onboard.restart;

import org.eigenzeit.onboard.status.Status;

/**
 * Big-endian writer of primitive values into a caller-owned buffer, with a bounds check that
 * latches: once a write would overflow, every later write is ignored and {@link #status()} says
 * {@link Status#BUFFER_TOO_SMALL}. No allocation. Mutable; one owner.
 */
public final class StateWriter {
  private byte[] buffer = new byte[0];
  private int position;
  private int limit;
  private int status = Status.OK;

  /** Creates a writer with no buffer (call {@link #reset} before use). */
  public StateWriter() {
    // empty
  }

  /**
   * Starts writing.
   *
   * @param target the buffer (kept by reference, not copied)
   * @param offset first byte to write
   * @param length bytes available
   */
  public void reset(byte[] target, int offset, int length) {
    buffer = target;
    position = offset;
    limit = offset + length;
    status = (offset < 0 || length < 0 || limit > target.length) ? Status.BUFFER_TOO_SMALL : Status.OK;
  }

  private boolean room(int n) {
    if (status != Status.OK || position + n > limit) {
      status = Status.BUFFER_TOO_SMALL;
      return false;
    }
    return true;
  }

  /**
   * Writes a 64-bit integer.
   *
   * @param v the value
   */
  public void putLong(long v) {
    if (room(8)) {
      for (int i = 7; i >= 0; i--) {
        buffer[position++] = (byte) (v >> (8 * i));
      }
    }
  }

  /**
   * Writes a 32-bit integer.
   *
   * @param v the value
   */
  public void putInt(int v) {
    if (room(4)) {
      for (int i = 3; i >= 0; i--) {
        buffer[position++] = (byte) (v >> (8 * i));
      }
    }
  }

  /**
   * Writes a double as its raw IEEE-754 bits (NaN payloads preserved).
   *
   * @param v the value
   */
  public void putDouble(double v) {
    putLong(Double.doubleToRawLongBits(v));
  }

  /**
   * Writes a boolean as one 32-bit word (0 or 1), keeping the layout word-aligned.
   *
   * @param v the value
   */
  public void putBoolean(boolean v) {
    putInt(v ? 1 : 0);
  }

  /**
   * Returns the next position to write.
   *
   * @return the next position to write
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
