package org.eigenzeit.bench.ops;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.corrector.ClockCorrector;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelConfigBuilder;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;

/**
 * Operations per onboard cycle, by instrumented count ({@link OpCountAgent}): for each model
 * level (point mass, J2, EGM96 degree 4, 8, 20, 36), tides off and on, the model's cycle alone
 * ({@code ProperTimeTracker.step}) and the full cycle with the servo and a measurement every
 * cycle ({@code ClockCorrector.cycle}), N cycles at 1 s of TT along a circular 7000 km orbit inclined
 * 53 degrees (computed by this uninstrumented harness), after a warm-up of one hour. Prints the
 * mean per cycle (the 60 s and hourly refreshes amortised), the median cycle and the worst single
 * cycle (the one with the hourly precession-nutation refresh).
 *
 * <p>Usage: {@code java -javaagent:benchmarks.jar -cp benchmarks.jar
 * org.eigenzeit.bench.ops.OpsRun [cycles]} (scripts/benchmarks.sh ops); default 3600 cycles (one hour:
 * one hourly refresh and 60 refreshes of the 60 s slot).
 */
public final class OpsRun {
  private static final long EPOCH_S = 850_000_000L;
  private static final double A = 7.0e6;

  private OpsRun() {}

  /** A model level. */
  record Level(String name, ModelLevel level, int degree) {}

  static final List<Level> LEVELS = List.of(new Level("point mass", ModelLevel.POINT_MASS, 0),
      new Level("J2", ModelLevel.J2, 0), new Level("degree 4", ModelLevel.HARMONICS, 4),
      new Level("degree 8", ModelLevel.HARMONICS, 8), new Level("degree 20", ModelLevel.HARMONICS, 20),
      new Level("degree 36", ModelLevel.HARMONICS, 36));

  /** Counts of one configuration. */
  record Result(String label, Map<String, Double> mean, Map<String, Long> worst, long medianTotal, long worstTotal,
      long worstCycle, long cycles) {}

  static ModelConfig config(Level l, boolean tides) {
    final ModelConfigBuilder b = ModelConfig.builder().energyToleranceRel(5e-3).level(l.level()).tides(tides);
    return l.degree() > 0 ? b.degree(l.degree()).build() : b.build();
  }

