package org.eigenzeit.ground.uplink;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.UplinkTable;
import org.eigenzeit.onboard.time.LeapSecondTable;

/**
 * The IERS/NIST {@code leap-seconds.list} (the format the IERS publishes and the tz database
 * ships), decoded on the ground into the onboard core's binary leap-second image.
 *
 * <p>Format (from the file's own header): {@code #$} last update and {@code #@} expiry in NTP
 * seconds (from 1900-01-01T00:00 UTC); {@code #h} five hexadecimal words of SHA-1 (FIPS 180-4) over
 * the concatenated digits of the update, the expiry and the first two fields of every data line;
 * data lines {@code NTP-seconds TAI-UTC [# day month year]}; other {@code #} lines are comments.
 *
 * <p>Checks, each refused as {@code file:line: what, found ..., allowed ...}: ASCII only; each of
 * {@code #$}, {@code #@}, {@code #h} exactly once; NTP fields of exactly ten digits (every date from
 * 1968 to 2036; this keeps a digit from moving across a field separator unseen, since the hash
 * covers digits only); TAI-UTC of one to three digits without a leading zero; a date comment, when
 * present, equal to the NTP date; the hash; then the core's content rules of {@link
 * LeapSecondTable} (expiry after the update, 10 s on 1972-01-01, entries at 00:00 UTC of the first
 * of a month and at least a month apart, steps of +-1 s, entries before the expiry).
 */
public final class LeapSecondsList {
  private static final String[] MONTHS = {"Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct",
    "Nov", "Dec"};

  private final String file;
  private long updateNtp = -1;
  private long expiryNtp = -1;
  private int updateLine;
  private int expiryLine;
  private int hashLine;
  private final int[] hash = new int[5];
  private final List<long[]> entries = new ArrayList<>();
  private final List<Integer> entryLines = new ArrayList<>();
  private final StringBuilder digits = new StringBuilder();

  private LeapSecondsList(String file) {
    this.file = file;
  }

  /**
   * Decodes and checks a file.
   *
   * @param file name for messages
   * @param text the file's bytes
   * @return the decoded list, every check passed
   * @throws UplinkInputException at the first refusal
   */
  public static LeapSecondsList read(String file, byte[] text) {
    final LeapSecondsList l = new LeapSecondsList(file);
    l.parse(text);
    l.checkHash();
    l.checkContent();
    return l;
  }

  private UplinkInputException error(int line, String what) {
    return new UplinkInputException(file + ":" + line + ": " + what);
  }

  private void parse(byte[] text) {
    int line = 1;
    for (int i = 0; i < text.length; i++) {
      if (text[i] < 0 || (text[i] < 0x20 && text[i] != '\n' && text[i] != '\r' && text[i] != '\t')) {
        throw error(line, String.format(Locale.ROOT, "byte 0x%02X, allowed printable ASCII", text[i] & 0xFF));
      }
      if (text[i] == '\n') {
        line++;
      }
    }
    final String[] lines = new String(text, StandardCharsets.US_ASCII).split("\n", -1);
    for (int k = 0; k < lines.length; k++) {
      final String l = lines[k].endsWith("\r") ? lines[k].substring(0, lines[k].length() - 1) : lines[k];
      parseLine(k + 1, l);
    }
    if (updateLine == 0 || expiryLine == 0 || hashLine == 0) {
      throw error(lines.length, "missing " + (updateLine == 0 ? "#$" : expiryLine == 0 ? "#@" : "#h")
          + " line, allowed a file with one #$, one #@ and one #h line");
    }
    if (entries.isEmpty()) {
      throw error(lines.length, "no data line, allowed at least the 1972-01-01 entry");
    }
  }

  private void parseLine(int n, String l) {
    if (l.startsWith("#$")) {
      updateLine = once(n, updateLine, "#$");
      updateNtp = ntp(n, l.substring(2).trim(), "#$ last update");
    } else if (l.startsWith("#@")) {
      expiryLine = once(n, expiryLine, "#@");
      expiryNtp = ntp(n, l.substring(2).trim(), "#@ expiry");
    } else if (l.startsWith("#h")) {
      hashLine = once(n, hashLine, "#h");
      parseHash(n, l.substring(2).trim());
    } else if (!l.startsWith("#") && !l.isBlank()) {
      parseData(n, l);
    }
  }

  private int once(int n, int seen, String tag) {
    if (seen != 0) {
      throw error(n, "second " + tag + " line, found one at line " + seen + " already, allowed one");
    }
    return n;
  }

  private long ntp(int n, String field, String what) {
    if (!field.matches("[1-9][0-9]{9}")) {
      throw error(n, what + " '" + field + "', allowed NTP seconds of exactly 10 digits");
    }
    return Long.parseLong(field);
  }

  private void parseHash(int n, String field) {
    final String[] words = field.split("\\s+");
    if (words.length != 5) {
      throw error(n, "#h with " + words.length + " words, allowed 5 hexadecimal words of SHA-1");
    }
    for (int i = 0; i < 5; i++) {
      if (!words[i].matches("[0-9a-fA-F]{1,8}")) {
        throw error(n, "#h word '" + words[i] + "', allowed 1 to 8 hexadecimal digits");
      }
      hash[i] = (int) Long.parseLong(words[i], 16);
    }
  }

