package org.eigenzeit.onboard.lunartime;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.util.function.Consumer;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The lunar time table: layout, validator and evaluator. The evaluator is checked against the
 * Chebyshev identities T_k(cos x) = cos(k x) and T_k'(cos x) = k sin(k x)/sin x (common
 * mathematical facts, e.g. Abramowitz and Stegun 22.3.15) and against the documented position
 * term; the validator is checked field by field against its documented ranges.
 */
class LunarTimeTableTest {
  private static final double C2 = 299_792_458.0 * 299_792_458.0;
  private static final double[] CENTRE = {0, 0, 0};

  private static int validate(byte[] image) {
    return LunarTimeTable.validate(image, 0, image.length);
  }

  private static int with(Consumer<TableImages> change) {
    final TableImages t = new TableImages();
    change.accept(t);
    return validate(t.build());
  }

  @Test
  void aWellFormedTableLoads() {
    final byte[] image = new TableImages().build();
    assertEquals(LunarTimeTable.imageBytes(6, 2), image.length);
    assertEquals(64 + 32 * 2 * 7, image.length);
    assertEquals(Status.OK, validate(image));
    final LunarTimeTable table = new LunarTimeTable();
    assertFalse(table.loaded());
    assertEquals(Status.OK, table.load(image, 0, image.length));
    assertTrue(table.loaded());
    assertEquals(0x8000_0007L, table.tableId());
    assertEquals(TableImages.START, table.startTtS());
    assertEquals(TableImages.START + TableImages.SPAN, table.endTtS());
    assertEquals(TableImages.L_L, table.scaleRateL(), 0.0);
    assertEquals(1e-12, table.accuracyS(), 0.0);
    assertEquals(0.0, table.tl0S(), 0.0);
    assertEquals(6, table.degree());
    assertEquals(2, table.segments());
    assertEquals(405, table.ephemeris());
    assertEquals(1, table.loads());
    assertEquals(0, table.loadFailures());
    assertEquals(Status.OK, table.lastLoadStatus());
    assertEquals(12_864, LunarTimeTable.MAX_IMAGE_BYTES);
  }

  @Test
  void anImageInsideALargerBufferIsReadFromItsOffset() {
    final byte[] image = new TableImages().build();
    final byte[] frame = new byte[image.length + 20];
    System.arraycopy(image, 0, frame, 7, image.length);
    assertEquals(Status.OK, LunarTimeTable.validate(frame, 7, image.length));
    assertEquals(Status.BUFFER_TOO_SMALL, LunarTimeTable.validate(frame, 7, frame.length));
    assertEquals(Status.BUFFER_TOO_SMALL, LunarTimeTable.validate(frame, -1, image.length));
    assertEquals(Status.BUFFER_TOO_SMALL, LunarTimeTable.validate(frame, 0, 63));
    assertEquals(Status.BUFFER_TOO_SMALL, LunarTimeTable.validate(null, 0, image.length));
    assertEquals(Status.MALFORMED, LunarTimeTable.validate(frame, 7, image.length + 8));
  }

