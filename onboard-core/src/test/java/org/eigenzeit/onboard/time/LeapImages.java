package org.eigenzeit.onboard.time;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.UplinkTable;

/**
 * Test helper: leap-second table images. The real table is read from the IERS/NIST file beside
 * the tests by a minimal reader of its numbers (the ground's full decoder, with the file's hash and
 * structure checks, lives in ground-sim).
 */
public final class LeapImages {
  /** Update, expiry (UTC label s since J2000.0) and the entries of the real file. */
  public static final long UPDATE;
  /** Expiry of the real file. */
  public static final long EXPIRY;
  /** Entry starts of the real file. */
  public static final long[] STARTS;
  /** TAI - UTC of the real file's entries. */
  public static final int[] OFFSETS;

  static {
    try (InputStream in = LeapImages.class.getResourceAsStream("leap-seconds.list")) {
      final String text = new String(in.readAllBytes(), StandardCharsets.US_ASCII);
      long update = 0;
      long expiry = 0;
      final List<long[]> rows = new ArrayList<>();
      for (String line : text.split("\n")) {
        if (line.startsWith("#$")) {
          update = Long.parseLong(line.substring(2).trim()) - LeapSecondTable.NTP_AT_J2000_S;
        } else if (line.startsWith("#@")) {
          expiry = Long.parseLong(line.substring(2).trim()) - LeapSecondTable.NTP_AT_J2000_S;
        } else if (!line.isEmpty() && Character.isDigit(line.charAt(0))) {
          final String[] f = line.split("\\s+");
          rows.add(new long[] {Long.parseLong(f[0]) - LeapSecondTable.NTP_AT_J2000_S, Long.parseLong(f[1])});
        }
      }
      UPDATE = update;
      EXPIRY = expiry;
      STARTS = new long[rows.size()];
      OFFSETS = new int[rows.size()];
      for (int i = 0; i < rows.size(); i++) {
        STARTS[i] = rows.get(i)[0];
        OFFSETS[i] = (int) rows.get(i)[1];
      }
    } catch (IOException e) {
      throw new IllegalStateException(e);
    }
  }

  private LeapImages() {}

  /**
   * An image of the given content.
   *
   * @param update last update
   * @param expiry expiry
   * @param starts entry starts
   * @param offsets TAI - UTC per entry
   * @return the image
   */
  public static byte[] image(long update, long expiry, long[] starts, int[] offsets) {
    final byte[] b = new byte[LeapSecondTable.imageBytesFor(starts.length)];
    if (LeapSecondTable.encode(update, expiry, starts, offsets, starts.length, b, 0) != Status.OK) {
      throw new IllegalStateException("encode");
    }
    return b;
  }

  /**
   * The real file's image.
   *
   * @return the image
   */
  public static byte[] real() {
    return image(UPDATE, EXPIRY, STARTS, OFFSETS);
  }

  /**
   * A table with the real file active.
   *
   * @return the table
   */
  public static LeapSecondTable activeReal() {
    final LeapSecondTable t = new LeapSecondTable();
    final UplinkTable u = new UplinkTable(t);
    final byte[] b = real();
    if (u.load(b, 0, b.length) != Status.OK || u.activate() != Status.OK) {
      throw new IllegalStateException("real table refused");
    }
    return t;
  }
}
