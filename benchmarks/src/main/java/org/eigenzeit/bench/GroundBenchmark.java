package org.eigenzeit.bench;

import java.io.IOException;
import java.io.InputStream;
import java.util.concurrent.TimeUnit;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.pipeline.Pipeline;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.ScenarioReader;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.time.SplitTime;
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
 * Ground side: one satellite-day of reference (LEO and MEO, degree 20, DE405 Sun and Moon, the
 * proper-time state), and a small campaign run (one closed-loop run of the MEO demo mission over
 * 6 h at 1 Hz).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2)
@Measurement(iterations = 5)
@Fork(1)
public class GroundBenchmark {
  /** Orbit class. */
  @Param({"LEO", "MEO"})
  public String orbit;

  private OrbitSpec spec;
  private SplitTime t0;
  private Scenario scenario;
  private ReferencePropagator propagator;

  /**
   * Prepares the orbit and the scenario.
   *
   * @throws IOException when the demo scenario cannot be read
   */
  @Setup(Level.Trial)
  public void setup() throws IOException {
    spec = orbit.equals("LEO")
        ? OrbitSpec.fromElements(CentralBody.EARTH, 6_928_137.0, 0.0012, 97.6, 30, 90, 0)
        : OrbitSpec.fromElements(CentralBody.EARTH, 27_900_000.0, 0.01, 56, 120, 40, 10);
    t0 = Epochs.parse("2026-10-01T00:00:00", "TT");
    propagator = new ReferencePropagator(ReferenceConfig.earth(20)); // loads DE405 once, outside the timing
    try (InputStream in = GroundBenchmark.class.getResourceAsStream("/org/eigenzeit/ground/demo/tamberlode-meo.yaml")) {
      scenario = ScenarioReader.parse("tamberlode-meo.yaml", in).withSpanH(6);
    }
  }

  /**
   * One satellite-day of reference at degree 20.
   *
   * @return the proper-time offset at the end (consumed by JMH)
   */
  @Benchmark
  public double referenceSatelliteDay() {
    return propagator.propagate(t0, spec.position(), spec.velocity(), 86_400)
        .properTimeOffsetS(86_400);
  }

  /**
   * One closed-loop run (6 h at 1 Hz, 21 600 clock-corrector cycles plus the truth).
   *
   * @return the RMS time error (consumed by JMH)
   */
  @Benchmark
  public double closedLoopRun() {
    return Pipeline.run(scenario, 0).result().rmsTimeErrorNs();
  }
}
