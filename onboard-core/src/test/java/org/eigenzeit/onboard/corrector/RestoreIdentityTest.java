package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.servo.ClockServo;
import org.eigenzeit.onboard.servo.gate.MeasurementGate;
import org.eigenzeit.onboard.servo.modes.ModeMachine;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;
import org.junit.jupiter.api.Test;

/**
 * Restore refuses a buffer of another configuration, refuses bad content behind a valid CRC, and
 * leaves the state exactly as it was when it refuses (docs/servo.md, warm restart).
 */
class RestoreIdentityTest {
  private static final ModelConfig EARTH = ModelConfig.builder().level(ModelLevel.J2).tides(true)
      .energyToleranceRel(2e-3).build();

  static ClockCorrector corrector(ModelConfig config, double[] servo) {
    final ClockCorrector c = new ClockCorrector(config, true, false);
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(servo, b, 0));
    assertEquals(Status.OK, c.loadTable(TableId.SERVO, b, 0, b.length));
    assertEquals(Status.OK, c.activateTable(TableId.SERVO));
    return c;
  }

  /** Flies a corrector for a while around its body (a circular orbit at 1.1 body radii). */
  static ClockCorrector flown(ModelConfig config) {
    final ClockCorrector c = corrector(config, ServoParameters.typicalRubidium());
    final CentralBody body = config.body();
    final double a = 1.1 * body.referenceRadiusM();
    final double n = Math.sqrt(body.gmM3PerS2() / (a * a * a));
    final OrbitSample s = new OrbitSample();
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    final SplitTime raw = new SplitTime();
    final SplitTime corr = new SplitTime();
    for (int t = 0; t < 600; t++) {
      assertEquals(Status.OK, raw.set(850_000_000L + t, 2e-11 * t));
      c.correctedTime(raw, corr);
      s.set(corr, OrbitSample.FRAME_INERTIAL, a * Math.cos(n * t), a * Math.sin(n * t), 0, -n * a * Math.sin(n * t),
          n * a * Math.cos(n * t), 0, true);
      m.set(corr, 0, corr.secondsSince(SplitTime.of(850_000_000L + t, 0.0)), true);
      final int v = c.cycle(raw, t % 90 < 80 ? s : null, t % 10 == 0 ? m : null);
      assertTrue(Status.isUsable(v) || v == Status.OUTLIER, Status.name(v));
    }
    return c;
  }

  static byte[] saved(ClockCorrector c) {
    final byte[] b = new byte[ClockCorrector.STATE_BYTES];
    assertEquals(Status.OK, c.save(b, 0, b.length));
    return b;
  }

  /** The buffer with one 8-byte window overwritten and its CRC recomputed (a faulty writer). */
  static byte[] withWindow(byte[] good, int at, long bits) {
    final byte[] b = good.clone();
    for (int i = 0; i < 8; i++) {
      b[at + i] = (byte) (bits >>> (56 - 8 * i));
    }
    resealed(b);
    return b;
  }

  static void resealed(byte[] b) {
    final CRC32C crc = new CRC32C();
    crc.update(b, 0, b.length - 4);
    final int v = (int) crc.getValue();
    for (int i = 0; i < 4; i++) {
      b[b.length - 4 + i] = (byte) (v >>> (24 - 8 * i));
    }
  }

  @Test
  void everyRestoreAnswerIsCountedByItsCode() {
    // docs/algorithms.md: every refusal is counted in housekeeping; a code out of range reads 0.
    final byte[] lunar = saved(flown(ModelConfig.builder().body(CentralBody.MOON).level(ModelLevel.J2).tides(true)
        .energyToleranceRel(2e-3).build()));
    final byte[] own = saved(flown(EARTH));
    final ClockCorrector c = corrector(EARTH, ServoParameters.typicalRubidium());
    assertEquals(Status.CONFIGURATION_MISMATCH, c.restore(lunar, 0, lunar.length));
    assertEquals(Status.CONFIGURATION_MISMATCH, c.restore(lunar, 0, lunar.length));
    assertEquals(Status.OK, c.restore(own, 0, own.length));
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertEquals(2, hk.restoreCounts(Status.CONFIGURATION_MISMATCH));
    assertEquals(1, hk.restoreCounts(Status.OK));
    for (int code : new int[] {-1, Status.COUNT, Integer.MIN_VALUE}) {
      assertEquals(0, hk.restoreCounts(code), "restore count of code " + code);
      assertEquals(0, hk.rawClockCounts(code), "raw-clock count of code " + code);
    }
  }

  @Test
  void aBufferOfAnotherConfigurationIsRefused() {
    final byte[] lunar = saved(flown(ModelConfig.builder().body(CentralBody.MOON).level(ModelLevel.J2).tides(true)
        .energyToleranceRel(2e-3).build()));
    final ClockCorrector earth = corrector(EARTH, ServoParameters.typicalRubidium());
    assertEquals(Status.CONFIGURATION_MISMATCH, earth.restore(lunar, 0, lunar.length), "a lunar buffer, an Earth corrector");
    final byte[] own = saved(flown(EARTH));
    assertEquals(Status.OK, corrector(EARTH, ServoParameters.typicalRubidium()).restore(own, 0, own.length));
    for (ModelConfig other : new ModelConfig[] {EARTH.toBuilder().tides(false).build(),
        EARTH.toBuilder().math(MathMode.STRICT).build(), EARTH.toBuilder().level(ModelLevel.HARMONICS).degree(4).build(),
        EARTH.toBuilder().bridgeLimitS(900).build()}) {
      assertEquals(Status.CONFIGURATION_MISMATCH, corrector(other, ServoParameters.typicalRubidium())
          .restore(own, 0, own.length));
    }
    final double[] tuned = ServoParameters.typicalRubidium();
    tuned[ServoParameters.F_GATE_SIGMA] = 5;
    assertEquals(Status.CONFIGURATION_MISMATCH, corrector(EARTH, tuned).restore(own, 0, own.length),
        "saved under another servo table");
    assertEquals(Status.CONFIGURATION_MISMATCH, new ClockCorrector(EARTH, true, false).restore(own, 0, own.length),
        "restored before the servo table was loaded");
    assertEquals(Status.CONFIGURATION_MISMATCH, new ClockCorrector(EARTH, true, false, 10.0).restore(own, 0,
        own.length), "another raw-clock bound");
  }

  @Test
  void everyIdentityFieldSeparatesConfigurations() {
    // Pairs that differ in one value of the configuration identity only: the buffer of one is
    // refused by the other, and accepted by a corrector built the same way.
    final CentralBody e = CentralBody.EARTH;
    final CentralBody heavier = CentralBody.of("earth-gm", e.centre(), e.gmM3PerS2() * (1 + 1e-9), e.referenceRadiusM(),
        e.j2(), e.rotationRateRadPerS(), e.scaleRateL(), e.minRadiusM(), e.maxRadiusM(), e.maxSpeedMPerS());
    final CentralBody otherCentre = CentralBody.of("earth-as-moon", CentralBody.CENTRE_MOON, e.gmM3PerS2(),
        e.referenceRadiusM(), e.j2(), e.rotationRateRadPerS(), e.scaleRateL(), e.minRadiusM(), e.maxRadiusM(),
        e.maxSpeedMPerS());
    // Degree 4 and 8 of one degree-8 field: the gravity table (and its CRC) is the same, only the degree used differs.
    final ModelConfig deg4 = EARTH.toBuilder().level(ModelLevel.HARMONICS).field(
        org.eigenzeit.onboard.gravity.GravityField.egm96(8)).degree(4).build();
    final ModelConfig[][] pairs = {
        {EARTH, EARTH.toBuilder().body(heavier).build()},
        {EARTH, EARTH.toBuilder().body(otherCentre).build()},
        {EARTH, EARTH.toBuilder().level(ModelLevel.POINT_MASS).build()},
        {deg4, deg4.toBuilder().degree(8).build()},
        {EARTH, EARTH.toBuilder().c4(true).build()},
    };
    for (ModelConfig[] p : pairs) {
      final byte[] own = saved(flown(p[0]));
      assertEquals(Status.OK, corrector(p[0], ServoParameters.typicalRubidium()).restore(own, 0, own.length));
      assertEquals(Status.CONFIGURATION_MISMATCH, corrector(p[1], ServoParameters.typicalRubidium())
          .restore(own, 0, own.length), p[1].body().name() + " " + p[1].level() + " " + p[1].degree() + " " + p[1].c4());
    }
    final byte[] own = saved(flown(EARTH));
    final byte[] table = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(ServoParameters.typicalRubidium(), table, 0));
    for (boolean[] flags : new boolean[][] {{false, false}, {true, true}}) {
      final ClockCorrector c = new ClockCorrector(EARTH, flags[0], flags[1]);
      assertEquals(Status.OK, c.loadTable(TableId.SERVO, table, 0, table.length));
      assertEquals(Status.OK, c.activateTable(TableId.SERVO));
      assertEquals(Status.CONFIGURATION_MISMATCH, c.restore(own, 0, own.length),
          "applyModel " + flags[0] + ", counter steered " + flags[1]);
    }
  }

  @Test
  void aRefusedRestoreLeavesTheStateByteIdentical() {
    final ClockCorrector c = flown(EARTH);
    final byte[] before = saved(c);
    final byte[] other = saved(flown(EARTH.toBuilder().futureToleranceS(2).build()));
    final byte[] nan = withWindow(saved(flown(EARTH)), ClockCorrector.STATE_BYTES - 12, 0x7FF8000000000000L);
    final byte[] crc = saved(flown(EARTH));
    crc[100] ^= 1;
    for (byte[] bad : new byte[][] {other, nan, crc}) {
      final int st = c.restore(bad, 0, bad.length);
      assertTrue(Status.isFault(st), Status.name(st));
      assertArrayEquals(before, saved(c), "refused (" + Status.name(st) + "): the state is as it was");
    }
  }

  /**
   * The restart buffer's fields as the components write them (I int, L long, D double), from the
   * components' save methods; each part's size is checked against its STATE_BYTES.
   */
  static String layout() {
    final String tracker = "I" + "I".repeat(Status.COUNT) + part("LDLDDILD" + "DD".repeat(3),
        org.eigenzeit.onboard.tracker.validation.SampleValidator.STATE_BYTES) + part("DDD",
        org.eigenzeit.onboard.tracker.cadence.OrientationCache.STATE_BYTES) + part("I" + "D".repeat(7) + "LD"
        + "D".repeat(8), org.eigenzeit.onboard.tracker.integration.OffsetIntegrator.STATE_BYTES) + part("IDLD"
        + "DDD".repeat(3), org.eigenzeit.onboard.tracker.bridging.OutageBridge.STATE_BYTES);
    final String servo = part("D".repeat(14), ClockEstimator.STATE_BYTES) + part("LDIIIID" + "I".repeat(Status.COUNT),
        MeasurementGate.STATE_BYTES) + part("I".repeat(8) + "D".repeat(5), ModeMachine.STATE_BYTES)
        + part("DDDDDII", org.eigenzeit.onboard.servo.law.SteeringLaw.STATE_BYTES) + "DD";
    final String all = part(tracker, ProperTimeTracker.STATE_BYTES) + part(servo, ClockServo.STATE_BYTES)
        + part("IILD" + "I".repeat(Status.COUNT), org.eigenzeit.onboard.corrector.rawclock.RawClockGate.STATE_BYTES)
        + part("IIDDD", CycleState.STATE_BYTES);
    return part("IIII" + all + "I", ClockCorrector.STATE_BYTES);
  }

  private static String part(String fields, int bytes) {
    int n = 0;
    for (char c : fields.toCharArray()) {
      n += c == 'I' ? 4 : 8;
    }
    assertEquals(bytes, n, "layout of " + fields.length() + " fields");
    return fields;
  }

  @Test
  void aNanBehindAValidCrcIsRefusedInEveryDoubleField() {
    final byte[] good = saved(flown(EARTH));
    final String layout = layout();
    int at = 0;
    int doubles = 0;
    for (char f : layout.toCharArray()) {
      if (f == 'D') {
        doubles++;
        for (long nan : new long[] {0x7FF8000000000000L, 0xFFF0000000000000L, 0x7FF0000000000000L}) {
          final int st = corrector(EARTH, ServoParameters.typicalRubidium()).restore(withWindow(good, at, nan), 0,
              good.length);
          assertTrue(st == Status.NOT_FINITE, "a non-finite double at byte " + at + " refused: " + Status.name(st));
        }
      }
      at += f == 'I' ? 4 : 8;
    }
    System.out.println("restore: every one of " + doubles + " double fields refuses NaN and infinities behind a valid CRC");
    System.out.println("evidence: core.restore_double_fields_checked = " + doubles);
    assertTrue(doubles > 60, "the layout covers every component's doubles: " + doubles);
  }

  @Test
  void anyNanWindowIsRefusedOrHarmless() {
    final byte[] good = saved(flown(EARTH));
    int refused = 0;
    int windows = 0;
    for (int at = RestartImage.HEADER_BYTES; at + 8 <= good.length - 4; at++) {
      final ClockCorrector c = corrector(EARTH, ServoParameters.typicalRubidium());
      final int st = c.restore(withWindow(good, at, 0x7FF8000000000001L), 0, good.length);
      windows++;
      if (st != Status.OK) {
        refused++;
      } else {
        keepsFinite(c, at);
      }
    }
    System.out.printf("restore: %d of %d NaN windows behind a valid CRC refused; every accepted one stays finite%n",
        refused, windows);
  }

  /** An accepted (unaligned, harmless) window: the corrector keeps finite outputs. */
  private static void keepsFinite(ClockCorrector c, int at) {
    final Housekeeping hk = new Housekeeping();
    final SplitTime raw = SplitTime.of(850_000_600L, 0.0);
    final SplitTime corr = new SplitTime();
    for (int k = 0; k < 20; k++) {
      raw.addWholeSeconds(1);
      final int v = c.cycle(raw, null, null);
      assertTrue(Status.isUsable(v) || Status.isFault(v));
      c.correctedTime(raw, corr);
      c.housekeeping(hk);
      for (double x : new double[] {corr.fractionS(), hk.command(), hk.phaseS(), hk.steeringPhaseS(), hk.modelOffsetS(),
          hk.modelRate(), hk.sigmaPhaseS()}) {
        assertTrue(Double.isFinite(x), "a value not finite after an accepted window at byte " + at);
      }
    }
  }
}
