package org.eigenzeit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.io.IOException;
import java.io.InputStream;
import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicLong;
import org.eigenzeit.ground.uplink.LeapSecondsList;
import org.eigenzeit.ground.uplink.UplinkInputException;
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
import org.eigenzeit.onboard.time.CucCodec;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.corrector.Housekeeping;
import org.eigenzeit.onboard.corrector.ClockCorrector;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.Test;

/**
 * Robustness of the onboard core against bad inputs: more than 10^6 generated inputs across every
 * input field (orbit samples, measurements, raw clock), every table (servo parameters, leap
 * seconds, gravity coefficients, restart buffer) and the CUC decoder. Properties: no exception,
 * no non-finite output, every input answered with a status and counted in housekeeping, a refused
 * table never replaces the active one. QuickTheories generates the seeds of the input sequences
 * (fixed seed, so a failure replays).
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class RobustnessProperties {
  private static final AtomicLong INPUTS = new AtomicLong();
  private static final byte[] TABLE = new byte[ServoParameters.TABLE_BYTES];

  static {
    if (ServoParameters.encode(ServoParameters.typicalRubidium(), TABLE, 0) != Status.OK) {
      throw new IllegalStateException("servo table encoding");
    }
  }

  /** Runs after the properties (highest order): totals and worst cases for the evidence package. */
  @Test
  @Order(Integer.MAX_VALUE)
  void totalsAfterAllProperties() {
    System.out.println("robustness: " + INPUTS.get() + " generated bad or random inputs, no exception, no NaN output");
    System.out.println("evidence: robustness.inputs = " + INPUTS.get());
    assertTrue(INPUTS.get() >= 1_000_000L, "at least 10^6 inputs: " + INPUTS.get());
  }

  /** A nasty double: NaN, infinities, extremes, zeros, or a plausible value. */
  static double nasty(SplittableRandom r, double plausible) {
    switch (r.nextInt(10)) {
      case 0: return Double.NaN;
      case 1: return r.nextBoolean() ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
      case 2: return r.nextBoolean() ? Double.MAX_VALUE : -Double.MAX_VALUE;
      case 3: return r.nextBoolean() ? Double.MIN_VALUE : -0.0;
      case 4: return (r.nextDouble() - 0.5) * 1e30;
      default: return plausible * (1 + (r.nextDouble() - 0.5) * (r.nextBoolean() ? 1e-4 : 2));
    }
  }

  private static ClockCorrector corrector(ModelLevel level) {
    final ClockCorrector tk = new ClockCorrector(ModelConfig.builder().level(level).degree(4).tides(true).build(), true, false);
    if (tk.loadTable(TableId.SERVO, TABLE, 0, TABLE.length) != Status.OK || tk.activateTable(TableId.SERVO) != Status.OK) {
      throw new IllegalStateException("servo table refused");
    }
    return tk;
  }

  @Test
  void orbitMeasurementAndClockInputs() {
    qt().withExamples(300).withFixedSeed(42L).forAll(longs().all(), integers().between(0, 2))
        .checkAssert((seed, lvl) -> {
          final SplittableRandom r = new SplittableRandom(seed);
          final ClockCorrector tk = corrector(ModelLevel.values()[lvl]);
          final OrbitSample s = new OrbitSample();
          final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
          final Housekeeping hk = new Housekeeping();
          final SplitTime raw = SplitTime.of(850_000_000L, 0.0);
          final SplitTime corr = new SplitTime();
          int orbits = 0;
          int measurements = 0;
          for (int k = 0; k < 1000; k++) {
            assertEquals(Status.OK, raw.addSeconds(r.nextInt(20) == 0 ? r.nextInt(5000) : 1.0));
            final double a = 7.0e6;
            final double ang = k * 1e-3;
            s.set(r.nextInt(10) == 0 ? SplitTime.of(raw.wholeSeconds() + r.nextInt(2000) - 1000, 0) : raw,
                r.nextInt(20) == 0 ? r.nextInt(7) - 3 : OrbitSample.FRAME_INERTIAL,
                nasty(r, a * Math.cos(ang)), nasty(r, a * Math.sin(ang)), nasty(r, 1e5),
                nasty(r, -7546 * Math.sin(ang)), nasty(r, 7546 * Math.cos(ang)), nasty(r, 10), r.nextInt(10) != 0);
            tk.correctedTime(raw, corr);
            m.set(r.nextInt(10) == 0 ? SplitTime.of(raw.wholeSeconds() - r.nextInt(100), 0) : corr, r.nextInt(6) - 1,
                nasty(r, 1e-8), r.nextInt(10) != 0);
            final boolean giveOrbit = r.nextBoolean();
            final boolean giveMeas = r.nextBoolean();
            tk.housekeeping(hk);
            final long cyclesBefore = hk.cycles();
            // Now and then the raw clock steps back 10 s (refused when before the last cycle).
            final SplitTime clock = r.nextInt(50) == 0 ? SplitTime.of(raw.wholeSeconds() - 10, 0) : raw;
            final int verdict = tk.cycle(clock, giveOrbit ? s : null, giveMeas ? m : null);
            INPUTS.addAndGet(3);
            tk.housekeeping(hk);
            if (hk.cycles() > cyclesBefore) {
              orbits += giveOrbit ? 1 : 0;
              measurements += giveMeas ? 1 : 0;
              if (giveMeas) {
                assertEquals(hk.lastMeasurementStatus(), verdict, "the verdict returned is the one counted");
              }
            } else {
              assertTrue(Status.isFault(verdict), "a refused cycle says so: " + Status.name(verdict));
            }
            tk.correctedTime(raw, corr);
            assertTrue(Double.isFinite(corr.fractionS()));
            for (double v : new double[] {hk.phaseS(), hk.frequency(), hk.command(), hk.modelRate(), hk.modelOffsetS(),
                hk.steeringPhaseS(), hk.sigmaPhaseS(), hk.modelRateErrorBound()}) {
              assertTrue(Double.isFinite(v), "non-finite housekeeping");
            }
            assertTrue(hk.mode() >= 0 && hk.mode() < ServoMode.COUNT);
          }
          int oSum = 0;
          int mSum = 0;
          for (int c = 0; c < Status.COUNT; c++) {
            oSum += hk.orbitCounts(c);
            mSum += hk.measurementCounts(c);
          }
          assertEquals(orbits, oSum, "every orbit sample counted");
          assertEquals(measurements, mSum, "every measurement counted");
        });
  }

  @Test
  void tablesDecodersAndRestartBuffers() throws IOException {
    final byte[] leapText;
    try (InputStream in = RobustnessProperties.class.getResourceAsStream("/org/eigenzeit/ground/trajectory/leap-seconds.list")) {
      leapText = in.readAllBytes();
    }
    final byte[] leapImage = LeapSecondsList.read("leap-seconds.list", leapText).image();
    final byte[] gravityImage = new byte[GravityTable.imageBytesFor(4)];
    assertEquals(Status.OK, GravityTable.encode(GravityField.egm96(4), gravityImage, 0));
    final ClockCorrector source = corrector(ModelLevel.J2);
    final byte[] restart = new byte[ClockCorrector.STATE_BYTES];
    assertEquals(Status.OK, source.save(restart, 0, restart.length));
    final TableStatus ts = new TableStatus();
    qt().withExamples(300).withFixedSeed(43L).forAll(longs().all()).checkAssert(seed -> {
      final SplittableRandom r = new SplittableRandom(seed);
      final ClockCorrector tk = new ClockCorrector(ModelConfig.builder().level(ModelLevel.HARMONICS).degree(4)
          .tides(false).build(), true, false);
      assertEquals(Status.OK, tk.loadTable(TableId.SERVO, TABLE, 0, TABLE.length));
      assertEquals(Status.OK, tk.activateTable(TableId.SERVO));
      assertEquals(Status.OK, tk.loadTable(TableId.LEAP_SECONDS, leapImage, 0, leapImage.length));
      assertEquals(Status.OK, tk.activateTable(TableId.LEAP_SECONDS));
      final CucCodec cuc = CucCodec.level1(1 + r.nextInt(7), r.nextInt(11));
      final SplitTime t = new SplitTime();
      final int[] crcs = new int[TableId.COUNT];
      for (int id = 0; id < TableId.COUNT; id++) {
        assertEquals(Status.OK, tk.tableStatus(id, ts));
        crcs[id] = ts.activeCrc();
      }
      for (int k = 0; k < 200; k++) {
        final int id = r.nextInt(TableId.COUNT);
        final byte[] good = id == TableId.SERVO ? TABLE : id == TableId.GRAVITY ? gravityImage : leapImage;
        final byte[] tb = mutate(good, r);
        final int off = r.nextInt(3) == 0 ? r.nextInt(5) - 2 : 0;
        final int len = r.nextInt(3) == 0 ? r.nextInt(tb.length + 20) : tb.length;
        final int st = tk.loadTable(id, tb, off, len);
        assertTrue(st == Status.OK || Status.isFault(st), "a load answers with a status");
        if (st == Status.OK && r.nextBoolean()) {
          assertEquals(Status.OK, tk.activateTable(id));
          assertEquals(Status.OK, tk.tableStatus(id, ts));
          crcs[id] = ts.activeCrc();
        }
        assertEquals(Status.OK, tk.tableStatus(id, ts));
        assertEquals(crcs[id], ts.activeCrc(), "only an explicit activation changes the active table");
        assertTrue(ts.active());
        final byte[] text = mutate(leapText, r);
        try {
          LeapSecondsList.read("fuzz", text);
        } catch (UplinkInputException e) {
          assertTrue(e.getMessage().startsWith("fuzz:"), "the ground decoder names the file: " + e.getMessage());
        }
        final byte[] code = new byte[r.nextInt(25)];
        r.nextBytes(code);
        if (cuc.decode(code, r.nextInt(3) - 1 + (code.length > 0 ? 0 : 1), t) == Status.OK) {
          assertTrue(Double.isFinite(t.fractionS()));
        }
        final ClockCorrector fresh = new ClockCorrector(ModelConfig.builder().level(ModelLevel.J2).build(), true, false);
        final byte[] rb = mutate(restart, r);
        final int rs = fresh.restore(rb, 0, rb.length);
        assertTrue(rs == Status.OK || Status.isFault(rs));
        INPUTS.addAndGet(5);
      }
    });
  }

  /** Flips bits, overwrites bytes, truncates or extends a copy. */
  static byte[] mutate(byte[] src, SplittableRandom r) {
    final int kind = r.nextInt(4);
    if (kind == 0) {
      return java.util.Arrays.copyOf(src, r.nextInt(src.length + 1));
    }
    final byte[] b = src.clone();
    final int edits = 1 + r.nextInt(4);
    for (int i = 0; i < edits && b.length > 0; i++) {
      final int p = r.nextInt(b.length);
      b[p] = kind == 1 ? (byte) (b[p] ^ (1 << r.nextInt(8))) : (byte) r.nextInt(256);
    }
    return b;
  }
}
