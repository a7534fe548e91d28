package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.tracker.ProperTimeTracker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.Consumer;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** Construction-time checks of bodies and configurations; holders' accessors. */
class ConfigBoundaryTest {
  private static void refused(Consumer<ModelConfigBuilder> change) {
    final ModelConfigBuilder b = ModelConfig.builder();
    change.accept(b);
    assertThrows(IllegalArgumentException.class, b::build);
  }

  @Test
  void everyConfigurationLimitIsChecked() {
    refused(b -> b.body(null));
    refused(b -> b.level(null));
    refused(b -> b.math(null));
    refused(b -> b.ut1MinusTtS(2000));
    refused(b -> b.nominalStepS(0));
    refused(b -> b.nominalStepS(4000));
    refused(b -> b.bridgeStepS(61));
    refused(b -> b.bridgeLimitS(-1));
    refused(b -> b.bridgeStepS(0.1).bridgeLimitS(1e7));
    refused(b -> b.energyToleranceRel(0));
    refused(b -> b.energyToleranceRel(1));
    refused(b -> b.energyDriftM2PerS3(-1));
    refused(b -> b.energyDriftM2PerS3(Double.NaN));
    refused(b -> b.maxSampleAgeS(0));
    refused(b -> b.maxSampleAgeS(1e7));
    refused(b -> b.futureToleranceS(-1));
    refused(b -> b.futureToleranceS(1e7));
    refused(b -> b.bridgeRateErrorPerS(-1));
    refused(b -> b.bridgeRateErrorPerS(1));
    refused(b -> b.degree(1));
    refused(b -> b.field(GravityField.egm96(4)).degree(5));
    refused(b -> b.field(GravityField.egm96(4)).degree(1));
    refused(b -> b.energyDriftM2PerS3(Double.POSITIVE_INFINITY));
    final ModelConfig c = ModelConfig.builder().level(ModelLevel.J2).math(MathMode.STRICT).c4(true).tides(false)
        .futureToleranceS(2).maxSampleAgeS(10).energyDriftM2PerS3(2).nominalStepS(2).build();
    final ModelConfig copy = c.toBuilder().build();
    assertEquals(c.level(), copy.level());
    assertEquals(c.math(), copy.math());
    assertEquals(c.c4(), copy.c4());
    assertEquals(c.tides(), copy.tides());
    assertEquals(c.degree(), copy.degree());
    assertEquals(c.bridgeLimitS(), copy.bridgeLimitS(), 0);
    assertEquals(CentralBody.EARTH, copy.body());
  }

  @Test
  void bodyConstantsAreChecked() {
    final double[] good = {3.9e14, 6.4e6, 1e-3, 7e-5, 7e-10, 6e6, 1e9, 2e4};
    assertNotNull(CentralBody.of("x", CentralBody.CENTRE_EARTH, good[0], good[1], good[2], good[3], good[4],
        good[5], good[6], good[7]));
    final double[][] bad = {
      {-1, 6.4e6, 1e-3, 7e-5, 7e-10, 6e6, 1e9, 2e4},
      {3.9e14, 0, 1e-3, 7e-5, 7e-10, 6e6, 1e9, 2e4},
      {3.9e14, 6.4e6, Double.NaN, 7e-5, 7e-10, 6e6, 1e9, 2e4},
      {3.9e14, 6.4e6, 1e-3, Double.NaN, 7e-10, 6e6, 1e9, 2e4},
      {3.9e14, 6.4e6, 1e-3, 7e-5, -1, 6e6, 1e9, 2e4},
      {3.9e14, 6.4e6, 1e-3, 7e-5, 1e-3, 6e6, 1e9, 2e4},
      {3.9e14, 6.4e6, 1e-3, 7e-5, 7e-10, 0, 1e9, 2e4},
      {3.9e14, 6.4e6, 1e-3, 7e-5, 7e-10, 6e6, 1e6, 2e4},
      {3.9e14, 6.4e6, 1e-3, 7e-5, 7e-10, 6e6, 1e9, 0},
      {Double.POSITIVE_INFINITY, 6.4e6, 1e-3, 7e-5, 7e-10, 6e6, 1e9, 2e4},
    };
    for (double[] v : bad) {
      assertThrows(IllegalArgumentException.class,
          () -> CentralBody.of("x", CentralBody.CENTRE_EARTH, v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7]));
    }
    assertThrows(IllegalArgumentException.class,
        () -> CentralBody.of("x", 5, good[0], good[1], good[2], good[3], good[4], good[5], good[6], good[7]));
    final CentralBody e = CentralBody.EARTH;
    assertEquals("Earth", e.name());
    assertEquals(62_636_856.0, e.referencePotentialM2PerS2(), 0.5); // IERS 2010 Table 1.1
    assertTrue(e.toString().contains("Earth"));
    assertEquals(CentralBody.CENTRE_MOON, CentralBody.MOON.centre());
  }

  @Test
  void holdersExposeTheirValues() {
    final OrbitSample s = new OrbitSample();
    final SplitTime t = SplitTime.of(3, 0.5);
    s.set(t, OrbitSample.FRAME_BODY_FIXED, 1, 2, 3, 4, 5, 6, false);
    assertEquals(OrbitSample.FRAME_BODY_FIXED, s.frame());
    assertFalse(s.valid());
    assertEquals(3, s.positionM(2), 0);
    assertEquals(6, s.velocityMPerS(2), 0);
    final SplitTime out = new SplitTime();
    s.epochTt(out);
    assertEquals(t, out);
    final ProperTimeTracker tracker = new ProperTimeTracker(ModelConfig.builder().level(ModelLevel.POINT_MASS).build());
    assertEquals(Status.NOT_FINITE, tracker.setInitialOffsetS(Double.NaN));
    assertEquals(Status.OK, tracker.setInitialOffsetS(1e-3));
    assertFalse(tracker.isInitialized());
    assertEquals(0.0, tracker.periodicOffsetS(), 0);
    s.set(t, OrbitSample.FRAME_INERTIAL, 7e6, 0, 0, 0, 7546, 0, true);
    assertEquals(Status.OK, tracker.step(t, s));
    assertEquals(1e-3, tracker.offsetS(), 0);
    assertEquals(7e6, tracker.inertialPositionM(0), 0);
    assertEquals(7546, tracker.inertialVelocityMPerS(1), 0);
    assertEquals(0.0, tracker.lastStepS(), 0);
    final RateComponents c = new RateComponents();
    tracker.rate(c);
    assertEquals(c.total(), tracker.fractionalFrequency(), 0);
    assertEquals(0.0, c.harmonics() + c.higherOrder(), 0);
    assertTrue(c.tidal() != 0); // tides are on by default
    assertEquals(0.0, c.rDotVM2PerS(), 0);
    assertTrue(c.integrandRate() != 0);
  }
}
