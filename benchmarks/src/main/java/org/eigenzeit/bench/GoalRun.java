package org.eigenzeit.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import org.openjdk.jmh.infra.BenchmarkParams;
import org.openjdk.jmh.profile.GCProfiler;
import org.openjdk.jmh.results.Result;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.ChainedOptionsBuilder;
import org.openjdk.jmh.runner.options.OptionsBuilder;

/**
 * Runs the benchmarks behind the performance goals (several forks, with the GC profiler) and
 * prints each goal with the measured median, JMH's score and 99.9 % error, the spread of the
 * forks and a verdict. Usage: {@code java -cp benchmarks.jar org.eigenzeit.bench.GoalRun [forks]
 * [output.md]} (scripts/benchmarks.sh runs it pinned to one processor).
 *
 * <p>Verdicts: MET when the score plus its error is within the goal; MET (MEDIAN) when the median
 * is within the goal but the error band crosses it; MISSED otherwise.
 */
public final class GoalRun {
  private GoalRun() {}

  /** One goal: a benchmark (method and level) and its bound. */
  private record Goal(String text, String method, String level, double boundNs) {}

  private static final List<Goal> GOALS = List.of(
      new Goal("J2-level cycle <= 50 ns", "CoreCycleBenchmark.modelCycle", "j2", 50.0),
      new Goal("full cycle (degree 4 + tides + servo) <= 250 ns", "CoreCycleBenchmark.servoCycle",
          "deg4-tides", 250.0),
      new Goal("degree-36 cycle <= 5 us", "CoreCycleBenchmark.modelCycle", "deg36", 5000.0));

  /**
   * Runs the goal benchmarks.
   *
   * @param args optional number of forks (default 5) and an output file for the table
   * @throws RunnerException if JMH fails
   * @throws IOException if the table cannot be written
   */
  public static void main(String[] args) throws RunnerException, IOException {
    final int forks = args.length > 0 ? Integer.parseInt(args[0]) : 5;
    final List<RunResult> results = new ArrayList<>();
    for (Goal g : GOALS) {
      results.addAll(run(new OptionsBuilder().include("org.eigenzeit.bench." + g.method() + "$")
          .param("level", g.level()), forks));
    }
    results.addAll(run(new OptionsBuilder().include("org.eigenzeit.bench.FloorBenchmark"), forks));

    final RunResult floor = find(results, "FloorBenchmark.keplerianTerms", null);
    final double floorMedian = median(floor);
    final StringBuilder out = new StringBuilder();
    out.append(String.format(Locale.ROOT, "%nPerformance goals (%d forks; ns per operation)%n%n", forks));
    out.append("| goal | median | score +- 99.9 % error | fork means | ratio to floor | B/op | verdict |\n");
    out.append("|---|---|---|---|---|---|---|\n");
    double j2Median = Double.NaN;
    for (Goal g : GOALS) {
      final RunResult r = find(results, g.method(), g.level());
      final double median = median(r);
      if ("j2".equals(g.level())) {
        j2Median = median;
      }
      final Result<?> p = r.getPrimaryResult();
      final double upper = p.getScore() + p.getScoreError();
      final String verdict = upper <= g.boundNs() ? "MET" : median <= g.boundNs() ? "MET (MEDIAN)" : "MISSED";
      out.append(String.format(Locale.ROOT, "| %s | %.1f | %.1f +- %.1f | %s | %.1f | %s | %s |%n", g.text(), median,
          p.getScore(), p.getScoreError(), forkMeans(r), median / floorMedian, allocation(r), verdict));
    }
    final double ratio = j2Median / floorMedian;
    out.append(String.format(Locale.ROOT, "| J2 level <= 10 x floor | %.2f x | floor %.2f +- %.2f | %s | %.2f | %s | %s |%n",
        ratio, floor.getPrimaryResult().getScore(), floor.getPrimaryResult().getScoreError(), forkMeans(floor), ratio,
        allocation(floor), ratio <= 10.0 ? "MET" : "MISSED"));
    out.append(String.format(Locale.ROOT, "%nfloor median %.2f ns; %s%n", floorMedian, machine()));
    System.out.print(out);
    if (args.length > 1) {
      Files.writeString(Path.of(args[1]), out.toString(), StandardCharsets.UTF_8);
    }
  }

  private static Collection<RunResult> run(ChainedOptionsBuilder opts, int forks) throws RunnerException {
    return new Runner(opts.forks(forks).addProfiler(GCProfiler.class).build()).run();
  }

  private static RunResult find(Collection<RunResult> results, String method, String level) {
    for (RunResult r : results) {
      final BenchmarkParams p = r.getParams();
      if (p.getBenchmark().endsWith(method) && (level == null || level.equals(p.getParam("level")))) {
        return r;
      }
    }
    throw new IllegalStateException("no result for " + method + " " + level);
  }

  private static double median(RunResult r) {
    return r.getPrimaryResult().getStatistics().getPercentile(50.0);
  }

  /** Mean of each fork (benchmark results in fork order), showing a fork that settled slower. */
  private static String forkMeans(RunResult r) {
    final List<String> means = new ArrayList<>();
    r.getBenchmarkResults().forEach(b -> means.add(String.format(Locale.ROOT, "%.1f", b.getPrimaryResult().getScore())));
    return String.join(" ", means);
  }

  private static String allocation(RunResult r) {
    final Result<?> a = r.getSecondaryResults().get("gc.alloc.rate.norm");
    return a == null ? "n/a" : String.format(Locale.ROOT, "%.4f", a.getScore());
  }

  private static String machine() {
    return String.format(Locale.ROOT, "%s %s, %d processors visible to the JVM that printed this",
        System.getProperty("java.vm.name"), System.getProperty("java.version"),
        Runtime.getRuntime().availableProcessors());
  }
}
