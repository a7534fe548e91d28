package org.eigenzeit.ground.timescale;

/**
 * Angular frequencies of the solar-system arguments that dominate the periodic parts of the
 * time relations, for the harmonic fits that separate a relation's constant and rate from its
 * periodic terms.
 *
 * <p>Values in rad per Julian millennium. Planetary and annual arguments: the arguments of the
 * largest terms of the Fairhead and Bretagnon (1990) TDB - TT series ("A(FB) analytical formula
 * for the TDB - TT difference", A&amp;A 229, 240), as carried by IAU SOFA {@code dtdb} (from
 * memory). Lunar arguments: the Delaunay arguments l (mean anomaly of the Moon) and D (mean
 * elongation) and the Moon's mean longitude, rates of Simon et al. (1994) as given in IERS
 * Conventions (2010) eq. 5.43 (from memory), and their combinations (evection 2D - l,
 * variation 2D). Arguments closer together than the resolution of a 40-year span
 * (2 pi / 40 yr = 157 rad per millennium) are represented by one of them, and arguments of
 * periods beyond 40 years (Uranus, Neptune, the 1783-year term) are left out: they cannot be told
 * from the constant and the rate over the span, and what they contribute is stated where a rate
 * or constant is fitted ({@link TimeScaleRelations}).
 */
final class Frequencies {
  private static final double MILLENNIUM_S = 365_250.0 * 86_400.0;

  /** Annual and planetary arguments, rad per Julian millennium. */
  private static final double[] PLANETARY = {
    6283.075849991, 12566.151699983, 18849.227549974, 5753.384884897, 6069.776754553, 529.690965095,
    213.299095438, 7860.419392439, 5223.693919802, 3930.209696220, 11506.769769794, 1577.343542448,
    5507.553238667, 12036.460734888, 10977.078804699, 10213.285546211, 1059.381930189, 398.149003408,
    775.522611324};

  /** Lunar arguments: D, 2D, D - annual, l, 2l, 2D - l, mean longitude, F, 2D - annual, l +/- annual. */
  private static final double[] LUNAR = {
    77713.771467920, 155427.542935840, 71430.695617928, 83286.914269554, 166573.828539108,
    72140.628666286, 83997.091135580, 84334.661581308, 149144.467085848, 89569.990119545,
    77003.838419563};

  /** Index of the annual argument in {@link #all()}. */
  static final int ANNUAL = 0;
  /** Index of the synodic month D in {@link #all()}. */
  static final int SYNODIC_MONTH = PLANETARY.length;
  /** Index of the anomalistic month l in {@link #all()}. */
  static final int ANOMALISTIC_MONTH = PLANETARY.length + 3;

  private Frequencies() {}

  /**
   * Every argument, rad/s.
   *
   * @return a new array: the planetary arguments, then the lunar ones
   */
  static double[] all() {
    final double[] out = new double[PLANETARY.length + LUNAR.length];
    for (int i = 0; i < PLANETARY.length; i++) {
      out[i] = PLANETARY[i] / MILLENNIUM_S;
    }
    for (int i = 0; i < LUNAR.length; i++) {
      out[PLANETARY.length + i] = LUNAR[i] / MILLENNIUM_S;
    }
    return out;
  }
}
