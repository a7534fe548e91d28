package org.eigenzeit.onboard.table;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;

/**
 * Writes the frame of an uplink image (see {@link TableLayout}): the header before the payload and
 * the CRC-32C after it. Used by the encoders of the table types (ground side and tests); it
 * allocates a CRC engine per image, so it is not for the flight path.
 */
public final class TableImage {
  private TableImage() {}

  /**
   * Starts an image: checks the room and writes the header.
   *
   * @param out buffer
   * @param offset where the image starts
   * @param imageBytes the whole image's length
   * @param magic the table type
   * @param version the layout version
   * @param count the header's count (0 to 65535)
   * @param w a writer, positioned after the header on return (payload next)
   * @return {@link Status#OK}, {@link Status#BUFFER_TOO_SMALL} or {@link Status#OUT_OF_RANGE} (count)
   */
  @CheckReturnValue
  public static int begin(byte[] out, int offset, int imageBytes, int magic, int version, int count, StateWriter w) {
    if (offset < 0 || imageBytes < UplinkTable.FRAME_BYTES || offset > out.length - imageBytes) {
      return Status.BUFFER_TOO_SMALL;
    }
    if (count < 0 || count > 0xFFFF) {
      return Status.OUT_OF_RANGE;
    }
    w.reset(out, offset, imageBytes - 4);
    w.putInt(magic);
    w.putInt((version << 16) | count);
    return Status.OK;
  }

  /**
   * Ends an image: checks that the payload filled it exactly and writes the CRC.
   *
   * @param out buffer
   * @param offset where the image starts
   * @param imageBytes the whole image's length
   * @param w the writer used for the payload
   * @return {@link Status#OK} or {@link Status#BUFFER_TOO_SMALL} (the payload did not fit or fill)
   */
  @CheckReturnValue
  public static int seal(byte[] out, int offset, int imageBytes, StateWriter w) {
    if (w.status() != Status.OK || w.position() != offset + imageBytes - 4) {
      return Status.BUFFER_TOO_SMALL;
    }
    final CRC32C c = new CRC32C();
    c.update(out, offset, imageBytes - 4);
    final int v = (int) c.getValue();
    final int p = offset + imageBytes - 4;
    out[p] = (byte) (v >>> 24);
    out[p + 1] = (byte) (v >>> 16);
    out[p + 2] = (byte) (v >>> 8);
    out[p + 3] = (byte) v;
    return Status.OK;
  }
}
