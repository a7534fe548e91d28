package org.eigenzeit.onboard.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import org.eigenzeit.onboard.status.Status;
import org.junit.jupiter.api.Test;

/** Boundary behaviour of the time package: bad numbers are refused with a status, never thrown. */
class TimeEdgeCaseTest {
  @Test
  void splitTimeRefusesNonFiniteAndHugeShifts() {
    final SplitTime t = SplitTime.of(10, 0.5);
    assertEquals(Status.NOT_FINITE, t.set(0, Double.NaN));
    assertEquals(Status.OUT_OF_RANGE, t.set(0, 2e15));
    assertEquals(Status.NOT_FINITE, t.addSeconds(Double.POSITIVE_INFINITY));
    assertEquals(Status.OUT_OF_RANGE, t.addSeconds(-2e15));
    assertEquals(Status.NOT_FINITE, t.setJulianDate(Double.NaN, 0));
    assertEquals(Status.NOT_FINITE, t.setJulianDate(0, Double.NaN));
    assertEquals(Status.OUT_OF_RANGE, t.setJulianDate(1e12, 0));
    assertEquals(Status.OUT_OF_RANGE, t.setJulianDate(2451545.0, 2e9));
    assertEquals(SplitTime.of(10, 0.5), t);
    assertThrows(IllegalArgumentException.class, () -> SplitTime.of(0, Double.NaN));
    // tiny negative fraction normalises into [0, 1)
    assertEquals(Status.OK, t.set(5, -1e-17));
    assertTrue(t.fractionS() >= 0 && t.fractionS() < 1);
    assertEquals(5.0, t.toSecondsApprox(), 1e-15);
  }

  @Test
  void comparisonsAndIdentity() {
    final SplitTime a = SplitTime.of(1, 0.25);
    final SplitTime b = SplitTime.of(1, 0.5);
    final SplitTime c = SplitTime.of(2, 0.0);
    assertTrue(a.compareTo(b) < 0 && b.compareTo(a) > 0 && b.compareTo(c) < 0 && c.compareTo(a) > 0);
    assertEquals(0, a.compareTo(SplitTime.of(1, 0.25)));
    assertEquals(a.hashCode(), SplitTime.of(1, 0.25).hashCode());
    assertNotEquals(a, b);
    assertNotEquals(a, c);
    assertNotEquals(a, "a");
    assertTrue(a.toString().contains("J2000"));
    assertEquals(1.25 / (36525.0 * 86400.0), a.julianCenturies(), 1e-25);
  }

  @Test
  void leapTableReportsUpdateTime() {
    final LeapSecondTable table = LeapImages.activeReal();
    assertEquals(3992312697L - LeapSecondTable.NTP_AT_J2000_S, table.updateUtcS());
  }

  @Test
  void cucAccessorsAndLevel2Epoch() {
    final CucCodec c = CucCodec.level2(4, 3, 100L);
    assertEquals(4, c.coarseOctets());
    assertEquals(3, c.fineOctets());
    assertEquals(1, c.preambleOctets());
    final byte[] b = new byte[8];
    assertEquals(Status.OK, c.encode(SplitTime.of(-100, 0.75), b, 0));
    final SplitTime back = new SplitTime();
    assertEquals(Status.OK, c.decode(b, 0, back));
    assertEquals(SplitTime.of(-100, 0.75), back);
    assertEquals(Status.BUFFER_TOO_SMALL, c.encode(back, b, -1));
    assertEquals(Status.BUFFER_TOO_SMALL, c.decode(b, -1, back));
    assertEquals(Status.MALFORMED, CucCodec.level1(4, 2).decode(new byte[] {0x1D, 0, 0, 0, 0, 0, 0}, 0, back));
    assertEquals(Status.MALFORMED, CucCodec.level1(4, 2).decode(new byte[] {0x12, 0, 0, 0, 0, 0, 0}, 0, back));
    assertEquals(Status.MALFORMED, CucCodec.level1(4, 2).decode(new byte[] {(byte) 0x9E, 0, 0, 0, 0, 0, 0, 0}, 0, back));
    assertThrows(IllegalArgumentException.class, () -> CucCodec.level1(1, -1));
  }
}
