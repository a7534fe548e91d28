package org.eigenzeit.bench;

import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.util.Locale;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.corrector.ClockCorrector;

/**
 * Soak run: 10^7 full clock-corrector cycles (degree 4, tides, servo with a measurement every cycle),
 * reporting the garbage collections that happened during the cycles (run with -Xlog:gc to see
 * them in the JVM's own log). Usage: {@code java -Xlog:gc -cp benchmarks.jar
 * org.eigenzeit.bench.SoakRun [cycles]}.
 */
public final class SoakRun {
  private SoakRun() {}

  private static long collections() {
    long n = 0;
    for (GarbageCollectorMXBean gc : ManagementFactory.getGarbageCollectorMXBeans()) {
      n += Math.max(0, gc.getCollectionCount());
    }
    return n;
  }

  /**
   * Runs the soak.
   *
   * @param args optional number of cycles
   */
  public static void main(String[] args) {
    final long cycles = args.length > 0 ? Long.parseLong(args[0]) : 10_000_000L;
    final ClockCorrector tk = new ClockCorrector(ModelConfig.builder().level(ModelLevel.HARMONICS).degree(4).tides(true)
        .energyToleranceRel(5e-3).build(), true, true);
    final byte[] table = new byte[ServoParameters.TABLE_BYTES];
    if (ServoParameters.encode(ServoParameters.typicalRubidium(), table, 0) != Status.OK
        || tk.loadTable(TableId.SERVO, table, 0, table.length) != Status.OK
        || tk.activateTable(TableId.SERVO) != Status.OK) {
      throw new IllegalStateException("servo table refused");
    }
    final int ring = 6000;
    final double a = 7.0e6;
    final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (a * a * a));
    final double[][] st = new double[ring][6];
    for (int k = 0; k < ring; k++) {
      final double u = n * k;
      st[k] = new double[] {a * Math.cos(u), a * Math.sin(u) * 0.6, a * Math.sin(u) * 0.8, -n * a * Math.sin(u),
          n * a * Math.cos(u) * 0.6, n * a * Math.cos(u) * 0.8};
    }
    final OrbitSample sample = new OrbitSample();
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    final SplitTime now = new SplitTime();
    final SplitTime raw = new SplitTime();
    System.gc();
    final long gc0 = collections();
    final long t0 = System.nanoTime();
    double sink = 0;
    long refused = 0;
    for (long t = 0; t < cycles; t++) {
      final double[] s = st[(int) (t % ring)];
      refused += now.set(850_000_000L + t, 0.0) == Status.OK && raw.set(850_000_000L + t, 1e-9) == Status.OK ? 0 : 1;
      sample.set(now, OrbitSample.FRAME_INERTIAL, s[0], s[1], s[2], s[3], s[4], s[5], true);
      m.set(now, 0, 1e-9, (t & 7) == 0);
      refused += tk.cycle(raw, sample, (t & 7) == 0 ? m : null) == Status.OK ? 0 : 1;
      sink += tk.frequencyCommand();
    }
    final double seconds = (System.nanoTime() - t0) / 1e9;
    final long gcs = collections() - gc0;
    System.out.printf(Locale.ROOT, "soak: %d cycles in %.1f s (%.0f ns per cycle), garbage collections during the "
        + "cycles: %d, cycles not OK: %d (sink %.1e)%n", cycles, seconds, seconds * 1e9 / cycles, gcs, refused, sink);
  }
}
