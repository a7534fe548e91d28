package org.eigenzeit.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.apache.spark.api.java.JavaSparkContext;
import org.eigenzeit.ground.campaign.CampaignOutput;
import org.eigenzeit.ground.campaign.CampaignPlan;
import org.eigenzeit.ground.campaign.CodeVersion;
import org.eigenzeit.ground.campaign.LocalRunner;
import org.eigenzeit.ground.campaign.Provenance;
import org.eigenzeit.ground.campaign.RunSpec;
import org.eigenzeit.ground.campaign.RunStore;
import org.eigenzeit.ground.campaign.RunTask;
import org.eigenzeit.ground.pipeline.RunResult;

/**
 * Runs a campaign's runs as Apache Spark tasks, one task per (scenario, seed, level) run. The
 * driver works out which runs are missing or stale (the local runner's rule: same run key, same
 * files), ships each as a {@link RunTask} (the scenario's canonical text, the seed, the hashes),
 * executors run {@link RunTask#execute}, and the driver writes the returned files and assembles
 * the campaign's outputs with the same {@link CampaignOutput#finish} as the local runner: the
 * bytes are the same.
 */
public final class SparkRunner {
  private SparkRunner() {}

  /**
   * What the Spark runner did.
   *
   * @param ran runs executed as tasks
   * @param reused stored runs reused
   * @param results every run's summary in campaign order
   */
  public record Outcome(int ran, int reused, List<RunResult> results) {
    /** Immutable copy. */
    public Outcome {
      results = List.copyOf(results);
    }
  }

  /**
   * Runs the pending runs of the given runs as Spark tasks and writes their files.
   *
   * @param sc the Spark context
   * @param runs the runs
   * @param out the campaign folder (on the driver)
   * @param partitions number of task partitions per batch (0: one per run)
   * @return runs executed
   * @throws IOException on a write failure
   */
  public static int runTasks(JavaSparkContext sc, List<RunSpec> runs, Path out, int partitions) throws IOException {
    Files.createDirectories(out);
    final String fp = CodeVersion.current().fingerprint();
    final List<RunTask> tasks = new ArrayList<>();
    for (RunSpec s : LocalRunner.pending(out, runs, fp, new int[1])) {
      tasks.add(RunTask.of(s, fp));
    }
    if (tasks.isEmpty()) {
      return 0;
    }
    // Batches of 4 x the default parallelism, each one Spark job whose tasks run side by side; the
    // driver writes a batch's outputs in run order. (toLocalIterator, used before, runs one job per
    // partition in turn: no two runs in parallel.) A batch bounds the outputs held on the driver.
    final int batch = Math.max(1, 4 * sc.defaultParallelism());
    for (int from = 0; from < tasks.size(); from += batch) {
      final List<RunTask> part = new ArrayList<>(tasks.subList(from, Math.min(tasks.size(), from + batch)));
      final int slices = partitions > 0 ? Math.min(partitions, part.size()) : part.size();
      for (RunTask.Output o : sc.parallelize(part, slices).map(RunTask::execute).collect()) {
        RunStore.write(out, o);
      }
    }
    return tasks.size();
  }

  /**
   * Runs a whole campaign on Spark and assembles its outputs.
   *
   * @param sc the Spark context
   * @param plan the campaign
   * @param out the campaign folder (on the driver)
   * @param date the outputs' date
   * @param partitions number of task partitions (0: one per run)
   * @return what was done
   * @throws IOException on a write failure or a missing run
   */
  public static Outcome run(JavaSparkContext sc, CampaignPlan plan, Path out, Instant date, int partitions)
      throws IOException {
    Files.createDirectories(out);
    CampaignOutput.writePlan(out, plan, 0, -1);
    final int ran = runTasks(sc, plan.runs(), out, partitions);
    final List<RunResult> results = CampaignOutput.finish(out, plan, Provenance.of(plan, date));
    return new Outcome(ran, plan.runs().size() - ran, results);
  }
}
