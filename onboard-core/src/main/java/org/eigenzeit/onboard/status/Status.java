package org.eigenzeit.onboard.status;

/**
 * Status codes of the onboard core. One place defines them all; every public hot-path method
 * documents which of them it can return.
 *
 * <p>Codes are small non-negative integers so that they fit a telemetry byte. {@link #OK} is zero.
 * Codes below {@link #FIRST_FAULT} are nominal or advisory: the result was produced and may be
 * used. Codes at or above it are faults: the input was rejected, the last good state was kept, and
 * the fault was counted in housekeeping.
 *
 * <p>Thread safety: constants only; safe from any thread.
 */
public final class Status {
  /** Nominal: the call did what it was asked. */
  public static final int OK = 0;
  /** Advisory: the result is produced from a bridged (propagated) orbit, with degraded accuracy. */
  public static final int DEGRADED_BRIDGED = 1;
  /** Advisory: the leap-second table has expired; the value returned is the last known one. */
  public static final int LEAP_TABLE_EXPIRED = 2;
  /** Advisory: the instant lies inside an inserted leap second; the UTC label is held at :59. */
  public static final int LEAP_SECOND_IN_PROGRESS = 3;
  /** Advisory: the integration step was longer than the configured nominal step. */
  public static final int LONG_STEP = 4;
  /** Advisory: the raw clock read the same as at the last cycle (no time elapsed; the cycle ran). */
  public static final int RAW_CLOCK_REPEATED = 5;
  /** Advisory: a forward jump of the raw clock, confirmed by two consecutive readings, was taken. */
  public static final int RAW_CLOCK_JUMP = 6;
  /** Advisory: the orbit sample is plausible and held until the next one confirms it (re-acquisition). */
  public static final int REACQUIRING = 7;
  /** Advisory: the model's value was not finite; the corrected time holds the last finite correction. */
  public static final int MODEL_HELD = 8;

  /** First fault code; every code at or above it means the input was rejected. */
  public static final int FIRST_FAULT = 16;
  /** Fault: an input held NaN or an infinite value. */
  public static final int NOT_FINITE = 16;
  /** Fault: the radius lies outside the physically possible range for the central body. */
  public static final int RADIUS_OUT_OF_RANGE = 17;
  /** Fault: the speed lies outside the physically possible range. */
  public static final int SPEED_OUT_OF_RANGE = 18;
  /** Fault: the orbital energy disagrees with the previous sample beyond the vis-viva tolerance. */
  public static final int ENERGY_INCONSISTENT = 19;
  /** Fault: the epoch did not advance (equal to or earlier than the last accepted one). */
  public static final int EPOCH_NOT_INCREASING = 20;
  /** Fault: the epoch jumped forward by more than the configured maximum gap. */
  public static final int EPOCH_JUMP = 21;
  /** Fault: no valid orbit is available and the bridging limit was exceeded. */
  public static final int STALE = 22;
  /** Fault: a value lies outside its allowed range (parameter, table entry, argument). */
  public static final int OUT_OF_RANGE = 23;
  /** Fault: a checksum, hash or CRC did not match. */
  public static final int CHECKSUM_MISMATCH = 24;
  /** Fault: an input could not be parsed (malformed text or bytes). */
  public static final int MALFORMED = 25;
  /** Fault: a buffer was too small for the requested operation. */
  public static final int BUFFER_TOO_SMALL = 26;
  /** Fault: the value does not fit the requested encoding (for example a CUC coarse field). */
  public static final int OVERFLOW = 27;
  /** Fault: the operation needs state that has not been initialised or activated yet. */
  public static final int NOT_READY = 28;
  /** Fault: the sample was flagged invalid by its producer. */
  public static final int INVALID_INPUT = 29;
  /** Fault: a measurement was rejected by the innovation gate (outlier). */
  public static final int OUTLIER = 30;
  /** Fault: a phase jump of the clock was detected. */
  public static final int PHASE_JUMP = 31;
  /** Fault: the table is full (capacity fixed at construction). */
  public static final int CAPACITY_EXCEEDED = 32;
  /** Fault: a re-acquisition sample disagrees with the held one (it is held instead). */
  public static final int UNCONFIRMED = 33;
  /** Fault: a restart buffer written by another configuration (body, model, tables) was refused. */
  public static final int CONFIGURATION_MISMATCH = 34;

  /** Number of distinct codes; arrays of counters are sized by it. */
  public static final int COUNT = 35;

  private Status() {}

  /**
   * Tells whether a code is a fault (the input was rejected).
   *
   * @param code a status code
   * @return true for codes at or above {@link #FIRST_FAULT}
   */
  public static boolean isFault(int code) {
    return code >= FIRST_FAULT;
  }

  /**
   * Tells whether a code is nominal or advisory (the result may be used).
   *
   * @param code a status code
   * @return true for {@link #OK} and the advisory codes
   */
  public static boolean isUsable(int code) {
    return code >= OK && code < FIRST_FAULT;
  }

  /**
   * A short constant name for a code, for logs and ground displays. Returns interned constants,
   * so it does not allocate.
   *
   * @param code a status code
   * @return the name, or {@code "UNKNOWN"}
   */
  public static String name(int code) {
    switch (code) {
      case OK: return "OK";
      case DEGRADED_BRIDGED: return "DEGRADED_BRIDGED";
      case LEAP_TABLE_EXPIRED: return "LEAP_TABLE_EXPIRED";
      case LEAP_SECOND_IN_PROGRESS: return "LEAP_SECOND_IN_PROGRESS";
      case LONG_STEP: return "LONG_STEP";
      case RAW_CLOCK_REPEATED: return "RAW_CLOCK_REPEATED";
      case RAW_CLOCK_JUMP: return "RAW_CLOCK_JUMP";
      case REACQUIRING: return "REACQUIRING";
      case MODEL_HELD: return "MODEL_HELD";
      case NOT_FINITE: return "NOT_FINITE";
      case RADIUS_OUT_OF_RANGE: return "RADIUS_OUT_OF_RANGE";
      case SPEED_OUT_OF_RANGE: return "SPEED_OUT_OF_RANGE";
      case ENERGY_INCONSISTENT: return "ENERGY_INCONSISTENT";
      case EPOCH_NOT_INCREASING: return "EPOCH_NOT_INCREASING";
      case EPOCH_JUMP: return "EPOCH_JUMP";
      case STALE: return "STALE";
      case OUT_OF_RANGE: return "OUT_OF_RANGE";
      case CHECKSUM_MISMATCH: return "CHECKSUM_MISMATCH";
      case MALFORMED: return "MALFORMED";
      case BUFFER_TOO_SMALL: return "BUFFER_TOO_SMALL";
      case OVERFLOW: return "OVERFLOW";
      case NOT_READY: return "NOT_READY";
      case INVALID_INPUT: return "INVALID_INPUT";
      case OUTLIER: return "OUTLIER";
      case PHASE_JUMP: return "PHASE_JUMP";
      case CAPACITY_EXCEEDED: return "CAPACITY_EXCEEDED";
      case UNCONFIRMED: return "UNCONFIRMED";
      case CONFIGURATION_MISMATCH: return "CONFIGURATION_MISMATCH";
      default: return "UNKNOWN";
    }
  }
}