  private void parseData(int n, String l) {
    final int hashAt = l.indexOf('#');
    final String data = (hashAt >= 0 ? l.substring(0, hashAt) : l).trim();
    final String[] f = data.split("\\s+");
    if (f.length != 2) {
      throw error(n, "data line with " + f.length + " fields '" + data + "', allowed NTP-seconds TAI-UTC");
    }
    final long t = ntp(n, f[0], "NTP seconds");
    if (!f[1].matches("[1-9][0-9]{0,2}")) {
      throw error(n, "TAI-UTC '" + f[1] + "', allowed 1 to 3 digits without a leading zero");
    }
    if (hashAt >= 0) {
      checkComment(n, t, l.substring(hashAt + 1).trim());
    }
    digits.append(f[0]).append(f[1]);
    entries.add(new long[] {t, Long.parseLong(f[1])});
    entryLines.add(n);
  }

  /** A date comment, as the IERS writes it ("1 Jan 1972"), must name the entry's own date. */
  private void checkComment(int n, long ntpSeconds, String comment) {
    final String[] c = comment.split("\\s+");
    if (c.length < 3 || !c[0].matches("[0-9]{1,2}") || !c[2].matches("[0-9]{4}")) {
      return; // not a date comment
    }
    final java.time.LocalDate date = java.time.LocalDate.of(1900, 1, 1).plusDays(Math.floorDiv(ntpSeconds, 86_400L));
    final String expected = date.getDayOfMonth() + " " + MONTHS[date.getMonthValue() - 1] + " " + date.getYear();
    final String found = Integer.parseInt(c[0]) + " " + c[1] + " " + c[2];
    if (!found.equals(expected)) {
      throw error(n, "comment date '" + found + "' differs from the NTP seconds' date, allowed '" + expected + "'");
    }
  }

  private void checkHash() {
    final byte[] sha;
    try {
      sha = MessageDigest.getInstance("SHA-1").digest((updateNtp + "" + expiryNtp + digits)
          .getBytes(StandardCharsets.US_ASCII));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("this Java runtime lacks SHA-1, which every Java SE runtime provides", e);
    }
    for (int i = 0; i < 5; i++) {
      final int word = ((sha[4 * i] & 0xFF) << 24) | ((sha[4 * i + 1] & 0xFF) << 16) | ((sha[4 * i + 2] & 0xFF) << 8)
          | (sha[4 * i + 3] & 0xFF);
      if (word != hash[i]) {
        throw error(hashLine, String.format(Locale.ROOT, "hash word %d is %08x, allowed %08x (SHA-1 of the file's"
            + " digits): the file was changed or damaged", i + 1, hash[i], word));
      }
    }
  }

  /** The core's content rules, refusals mapped back to lines. */
  private void checkContent() {
    final byte[] image = image();
    final LeapSecondTable table = new LeapSecondTable();
    final int st = new UplinkTable(table).load(image, 0, image.length);
    if (st == Status.OK) {
      return;
    }
    final int item = table.failedItem();
    final int line = item >= 0 ? entryLines.get(item) : expiryLine;
    throw error(line, ruleText(table.failedRule(), item));
  }

  private String ruleText(int rule, int item) {
    final long[] e = item >= 0 ? entries.get(item) : null;
    switch (rule) {
      case LeapSecondTable.RULE_EXPIRY:
        return "expiry " + expiryNtp + " not after the last update " + updateNtp + ", allowed an expiry after it";
      case LeapSecondTable.RULE_FIRST_ENTRY:
        return "first entry " + e[0] + " with TAI-UTC " + e[1] + " s, allowed 2272060800 (1972-01-01) with 10 s";
      case LeapSecondTable.RULE_MIDNIGHT_FIRST:
        return "entry " + e[0] + " not at 00:00:00 UTC of the first of a month, allowed only such instants";
      case LeapSecondTable.RULE_MONTH_ORDER:
        return "entry " + e[0] + " less than a calendar month after the previous one, allowed a later month";
      case LeapSecondTable.RULE_STEP:
        return "TAI-UTC " + e[1] + " s after " + entries.get(item - 1)[1] + " s, allowed a step of exactly +1 or -1 s";
      case LeapSecondTable.RULE_BEFORE_EXPIRY:
        return "entry " + e[0] + " at or after the expiry " + expiryNtp + ", allowed entries before it";
      default:
        return "refused by the onboard table's rules (rule " + rule + ")";
    }
  }

  /**
   * The onboard core's binary image of this list.
   *
   * @return the image, ready to uplink
   */
  public byte[] image() {
    final int n = entries.size();
    final long[] starts = new long[n];
    final int[] offsets = new int[n];
    for (int i = 0; i < n; i++) {
      starts[i] = entries.get(i)[0] - LeapSecondTable.NTP_AT_J2000_S;
      offsets[i] = (int) entries.get(i)[1];
    }
    final byte[] image = new byte[LeapSecondTable.imageBytesFor(n)];
    final int st = LeapSecondTable.encode(updateNtp - LeapSecondTable.NTP_AT_J2000_S,
        expiryNtp - LeapSecondTable.NTP_AT_J2000_S, starts, offsets, n, image, 0);
    if (st != Status.OK) {
      throw error(entryLines.get(n - 1), "more entries than the onboard table holds, allowed "
          + LeapSecondTable.CAPACITY);
    }
    return image;
  }

  /**
   * A core table with this list active, for ground conversions.
   *
   * @return the table
   */
  public LeapSecondTable activeTable() {
    final LeapSecondTable table = new LeapSecondTable();
    final UplinkTable uplink = new UplinkTable(table);
    final byte[] image = image();
    if (uplink.load(image, 0, image.length) != Status.OK || uplink.activate() != Status.OK) {
      throw error(expiryLine, "refused by the onboard table although it passed the checks (a defect)");
    }
    return table;
  }

  /**
   * Returns the number of entries.
   *
   * @return the count
   */
  public int size() {
    return entries.size();
  }

  /**
   * Returns the expiry in NTP seconds.
   *
   * @return the expiry
   */
  public long expiryNtp() {
    return expiryNtp;
  }
}
