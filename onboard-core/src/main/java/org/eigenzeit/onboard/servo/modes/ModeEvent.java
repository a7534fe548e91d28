package org.eigenzeit.onboard.servo.modes;

/**
 * The events that move the servo between its modes, as small integer codes for telemetry
 * ({@code lastModeEvent} in housekeeping), with their names. The transition each one makes is in
 * {@link ModeMachine}'s table and in docs/servo.md.
 *
 * <p>Constants only; thread-safe.
 */
public final class ModeEvent {
  /** No event yet. */
  public static final int NONE = 0;
  /** STANDBY to ACQUIRE: the first accepted measurement with an active table. */
  public static final int FIRST_MEASUREMENT = 1;
  /** ACQUIRE to TRACK: |x| and sigma_x below TRACK_ENTER for HYSTERESIS_COUNT updates. */
  public static final int CONVERGED = 2;
  /** TRACK to ACQUIRE: |x| above TRACK_EXIT for HYSTERESIS_COUNT updates. */
  public static final int DIVERGED = 3;
  /** TRACK to ACQUIRE: a phase jump (PHASE_JUMP_COUNT consistent outliers). */
  public static final int PHASE_JUMP_IN_TRACK = 4;
  /** ACQUIRE or TRACK to COAST: no accepted measurement for COAST_AFTER. */
  public static final int MEASUREMENTS_LOST = 5;
  /** COAST to TRACK: an accepted measurement with |x| below TRACK_EXIT. */
  public static final int RESUMED_SMALL = 6;
  /** COAST to ACQUIRE: an accepted measurement with |x| at or above TRACK_EXIT. */
  public static final int RESUMED_LARGE = 7;
  /** COAST to ACQUIRE: a phase jump. */
  public static final int PHASE_JUMP_IN_COAST = 8;
  /** ACQUIRE, TRACK or COAST to SAFE: SAFE_AFTER_INVALID cycles without a usable input. */
  public static final int INPUTS_INVALID = 9;
  /** ACQUIRE, TRACK or COAST to SAFE: the estimator is not finite (defensive). */
  public static final int ESTIMATOR_NOT_FINITE = 10;
  /** COAST to SAFE: no accepted measurement for COAST_MAX. */
  public static final int COAST_TOO_LONG = 11;
  /** SAFE to ACQUIRE: SAFE_EXIT_COUNT cycles with a usable orbit and a valid measurement. */
  public static final int SAFE_RECOVERED = 12;
  /** Any mode to STANDBY: no active parameter table. */
  public static final int NO_ACTIVE_TABLE = 13;
  /** ACQUIRE stays ACQUIRE: a phase jump re-initialises the estimator (no transition). */
  public static final int PHASE_JUMP_IN_ACQUIRE = 14;
  /** Number of event codes. */
  public static final int COUNT = 15;

  private ModeEvent() {}

  /**
   * Name of an event, for logs (interned constants, no allocation).
   *
   * @param event an event code
   * @return its name, or "UNKNOWN"
   */
  public static String name(int event) {
    switch (event) {
      case NONE: return "NONE";
      case FIRST_MEASUREMENT: return "FIRST_MEASUREMENT";
      case CONVERGED: return "CONVERGED";
      case DIVERGED: return "DIVERGED";
      case PHASE_JUMP_IN_TRACK: return "PHASE_JUMP_IN_TRACK";
      case MEASUREMENTS_LOST: return "MEASUREMENTS_LOST";
      case RESUMED_SMALL: return "RESUMED_SMALL";
      case RESUMED_LARGE: return "RESUMED_LARGE";
      case PHASE_JUMP_IN_COAST: return "PHASE_JUMP_IN_COAST";
      case INPUTS_INVALID: return "INPUTS_INVALID";
      case ESTIMATOR_NOT_FINITE: return "ESTIMATOR_NOT_FINITE";
      case COAST_TOO_LONG: return "COAST_TOO_LONG";
      case SAFE_RECOVERED: return "SAFE_RECOVERED";
      case NO_ACTIVE_TABLE: return "NO_ACTIVE_TABLE";
      case PHASE_JUMP_IN_ACQUIRE: return "PHASE_JUMP_IN_ACQUIRE";
      default: return "UNKNOWN";
    }
  }
}
