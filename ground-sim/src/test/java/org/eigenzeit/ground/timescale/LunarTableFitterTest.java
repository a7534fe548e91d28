package org.eigenzeit.ground.timescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.lunartime.LunarTimeOffset;
import org.eigenzeit.onboard.lunartime.LunarTimeTable;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The ground's lunar table and the onboard evaluator: the core reproduces the ground's numerical
 * TL - TT, at the Moon's centre and at an orbiting clock, within the accuracy the table states;
 * corrupted and expired tables are refused.
 */
class LunarTableFitterTest {
  /** 2026-10-01T00:00:00 TT. */
  private static final long START = 844_128_000L - 43_200L;
  private static final TimeScaleConverter CONVERTER = new TimeScaleConverter(TimeRelationsFixture.get().relations,
      TimeScaleConverter.shippedLeapSeconds());

  @Test
  void degreeAndSegmentsAreChosenByTheMeasuredError() {
    final LunarTableFitter fitter = new LunarTableFitter(CONVERTER);
    for (long days : new long[] {7, 14, 32}) {
      final LunarTableFitter.Fit fit = fitter.choose(START, days * 86_400, 1e-12, days);
      System.out.printf("evidence: lunartable.days%d_degree = %d%n", days, fit.degree());
      System.out.printf("evidence: lunartable.days%d_segments = %d%n", days, fit.segments());
      System.out.printf("evidence: lunartable.days%d_fit_error_s = %.3e%n", days, fit.maxErrorS());
      System.out.printf("evidence: lunartable.days%d_bytes = %d%n", days, fit.image().length);
      assertTrue(fit.maxErrorS() <= 1e-12 && fit.maxVelocityErrorMPerS() <= 0.01);
      assertTrue(fit.accuracyS() >= 2 * fit.maxErrorS());
      // One degree less in the same segments misses the target (else it would have been chosen).
      if (fit.degree() > 4) {
        assertTrue(fitter.fit(START, days * 86_400, fit.degree() - 1, fit.segments(), 1).maxErrorS() > 1e-12);
      }
    }
    assertThrows(IllegalArgumentException.class, () -> fitter.choose(START, 32 * 86_400, 1e-16, 1));
    assertThrows(IllegalArgumentException.class, () -> fitter.fit(START, 65 * 86_400, 10, 1, 1));
    assertThrows(IllegalArgumentException.class, () -> fitter.fit(START, 7 * 86_400, 10, 1, 0));
    assertThrows(IllegalStateException.class, () -> fitter.fit(START, 32 * 86_400, 6, 2, 1));
    assertThrows(IllegalArgumentException.class, () -> fitter.fit(45L * 365 * 86_400, 7 * 86_400, 10, 1, 1));
  }

  @Test
  void theCoreReproducesTheGroundWithinTheStatedAccuracy() {
    final LunarTableFitter.Fit fit = new LunarTableFitter(CONVERTER).choose(START, 32 * 86_400, 1e-12, 17);
    final byte[] image = fit.image();
    final LunarTimeTable table = new LunarTimeTable();
    assertEquals(Status.OK, table.load(image, 0, image.length));
    assertEquals(CONVERTER.relations().lunar().scaleRateL(), table.scaleRateL(), 0.0);
    assertEquals(17L, table.tableId());
    final LunarTimeOffset out = new LunarTimeOffset();
    final double[] zero = new double[3];
    final double[] r = new double[3];
    final double[] v = new double[3];
    double worstCentre = 0;
    double worstClock = 0;
    double largestTerm = 0;
    for (double t = 0; t <= 32 * 86_400; t += 1003.7) {
      final SplitTime tt = SplitTime.of(START, 0.0);
      assertEquals(Status.OK, tt.addSeconds(t));
      final TimeScaleConverter.Converted c = CONVERTER.convert(TimeScale.TT, tt, false, Centre.MOON);
      assertEquals(Status.OK, table.evaluate(tt, zero, zero, out));
      worstCentre = Math.max(worstCentre, Math.abs(out.centreTlMinusTtS() - c.labels().get(TimeScale.TL).secondsSince(tt)));
      // An orbiter 100 km above the Moon in a polar orbit, period about 7070 s.
      final double phase = 2 * Math.PI * t / 7070.0;
      r[0] = 1.838e6 * Math.cos(phase);
      r[2] = 1.838e6 * Math.sin(phase);
      v[0] = -1633.0 * Math.sin(phase);
      v[2] = 1633.0 * Math.cos(phase);
      assertEquals(Status.OK, table.evaluate(tt, r, v, out));
      // Ground: the event at x = x_M + r, both 4-D transformations with their position terms.
      worstClock = Math.max(worstClock, Math.abs(out.tlMinusTtS() - CONVERTER.tlMinusTtAtClockS(tt, r)));
      largestTerm = Math.max(largestTerm, Math.abs(out.positionTermS()));
    }
    System.out.printf("evidence: lunartable.core_vs_ground_centre_s = %.3e%n", worstCentre);
    System.out.printf("evidence: lunartable.core_vs_ground_orbiter_s = %.3e%n", worstClock);
    System.out.printf("evidence: lunartable.orbiter_position_term_s = %.3e%n", largestTerm);
    System.out.printf("evidence: lunartable.stated_accuracy_s = %.3e%n", fit.accuracyS());
    assertTrue(worstCentre <= fit.accuracyS(), "centre " + worstCentre);
    // At the clock: the fit, the velocity fit's share (0.01 m/s x 1838 km / c^2 = 2e-13 s).
    assertTrue(worstClock <= fit.accuracyS() + 2e-13, "clock " + worstClock);
    // v_rel about 1.02 km/s times 1838 km over c^2: about 21 ns.
    assertTrue(largestTerm > 1.9e-8 && largestTerm < 2.3e-8, "position term " + largestTerm);
    assertEquals(2.09e-8, 1.025e3 * 1.838e6 / CentralBody.C2, 0.01e-8);
  }

