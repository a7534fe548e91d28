package org.eigenzeit.onboard.corrector;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.corrector.rawclock.RawClockGate;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.servo.ClockServo;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableStatus;
import org.eigenzeit.onboard.table.UplinkTable;
import org.eigenzeit.onboard.time.CucCodec;
import org.eigenzeit.onboard.time.LeapSecondTable;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.time.TimeScales;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;

/**
 * The onboard clock corrector: the one object a host builds at start-up and calls every cycle.
 *
 * <p><b>Corrected time.</b> {@code T = raw + S + M}: the raw reading, the servo's accumulated
 * steering S (only its phase steps when the counter is driven by the steered synthesizer) and the
 * relativistic model M = -(tau - T_scale) of the {@link ProperTimeTracker} (0 with the model off).
 * A model value that is not finite never reaches T: the last finite M is held, the cycle reports
 * {@link Status#MODEL_HELD} and counts it.
 *
 * <p><b>Lunar time.</b> For a Moon-centred configuration the target scale is TL (the body's L_L)
 * and each cycle also evaluates TL - TT at the clock from the active lunar time table ({@link
 * TableId#LUNAR_TIME}, {@code org.eigenzeit.onboard.lunartime}); {@link #correctedTimeTt} gives
 * the corrected time in TT. Outside the table's span, with no valid table or no orbit state, the
 * last valid value is held and flagged ({@link Housekeeping#lunarValid}, {@link
 * Housekeeping#lunarStatus}) and the refusal counted; it is never extrapolated. The lunar table
 * is not part of the restart buffer's identity: it changes no state the buffer holds, and the
 * value is re-evaluated at the first cycle after a restore.
 *
 * <p><b>Call sequence.</b> Construct (allocates everything); load and activate the uplink tables
 * ({@link #loadTable}, {@link #activateTable}: the servo parameters at least); after a processor
 * reset {@link #restore} (the tables first: the buffer carries their identity); then every cycle
 * {@link #cycle}; read {@link #correctedTime}, {@link #stampCuc} and {@link #housekeeping} at any
 * time; {@link #save} periodically into a buffer of {@link #STATE_BYTES} that survives a reset.
 *
 * <p>Not thread-safe: one owner thread calls every method. No allocation after construction; no
 * exception after construction.
 */
public final class ClockCorrector {
  /** Magic number of the restart buffer, "EZRS" (layout version {@value #RESTART_VERSION}). */
  public static final int RESTART_MAGIC = RestartImage.MAGIC;
  /** Layout version of the restart buffer. */
  public static final int RESTART_VERSION = RestartImage.VERSION;
  /** Size of the restart buffer in bytes. */
  public static final int STATE_BYTES = RestartImage.STATE_BYTES;
  /** Default bound of the raw-clock gate, s: the largest step between cycles taken unconfirmed. */
  public static final double DEFAULT_MAX_RAW_STEP_S = 60.0;

  private final TableSet tables;
  private final ProperTimeTracker tracker;
  private final ClockServo servo;
  private final RawClockGate gate;
  private final CycleState state = new CycleState();
  private final RestartImage restart;
  private final CorrectedTime time;
  private final boolean applyModel;
  private final LunarOffsetStage lunar;
  private final SplitTime cycleTime = new SplitTime();
  private final SplitTime servoTime = new SplitTime();
  private final SplitTime scratch = new SplitTime();
  private int restoreStatus = Status.NOT_READY;
  private final int[] restoreCounts = new int[Status.COUNT];

  /**
   * Creates a corrector with the default raw-clock bound ({@value #DEFAULT_MAX_RAW_STEP_S} s).
   *
   * @param model the relativistic model configuration
   * @param applyModel whether the corrected time includes the relativistic model (false only to
   *     show, in simulations, what the model does)
   * @param counterIsSteered true when the host's raw counter is driven in frequency by the steered
   *     synthesizer (the frequency steering is then in the reading; phase steps are added in software)
   */
  public ClockCorrector(ModelConfig model, boolean applyModel, boolean counterIsSteered) {
    this(model, applyModel, counterIsSteered, DEFAULT_MAX_RAW_STEP_S);
  }

  /**
   * Creates a corrector.
   *
   * @param model the relativistic model configuration
   * @param applyModel whether the corrected time includes the relativistic model
   * @param counterIsSteered true when the host's raw counter is driven by the steered synthesizer
   * @param maxRawStepS the raw-clock gate's bound: the largest step of the raw clock between two
   *     cycles that is taken without confirmation by the next reading, s (1e-3 to 1e6)
   * @throws IllegalArgumentException for a bound out of range or a configured field its own
   *     table refuses (construction time)
   */
  public ClockCorrector(ModelConfig model, boolean applyModel, boolean counterIsSteered, double maxRawStepS) {
    this.tables = new TableSet(model);
    this.tracker = new ProperTimeTracker(model, tables.gravity());
    this.servo = new ClockServo(tables.servo());
    this.gate = new RawClockGate(maxRawStepS);
    this.applyModel = applyModel;
    this.time = new CorrectedTime(tracker, servo, gate, state, applyModel, counterIsSteered);
    this.lunar = model.body().centre() == CentralBody.CENTRE_MOON ? new LunarOffsetStage(tables.lunarTime().table())
        : null;
    this.restart = new RestartImage(model, applyModel, counterIsSteered, maxRawStepS, tracker, servo, gate, state,
        tables);
  }

