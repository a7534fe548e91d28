package org.eigenzeit.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The floor: the minimum arithmetic of the Keplerian clock terms on one state (|r| by a square
 * root, v^2, r.v, one division), advancing the state a little each call so nothing is hoisted.
 * Every core cycle is reported as a ratio to it, so that figures compare across machines.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FloorBenchmark {
  private double x = 7.0e6;
  private double y = 1.0e5;
  private double z = 2.0e5;
  private double vx = 10.0;
  private double vy = 7500.0;
  private double vz = 100.0;

  /**
   * The Keplerian minimum.
   *
   * @return y (consumed by JMH)
   */
  @Benchmark
  public double keplerianTerms() {
    x += 1e-3;
    vy -= 1e-9;
    final double r = Math.sqrt(x * x + y * y + z * z);
    final double v2 = vx * vx + vy * vy + vz * vz;
    final double rv = x * vx + y * vy + z * vz;
    return -(0.5 * v2 + 3.986004415e14 / r) * 1.1126500560536185e-17 + rv * 2.2e-17;
  }
}
