package org.eigenzeit.onboard.lunartime;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * Zero allocation in validation, loading and evaluation of the lunar time table (accepted and
 * refused calls mixed), measured with the thread's allocated-byte counter around each call as in
 * the tracker's allocation test.
 */
class LunarTimeAllocationTest {
  private static final com.sun.management.ThreadMXBean BEAN =
      (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();

  @Test
  void noAllocationAfterConstruction() {
    final TableImages t = new TableImages();
    t.degree = 24;
    t.segments = 16;
    final byte[] image = t.build();
    final byte[] bad = image.clone();
    bad[100] = (byte) 0x7F;
    bad[101] = (byte) 0xF8; // a NaN coefficient
    final LunarTimeTable table = new LunarTimeTable();
    final LunarTimeOffset out = new LunarTimeOffset();
    final SplitTime tt = new SplitTime();
    final double[] r = {1.2e6, -1.1e6, 0.4e6};
    final double[] v = {-900.0, -1000.0, 300.0};
    final double[] nan = {Double.NaN, 0, 0};
    long inCore = 0;
    int ok = 0;
    for (int k = 0; k < 20_000; k++) {
      assertEquals(Status.OK, tt.set(TableImages.START + (k * 37L) % (TableImages.SPAN + 200), 0.25));
      final long before = BEAN.getCurrentThreadAllocatedBytes();
      final int st;
      if (k % 1000 == 0) {
        st = table.load(k % 2000 == 0 ? image : bad, 0, image.length);
      } else {
        st = table.evaluate(tt, k % 97 == 5 ? nan : r, v, out);
      }
      inCore += BEAN.getCurrentThreadAllocatedBytes() - before;
      ok += st == Status.OK ? 1 : 0;
    }
    System.out.printf("evidence: lunartime.allocated_bytes = %d%n", inCore);
    assertTrue(ok > 15_000, "ok " + ok);
    assertEquals(0L, inCore);
  }
}
