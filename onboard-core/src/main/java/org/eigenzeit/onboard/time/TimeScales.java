package org.eigenzeit.onboard.time;

import org.eigenzeit.onboard.status.CheckReturnValue;
import org.eigenzeit.onboard.status.Status;

/**
 * Conversions between TAI, TT, TCG, TDB, TCB, a GNSS-style system time and the linear part of the
 * lunar scales (TCL, TL), on {@link SplitTime} values counted from J2000.0 in each scale's own
 * labels. UTC goes through {@link LeapSecondTable}. The relations that need an ephemeris (TCB -
 * TCG, TCB - TCL) are the ground's; the core evaluates TL - TT from an uplinked table
 * ({@code org.eigenzeit.onboard.lunartime}).
 *
 * <p>Relations used:
 *
 * <pre>
 *   TT  = TAI + 32.184 s                                  (IAU 1991 Res. A4; IAU 2000 B1.9)
 *   TCG = TT + L_G / (1 - L_G) * (TT - T0)                (IAU 2000 Res. B1.9, exact form;
 *   TT  = TCG - L_G * (TCG - T0)                           IERS Conventions 2010 eq. 10.3)
 *   L_G = 6.969290134e-10 (defining), T0 = 1977-01-01T00:00:32.184 TT = JD 2443144.5003725
 *   SYS = TAI - k, k a configured whole number of seconds (19 s for GPS time, common practice)
 *   TDB = TCB - L_B (TCB - T0) + TDB0                     (IAU 2006 Resolution B3)
 *   L_B = 1.550519768e-8, TDB0 = -6.55e-5 s (defining), T0 = JD 2443144.5003725 in TCB labels
 *   TL  = TCL - L_L (TCL - T0)                            (Eigenzeit's TT-like lunar scale: the
 *                                                          TT/TCG relation with L_L for L_G)
 * </pre>
 *
 * <p>L_L is the lunar body's {@code scaleRateL} ({@code CentralBody.MOON}: GM_M/(R_M c^2) =
 * 3.1403e-11 by default); the IAU (2024 Resolution II) has not fixed it, see docs/algorithms.md.
 *
 * <p>Accuracy: the TT/TCG relation is exact by definition; the implementation's rounding is below
 * 1e-15 s for dates within a century of J2000 (the rate term is about 60 us/day and is computed
 * in one double from the elapsed seconds since T0). Checked against the IAU SOFA worked examples
 * and against jsofa over random dates.
 *
 * <p>Stateless; safe from any thread when callers do not share output instants. Nothing here
 * allocates. Input and output may be the same object. The conversions with defining constants
 * cannot fail for any instant (a fraction in [0, 1) moved by at most L_B times the range of a
 * long of seconds, below 1.5e11 s), so they return no status; the TCL/TL conversions take L_L as
 * an argument, check it and return a status.
 */
public final class TimeScales {
  /**
   * Largest |L_L| the TCL/TL conversions accept (the lunar L_L is about 6.8e-10): with it the
   * shift stays below 1e13 s for any instant, so the conversion cannot fail.
   */
  public static final double MAX_ABS_SCALE_RATE = 1.0e-6;
  /** TT - TAI in seconds (exact, IAU). */
  public static final double TT_MINUS_TAI_S = 32.184;
  /** L_G, the defining rate constant between TT and TCG (IAU 2000 Resolution B1.9). */
  public static final double L_G = 6.969290134e-10;
  /** TT seconds from T0 (1977-01-01T00:00:32.184 TT) to J2000.0: (2451545.0 - 2443144.5003725) d. */
  public static final double J2000_MINUS_T0_S = 725_803_167.816;
  /** TAI seconds from the CCSDS epoch 1958-01-01T00:00:00 TAI to J2000.0 (15340.5 days). */
  public static final long J2000_MINUS_1958_S = 1_325_419_200L;
  /** TAI minus GPS time in seconds (common practice: GPS time was set to UTC on 1980-01-06). */
  public static final int TAI_MINUS_GPS_S = 19;
  /** L_B, the defining rate constant between TDB and TCB (IAU 2006 Resolution B3). */
  public static final double L_B = 1.550519768e-8;
  /** TDB0, the defining offset of TDB at T0, s (IAU 2006 Resolution B3). */
  public static final double TDB0_S = -6.55e-5;

  private static final long TT_MINUS_TAI_WHOLE_S = 32L;
  private static final double TT_MINUS_TAI_FRACTION_S = 0.184;

  private TimeScales() {}

  /**
   * TAI to TT.
   *
   * @param tai instant in TAI
   * @param ttOut receives the instant in TT (may be {@code tai})
   */
  public static void taiToTt(SplitTime tai, SplitTime ttOut) {
    ttOut.setInRange(
        tai.wholeSeconds() + TT_MINUS_TAI_WHOLE_S, tai.fractionS() + TT_MINUS_TAI_FRACTION_S);
  }

  /**
   * TT to TAI.
   *
   * @param tt instant in TT
   * @param taiOut receives the instant in TAI (may be {@code tt})
   */
  public static void ttToTai(SplitTime tt, SplitTime taiOut) {
    taiOut.setInRange(
        tt.wholeSeconds() - TT_MINUS_TAI_WHOLE_S, tt.fractionS() - TT_MINUS_TAI_FRACTION_S);
  }

