package org.eigenzeit.onboard.time;

import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;

/**
 * CCSDS Unsegmented Time Code (CUC) encoder and decoder, after CCSDS 301.0-B-4 "Time Code
 * Formats" (Blue Book, 2010), section 3.2, with a configurable number of coarse (whole-second)
 * and fine (binary fraction) octets.
 *
 * <p>P-field (preamble), bit 0 being the most significant bit of each octet (CCSDS numbering):
 *
 * <pre>
 *  octet 1: bit 0      extension flag (1 = a second P-field octet follows)
 *           bits 1-3   time code identification: 001 = Level 1 (epoch 1958-01-01T00:00:00 TAI),
 *                      010 = Level 2 (agency-defined epoch)
 *           bits 4-5   number of basic (coarse) time octets minus 1 (1 to 4 octets)
 *           bits 6-7   number of fractional (fine) time octets (0 to 3)
 *  octet 2: bit 0      extension flag (0: no further octet)
 *           bits 1-2   additional coarse octets (0 to 3)
 *           bits 3-5   additional fine octets (0 to 7)
 *           bits 6-7   reserved, zero
 * </pre>
 *
 * So a code carries 1 to 7 coarse octets and 0 to 10 fine octets. The T-field is the coarse count
 * of seconds since the epoch, then the fraction of a second times 256^fine, both big-endian
 * unsigned. The second P-field octet is written only when the layout needs it.
 *
 * <p>Resolution: the fraction is carried in a double, so fine octets beyond six add zero bits.
 * Encoding truncates toward the earlier instant (common practice for time stamps).
 *
 * <p>Immutable configuration; {@link #encode} and {@link #decode} allocate nothing and are safe
 * from several threads when they do not share buffers or instants.
 */
public final class CucCodec {
  /** Time code identification of Level 1 (1958 TAI epoch). */
  public static final int ID_LEVEL1_TAI_1958 = 0b001;
  /** Time code identification of Level 2 (agency-defined epoch). */
  public static final int ID_LEVEL2_AGENCY = 0b010;
  /** Most coarse octets a CUC can carry. */
  public static final int MAX_COARSE_OCTETS = 7;
  /** Most fine octets a CUC can carry. */
  public static final int MAX_FINE_OCTETS = 10;
  /** Most octets one code takes (2 P-field + 7 + 10). */
  public static final int MAX_CODE_OCTETS = 2 + MAX_COARSE_OCTETS + MAX_FINE_OCTETS;

  private final int coarseOctets;
  private final int fineOctets;
  private final int timeCodeId;
  private final long epochOffsetS;

  private CucCodec(int coarseOctets, int fineOctets, int timeCodeId, long epochOffsetS) {
    this.coarseOctets = coarseOctets;
    this.fineOctets = fineOctets;
    this.timeCodeId = timeCodeId;
    this.epochOffsetS = epochOffsetS;
  }

  /**
   * A Level 1 codec (epoch 1958-01-01 TAI).
   *
   * @param coarseOctets 1 to 7
   * @param fineOctets 0 to 10
   * @return the codec
   * @throws IllegalArgumentException for octet counts out of range (construction-time error)
   */
  public static CucCodec level1(int coarseOctets, int fineOctets) {
    checkLayout(coarseOctets, fineOctets);
    return new CucCodec(coarseOctets, fineOctets, ID_LEVEL1_TAI_1958, TimeScales.J2000_MINUS_1958_S);
  }

  /**
   * A Level 2 codec whose epoch is an agency-defined TAI instant.
   *
   * @param coarseOctets 1 to 7
   * @param fineOctets 0 to 10
   * @param epochTaiSecondsBeforeJ2000 TAI seconds from the agency epoch to J2000.0 (positive when
   *     the epoch lies before J2000.0)
   * @return the codec
   * @throws IllegalArgumentException for octet counts out of range (construction-time error)
   */
  public static CucCodec level2(int coarseOctets, int fineOctets, long epochTaiSecondsBeforeJ2000) {
    checkLayout(coarseOctets, fineOctets);
    return new CucCodec(coarseOctets, fineOctets, ID_LEVEL2_AGENCY, epochTaiSecondsBeforeJ2000);
  }

  private static void checkLayout(int coarse, int fine) {
    if (coarse < 1 || coarse > MAX_COARSE_OCTETS || fine < 0 || fine > MAX_FINE_OCTETS) {
      throw new IllegalArgumentException("CUC layout out of range: coarse 1..7, fine 0..10");
    }
  }

