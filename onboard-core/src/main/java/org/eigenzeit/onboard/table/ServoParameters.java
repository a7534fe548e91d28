package org.eigenzeit.onboard.table;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;

/**
 * The servo's parameter table: oscillator noise, measurement noise per source, gating, loop time
 * constants, actuator resolution and limits, mode thresholds.
 *
 * <p>Uplink image (the frame of {@link TableLayout}): magic {@code 0x455A5350} ("EZSP"), version 1,
 * count = {@link #FIELD_COUNT}, then the fields as IEEE-754 doubles in the order of the {@code F_*}
 * indices, then the CRC-32C. Total {@link #TABLE_BYTES} bytes. Content rules: every field finite
 * and within its bounds ({@link #min}, {@link #max}), and TRACK_EXIT above TRACK_ENTER, COAST_MAX
 * at least COAST_AFTER, the tracking time constant at least the acquisition one (a failed rule
 * across fields reports the item {@link #FIELD_COUNT}). Loaded, validated and activated through
 * an {@link UplinkTable}; this class holds the staged and the active values.
 *
 * <p>Mutable; one owner. No allocation after construction.
 */
public final class ServoParameters implements TableLayout {
  /** White frequency noise: sigma_y(1 s), dimensionless (Zucca and Tavella 2005 q1 = sigma^2). */
  public static final int F_SIGMA_WHITE_FM = 0;
  /** Random-walk frequency noise: sigma_y(1 s) of the RWFM term (q2 = 3 sigma^2 per s). */
  public static final int F_SIGMA_RANDOM_WALK_FM = 1;
  /** Random-run (drift random walk): sigma_y(1 s) of that term (q3 = 20 sigma^2 per s^3). */
  public static final int F_SIGMA_RANDOM_RUN = 2;
  /** Measurement noise of source 0 (for example a GNSS timing receiver), s. */
  public static final int F_SIGMA_SOURCE0 = 3;
  /** Measurement noise of source 1 (for example ground time transfer), s. */
  public static final int F_SIGMA_SOURCE1 = 4;
  /** Measurement noise of source 2 (for example a crosslink), s. */
  public static final int F_SIGMA_SOURCE2 = 5;
  /** Measurement noise of source 3 (spare), s. */
  public static final int F_SIGMA_SOURCE3 = 6;
  /** Innovation gate, in standard deviations. */
  public static final int F_GATE_SIGMA = 7;
  /** Consecutive consistent outliers that declare a phase jump. */
  public static final int F_PHASE_JUMP_COUNT = 8;
  /** Loop time constant in tracking, s. */
  public static final int F_TIME_CONSTANT_TRACK_S = 9;
  /** Loop time constant in acquisition, s. */
  public static final int F_TIME_CONSTANT_ACQUIRE_S = 10;
  /** Frequency command resolution (fractional step or DDS LSB), dimensionless. */
  public static final int F_STEER_RESOLUTION = 11;
  /** Largest |frequency command|, dimensionless. */
  public static final int F_STEER_MAX = 12;
  /** Largest change of the frequency command per second. */
  public static final int F_SLEW_MAX_PER_S = 13;
  /** Phase step resolution, s (0: phase steps disabled). */
  public static final int F_PHASE_STEP_RESOLUTION_S = 14;
  /** In acquisition, |phase error| above which a phase step is made, s. */
  public static final int F_PHASE_STEP_THRESHOLD_S = 15;
  /** |phase error| below which tracking is entered, s. */
  public static final int F_TRACK_ENTER_S = 16;
  /** |phase error| above which tracking is left, s (must exceed the enter threshold). */
  public static final int F_TRACK_EXIT_S = 17;
  /** Consecutive updates to enter or leave tracking (hysteresis count). */
  public static final int F_HYSTERESIS_COUNT = 18;
  /** Time without an accepted measurement before coasting, s. */
  public static final int F_COAST_AFTER_S = 19;
  /** Longest coast before the safe state, s. */
  public static final int F_COAST_MAX_S = 20;
  /** Oldest measurement accepted, s. */
  public static final int F_MEASUREMENT_MAX_AGE_S = 21;
  /** Largest |measured offset| accepted, s. */
  public static final int F_MAX_ABS_OFFSET_S = 22;
  /** Initial phase uncertainty, s. */
  public static final int F_INITIAL_SIGMA_PHASE_S = 23;
  /** Initial frequency uncertainty, dimensionless. */
  public static final int F_INITIAL_SIGMA_FREQUENCY = 24;
  /** Initial drift uncertainty, 1/s. */
  public static final int F_INITIAL_SIGMA_DRIFT_PER_S = 25;
  /** Consecutive invalid cycles (orbit and measurement) that force the safe state. */
  public static final int F_SAFE_AFTER_INVALID = 26;
  /** Consecutive good cycles to leave the safe state. */
  public static final int F_SAFE_EXIT_COUNT = 27;
  /** Number of fields. */
  public static final int FIELD_COUNT = 28;
  /** Magic number "EZSP". */
  public static final int MAGIC = 0x455A5350;
  /** Layout version. */
  public static final int VERSION = 1;
  /** Size of an encoded table in bytes. */
  public static final int TABLE_BYTES = 8 + 8 * FIELD_COUNT + 4;

