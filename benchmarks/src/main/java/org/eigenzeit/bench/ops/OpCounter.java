package org.eigenzeit.bench.ops;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The counters the instrumented code increments: one slot per kind of operation (a bytecode
 * class, or a static method such as {@code Math.sqrt}), registered when a class is instrumented.
 * Not thread-safe on purpose (the increment is a plain load, add, store): count one thread only.
 * Public so that a harness in another class loader (OpsPinTest) can read it.
 */
public final class OpCounter {
  /** Largest number of kinds. */
  static final int CAPACITY = 512;

  /** The counts, by slot; incremented by the instrumented bytecode (public and mutable for it). */
  @SuppressWarnings("MutablePublicArray") // the inserted GETSTATIC/LASTORE needs the bare array
  public static final long[] COUNTS = new long[CAPACITY];

  private static final List<String> NAMES = new ArrayList<>();

  private OpCounter() {}

  /**
   * The slot of a kind, registering it on first use.
   *
   * @param name the kind, e.g. "dmul" or "Math.sqrt"
   * @return its slot
   */
  static synchronized int slot(String name) {
    final int i = NAMES.indexOf(name);
    if (i >= 0) {
      return i;
    }
    if (NAMES.size() == CAPACITY) {
      throw new IllegalStateException("more than " + CAPACITY + " kinds of operation");
    }
    NAMES.add(name);
    return NAMES.size() - 1;
  }

  /**
   * Returns the registered kinds.
   *
   * @return the kinds, by slot
   */
  public static synchronized List<String> names() {
    return Collections.unmodifiableList(new ArrayList<>(NAMES));
  }

  /**
   * A copy of the counts.
   *
   * @return the counts, by slot
   */
  public static long[] snapshot() {
    return COUNTS.clone();
  }

  /**
   * The count of one kind in a snapshot.
   *
   * @param snapshot counts from {@link #snapshot} (or differences of two)
   * @param name the kind
   * @return its count (0 when never registered)
   */
  public static synchronized long count(long[] snapshot, String name) {
    final int i = NAMES.indexOf(name);
    return i < 0 ? 0 : snapshot[i];
  }
}
