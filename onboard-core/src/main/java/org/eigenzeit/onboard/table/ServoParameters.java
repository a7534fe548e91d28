package org.eigenzeit.onboard.table;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.status.Status;

/**
 * The servo's parameter table: oscillator noise, measurement noise per source, gating, loop time
 * constants, actuator resolution and limits, mode thresholds.
 *
 * <p>Binary layout (big-endian): magic {@code 0x455A5350} ("EZSP"), version (u16) = 1, field
 * count (u16) = {@link #FIELD_COUNT}, then the fields as IEEE-754 doubles in the order of the
 * {@code F_*} indices, then CRC-32C (Castagnoli polynomial 0x1EDC6F41, reflected, init and final
 * XOR 0xFFFFFFFF; RFC 3720 appendix B.4; check value 0xE3069283 for "123456789") of every preceding
 * byte. Total {@link #TABLE_BYTES} bytes.
 *
 * <p>Life cycle: {@link #load} checks length, magic, version, CRC and every field's range into an
 * inactive buffer; {@link #activate} copies it to the active set. A failed load never touches the
 * active set. Counters of loads, CRC failures, range failures and activations feed housekeeping.
 *
 * <p>Mutable; one owner. No allocation after construction.
 */
public final class ServoParameters {
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

  private final double[] active = new double[FIELD_COUNT];
  private final double[] staged = new double[FIELD_COUNT];
  private final CRC32C crc = new CRC32C();
  private boolean stagedValid;
  private boolean activeValid;
  private int loads;
  private int crcFailures;
  private int rangeFailures;
  private int activations;
  private int lastLoadStatus = Status.NOT_READY;
  private int lastFailedField = -1;

  /** Creates a table holder with nothing active. */
  public ServoParameters() {
    // empty
  }

  /**
   * Encodes values into the binary layout (ground side; also used by tests).
   *
   * @param values {@link #FIELD_COUNT} values
   * @param out buffer of at least {@link #TABLE_BYTES} bytes from {@code offset}
   * @param offset where to write
   * @return {@link Status#OK} or {@link Status#BUFFER_TOO_SMALL}
   */
  public static int encode(double[] values, byte[] out, int offset) {
    if (values.length != FIELD_COUNT || offset < 0 || offset > out.length - TABLE_BYTES) {
      return Status.BUFFER_TOO_SMALL;
    }
    int p = offset;
    p = putInt(out, p, MAGIC);
    out[p++] = (byte) (VERSION >>> 8);
    out[p++] = (byte) VERSION;
    out[p++] = (byte) (FIELD_COUNT >>> 8);
    out[p++] = (byte) FIELD_COUNT;
    for (int i = 0; i < FIELD_COUNT; i++) {
      final long bits = Double.doubleToRawLongBits(values[i]);
      p = putInt(out, p, (int) (bits >>> 32));
      p = putInt(out, p, (int) bits);
    }
    final CRC32C c = new CRC32C();
    c.update(out, offset, p - offset);
    putInt(out, p, (int) c.getValue());
    return Status.OK;
  }

  private static int putInt(byte[] b, int p, int v) {
    b[p] = (byte) (v >>> 24);
    b[p + 1] = (byte) (v >>> 16);
    b[p + 2] = (byte) (v >>> 8);
    b[p + 3] = (byte) v;
    return p + 4;
  }

  private static int getInt(byte[] b, int p) {
    return ((b[p] & 0xFF) << 24) | ((b[p + 1] & 0xFF) << 16) | ((b[p + 2] & 0xFF) << 8) | (b[p + 3] & 0xFF);
  }

  /**
   * Loads an encoded table into the inactive buffer and validates it.
   *
   * @param in buffer
   * @param offset first byte
   * @param length bytes given (must equal {@link #TABLE_BYTES})
   * @return {@link Status#OK}, {@link Status#BUFFER_TOO_SMALL}, {@link Status#MALFORMED} (magic,
   *     version or field count), {@link Status#CHECKSUM_MISMATCH} or {@link Status#OUT_OF_RANGE} (a
   *     field outside its bounds, see {@link #lastFailedField()}, or inconsistent thresholds)
   */
  public int load(byte[] in, int offset, int length) {
    loads++;
    stagedValid = false;
    lastFailedField = -1;
    final int st = check(in, offset, length);
    lastLoadStatus = st;
    if (st == Status.CHECKSUM_MISMATCH) {
      crcFailures++;
    } else if (st == Status.OUT_OF_RANGE) {
      rangeFailures++;
    }
    stagedValid = st == Status.OK;
    return st;
  }

  private int check(byte[] in, int offset, int length) {
    if (offset < 0 || length != TABLE_BYTES || offset > in.length - length) {
      return Status.BUFFER_TOO_SMALL;
    }
    if (getInt(in, offset) != MAGIC || getInt(in, offset + 4) != ((VERSION << 16) | FIELD_COUNT)) {
      return Status.MALFORMED;
    }
    crc.reset();
    crc.update(in, offset, length - 4);
    if ((int) crc.getValue() != getInt(in, offset + length - 4)) {
      return Status.CHECKSUM_MISMATCH;
    }
    for (int i = 0; i < FIELD_COUNT; i++) {
      final long bits = ((long) getInt(in, offset + 8 + 8 * i) << 32) | (getInt(in, offset + 12 + 8 * i) & 0xFFFFFFFFL);
      final double v = Double.longBitsToDouble(bits);
      if (!(v >= MIN[i] && v <= MAX[i])) {
        lastFailedField = i;
        return Status.OUT_OF_RANGE;
      }
      staged[i] = v;
    }
    if (!(staged[F_TRACK_EXIT_S] > staged[F_TRACK_ENTER_S]) || !(staged[F_COAST_MAX_S] >= staged[F_COAST_AFTER_S])
        || !(staged[F_TIME_CONSTANT_TRACK_S] >= staged[F_TIME_CONSTANT_ACQUIRE_S])) {
      lastFailedField = FIELD_COUNT;
      return Status.OUT_OF_RANGE;
    }
    return Status.OK;
  }

  /**
   * Activates the staged table.
   *
   * @return {@link Status#OK}, or {@link Status#NOT_READY} when no valid table is staged
   */
  public int activate() {
    if (!stagedValid) {
      return Status.NOT_READY;
    }
    System.arraycopy(staged, 0, active, 0, FIELD_COUNT);
    activeValid = true;
    stagedValid = false;
    activations++;
    return Status.OK;
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
   * Returns loads attempted.
   *
   * @return loads attempted
   */
  public int loads() {
    return loads;
  }

  /**
   * Returns loads refused for their CRC.
   *
   * @return loads refused for their CRC
   */
  public int crcFailures() {
    return crcFailures;
  }

  /**
   * Returns loads refused for a range.
   *
   * @return loads refused for a range
   */
  public int rangeFailures() {
    return rangeFailures;
  }

  /**
   * Returns successful activations.
   *
   * @return successful activations
   */
  public int activations() {
    return activations;
  }

  /**
   * Returns the status of the last load.
   *
   * @return the status of the last load
   */
  public int lastLoadStatus() {
    return lastLoadStatus;
  }

  /**
   * Returns the field that failed the last range check, {@link #FIELD_COUNT} for a consistency rule, -1 for none.
   *
   * @return the field that failed the last range check, {@link #FIELD_COUNT} for a consistency rule, -1 for none
   */
  public int lastFailedField() {
    return lastFailedField;
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