  /** Lower bounds of the fields. */
  private static final double[] MIN = {
    1e-16, 0, 0, 1e-12, 1e-12, 1e-12, 1e-12, 2, 2, 1, 1, 0, 1e-12, 1e-18, 0, 0, 1e-12, 1e-12, 1, 1, 1, 1,
    1e-9, 1e-12, 1e-16, 0, 1, 1};
  /** Upper bounds of the fields. */
  private static final double[] MAX = {
    1e-8, 1e-9, 1e-9, 1e-3, 1e-3, 1e-3, 1e-3, 100, 1000, 1e7, 1e7, 1e-9, 1e-4, 1e-6, 1e-3, 10, 1, 10, 10_000,
    1e6, 1e8, 1e6, 1e3, 1e3, 1e-4, 1e-6, 1e6, 1e6};
  /** Names of the fields, for ground messages (interned constants). */
  private static final String[] NAMES = {
    "sigma_white_fm", "sigma_random_walk_fm", "sigma_random_run", "sigma_source0_s", "sigma_source1_s",
    "sigma_source2_s", "sigma_source3_s", "gate_sigma", "phase_jump_count", "time_constant_track_s",
    "time_constant_acquire_s", "steer_resolution", "steer_max", "slew_max_per_s", "phase_step_resolution_s",
    "phase_step_threshold_s", "track_enter_s", "track_exit_s", "hysteresis_count", "coast_after_s", "coast_max_s",
    "measurement_max_age_s", "max_abs_offset_s", "initial_sigma_phase_s", "initial_sigma_frequency",
    "initial_sigma_drift_per_s", "safe_after_invalid", "safe_exit_count"};

  private final double[] active = new double[FIELD_COUNT];
  private final double[] staged = new double[FIELD_COUNT];
  private boolean activeValid;
  private int activations;
  private int failedItem = -1;

  /** Creates a table with nothing active. */
  public ServoParameters() {
    // empty
  }

  /**
   * Encodes values into the uplink image (ground side; also used by tests).
   *
   * @param values {@link #FIELD_COUNT} values
   * @param out buffer of at least {@link #TABLE_BYTES} bytes from {@code offset}
   * @param offset where to write
   * @return {@link Status#OK} or {@link Status#BUFFER_TOO_SMALL}
   */
  @CheckReturnValue
  public static int encode(double[] values, byte[] out, int offset) {
    if (values.length != FIELD_COUNT) {
      return Status.BUFFER_TOO_SMALL;
    }
    final StateWriter w = new StateWriter();
    final int st = TableImage.begin(out, offset, TABLE_BYTES, MAGIC, VERSION, FIELD_COUNT, w);
    if (st != Status.OK) {
      return st;
    }
    for (int i = 0; i < FIELD_COUNT; i++) {
      w.putDouble(values[i]);
    }
    return TableImage.seal(out, offset, TABLE_BYTES, w);
  }

  @Override
  public int magic() {
    return MAGIC;
  }

  @Override
  public int version() {
    return VERSION;
  }

  @Override
  public int checkCount(int count) {
    return count == FIELD_COUNT ? Status.OK : Status.MALFORMED;
  }

  @Override
  public int imageBytes(int count) {
    return 8 + 8 * count + 4;
  }