  /**
   * Length of the P-field this codec writes.
   *
   * @return 1 or 2 octets
   */
  public int preambleOctets() {
    return (coarseOctets > 4 || fineOctets > 3) ? 2 : 1;
  }

  /**
   * Total length of one code (P-field and T-field).
   *
   * @return octets
   */
  public int codeOctets() {
    return preambleOctets() + coarseOctets + fineOctets;
  }

  /**
   * Encodes a TAI instant with its P-field.
   *
   * @param tai instant in TAI
   * @param out buffer
   * @param offset where the code starts in {@code out}
   * @return {@link Status#OK}, {@link Status#BUFFER_TOO_SMALL}, or {@link Status#OVERFLOW} (the
   *     instant lies before the epoch or beyond the coarse field's range); {@code out} is
   *     unchanged on a fault
   */
  @CheckReturnValue
  public int encode(SplitTime tai, byte[] out, int offset) {
    final int n = codeOctets();
    if (offset < 0 || offset > out.length - n) {
      return Status.BUFFER_TOO_SMALL;
    }
    final long coarse = tai.wholeSeconds() + epochOffsetS;
    if (coarse < 0 || (coarse >>> (8 * coarseOctets)) != 0) { // coarseOctets <= MAX_COARSE_OCTETS (7): shift <= 56
      return Status.OVERFLOW;
    }
    int pos = offset;
    final boolean extended = preambleOctets() == 2;
    final int basicCoarse = Math.min(coarseOctets, 4);
    final int basicFine = Math.min(fineOctets, 3);
    out[pos++] = (byte) ((extended ? 0x80 : 0) | (timeCodeId << 4) | ((basicCoarse - 1) << 2) | basicFine);
    if (extended) {
      out[pos++] = (byte) (((coarseOctets - basicCoarse) << 5) | ((fineOctets - basicFine) << 2));
    }
    for (int i = coarseOctets - 1; i >= 0; i--) {
      out[pos++] = (byte) (coarse >>> (8 * i));
    }
    double fraction = tai.fractionS();
    for (int i = 0; i < fineOctets; i++) {
      fraction *= 256.0;
      final int octet = (int) Math.floor(fraction);
      out[pos++] = (byte) octet;
      fraction -= octet;
    }
    return Status.OK;
  }

  /**
   * Decodes a code written with this codec's layout, checking its P-field.
   *
   * @param in buffer
   * @param offset where the code starts
   * @param taiOut receives the instant in TAI; unchanged on a fault
   * @return {@link Status#OK}, {@link Status#BUFFER_TOO_SMALL}, or {@link Status#MALFORMED}
   *     (the P-field names another code, layout or epoch, or a reserved bit is set)
   */
  @CheckReturnValue
  public int decode(byte[] in, int offset, SplitTime taiOut) {
    if (offset < 0 || offset >= in.length) {
      return Status.BUFFER_TOO_SMALL;
    }
    final int p1 = in[offset] & 0xFF;
    final boolean extended = (p1 & 0x80) != 0;
    final int id = (p1 >>> 4) & 0x7;
    int coarse = ((p1 >>> 2) & 0x3) + 1;
    int fine = p1 & 0x3;
    int pos = offset + 1;
    if (extended) {
      if (pos >= in.length) {
        return Status.BUFFER_TOO_SMALL;
      }
      final int p2 = in[pos++] & 0xFF;
      if ((p2 & 0x80) != 0 || (p2 & 0x03) != 0) {
        return Status.MALFORMED;
      }
      coarse += (p2 >>> 5) & 0x3;
      fine += (p2 >>> 2) & 0x7;
    }
    if (id != timeCodeId || coarse != coarseOctets || fine != fineOctets
        || extended != (preambleOctets() == 2)) {
      return Status.MALFORMED;
    }
    if (pos > in.length - coarse - fine) {
      return Status.BUFFER_TOO_SMALL;
    }
    long seconds = 0;
    for (int i = 0; i < coarse; i++) {
      seconds = (seconds << 8) | (in[pos++] & 0xFF);
    }
    double fraction = 0.0;
    double scale = 1.0;
    for (int i = 0; i < fine; i++) {
      scale /= 256.0;
      fraction += (in[pos++] & 0xFF) * scale;
    }
    taiOut.setInRange(seconds - epochOffsetS, fraction);
    return Status.OK;
  }

  /**
   * Number of coarse octets.
   *
   * @return 1 to 7
   */
  public int coarseOctets() {
    return coarseOctets;
  }

  /**
   * Number of fine octets.
   *
   * @return 0 to 10
   */
  public int fineOctets() {
    return fineOctets;
  }
}
