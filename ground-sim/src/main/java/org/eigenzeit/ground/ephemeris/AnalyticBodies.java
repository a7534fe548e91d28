package org.eigenzeit.ground.ephemeris;

import org.eigenzeit.onboard.frames.LunarPole;
import org.eigenzeit.onboard.gravity.LunisolarEphemeris;
import org.eigenzeit.onboard.math.MathMode;

/** {@link ThirdBodies} from the onboard core's series; not thread-safe (one per reference run). */
final class AnalyticBodies implements ThirdBodies {
  private static final double CENTURY_S = 36_525.0 * 86_400.0;
  private final LunisolarEphemeris series = new LunisolarEphemeris(MathMode.STRICT);
  private final LunarPole pole = new LunarPole(MathMode.STRICT);

  @Override
  public void sunGeocentricM(double t, double[] out) {
    series.sun(t / CENTURY_S, out);
  }

  @Override
  public void moonGeocentricM(double t, double[] out) {
    series.moon(t / CENTURY_S, out);
  }

  @Override
  public void lunarPole(double t, double[] out) {
    pole.pole(t / 86_400.0, out);
  }

  @Override
  public String source() {
    return "low-precision series (Montenbruck and Gill 2000, 3.3.2)";
  }
}