  @Override
  public int stage(StateReader payload, int count) {
    failedItem = -1;
    for (int i = 0; i < FIELD_COUNT; i++) {
      final double v = payload.getDouble();
      if (!(v >= MIN[i] && v <= MAX[i])) {
        failedItem = i;
        return Double.isFinite(v) ? Status.OUT_OF_RANGE : Status.NOT_FINITE;
      }
      staged[i] = v;
    }
    if (!(staged[F_TRACK_EXIT_S] > staged[F_TRACK_ENTER_S]) || !(staged[F_COAST_MAX_S] >= staged[F_COAST_AFTER_S])
        || !(staged[F_TIME_CONSTANT_TRACK_S] >= staged[F_TIME_CONSTANT_ACQUIRE_S])) {
      failedItem = FIELD_COUNT;
      return Status.OUT_OF_RANGE;
    }
    return Status.OK;
  }

  @Override
  public int failedItem() {
    return failedItem;
  }

  @Override
  public void activate() {
    System.arraycopy(staged, 0, active, 0, FIELD_COUNT);
    activeValid = true;
    activations++;
  }

  /**
   * One active value.
   *
   * @param field an {@code F_*} index
   * @return the value (0 when nothing is active)
   */
  public double get(int field) {
    return active[field];
  }

  /**
   * Returns whether a table is active.
   *
   * @return whether a table is active
   */
  public boolean isActive() {
    return activeValid;
  }

  /**
   * Returns the number of activations (a user of derived values recomputes them when it changes).
   *
   * @return the count
   */
  public int activations() {
    return activations;
  }

  /**
   * Lower bound of a field.
   *
   * @param field an {@code F_*} index
   * @return the smallest value accepted
   */
  public static double min(int field) {
    return MIN[field];
  }

  /**
   * Upper bound of a field.
   *
   * @param field an {@code F_*} index
   * @return the largest value accepted
   */
  public static double max(int field) {
    return MAX[field];
  }

  /**
   * Name of a field (its YAML key in the ground's table files).
   *
   * @param field an {@code F_*} index
   * @return the name
   */
  public static String fieldName(int field) {
    return NAMES[field];
  }

  /**
   * Default values for a rubidium-class clock steered from a GNSS timing receiver (typical values,
   * for demos and tests, not a mission's tuning).
   *
   * @return a new array of {@link #FIELD_COUNT} values
   */
  public static double[] typicalRubidium() {
    final double[] v = new double[FIELD_COUNT];
    v[F_SIGMA_WHITE_FM] = 3e-12;
    v[F_SIGMA_RANDOM_WALK_FM] = 1e-16;
    v[F_SIGMA_RANDOM_RUN] = 1e-21;
    v[F_SIGMA_SOURCE0] = 10e-9;
    v[F_SIGMA_SOURCE1] = 1e-9;
    v[F_SIGMA_SOURCE2] = 0.3e-9;
    v[F_SIGMA_SOURCE3] = 1e-6;
    v[F_GATE_SIGMA] = 6;
    v[F_PHASE_JUMP_COUNT] = 5;
    v[F_TIME_CONSTANT_TRACK_S] = 3000;
    v[F_TIME_CONSTANT_ACQUIRE_S] = 100;
    v[F_STEER_RESOLUTION] = 1e-15;
    v[F_STEER_MAX] = 1e-7;
    v[F_SLEW_MAX_PER_S] = 1e-10;
    v[F_PHASE_STEP_RESOLUTION_S] = 1e-9;
    v[F_PHASE_STEP_THRESHOLD_S] = 1e-6;
    v[F_TRACK_ENTER_S] = 50e-9;
    v[F_TRACK_EXIT_S] = 1e-6;
    v[F_HYSTERESIS_COUNT] = 10;
    v[F_COAST_AFTER_S] = 60;
    v[F_COAST_MAX_S] = 7 * 86_400.0;
    v[F_MEASUREMENT_MAX_AGE_S] = 10;
    v[F_MAX_ABS_OFFSET_S] = 1.0;
    v[F_INITIAL_SIGMA_PHASE_S] = 1e-3;
    v[F_INITIAL_SIGMA_FREQUENCY] = 1e-8;
    v[F_INITIAL_SIGMA_DRIFT_PER_S] = 1e-14;
    v[F_SAFE_AFTER_INVALID] = 600;
    v[F_SAFE_EXIT_COUNT] = 30;
    return v;
  }
}
