package org.eigenzeit.bench;

import java.util.concurrent.TimeUnit;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.CucCodec;
import org.eigenzeit.onboard.time.SplitTime;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/** CCSDS CUC encode and decode (4 coarse + 3 fine octets, Level 1). */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class CucBenchmark {
  private final CucCodec codec = CucCodec.level1(4, 3);
  private final byte[] buffer = new byte[CucCodec.MAX_CODE_OCTETS];
  private final SplitTime in = SplitTime.of(850_000_000L, 0.123456789);
  private final SplitTime out = new SplitTime();

  /** Encodes one valid code for the decode benchmark. */
  @org.openjdk.jmh.annotations.Setup(org.openjdk.jmh.annotations.Level.Trial)
  public void setup() {
    if (codec.encode(in, buffer, 0) != Status.OK) {
      throw new IllegalStateException("the benchmark's instant does not encode");
    }
  }

  /**
   * Encode.
   *
   * @return status
   */
  @Benchmark
  public int encode() {
    in.addWholeSeconds(1);
    return codec.encode(in, buffer, 0);
  }

  /**
   * Decode.
   *
   * @return status
   */
  @Benchmark
  public int decode() {
    buffer[4]++; // changes the lowest coarse octet: always a valid code, a different time
    return codec.decode(buffer, 0, out);
  }
}