  /**
   * One cycle. Data flows one way, each stage once:
   *
   * <pre>
   *   raw reading  -> raw-clock gate (refused readings stop the cycle here)
   *                -> steering S at the reading, from the state the previous cycle left
   *                -> the cycle's instant on the target scale, raw + S + M_prev (the previous
   *                   cycle's model extrapolated: the only value that crosses from cycle to cycle)
   *   orbit sample -> model (validation, frames, rate, integration or bridging) at that instant
   *   model        -> servo: the measurement's instant is raw + S + M with this cycle's model
   *   servo        -> command, steering phase, phase step; {@link #correctedTime} reads them
   *   Moon-centred -> TL - TT at the clock from the lunar table at the servo's instant (held and
   *                   flagged when refused; housekeeping's lunar fields)
   * </pre>
   *
   * @param raw the raw clock reading at this cycle
   * @param orbit the newest orbit estimate, or null
   * @param measurement the newest time-offset measurement, or null
   * @return the raw-clock gate's refusal (EPOCH_NOT_INCREASING, EPOCH_JUMP: nothing else ran), else
   *     {@link Status#MODEL_HELD} (the model's value was not finite), else the servo's verdict on
   *     the measurement ({@link ClockServo#cycle}); every verdict is also in housekeeping
   */
  @CheckReturnValue
  public int cycle(SplitTime raw, OrbitSample orbit, TimeOffsetMeasurement measurement) {
    final boolean first = !gate.hasReading();
    final int rawVerdict = gate.admit(raw);
    if (Status.isFault(rawVerdict)) {
      return rawVerdict;
    }
    state.cycles++;
    final double stepsBefore = servo.phaseStepTotalS();
    final double steering = time.steeringAtCycle(first);
    final double modelBefore = time.heldIfNotFinite(time.model(raw, steering));
    time.timeOf(raw, steering, modelBefore, cycleTime); // the model's instant: this cycle's prediction
    final int orbitStatus = tracker.step(cycleTime, orbit);
    if (orbit != null) {
      state.lastOrbitStatus = orbitStatus;
    }
    final double model = time.model(raw, steering);
    final boolean modelFinite = Double.isFinite(model);
    final double modelAfter = time.heldIfNotFinite(model);
    state.heldModelS = modelAfter;
    time.timeOf(raw, steering, modelAfter, servoTime); // the servo's instant: with this cycle's model
    final int sol = tracker.solutionStatus();
    final boolean orbitUsable = !applyModel || (modelFinite && (sol == Status.OK || sol == Status.DEGRADED_BRIDGED));
    final int verdict = servo.cycle(servoTime, gate.elapsedS(), orbitUsable, measurement);
    state.lastPhaseStepS = servo.phaseStepTotalS() - stepsBefore;
    state.lastModelStepS = modelAfter - modelBefore;
    if (lunar != null) {
      lunar.update(servoTime, tracker); // its status and counters go to housekeeping, not to the cycle's verdict
    }
    if (!modelFinite) {
      state.modelHeldCycles++;
      return Status.MODEL_HELD;
    }
    return verdict;
  }

  /**
   * The corrected time for a raw clock reading (normally between two cycles, for stamping).
   *
   * @param raw raw clock reading
   * @param out receives the corrected time (an estimate of the target scale)
   */
  public void correctedTime(SplitTime raw, SplitTime out) {
    time.at(raw, out);
  }

  /**
   * The corrected time of a raw reading in TT, for a Moon-centred configuration: its corrected
   * time is TL, and TT = TL - (TL - TT) with the lunar value of the last cycle ({@link
   * Housekeeping#tlMinusTtS}).
   *
   * @param raw raw clock reading
   * @param out receives TT; unchanged when no lunar value was ever valid
   * @return {@link Status#OK} when the last cycle's lunar value was valid; the last cycle's
   *     refusal (OUT_OF_RANGE, NOT_READY, ...) when a held value was used, so the result is flagged;
   *     {@link Status#NOT_READY} when no value was ever valid or the configuration is Earth-centred
   *     (out unchanged)
   */
  @CheckReturnValue
  public int correctedTimeTt(SplitTime raw, SplitTime out) {
    if (lunar == null) {
      return Status.NOT_READY;
    }
    correctedTime(raw, scratch);
    return lunar.toTt(scratch, out);
  }

