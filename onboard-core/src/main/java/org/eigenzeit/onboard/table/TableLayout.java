package org.eigenzeit.onboard.table;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.CheckReturnValue;

/**
 * What a table type supplies to the uplink mechanism ({@link UplinkTable}): its binary layout and
 * its content rules, and the two buffers (staged and active) its content lives in. Everything
 * else (header, length, CRC-32C, counters, the staged-then-activated life cycle) is the
 * mechanism's.
 *
 * <p>The image of every table type has the same frame (big-endian):
 *
 * <pre>
 *   offset 0      u32  magic (the table type)
 *   offset 4      u16  layout version
 *   offset 6      u16  count (entries, fields or degree: the table type says)
 *   offset 8      payload, {@link #imageBytes}(count) - 12 bytes
 *   end - 4       u32  CRC-32C (Castagnoli; RFC 3720 appendix B.4) of every byte before it
 * </pre>
 *
 * <p>Implementations are mutable, single-owner and allocate nothing after construction.
 */
public interface TableLayout {
  /**
   * The table type's magic number.
   *
   * @return the magic
   */
  int magic();

  /**
   * The layout version this implementation reads.
   *
   * @return the version (0 to 65535)
   */
  int version();

  /**
   * Whether a header count is acceptable.
   *
   * @param count the header's count
   * @return {@link org.eigenzeit.onboard.status.Status#OK}, {@link
   *     org.eigenzeit.onboard.status.Status#MALFORMED} (not a count of this layout) or {@link
   *     org.eigenzeit.onboard.status.Status#CAPACITY_EXCEEDED} (beyond the capacity fixed at
   *     construction)
   */
  @CheckReturnValue
  int checkCount(int count);

  /**
   * Length of a whole image (frame included) for an acceptable count.
   *
   * @param count the header's count
   * @return bytes
   */
  int imageBytes(int count);

  /**
   * Decodes the payload into the staged buffer and checks every value (finiteness, ranges, rules
   * across values). Writes only the staged buffer; the active content never changes here.
   *
   * @param payload a reader positioned at the payload (its bounds are already checked)
   * @param count the header's count (already accepted by {@link #checkCount})
   * @return {@link org.eigenzeit.onboard.status.Status#OK}, or {@code NOT_FINITE},
   *     {@code OUT_OF_RANGE} or {@code MALFORMED} for the first value refused
   */
  @CheckReturnValue
  int stage(StateReader payload, int count);

  /**
   * The item (field, entry or coefficient index; the table type says) of the last refusal by
   * {@link #stage}, or -1.
   *
   * @return the item
   */
  int failedItem();

  /** Makes the staged content the active content (called only after a successful stage). */
  void activate();
}
