package org.eigenzeit.onboard.corrector;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.servo.ClockServo;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableStatus;
import org.eigenzeit.onboard.table.UplinkTable;
import org.eigenzeit.onboard.time.CucCodec;
import org.eigenzeit.onboard.time.LeapSecondTable;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.time.TimeScales;

/**
 * The onboard clock corrector: the one object a host builds at start-up and calls every cycle.
 *
 * <p><b>Corrected time.</b> {@code T = raw + S + M}: the raw clock reading, plus the accumulated
 * steering S of the servo (when the host's counter is itself driven in frequency by the steered
 * synthesizer, only the servo's phase steps are added: the frequency part is already in the
 * reading), plus the relativistic model M = -(tau - T_scale) from the
 * {@link ProperTimeTracker} (zero when the model is switched off, for comparisons). The servo
 * estimates and steers the error of T against the target scale from measured offsets.
 *
 * <p><b>Call sequence.</b> Construct (allocates everything); load and activate the uplink tables
 * ({@link #loadTable}, {@link #activateTable}: the servo parameters at least); then every cycle {@link #cycle}; read {@link
 * #correctedTime},
 * {@link #stampCuc} and {@link #housekeeping} at any time; {@link #save} periodically into a
 * buffer of {@link #STATE_BYTES} that survives a processor reset; after a reset, {@link #restore}
 * (a corrupted buffer is refused: cold start).
 *
 * <p><b>Warm-restart buffer.</b> Magic "EZRS", version, length, the tracker's and the servo's
 * state, the last raw clock reading, CRC-32C of everything before it.
 *
 * <p>Not thread-safe: one owner thread calls every method. No allocation after construction; no
 * exception after construction.
 */
public final class ClockCorrector {
  /** Magic number of the restart buffer, "EZRS". */
  public static final int RESTART_MAGIC = 0x455A5253;
  /** Layout version of the restart buffer. */
  public static final int RESTART_VERSION = 1;
  /** Size of the restart buffer in bytes. */
  public static final int STATE_BYTES = 16 + ProperTimeTracker.STATE_BYTES + ClockServo.STATE_BYTES + 16 + 4;

  private final ProperTimeTracker tracker;
  private final ClockServo servo;
  private final TableSet tables;
  private final boolean applyModel;
  private final boolean counterIsSteered;
  private final SplitTime lastRaw = new SplitTime();
  private final SplitTime cycleTime = new SplitTime();
  private final SplitTime servoTime = new SplitTime();
  private final SplitTime scratch = new SplitTime();
  private final StateWriter writer = new StateWriter();
  private final StateReader reader = new StateReader();
  private final byte[] rollback = new byte[STATE_BYTES];
  private final CRC32C crc = new CRC32C();
  private boolean haveRaw;
  private long cycles;
  private int lastOrbitStatus = Status.NOT_READY;
  private int restoreStatus = Status.NOT_READY;

  /**
   * Creates a corrector.
   *
   * @param model the relativistic model configuration
   * @param applyModel whether the corrected time includes the relativistic model (false only to
   *     show, in simulations, what the model does)
   * @param counterIsSteered true when the host's raw counter is driven in frequency by the steered
   *     synthesizer (the frequency steering is then already in the raw reading; phase steps are
   *     still added in software)
   */
  public ClockCorrector(ModelConfig model, boolean applyModel, boolean counterIsSteered) {
    this.tables = new TableSet(model);
    this.tracker = new ProperTimeTracker(model, tables.gravity());
    this.servo = new ClockServo(tables.servo());
    this.applyModel = applyModel;
    this.counterIsSteered = counterIsSteered;
  }

  /**
   * Loads an uplink image into the staged buffer of one of the tables this corrector owns and
   * validates it (frame, CRC-32C, content rules); the active table is untouched.
   *
   * @param tableId a {@link TableId} code
   * @param image buffer
   * @param offset first byte of the image
   * @param length bytes given
   * @return {@link Status#OUT_OF_RANGE} for an unknown table, else {@link UplinkTable#load}'s status
   */
  @CheckReturnValue
  public int loadTable(int tableId, byte[] image, int offset, int length) {
    return tableId >= 0 && tableId < TableId.COUNT ? tables.table(tableId).load(image, offset, length)
        : Status.OUT_OF_RANGE;
  }

  /**
   * Activates the validated staged table: from the next use on, the core works with it.
   *
   * @param tableId a {@link TableId} code
   * @return {@link Status#OK}, {@link Status#NOT_READY} (nothing validated is staged) or {@link
   *     Status#OUT_OF_RANGE} (unknown table)
   */
  @CheckReturnValue
  public int activateTable(int tableId) {
    return tableId >= 0 && tableId < TableId.COUNT ? tables.table(tableId).activate() : Status.OUT_OF_RANGE;
  }

  /**
   * A snapshot of one table's status (also in {@link #housekeeping}).
   *
   * @param tableId a {@link TableId} code
   * @param out the caller's holder
   * @return {@link Status#OK}, or {@link Status#OUT_OF_RANGE} for an unknown table (holder untouched)
   */
  @CheckReturnValue
  public int tableStatus(int tableId, TableStatus out) {
    if (tableId < 0 || tableId >= TableId.COUNT) {
      return Status.OUT_OF_RANGE;
    }
    tables.table(tableId).status(out);
    return Status.OK;
  }