  /**
   * Stamps the corrected time of a raw reading as a CCSDS CUC in TAI (TAI = TT - 32.184 s).
   *
   * @param raw raw clock reading
   * @param codec the CUC layout
   * @param out buffer
   * @param offset where to write
   * @return the codec's status
   */
  @CheckReturnValue
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
   * Loads an uplink image into a table's staged buffer and validates it; the active one is untouched.
   *
   * @param tableId a {@link TableId} code
   * @param image buffer
   * @param offset first byte of the image
   * @param length bytes given
   * @return {@link Status#OUT_OF_RANGE} for an unknown table (or the lunar table of an Earth-centred
   *     configuration), else the table's load status
   */
  @CheckReturnValue
  public int loadTable(int tableId, byte[] image, int offset, int length) {
    final UplinkTable t = tables.table(tableId);
    return t != null ? t.load(image, offset, length) : Status.OUT_OF_RANGE;
  }

  /**
   * Activates the validated staged table: from the next use on, the core works with it.
   *
   * @param tableId a {@link TableId} code
   * @return {@link Status#OK}, {@link Status#NOT_READY} (nothing validated staged), {@link Status#OUT_OF_RANGE}
   */
  @CheckReturnValue
  public int activateTable(int tableId) {
    final UplinkTable t = tables.table(tableId);
    return t != null ? t.activate() : Status.OUT_OF_RANGE;
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
    final UplinkTable t = tables.table(tableId);
    if (t == null) {
      return Status.OUT_OF_RANGE;
    }
    t.status(out);
    return Status.OK;
  }

  /**
   * The active leap-second table for UTC conversions (uplinked as {@link TableId#LEAP_SECONDS}).
   *
   * @return the table (queries return NOT_READY until one is active)
   */
  public LeapSecondTable leapSeconds() {
    return tables.leapSeconds();
  }

  /**
   * Fills a housekeeping snapshot.
   *
   * @param hk the caller's snapshot
   */
  public void housekeeping(Housekeeping hk) {
    hk.fillServo(servo);
    hk.fillModel(tracker);
    hk.lastOrbitStatus = state.lastOrbitStatus;
    hk.modelHeldCycles = state.modelHeldCycles;
    hk.lastPhaseStepS = state.lastPhaseStepS;
    hk.lastModelStepS = state.lastModelStepS;
    hk.rawClockStatus = gate.lastStatus();
    for (int i = 0; i < Status.COUNT; i++) {
      hk.rawClockCounts[i] = gate.count(i);
    }
    tables.status(hk.tables);
    if (lunar != null) {
      lunar.fill(hk);
    }
    hk.restoreStatus = restoreStatus;
    for (int i = 0; i < Status.COUNT; i++) {
      hk.restoreCounts[i] = restoreCounts[i];
    }
    hk.cycles = state.cycles;
  }

  /**
   * Writes the complete state into a restart buffer (layout in docs/servo.md).
   *
   * @param buffer the buffer
   * @param offset where to write
   * @param length bytes available (at least {@link #STATE_BYTES})
   * @return {@link Status#OK} or {@link Status#BUFFER_TOO_SMALL}
   */
  @CheckReturnValue
  public int save(byte[] buffer, int offset, int length) {
    return restart.save(buffer, offset, length);
  }

  /**
   * Restores the state from a restart buffer. Refused, with the state left exactly as it was: a
   * wrong size, magic, version, length ({@link Status#BUFFER_TOO_SMALL}, {@link
   * Status#MALFORMED}), CRC ({@link Status#CHECKSUM_MISMATCH}), a buffer of another configuration
   * or saved under other active gravity or servo tables ({@link Status#CONFIGURATION_MISMATCH}),
   * or any field out of its range or not finite ({@link Status#OUT_OF_RANGE}, {@link
   * Status#NOT_FINITE}). A refusal means a cold start when freshly built.
   *
   * @param buffer the buffer
   * @param offset where it starts
   * @param length bytes given
   * @return {@link Status#OK} or the refusal; every answer is counted in housekeeping by code
   *     ({@link Housekeeping#restoreCounts})
   */
  @CheckReturnValue
  public int restore(byte[] buffer, int offset, int length) {
    final int st = restart.restore(buffer, offset, length);
    if (st == Status.OK) {
      gate.dropHeld();
      state.cycles = 0;
    }
    restoreStatus = st;
    restoreCounts[st]++;
    return st;
  }

  /** The model tracker, for the package's tests (read-only use). */
  ProperTimeTracker tracker() {
    return tracker;
  }

  /** The servo, for the package's tests (read-only use). */
  ClockServo servo() {
    return servo;
  }
}
