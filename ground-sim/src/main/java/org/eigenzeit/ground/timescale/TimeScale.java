package org.eigenzeit.ground.timescale;

/**
 * The time scales the ground converts between, each with the relation it is realised by and its
 * accuracy here.
 */
public enum TimeScale {
  /** Coordinated Universal Time, from TAI through the shipped IERS leap-second table. */
  UTC("UTC = TAI - (TAI - UTC) from the IERS leap-second table (IERS Bulletin C)",
      "exact within the table (1972 to its expiry); later instants use the last offset, flagged"),
  /** International Atomic Time. */
  TAI("TAI (BIPM)", "exact (the pivot of the atomic scales)"),
  /** Terrestrial Time. */
  TT("TT = TAI + 32.184 s (IAU 1991 Res. A4, IAU 2000 Res. B1.9)", "exact by definition"),
  /** Geocentric Coordinate Time. */
  TCG("TCG = TT + L_G/(1 - L_G) (TT - T0), L_G = 6.969290134e-10 (IAU 2000 Res. B1.9)", "exact by definition"),
  /** Barycentric Dynamical Time. */
  TDB("TDB = TCB - L_B (TCB - T0) + TDB0, L_B = 1.550519768e-8, TDB0 = -6.55e-5 s (IAU 2006 Res. B3); "
      + "TCB - TCG numerically along DE405 (IERS Conventions 2010 section 10.1)",
      "periodic part within 12 ns of IAU SOFA dtdb over 2000-2040; constant realised from the 40-year DE405 "
      + "span, 2.3 us from the SOFA/Fairhead-Bretagnon convention (docs/time-scales.md)"),
  /** Barycentric Coordinate Time. */
  TCB("TCB from TCG by the 4-D transformation integrated along DE405 (IERS Conventions 2010 section 10.1)",
      "as TDB"),
  /** GPS system time, nominal. */
  GPS("GPS time = TAI - 19 s (IS-GPS-200: GPS time began 1980-01-06T00:00:00 UTC, TAI - UTC = 19 s)",
      "nominal: the broadcast GPS time differs from TAI - 19 s by tens of ns (its offset to UTC(USNO))"),
  /** Galileo System Time, nominal. */
  GST("GST = TAI - 19 s (Galileo OS SIS ICD: GST was 13 s at 1999-08-22T00:00:00 UTC, TAI - UTC = 32 s)",
      "nominal: the realised GST differs from TAI - 19 s by tens of ns (its broadcast offset to UTC)"),
  /** BeiDou Time, nominal. */
  BDT("BDT = TAI - 33 s (BDS SIS ICD: BDT began 2006-01-01T00:00:00 UTC, TAI - UTC = 33 s)",
      "nominal: the realised BDT differs from TAI - 33 s by tens of ns (its broadcast offset to UTC(NTSC))"),
  /** Lunar Coordinate Time. */
  TCL("TCL from TCB by the 4-D transformation about the Moon (IAU 2024 Res. II) integrated along DE405",
      "mean dTCL/dTDB within 1e-15 of Lu, Yang and Xie (2025); constant by Eigenzeit's convention (not standardised)"),
  /** Eigenzeit's TT-like lunar time. */
  TL("TL = TCL - L_L (TCL - T0) (Eigenzeit; L_L not fixed by the IAU)",
      "TL - TT drift set by L_L; periodic terms within a few ns of Turyshev et al. (2024); constant by convention");

  private final String relation;
  private final String accuracy;

  TimeScale(String relation, String accuracy) {
    this.relation = relation;
    this.accuracy = accuracy;
  }

  /** @return how the scale is related to the others, with its source */
  public String relation() {
    return relation;
  }

  /** @return its accuracy as realised here */
  public String accuracy() {
    return accuracy;
  }

  /** @return whether the scale needs the ephemeris (TDB, TCB, TCL, TL) */
  public boolean needsEphemeris() {
    return this == TDB || this == TCB || this == TCL || this == TL;
  }

  /**
   * TAI minus this scale for the nominal GNSS system times.
   *
   * @return whole seconds, or -1 for a scale that is not a GNSS system time
   */
  public int taiMinusSystemS() {
    switch (this) {
      case GPS:
      case GST:
        return 19;
      case BDT:
        return 33;
      default:
        return -1;
    }
  }
}
