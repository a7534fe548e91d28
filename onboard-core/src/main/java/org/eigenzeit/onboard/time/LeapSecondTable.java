package org.eigenzeit.onboard.time;

import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.TableImage;
import org.eigenzeit.onboard.table.TableLayout;

/**
 * UTC through an uplinked leap-second table: the staged and the active table, loaded, validated
 * and activated through the corrector's uplink table for it; queries read the active one. Queries
 * after the table's expiry still return the last known offset but report {@link
 * Status#LEAP_TABLE_EXPIRED}, so an expired table is never used silently.
 *
 * <p>Image (the frame of {@link TableLayout}): magic {@code 0x455A4C53} ("EZLS"), version 1,
 * count = entries (1 to {@value #CAPACITY}), then the last update and the expiry as i64 UTC label
 * seconds since J2000.0, then per entry its start (i64, same scale), TAI - UTC from it (i32, s)
 * and a reserved i32 zero, then the CRC-32C. The ground writes it from the IERS/NIST {@code
 * leap-seconds.list} after checking that file's own hash and structure; the text never reaches
 * the flight path. Content rules, first failure wins ({@link #failedRule()} names it, {@link
 * #failedItem()} the entry or -1):
 *
 * <pre>
 *   RULE_EXPIRY           the expiry lies after the last update
 *   RULE_FIRST_ENTRY      the first entry is 1972-01-01T00:00:00 UTC with TAI - UTC = 10 s
 *   RULE_MIDNIGHT_FIRST   every entry starts at 00:00:00 UTC of the first day of a month
 *   RULE_MONTH_ORDER      every entry starts at least one calendar month after the previous one
 *   RULE_STEP             TAI - UTC changes by exactly +1 s (an inserted leap second) or -1 s (a
 *                         removed one, which the format allows and has never happened)
 *   RULE_BEFORE_EXPIRY    every entry starts before the expiry
 *   RULE_RESERVED         the reserved word is zero
 * </pre>
 *
 * <p>Validity: from 1972-01-01 (integer offsets only; the pre-1972 era is out of range and reported
 * as {@link Status#OUT_OF_RANGE}). During an inserted leap second the UTC label is held at
 * 23:59:59 plus the fraction and {@link Status#LEAP_SECOND_IN_PROGRESS} is reported, because a
 * label count cannot express 23:59:60; during a removed second the labels skip 23:59:59.
 *
 * <p>Capacity is fixed at {@value #CAPACITY} entries. Nothing allocates after construction.
 * Mutable, not thread-safe: load, activate and query from one thread.
 */
public final class LeapSecondTable implements TableLayout {
  /** Maximum number of entries. */
  public static final int CAPACITY = 64;
  /** NTP seconds (from 1900-01-01T00:00 UTC) at J2000.0 (2000-01-01T12:00 UTC labels): 36524.5 d. */
  public static final long NTP_AT_J2000_S = 3_155_716_800L;
  /** Magic number "EZLS". */
  public static final int MAGIC = 0x455A4C53;
  /** Layout version. */
  public static final int VERSION = 1;
  /** 1972-01-01T00:00:00 UTC in label seconds since J2000.0 (NTP 2272060800). */
  public static final long START_1972_UTC_S = 2_272_060_800L - NTP_AT_J2000_S;
  /** TAI - UTC from 1972-01-01, s (IERS Bulletin C; common practice). */
  public static final int OFFSET_1972_S = 10;
  /** Rule: expiry after the last update. */
  public static final int RULE_EXPIRY = 1;
  /** Rule: the first entry is 1972-01-01 with 10 s. */
  public static final int RULE_FIRST_ENTRY = 2;
  /** Rule: entries at 00:00:00 UTC of the first of a month. */
  public static final int RULE_MIDNIGHT_FIRST = 3;
  /** Rule: at least one calendar month after the previous entry. */
  public static final int RULE_MONTH_ORDER = 4;
  /** Rule: TAI - UTC steps by exactly +-1 s. */
  public static final int RULE_STEP = 5;
  /** Rule: entries before the expiry. */
  public static final int RULE_BEFORE_EXPIRY = 6;
  /** Rule: reserved word zero. */
  public static final int RULE_RESERVED = 7;

