package org.eigenzeit.onboard.table;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;

/**
 * The one uplink mechanism for every table the core accepts: stage, validate, activate, with
 * counters. {@link #load} checks the frame (bounds, magic, version, count, length), then the
 * CRC-32C, then hands the payload to the table type's content rules ({@link TableLayout#stage}),
 * which write only the staged buffer; {@link #activate} makes a validated staged table the active
 * one. Double-buffered: a refused or unvalidated upload never replaces the active table, and a new
 * load discards whatever was staged before it.
 *
 * <p>Counters: loads (every call), CRC failures, range failures (content refused: NOT_FINITE or
 * OUT_OF_RANGE), format failures (bounds, frame, count: BUFFER_TOO_SMALL, MALFORMED,
 * CAPACITY_EXCEEDED), activations, the last load status and refused item, and the CRC of the
 * active table (what is active is always reported).
 *
 * <p>Mutable; one owner. No allocation after construction.
 */
public final class UplinkTable {
  /** Bytes of the frame around the payload: header 8, CRC 4. */
  public static final int FRAME_BYTES = 12;

  private final TableLayout layout;
  private final CRC32C crc = new CRC32C();
  private final StateReader reader = new StateReader();
  private boolean stagedValid;
  private boolean active;
  private int stagedCrc;
  private int activeCrc;
  private int loads;
  private int crcFailures;
  private int rangeFailures;
  private int formatFailures;
  private int activations;
  private int lastStatus = Status.NOT_READY;
  private int lastFailedItem = -1;

  /**
   * Creates the mechanism around a table type, nothing active.
   *
   * @param layout the table type's layout and content
   */
  public UplinkTable(TableLayout layout) {
    this.layout = layout;
  }

  /**
   * Loads an image into the staged buffer and validates it.
   *
   * @param image buffer
   * @param offset first byte of the image
   * @param length bytes given (must be the image's length)
   * @return {@link Status#OK} (staged, not active), {@link Status#BUFFER_TOO_SMALL} (bounds or
   *     length), {@link Status#MALFORMED} (magic, version, count or content layout), {@link
   *     Status#CAPACITY_EXCEEDED}, {@link Status#CHECKSUM_MISMATCH}, {@link Status#NOT_FINITE} or
   *     {@link Status#OUT_OF_RANGE} (content; see {@link #lastFailedItem()})
   */
  @CheckReturnValue
  public int load(byte[] image, int offset, int length) {
    loads++;
    stagedValid = false;
    lastFailedItem = -1;
    final int st = check(image, offset, length);
    lastStatus = st;
    if (st == Status.CHECKSUM_MISMATCH) {
      crcFailures++;
    } else if (st == Status.OUT_OF_RANGE || st == Status.NOT_FINITE) {
      rangeFailures++;
    } else if (st != Status.OK) {
      formatFailures++;
    }
    stagedValid = st == Status.OK;
    return st;
  }

  private int check(byte[] image, int offset, int length) {
    if (offset < 0 || length < FRAME_BYTES || offset > image.length - length) {
      return Status.BUFFER_TOO_SMALL;
    }
    reader.reset(image, offset, length);
    final int magic = reader.getInt();
    final int versionAndCount = reader.getInt();
    if (magic != layout.magic() || (versionAndCount >>> 16) != layout.version()) {
      return Status.MALFORMED;
    }
    final int count = versionAndCount & 0xFFFF;
    final int countStatus = layout.checkCount(count);
    if (countStatus != Status.OK) {
      return countStatus;
    }
    if (length != layout.imageBytes(count)) {
      return Status.BUFFER_TOO_SMALL;
    }
    crc.reset();
    crc.update(image, offset, length - 4);
    final int expected = (int) crc.getValue();
    reader.reset(image, offset + length - 4, 4);
    if (reader.getInt() != expected) {
      return Status.CHECKSUM_MISMATCH;
    }
    reader.reset(image, offset + 8, length - FRAME_BYTES);
    final int content = layout.stage(reader, count);
    if (content != Status.OK) {
      lastFailedItem = layout.failedItem();
      return content;
    }
    if (reader.status() != Status.OK || reader.position() != offset + length - 4) {
      return Status.MALFORMED; // the layout read past or short of its payload: a defect of the layout
    }
    stagedCrc = expected;
    return Status.OK;
  }

  /**
   * Activates the staged table.
   *
   * @return {@link Status#OK}, or {@link Status#NOT_READY} when no validated table is staged
   */
  @CheckReturnValue
  public int activate() {
    if (!stagedValid) {
      return Status.NOT_READY;
    }
    layout.activate();
    active = true;
    activeCrc = stagedCrc;
    stagedValid = false;
    activations++;
    return Status.OK;
  }

  /**
   * Fills a housekeeping snapshot of this table.
   *
   * @param out the caller's holder
   */
  public void status(TableStatus out) {
    out.active = active;
    out.activeCrc = activeCrc;
    out.staged = stagedValid;
    out.loads = loads;
    out.crcFailures = crcFailures;
    out.rangeFailures = rangeFailures;
    out.formatFailures = formatFailures;
    out.activations = activations;
    out.lastLoadStatus = lastStatus;
    out.lastFailedItem = lastFailedItem;
  }

  /**
   * Returns whether a table is active.
   *
   * @return whether a table is active
   */
  public boolean isActive() {
    return active;
  }

  /**
   * Returns the CRC-32C of the active table's image (0 when none is active).
   *
   * @return the CRC, as a 32-bit word
   */
  public int activeCrc() {
    return activeCrc;
  }

  /**
   * Returns the status of the last load.
   *
   * @return the status code
   */
  public int lastLoadStatus() {
    return lastStatus;
  }

  /**
   * Returns the item the last load's content check refused (-1 when none).
   *
   * @return the item
   */
  public int lastFailedItem() {
    return lastFailedItem;
  }
}
