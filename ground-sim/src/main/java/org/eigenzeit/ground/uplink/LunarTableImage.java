package org.eigenzeit.ground.uplink;

import org.eigenzeit.onboard.lunartime.LunarTimeLayout;
import org.eigenzeit.onboard.lunartime.LunarTimeTable;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.TableImage;

/** Frames an EZLT lunar time table for the uplink (TableId.LUNAR_TIME; layout in {@link LunarTimeLayout}). */
public final class LunarTableImage {
  private LunarTableImage() {}

  /**
   * The uplink image of an EZLT table: the mechanism's header, the table as 8-byte words, CRC-32C.
   *
   * @param ezlt the table's image (a multiple of 8 bytes)
   * @return the framed image
   * @throws IllegalArgumentException when the table's length is not a whole number of words or too long
   */
  public static byte[] frame(byte[] ezlt) {
    if (ezlt.length % 8 != 0 || ezlt.length > LunarTimeTable.MAX_IMAGE_BYTES) {
      throw new IllegalArgumentException("lunar table of " + ezlt.length + " bytes, allowed a multiple of 8 up to "
          + LunarTimeTable.MAX_IMAGE_BYTES);
    }
    final LunarTimeLayout layout = new LunarTimeLayout();
    final int words = ezlt.length / 8;
    final int bytes = layout.imageBytes(words);
    final byte[] out = new byte[bytes];
    final StateWriter w = new StateWriter();
    if (TableImage.begin(out, 0, bytes, layout.magic(), layout.version(), words, w) != Status.OK) {
      throw new IllegalArgumentException("lunar table of " + words + " words does not fit a frame");
    }
    for (int i = 0; i < words; i++) {
      long v = 0;
      for (int b = 0; b < 8; b++) {
        v = (v << 8) | (ezlt[8 * i + b] & 0xFF);
      }
      w.putLong(v);
    }
    if (TableImage.seal(out, 0, bytes, w) != Status.OK) {
      throw new IllegalStateException("lunar table frame not filled");
    }
    return out;
  }
}
