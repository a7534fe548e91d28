package org.eigenzeit.onboard.tracker.validation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.KeplerOrbit;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.restart.StateBytes;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.tracker.cadence.OrientationCache;
import org.junit.jupiter.api.Test;

/** The sample validator: its state size, its purity, its reference and its restore checks. */
class SampleValidatorTest {
  private static final ModelConfig CONFIG = ModelConfig.builder().level(ModelLevel.J2).tides(false)
      .energyToleranceRel(2e-3).build();
  private static final KeplerOrbit ORBIT = new KeplerOrbit(CentralBody.EARTH.gmM3PerS2(), 7.0e6, 0.001, 0.9, 0.1,
      0.2, 0.3);
  private final SampleValidator validator = new SampleValidator(CONFIG);
  private final OrientationCache cache = new OrientationCache(CONFIG);
  private final OrbitSample s = new OrbitSample();
  private final double[] r = new double[3];
  private final double[] v = new double[3];
  private final SplitTime epoch = new SplitTime();
  private final double[] givenR = new double[3];
  private final double[] givenV = new double[3];
  private final double[] candR = new double[3];
  private final double[] candV = new double[3];
  private final double[] candRb = new double[3];
  private final double[] pole = new double[3];

  private OrbitSample sample(long t, double scaleR, double vy, boolean valid) {
    ORBIT.state(t, r, v);
    s.set(SplitTime.of(850_000_000L + t, 0.0), OrbitSample.FRAME_INERTIAL, r[0] * scaleR, r[1] * scaleR,
        r[2] * scaleR, v[0], Double.isNaN(vy) ? vy : v[1] + vy, v[2], valid);
    return s;
  }

  /** Both stages as the tracker runs them. */
  private int validate(OrbitSample x, SplitTime now, boolean initialized) {
    final int first = validator.checkSample(x, now, initialized, epoch, givenR, givenV);
    if (first != Status.OK) {
      return first;
    }
    cache.toInertial(epoch, x.frame(), givenR, givenV, candR, candV, candRb);
    cache.pole(pole);
    return validator.checkMotion(epoch, candR, candV, pole, initialized);
  }

  @Test
  void stateSizeIsWhatItWrites() {
    assertEquals(SampleValidator.STATE_BYTES, StateBytes.written(validator::save).length);
  }

  @Test
  void validationChangesNoStateAndRepeatsItsVerdicts() {
    final SplitTime now = SplitTime.of(850_000_100L, 0.0);
    assertEquals(Status.OK, validate(sample(100, 1, 0, true), now, false));
    validator.accepted(epoch);
    final byte[] before = StateBytes.written(validator::save);
    final int[] first = new int[8];
    final int[] second = new int[8];
    for (int pass = 0; pass < 2; pass++) {
      final int[] out = pass == 0 ? first : second;
      final SplitTime later = SplitTime.of(850_000_101L, 0.0);
      out[0] = validate(sample(101, 1, 0, true), later, true);
      out[1] = validate(sample(101, 1, 0, false), later, true);
      out[2] = validate(sample(101, 1, Double.NaN, true), later, true);
      out[3] = validate(sample(101, 1e-3, 0, true), later, true);
      out[4] = validate(sample(101, 1, 3e4, true), later, true);
      s.set(later, OrbitSample.FRAME_INERTIAL, 4e7, 0, 0, 0, 5000, 0, true);
      final int escape = validate(s, later, true);
      assertEquals(Status.SPEED_OUT_OF_RANGE, escape, "5 km/s at 40 000 km exceeds sqrt(2.2 GM/r)");
      out[5] = validate(sample(101, 1.01, 0, true), later, true);
      out[6] = validate(sample(200, 1, 0, true), later, true);
      out[7] = validate(sample(100, 1, 0, true), later, true);
      assertArrayEquals(before, StateBytes.written(validator::save), "pass " + pass + ": validation is pure");
    }
    assertArrayEquals(new int[] {Status.OK, Status.INVALID_INPUT, Status.NOT_FINITE, Status.RADIUS_OUT_OF_RANGE,
        Status.SPEED_OUT_OF_RANGE, Status.ENERGY_INCONSISTENT, Status.EPOCH_JUMP, Status.EPOCH_NOT_INCREASING},
        first);
    assertArrayEquals(first, second);
  }

  @Test
  void theReferenceMovesOnlyThroughAcceptedAndReferenceAt() {
    final SplitTime now = SplitTime.of(850_000_100L, 0.0);
    assertEquals(Status.OK, validate(sample(100, 1, 0, true), now, false));
    validator.accepted(epoch);
    final double e = validator.energy(candR, candV, validator.inverseRadius(), pole);
    // A bridged node 10 times the energy away becomes the reference: the true orbit is then refused.
    validator.referenceAt(SplitTime.of(850_000_100L, 0.5), 10 * e);
    assertEquals(Status.ENERGY_INCONSISTENT, validate(sample(101, 1, 0, true), SplitTime.of(850_000_101L, 0), true));
    validator.referenceAt(SplitTime.of(850_000_100L, 0.5), e);
    assertEquals(Status.OK, validate(sample(101, 1, 0, true), SplitTime.of(850_000_101L, 0), true));
    // Without the energy check (first sample, or after STALE) the same jump passes stage 2.
    validator.referenceAt(SplitTime.of(850_000_100L, 0.5), 10 * e);
    assertEquals(Status.OK, validate(sample(101, 1, 0, true), SplitTime.of(850_000_101L, 0), false));
  }

