package org.eigenzeit.onboard.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.math.BigDecimal;
import java.math.MathContext;
import org.eigenzeit.onboard.status.Status;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/**
 * TDB/TCB (IAU 2006 Resolution B3) against IAU SOFA through jsofa, and TCL/TL (the TT/TCG form
 * with L_L) against exact decimal arithmetic written here.
 */
class TimeScalesBarycentricTest {
  private static double differenceS(SplitTime t, double jd1, double jd2) {
    final SplitTime other = new SplitTime();
    assertEquals(Status.OK, other.setJulianDate(jd1, jd2));
    return t.secondsSince(other);
  }

  @Test
  void definingConstantsOfIau2006B3() {
    // IAU 2006 Resolution B3: L_B = 1.550519768e-8, TDB0 = -6.55e-5 s (defining values).
    assertEquals(1.550519768e-8, TimeScales.L_B, 0.0);
    assertEquals(-6.55e-5, TimeScales.TDB0_S, 0.0);
  }

  @Test
  void sofaExamplesTdbTcb() {
    // IAU SOFA test suite (t_sofa_c.c, t_tdbtcb and t_tcbtdb; values from memory, and the same
    // inputs through jsofa below): 2453750.5 + 0.892855137 TDB -> 0.8930195997253656716 TCB,
    // 2453750.5 + 0.893019599 TCB -> 0.8928551362746343397 TDB.
    final SplitTime t = new SplitTime();
    assertEquals(Status.OK, t.setJulianDate(2453750.5, 0.892855137));
    TimeScales.tdbToTcb(t, t);
    assertEquals(0.0, differenceS(t, 2453750.5, 0.8930195997253656716), 1e-9);
    final JSOFA.JulianDate sofa = JSOFA.jauTdbtcb(2453750.5, 0.892855137);
    assertEquals(0.0, differenceS(t, sofa.djm0, sofa.djm1), 1e-9);
    assertEquals(Status.OK, t.setJulianDate(2453750.5, 0.893019599));
    TimeScales.tcbToTdb(t, t);
    assertEquals(0.0, differenceS(t, 2453750.5, 0.8928551362746343397), 1e-9);
  }

  @Test
  void tdbTcbAgreesWithJsofaOverRandomDates() {
    // Independent reference: jsofa tdbtcb / tcbtdb. Their two-part JD holds a day fraction in a
    // double (about 1e-11 s resolution); measured worst 3.6e-11 s, tolerance 3e-10 s.
    final double[] worst = new double[1];
    qt().withExamples(2000).withFixedSeed(20261217L)
        .forAll(doubles().between(2_430_000.5, 2_470_000.5), doubles().between(0.0, 1.0))
        .checkAssert((jd1raw, jd2) -> {
          final double jd1 = Math.floor(jd1raw) + 0.5;
          final SplitTime tdb = new SplitTime();
          assertEquals(Status.OK, tdb.setJulianDate(jd1, jd2));
          final SplitTime tcb = new SplitTime();
          TimeScales.tdbToTcb(tdb, tcb);
          final JSOFA.JulianDate ref = JSOFA.jauTdbtcb(jd1, jd2);
          final double d = differenceS(tcb, ref.djm0, ref.djm1);
          worst[0] = Math.max(worst[0], Math.abs(d));
          assertEquals(0.0, d, 3e-10);
          final JSOFA.JulianDate back = JSOFA.jauTcbtdb(ref.djm0, ref.djm1);
          final SplitTime ours = new SplitTime();
          TimeScales.tcbToTdb(tcb, ours);
          final double dBack = differenceS(ours, back.djm0, back.djm1);
          worst[0] = Math.max(worst[0], Math.abs(dBack));
          assertEquals(0.0, dBack, 3e-10);
          assertEquals(0.0, ours.secondsSince(tdb), 5e-14); // double of TCB - T0 (ulp 2.4e-7 s) times L_B, measured 1.1e-14 s
        });
    System.out.printf("evidence: time.tdb_tcb_vs_jsofa_s = %.3e%n", worst[0]);
  }

  /** TL = TCL - L_L (TCL - T0) in 40-digit decimals: the independent check of both directions. */
  private static BigDecimal tlExact(BigDecimal tclS, BigDecimal l) {
    final BigDecimal t0 = new BigDecimal("-725803167.816");
    return tclS.subtract(l.multiply(tclS.subtract(t0), MathContext.DECIMAL128), MathContext.DECIMAL128);
  }

  @Test
  void tclTlAgreeWithDecimalArithmetic() {
    // Measured worst 6.8e-17 s over 1975-2050; tolerance 1e-15 s (the fraction's resolution is 1.1e-16 s).
    final double[] worst = new double[1];
    final double l = 3.1402646e-11;
    qt().withExamples(1000).withFixedSeed(20261218L)
        .forAll(doubles().between(-8.0e8, 1.6e9), doubles().between(0.0, 0.999999))
        .checkAssert((whole, fraction) -> {
          final SplitTime tcl = SplitTime.of((long) Math.floor(whole), fraction);
          final SplitTime tl = new SplitTime();
          assertEquals(Status.OK, TimeScales.tclToTl(tcl, l, tl));
          final BigDecimal tclS = BigDecimal.valueOf(tcl.wholeSeconds()).add(new BigDecimal(tcl.fractionS()));
          final BigDecimal expected = tlExact(tclS, new BigDecimal(l));
          final BigDecimal got = BigDecimal.valueOf(tl.wholeSeconds()).add(new BigDecimal(tl.fractionS()));
          final double d = got.subtract(expected).doubleValue();
          worst[0] = Math.max(worst[0], Math.abs(d));
          assertEquals(0.0, d, 1e-15);
          final SplitTime back = new SplitTime();
          assertEquals(Status.OK, TimeScales.tlToTcl(tl, l, back));
          assertEquals(0.0, back.secondsSince(tcl), 1e-15);
        });
    System.out.printf("evidence: time.tl_tcl_vs_decimal_s = %.3e%n", worst[0]);
  }

  @Test
  void lunarConversionsRefuseAnUnusableDefiningRateAndLeaveTheOutputUnchanged() {
    // L_L is an argument (the lunar body's), so it is checked: NaN, infinity and a rate of 1e-6 or
    // more are refused (the IAU's lunar L_L is about 6.8e-10, common practice).
    final SplitTime in = SplitTime.of(800_000_000L, 0.5);
    final SplitTime out = SplitTime.of(1L, 0.25);
    for (double bad : new double[] {Double.NaN, Double.POSITIVE_INFINITY, 1e-6, -2e-6}) {
      final int expected = Double.isFinite(bad) ? Status.OUT_OF_RANGE : Status.NOT_FINITE;
      assertEquals(expected, TimeScales.tclToTl(in, bad, out), "L_L " + bad);
      assertEquals(expected, TimeScales.tlToTcl(in, bad, out), "L_L " + bad);
      assertEquals(0.0, out.secondsSince(SplitTime.of(1L, 0.25)), 0.0, "output unchanged");
    }
    assertEquals(Status.OK, TimeScales.tclToTl(in, 6.8e-10, out));
  }
}
