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
  private final double[] nextFirst = new double[3];
  private final double[] nextSecond = new double[3];
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
   * Recomputes both positions: the same as every {@link #prepareStep} in order followed by {@link
   * #install}.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0
   */
  public void refresh(double centuriesTt) {
    for (int step = 0; step < steps(); step++) {
      prepareStep(centuriesTt, step);
    }
    install();
  }

  /**
   * Number of {@link #prepareStep} steps that make one set of positions: 2 with tides (the Sun,
   * then the Moon), 0 without.
   *
   * @return the number of steps
   */
  public int steps() {
    return tides ? 2 : 0;
  }

  /**
   * One step of the positions' computation into a staging set, leaving the positions in use as
   * they are (a caller may spread the steps over several cycles): step 0 the Sun series (about 5
   * sine/cosine and 30 operations), step 1 the Moon series (about 35 sine/cosine and 150
   * operations) and the change of centre. Then {@link #install}.
   *
   * @param centuriesTt Julian centuries of TT since J2000.0 (the same for both steps)
   * @param step 0 or 1 (other values, or no tides, do nothing)
   */
  public void prepareStep(double centuriesTt, int step) {
    if (!tides) {
      return;
    }
    if (step == 0) {
      ephemeris.sun(centuriesTt, nextFirst);
    } else if (step == 1) {
      ephemeris.moon(centuriesTt, nextSecond);
      if (moonCentred) {
        for (int i = 0; i < 3; i++) {
          nextFirst[i] -= nextSecond[i];
          nextSecond[i] = -nextSecond[i];
        }
      }
    }
  }

  /** Puts the staged positions (after the last {@link #prepareStep}) into use. */
  public void install() {
    if (!tides) {
      return;
    }
    System.arraycopy(nextFirst, 0, first, 0, 3);
    System.arraycopy(nextSecond, 0, second, 0, 3);
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

  /**
   * One component of the second body's position (the Moon; the Earth for a lunar orbiter), m.
   *
   * @param axis 0..2
   * @return the component
   */
  public double secondM(int axis) {
    return second[axis];
  }
}
