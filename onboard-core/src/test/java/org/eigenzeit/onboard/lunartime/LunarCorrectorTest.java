package org.eigenzeit.onboard.lunartime;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.corrector.ClockCorrector;
import org.eigenzeit.onboard.corrector.Housekeeping;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The lunar table held by the clock corrector (TableId.LUNAR_TIME): uploaded through the one
 * uplink mechanism, evaluated each cycle of a Moon-centred configuration at the clock's state, and
 * refused, held and flagged with no table, a corrupted upload or past the table's span. The
 * expected position term is written here from the layout's definition (the test table's velocity
 * is linear in time: {@link TableImages}); the centre value against a directly loaded table.
 */
class LunarCorrectorTest {
  private static final double C2 = 299_792_458.0 * 299_792_458.0;
  private static final double A = 1.838e6;

  static ClockCorrector lunar() {
    final ClockCorrector c = new ClockCorrector(ModelConfig.builder().body(CentralBody.MOON).level(ModelLevel.J2)
        .tides(true).energyToleranceRel(5e-3).maxSampleAgeS(60).build(), true, true);
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(ServoParameters.typicalRubidium(), b, 0));
    assertEquals(Status.OK, c.loadTable(TableId.SERVO, b, 0, b.length));
    assertEquals(Status.OK, c.activateTable(TableId.SERVO));
    return c;
  }

  /** Circular polar orbit at 1838 km, Moon-centred ICRF axes. */
  static void orbit(double t, double[] r, double[] v) {
    final double n = Math.sqrt(CentralBody.MOON.gmM3PerS2() / (A * A * A));
    final double ang = n * t;
    r[0] = A * Math.cos(ang);
    r[1] = 0.0;
    r[2] = A * Math.sin(ang);
    v[0] = -n * A * Math.sin(ang);
    v[1] = 0.0;
    v[2] = n * A * Math.cos(ang);
  }

  /** Cycles from..to (seconds after the table's start), raw = TL labels; returns the last r. */
  static double[] drive(ClockCorrector c, long from, long to) {
    final OrbitSample s = new OrbitSample();
    final SplitTime raw = new SplitTime();
    final SplitTime corr = new SplitTime();
    final double[] r = new double[3];
    final double[] v = new double[3];
    for (long t = from; t <= to; t++) {
      assertEquals(Status.OK, raw.set(TableImages.START + t, 0.0));
      c.correctedTime(raw, corr);
      orbit(t, r, v);
      s.set(corr, OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
      assertEquals(Status.OK, c.cycle(raw, s, null), "t " + t);
    }
    return r;
  }

  private static byte[] framedTable() {
    return LunarTimeLayoutTest.frame(new TableImages().build(), LunarTimeLayout.FRAME_VERSION);
  }

  @Test
  void anActiveTableGivesTlMinusTtAtTheClockEachCycle() {
    final ClockCorrector c = lunar();
    final byte[] image = framedTable();
    assertEquals(Status.OK, c.loadTable(TableId.LUNAR_TIME, image, 0, image.length));
    assertEquals(Status.OK, c.activateTable(TableId.LUNAR_TIME));
    final double[] r = drive(c, 1000, 1100);
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertEquals(Status.OK, hk.lunarStatus());
    assertTrue(hk.lunarValid());
    assertEquals(0, hk.lunarHeldCycles());
    assertEquals(101, hk.lunarEvaluations());
    assertEquals(0x8000_0007L, hk.lunarTableId());
    // TT of the last cycle: its corrected TL minus the value; the table's velocity there is linear
    final SplitTime raw = SplitTime.of(TableImages.START + 1100, 0.0);
    final SplitTime tl = new SplitTime();
    c.correctedTime(raw, tl);
    final SplitTime tt = new SplitTime();
    assertEquals(Status.OK, c.correctedTimeTt(raw, tt));
    assertEquals(hk.tlMinusTtS(), tl.secondsSince(tt), 1e-15);
    final double since = tt.secondsSince(SplitTime.of(TableImages.START, 0.0));
    final TableImages ti = new TableImages();
    double vr = 0;
    for (int i = 0; i < 3; i++) {
      vr += (ti.velocity[i] + ti.acceleration[i] * since) * r[i];
    }
    assertEquals(-vr / C2, hk.lunarPositionTermS(), 1e-16, "position term -(v_M - v_E).r/c^2");
    final LunarTimeTable direct = new LunarTimeTable();
    final byte[] ezlt = new TableImages().build();
    assertEquals(Status.OK, direct.load(ezlt, 0, ezlt.length));
    final LunarTimeOffset at = new LunarTimeOffset();
    assertEquals(Status.OK, direct.evaluate(tt, new double[3], new double[3], at));
    assertEquals(at.centreTlMinusTtS(), hk.centreTlMinusTtS(), 1e-15);
    assertEquals(hk.centreTlMinusTtS() + hk.lunarPositionTermS(), hk.tlMinusTtS(), 1e-18);
    // The clock's rate: the centre's plus the position term's, -(a.r + v_rel.v)/c^2, at most
    // (1 m/s^2 x 2e6 m + 2e3 m/s x 2e3 m/s)/c^2 = 6.7e-11 away from the centre's here.
    assertTrue(Math.abs(hk.lunarRate() - at.centreRate()) < 6.7e-11 && at.centreRate() > 0,
        hk.lunarRate() + " against " + at.centreRate());
    assertEquals(0, hk.lunarNoStateCycles());
  }

  @Test
  void beforeTheFirstOrbitStateNothingIsEvaluatedAndTheCyclesAreCounted() {
    final ClockCorrector c = lunar();
    final byte[] image = framedTable();
    assertEquals(Status.OK, c.loadTable(TableId.LUNAR_TIME, image, 0, image.length));
    assertEquals(Status.OK, c.activateTable(TableId.LUNAR_TIME));
    final SplitTime raw = new SplitTime();
    for (int t = 0; t < 5; t++) {
      assertEquals(Status.OK, raw.set(TableImages.START + t, 0.0));
      assertTrue(Status.isUsable(c.cycle(raw, null, null)), "t " + t);
    }
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertEquals(5, hk.lunarNoStateCycles());
    assertEquals(5, hk.lunarHeldCycles());
    assertEquals(Status.NOT_READY, hk.lunarStatus());
    assertEquals(0, hk.lunarEvaluations());
  }

  @Test
  void pastTheSpanTheLastValueIsHeldFlaggedAndCounted() {
    final ClockCorrector c = lunar();
    final byte[] image = framedTable();
    assertEquals(Status.OK, c.loadTable(TableId.LUNAR_TIME, image, 0, image.length));
    assertEquals(Status.OK, c.activateTable(TableId.LUNAR_TIME));
    final long end = TableImages.SPAN;
    drive(c, end - 40, end - 1);
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertTrue(hk.lunarValid());
    final double last = hk.tlMinusTtS();
    // TL runs ahead of TT by TL - TT (about 0.94 s here), so the span's end in TT is passed a
    // second or so after end in TL
    drive(c, end, end + 20);
    c.housekeeping(hk);
    assertEquals(Status.OUT_OF_RANGE, hk.lunarStatus());
    assertFalse(hk.lunarValid(), "flagged");
    assertTrue(hk.lunarEverValid());
    assertTrue(hk.lunarOutOfSpan() >= 19 && hk.lunarOutOfSpan() == hk.lunarHeldCycles(), "counted: "
        + hk.lunarOutOfSpan());
    final double held = hk.tlMinusTtS();
    // at most about 2 s of the rate (6.5e-10) after the last cycle seen valid above
    assertTrue(Math.abs(held - last) < 3 * TableImages.RATE, "held near the last valid value: " + (held - last));
    drive(c, end + 21, end + 30);
    c.housekeeping(hk);
    assertEquals(held, hk.tlMinusTtS(), 0.0, "held exactly");
    final SplitTime tt = new SplitTime();
    assertEquals(Status.OUT_OF_RANGE, c.correctedTimeTt(SplitTime.of(TableImages.START + end + 30, 0.0), tt),
        "TT from a held value is flagged");
  }

  @Test
  void withNoTableOrACorruptedUploadNothingIsEvaluatedAndTheCyclesAreFlagged() {
    final ClockCorrector c = lunar();
    final byte[] image = framedTable();
    image[8 + 64 + 9] ^= 0x04; // a coefficient bit; CRC not recomputed
    assertEquals(Status.CHECKSUM_MISMATCH, c.loadTable(TableId.LUNAR_TIME, image, 0, image.length));
    assertEquals(Status.NOT_READY, c.activateTable(TableId.LUNAR_TIME));
    drive(c, 0, 9);
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertEquals(Status.NOT_READY, hk.lunarStatus());
    assertFalse(hk.lunarValid());
    assertFalse(hk.lunarEverValid());
    assertEquals(10, hk.lunarNotReady());
    assertEquals(10, hk.lunarHeldCycles());
    assertEquals(1, hk.table(TableId.LUNAR_TIME).crcFailures());
    assertEquals(Status.NOT_READY, c.correctedTimeTt(SplitTime.of(TableImages.START + 9, 0.0), new SplitTime()));
  }

  private static final com.sun.management.ThreadMXBean BEAN =
      (com.sun.management.ThreadMXBean) java.lang.management.ManagementFactory.getThreadMXBean();

  /** Bytes allocated by cycle, correctedTimeTt and housekeeping across the span's end; counts[0..1] valid/held. */
  private static long crossing(int[] counts) {
    final ClockCorrector c = lunar();
    final byte[] image = framedTable();
    assertEquals(Status.OK, c.loadTable(TableId.LUNAR_TIME, image, 0, image.length));
    assertEquals(Status.OK, c.activateTable(TableId.LUNAR_TIME));
    drive(c, TableImages.SPAN - 3000, TableImages.SPAN - 2001);
    final OrbitSample s = new OrbitSample();
    final SplitTime raw = new SplitTime();
    final SplitTime corr = new SplitTime();
    final SplitTime tt = new SplitTime();
    final Housekeeping hk = new Housekeeping();
    final double[] r = new double[3];
    final double[] v = new double[3];
    long allocated = 0;
    for (long t = TableImages.SPAN - 2000; t <= TableImages.SPAN + 2000; t++) {
      assertEquals(Status.OK, raw.set(TableImages.START + t, 0.0));
      c.correctedTime(raw, corr);
      orbit(t, r, v);
      s.set(corr, OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
      final long before = BEAN.getCurrentThreadAllocatedBytes();
      final int st = c.cycle(raw, s, null);
      final int ttStatus = c.correctedTimeTt(raw, tt);
      c.housekeeping(hk);
      allocated += BEAN.getCurrentThreadAllocatedBytes() - before;
      assertEquals(Status.OK, st);
      counts[ttStatus == Status.OK ? 0 : 1]++;
    }
    return allocated;
  }

  @Test
  void theLunarCycleAllocatesNothingInsideAndOutsideTheSpan() {
    final int[] counts = new int[2];
    crossing(counts); // warm-up (the JIT's own allocations)
    long bytes = -1;
    final long[] windows = new long[3];
    for (int w = 0; w < 3 && bytes != 0; w++) {
      counts[0] = 0;
      counts[1] = 0;
      windows[w] = crossing(counts);
      bytes = windows[w];
    }
    System.out.println("lunar corrector cycle across the span end, bytes per window: "
        + java.util.Arrays.toString(windows));
    assertTrue(counts[0] > 1000 && counts[1] > 1000, "both branches: " + counts[0] + " valid, " + counts[1] + " held");
    assertEquals(0, bytes, "bytes allocated by the lunar cycle");
  }

  @Test
  void anEarthConfigurationHasNoLunarStage() {
    final ClockCorrector c = new ClockCorrector(ModelConfig.builder().level(ModelLevel.J2).build(), true, true);
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertEquals(Status.NOT_READY, hk.lunarStatus());
    assertEquals(0, hk.lunarEvaluations());
    assertEquals(Status.NOT_READY, c.correctedTimeTt(SplitTime.of(0, 0.0), new SplitTime()));
    assertEquals("LUNAR_TIME", TableId.name(TableId.LUNAR_TIME));
  }
}