  @Test
  void restoreRefusesNonFiniteAndOutOfRangeValues() {
    final SplitTime now = SplitTime.of(850_000_100L, 0.0);
    assertEquals(Status.OK, validate(sample(100, 1, 0, true), now, false));
    validator.accepted(epoch);
    final byte[] good = StateBytes.written(validator::save);
    final SampleValidator other = new SampleValidator(CONFIG);
    StateReader r = StateBytes.reader(good);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    assertArrayEquals(good, StateBytes.written(other::save), "round trip");
    r = StateBytes.reader(StateBytes.withDouble(good, 32, Double.NaN));
    other.restore(r);
    assertEquals(Status.NOT_FINITE, r.status(), "NaN energy");
    r = StateBytes.reader(StateBytes.withDouble(good, 32, -1e12));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "energy beyond any orbit");
    r = StateBytes.reader(StateBytes.withDouble(good, 8, 1.0));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "fraction of a second outside [0, 1)");
    assertEquals(8, r.failedAt());
  }

  @Test
  void periapsisRadiusIsAOneMinusEOfTheTwoBodyOrbit() {
    // Textbook two-body closed form r_p = a (1 - e) (e.g. Vallado 2013, ch. 2), from the elements
    // the states were made of (KeplerOrbit: Kepler's equation solved in the test), LEO to HEO.
    final double mu = CentralBody.EARTH.gmM3PerS2();
    double worst = 0;
    double worstCircular = 0;
    for (double[] el : new double[][] {{7.0e6, 0.0}, {7.0e6, 0.001}, {2.656175e7, 0.0123}, {2.66e7, 0.74},
        {4.2164e7, 0.3}, {1.0e7, 0.35}}) {
      final KeplerOrbit o = new KeplerOrbit(mu, el[0], el[1], 1.1, 0.4, 2.2, 0.7);
      for (int k = 0; k < 40; k++) {
        o.state(k * 997.0, r, v);
        final double rel = Math.abs(validator.periapsisRadius(r, v) / (el[0] * (1 - el[1])) - 1);
        if (el[1] < 0.01) {
          worstCircular = Math.max(worstCircular, rel);
        } else {
          worst = Math.max(worst, rel);
        }
      }
    }
    assertTrue(worst < 1e-12, "relative error " + worst);
    // Near e = 0 the eccentricity sqrt(1 + 2 E h^2/GM^2) takes the square root of a rounding
    // error: about sqrt(2.2e-16) = 1.5e-8 relative (0.1 m at 7000 km), immaterial to the check.
    assertTrue(worstCircular < 1e-7, "relative error near e = 0: " + worstCircular);
    assertEquals(0.0, validator.periapsisRadius(new double[] {7e6, 0, 0}, new double[] {7e3, 0, 0}), 0.0,
        "radial motion: no angular momentum");
  }

  @Test
  void energyIsTheTextbookJ2Energy() {
    // E = v^2/2 - (GM/r) (1 - J2 (R/r)^2 P2(sin phi)), P2(x) = (3 x^2 - 1)/2, phi the latitude
    // above the plane normal to the pole (e.g. Montenbruck and Gill 2000, eq. 3.11 truncated at J2).
    final CentralBody e = CentralBody.EARTH;
    final double[][] poles = {{0, 0, 1}, {Math.sin(0.3) * Math.cos(1.0), Math.sin(0.3) * Math.sin(1.0), Math.cos(0.3)}};
    final java.util.SplittableRandom rnd = new java.util.SplittableRandom(77);
    double worst = 0;
    for (int k = 0; k < 2000; k++) {
      final double[] x = {rnd.nextDouble(-4e7, 4e7), rnd.nextDouble(-4e7, 4e7), rnd.nextDouble(-4e7, 4e7)};
      final double[] w = {rnd.nextDouble(-8e3, 8e3), rnd.nextDouble(-8e3, 8e3), rnd.nextDouble(-8e3, 8e3)};
      final double rr = Math.sqrt(x[0] * x[0] + x[1] * x[1] + x[2] * x[2]);
      if (rr < 6.5e6) {
        continue;
      }
      final double[] pl = poles[k % 2];
      final double sinPhi = (x[0] * pl[0] + x[1] * pl[1] + x[2] * pl[2]) / rr;
      final double p2 = 1.5 * sinPhi * sinPhi - 0.5;
      final double u = e.gmM3PerS2() / rr * (1 - e.j2() * Math.pow(e.referenceRadiusM() / rr, 2) * p2);
      final double expected = 0.5 * (w[0] * w[0] + w[1] * w[1] + w[2] * w[2]) - u;
      worst = Math.max(worst, Math.abs(validator.energy(x, w, 1 / rr, pl) - expected) / Math.abs(u));
    }
    assertTrue(worst < 1e-14, "relative error " + worst);
  }
}
