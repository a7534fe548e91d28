package org.eigenzeit.onboard.time;

import org.eigenzeit.onboard.status.Status;

/**
 * UTC through an uploadable leap-second table in the IERS/NIST {@code leap-seconds.list} format.
 *
 * <p>Life cycle (load, validate, activate): {@link #load(byte[], int)} parses the text into an
 * inactive buffer and checks its {@code #h} SHA-1 hash; {@link #activate()} makes the staged table
 * the one in use. A table that fails its hash is never staged. Queries after the table's
 * {@code #@} expiry still return the last known offset but report {@link
 * Status#LEAP_TABLE_EXPIRED}, so an expired table is never used silently.
 *
 * <p>Format (as published by the IERS and shipped in the tz database): lines starting with
 * {@code #$} (last update) and {@code #@} (expiry) carry NTP seconds (from 1900-01-01T00:00 UTC);
 * {@code #h} carries five hexadecimal words of SHA-1 over the concatenated digits of the update
 * time, the expiry time and the first two fields of every data line; data lines hold
 * {@code NTP-seconds TAI-UTC}; other {@code #} lines are comments.
 *
 * <p>Validity: from 1972-01-01 (integer offsets only; the pre-1972 rubber-second era is out of
 * range and reported as {@link Status#OUT_OF_RANGE}). During an inserted leap second the UTC
 * label is held at 23:59:59 plus the fraction and {@link Status#LEAP_SECOND_IN_PROGRESS} is
 * reported, because a label count cannot express 23:59:60.
 *
 * <p>Capacity is fixed at {@value #CAPACITY} entries. Nothing allocates after construction.
 * Mutable, not thread-safe: load, activate and query from one thread, or guard externally.
 */
public final class LeapSecondTable {
  /** Maximum number of entries. */
  public static final int CAPACITY = 64;
  /** NTP seconds (from 1900-01-01T00:00 UTC) at J2000.0 (2000-01-01T12:00 UTC labels): 36524.5 d. */
  public static final long NTP_AT_J2000_S = 3_155_716_800L;
  /** Largest TAI-UTC accepted in a table, seconds (range check). */
  public static final int MAX_OFFSET_S = 1000;

  private final long[] activeStartUtcS = new long[CAPACITY];
  private final int[] activeOffsetS = new int[CAPACITY];
  private int activeCount;
  private long activeExpiryUtcS;
  private long activeUpdateUtcS;

  private final long[] stagedStartUtcS = new long[CAPACITY];
  private final int[] stagedOffsetS = new int[CAPACITY];
  private int stagedCount;
  private long stagedExpiryUtcS;
  private long stagedUpdateUtcS;
  private boolean staged;

  private final Sha1 sha1 = new Sha1();
  private final int[] expectedHash = new int[5];
  private final int[] actualHash = new int[5];
  private final long[] fields = new long[2];
  private final int[] fieldDigitStart = new int[2];
  private final int[] fieldDigitEnd = new int[2];

  /** Creates an empty table; no query succeeds until a table is loaded and activated. */
  public LeapSecondTable() {
    // empty
  }

  /**
   * Parses a leap-second file into the inactive buffer and checks its hash.
   *
   * @param text the file's bytes (ASCII)
   * @param length number of bytes to read from {@code text}
   * @return {@link Status#OK} when staged; {@link Status#MALFORMED} (a line could not be parsed,
   *     or the {@code #$}, {@code #@} or {@code #h} line is missing), {@link Status#OUT_OF_RANGE}
   *     (offsets not increasing by whole seconds, times not increasing, values out of range),
   *     {@link Status#CAPACITY_EXCEEDED}, {@link Status#BUFFER_TOO_SMALL} or {@link
   *     Status#CHECKSUM_MISMATCH}. On any fault nothing is staged.
   */
  public int load(byte[] text, int length) {
    staged = false;
    if (length < 0 || length > text.length) {
      return Status.BUFFER_TOO_SMALL;
    }
    int count = 0;
    boolean haveUpdate = false;
    boolean haveExpiry = false;
    boolean haveHash = false;
    long updateNtp = 0;
    long expiryNtp = 0;
    int lineStart = 0;
    int guard = 0;
    while (lineStart < length && guard++ < length + 1) {
      int lineEnd = lineStart;
      while (lineEnd < length && text[lineEnd] != '\n') {
        lineEnd++;
      }
      final int status;
      if (lineEnd - lineStart >= 2 && text[lineStart] == '#') {
        final byte kind = text[lineStart + 1];
        if (kind == '$') {
          status = parseNumbers(text, lineStart + 2, lineEnd, 1);
          updateNtp = fields[0];
          haveUpdate = status == Status.OK;
        } else if (kind == '@') {
          status = parseNumbers(text, lineStart + 2, lineEnd, 1);
          expiryNtp = fields[0];
          haveExpiry = status == Status.OK;
        } else if (kind == 'h') {
          status = parseHash(text, lineStart + 2, lineEnd);
          haveHash = status == Status.OK;
        } else {
          status = Status.OK;
        }
      } else if (lineEnd > lineStart && text[lineStart] == '#') {
        status = Status.OK;
      } else if (isBlank(text, lineStart, lineEnd)) {
        status = Status.OK;
      } else {
        status = parseDataLine(text, lineStart, lineEnd, count);
        if (status == Status.OK) {
          count++;
        }
      }
      if (status != Status.OK) {
        return status;
      }
      lineStart = lineEnd + 1;
    }
    if (!haveUpdate || !haveExpiry || !haveHash || count == 0) {
      return Status.MALFORMED;
    }
    final int hashStatus = verifyHash(text, length, updateNtp, expiryNtp);
    if (hashStatus != Status.OK) {
      return hashStatus;
    }
    stagedCount = count;
    stagedUpdateUtcS = updateNtp - NTP_AT_J2000_S;
    stagedExpiryUtcS = expiryNtp - NTP_AT_J2000_S;
    staged = true;
    return Status.OK;
  }