  private static final long HALF_DAY_S = 43_200L;

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
  private final int[] date = new int[3];
  private int failedRule;
  private int failedItem = -1;

  /** Creates an empty table; no query succeeds until a table is loaded and activated. */
  public LeapSecondTable() {
    // empty
  }

  /**
   * Length of the image of a table of {@code count} entries.
   *
   * @param count entries
   * @return bytes
   */
  public static int imageBytesFor(int count) {
    return 8 + 16 + 16 * count + 4;
  }

  /**
   * Encodes a table into its uplink image (ground side and tests). The content is not checked
   * here: loading the image checks it.
   *
   * @param updateUtcS last update, UTC label seconds since J2000.0
   * @param expiryUtcS expiry, same scale
   * @param startUtcS entry starts, same scale
   * @param offsetS TAI - UTC of each entry, s
   * @param count entries (0 to 65535)
   * @param out buffer of at least {@link #imageBytesFor}(count) bytes from {@code offset}
   * @param offset where to write
   * @return {@link Status#OK}, {@link Status#BUFFER_TOO_SMALL} or {@link Status#OUT_OF_RANGE}
   */
  @CheckReturnValue
  public static int encode(long updateUtcS, long expiryUtcS, long[] startUtcS, int[] offsetS, int count, byte[] out,
      int offset) {
    if (count < 0 || count > startUtcS.length || count > offsetS.length) {
      return Status.OUT_OF_RANGE;
    }
    final int bytes = imageBytesFor(count);
    final StateWriter w = new StateWriter();
    final int st = TableImage.begin(out, offset, bytes, MAGIC, VERSION, count, w);
    if (st != Status.OK) {
      return st;
    }
    w.putLong(updateUtcS);
    w.putLong(expiryUtcS);
    for (int i = 0; i < count; i++) {
      w.putLong(startUtcS[i]);
      w.putInt(offsetS[i]);
      w.putInt(0);
    }
    return TableImage.seal(out, offset, bytes, w);
  }

  @Override
  public int magic() {
    return MAGIC;
  }

  @Override
  public int version() {
    return VERSION;
  }

  @Override
  public int checkCount(int count) {
    if (count < 1) {
      return Status.MALFORMED;
    }
    return count > CAPACITY ? Status.CAPACITY_EXCEEDED : Status.OK;
  }

  @Override
  public int imageBytes(int count) {
    return imageBytesFor(count);
  }

  @Override
  public int stage(StateReader payload, int count) {
    failedRule = 0;
    failedItem = -1;
    stagedUpdateUtcS = payload.getLong();
    stagedExpiryUtcS = payload.getLong();
    if (!(stagedExpiryUtcS > stagedUpdateUtcS)) {
      return refuse(RULE_EXPIRY, -1);
    }
    int previousMonth = Integer.MIN_VALUE;
    for (int i = 0; i < count; i++) {
      final long start = payload.getLong();
      final int offset = payload.getInt();
      final int reserved = payload.getInt();
      final int rule = checkEntry(i, start, offset, reserved, previousMonth);
      if (rule != 0) {
        return refuse(rule, i);
      }
      previousMonth = date[0] * 12 + date[1];
      stagedStartUtcS[i] = start;
      stagedOffsetS[i] = offset;
    }
    stagedCount = count;
    return Status.OK;
  }

  /** The rule an entry breaks, or 0; leaves the entry's civil date in {@code date}. */
  private int checkEntry(int i, long start, int offset, int reserved, int previousMonth) {
    if (reserved != 0) {
      return RULE_RESERVED;
    }
    if (i == 0 && (start != START_1972_UTC_S || offset != OFFSET_1972_S)) {
      return RULE_FIRST_ENTRY;
    }
    if (Math.floorMod(start + HALF_DAY_S, SplitTime.SECONDS_PER_DAY) != 0
        || !civilDate(Math.floorDiv(start + HALF_DAY_S, SplitTime.SECONDS_PER_DAY)) || date[2] != 1) {
      return RULE_MIDNIGHT_FIRST;
    }
    if (i > 0 && date[0] * 12 + date[1] <= previousMonth) {
      return RULE_MONTH_ORDER;
    }
    if (i > 0 && Math.abs(offset - stagedOffsetS[i - 1]) != 1) {
      return RULE_STEP;
    }
    if (start >= stagedExpiryUtcS) {
      return RULE_BEFORE_EXPIRY;
    }
    return 0;
  }

