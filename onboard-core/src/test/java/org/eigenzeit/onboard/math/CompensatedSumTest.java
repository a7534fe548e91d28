package org.eigenzeit.onboard.math;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.junit.jupiter.api.Test;

/**
 * Compensated summation: a year of 1 Hz clock-rate increments against a double-double reference
 * sum (Knuth's error-free TwoSum, TAOCP vol. 2 section 4.2.2; error about n u^2 |S|, i.e. below
 * 1e-25 s here), cross-checked on a prefix against an exact BigDecimal sum.
 */
class CompensatedSumTest {
  /** 10x the measured error of the compensated sum (2.3e-19 s). */
  private static final double BOUND_S = 2.3e-18;

  @Test
  void aYearOfOneHertzIncrementsLosesLessThanAFemtosecond() {
    // Increments of a GPS-like rate (4.4647e-10 s/s) modulated like an eccentric orbit.
    final int n = 365 * 86_400;
    final CompensatedSum sum = new CompensatedSum();
    double naive = 0;
    double hi = 0;
    double lo = 0;
    BigDecimal exactPrefix = BigDecimal.ZERO;
    final MathContext mc = MathContext.DECIMAL128;
    final int prefix = 200_000;
    for (int i = 0; i < n; i++) {
      final double x = 4.4647e-10 + 3.4e-12 * Math.sin(i * 1.458e-4);
      sum.add(x);
      naive += x;
      // double-double accumulation: (hi, lo) += x with TwoSum
      final double s = hi + x;
      final double bb = s - hi;
      final double err2 = (hi - (s - bb)) + (x - bb);
      hi = s;
      lo += err2;
      if (i < prefix) {
        exactPrefix = exactPrefix.add(new BigDecimal(x), mc);
        if (i == prefix - 1) {
          assertEquals(0.0, exactPrefix.subtract(new BigDecimal(hi).add(new BigDecimal(lo), mc), mc).doubleValue(), 1e-25);
        }
      }
    }
    final BigDecimal exact = new BigDecimal(hi).add(new BigDecimal(lo), mc);
    final double err = Math.abs(exact.subtract(new BigDecimal(sum.value()), mc).doubleValue());
    final double naiveErr = Math.abs(exact.subtract(new BigDecimal(naive), mc).doubleValue());
    System.out.printf("year of 1 Hz increments: compensated error %.2e s, naive %.2e s%n", err, naiveErr);
    System.out.printf("evidence: core.year_of_sums_error_s = %.3e bound %.1e%n", err, BOUND_S);
    // The requirement (EZ-NUM-01) is 1 fs; the test holds the measured 2.3e-19 s to 10x, because the
    // plain double sum of the same increments already stays below 1 fs (measured 9.9e-16 s) and a
    // 1 fs bound could not tell compensation from none.
    assertTrue(err < BOUND_S, "error " + err);
    assertTrue(naiveErr > 100 * BOUND_S, "the naive sum must lose visibly, or the check proves nothing: " + naiveErr);
  }

  @Test
  void partsRoundTripAndReset() {
    final CompensatedSum a = new CompensatedSum();
    a.add(1.0);
    a.add(1e-20);
    a.add(1e20);
    a.add(-1e20);
    assertEquals(1.0 + 1e-20, a.value(), 0);
    final CompensatedSum b = new CompensatedSum();
    b.set(a.high(), a.low());
    assertEquals(a.value(), b.value(), 0);
    b.reset();
    assertEquals(0.0, b.value(), 0);
  }

  @Test
  void mathModesAndVectors() {
    assertTrue(MathMode.STRICT.isStrict());
    assertFalse(MathMode.FAST.isStrict());
    assertEquals("STRICT", MathMode.STRICT.toString());
    assertEquals("FAST", MathMode.FAST.toString());
    for (MathMode m : new MathMode[] {MathMode.FAST, MathMode.STRICT}) {
      assertEquals(Math.PI / 4, m.atan2(1, 1), 1e-15);
      assertEquals(3.0, m.sqrt(9.0), 0);
      assertEquals(1.0, m.sin(Math.PI / 2), 0);
      assertEquals(1.0, m.cos(0), 0);
    }
    assertFalse(Vec3.isFinite(new double[] {0, 0, Double.NaN}));
    assertFalse(Vec3.isFinite(new double[] {0, Double.NaN, 0}));
    assertTrue(Vec3.isFinite(new double[] {0, 0, 0}));
  }
}
