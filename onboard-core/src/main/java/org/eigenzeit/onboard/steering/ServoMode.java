package org.eigenzeit.onboard.steering;

/**
 * Operating modes of the servo, as small integer codes for telemetry. The state table with the
 * event that drives each transition is in docs/servo.md and in the servo's mode machine.
 */
public final class ServoMode {
  /** No active parameter table or no measurement yet: no steering. */
  public static final int STANDBY = 0;
  /** Pull-in of a large error: short time constant, phase steps allowed. */
  public static final int ACQUIRE = 1;
  /** Steady tracking: long time constant, no phase steps. */
  public static final int TRACK = 2;
  /** No measurements: keep the model and the last frequency estimate, no phase pull. */
  public static final int COAST = 3;
  /** Inputs invalid for too long: hold the last frequency command, estimator frozen. */
  public static final int SAFE = 4;
  /** Number of modes. */
  public static final int COUNT = 5;

  private ServoMode() {}

  /**
   * Name of a mode, for logs (interned constants, no allocation).
   *
   * @param mode a mode code
   * @return its name, or "UNKNOWN"
   */
  public static String name(int mode) {
    switch (mode) {
      case STANDBY: return "STANDBY";
      case ACQUIRE: return "ACQUIRE";
      case TRACK: return "TRACK";
      case COAST: return "COAST";
      case SAFE: return "SAFE";
      default: return "UNKNOWN";
    }
  }
}