  /**
   * TT to TCG by the exact IAU 2000 B1.9 relation.
   *
   * @param tt instant in TT
   * @param tcgOut receives the instant in TCG (may be {@code tt})
   */
  public static void ttToTcg(SplitTime tt, SplitTime tcgOut) {
    final double sinceT0S = ((double) tt.wholeSeconds() + J2000_MINUS_T0_S) + tt.fractionS();
    final double shiftS = sinceT0S * (L_G / (1.0 - L_G));
    tcgOut.setInRange(tt.wholeSeconds(), tt.fractionS() + shiftS);
  }

  /**
   * TCG to TT by the exact IAU 2000 B1.9 relation.
   *
   * @param tcg instant in TCG
   * @param ttOut receives the instant in TT (may be {@code tcg})
   */
  public static void tcgToTt(SplitTime tcg, SplitTime ttOut) {
    final double sinceT0S = ((double) tcg.wholeSeconds() + J2000_MINUS_T0_S) + tcg.fractionS();
    ttOut.setInRange(tcg.wholeSeconds(), tcg.fractionS() - sinceT0S * L_G);
  }

  /**
   * TAI to a GNSS-style system time that runs at the TAI rate with a whole-second offset.
   *
   * @param tai instant in TAI
   * @param taiMinusSystemS TAI minus system time in whole seconds (19 for GPS time)
   * @param systemOut receives the instant in system time (may be {@code tai})
   */
  public static void taiToSystem(SplitTime tai, int taiMinusSystemS, SplitTime systemOut) {
    systemOut.setInRange(tai.wholeSeconds() - taiMinusSystemS, tai.fractionS());
  }

  /**
   * GNSS-style system time to TAI.
   *
   * @param system instant in system time
   * @param taiMinusSystemS TAI minus system time in whole seconds (19 for GPS time)
   * @param taiOut receives the instant in TAI (may be {@code system})
   */
  public static void systemToTai(SplitTime system, int taiMinusSystemS, SplitTime taiOut) {
    taiOut.setInRange(system.wholeSeconds() + taiMinusSystemS, system.fractionS());
  }

  /**
   * TCB to TDB by the IAU 2006 B3 definition.
   *
   * @param tcb instant in TCB
   * @param tdbOut receives the instant in TDB (may be {@code tcb})
   */
  public static void tcbToTdb(SplitTime tcb, SplitTime tdbOut) {
    final double sinceT0S = ((double) tcb.wholeSeconds() + J2000_MINUS_T0_S) + tcb.fractionS();
    tdbOut.setInRange(tcb.wholeSeconds(), tcb.fractionS() + (TDB0_S - L_B * sinceT0S));
  }

  /**
   * TDB to TCB by the IAU 2006 B3 definition, inverted exactly:
   * TCB - TDB = (L_B (TDB - T0) - TDB0) / (1 - L_B).
   *
   * @param tdb instant in TDB
   * @param tcbOut receives the instant in TCB (may be {@code tdb})
   */
  public static void tdbToTcb(SplitTime tdb, SplitTime tcbOut) {
    final double sinceT0S = ((double) tdb.wholeSeconds() + J2000_MINUS_T0_S) + tdb.fractionS();
    tcbOut.setInRange(tdb.wholeSeconds(), tdb.fractionS() + (L_B * sinceT0S - TDB0_S) / (1.0 - L_B));
  }

  /**
   * TCL to TL: TL = TCL - L_L (TCL - T0).
   *
   * @param tcl instant in TCL
   * @param scaleRateL L_L (the lunar body's {@code scaleRateL}), |L_L| below {@link
   *     #MAX_ABS_SCALE_RATE}
   * @param tlOut receives the instant in TL (may be {@code tcl}); unchanged on a fault
   * @return {@link Status#OK}, {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE} (L_L)
   */
  @CheckReturnValue
  public static int tclToTl(SplitTime tcl, double scaleRateL, SplitTime tlOut) {
    final int st = checkScaleRate(scaleRateL);
    if (st != Status.OK) {
      return st;
    }
    final double sinceT0S = ((double) tcl.wholeSeconds() + J2000_MINUS_T0_S) + tcl.fractionS();
    tlOut.setInRange(tcl.wholeSeconds(), tcl.fractionS() - sinceT0S * scaleRateL);
    return Status.OK;
  }

  /**
   * TL to TCL: TCL = TL + L_L/(1 - L_L) (TL - T0).
   *
   * @param tl instant in TL
   * @param scaleRateL L_L (the lunar body's {@code scaleRateL}), |L_L| below {@link
   *     #MAX_ABS_SCALE_RATE}
   * @param tclOut receives the instant in TCL (may be {@code tl}); unchanged on a fault
   * @return {@link Status#OK}, {@link Status#NOT_FINITE} or {@link Status#OUT_OF_RANGE} (L_L)
   */
  @CheckReturnValue
  public static int tlToTcl(SplitTime tl, double scaleRateL, SplitTime tclOut) {
    final int st = checkScaleRate(scaleRateL);
    if (st != Status.OK) {
      return st;
    }
    final double sinceT0S = ((double) tl.wholeSeconds() + J2000_MINUS_T0_S) + tl.fractionS();
    tclOut.setInRange(tl.wholeSeconds(), tl.fractionS() + sinceT0S * (scaleRateL / (1.0 - scaleRateL)));
    return Status.OK;
  }

  /** A defining rate the conversions accept: finite and below {@link #MAX_ABS_SCALE_RATE}. */
  private static int checkScaleRate(double scaleRateL) {
    if (!Double.isFinite(scaleRateL)) {
      return Status.NOT_FINITE;
    }
    return Math.abs(scaleRateL) < MAX_ABS_SCALE_RATE ? Status.OK : Status.OUT_OF_RANGE;
  }
}
