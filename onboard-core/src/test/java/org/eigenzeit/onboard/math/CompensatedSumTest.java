package org.eigenzeit.onboard.math;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import org.junit.jupiter.api.Test;

/**
 * Compensated summation: a year of 1 Hz clock-rate increments against their exact sum, formed in
 * the test by integer arithmetic (no floating-point step, no summation algorithm). Every increment
 * lies in the binade [2^-32, 2^-31), so it is exactly m 2^-84 with an integer m below 2^53
 * (IEEE 754 binary64: 52 stored fraction bits); the exact sum is (sum of m) 2^-84, accumulated
 * in two longs (high and low 26-bit parts of m, each total below 2^52) and scaled in BigDecimal.
 */
class CompensatedSumTest {
  /** 10x the measured error of the compensated sum (2.3e-19 s). */
  private static final double BOUND_S = 2.3e-18;
  /** 2^-84, the spacing of doubles in [2^-32, 2^-31), exact as a BigDecimal. */
  private static final BigDecimal ULP = BigDecimal.ONE.divide(BigDecimal.valueOf(2).pow(84));
  private static final long LOW_MASK = (1L << 26) - 1;

  @Test
  void aYearOfOneHertzIncrementsLosesLessThanAFemtosecond() {
    // Increments of a GPS-like rate (4.4647e-10 s/s) modulated like an eccentric orbit.
    final int n = 365 * 86_400;
    final CompensatedSum sum = new CompensatedSum();
    double naive = 0;
    long mHigh = 0;
    long mLow = 0;
    for (int i = 0; i < n; i++) {
      final double x = 4.4647e-10 + 3.4e-12 * Math.sin(i * 1.458e-4);
      sum.add(x);
      naive += x;
      // x = m 2^-84 exactly: the binade is fixed, so m is the significand with its hidden bit.
      if (Math.getExponent(x) != -32) {
        fail("increment outside [2^-32, 2^-31): " + x);
      }
      final long m = (Double.doubleToRawLongBits(x) & ((1L << 52) - 1)) | (1L << 52);
      mHigh += m >>> 26;
      mLow += m & LOW_MASK;
    }
    final BigDecimal exact = new BigDecimal(BigInteger.valueOf(mHigh).shiftLeft(26)
        .add(BigInteger.valueOf(mLow))).multiply(ULP);
    // Cross-check of the integer decoding on one value: 4.4647e-10 itself, exactly, as BigDecimal.
    final double x0 = 4.4647e-10;
    final long m0 = (Double.doubleToRawLongBits(x0) & ((1L << 52) - 1)) | (1L << 52);
    assertEquals(0, new BigDecimal(x0).compareTo(BigDecimal.valueOf(m0).multiply(ULP)));
    final MathContext mc = MathContext.DECIMAL128;
    final double err = Math.abs(exact.subtract(new BigDecimal(sum.value()), mc).doubleValue());
    final double naiveErr = Math.abs(exact.subtract(new BigDecimal(naive), mc).doubleValue());
    System.out.printf("year of 1 Hz increments: compensated error %.2e s, naive %.2e s (exact sum %.17e s)%n",
        err, naiveErr, exact.doubleValue());
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