  @Test
  void headerFieldsOutsideTheirRangesAreRefused() {
    assertEquals(Status.MALFORMED, with(t -> t.magic = 0x455A4C55));
    assertEquals(Status.MALFORMED, with(t -> t.version = 2));
    assertEquals(Status.MALFORMED, with(t -> t.headerBytes = 72));
    assertEquals(Status.MALFORMED, with(t -> t.components = 3));
    assertEquals(Status.MALFORMED, with(t -> t.reserved32 = 1));
    assertEquals(Status.NOT_FINITE, with(t -> t.tl0 = Double.NaN));
    assertEquals(Status.OUT_OF_RANGE, with(t -> {
      t.tl0 = 1.01;
      t.offsetAtStartS += 1.01;
    }));
    assertEquals(Status.OK, with(t -> {
      t.tl0 = -1.0;
      t.offsetAtStartS -= 1.0;
    }));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.degree = 1));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.degree = 25));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.segments = 0));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.segments = 17));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.ephemeris = 0));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.ephemeris = 10_000));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.id = 0));
    assertEquals(Status.OUT_OF_RANGE, with(t -> {
      t.start = -LunarTimeTable.MAX_ABS_EPOCH_S - 1;
      t.end = t.start + TableImages.SPAN;
    }));
    assertEquals(Status.OUT_OF_RANGE, with(t -> {
      t.end = LunarTimeTable.MAX_ABS_EPOCH_S + 1;
      t.start = t.end - TableImages.SPAN;
    }));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.end = t.start + LunarTimeTable.MIN_SPAN_S - 1));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.end = t.start + LunarTimeTable.MAX_SPAN_S + 1));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.end = t.start - TableImages.SPAN));
    assertEquals(Status.NOT_FINITE, with(t -> t.scaleRateL = Double.NaN));
    assertEquals(Status.NOT_FINITE, with(t -> t.accuracyS = Double.POSITIVE_INFINITY));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.scaleRateL = 0.0));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.scaleRateL = 1e-9));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.accuracyS = 0.0));
    assertEquals(Status.OUT_OF_RANGE, with(t -> t.accuracyS = 1.1e-6));
    // The limits themselves are allowed.
    assertEquals(Status.OK, with(t -> {
      t.degree = 24;
      t.segments = 16;
      t.end = t.start + LunarTimeTable.MAX_SPAN_S;
      t.accuracyS = 1e-6;
    }));
    assertEquals(Status.OK, with(t -> {
      t.degree = 2;
      t.segments = 1;
      t.end = t.start + LunarTimeTable.MIN_SPAN_S;
    }));
  }

  @Test
  void contentFailingItsSanityChecksIsRefused() {
    final TableImages t = new TableImages();
    final double[][] c = t.coefficients();
    c[5][3] = Double.NaN;
    assertEquals(Status.NOT_FINITE, validate(t.build(c)));
    // TL - TT must follow TL0 + (MEAN_TCL_TT_RATE - L_L)(t - T0) within 1e-5 s.
    assertEquals(Status.OUT_OF_RANGE, with(x -> x.offsetAtStartS += 1.01e-5));
    assertEquals(Status.OUT_OF_RANGE, with(x -> x.offsetAtStartS -= 1.01e-5));
    assertEquals(Status.OK, with(x -> x.offsetAtStartS += 0.99e-5));
    assertEquals(Status.OUT_OF_RANGE, with(x -> x.tl0 = 0.5));
    // The rate must follow the mean dTCL/dTT - L_L within 1e-11: a TL of another L_L, or a table
    // of TL - TT with its sign flipped, is refused.
    assertEquals(Status.OUT_OF_RANGE, with(x -> x.rate = TableImages.RATE + 1.2e-11));
    assertEquals(Status.OUT_OF_RANGE, with(x -> x.rate = -TableImages.RATE));
    assertEquals(Status.OK, with(x -> x.rate = TableImages.RATE + 0.9e-11));
    assertEquals(Status.OUT_OF_RANGE, with(x -> x.scaleRateL = 1.5e-11));
    assertEquals(Status.OUT_OF_RANGE, with(x -> x.velocity = new double[] {0, 840, 0}));
    assertEquals(Status.OUT_OF_RANGE, with(x -> x.velocity = new double[] {0, 1210, 0}));
    // An odd Chebyshev term jumps by twice its coefficient between segments.
    assertEquals(Status.OUT_OF_RANGE, with(x -> {
      x.periodicIndex = 3;
      x.periodicS = 0.6e-12;
    }));
    assertEquals(Status.OK, with(x -> {
      x.periodicIndex = 3;
      x.periodicS = 0.4e-12;
    }));
    final double[][] v = t.coefficients();
    v[5][0] += 0.011; // segment 1, velocity x: jumps by 0.011 m/s at the boundary
    assertEquals(Status.OUT_OF_RANGE, validate(t.build(v)));
    v[5][0] -= 0.002;
    assertEquals(Status.OK, validate(t.build(v)));
  }

  @Test
  void aRefusedLoadKeepsTheTableItHeld() {
    final LunarTimeTable table = new LunarTimeTable();
    final byte[] good = new TableImages().build();
    assertEquals(Status.OK, table.load(good, 0, good.length));
    final TableImages other = new TableImages();
    other.id = 99;
    other.offsetAtStartS = 200.0;
    final byte[] bad = other.build();
    assertEquals(Status.OUT_OF_RANGE, table.load(bad, 0, bad.length));
    assertEquals(0x8000_0007L, table.tableId());
    assertEquals(2, table.loads());
    assertEquals(1, table.loadFailures());
    assertEquals(Status.OUT_OF_RANGE, table.lastLoadStatus());
    final LunarTimeOffset out = new LunarTimeOffset();
    assertEquals(Status.OK, table.evaluate(SplitTime.of(TableImages.START, 0.0), CENTRE, CENTRE, out));
    assertEquals(new TableImages().offsetAtStartS + 2e-9, out.centreTlMinusTtS(), 1e-15); // T_4(-1) = 1
  }

  @Test
  void theEvaluatorFollowsTheChebyshevIdentities() {
    final TableImages t = new TableImages();
    t.degree = 9;
    t.segments = 1;
    t.periodicIndex = 7;
    t.periodicS = 3e-9;
    final byte[] image = t.build();
    final LunarTimeTable table = new LunarTimeTable();
    assertEquals(Status.OK, table.load(image, 0, image.length));
    final LunarTimeOffset out = new LunarTimeOffset();
    final double h = TableImages.SPAN;
    double worst = 0.0;
    double worstRate = 0.0;
    for (int i = 1; i < 50; i++) {
      final double x = Math.PI * i / 50.0;
      final double s = Math.cos(x);
      final double sinceStart = (s + 1.0) * h / 2.0;
      final SplitTime tt = SplitTime.of(TableImages.START, 0.0);
      assertEquals(Status.OK, tt.addSeconds(sinceStart));
      assertEquals(Status.OK, table.evaluate(tt, CENTRE, CENTRE, out));
      final double linear = t.offsetAtStartS + TableImages.RATE * sinceStart;
      worst = Math.max(worst, Math.abs(out.centreTlMinusTtS() - (linear + 3e-9 * Math.cos(7 * x))));
      final double slope = TableImages.RATE + 3e-9 * 7 * Math.sin(7 * x) / Math.sin(x) * 2.0 / h;
      worstRate = Math.max(worstRate, Math.abs(out.centreRate() - slope));
      assertEquals(out.centreTlMinusTtS(), out.tlMinusTtS(), 0.0);
      assertEquals(0.0, out.positionTermS(), 0.0);
    }
    System.out.printf("evidence: lunartime.chebyshev_identity_s = %.3e%n", worst);
    System.out.printf("evidence: lunartime.chebyshev_rate_identity = %.3e%n", worstRate);
    assertTrue(worst < 5e-16, "value " + worst); // measured 2.2e-16: one rounding of a 1 s value
    assertTrue(worstRate < 1e-24, "rate " + worstRate); // measured 1.0e-25
  }

  @Test
  void thePositionTermIsMinusVelocityDotPositionOverCSquared() {
    final byte[] image = new TableImages().build();
    final LunarTimeTable table = new LunarTimeTable();
    table.load(image, 0, image.length);
    final LunarTimeOffset centre = new LunarTimeOffset();
    final LunarTimeOffset clock = new LunarTimeOffset();
    final SplitTime tt = SplitTime.of(TableImages.START + TableImages.SPAN / 2, 0.0);
    final double[] r = {1.5e6, 1.0e6, 0.0};
    final double[] v = {0.0, 0.0, 1600.0};
    assertEquals(Status.OK, table.evaluate(tt, CENTRE, CENTRE, centre));
    assertEquals(Status.OK, table.evaluate(tt, r, v, clock));
    // At mid-span the velocity is (1e-4 * 4 d, 1000, 0) m/s; a = (1e-4, 0, 0) m/s^2.
    final double vx = 1e-4 * TableImages.SPAN / 2;
    final double expected = -(vx * 1.5e6 + 1000.0 * 1.0e6) / C2;
    assertEquals(expected, clock.positionTermS(), 1e-22);
    assertEquals(-1.1703e-8, clock.positionTermS(), 0.0001e-8); // (34.56 * 1.5e6 + 1000 * 1e6) / c^2 by hand
    assertEquals(centre.tlMinusTtS() + expected, clock.tlMinusTtS(), 1e-16);
    assertEquals(centre.centreRate() - (1e-4 * 1.5e6) / C2, clock.rate(), 1e-24);
    final double[] vy = {0.0, 1600.0, 0.0};
    assertEquals(Status.OK, table.evaluate(tt, r, vy, clock));
    assertEquals(centre.centreRate() - (1e-4 * 1.5e6 + 1000.0 * 1600.0) / C2, clock.rate(), 1e-24);
    assertEquals(0x8000_0007L, clock.tableId());
  }

  @Test
  void outsideItsSpanOrWithoutATableTheEvaluatorRefusesAndCounts() {
    final LunarTimeTable table = new LunarTimeTable();
    final LunarTimeOffset out = new LunarTimeOffset();
    final SplitTime tt = SplitTime.of(TableImages.START, 0.0);
    assertEquals(Status.NOT_READY, table.evaluate(tt, CENTRE, CENTRE, out));
    assertEquals(1, table.notReadyCount());
    final byte[] image = new TableImages().build();
    table.load(image, 0, image.length);
    assertEquals(Status.OK, table.evaluate(SplitTime.of(TableImages.START + TableImages.SPAN, 0.0), CENTRE, CENTRE, out));
    final double atEnd = out.centreTlMinusTtS();
    assertEquals(Status.OUT_OF_RANGE, table.evaluate(SplitTime.of(TableImages.START + TableImages.SPAN, 1e-9), CENTRE,
        CENTRE, out));
    assertEquals(Status.OUT_OF_RANGE, table.evaluate(SplitTime.of(TableImages.START - 1, 0.999), CENTRE, CENTRE, out));
    assertEquals(atEnd, out.centreTlMinusTtS(), 0.0);
    assertEquals(2, table.outOfSpanCount());
    assertEquals(Status.OUT_OF_RANGE, table.lastEvaluateStatus());
    assertEquals(Status.NOT_FINITE, table.evaluate(tt, new double[] {Double.NaN, 0, 0}, CENTRE, out));
    assertEquals(Status.NOT_FINITE, table.evaluate(tt, CENTRE, new double[] {0, 0, Double.POSITIVE_INFINITY}, out));
    assertEquals(Status.OUT_OF_RANGE, table.evaluate(tt, new double[] {6.7e7, 0, 0}, CENTRE, out));
    assertEquals(Status.BUFFER_TOO_SMALL, table.evaluate(tt, new double[2], CENTRE, out));
    assertEquals(Status.BUFFER_TOO_SMALL, table.evaluate(tt, CENTRE, new double[2], out));
    assertEquals(5, table.badInputCount());
    assertEquals(9, table.evaluations());
    assertEquals(Status.OK, table.evaluate(tt, new double[] {6.5e7, 0, 0}, CENTRE, out));
    assertEquals(Status.OK, table.lastEvaluateStatus());
  }

  @Test
  void bytesAreBigEndian() {
    final byte[] image = new TableImages().build();
    final ByteBuffer b = ByteBuffer.wrap(image);
    assertEquals('E', image[0]);
    assertEquals('Z', image[1]);
    assertEquals('L', image[2]);
    assertEquals('T', image[3]);
    assertEquals(405, b.getShort(14));
    image[15] ^= 0x01; // ephemeris 404: still valid, and read as such
    final LunarTimeTable table = new LunarTimeTable();
    assertEquals(Status.OK, table.load(image, 0, image.length));
    assertEquals(404, table.ephemeris());
  }
}
