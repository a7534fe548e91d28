package org.eigenzeit.onboard.lunartime;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.util.zip.CRC32C;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.TableStatus;
import org.eigenzeit.onboard.table.UplinkTable;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The lunar time table through the one uplink-table mechanism: the frame (magic, version, count
 * in 8-byte words, CRC-32C computed here with the JDK's java.util.zip.CRC32C), staging without
 * touching the active table, the table's own content rules, and activation. The images come from
 * {@link TableImages}, written field by field from the documented layout.
 */
class LunarTimeLayoutTest {
  private static final double[] CENTRE = {0, 0, 0};

  /** The mechanism's frame around an EZLT image, with the CRC computed by the JDK. */
  static byte[] frame(byte[] ezlt, int version) {
    final ByteBuffer b = ByteBuffer.allocate(8 + ezlt.length + 4);
    b.putInt(LunarTimeTable.MAGIC).putShort((short) version).putShort((short) (ezlt.length / 8)).put(ezlt);
    final CRC32C crc = new CRC32C();
    crc.update(b.array(), 0, 8 + ezlt.length);
    b.putInt((int) crc.getValue());
    return b.array();
  }

  private static double[] evaluated(LunarTimeTable t, long at) {
    final LunarTimeOffset out = new LunarTimeOffset();
    assertEquals(Status.OK, t.evaluate(SplitTime.of(at, 0.25), CENTRE, CENTRE, out));
    return new double[] {out.tlMinusTtS, out.rate};
  }

  @Test
  void aFramedTableIsStagedThenActivatedAndEvaluatesAsTheDirectlyLoadedOne() {
    final byte[] ezlt = new TableImages().build();
    final LunarTimeTable direct = new LunarTimeTable();
    assertEquals(Status.OK, direct.load(ezlt, 0, ezlt.length));
    final LunarTimeLayout layout = new LunarTimeLayout();
    final UplinkTable uplink = new UplinkTable(layout);
    final byte[] image = frame(ezlt, LunarTimeLayout.FRAME_VERSION);
    assertEquals(Status.OK, uplink.load(image, 0, image.length));
    assertFalse(layout.table().loaded(), "staged, not active");
    assertEquals(Status.OK, uplink.activate());
    assertTrue(layout.table().loaded());
    for (long at = TableImages.START; at < TableImages.START + TableImages.SPAN; at += 86_399L) {
      assertArrayEquals(evaluated(direct, at), evaluated(layout.table(), at), 0.0, "at " + at);
    }
    final TableStatus s = new TableStatus();
    uplink.status(s);
    assertEquals(1, s.activations());
  }

  @Test
  void refusedUploadsLeaveTheActiveTableAndAreCounted() {
    final LunarTimeLayout layout = new LunarTimeLayout();
    final UplinkTable uplink = new UplinkTable(layout);
    final byte[] good = frame(new TableImages().build(), LunarTimeLayout.FRAME_VERSION);
    assertEquals(Status.OK, uplink.load(good, 0, good.length));
    assertEquals(Status.OK, uplink.activate());
    final double[] before = evaluated(layout.table(), TableImages.START + 1000);
    final long idBefore = layout.table().tableId();

    final byte[] flipped = good.clone();
    flipped[8 + 64 + 3] ^= 0x10; // a coefficient bit, CRC not recomputed
    assertEquals(Status.CHECKSUM_MISMATCH, uplink.load(flipped, 0, flipped.length));

    final TableImages nan = new TableImages();
    final double[][] c = nan.coefficients();
    c[1][0] = Double.NaN; // the velocity series, CRC recomputed: only the content rules can catch it
    final byte[] bad = frame(nan.build(c), LunarTimeLayout.FRAME_VERSION);
    assertEquals(Status.NOT_FINITE, uplink.load(bad, 0, bad.length));
    assertEquals(Status.NOT_READY, uplink.activate(), "nothing valid staged");

    final TableImages fast = new TableImages();
    fast.rate = -TableImages.RATE; // TL - TT running backwards
    final byte[] wrongRate = frame(fast.build(), LunarTimeLayout.FRAME_VERSION);
    assertEquals(Status.OUT_OF_RANGE, uplink.load(wrongRate, 0, wrongRate.length));

    final byte[] otherVersion = frame(new TableImages().build(), 2);
    assertEquals(Status.MALFORMED, uplink.load(otherVersion, 0, otherVersion.length));

    assertArrayEquals(before, evaluated(layout.table(), TableImages.START + 1000), 0.0);
    assertEquals(idBefore, layout.table().tableId());
    final TableStatus s = new TableStatus();
    uplink.status(s);
    assertEquals(5, s.loads());
    assertEquals(1, s.crcFailures());
    assertEquals(2, s.rangeFailures());
    assertEquals(1, s.formatFailures());
  }

  @Test
  void countsThatAreNoEzltLengthAreRefusedByTheFrame() {
    final LunarTimeLayout layout = new LunarTimeLayout();
    assertEquals(Status.OK, layout.checkCount(LunarTimeTable.imageBytes(6, 2) / 8));
    assertEquals(Status.MALFORMED, layout.checkCount(LunarTimeTable.imageBytes(6, 2) / 8 + 1));
    assertEquals(Status.MALFORMED, layout.checkCount(LunarTimeTable.HEADER_BYTES / 8));
    assertEquals(Status.CAPACITY_EXCEEDED, layout.checkCount(LunarTimeTable.MAX_IMAGE_BYTES / 8 + 4));
    assertEquals(8 + LunarTimeTable.imageBytes(6, 2) + 4, layout.imageBytes(LunarTimeTable.imageBytes(6, 2) / 8));
  }
}
