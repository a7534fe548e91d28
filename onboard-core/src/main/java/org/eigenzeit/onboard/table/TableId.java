package org.eigenzeit.onboard.table;

/**
 * Identifiers of the uplink tables a clock corrector owns (housekeeping and commanding index
 * them). A new table type takes the next code, supplies its {@link TableLayout} and is registered
 * by the corrector.
 *
 * <p>Constants only; thread-safe.
 */
public final class TableId {
  /** The servo's parameter table ({@link ServoParameters}). */
  public static final int SERVO = 0;
  /** The geopotential coefficients ({@code org.eigenzeit.onboard.gravity.GravityTable}). */
  public static final int GRAVITY = 1;
  /** The leap-second table ({@code org.eigenzeit.onboard.time.LeapSecondTable}). */
  public static final int LEAP_SECONDS = 2;
  /**
   * The lunar time table TL - TT ({@code org.eigenzeit.onboard.lunartime.LunarTimeLayout}); used
   * by a Moon-centred configuration, nothing active until the first upload.
   */
  public static final int LUNAR_TIME = 3;
  /** Number of table identifiers. */
  public static final int COUNT = 4;

  private TableId() {}

  /**
   * Name of a table, for logs and ground displays (interned constants, no allocation).
   *
   * @param id a table identifier
   * @return its name, or "UNKNOWN"
   */
  public static String name(int id) {
    switch (id) {
      case SERVO: return "SERVO";
      case GRAVITY: return "GRAVITY";
      case LEAP_SECONDS: return "LEAP_SECONDS";
      case LUNAR_TIME: return "LUNAR_TIME";
      default: return "UNKNOWN";
    }
  }
}
