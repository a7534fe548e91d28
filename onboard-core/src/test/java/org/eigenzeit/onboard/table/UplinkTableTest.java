package org.eigenzeit.onboard.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32C;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.Status;
import org.junit.jupiter.api.Test;

/**
 * The one uplink mechanism, with a minimal table type of the test's own (one double, which must
 * be positive): frame checks in order, CRC-32C with its published check value, double buffering
 * and every counter.
 */
class UplinkTableTest {
  /** A table type of one positive double: its layout and content rule only. */
  static final class OneValue implements TableLayout {
    double staged;
    double active;
    int readExtra;
    boolean readShort;

    @Override
    public int magic() {
      return 0x54455354;
    }

    @Override
    public int version() {
      return 3;
    }

    @Override
    public int checkCount(int count) {
      return count == 1 ? Status.OK : count > 1 ? Status.CAPACITY_EXCEEDED : Status.MALFORMED;
    }

    @Override
    public int imageBytes(int count) {
      return 8 + 8 * count + 4;
    }

    @Override
    public int stage(StateReader payload, int count) {
      final double v = readShort ? payload.getInt() : payload.getDouble();
      for (int i = 0; i < readExtra; i++) {
        payload.getInt();
      }
      if (!(v > 0)) {
        return Double.isNaN(v) ? Status.NOT_FINITE : Status.OUT_OF_RANGE;
      }
      staged = v;
      return Status.OK;
    }

    @Override
    public int failedItem() {
      return 0;
    }

    @Override
    public void activate() {
      active = staged;
    }
  }

  private final OneValue layout = new OneValue();
  private final UplinkTable table = new UplinkTable(layout);

  private static byte[] image(double v) {
    final byte[] b = new byte[20];
    final StateWriter w = new StateWriter();
    assertEquals(Status.OK, TableImage.begin(b, 0, 20, 0x54455354, 3, 1, w));
    w.putDouble(v);
    assertEquals(Status.OK, TableImage.seal(b, 0, 20, w));
    return b;
  }

  @Test
  void crc32cPublishedCheckValue() {
    // CRC-32C (Castagnoli), RFC 3720 appendix B.4 / CRC catalogue: "123456789" -> 0xE3069283.
    final CRC32C c = new CRC32C();
    c.update("123456789".getBytes(StandardCharsets.US_ASCII));
    assertEquals(0xE3069283L, c.getValue());
  }

  @Test
  void stageValidateActivateDoubleBuffered() {
    final byte[] one = image(1.5);
    assertEquals(Status.OK, table.load(one, 0, one.length));
    assertFalse(table.isActive(), "staged, not active");
    assertEquals(0.0, layout.active, 0.0);
    assertEquals(Status.OK, table.activate());
    assertEquals(1.5, layout.active, 0.0);
    final CRC32C c = new CRC32C();
    c.update(one, 0, 16);
    assertEquals((int) c.getValue(), table.activeCrc(), "the active CRC is the image's");
    final byte[] two = image(2.5);
    assertEquals(Status.OK, table.load(two, 0, two.length));
    final byte[] bad = image(-1.0);
    assertEquals(Status.OUT_OF_RANGE, table.load(bad, 0, bad.length));
    assertEquals(Status.NOT_READY, table.activate(), "a refused load discards what was staged before it");
    assertEquals(1.5, layout.active, 0.0, "the active table is untouched");
  }

  @Test
  void frameIsCheckedInOrderAndEveryRefusalCounted() {
    final byte[] good = image(1.0);
    assertEquals(Status.BUFFER_TOO_SMALL, table.load(good, -1, good.length));
    assertEquals(Status.BUFFER_TOO_SMALL, table.load(good, 1, good.length));
    assertEquals(Status.BUFFER_TOO_SMALL, table.load(good, 0, 11));
    final byte[] magic = good.clone();
    magic[0] ^= 1;
    assertEquals(Status.MALFORMED, table.load(magic, 0, magic.length));
    final byte[] version = good.clone();
    version[5] ^= 1;
    assertEquals(Status.MALFORMED, table.load(version, 0, version.length));
    final byte[] count = good.clone();
    count[7] = 2;
    assertEquals(Status.CAPACITY_EXCEEDED, table.load(count, 0, count.length));
    count[7] = 0;
    assertEquals(Status.MALFORMED, table.load(count, 0, count.length));
    final byte[] longer = java.util.Arrays.copyOf(good, 24);
    assertEquals(Status.BUFFER_TOO_SMALL, table.load(longer, 0, longer.length), "length not the layout's");
    final byte[] flipped = good.clone();
    flipped[12] ^= 0x40;
    assertEquals(Status.CHECKSUM_MISMATCH, table.load(flipped, 0, flipped.length));
    final byte[] nan = image(Double.NaN);
    assertEquals(Status.NOT_FINITE, table.load(nan, 0, nan.length));
    layout.readExtra = 1;
    assertEquals(Status.MALFORMED, table.load(good, 0, good.length), "a layout that reads past its payload");
    layout.readExtra = 0;
    layout.readShort = true;
    assertEquals(Status.MALFORMED, table.load(good, 0, good.length), "a layout that reads short of its payload");
    layout.readShort = false;
    assertEquals(Status.OK, table.load(good, 0, good.length));
    assertEquals(Status.OK, table.activate());
    final TableStatus s = new TableStatus();
    table.status(s);
    assertEquals(13, s.loads());
    assertEquals(1, s.crcFailures());
    assertEquals(1, s.rangeFailures());
    assertEquals(10, s.formatFailures());
    assertEquals(1, s.activations());
    assertEquals(Status.OK, s.lastLoadStatus());
    assertTrue(s.active());
    assertFalse(s.staged());
    assertEquals(-1, s.lastFailedItem());
  }

  @Test
  void imageWriterRefusesWhatDoesNotFit() {
    final StateWriter w = new StateWriter();
    assertEquals(Status.BUFFER_TOO_SMALL, TableImage.begin(new byte[10], 0, 20, 1, 1, 1, w));
    assertEquals(Status.OUT_OF_RANGE, TableImage.begin(new byte[20], 0, 20, 1, 1, 70_000, w));
    final byte[] b = new byte[20];
    assertEquals(Status.OK, TableImage.begin(b, 0, 20, 1, 1, 1, w));
    assertEquals(Status.BUFFER_TOO_SMALL, TableImage.seal(b, 0, 20, w), "payload missing");
    assertEquals(Status.BUFFER_TOO_SMALL, TableImage.begin(b, -1, 20, 1, 1, 1, w));
    assertEquals(Status.BUFFER_TOO_SMALL, TableImage.begin(b, 0, 8, 1, 1, 1, w));
    assertEquals(Status.OUT_OF_RANGE, TableImage.begin(b, 0, 20, 1, 1, -1, w));
    assertEquals(Status.OK, TableImage.begin(b, 0, 20, 1, 1, 1, w));
    w.putLong(1);
    w.putLong(2);
    assertEquals(Status.BUFFER_TOO_SMALL, TableImage.seal(b, 0, 20, w), "payload too long");
    for (int id = -1; id <= TableId.COUNT; id++) {
      assertEquals(id >= 0 && id < TableId.COUNT, !"UNKNOWN".equals(TableId.name(id)), "name of " + id);
    }
    assertEquals("SERVO", TableId.name(TableId.SERVO));
    assertEquals("LEAP_SECONDS", TableId.name(TableId.LEAP_SECONDS));
  }
}