  /** The orbit state at t seconds (circular, inclination 53 degrees), uninstrumented. */
  static void state(long t, double[] s) {
    final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (A * A * A));
    final double u = n * t;
    final double ci = 0.6;
    final double si = 0.8;
    s[0] = A * Math.cos(u);
    s[1] = A * Math.sin(u) * ci;
    s[2] = A * Math.sin(u) * si;
    s[3] = -n * A * Math.sin(u);
    s[4] = n * A * Math.cos(u) * ci;
    s[5] = n * A * Math.cos(u) * si;
  }

  /** The kinds counted as arithmetic (the total per cycle). */
  static final List<String> ARITHMETIC = List.of("add", "sub", "mul", "div", "rem", "neg", "cmp", "conv", "fadd",
      "fsub", "fmul", "fdiv", "frem", "fneg", "fcmp");

  static long total(long[] delta) {
    long sum = 0;
    for (String k : ARITHMETIC) {
      sum += OpCounter.count(delta, k);
    }
    return sum;
  }

  /**
   * Counts one configuration.
   *
   * @param l level
   * @param tides tides on
   * @param servo with the servo (ClockCorrector.cycle) or the model only (ProperTimeTracker.step)
   * @param cycles measured cycles
   * @return the counts
   */
  static Result run(Level l, boolean tides, boolean servo, int cycles) {
    final ProperTimeTracker tracker = servo ? null : new ProperTimeTracker(config(l, tides));
    final ClockCorrector tk = servo ? new ClockCorrector(config(l, tides), true, true) : null;
    if (tk != null) {
      final byte[] table = new byte[ServoParameters.TABLE_BYTES];
      check(ServoParameters.encode(ServoParameters.typicalRubidium(), table, 0), "servo table encoding");
      check(tk.loadTable(TableId.SERVO, table, 0, table.length), "servo table load");
      check(tk.activateTable(TableId.SERVO), "servo table activation");
    }
    final OrbitSample sample = new OrbitSample();
    final TimeOffsetMeasurement m = new TimeOffsetMeasurement();
    final SplitTime now = new SplitTime();
    final SplitTime raw = new SplitTime();
    final double[] s = new double[6];
    final int warm = 3600;
    final long[] sum = new long[OpCounter.CAPACITY];
    final long[] totals = new long[cycles];
    long[] worst = null;
    long worstTotal = -1;
    long worstCycle = -1;
    for (int k = -warm; k < cycles; k++) {
      final long t = (long) k + warm;
      state(t, s);
      check(now.set(EPOCH_S + t, 0.0), "instant");
      sample.set(now, OrbitSample.FRAME_INERTIAL, s[0], s[1], s[2], s[3], s[4], s[5], true);
      final long[] before = OpCounter.snapshot();
      final int status;
      if (servo) {
        check(raw.set(EPOCH_S + t, 1e-9), "raw clock reading");
        m.set(now, 0, 1e-9, true);
        status = tk.cycle(raw, sample, m);
      } else {
        status = tracker.step(now, sample);
      }
      final long[] after = OpCounter.snapshot();
      check(status, servo ? "ClockCorrector.cycle" : "ProperTimeTracker.step");
      if (k < 0) {
        continue;
      }
      final long[] delta = new long[after.length];
      for (int i = 0; i < after.length; i++) {
        delta[i] = after[i] - before[i];
        sum[i] += delta[i];
      }
      totals[k] = total(delta);
      if (totals[k] > worstTotal) {
        worstTotal = totals[k];
        worst = delta;
        worstCycle = t;
      }
    }
    final Map<String, Double> mean = new LinkedHashMap<>();
    final Map<String, Long> worstMap = new LinkedHashMap<>();
    for (String k : OpCounter.names()) {
      if (OpCounter.count(sum, k) > 0 || OpCounter.count(worst, k) > 0) {
        mean.put(k, OpCounter.count(sum, k) / (double) cycles);
        worstMap.put(k, OpCounter.count(worst, k));
      }
    }
    final long[] sorted = totals.clone();
    Arrays.sort(sorted);
    final String label = l.name() + (tides ? " + tides" : "") + (servo ? " + servo" : "");
    return new Result(label, mean, worstMap, sorted[cycles / 2], worstTotal, worstCycle, cycles);
  }

  private static void check(int status, String what) {
    if (!Status.isUsable(status)) {
      throw new IllegalStateException(what + " returned " + Status.name(status) + ": not the nominal path");
    }
  }

  /** Trigonometric functions (of Math and StrictMath) for the "trig" column. */
  static final List<String> TRIG = List.of("sin", "cos", "tan", "asin", "acos", "atan", "atan2");

  static boolean isTrig(String kind) {
    final int dot = kind.indexOf('.');
    return (kind.startsWith("Math.") || kind.startsWith("StrictMath.")) && TRIG.contains(kind.substring(dot + 1));
  }

  static boolean isSqrt(String kind) {
    return kind.equals("Math.sqrt") || kind.equals("StrictMath.sqrt");
  }

  static double sum(Map<String, ? extends Number> counts, java.util.function.Predicate<String> which) {
    double s = 0;
    for (Map.Entry<String, ? extends Number> e : counts.entrySet()) {
      if (which.test(e.getKey())) {
        s += e.getValue().doubleValue();
      }
    }
    return s;
  }

  /** The calls of a map as "Math.abs 3, Math.floor 2" (sorted by name), or the trig ones only. */
  static String calls(Map<String, ? extends Number> counts, boolean trig) {
    final List<String> parts = new ArrayList<>();
    counts.entrySet().stream().filter(e -> e.getKey().contains(".") && e.getValue().doubleValue() > 0)
        .filter(e -> trig == isTrig(e.getKey()) && (trig || !isSqrt(e.getKey())))
        .sorted(Map.Entry.comparingByKey())
        .forEach(e -> parts.add(e.getKey() + " " + number(e.getValue().doubleValue())));
    return parts.isEmpty() ? "none" : String.join(", ", parts);
  }

  static String number(double x) {
    if (x == Math.rint(x)) {
      return String.format(Locale.ROOT, "%.0f", x);
    }
    return x >= 0.1 ? String.format(Locale.ROOT, "%.2f", x) : String.format(Locale.ROOT, "%.2e", x);
  }

  static double get(Map<String, ? extends Number> m, String k) {
    final Number n = m.get(k);
    return n == null ? 0.0 : n.doubleValue();
  }

  /**
   * Runs every configuration and prints the tables.
   *
   * @param args optional number of measured cycles (default 3600, one hour)
   */
  public static void main(String[] args) {
    if (!OpCountAgent.installed) {
      System.err.println("ops: run with -javaagent:benchmarks.jar (the counts come from the instrumented core)");
      System.exit(2);
    }
    final int cycles = args.length > 0 ? Integer.parseInt(args[0]) : 3600;
    final List<Result> results = all(cycles);
    if (OpCountTransformer.FAILURES.get() > 0) {
      System.err.println("ops: " + OpCountTransformer.FAILURES.get() + " classes could not be instrumented: counts incomplete");
      System.exit(1);
    }
    System.out.print(table(results, cycles));
  }

  /** Every configuration: model only, then with the servo; each level without and with tides. */
  static List<Result> all(int cycles) {
    final List<Result> results = new ArrayList<>();
    for (boolean servo : new boolean[] {false, true}) {
      for (Level l : LEVELS) {
        for (boolean tides : new boolean[] {false, true}) {
          results.add(run(l, tides, servo, cycles));
        }
      }
    }
    return results;
  }

  /**
   * For a caller in another class loader (the pinning test): per configuration its label and
   * the arithmetic per cycle as {mean, median cycle, worst cycle}.
   *
   * @param cycles measured cycles
   * @param labels receives the labels (length 24)
   * @return the counts, one row per label
   */
  public static double[][] summaries(int cycles, String[] labels) {
    final List<Result> results = all(cycles);
    final double[][] out = new double[results.size()][];
    for (int i = 0; i < out.length; i++) {
      final Result r = results.get(i);
      labels[i] = r.label();
      out[i] = new double[] {sum(r.mean(), ARITHMETIC::contains), r.medianTotal(), r.worstTotal()};
    }
    return out;
  }

  static String table(List<Result> results, int cycles) {
    final StringBuilder out = new StringBuilder();
    out.append(String.format(Locale.ROOT, "%nOperations per cycle, instrumented count: mean over %d cycles of 1 s "
        + "(60 s and hourly refreshes amortised), after a 1 h warm-up%n%n", cycles));
    out.append(header("median cycle (arithmetic)"));
    for (Result r : results) {
      out.append(row(r.label(), r.mean(), Long.toString(r.medianTotal())));
    }
    out.append("\nThe worst single cycle (the most arithmetic: the cycle with the hourly refresh)\n\n");
    out.append(header("cycle (s after start)"));
    for (Result r : results) {
      out.append(row(r.label(), r.worst(), Long.toString(r.worstCycle())));
    }
    out.append("\nadd/sub/mul/div/neg: double DADD/DSUB/DMUL/DDIV/DNEG bytecodes executed; cmp: DCMPL/DCMPG; conv:\n"
        + "I2D/L2D/F2D/D2I/D2L/D2F; arithmetic: their sum (float or DREM bytecodes would be added; none ran).\n"
        + "Calls: static calls made by the core's own classes to java.lang.Math, StrictMath and Double (what\n"
        + "those do inside is not counted). Default math mode FAST (java.lang.Math).\n");
    return out.toString();
  }

  private static String header(String extra) {
    return "| configuration | add | sub | mul | div | cmp | neg | conv | arithmetic | " + extra
        + " | sqrt | sin, cos, atan2 | other calls |\n|---|---|---|---|---|---|---|---|---|---|---|---|---|\n";
  }

  private static String row(String label, Map<String, ? extends Number> m, String extra) {
    return String.format(Locale.ROOT, "| %s | %s | %s | %s | %s | %s | %s | %s | %s | %s | %s | %s | %s |%n", label,
        number1(get(m, "add")), number1(get(m, "sub")), number1(get(m, "mul")), number1(get(m, "div")),
        number1(get(m, "cmp")), number1(get(m, "neg")), number1(get(m, "conv")),
        number1(sum(m, ARITHMETIC::contains)), extra, number1(sum(m, OpsRun::isSqrt)), calls(m, true), calls(m, false));
  }

  /** Whole numbers as such, others with one decimal (three significant digits below 1). */
  static String number1(double x) {
    if (x == Math.rint(x)) {
      return String.format(Locale.ROOT, "%.0f", x);
    }
    return x >= 1 ? String.format(Locale.ROOT, "%.1f", x) : String.format(Locale.ROOT, "%.3g", x);
  }
}
