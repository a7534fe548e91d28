package org.eigenzeit.verification;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.zip.CRC32C;
import org.eigenzeit.ground.uplink.LeapSecondsList;
import org.eigenzeit.onboard.corrector.ClockCorrector;
import org.eigenzeit.onboard.corrector.Housekeeping;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.gravity.GravityTable;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableStatus;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * Robustness of the onboard core against bad inputs (issue 14, item 4). Every input fed is
 * counted and classified: <em>bad</em> (one deliberate defect, with the status code the documented
 * check order gives it) or <em>plausible</em> (a value the core may accept or refuse on its own
 * judgement). Properties, each asserted for every input:
 *
 * <ul>
 *   <li>a bad input is refused with its expected code;
 *   <li>every answer (bad or plausible) moves exactly one housekeeping counter by exactly one, and
 *       the counter of a refusal is the refusal's code;
 *   <li>no non-finite value in the corrected time or any housekeeping value;
 *   <li>a refused table (servo, gravity, leap seconds) or restart buffer leaves the saved state
 *       byte-identical and the active table's CRC unchanged;
 *   <li>between two cycles the corrected time advances by the raw step plus the commanded phase
 *       step, within (F_STEER_MAX + 1e-8) x the raw step (the steering's largest frequency plus a
 *       bound on the model's rate for any Earth orbit the validator admits).
 * </ul>
 *
 * <p>Each test is self-contained (its own corrector, fixed seeds, its own counts and evidence
 * lines); QuickTheories generates the seeds of the input sequences so a failure replays. The
 * lunar time table is not held by the corrector and is covered by LunarTimeLayoutTest.
 */
class RobustnessProperties {
  private static final double GM = 3.986004418e14;
  private static final double RADIUS = 7.0e6;
  /** Bound on |model rate| admitted for any Earth orbit (documented above), dimensionless. */
  private static final double MODEL_RATE_BOUND = 1e-8;

  private static byte[] servoImage() {
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(ServoParameters.typicalRubidium(), b, 0));
    return b;
  }

  private static ClockCorrector corrector(ModelLevel level, byte[] servo) {
    final ClockCorrector tk = new ClockCorrector(ModelConfig.builder().level(level).degree(4).tides(true).build(),
        true, false);
    assertEquals(Status.OK, tk.loadTable(TableId.SERVO, servo, 0, servo.length));
    assertEquals(Status.OK, tk.activateTable(TableId.SERVO));
    return tk;
  }

  /** Counts of one test: fed inputs by class. */
  private static final class Tally {
    long bad;
    long plausible;
  }

  private static void assertAllFinite(Housekeeping hk, SplitTime corr) {
    assertTrue(Double.isFinite(corr.fractionS()), "corrected time finite");
    final double[] values = {hk.phaseS(), hk.sigmaPhaseS(), hk.frequency(), hk.sigmaFrequency(), hk.driftPerS(),
        hk.sigmaDriftPerS(), hk.command(), hk.steeringPhaseS(), hk.lastPhaseStepS(), hk.modelRate(),
        hk.modelOffsetS(), hk.modelRateErrorBound(), hk.lastModelStepS(), hk.sinceMeasurementS()};
    for (int i = 0; i < values.length; i++) {
      assertTrue(Double.isFinite(values[i]), "housekeeping value " + i + " not finite: " + values[i]);
    }
    for (int m = 0; m < ServoMode.COUNT; m++) {
      assertTrue(Double.isFinite(hk.timeInModeS(m)), "time in mode " + m);
    }
    assertTrue(hk.mode() >= 0 && hk.mode() < ServoMode.COUNT, "mode in range");
  }

  /** Asserts exactly one counter moved, by one, and returns its code. */
  private static int movedByOne(int[] before, int[] after, String what) {
    int moved = -1;
    for (int c = 0; c < Status.COUNT; c++) {
      final int d = after[c] - before[c];
      assertTrue(d == 0 || d == 1, what + ": counter " + Status.name(c) + " moved by " + d);
      if (d == 1) {
        assertEquals(-1, moved, what + ": two counters moved");
        moved = c;
      }
    }
    assertTrue(moved >= 0, what + ": no counter moved");
    return moved;
  }

  private interface Counts {
    int get(Housekeeping hk, int code);
  }

  private static int[] counts(Housekeeping hk, Counts f) {
    final int[] out = new int[Status.COUNT];
    for (int c = 0; c < Status.COUNT; c++) {
      out[c] = f.get(hk, c);
    }
    return out;
  }

  private static double seconds(SplitTime a, SplitTime b) {
    return (a.wholeSeconds() - b.wholeSeconds()) + (a.fractionS() - b.fractionS());
  }

  /**
   * A bad orbit sample: a plausible one with one defect. Returns the expected code (check order
   * of SampleValidator: valid flag, frame, finiteness, radius).
   */
  private static int badOrbit(SplittableRandom r, OrbitSample s, SplitTime epoch, double[] rv) {
    switch (r.nextInt(4)) {
      case 0:
        s.set(epoch, OrbitSample.FRAME_INERTIAL, rv[0], rv[1], rv[2], rv[3], rv[4], rv[5], false);
        return Status.INVALID_INPUT;
      case 1:
        s.set(epoch, 2 + r.nextInt(100), rv[0], rv[1], rv[2], rv[3], rv[4], rv[5], true);
        return Status.OUT_OF_RANGE;
      case 2: {
        final double[] b = rv.clone();
        b[r.nextInt(6)] = r.nextBoolean() ? Double.NaN : r.nextBoolean() ? Double.POSITIVE_INFINITY
            : Double.NEGATIVE_INFINITY;
        s.set(epoch, OrbitSample.FRAME_INERTIAL, b[0], b[1], b[2], b[3], b[4], b[5], true);
        return Status.NOT_FINITE;
      }
      default: {
        final double k = r.nextBoolean() ? 1e5 + r.nextDouble() * 1e290 : r.nextDouble() * 0.5;
        s.set(epoch, OrbitSample.FRAME_INERTIAL, rv[0] * k, rv[1] * k, rv[2] * k, rv[3], rv[4], rv[5], true);
        return Status.RADIUS_OUT_OF_RANGE;
      }
    }
  }

  /** A bad measurement with one defect; check order of MeasurementGate. */
  private static int badMeasurement(SplittableRandom r, TimeOffsetMeasurement m, SplitTime epoch, double z) {
    switch (r.nextInt(4)) {
      case 0:
        m.set(epoch, 0, z, false);
        return Status.INVALID_INPUT;
      case 1:
        m.set(epoch, r.nextBoolean() ? -1 - r.nextInt(100) : TimeOffsetMeasurement.SOURCES + r.nextInt(100), z, true);
        return Status.OUT_OF_RANGE;
      case 2:
        m.set(epoch, 0, r.nextBoolean() ? Double.NaN : Double.NEGATIVE_INFINITY, true);
        return Status.NOT_FINITE;
      default:
        m.set(epoch, 0, (r.nextBoolean() ? 1 : -1) * (1.0 + 1e-9 + r.nextDouble() * 1e300), true);
        return Status.OUT_OF_RANGE; // |z| above F_MAX_ABS_OFFSET_S = 1 s
    }
  }

  @Test
  void everyBadCycleInputIsRefusedWithItsCodeCountedOnceAndTheTimeNeverJumps() {
    final byte[] servo = servoImage();
    final double steerMax = ServoParameters.typicalRubidium()[ServoParameters.F_STEER_MAX];
    final Tally orbits = new Tally();
    final Tally meas = new Tally();
    final Tally raws = new Tally();
    final double[] worstStep = {0.0};
    qt().withExamples(260).withFixedSeed(42L).forAll(longs().all()).checkAssert(seed -> {
      final SplittableRandom r = new SplittableRandom(seed);
      final ClockCorrector tk = corrector(ModelLevel.values()[r.nextInt(ModelLevel.values().length)], servo);
      final OrbitSample s = new OrbitSample();
      final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
      final Housekeeping hk = new Housekeeping();
      final SplitTime raw = SplitTime.of(850_000_000L, 0.0);
      final SplitTime prevRaw = new SplitTime();
      final SplitTime corr = new SplitTime();
      final SplitTime prevCorr = new SplitTime();
      final double w = Math.sqrt(GM / (RADIUS * RADIUS * RADIUS));
      final double v = w * RADIUS;
      final double[] rv = new double[6];
      boolean havePrev = false;
      for (int k = 0; k < 2500; k++) {
        tk.housekeeping(hk);
        final int[] rawBefore = counts(hk, Housekeeping::rawClockCounts);
        final int[] orbBefore = counts(hk, Housekeeping::orbitCounts);
        final int[] measBefore = counts(hk, Housekeeping::measurementCounts);
        final long cyclesBefore = hk.cycles();
        if (k > 0 && r.nextInt(20) == 0) { // bad raw clock: 1 to 1000 s before the last admitted reading
          final SplitTime back = SplitTime.of(raw.wholeSeconds() - 1 - r.nextInt(1000), raw.fractionS());
          final int verdict = tk.cycle(back, null, null);
          raws.bad++;
          assertEquals(Status.EPOCH_NOT_INCREASING, verdict, "raw clock stepping back");
          tk.housekeeping(hk);
          assertEquals(Status.EPOCH_NOT_INCREASING, movedByOne(rawBefore, counts(hk, Housekeeping::rawClockCounts),
              "raw clock"));
          assertEquals(cyclesBefore, hk.cycles(), "a refused reading runs no cycle");
          assertArrayEquals(orbBefore, counts(hk, Housekeeping::orbitCounts), "nothing else ran");
          assertArrayEquals(measBefore, counts(hk, Housekeeping::measurementCounts), "nothing else ran");
          continue;
        }
        assertEquals(Status.OK, raw.addSeconds(1.0));
        raws.plausible++;
        final double ang = w * k;
        rv[0] = RADIUS * Math.cos(ang);
        rv[1] = RADIUS * Math.sin(ang);
        rv[2] = 0;
        rv[3] = -v * Math.sin(ang);
        rv[4] = v * Math.cos(ang);
        rv[5] = 0;
        tk.correctedTime(raw, corr);
        final boolean orbitBad = r.nextInt(10) < 8;
        final int orbitExpected;
        if (orbitBad) {
          orbitExpected = badOrbit(r, s, raw, rv);
        } else {
          orbitExpected = -1;
          s.set(raw, OrbitSample.FRAME_INERTIAL, rv[0], rv[1], rv[2], rv[3], rv[4], rv[5], true);
        }
        final boolean measBad = r.nextInt(10) < 8;
        final int measExpected = measBad ? badMeasurement(r, m, corr, 1e-8) : -1;
        if (!measBad) {
          m.set(corr, r.nextInt(TimeOffsetMeasurement.SOURCES), 1e-8 * (1 + 0.1 * r.nextGaussian()), true);
        }
        final int verdict = tk.cycle(raw, s, m);
        tk.housekeeping(hk);
        assertEquals(cyclesBefore + 1, hk.cycles(), "one cycle ran");
        assertTrue(Status.isUsable(movedByOne(rawBefore, counts(hk, Housekeeping::rawClockCounts), "raw clock")));
        final int orbitCode = movedByOne(orbBefore, counts(hk, Housekeeping::orbitCounts), "orbit");
        assertEquals(orbitCode, hk.lastOrbitStatus(), "the orbit verdict counted is the one reported");
        final int measCode = movedByOne(measBefore, counts(hk, Housekeeping::measurementCounts), "measurement");
        assertEquals(measCode, hk.lastMeasurementStatus(), "the measurement verdict counted is the one reported");
        assertTrue(verdict == measCode || verdict == Status.MODEL_HELD, "the cycle returns the counted verdict");
        if (orbitBad) {
          orbits.bad++;
          assertEquals(Status.name(orbitExpected), Status.name(orbitCode), "bad orbit sample refused with its code");
        } else {
          orbits.plausible++;
        }
        if (measBad) {
          meas.bad++;
          assertEquals(Status.name(measExpected), Status.name(measCode), "bad measurement refused with its code");
        } else {
          meas.plausible++;
        }
        tk.correctedTime(raw, corr);
        assertAllFinite(hk, corr);
        if (havePrev) {
          final double dt = seconds(raw, prevRaw);
          final double step = seconds(corr, prevCorr) - dt - hk.lastPhaseStepS();
          final double bound = (steerMax + MODEL_RATE_BOUND) * dt;
          worstStep[0] = Math.max(worstStep[0], Math.abs(step) / dt);
          assertTrue(Math.abs(step) <= bound, "corrected time stepped by " + step + " s over " + dt + " s");
        }
        assertEquals(Status.OK, prevRaw.set(raw.wholeSeconds(), raw.fractionS()));
        assertEquals(Status.OK, prevCorr.set(corr.wholeSeconds(), corr.fractionS()));
        havePrev = true;
      }
    });
    final long bad = orbits.bad + meas.bad + raws.bad;
    System.out.printf("robustness: cycle inputs fed: orbit %d bad + %d plausible, measurement %d bad + %d plausible,"
        + " raw clock %d bad + %d plausible%n", orbits.bad, orbits.plausible, meas.bad, meas.plausible, raws.bad,
        raws.plausible);
    System.out.printf("evidence: robustness.cycle_bad_inputs = %d%n", bad);
    System.out.printf("evidence: robustness.worst_unexplained_time_rate = %.4e bound %.1e%n", worstStep[0],
        steerMax + MODEL_RATE_BOUND);
    assertTrue(bad >= 1_000_000L, "at least 10^6 bad cycle inputs fed: " + bad);
  }

  /** CRC-32C over all but the last 4 bytes, written big-endian into them (re-signing a tampered image). */
  private static void resign(byte[] b) {
    final CRC32C crc = new CRC32C();
    crc.update(b, 0, b.length - 4);
    ByteBuffer.wrap(b).putInt(b.length - 4, (int) crc.getValue());
  }

  /**
   * A bad table image: one defect, expected code. Kinds: truncated (BUFFER_TOO_SMALL), bad offset
   * (BUFFER_TOO_SMALL), magic changed (MALFORMED), one byte of payload or CRC changed
   * (CHECKSUM_MISMATCH: CRC-32C detects every burst of up to 32 bits), and, when {@code
   * doubleAt} names a double field, that field set non-finite and the image re-signed (NOT_FINITE
   * or OUT_OF_RANGE: a content refusal). Returns {code, offset, length} in {@code out}.
   */
  private static byte[] badTable(SplittableRandom r, byte[] good, int doubleAt, int[] out) {
    final int kind = r.nextInt(doubleAt >= 0 ? 5 : 4);
    out[1] = 0;
    if (kind == 0) {
      final byte[] b = Arrays.copyOf(good, r.nextInt(good.length));
      out[0] = Status.BUFFER_TOO_SMALL;
      out[2] = b.length;
      return b;
    }
    final byte[] b = good.clone();
    out[2] = b.length;
    if (kind == 1) {
      out[1] = r.nextBoolean() ? -1 - r.nextInt(5) : 1 + r.nextInt(5);
      out[0] = Status.BUFFER_TOO_SMALL;
    } else if (kind == 2) {
      final int p = r.nextInt(4);
      b[p] = (byte) (b[p] ^ (1 + r.nextInt(255)));
      out[0] = Status.MALFORMED;
    } else if (kind == 3) {
      final int p = 8 + r.nextInt(b.length - 8);
      b[p] = (byte) (b[p] ^ (1 + r.nextInt(255)));
      out[0] = Status.CHECKSUM_MISMATCH;
    } else {
      ByteBuffer.wrap(b).putDouble(doubleAt, r.nextBoolean() ? Double.NaN : Double.POSITIVE_INFINITY);
      resign(b);
      out[0] = Status.NOT_FINITE; // either content code is accepted below
    }
    return b;
  }

  @Test
  void refusedTablesAndRestartBuffersLeaveTheStateByteIdenticalAndAreCountedOnce() throws IOException {
    final byte[] servo = servoImage();
    final byte[] leapText;
    try (InputStream in = RobustnessProperties.class.getResourceAsStream(
        "/org/eigenzeit/ground/trajectory/leap-seconds.list")) {
      leapText = in.readAllBytes();
    }
    final byte[] leapImage = LeapSecondsList.read("leap-seconds.list", leapText).image();
    final byte[] gravityImage = new byte[GravityTable.imageBytesFor(4)];
    assertEquals(Status.OK, GravityTable.encode(GravityField.egm96(4), gravityImage, 0));
    final Tally tables = new Tally();
    final Tally restores = new Tally();
    qt().withExamples(60).withFixedSeed(43L).forAll(longs().all()).checkAssert(seed -> {
      final SplittableRandom r = new SplittableRandom(seed);
      final ClockCorrector tk = corrector(ModelLevel.HARMONICS, servo);
      assertEquals(Status.OK, tk.loadTable(TableId.LEAP_SECONDS, leapImage, 0, leapImage.length));
      assertEquals(Status.OK, tk.activateTable(TableId.LEAP_SECONDS));
      assertEquals(Status.OK, tk.loadTable(TableId.GRAVITY, gravityImage, 0, gravityImage.length));
      assertEquals(Status.OK, tk.activateTable(TableId.GRAVITY));
      WarmState.drive(tk, r, 200);
      final byte[] restart = new byte[ClockCorrector.STATE_BYTES];
      assertEquals(Status.OK, tk.save(restart, 0, restart.length));
      final byte[] before = new byte[ClockCorrector.STATE_BYTES];
      final byte[] after = new byte[ClockCorrector.STATE_BYTES];
      final TableStatus ts0 = new TableStatus();
      final TableStatus ts1 = new TableStatus();
      final Housekeeping hk = new Housekeeping();
      final int[] spec = new int[3];
      for (int k = 0; k < 2000; k++) {
        assertEquals(Status.OK, tk.save(before, 0, before.length));
        if (r.nextInt(4) == 0) { // a restart buffer
          tk.housekeeping(hk);
          final int[] rb0 = counts(hk, Housekeeping::restoreCounts);
          final byte[] rb = restart.clone();
          int len = rb.length;
          final int expected;
          final int kind = r.nextInt(4);
          if (kind == 0) {
            len = r.nextInt(rb.length);
            expected = Status.BUFFER_TOO_SMALL;
          } else if (kind == 1) {
            final int p = r.nextInt(12);
            rb[p] = (byte) (rb[p] ^ (1 + r.nextInt(255)));
            expected = Status.MALFORMED;
          } else if (kind == 2) {
            final int p = 12 + r.nextInt(rb.length - 12);
            rb[p] = (byte) (rb[p] ^ (1 + r.nextInt(255)));
            expected = Status.CHECKSUM_MISMATCH;
          } else { // content: 8 bytes of a non-finite double anywhere in the payload, re-signed
            ByteBuffer.wrap(rb).putDouble(16 + r.nextInt(rb.length - 28), Double.NaN);
            resign(rb);
            expected = -1;
          }
          final int st = tk.restore(rb, 0, len);
          tk.housekeeping(hk);
          assertEquals(st, movedByOne(rb0, counts(hk, Housekeeping::restoreCounts), "restore"),
              "the restore answer is counted under its code");
          if (expected >= 0) {
            restores.bad++;
            assertEquals(Status.name(expected), Status.name(st), "bad restart buffer refused with its code");
          } else {
            restores.plausible++;
          }
          if (Status.isFault(st)) {
            assertEquals(Status.OK, tk.save(after, 0, after.length));
            assertArrayEquals(before, after, "a refused restore leaves the state byte-identical");
          } else {
            assertEquals(Status.OK, tk.restore(restart, 0, restart.length), "back to the saved state");
          }
          continue;
        }
        final int id = r.nextInt(TableId.LUNAR_TIME); // the tables an Earth configuration holds: ids 0 to 2 (the lunar table, id 3, only a lunar one)
        final byte[] good = id == TableId.SERVO ? servo : id == TableId.GRAVITY ? gravityImage : leapImage;
        final int doubleAt = id == TableId.LEAP_SECONDS ? -1 : 8 + 8 * r.nextInt(id == TableId.SERVO
            ? ServoParameters.FIELD_COUNT : 2);
        final byte[] tb = badTable(r, good, doubleAt, spec);
        assertEquals(Status.OK, tk.tableStatus(id, ts0));
        final int st = tk.loadTable(id, tb, spec[1], spec[2]);
        assertEquals(Status.OK, tk.tableStatus(id, ts1));
        tables.bad++;
        if (spec[0] == Status.NOT_FINITE) {
          assertTrue(st == Status.NOT_FINITE || st == Status.OUT_OF_RANGE, "content refusal: " + Status.name(st));
        } else {
          assertEquals(Status.name(spec[0]), Status.name(st), TableId.name(id) + ": bad table refused with its code");
        }
        assertEquals(ts0.loads() + 1, ts1.loads(), "load counted once");
        final int dCrc = ts1.crcFailures() - ts0.crcFailures();
        final int dRange = ts1.rangeFailures() - ts0.rangeFailures();
        final int dFormat = ts1.formatFailures() - ts0.formatFailures();
        assertEquals(st == Status.CHECKSUM_MISMATCH ? 1 : 0, dCrc, "CRC failure counted once");
        assertEquals(st == Status.NOT_FINITE || st == Status.OUT_OF_RANGE ? 1 : 0, dRange, "range failure counted once");
        assertEquals(1, dCrc + dRange + dFormat, "exactly one refusal counter moved by one");
        assertEquals(st, ts1.lastLoadStatus(), "the refusal is reported");
        assertEquals(ts0.activeCrc(), ts1.activeCrc(), "the active table is unchanged");
        assertEquals(ts0.activations(), ts1.activations());
        assertEquals(Status.NOT_READY, tk.activateTable(id), "nothing validated is staged");
        assertEquals(Status.OK, tk.save(after, 0, after.length));
        assertArrayEquals(before, after, "a refused table leaves the state byte-identical");
      }
      tk.housekeeping(hk);
      final SplitTime corr = new SplitTime();
      tk.correctedTime(SplitTime.of(850_000_300L, 0.5), corr);
      assertAllFinite(hk, corr);
    });
    System.out.printf("robustness: table images fed: %d bad; restart buffers fed: %d bad + %d plausible (re-signed"
        + " content)%n", tables.bad, restores.bad, restores.plausible);
    System.out.printf("evidence: robustness.table_and_restart_bad_inputs = %d%n", tables.bad + restores.bad);
    assertTrue(tables.bad + restores.bad >= 80_000L, "bad tables and buffers fed: " + (tables.bad + restores.bad));
  }

  /** Drives a corrector with plausible inputs so its state is not the initial one. */
  private static final class WarmState {
    static void drive(ClockCorrector tk, SplittableRandom r, int cycles) {
      final OrbitSample s = new OrbitSample();
      final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
      final SplitTime raw = SplitTime.of(850_000_000L, 0.0);
      final SplitTime corr = new SplitTime();
      final double w = Math.sqrt(GM / (RADIUS * RADIUS * RADIUS));
      for (int k = 0; k < cycles; k++) {
        assertEquals(Status.OK, raw.addSeconds(1.0));
        final double a = w * k;
        s.set(raw, OrbitSample.FRAME_INERTIAL, RADIUS * Math.cos(a), RADIUS * Math.sin(a), 0,
            -w * RADIUS * Math.sin(a), w * RADIUS * Math.cos(a), 0, true);
        tk.correctedTime(raw, corr);
        m.set(corr, 0, 1e-8 * (1 + 0.1 * r.nextGaussian()), true);
        final int st = tk.cycle(raw, s, m);
        assertTrue(st >= 0 && st < Status.COUNT, "a status code");
      }
    }
  }
}
