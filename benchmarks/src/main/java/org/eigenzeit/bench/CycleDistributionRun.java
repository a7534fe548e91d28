package org.eigenzeit.bench;

import java.util.Locale;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;

/**
 * The distribution of single-cycle times of the model (the worst cycle a flight scheduler budgets):
 * one {@code ProperTimeTracker.step} per cycle with a fresh inertial sample at 1 s of TT, as
 * {@code CoreCycleBenchmark.modelCycle}, each cycle bracketed by {@code System.nanoTime} and counted
 * in a histogram of 1 ns bins (preallocated; cycles above its range only raise the maximum). After
 * a warm-up of 10^6 cycles, the given number of cycles per level (default 10^7: 10^7 s of TT, so
 * 2 777 hourly and 166 666 minute slots). It also measures the timer's own bracket (two {@code
 * nanoTime} calls with nothing between) in the same run: the floor the cycle figures include.
 * Prints per level the median, p99, p99.9, p99.99 and maximum in ns, the maximum and p99.9 as
 * ratios to the median, and the tracker's count of slot refreshes computed at once.
 *
 * <p>Usage: {@code java -cp benchmarks.jar org.eigenzeit.bench.CycleDistributionRun [cycles]
 * [level,...]} (levels of {@code CoreCycleBenchmark}: point-mass, j2, deg36 by default). One JVM
 * is one fork; {@code scripts/benchmarks.sh cycles [forks]} runs several. The maximum of 10^7
 * cycles on a shared virtual machine also holds interruptions of the guest (timer interrupts,
 * other work): compare it across forks and with the timer's own maximum.
 */
public final class CycleDistributionRun {
  private static final int BINS = 1_000_000; // 1 ns bins up to 1 ms
  private static final int RING = 6000;

  private CycleDistributionRun() {}

  /** Percentiles and maximum of a histogram. */
  private static String summary(String name, long[] hist, long max, long n, String sync) {
    final double[] qs = {0.5, 0.99, 0.999, 0.9999};
    final long[] at = new long[qs.length];
    long seen = 0;
    int q = 0;
    for (int i = 0; i < BINS && q < qs.length; i++) {
      seen += hist[i];
      while (q < qs.length && seen >= (long) Math.ceil(qs[q] * n)) {
        at[q++] = i;
      }
    }
    for (; q < qs.length; q++) {
      at[q] = max;
    }
    final double median = Math.max(1, at[0]);
    return String.format(Locale.ROOT, "%-11s median %6d  p99 %6d  p99.9 %6d  p99.99 %7d  max %8d ns  "
        + "max/median %7.1f  p99.9/median %5.2f  synchronous refreshes %s", name, at[0], at[1], at[2], at[3], max,
        max / median, at[2] / median, sync);
  }

  /**
   * The tracker's count of slot refreshes computed at once, looked up by name so that the same
   * harness also runs on the core before staging (commit b6242fe), which has no such count.
   */
  private static String synchronousRefreshes(ProperTimeTracker tracker) {
    try {
      return String.valueOf(ProperTimeTracker.class.getMethod("synchronousRefreshes").invoke(tracker));
    } catch (ReflectiveOperationException e) {
      return "n/a (core before staging)";
    }
  }

  /**
   * Runs the levels.
   *
   * @param args optional number of cycles and a comma-separated list of levels
   */
  public static void main(String[] args) {
    final long cycles = args.length > 0 ? Long.parseLong(args[0]) : 10_000_000L;
    final String[] levels = (args.length > 1 ? args[1] : "point-mass,j2,deg36").split(",");
    final double a = 7.0e6;
    final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (a * a * a));
    final double[][] st = new double[RING][];
    for (int k = 0; k < RING; k++) {
      final double u = n * k;
      st[k] = new double[] {a * Math.cos(u), a * Math.sin(u) * 0.6, a * Math.sin(u) * 0.8, -n * a * Math.sin(u),
          n * a * Math.cos(u) * 0.6, n * a * Math.cos(u) * 0.8};
    }
    final long[] hist = new long[BINS];
    // The timer's own bracket.
    long tmax = 0;
    for (long k = 0; k < cycles; k++) {
      final long t0 = System.nanoTime();
      final long d = System.nanoTime() - t0;
      if (k >= cycles / 10) {
        hist[(int) Math.min(d, BINS - 1)]++;
        tmax = Math.max(tmax, d);
      }
    }
    System.out.println(summary("timer", hist, tmax, cycles - cycles / 10, "-"));
    for (String level : levels) {
      java.util.Arrays.fill(hist, 0);
      final ProperTimeTracker tracker = new ProperTimeTracker(CoreCycleBenchmark.config(level));
      final OrbitSample sample = new OrbitSample();
      final SplitTime now = new SplitTime();
      final long warm = 1_000_000L;
      long max = 0;
      long refused = 0;
      double sink = 0;
      int ring = 0;
      for (long t = 0; t < warm + cycles; t++) {
        final double[] s = st[ring];
        ring = ring + 1 == RING ? 0 : ring + 1;
        refused += now.set(850_000_000L + t, 0.0) == Status.OK ? 0 : 1;
        sample.set(now, OrbitSample.FRAME_INERTIAL, s[0], s[1], s[2], s[3], s[4], s[5], true);
        final long t0 = System.nanoTime();
        final int verdict = tracker.step(now, sample);
        final long d = System.nanoTime() - t0;
        refused += Status.isUsable(verdict) ? 0 : 1;
        sink += tracker.offsetS();
        if (t >= warm) {
          hist[(int) Math.min(d, BINS - 1)]++;
          max = Math.max(max, d);
        }
      }
      System.out.println(summary(level, hist, max, cycles, synchronousRefreshes(tracker))
          + (refused == 0 ? "" : "  CYCLES NOT USABLE " + refused) + String.format(Locale.ROOT, " (sink %.1e)", sink));
    }
  }
}
