package org.eigenzeit.onboard.corrector;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.corrector.rawclock.RawClockGate;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.servo.ClockServo;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;

/**
 * The warm-restart buffer of a corrector (big-endian):
 *
 * <pre>
 *   magic "EZRS", version 2, length, configuration identity (u32)
 *   model state (ProperTimeTracker), servo state (ClockServo), raw-clock gate, corrector state
 *   CRC-32C of every byte before it
 * </pre>
 *
 * The identity is the CRC-32C of the configuration (body constants, model level, degree, tides,
 * c^-4, math mode, UT1 - TT, steps, tolerances and limits, the corrector's options) followed by
 * the CRCs of the active gravity and servo tables: a buffer from another configuration, or saved
 * under other tables, is refused. Restore checks, in order: bounds, magic, version, length, CRC,
 * identity; then every field's range and finiteness while it is applied, and on any refusal the
 * state from before the call is put back from a copy taken at the start: a refused restore leaves
 * the state as it was (its own save gives the same bytes).
 *
 * <p>Mutable; one owner (the corrector). No allocation after construction.
 */
final class RestartImage {
  static final int MAGIC = 0x455A5253;
  static final int VERSION = 2;
  static final int HEADER_BYTES = 16;
  static final int STATE_BYTES = HEADER_BYTES + ProperTimeTracker.STATE_BYTES + ClockServo.STATE_BYTES
      + RawClockGate.STATE_BYTES + CycleState.STATE_BYTES + 4;

  private final ProperTimeTracker tracker;
  private final ClockServo servo;
  private final RawClockGate gate;
  private final CycleState state;
  private final TableSet tables;
  private final byte[] configuration;
  private final byte[] tableCrcs = new byte[8];
  private final byte[] rollback = new byte[STATE_BYTES];
  private final CRC32C crc = new CRC32C();
  private final StateWriter writer = new StateWriter();
  private final StateReader reader = new StateReader();

  RestartImage(ModelConfig config, boolean applyModel, boolean counterIsSteered, double maxRawStepS,
      ProperTimeTracker tracker, ClockServo servo, RawClockGate gate, CycleState state, TableSet tables) {
    this.tracker = tracker;
    this.servo = servo;
    this.gate = gate;
    this.state = state;
    this.tables = tables;
    this.configuration = ConfigIdentity.bytes(config, applyModel, counterIsSteered, maxRawStepS);
  }

  /** CRC-32C of the configuration and the active gravity and servo tables' CRCs. */
  int identity() {
    final int g = tables.table(TableId.GRAVITY).activeCrc();
    final int s = tables.table(TableId.SERVO).activeCrc();
    for (int i = 0; i < 4; i++) {
      tableCrcs[i] = (byte) (g >> (24 - 8 * i));
      tableCrcs[4 + i] = (byte) (s >> (24 - 8 * i));
    }
    crc.reset();
    crc.update(configuration, 0, configuration.length);
    crc.update(tableCrcs, 0, 8);
    return (int) crc.getValue();
  }

  int save(byte[] buffer, int offset, int length) {
    if (offset < 0 || length < STATE_BYTES || offset > buffer.length - STATE_BYTES) {
      return Status.BUFFER_TOO_SMALL;
    }
    writer.reset(buffer, offset, STATE_BYTES);
    writer.putInt(MAGIC);
    writer.putInt(VERSION);
    writer.putInt(STATE_BYTES);
    writer.putInt(identity());
    tracker.save(writer);
    servo.save(writer);
    gate.save(writer);
    state.save(writer);
    crc.reset();
    crc.update(buffer, offset, STATE_BYTES - 4);
    writer.putInt((int) crc.getValue());
    return writer.status();
  }

  int restore(byte[] buffer, int offset, int length) {
    final int checked = check(buffer, offset, length);
    if (checked != Status.OK) {
      return checked;
    }
    if (save(rollback, 0, STATE_BYTES) != Status.OK) {
      return Status.BUFFER_TOO_SMALL; // unreachable: the rollback copy has the state's size
    }
    final int st = apply(buffer, offset);
    if (st != Status.OK && apply(rollback, 0) != Status.OK) {
      return Status.MALFORMED; // unreachable: the corrector's own state always restores
    }
    return st;
  }

  private int apply(byte[] buffer, int offset) {
    reader.reset(buffer, offset + HEADER_BYTES, STATE_BYTES - HEADER_BYTES - 4);
    final int t = tracker.restore(reader);
    final int s = servo.restore(reader);
    gate.restore(reader);
    state.restore(reader);
    return t != Status.OK ? t : s != Status.OK ? s : reader.status();
  }

  private int check(byte[] buffer, int offset, int length) {
    if (offset < 0 || length < STATE_BYTES || offset > buffer.length - STATE_BYTES) {
      return Status.BUFFER_TOO_SMALL;
    }
    reader.reset(buffer, offset, HEADER_BYTES);
    if (reader.getInt() != MAGIC || reader.getInt() != VERSION || reader.getInt() != STATE_BYTES) {
      return Status.MALFORMED;
    }
    final int savedIdentity = reader.getInt();
    crc.reset();
    crc.update(buffer, offset, STATE_BYTES - 4);
    final int expected = (int) crc.getValue();
    reader.reset(buffer, offset + STATE_BYTES - 4, 4);
    if (reader.getInt() != expected) {
      return Status.CHECKSUM_MISMATCH;
    }
    return savedIdentity == identity() ? Status.OK : Status.CONFIGURATION_MISMATCH;
  }
}
