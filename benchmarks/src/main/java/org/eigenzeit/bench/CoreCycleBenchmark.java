package org.eigenzeit.bench;

import java.util.concurrent.TimeUnit;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelConfigBuilder;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.corrector.ClockCorrector;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One onboard cycle (a fresh inertial orbit sample, validation, frames, rate model, integration)
 * at each model level, the same with the servo (measurement every cycle), and the floor: the least
 * arithmetic of the Keplerian terms (|r|, v^2, r.v, one division). The sample advances 1 s of a
 * circular 7000 km orbit per call (precomputed ring of 600 states, so the benchmark measures the
 * core, not the test orbit).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class CoreCycleBenchmark {
  /** Model level: point-mass, j2, deg4, deg20, deg36, deg4-tides. */
  @Param({"point-mass", "j2", "deg4", "deg20", "deg36", "deg4-tides"})
  public String level;

  private static final int RING = 600;
  private final double[][] states = new double[RING][6];
  private ProperTimeTracker tracker;
  private ClockCorrector corrector;
  private final OrbitSample sample = new OrbitSample();
  private final TimeOffsetMeasurement measurement = new TimeOffsetMeasurement();
  private final SplitTime now = new SplitTime();
  private final SplitTime raw = new SplitTime();
  private long t;
  private int ring;

  static ModelConfig config(String level) {
    final ModelConfigBuilder b = ModelConfig.builder().energyToleranceRel(5e-3);
    return switch (level) {
      case "point-mass" -> b.level(ModelLevel.POINT_MASS).tides(false).build();
      case "j2" -> b.level(ModelLevel.J2).tides(false).build();
      case "deg4" -> b.level(ModelLevel.HARMONICS).degree(4).tides(false).build();
      case "deg20" -> b.level(ModelLevel.HARMONICS).degree(20).tides(false).build();
      case "deg36" -> b.level(ModelLevel.HARMONICS).degree(36).tides(false).build();
      default -> b.level(ModelLevel.HARMONICS).degree(4).tides(true).build();
    };
  }

  /** Builds the objects under test and the orbit ring. */
  @Setup(Level.Trial)
  public void setup() {
    final double a = 7.0e6;
    final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (a * a * a));
    for (int k = 0; k < RING; k++) {
      final double u = n * k;
      states[k][0] = a * Math.cos(u);
      states[k][1] = a * Math.sin(u) * 0.6;
      states[k][2] = a * Math.sin(u) * 0.8;
      states[k][3] = -n * a * Math.sin(u);
      states[k][4] = n * a * Math.cos(u) * 0.6;
      states[k][5] = n * a * Math.cos(u) * 0.8;
    }
    tracker = new ProperTimeTracker(config(level));
    corrector = new ClockCorrector(config(level), true, true);
    final byte[] table = new byte[ServoParameters.TABLE_BYTES];
    if (ServoParameters.encode(ServoParameters.typicalRubidium(), table, 0) != Status.OK
        || corrector.loadTable(TableId.SERVO, table, 0, table.length) != Status.OK
        || corrector.activateTable(TableId.SERVO) != Status.OK) {
      throw new IllegalStateException("servo table refused");
    }
  }

  /** The next state of the ring (no long division in the measured path). */
  private double[] nextState() {
    final double[] s = states[ring];
    ring = ring + 1 == RING ? 0 : ring + 1;
    return s;
  }

  /**
   * The relativistic model's cycle.
   *
   * @return the offset plus the verdict code (consumed by JMH)
   */
  @Benchmark
  public double modelCycle() {
    final double[] s = nextState();
    final int set = now.set(850_000_000L + t, 0.0);
    t++;
    sample.set(now, OrbitSample.FRAME_INERTIAL, s[0], s[1], s[2], s[3], s[4], s[5], true);
    final int verdict = tracker.step(now, sample); // consumed with the offset: a dropped status is refused
    return tracker.offsetS() + verdict + set;
  }

  /**
   * The worst single cycle for a timing budget: every call starts a new hour of TT, so each one
   * also refreshes the 60 s slot (Sun, Moon, lunar pole) and the hourly precession-nutation, which
   * the other benchmarks amortise over their slots.
   *
   * @return the offset plus the verdict code (consumed by JMH)
   */
  @Benchmark
  public double refreshCycle() {
    final double[] s = nextState();
    final int set = now.set(850_000_000L + 3600L * t, 0.0);
    t++;
    sample.set(now, OrbitSample.FRAME_INERTIAL, s[0], s[1], s[2], s[3], s[4], s[5], true);
    final int verdict = tracker.step(now, sample); // consumed with the offset: a dropped status is refused
    return tracker.offsetS() + verdict + set;
  }

  /**
   * The full clock-corrector cycle: model, servo with a measurement, corrected time.
   *
   * @return the steering command plus the verdict code (consumed by JMH)
   */
  @Benchmark
  public double servoCycle() {
    final double[] s = nextState();
    final int set = now.set(850_000_000L + t, 0.0) + raw.set(850_000_000L + t, 1e-9);
    t++;
    sample.set(now, OrbitSample.FRAME_INERTIAL, s[0], s[1], s[2], s[3], s[4], s[5], true);
    measurement.set(now, 0, 1e-9, true);
    final int verdict = corrector.cycle(raw, sample, measurement); // consumed: a dropped status is refused
    return corrector.frequencyCommand() + verdict + set;
  }
}
