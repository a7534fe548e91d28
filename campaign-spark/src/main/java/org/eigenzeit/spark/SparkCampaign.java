package org.eigenzeit.spark;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.eigenzeit.ground.campaign.CampaignPlan;
import org.eigenzeit.ground.campaign.CampaignSummary;
import org.eigenzeit.ground.campaign.Provenance;
import org.eigenzeit.ground.pipeline.RunResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The job's entry point for {@code spark-submit} (docs/campaigns.md): the options of {@code
 * eigenzeit campaign}, the runs executed as Spark tasks, the same output folder.
 */
@Command(name = "eigenzeit-spark-campaign", mixinStandardHelpOptions = true,
    description = {"Runs closed-loop scenarios as Apache Spark tasks (one per scenario, seed and level) and",
      "writes the outputs of 'eigenzeit campaign' (byte-identical for the same inputs) into --out on the driver."},
    sortOptions = false)
public final class SparkCampaign implements Callable<Integer> {
  @Parameters(arity = "1..*", paramLabel = "SCENARIO.yaml", description = "Scenario files (readable on the driver).")
  List<Path> files;

  @Option(names = "--seeds", defaultValue = "0", description = "Seeds per scenario, 1 .. 10000 (default: the file's own).")
  int seeds;

  @Option(names = "--levels", description = "Also run seed 0 of each scenario at every model level.")
  boolean levels;

  @Option(names = "--out", required = true, description = "Output folder on the driver.")
  Path out;

  @Option(names = "--partitions", defaultValue = "0", description = "Task partitions (default: one per run).")
  int partitions;

  @Option(names = "--master", description = "Spark master for a run without spark-submit, e.g. local[2].")
  String master;

  /**
   * Runs the job.
   *
   * @param args the arguments
   */
  public static void main(String[] args) {
    final CommandLine cl = new CommandLine(new SparkCampaign());
    cl.setExecutionExceptionHandler((ex, c, parsed) -> {
      c.getErr().println("eigenzeit-spark-campaign: " + ex.getMessage());
      return 1;
    });
    System.exit(cl.execute(args));
  }

  @Override
  public Integer call() throws Exception {
    if (seeds < 0 || seeds > 10_000 || partitions < 0) {
      throw new IllegalArgumentException("--seeds: out of range, found " + seeds + ", allowed 1 .. 10000; --partitions >= 0");
    }
    final CampaignPlan plan = CampaignPlan.ofFiles("Eigenzeit campaign", files, seeds, levels);
    final SparkConf conf = new SparkConf().setAppName("eigenzeit-campaign");
    if (master != null) {
      conf.setMaster(master).set("spark.driver.bindAddress", "127.0.0.1").set("spark.driver.host", "127.0.0.1")
          .set("spark.ui.enabled", "false");
    }
    try (JavaSparkContext sc = new JavaSparkContext(conf)) {
      final SparkRunner.Outcome o = SparkRunner.run(sc, plan, out, Provenance.dateNow(), partitions);
      System.out.printf(Locale.ROOT, "%d runs: %d ran as Spark tasks, %d reused%n", o.results().size(), o.ran(), o.reused());
      for (RunResult r : o.results()) {
        System.out.printf(Locale.ROOT, "%-28s %-10s %5d %12.3f ns RMS%n", r.scenario(), r.modelLevel(), r.seed(),
            r.rmsTimeErrorNs());
      }
      System.out.println("Report: " + out.resolve("report.html"));
      System.out.println("CAUTION: " + CampaignSummary.CAUTION);
    }
    return 0;
  }
}
