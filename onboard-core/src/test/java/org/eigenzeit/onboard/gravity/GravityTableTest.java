package org.eigenzeit.onboard.gravity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.UplinkTable;
import org.junit.jupiter.api.Test;

/** The gravity table's content rules (class Javadoc of GravityTable), one refusal each. */
class GravityTableTest {
  private static final double GM = 3.986004415e14;
  private static final double RE = 6378136.3;
  private final GravityTable table = new GravityTable(4, GM, RE);
  private final UplinkTable uplink = new UplinkTable(table);

  /** The degree-4 EGM96 image with one double replaced, CRC recomputed. */
  private static byte[] with(int doubleIndex, double value) {
    final byte[] b = new byte[GravityTable.imageBytesFor(4)];
    assertEquals(Status.OK, GravityTable.encode(GravityField.egm96(4), b, 0));
    final long bits = Double.doubleToRawLongBits(value);
    final int at = 8 + 8 * doubleIndex;
    for (int i = 0; i < 8; i++) {
      b[at + i] = (byte) (bits >>> (56 - 8 * i));
    }
    final CRC32C c = new CRC32C();
    c.update(b, 0, b.length - 4);
    final int v = (int) c.getValue();
    for (int i = 0; i < 4; i++) {
      b[b.length - 4 + i] = (byte) (v >>> (24 - 8 * i));
    }
    return b;
  }

  private int load(byte[] b) {
    return uplink.load(b, 0, b.length);
  }

  /** Position of C_nm (S_nm follows) among the payload's doubles. */
  private static int coefficient(int n, int m) {
    return 2 + 2 * (GravityField.index(n, m) - 3);
  }

  @Test
  void everyRuleRefusesItsValue() {
    assertEquals(Status.OK, load(with(0, GM)));
    assertEquals(Status.NOT_FINITE, load(with(0, Double.NaN)));
    assertEquals(0, uplink.lastFailedItem(), "GM");
    assertEquals(Status.OUT_OF_RANGE, load(with(1, RE * 1.02)));
    assertEquals(1, uplink.lastFailedItem(), "radius 2 % off");
    assertEquals(Status.NOT_FINITE, load(with(1, Double.POSITIVE_INFINITY)));
    assertEquals(Status.NOT_FINITE, load(with(coefficient(3, 1), Double.NaN)));
    assertEquals(GravityField.index(3, 1), uplink.lastFailedItem());
    assertEquals(Status.NOT_FINITE, load(with(coefficient(3, 1) + 1, Double.NEGATIVE_INFINITY)));
    assertEquals(Status.OUT_OF_RANGE, load(with(coefficient(4, 0) + 1, 1e-9)), "S_40 must be zero");
    assertEquals(GravityField.index(4, 0), uplink.lastFailedItem());
    assertEquals(Status.OUT_OF_RANGE, load(with(coefficient(2, 2) + 1, 0.02)), "|S_22| above 1e-2");
    final byte[] small = with(0, GM);
    small[7] = 1; // degree 1
    assertEquals(Status.MALFORMED, load(small));
    assertEquals(Status.BUFFER_TOO_SMALL, GravityTable.encode(GravityField.egm96(4), new byte[10], 0));
    assertThrows(IllegalArgumentException.class, () -> new GravityTable(91, GM, RE));
    assertThrows(IllegalArgumentException.class, () -> new GravityTable(1, GM, RE));
    assertEquals(0, new GravityTable(0, GM, RE).capacityDegree());
  }
}
