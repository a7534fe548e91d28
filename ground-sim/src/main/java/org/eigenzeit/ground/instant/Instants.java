package org.eigenzeit.ground.instant;

import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Status-checked {@link SplitTime} setters for ground code. The core refuses a non-finite value
 * or a shift of {@link SplitTime#MAX_SHIFT_S} or more and leaves the instant unchanged; here that
 * refusal becomes an {@link IllegalStateException} naming the value, because on the ground a
 * refused instant means a model or an input produced a non-finite time, which must stop the run.
 */
public final class Instants {
  private Instants() {}

  /**
   * Moves an instant by a shift in seconds ({@link SplitTime#addSeconds(double)}).
   *
   * @param t the instant, moved in place
   * @param shiftS the shift in seconds
   * @throws IllegalStateException if the core refuses the shift (non-finite or too large)
   */
  public static void shift(SplitTime t, double shiftS) {
    final int st = t.addSeconds(shiftS);
    if (st != Status.OK) {
      throw new IllegalStateException(
          "time shift refused (" + Status.name(st) + "), found " + shiftS + " s, allowed a finite shift below "
              + SplitTime.MAX_SHIFT_S + " s");
    }
  }

  /**
   * Sets an instant to {@code base} plus a shift in seconds.
   *
   * @param t receives the instant
   * @param base the instant to start from (may be {@code t})
   * @param shiftS the shift in seconds
   * @throws IllegalStateException if the core refuses the shift (non-finite or too large)
   */
  public static void shifted(SplitTime t, SplitTime base, double shiftS) {
    t.setTo(base);
    shift(t, shiftS);
  }

  /**
   * Sets an instant from whole seconds and a fraction ({@link SplitTime#set(long, double)}).
   *
   * @param t receives the instant
   * @param wholeS whole seconds since J2000.0
   * @param fractionS fraction of a second (any finite value below the core's limit)
   * @throws IllegalStateException if the core refuses the fraction
   */
  public static void set(SplitTime t, long wholeS, double fractionS) {
    final int st = t.set(wholeS, fractionS);
    if (st != Status.OK) {
      throw new IllegalStateException(
          "time refused (" + Status.name(st) + "), found fraction " + fractionS + " s, allowed a finite value below "
              + SplitTime.MAX_SHIFT_S + " s");
    }
  }

  /**
   * Requires a core conversion's status to be OK.
   *
   * @param status the status the core returned
   * @param what the conversion, for the message
   * @throws IllegalStateException if the status is not {@link Status#OK}
   */
  public static void require(int status, String what) {
    if (status != Status.OK) {
      throw new IllegalStateException(what + " refused by the core: " + Status.name(status));
    }
  }
}
