package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.restart.StateReader;
import org.eigenzeit.onboard.restart.StateWriter;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ClockEstimator;
import org.eigenzeit.onboard.servo.ClockServo;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/** Every measurement fault is flagged and counted; boundary behaviour of the servo's parts. */
class ServoEdgeCaseTest {
  private static ClockCorrector withTable(boolean counterIsSteered) {
    final ClockCorrector tk = new ClockCorrector(ModelConfig.builder().level(ModelLevel.POINT_MASS).tides(false).build(),
        false, counterIsSteered);
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(ServoParameters.typicalRubidium(), b, 0));
    assertEquals(Status.OK, tk.loadTable(TableId.SERVO, b, 0, b.length));
    assertEquals(Status.OK, tk.activateTable(TableId.SERVO));
    return tk;
  }

  @Test
  void everyMeasurementFaultIsFlaggedAndCounted() {
    final ClockCorrector tk = withTable(false);
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    final SplitTime raw = SplitTime.of(1_000_000, 0);
    m.set(raw, 0, 1e-7, true);
    assertEquals(Status.OK, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(raw, 0, 1e-7, false);
    assertEquals(Status.INVALID_INPUT, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(raw, 4, 1e-7, true);
    assertEquals(Status.OUT_OF_RANGE, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(raw, -1, 1e-7, true);
    assertEquals(Status.OUT_OF_RANGE, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(raw, 0, Double.NaN, true);
    assertEquals(Status.NOT_FINITE, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(raw, 0, 2.0, true);
    assertEquals(Status.OUT_OF_RANGE, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(SplitTime.of(raw.wholeSeconds() + 100, 0), 0, 1e-7, true);
    assertEquals(Status.EPOCH_JUMP, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(SplitTime.of(raw.wholeSeconds() - 100, 0), 0, 1e-7, true);
    assertEquals(Status.STALE, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(SplitTime.of(1_000_000, 0), 0, 1e-7, true);
    assertEquals(Status.EPOCH_NOT_INCREASING, tk.cycle(raw, null, m)); // young enough, not newer
    final SplitTime early = SplitTime.of(raw.wholeSeconds() - 3, 0);
    raw.addWholeSeconds(1);
    final SplitTime corr = new SplitTime();
    tk.correctedTime(raw, corr);
    m.set(corr, 0, 1e-7, true);
    assertEquals(Status.OK, tk.cycle(raw, null, m));
    raw.addWholeSeconds(1);
    m.set(early, 0, 1e-7, true);
    assertEquals(Status.EPOCH_NOT_INCREASING, tk.cycle(raw, null, m));
    final Housekeeping hk = new Housekeeping();
    tk.housekeeping(hk);
    assertEquals(2, hk.measurementCounts(Status.OK));
    assertEquals(3, hk.measurementCounts(Status.OUT_OF_RANGE));
    assertEquals(1, hk.measurementCounts(Status.STALE));
    assertEquals(2, hk.measurementCounts(Status.EPOCH_NOT_INCREASING));
    assertEquals(0, hk.measurementCounts(-1));
    assertEquals(0.0, hk.timeInModeS(99), 0);
    assertEquals(Status.EPOCH_NOT_INCREASING, hk.lastMeasurementStatus());
    assertTrue(hk.table(TableId.SERVO).active());
    assertEquals(1, hk.table(TableId.SERVO).activations());
    assertEquals(11, hk.cycles());
    assertEquals(Status.NOT_READY, hk.restoreStatus());
    assertEquals(ServoMode.ACQUIRE, hk.mode());
  }

  private static boolean gated(int verdict) {
    return verdict == Status.OK || verdict == Status.OUTLIER || verdict == Status.PHASE_JUMP;
  }

  @Test
  void steeredCounterIsNotCorrectedTwice() {
    final ClockCorrector soft = withTable(false);
    final ClockCorrector hard = withTable(true);
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    final SplitTime raw = SplitTime.of(1_000_000, 0);
    for (int k = 0; k < 50; k++) {
      raw.addWholeSeconds(1);
      m.set(raw, 1, 3e-7, true);
      // the same offset keeps arriving while the corrected time is steered: never an invalid input
      final int vs = soft.cycle(raw, null, m);
      final int vh = hard.cycle(raw, null, m);
      assertTrue(gated(vs) && gated(vh), vs + " " + vh);
    }
    final SplitTime a = new SplitTime();
    final SplitTime b = new SplitTime();
    soft.correctedTime(raw, a);
    hard.correctedTime(raw, b);
    assertTrue(Math.abs(a.secondsSince(raw)) > 0, "software steering moves the corrected time");
    assertEquals(0.0, b.secondsSince(raw), 0.0);
  }

  @Test
  void namesAndCursors() {
    for (int m = 0; m < ServoMode.COUNT; m++) {
      assertFalse(ServoMode.name(m).equals("UNKNOWN"));
    }
    assertEquals("UNKNOWN", ServoMode.name(9));
    // The names telemetry shows (docs/servo.md, the mode machine).
    assertEquals("STANDBY ACQUIRE TRACK COAST SAFE", String.join(" ", ServoMode.name(ServoMode.STANDBY),
        ServoMode.name(ServoMode.ACQUIRE), ServoMode.name(ServoMode.TRACK), ServoMode.name(ServoMode.COAST),
        ServoMode.name(ServoMode.SAFE)));
    final StateWriter w = new StateWriter();
    final byte[] small = new byte[6];
    w.reset(small, 0, 6);
    w.putInt(1);
    w.putInt(2);
    assertEquals(Status.BUFFER_TOO_SMALL, w.status());
    w.putLong(3);
    assertEquals(4, w.position());
    w.reset(small, 4, 6);
    assertEquals(Status.BUFFER_TOO_SMALL, w.status());
    final byte[] before = small.clone();
    w.reset(small, -1, 4);
    assertEquals(Status.BUFFER_TOO_SMALL, w.status(), "a negative offset");
    w.putInt(0x7f7f7f7f);
    w.reset(small, 0, -1);
    assertEquals(Status.BUFFER_TOO_SMALL, w.status(), "a negative length");
    w.putInt(0x7f7f7f7f);
    assertArrayEquals(before, small, "a refused cursor writes nothing");
    final StateReader r = new StateReader();
    r.reset(small, 0, 6);
    assertEquals(1, r.getInt());
    assertEquals(0L, r.getLong());
    assertEquals(Status.BUFFER_TOO_SMALL, r.status());
    assertEquals(0, r.getInt());
    assertFalse(r.getFlag());
    assertEquals(4, r.position());
    r.reset(small, -1, 2);
    assertEquals(Status.BUFFER_TOO_SMALL, r.status());
    final ClockEstimator e = new ClockEstimator();
    assertFalse(e.isHealthy());
    e.initialize(1e-6, 1e-6, 1e-9, 1e-14, true);
    assertTrue(e.isHealthy());
    e.predict(0, 0);
    e.predict(-1, 0);
    assertEquals(1e-6, e.phaseS(), 0);
    e.shiftPhase(Double.NaN);
    assertFalse(e.isHealthy());
    final ClockEstimator nanCovariance = new ClockEstimator();
    nanCovariance.initialize(1e-6, Double.NaN, 1e-9, 1e-14, true);
    assertFalse(nanCovariance.isHealthy(), "a NaN variance");
    final ClockEstimator frozenFrequency = new ClockEstimator();
    frozenFrequency.initialize(1e-6, 1e-6, 0.0, 1e-14, true);
    assertFalse(frozenFrequency.isHealthy(), "a zero frequency variance: the filter could never learn the rate");
  }

  @Test
  void estimatorRestoreRefusesACovarianceThatCannotOccur() {
    final ClockEstimator e = new ClockEstimator();
    e.initialize(1e-6, 1e-6, 1e-9, 1e-14, true);
    e.predict(1.0, 0.0);
    final byte[] good = org.eigenzeit.onboard.restart.StateBytes.written(e::save);
    final ClockEstimator other = new ClockEstimator();
    StateReader r = org.eigenzeit.onboard.restart.StateBytes.reader(good);
    other.restore(r);
    assertEquals(Status.OK, r.status());
    // layout: x[3], then P row-major; P[0][1] is double 4, P[1][0] double 6, P[1][1] double 7
    r = org.eigenzeit.onboard.restart.StateBytes.reader(org.eigenzeit.onboard.restart.StateBytes.withDouble(good, 32,
        1.0));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "P not symmetric");
    r = org.eigenzeit.onboard.restart.StateBytes.reader(org.eigenzeit.onboard.restart.StateBytes.withDouble(good, 56,
        -1.0));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a negative variance");
    r = org.eigenzeit.onboard.restart.StateBytes.reader(org.eigenzeit.onboard.restart.StateBytes.withDouble(good,
        good.length - 8, -1.0));
    other.restore(r);
    assertEquals(Status.OUT_OF_RANGE, r.status(), "a negative innovation variance");
  }

  @Test
  void steeringPhaseExtrapolatesWithTheCommandAndAccessorsAreBounded() {
    final ClockCorrector tk = withTable(false);
    final ClockServo s = tk.servo();
    final SplitTime t = SplitTime.of(2_000_000, 0);
    assertEquals(0, s.count(-1));
    assertEquals(0, s.count(Status.COUNT));
    assertEquals(0.0, s.timeInModeS(-1), 0);
    assertEquals(0.0, s.timeInModeS(ServoMode.COUNT), 0);
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    for (int k = 0; k < 600; k++) { // a clock 2e-11 fast: the servo commands a rate
      m.set(t, 0, 2e-11 * k, true);
      assertEquals(Status.OK, s.cycle(t, 1.0, true, k % 10 == 0 ? m : null));
      if (k < 599) {
        t.addWholeSeconds(1);
      }
    }
    assertTrue(s.command() != 0.0, "servo commands a rate");
    final double phaseBefore = s.steeringPhaseS();
    final double commandBefore = s.command();
    assertEquals(Status.OUT_OF_RANGE, s.cycle(t, -1.0, true, null), "a negative elapsed time is refused");
    assertEquals(Status.NOT_FINITE, s.cycle(t, Double.NaN, true, null));
    assertEquals(Status.NOT_FINITE, s.cycle(t, Double.POSITIVE_INFINITY, true, null));
    assertEquals(phaseBefore, s.steeringPhaseS(), 0, "a refused cycle changes nothing");
    assertEquals(commandBefore, s.command(), 0);
    // A gap of 1e8 s (about 3 years) is taken whole: the command was applied throughout (docs/servo.md).
    assertEquals(Status.OK, s.cycle(t, 1e8, true, null));
    assertEquals(phaseBefore + commandBefore * 1e8, s.steeringPhaseS(), 1e-12 * Math.abs(commandBefore * 1e8),
        "the steering phase advances by command x gap");
    assertEquals(0, tk.tracker().count(-1));
    assertEquals(0, tk.tracker().count(Status.COUNT));
  }

  @Test
  void servoRestoreRefusesAnUnknownMode() {
    final ClockCorrector a = withTable(false);
    final byte[] buf = new byte[4096];
    final StateWriter w = new StateWriter();
    w.reset(buf, 0, buf.length);
    a.servo().save(w);
    assertEquals(Status.OK, w.status());
    final int end = w.position();
    final StateWriter bounds = new StateWriter();
    bounds.reset(buf, 0, -1);
    assertEquals(Status.BUFFER_TOO_SMALL, bounds.status());
    bounds.reset(buf, 1, buf.length);
    assertEquals(Status.BUFFER_TOO_SMALL, bounds.status());
    final StateReader rb = new StateReader();
    rb.reset(buf, 0, -1);
    assertEquals(Status.BUFFER_TOO_SMALL, rb.status());
    rb.reset(buf, 1, buf.length);
    assertEquals(Status.BUFFER_TOO_SMALL, rb.status());
    // layout of ClockServo.save: estimator, gate, then the mode machine starting with the mode
    final int modeAt = ClockEstimator.STATE_BYTES + org.eigenzeit.onboard.servo.gate.MeasurementGate.STATE_BYTES;
    final StateReader r = new StateReader();
    r.reset(buf, 0, end);
    assertEquals(Status.OK, withTable(false).servo().restore(r));
    for (int badMode : new int[] {-1, ServoMode.COUNT}) {
      final byte[] bad = buf.clone();
      for (int i = 0; i < 4; i++) {
        bad[modeAt + i] = (byte) (badMode >> (8 * (3 - i)));
      }
      r.reset(bad, 0, end);
      assertEquals(Status.OUT_OF_RANGE, withTable(false).servo().restore(r), "mode " + badMode);
    }
  }
}