  private int refuse(int rule, int item) {
    failedRule = rule;
    failedItem = item;
    return Status.OUT_OF_RANGE;
  }

  /**
   * Civil (proleptic Gregorian) date of a day counted from 2000-01-01 into {@code date} (year,
   * month 1-12, day 1-31), by the days-to-civil algorithm of H. Hinnant, "chrono-Compatible
   * Low-Level Date Algorithms" (2013), function civil_from_days. Returns false for days beyond
   * +-1e8 (outside any table).
   */
  private boolean civilDate(long daysSince2000) {
    if (Math.abs(daysSince2000) > 100_000_000L) {
      return false;
    }
    final long z = daysSince2000 + 10_957L + 719_468L;
    final long era = Math.floorDiv(z, 146_097L);
    final long doe = z - era * 146_097L;
    final long yoe = (doe - doe / 1460 + doe / 36_524 - doe / 146_096) / 365;
    final long doy = doe - (365 * yoe + yoe / 4 - yoe / 100);
    final long mp = (5 * doy + 2) / 153;
    final int month = (int) (mp < 10 ? mp + 3 : mp - 9);
    date[0] = (int) (yoe + era * 400 + (month <= 2 ? 1 : 0));
    date[1] = month;
    date[2] = (int) (doy - (153 * mp + 2) / 5 + 1);
    return true;
  }

  @Override
  public int failedItem() {
    return failedItem;
  }

  /**
   * The rule ({@code RULE_*}) the last refused image broke, or 0.
   *
   * @return the rule code
   */
  public int failedRule() {
    return failedRule;
  }

  @Override
  public void activate() {
    System.arraycopy(stagedStartUtcS, 0, activeStartUtcS, 0, stagedCount);
    System.arraycopy(stagedOffsetS, 0, activeOffsetS, 0, stagedCount);
    activeCount = stagedCount;
    activeExpiryUtcS = stagedExpiryUtcS;
    activeUpdateUtcS = stagedUpdateUtcS;
  }

  /**
   * Tells whether a table is active.
   *
   * @return true after an activation
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
   * Expiry of the active table, in UTC label seconds since J2000.0.
   *
   * @return the expiry
   */
  public long expiryUtcS() {
    return activeExpiryUtcS;
  }

  /**
   * Last update of the active table, in UTC label seconds since J2000.0.
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
  @CheckReturnValue
  public int utcToTai(SplitTime utc, SplitTime taiOut) {
    if (activeCount == 0) {
      return Status.NOT_READY;
    }
    final long label = utc.wholeSeconds();
    if (label < activeStartUtcS[0]) {
      return Status.OUT_OF_RANGE;
    }
    int k = activeCount - 1; // label >= the first start (checked above): the entry in force is found by k = 0
    while (k > 0 && label < activeStartUtcS[k]) {
      k--;
    }
    taiOut.setInRange(label + activeOffsetS[k], utc.fractionS());
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
  @CheckReturnValue
  public int taiToUtc(SplitTime tai, SplitTime utcOut) {
    if (activeCount == 0) {
      return Status.NOT_READY;
    }
    final long taiWhole = tai.wholeSeconds();
    if (taiWhole < activeStartUtcS[0] + activeOffsetS[0]) {
      return Status.OUT_OF_RANGE;
    }
    int k = activeCount - 1; // taiWhole >= the first start in TAI (checked above): found by k = 0
    while (k > 0 && taiWhole < activeStartUtcS[k] + activeOffsetS[k]) {
      k--;
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
    utcOut.setInRange(label, tai.fractionS());
    if (status == Status.OK && label >= activeExpiryUtcS) {
      status = Status.LEAP_TABLE_EXPIRED;
    }
    return status;
  }

}
