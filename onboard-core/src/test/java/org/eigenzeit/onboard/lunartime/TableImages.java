package org.eigenzeit.onboard.lunartime;

import java.nio.ByteBuffer;

/**
 * Writes lunar time table images for the tests, field by field from the layout documented in
 * {@link LunarTimeTable}'s Javadoc (independent of the ground's writer).
 */
final class TableImages {
  static final double L_L = 3.14e-11;
  static final double RATE = LunarTimeTable.MEAN_TCL_TT_RATE - L_L;
  static final long START = 844_128_000L;
  static final long SPAN = 8L * 86_400L;

  int degree = 6;
  int segments = 2;
  int magic = LunarTimeTable.MAGIC;
  int version = LunarTimeTable.VERSION;
  int headerBytes = LunarTimeTable.HEADER_BYTES;
  int components = LunarTimeTable.COMPONENTS;
  int ephemeris = 405;
  int id = 0x8000_0007;
  int reserved32;
  long start = START;
  long end = START + SPAN;
  double scaleRateL = L_L;
  double accuracyS = 1e-12;
  double tl0 = 0.0;
  /** TL - TT at the span start, s: the secular model TL0 + RATE (t - T0) there. */
  double offsetAtStartS = RATE * (START + 725_803_167.816);
  /** Rate of TL - TT. */
  double rate = RATE;
  /** An even-degree Chebyshev term added to TL - TT in every segment (continuous across them). */
  int periodicIndex = 4;
  double periodicS = 2e-9;
  /** Moon's geocentric velocity and its rate of change (per second), m/s and m/s^2. */
  double[] velocity = {0.0, 1000.0, 0.0};
  double[] acceleration = {1.0e-4, 0.0, 0.0};

  /** The coefficients: [segment * 4 + component][degree + 1]. */
  double[][] coefficients() {
    final double[][] c = new double[segments * 4][degree + 1];
    final double h = (double) (end - start) / segments;
    for (int j = 0; j < segments; j++) {
      final double mid = (j + 0.5) * h;
      c[j * 4][0] = offsetAtStartS + rate * mid;
      c[j * 4][1] = rate * h / 2;
      if (periodicIndex <= degree) {
        c[j * 4][periodicIndex] = periodicS;
      }
      for (int k = 0; k < 3; k++) {
        c[j * 4 + 1 + k][0] = velocity[k] + acceleration[k] * mid;
        c[j * 4 + 1 + k][1] = acceleration[k] * h / 2;
      }
    }
    return c;
  }

  byte[] build() {
    return build(coefficients());
  }

  byte[] build(double[][] coefficients) {
    final ByteBuffer b = ByteBuffer.allocate(64 + 8 * segments * 4 * (degree + 1));
    b.putInt(magic).putShort((short) version).putShort((short) headerBytes).putShort((short) degree)
        .putShort((short) segments).putShort((short) components).putShort((short) ephemeris).putInt(id)
        .putInt(reserved32).putLong(start).putLong(end).putDouble(scaleRateL).putDouble(accuracyS)
        .putDouble(tl0);
    for (double[] series : coefficients) {
      for (double x : series) {
        b.putDouble(x);
      }
    }
    return b.array();
  }
}
