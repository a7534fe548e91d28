package org.eigenzeit.ground.timescale;

import org.eigenzeit.onboard.time.TimeScales;

/** The DE405 relations, their day nodes and the harmonic fits the tests share (built once). */
final class TimeRelationsFixture {
  private static TimeRelationsFixture instance;

  final TimeScaleRelations relations = TimeScaleRelations.de405();
  final TimeEphemeris eph = relations.ephemeris();
  final double[] t = TimeScaleRelations.nodeTimes(eph);
  final double[] omega = Frequencies.all();
  private HarmonicFit.Result earth;
  private HarmonicFit.Result moon;

  private TimeRelationsFixture() {}

  static synchronized TimeRelationsFixture get() {
    if (instance == null) {
      instance = new TimeRelationsFixture();
    }
    return instance;
  }

  /** Fit of J_B against TCB with a rate, origin mid-span; the rate is the mean d(TCB - T_B)/dTCB. */
  private HarmonicFit.Result fitIntegral(int centre) {
    final double[] u = new double[t.length];
    final double[] j = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      u[i] = TimeScaleRelations.tcbSinceT0S(t[i]);
      j[i] = eph.integralS(centre, t[i]);
    }
    return HarmonicFit.fit(u, j, u[u.length / 2], true, omega);
  }

  synchronized double earthMeanRate() {
    if (earth == null) {
      earth = fitIntegral(TimeEphemeris.EARTH);
    }
    return earth.rate();
  }

  synchronized double moonMeanRate() {
    if (moon == null) {
      moon = fitIntegral(TimeEphemeris.MOON);
    }
    return moon.rate();
  }

  /** Fits a sampled relation with a rate from T0. */
  HarmonicFit.Result fitWithRate(double[] y) {
    return HarmonicFit.fit(t, y, -TimeScales.J2000_MINUS_T0_S, true, omega);
  }
}