  /**
   * The active leap-second table, for UTC conversions ({@link LeapSecondTable#utcToTai}, {@link
   * LeapSecondTable#taiToUtc}); upload it with {@link #loadTable} and {@link #activateTable} ({@link TableId#LEAP_SECONDS}).
   *
   * @return the table (queries return NOT_READY until one is active)
   */
  public LeapSecondTable leapSeconds() {
    return tables.leapSeconds();
  }

  /**
   * One cycle. Data flows one way, each stage once:
   *
   * <pre>
   *   raw reading  -> steering S at the reading, from the state the previous cycle left
   *                -> the cycle's instant on the target scale, raw + S + M_prev (the previous
   *                   cycle's model extrapolated: the only value that crosses from cycle to cycle)
   *   orbit sample -> model (validation, frames, rate, integration or bridging) at that instant
   *   model        -> servo: the measurement's instant is raw + S + M with this cycle's model
   *   servo        -> command, steering phase, phase step; {@link #correctedTime} reads them
   * </pre>
   *
   * @param raw the raw clock reading at this cycle
   * @param orbit the newest orbit estimate, or null
   * @param measurement the newest time-offset measurement, or null
   * @return the servo's verdict on the measurement (see {@link ClockServo#cycle}); the orbit's
   *     verdict is in housekeeping
   */
  @CheckReturnValue
  public int cycle(SplitTime raw, OrbitSample orbit, TimeOffsetMeasurement measurement) {
    if (haveRaw && raw.compareTo(lastRaw) < 0) {
      return Status.EPOCH_NOT_INCREASING;
    }
    cycles++;
    final double steering = steeringAt(raw);
    timeOf(raw, steering, cycleTime); // the model's instant: this cycle's prediction
    final int orbitStatus = tracker.step(cycleTime, orbit);
    if (orbit != null) {
      lastOrbitStatus = orbitStatus;
    }
    final int sol = tracker.solutionStatus();
    final boolean orbitUsable = !applyModel || sol == Status.OK || sol == Status.DEGRADED_BRIDGED;
    timeOf(raw, steering, servoTime); // the servo's instant: with this cycle's model
    final double dtS = haveRaw ? raw.secondsSince(lastRaw) : 0.0;
    final int verdict = servo.cycle(servoTime, dtS, orbitUsable, measurement);
    lastRaw.setTo(raw);
    haveRaw = true;
    return verdict;
  }

  /** The steering phase at a raw reading: what the servo has applied up to it. */
  private double steeringAt(SplitTime raw) {
    if (counterIsSteered) {
      return servo.phaseStepTotalS();
    }
    return haveRaw ? servo.steeringPhaseS() + servo.command() * raw.secondsSince(lastRaw) : servo.steeringPhaseS();
  }

  /** raw + steering + model: the model term is -(tau - T) extrapolated from the model's last node. */
  private void timeOf(SplitTime raw, double steering, SplitTime out) {
    final double model = (applyModel && tracker.isInitialized()) ? -tracker.offsetAtS(raw, steering) : 0.0;
    out.setTo(raw);
    out.addSeconds(steering + model);
  }

  /**
   * The corrected time for a raw clock reading (normally between two cycles, for stamping).
   *
   * @param raw raw clock reading
   * @param out receives the corrected time (an estimate of the target scale)
   */
  public void correctedTime(SplitTime raw, SplitTime out) {
    timeOf(raw, steeringAt(raw), out);
  }

  /**
   * Stamps the corrected time of a raw reading as a CCSDS CUC in TAI (the target scale is taken
   * as TT: TAI = TT - 32.184 s).
   *
   * @param raw raw clock reading
   * @param codec the CUC layout
   * @param out buffer
   * @param offset where to write
   * @return the codec's status
   */
  public int stampCuc(SplitTime raw, CucCodec codec, byte[] out, int offset) {
    correctedTime(raw, scratch);
    TimeScales.ttToTai(scratch, scratch);
    return codec.encode(scratch, out, offset);
  }

  /**
   * The servo's current frequency command (what the host sends to the synthesizer).
   *
   * @return the fractional frequency command
   */
  public double frequencyCommand() {
    return servo.command();
  }