  /**
   * Makes the staged table the active one.
   *
   * @return {@link Status#OK}, or {@link Status#NOT_READY} when nothing valid is staged
   */
  public int activate() {
    if (!staged) {
      return Status.NOT_READY;
    }
    System.arraycopy(stagedStartUtcS, 0, activeStartUtcS, 0, stagedCount);
    System.arraycopy(stagedOffsetS, 0, activeOffsetS, 0, stagedCount);
    activeCount = stagedCount;
    activeExpiryUtcS = stagedExpiryUtcS;
    activeUpdateUtcS = stagedUpdateUtcS;
    staged = false;
    return Status.OK;
  }

  /**
   * Tells whether a table is active.
   *
   * @return true after a successful {@link #activate()}
   */
  public boolean isActive() {
    return activeCount > 0;
  }

  /**
   * Number of entries in the active table.
   *
   * @return the count (0 when none is active)
   */
  public int size() {
    return activeCount;
  }

  /**
   * Expiry of the active table, in UTC seconds since J2000.0.
   *
   * @return the expiry
   */
  public long expiryUtcS() {
    return activeExpiryUtcS;
  }

  /**
   * Last update of the active table, in UTC seconds since J2000.0.
   *
   * @return the update time
   */
  public long updateUtcS() {
    return activeUpdateUtcS;
  }

  /**
   * UTC to TAI.
   *
   * @param utc instant in UTC labels
   * @param taiOut receives the instant in TAI (may be {@code utc}); unchanged on a fault
   * @return {@link Status#OK}, {@link Status#LEAP_TABLE_EXPIRED} (value given), {@link
   *     Status#NOT_READY} (no table) or {@link Status#OUT_OF_RANGE} (before the first entry)
   */
  public int utcToTai(SplitTime utc, SplitTime taiOut) {
    if (activeCount == 0) {
      return Status.NOT_READY;
    }
    final long label = utc.wholeSeconds();
    if (label < activeStartUtcS[0]) {
      return Status.OUT_OF_RANGE;
    }
    int k = 0;
    for (int i = activeCount - 1; i >= 0; i--) {
      if (label >= activeStartUtcS[i]) {
        k = i;
        break;
      }
    }
    taiOut.set(label + activeOffsetS[k], utc.fractionS());
    return label >= activeExpiryUtcS ? Status.LEAP_TABLE_EXPIRED : Status.OK;
  }

  /**
   * TAI to UTC.
   *
   * @param tai instant in TAI
   * @param utcOut receives the instant in UTC labels (may be {@code tai}); unchanged on a fault
   * @return {@link Status#OK}, {@link Status#LEAP_SECOND_IN_PROGRESS}, {@link
   *     Status#LEAP_TABLE_EXPIRED} (value given), {@link Status#NOT_READY} or {@link
   *     Status#OUT_OF_RANGE}
   */
  public int taiToUtc(SplitTime tai, SplitTime utcOut) {
    if (activeCount == 0) {
      return Status.NOT_READY;
    }
    final long taiWhole = tai.wholeSeconds();
    if (taiWhole < activeStartUtcS[0] + activeOffsetS[0]) {
      return Status.OUT_OF_RANGE;
    }
    int k = 0;
    for (int i = activeCount - 1; i >= 0; i--) {
      if (taiWhole >= activeStartUtcS[i] + activeOffsetS[i]) {
        k = i;
        break;
      }
    }
    int status = Status.OK;
    long label = taiWhole - activeOffsetS[k];
    if (k + 1 < activeCount) {
      final long nextStartTai = activeStartUtcS[k + 1] + activeOffsetS[k + 1];
      final int inserted = activeOffsetS[k + 1] - activeOffsetS[k];
      if (inserted > 0 && taiWhole >= nextStartTai - inserted) {
        label = activeStartUtcS[k + 1] - 1;
        status = Status.LEAP_SECOND_IN_PROGRESS;
      }
    }
    utcOut.set(label, tai.fractionS());
    if (status == Status.OK && label >= activeExpiryUtcS) {
      status = Status.LEAP_TABLE_EXPIRED;
    }
    return status;
  }

