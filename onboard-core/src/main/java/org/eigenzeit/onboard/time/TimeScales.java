package org.eigenzeit.onboard.time;

/**
 * Conversions between TAI, TT, TCG and a GNSS-style system time, on {@link SplitTime} values
 * counted from J2000.0 in each scale's own labels. UTC goes through {@link LeapSecondTable}.
 *
 * <p>Relations used:
 *
 * <pre>
 *   TT  = TAI + 32.184 s                                  (IAU 1991 Res. A4; IAU 2000 B1.9)
 *   TCG = TT + L_G / (1 - L_G) * (TT - T0)                (IAU 2000 Res. B1.9, exact form;
 *   TT  = TCG - L_G * (TCG - T0)                           IERS Conventions 2010 eq. 10.3)
 *   L_G = 6.969290134e-10 (defining), T0 = 1977-01-01T00:00:32.184 TT = JD 2443144.5003725
 *   SYS = TAI - k, k a configured whole number of seconds (19 s for GPS time, common practice)
 * </pre>
 *
 * <p>Accuracy: the TT/TCG relation is exact by definition; the implementation's rounding is below
 * 1e-15 s for dates within a century of J2000 (the rate term is about 60 us/day and is computed
 * in one double from the elapsed seconds since T0). Checked against the IAU SOFA worked examples
 * and against jsofa over random dates.
 *
 * <p>Stateless; safe from any thread when callers do not share output instants. Nothing here
 * allocates. Input and output may be the same object. The conversions cannot fail for a valid
 * instant (a fraction in [0, 1) moved by at most L_G times the age of the universe), so they
 * return no status.
 */
public final class TimeScales {
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
}