  /**
   * Fills a housekeeping snapshot.
   *
   * @param hk the caller's snapshot
   */
  public void housekeeping(Housekeeping hk) {
    hk.mode = servo.mode();
    hk.lastModeEvent = servo.lastEvent();
    hk.modeTransitions = servo.modeTransitions();
    hk.lastMeasurementStatus = servo.lastMeasurementStatus();
    hk.lastOrbitStatus = lastOrbitStatus;
    hk.orbitSolutionStatus = tracker.solutionStatus();
    hk.phaseS = servo.estimator().phaseS();
    hk.sigmaPhaseS = Math.sqrt(Math.max(0.0, servo.estimator().covariance(0, 0)));
    hk.frequency = servo.estimator().frequency();
    hk.sigmaFrequency = Math.sqrt(Math.max(0.0, servo.estimator().covariance(1, 1)));
    hk.driftPerS = servo.estimator().driftPerS();
    hk.sigmaDriftPerS = Math.sqrt(Math.max(0.0, servo.estimator().covariance(2, 2)));
    hk.command = servo.command();
    hk.steeringPhaseS = servo.steeringPhaseS();
    hk.modelRate = tracker.fractionalFrequency();
    hk.modelOffsetS = tracker.offsetS();
    hk.modelRateErrorBound = tracker.rateErrorBound();
    hk.sinceMeasurementS = servo.sinceAcceptedS();
    hk.phaseJumps = servo.phaseJumps();
    hk.phaseSteps = servo.phaseSteps();
    tables.status(hk.tables);
    hk.restoreStatus = restoreStatus;
    hk.cycles = cycles;
    for (int i = 0; i < Status.COUNT; i++) {
      hk.measurementCounts[i] = servo.count(i);
      hk.orbitCounts[i] = tracker.count(i);
    }
    for (int i = 0; i < ServoMode.COUNT; i++) {
      hk.timeInModeS[i] = servo.timeInModeS(i);
    }
  }

  /**
   * Writes the complete state into a restart buffer.
   *
   * @param buffer the buffer
   * @param offset where to write
   * @param length bytes available (at least {@link #STATE_BYTES})
   * @return {@link Status#OK} or {@link Status#BUFFER_TOO_SMALL}
   */
  public int save(byte[] buffer, int offset, int length) {
    if (offset < 0 || length < STATE_BYTES || offset > buffer.length - STATE_BYTES) {
      return Status.BUFFER_TOO_SMALL;
    }
    writer.reset(buffer, offset, STATE_BYTES);
    writer.putInt(RESTART_MAGIC);
    writer.putInt(RESTART_VERSION);
    writer.putInt(STATE_BYTES);
    writer.putInt(0);
    tracker.save(writer);
    servo.save(writer);
    writer.putLong(lastRaw.wholeSeconds());
    writer.putDouble(lastRaw.fractionS());
    crc.reset();
    crc.update(buffer, offset, STATE_BYTES - 4);
    writer.putInt((int) crc.getValue());
    return writer.status();
  }

  /**
   * Restores the state from a restart buffer. A buffer with a wrong magic, version, length or
   * CRC is refused and the clock corrector stays as it is (a cold start when freshly built). A buffer
   * that passes those checks but holds content the tracker or servo refuses (a faulty writer) is
   * refused as {@link Status#MALFORMED} and the state from before the call is put back from an
   * internal copy taken at the start of the call: a refused restore never leaves a mixed state.
   *
   * @param buffer the buffer
   * @param offset where it starts
   * @param length bytes given
   * @return {@link Status#OK}, {@link Status#BUFFER_TOO_SMALL}, {@link Status#MALFORMED} or
   *     {@link Status#CHECKSUM_MISMATCH}
   */
  public int restore(byte[] buffer, int offset, int length) {
    restoreStatus = checkRestore(buffer, offset, length);
    if (restoreStatus != Status.OK) {
      return restoreStatus;
    }
    final boolean hadRaw = haveRaw;
    final long hadCycles = cycles;
    save(rollback, 0, STATE_BYTES); // known-good copy of the current state
    int st = apply(buffer, offset);
    if (st == Status.OK) {
      haveRaw = true;
      cycles = 0;
    } else {
      apply(rollback, 0);
      haveRaw = hadRaw;
      cycles = hadCycles;
      st = Status.MALFORMED;
    }
    restoreStatus = st;
    return st;
  }

  private int apply(byte[] buffer, int offset) {
    reader.reset(buffer, offset + 16, STATE_BYTES - 16);
    int st = tracker.restore(reader);
    if (st == Status.OK) {
      st = servo.restore(reader);
    }
    final long whole = reader.getLong();
    final double fraction = reader.getDouble();
    return st == Status.OK && lastRaw.set(whole, fraction) == Status.OK ? Status.OK : Status.MALFORMED;
  }

  private int checkRestore(byte[] buffer, int offset, int length) {
    if (offset < 0 || length < STATE_BYTES || offset > buffer.length - STATE_BYTES) {
      return Status.BUFFER_TOO_SMALL;
    }
    reader.reset(buffer, offset, 16);
    if (reader.getInt() != RESTART_MAGIC || reader.getInt() != RESTART_VERSION || reader.getInt() != STATE_BYTES) {
      return Status.MALFORMED;
    }
    crc.reset();
    crc.update(buffer, offset, STATE_BYTES - 4);
    reader.reset(buffer, offset + STATE_BYTES - 4, 4);
    return reader.getInt() == (int) crc.getValue() ? Status.OK : Status.CHECKSUM_MISMATCH;
  }

  /**
   * Returns the relativistic model tracker (read-only use).
   *
   * @return the relativistic model tracker (read-only use)
   */
  ProperTimeTracker tracker() {
    return tracker;
  }

  /**
   * Returns the servo (read-only use).
   *
   * @return the servo (read-only use)
   */
  ClockServo servo() {
    return servo;
  }
}