  private int parseDataLine(byte[] text, int start, int end, int index) {
    final int status = parseNumbers(text, start, end, 2);
    if (status != Status.OK) {
      return status;
    }
    if (index >= CAPACITY) {
      return Status.CAPACITY_EXCEEDED;
    }
    final long startUtc = fields[0] - NTP_AT_J2000_S;
    final long offset = fields[1];
    if (offset < 0 || offset > MAX_OFFSET_S) {
      return Status.OUT_OF_RANGE;
    }
    if (index > 0 && (startUtc <= stagedStartUtcS[index - 1]
        || Math.abs(offset - stagedOffsetS[index - 1]) != 1)) {
      return Status.OUT_OF_RANGE;
    }
    stagedStartUtcS[index] = startUtc;
    stagedOffsetS[index] = (int) offset;
    return Status.OK;
  }

  /** Parses {@code n} unsigned decimal fields, stopping at a '#' comment; records digit spans. */
  private int parseNumbers(byte[] text, int start, int end, int n) {
    int pos = start;
    for (int f = 0; f < n; f++) {
      while (pos < end && isSpace(text[pos])) {
        pos++;
      }
      final int digitStart = pos;
      long value = 0;
      while (pos < end && text[pos] >= '0' && text[pos] <= '9') {
        if (pos - digitStart >= 12) {
          return Status.OUT_OF_RANGE;
        }
        value = value * 10 + (text[pos] - '0');
        pos++;
      }
      if (pos == digitStart || (pos < end && !isSpace(text[pos]) && text[pos] != '#')) {
        return Status.MALFORMED;
      }
      fields[f] = value;
      fieldDigitStart[f] = digitStart;
      fieldDigitEnd[f] = pos;
    }
    return Status.OK;
  }

  private int parseHash(byte[] text, int start, int end) {
    int pos = start;
    for (int word = 0; word < 5; word++) {
      while (pos < end && isSpace(text[pos])) {
        pos++;
      }
      final int digitStart = pos;
      int value = 0;
      while (pos < end && hexValue(text[pos]) >= 0) {
        if (pos - digitStart >= 8) {
          return Status.MALFORMED;
        }
        value = (value << 4) | hexValue(text[pos]);
        pos++;
      }
      if (pos == digitStart) {
        return Status.MALFORMED;
      }
      expectedHash[word] = value;
    }
    return Status.OK;
  }

  /** Second pass: SHA-1 over the digits of #$, #@ and the first two fields of each data line. */
  private int verifyHash(byte[] text, int length, long updateNtp, long expiryNtp) {
    sha1.reset();
    feedDecimal(updateNtp);
    feedDecimal(expiryNtp);
    int lineStart = 0;
    int guard = 0;
    while (lineStart < length && guard++ < length + 1) {
      int lineEnd = lineStart;
      while (lineEnd < length && text[lineEnd] != '\n') {
        lineEnd++;
      }
      if (lineEnd > lineStart && text[lineStart] != '#' && !isBlank(text, lineStart, lineEnd)
          && parseNumbers(text, lineStart, lineEnd, 2) == Status.OK) {
        for (int f = 0; f < 2; f++) {
          for (int i = fieldDigitStart[f]; i < fieldDigitEnd[f]; i++) {
            sha1.update(text[i]);
          }
        }
      }
      lineStart = lineEnd + 1;
    }
    sha1.finish(actualHash);
    for (int i = 0; i < 5; i++) {
      if (actualHash[i] != expectedHash[i]) {
        return Status.CHECKSUM_MISMATCH;
      }
    }
    return Status.OK;
  }

  private void feedDecimal(long value) {
    long divisor = 1;
    while (divisor <= value / 10) {
      divisor *= 10;
    }
    long rest = value;
    while (divisor > 0) {
      sha1.update((byte) ('0' + (rest / divisor)));
      rest %= divisor;
      divisor /= 10;
    }
  }

  private static boolean isSpace(byte b) {
    return b == ' ' || b == '\t' || b == '\r';
  }

  private static boolean isBlank(byte[] text, int start, int end) {
    for (int i = start; i < end; i++) {
      if (!isSpace(text[i])) {
        return false;
      }
    }
    return true;
  }

  private static int hexValue(byte b) {
    if (b >= '0' && b <= '9') {
      return b - '0';
    }
    if (b >= 'a' && b <= 'f') {
      return b - 'a' + 10;
    }
    if (b >= 'A' && b <= 'F') {
      return b - 'A' + 10;
    }
    return -1;
  }
}