  @Test
  void corruptedAndExpiredTablesAreRefused() {
    final LunarTableFitter.Fit fit = new LunarTableFitter(CONVERTER).fit(START, 7 * 86_400, 8, 1, 5);
    final byte[] good = fit.image();
    assertEquals(Status.OK, LunarTimeTable.validate(good, 0, good.length));
    final byte[] magic = good.clone();
    magic[0] ^= 0x10;
    assertEquals(Status.MALFORMED, LunarTimeTable.validate(magic, 0, magic.length));
    final byte[] exponent = good.clone();
    exponent[LunarTimeTable.HEADER_BYTES] ^= 0x04; // exponent bit of c_0 of TL - TT: 1 s becomes about 1e77 s
    assertEquals(Status.OUT_OF_RANGE, LunarTimeTable.validate(exponent, 0, exponent.length));
    final byte[] rate = good.clone();
    rate[LunarTimeTable.HEADER_BYTES + 8] ^= (byte) 0x80; // sign of c_1: TL - TT decreasing
    assertEquals(Status.OUT_OF_RANGE, LunarTimeTable.validate(rate, 0, rate.length));
    final byte[] nan = good.clone();
    for (int i = 0; i < 8; i++) {
      nan[LunarTimeTable.HEADER_BYTES + 8 * 20 + i] = (byte) 0xFF;
    }
    assertEquals(Status.NOT_FINITE, LunarTimeTable.validate(nan, 0, nan.length));
    assertEquals(Status.MALFORMED, LunarTimeTable.validate(good, 0, good.length - 8));
    // What the content check cannot see, a flipped low mantissa bit, is the CRC's to catch (the
    // uplink-table mechanism around this layout): the validator alone accepts it.
    final byte[] mantissa = good.clone();
    mantissa[LunarTimeTable.HEADER_BYTES + 7] ^= 0x01;
    assertEquals(Status.OK, LunarTimeTable.validate(mantissa, 0, mantissa.length));
    // Expired: one second after the span's end.
    final LunarTimeTable table = new LunarTimeTable();
    assertEquals(Status.OK, table.load(good, 0, good.length));
    final LunarTimeOffset out = new LunarTimeOffset();
    final double[] zero = new double[3];
    assertEquals(Status.OK, table.evaluate(SplitTime.of(fit.endTtS(), 0.0), zero, zero, out));
    assertEquals(Status.OUT_OF_RANGE, table.evaluate(SplitTime.of(fit.endTtS() + 1, 0.0), zero, zero, out));
    assertEquals(1, table.outOfSpanCount());
    assertEquals(Status.MALFORMED, table.load(magic, 0, magic.length));
    assertEquals(1, table.loadFailures());
    assertEquals(Status.OK, table.evaluate(SplitTime.of(START + 3600, 0.0), zero, zero, out));
  }
}
