package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.LunisolarEphemeris;
import org.eigenzeit.onboard.math.MathMode;

/**
 * Positions of the two tidal bodies relative to the central body, as the rate model reads them:
 * for the Earth the Sun ({@code first}) and the Moon ({@code second}), for the Moon the Sun and the
 * Earth, from the low-precision series of {@link LunisolarEphemeris} (seen from the Moon: the Sun
 * at sun - moon and the Earth at -moon). The caller decides the cadence ({@link #refresh}); the
 * tracker's orientation cache refreshes once per 60 s slot of TT.
 *
 * <p>Mutable; one owner. Nothing allocates after construction.
 */
public final class ThirdBodies {
  final double[] first = new double[3];
  final double[] second = new double[3];
  private final LunisolarEphemeris ephemeris;
  private final boolean moonCentred;
  private final boolean tides;

  /**
   * Creates the holder (both positions zero until the first refresh).
   *
   * @param body the central body
   * @param math math mode of the series
   * @param tides whether positions are needed at all (without tides {@link #refresh} does nothing)
   */
  public ThirdBodies(CentralBody body, MathMode math, boolean tides) {
    this.ephemeris = new LunisolarEphemeris(math);
    this.moonCentred = body.centre() == CentralBody.CENTRE_MOON;
    this.tides = tides;
  }

  /**
   * Recomputes both positions.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0
   */
  public void refresh(double centuriesTt) {
    if (!tides) {
      return;
    }
    ephemeris.sun(centuriesTt, first);
    ephemeris.moon(centuriesTt, second);
    if (moonCentred) {
      for (int i = 0; i < 3; i++) {
        first[i] -= second[i];
        second[i] = -second[i];
      }
    }
  }

  /**
   * One component of the first body's position (the Sun), m.
   *
   * @param axis 0..2
   * @return the component
   */
  public double firstM(int axis) {
    return first[axis];
  }
}
