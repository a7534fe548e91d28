package org.eigenzeit.ground.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** Allan statistics against a published worked example and the power-law slopes. */
class StabilityTest {
  @Test
  void nbsWorkedExample() {
    // The classic NBS test data set of nine fractional-frequency values (Riley, NIST SP 1065, 2008,
    // validation data; from memory): Allan deviation at tau = 1 is 91.22945.
    final double[] y = {892.0, 809.0, 823.0, 798.0, 671.0, 644.0, 883.0, 903.0, 677.0};
    final double[] x = new double[y.length + 1];
    for (int i = 0; i < y.length; i++) {
      x[i + 1] = x[i] + y[i];
    }
    assertEquals(91.22945, Stability.adev(x, 1.0, 1), 5e-6);
    // Same source and data (from memory): at tau = tau0 the modified Allan deviation equals the
    // Allan deviation, and the time deviation is tau/sqrt(3) of it: 52.67135.
    assertEquals(91.22945, Stability.mdev(x, 1.0, 1), 5e-6);
    assertEquals(52.67135, Stability.tdev(x, 1.0, 1), 5e-6);
  }

  @Test
  void whiteFrequencyNoiseSlopes() {
    final Random r = new Random(5);
    final int n = 200_000;
    final double[] x = new double[n + 1];
    for (int i = 0; i < n; i++) {
      x[i + 1] = x[i] + 1e-12 * r.nextGaussian();
    }
    // White FM: sigma_y(tau) = sigma / sqrt(tau); Mod sigma_y = sigma_y / sqrt(2) asymptotically
    // (Riley 2008, Table 9: ratio 0.5 in variance for white FM).
    for (int m : new int[] {1, 10, 100, 1000}) {
      assertEquals(1e-12 / Math.sqrt(m), Stability.adev(x, 1.0, m), 0.08e-12 / Math.sqrt(m));
    }
    assertEquals(Math.sqrt(0.5), Stability.mdev(x, 1.0, 100) / Stability.adev(x, 1.0, 100), 0.05);
    assertEquals(100 / Math.sqrt(3) * Stability.mdev(x, 1.0, 100), Stability.tdev(x, 1.0, 100), 1e-25);
    assertTrue(Double.isNaN(Stability.adev(x, 1.0, n)));
    assertTrue(Double.isNaN(Stability.mdev(x, 1.0, n)));
    assertEquals(5, Stability.decadeFactors(200_001, 1.0).length);
  }
}
