package org.eigenzeit.onboard.lunartime;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.TableLayout;

/**
 * The lunar time table as a table type of the one uplink-table mechanism ({@link
 * org.eigenzeit.onboard.table.UplinkTable}): staged, CRC-checked, validated, then activated, with
 * the mechanism's counters, like the servo, gravity and leap-second tables.
 *
 * <p>Image: the mechanism's frame around the unchanged "EZLT" layout of {@link LunarTimeTable}:
 *
 * <pre>
 *   offset 0      u32  magic 0x455A4C54 ("EZLT", as the layout's own)
 *   offset 4      u16  frame version = 1
 *   offset 6      u16  count = length of the EZLT image in 8-byte words (8 + 4 m (n + 1))
 *   offset 8      the EZLT image, 8 count bytes ({@link LunarTimeTable}'s layout)
 *   end - 4       u32  CRC-32C of every byte before it
 * </pre>
 *
 * <p>Double-buffered: {@link #stage} copies the payload into the staged buffer and runs the pure
 * {@link LunarTimeTable#validate}; {@link #activate} decodes the staged image into the active
 * {@link #table()}, which is what evaluations read. A refused upload leaves the active table as it
 * was. {@link #failedItem()} is 0 (the table refuses as a whole; its status says why).
 *
 * <p>Mutable; one owner. Allocation only in the constructor.
 */
public final class LunarTimeLayout implements TableLayout {
  /** Frame version. */
  public static final int FRAME_VERSION = 1;
  /** Smallest count: the header plus one segment of the smallest degree, in 8-byte words. */
  static final int MIN_WORDS = LunarTimeTable.imageBytes(LunarTimeTable.MIN_DEGREE, 1) / 8;
  /** Largest count, in 8-byte words. */
  static final int MAX_WORDS = LunarTimeTable.MAX_IMAGE_BYTES / 8;

  private final byte[] staged = new byte[LunarTimeTable.MAX_IMAGE_BYTES];
  private int stagedBytes;
  private int failedItem = -1;
  private final LunarTimeTable active = new LunarTimeTable();

  /** Creates the layout with nothing staged and nothing active. */
  public LunarTimeLayout() {
    // buffers allocated above, for the largest table
  }

  @Override
  public int magic() {
    return LunarTimeTable.MAGIC;
  }

  @Override
  public int version() {
    return FRAME_VERSION;
  }

  @Override
  public int checkCount(int count) {
    if (count < MIN_WORDS || (count - LunarTimeTable.HEADER_BYTES / 8) % LunarTimeTable.COMPONENTS != 0) {
      return Status.MALFORMED; // not the length of an EZLT image (header plus 4 series per segment)
    }
    return count <= MAX_WORDS ? Status.OK : Status.CAPACITY_EXCEEDED;
  }

  @Override
  public int imageBytes(int count) {
    return 8 + 8 * count + 4;
  }

  @Override
  public int stage(StateReader payload, int count) {
    stagedBytes = 0;
    for (int i = 0; i < count; i++) {
      final long w = payload.getLong();
      for (int b = 0; b < 8; b++) {
        staged[8 * i + b] = (byte) (w >>> (56 - 8 * b));
      }
    }
    final int st = LunarTimeTable.validate(staged, 0, 8 * count);
    failedItem = st == Status.OK ? -1 : 0;
    if (st == Status.OK) {
      stagedBytes = 8 * count;
    }
    return st;
  }

  @Override
  public int failedItem() {
    return failedItem;
  }

  @Override
  public void activate() {
    active.install(staged, 0, stagedBytes);
  }

  /**
   * The active table (what the last activation installed; empty before the first).
   *
   * @return the table to evaluate
   */
  public LunarTimeTable table() {
    return active;
  }
}
