package org.eigenzeit.onboard.restart;

import java.util.function.Consumer;
import org.eigenzeit.onboard.status.Status;

/** Test helper: what a component's save writes, and a reader over it. */
public final class StateBytes {
  private StateBytes() {}

  /**
   * Runs a save into a large buffer and returns exactly the bytes written.
   *
   * @param save the component's save
   * @return the bytes written
   */
  public static byte[] written(Consumer<StateWriter> save) {
    final byte[] big = new byte[1 << 16];
    final StateWriter w = new StateWriter();
    w.reset(big, 0, big.length);
    save.accept(w);
    if (w.status() != Status.OK) {
      throw new IllegalStateException("writer overflow");
    }
    return java.util.Arrays.copyOf(big, w.position());
  }

  /**
   * A reader positioned at the start of the bytes.
   *
   * @param bytes the state
   * @return the reader
   */
  public static StateReader reader(byte[] bytes) {
    final StateReader r = new StateReader();
    r.reset(bytes, 0, bytes.length);
    return r;
  }

  /**
   * A copy of the state with one double overwritten (for refusal tests).
   *
   * @param bytes the state
   * @param at byte position of the double
   * @param value the value written there
   * @return the changed copy
   */
  public static byte[] withDouble(byte[] bytes, int at, double value) {
    final byte[] b = bytes.clone();
    final long bits = Double.doubleToRawLongBits(value);
    for (int i = 0; i < 8; i++) {
      b[at + i] = (byte) (bits >>> (56 - 8 * i));
    }
    return b;
  }

  /**
   * A copy of the state with one 32-bit word overwritten.
   *
   * @param bytes the state
   * @param at byte position of the word
   * @param value the value written there
   * @return the changed copy
   */
  public static byte[] withInt(byte[] bytes, int at, int value) {
    final byte[] b = bytes.clone();
    for (int i = 0; i < 4; i++) {
      b[at + i] = (byte) (value >>> (24 - 8 * i));
    }
    return b;
  }
}
