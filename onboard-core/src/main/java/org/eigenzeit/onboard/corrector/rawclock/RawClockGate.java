package org.eigenzeit.onboard.corrector.rawclock;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The raw-clock gate: decides, for each cycle's raw reading R, whether it is adopted as the new
 * last reading L, and what elapsed time the cycle gets. With d = R - L and the bound D (the largest
 * step of the raw clock between two cycles taken without confirmation):
 *
 * <pre>
 *   first reading              adopted                              OK
 *   d &lt; 0                      refused, never adopted               EPOCH_NOT_INCREASING
 *   d = 0                      adopted, elapsed 0 (the cycle runs)   RAW_CLOCK_REPEATED
 *   0 &lt; d &lt;= D                 adopted                              OK
 *   d &gt; D, R within (0, D]     adopted: two consecutive readings    RAW_CLOCK_JUMP
 *     after the held reading   agree, the jump is real
 *   d &gt; D otherwise           refused; R is held to confirm         EPOCH_JUMP
 * </pre>
 *
 * Bound: a single reading ahead by more than D, of any size, is refused and costs its own cycle
 * only; the next consistent reading is adopted as usual, so no later good cycle is refused because
 * of it. A jump is taken only when the reading after it agrees with it; the cycle that takes it
 * runs with the whole elapsed time (the servo integrates its command over it). A reading behind
 * the last adopted one is never adopted. Any refused or non-confirming reading drops the held one.
 * Every verdict is counted per status code.
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class RawClockGate {
  /** Bytes written by {@link #save}. */
  public static final int STATE_BYTES = 4 + 4 + 16 + Status.COUNT * 4;

  private final double maxStepS;
  private final SplitTime last = new SplitTime();
  private final SplitTime held = new SplitTime();
  private final int[] counters = new int[Status.COUNT];
  private boolean haveLast;
  private boolean haveHeld;
  private double elapsedS;
  private int lastStatus = Status.NOT_READY;

  /**
   * Creates a gate with nothing adopted.
   *
   * @param maxStepS D, s (positive, finite)
   * @throws IllegalArgumentException for a bound out of range (construction time)
   */
  public RawClockGate(double maxStepS) {
    if (!(maxStepS >= 1e-3 && maxStepS <= 1e6)) {
      throw new IllegalArgumentException("raw-clock step bound must be 1e-3..1e6 s, found " + maxStepS);
    }
    this.maxStepS = maxStepS;
  }

  /**
   * Judges a reading; an adopted one becomes the last reading.
   *
   * @param raw the cycle's raw reading
   * @return {@link Status#OK}, {@link Status#RAW_CLOCK_REPEATED} or {@link Status#RAW_CLOCK_JUMP}
   *     (adopted: the cycle runs with {@link #elapsedS()}), or {@link Status#EPOCH_NOT_INCREASING}
   *     or {@link Status#EPOCH_JUMP} (refused: the cycle must not run)
   */
  @CheckReturnValue
  public int admit(SplitTime raw) {
    final int verdict = judge(raw);
    counters[verdict]++;
    lastStatus = verdict;
    if (Status.isUsable(verdict)) {
      elapsedS = haveLast ? raw.secondsSince(last) : 0.0;
      last.setTo(raw);
      haveLast = true;
    }
    return verdict;
  }

  private int judge(SplitTime raw) {
    if (!haveLast) {
      haveHeld = false;
      return Status.OK;
    }
    final int order = raw.compareTo(last);
    if (order <= 0 || raw.secondsSince(last) <= maxStepS) {
      haveHeld = false;
      return order < 0 ? Status.EPOCH_NOT_INCREASING : order == 0 ? Status.RAW_CLOCK_REPEATED : Status.OK;
    }
    final boolean confirmed = haveHeld && raw.secondsSince(held) > 0 && raw.secondsSince(held) <= maxStepS;
    haveHeld = !confirmed;
    if (confirmed) {
      return Status.RAW_CLOCK_JUMP;
    }
    held.setTo(raw);
    return Status.EPOCH_JUMP;
  }

  /**
   * Seconds from the previous adopted reading to the last adopted one (0 for the first, or a
   * repeated reading).
   *
   * @return the elapsed time, s
   */
  public double elapsedS() {
    return elapsedS;
  }

  /**
   * Whether a reading has been adopted.
   *
   * @return true after the first adopted reading
   */
  public boolean hasReading() {
    return haveLast;
  }

  /**
   * Seconds from the last adopted reading to a reading.
   *
   * @param raw a raw reading
   * @return raw - last, s (valid after the first adopted reading)
   */
  public double secondsSinceLast(SplitTime raw) {
    return raw.secondsSince(last);
  }

  /**
   * Verdicts of a status code.
   *
   * @param code a status code
   * @return the count (0 for codes out of range)
   */
  public int count(int code) {
    return code >= 0 && code < Status.COUNT ? counters[code] : 0;
  }

  /**
   * Returns the verdict on the last reading.
   *
   * @return the status code
   */
  public int lastStatus() {
    return lastStatus;
  }

  /** Drops a held reading (after a restore: the held reading belonged to the state before it). */
  public void dropHeld() {
    haveHeld = false;
  }

  /**
   * Writes the last adopted reading and the counters (a held reading is not kept across a restart).
   *
   * @param w the writer
   */
  public void save(StateWriter w) {
    w.putBoolean(haveLast);
    w.putInt(lastStatus);
    last.save(w);
    for (int i = 0; i < Status.COUNT; i++) {
      w.putInt(counters[i]);
    }
  }

  /**
   * Restores what {@link #save} wrote; counts not negative, the status code known. The held
   * reading is left as it is ({@link #dropHeld} after a successful restore).
   *
   * @param r the reader (refusals latch in it)
   */
  public void restore(StateReader r) {
    haveLast = r.getFlag();
    lastStatus = r.getIntIn(0, Status.COUNT - 1);
    last.restore(r);
    for (int i = 0; i < Status.COUNT; i++) {
      counters[i] = r.getIntIn(0, Integer.MAX_VALUE);
    }
  }
}
