package org.eigenzeit.spark;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.eigenzeit.ground.campaign.CampaignPlan;
import org.eigenzeit.ground.campaign.LocalRunner;
import org.eigenzeit.ground.campaign.RunSpec;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.ScenarioReader;

/**
 * The scaling harness (docs/campaigns.md, run by {@code scripts/campaign-scaling.sh}): wall time
 * of N runs of the MEO demo mission (shortened to a given span) through the local runner on 1 and
 * 2 threads and through Spark in local[1] and local[2], each after one warm-up campaign, into a
 * fresh folder each time. Prints a Markdown table with the speed-up on 2 cores and the overhead
 * per task of Spark against the local runner. Speed is measured here, never asserted in a test.
 */
public final class Scaling {
  private Scaling() {}

  /**
   * Runs the harness.
   *
   * @param args span in hours, then run counts (e.g. {@code 6 4 8 16})
   * @throws IOException on a write failure
   */
  public static void main(String[] args) throws IOException {
    final double spanH = args.length > 0 ? Double.parseDouble(args[0]) : 6;
    final List<Integer> counts = new ArrayList<>();
    for (int i = 1; i < args.length; i++) {
      counts.add(Integer.parseInt(args[i]));
    }
    if (counts.isEmpty()) {
      counts.addAll(List.of(4, 8, 16));
    }
    final Scenario base;
    try (InputStream in = Scaling.class.getResourceAsStream("/org/eigenzeit/ground/demo/tamberlode-meo.yaml")) {
      base = ScenarioReader.parse("tamberlode-meo.yaml", in).shortenedTo(spanH);
    }
    final Path tmp = Files.createTempDirectory("eigenzeit-scaling");
    System.out.printf(Locale.ROOT, "Scaling: tamberlode-meo at %s h per run, %d processors, %s%n", spanH,
        Runtime.getRuntime().availableProcessors(), Runtime.version());
    System.out.println("| runs | local 1 thread (s) | local 2 threads (s) | speed-up | Spark local[1] (s) | Spark local[2] (s)"
        + " | speed-up | Spark overhead per task (s) |");
    System.out.println("|---|---|---|---|---|---|---|---|");
    timeLocal(base, 2, 1, tmp);
    timeLocal(base, 2, 2, tmp);
    for (int n : counts) {
      final double l1 = timeLocal(base, n, 1, tmp);
      final double l2 = timeLocal(base, n, 2, tmp);
      final double s1 = timeSpark(base, n, 1, tmp);
      final double s2 = timeSpark(base, n, 2, tmp);
      System.out.printf(Locale.ROOT, "| %d | %.2f | %.2f | %.2f | %.2f | %.2f | %.2f | %.3f |%n", n, l1, l2, l1 / l2, s1, s2,
          s1 / s2, (s1 - l1) / n);
    }
    delete(tmp);
  }

  private static List<RunSpec> runs(Scenario s, int n) {
    return CampaignPlan.of("scaling", List.of(new CampaignPlan.Entry(s, "scaling", true, n, false)), 0, false).runs();
  }

  private static double timeLocal(Scenario s, int n, int threads, Path tmp) throws IOException {
    final Path out = Files.createTempDirectory(tmp, "local");
    final long t0 = System.nanoTime();
    LocalRunner.run(runs(s, n), out, threads, null);
    return (System.nanoTime() - t0) / 1e9;
  }

  private static double timeSpark(Scenario s, int n, int cores, Path tmp) throws IOException {
    final SparkConf conf = new SparkConf().setMaster("local[" + cores + "]").setAppName("eigenzeit-scaling")
        .set("spark.driver.bindAddress", "127.0.0.1").set("spark.driver.host", "127.0.0.1").set("spark.ui.enabled", "false");
    try (JavaSparkContext sc = new JavaSparkContext(conf)) {
      SparkRunner.runTasks(sc, runs(s, 2), Files.createTempDirectory(tmp, "warm"), 0);
      final Path out = Files.createTempDirectory(tmp, "spark");
      final long t0 = System.nanoTime();
      SparkRunner.runTasks(sc, runs(s, n), out, 0);
      return (System.nanoTime() - t0) / 1e9;
    }
  }

  private static void delete(Path dir) throws IOException {
    try (Stream<Path> s = Files.walk(dir)) {
      for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
        Files.delete(p);
      }
    }
  }
}
