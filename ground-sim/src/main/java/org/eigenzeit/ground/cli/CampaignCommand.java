package org.eigenzeit.ground.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.campaign.CampaignOutput;
import org.eigenzeit.ground.campaign.CampaignPlan;
import org.eigenzeit.ground.campaign.LocalRunner;
import org.eigenzeit.ground.campaign.Provenance;
import org.eigenzeit.ground.campaign.RunSpec;
import org.eigenzeit.ground.pipeline.RunResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code eigenzeit campaign}: closed-loop runs of scenario files, many seeds, with a report. */
@Command(name = "campaign", mixinStandardHelpOptions = true,
    description = {"Runs closed-loop scenarios (YAML files, see docs/campaigns.md) for many Monte-Carlo seeds,",
      "in parallel on this machine's cores, and writes per-run CSV and JSON, a campaign summary.json",
      "with provenance, the resolved inputs, plots (PNG and SVG) and report.html into --out. A run",
      "already stored with the same inputs, code and seed is reused; a changed input runs again.",
      "With --seed-from/--seed-count it runs one shard of the seeds (any batch system can run the",
      "shards); 'eigenzeit merge' then assembles them.",
      "",
      "Example: eigenzeit campaign my-mission.yaml --seeds 20 --out out/my-mission"},
    sortOptions = false)
final class CampaignCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Parameters(arity = "1..*", paramLabel = "SCENARIO.yaml", description = "Scenario files.")
  List<Path> files;

  @Option(names = "--seeds", defaultValue = "0", description = "Seeds per scenario, 1 .. 10000 (default: the file's own 'seeds').")
  int seeds;

  @Option(names = "--levels", description = "Also run seed 0 of each scenario at every model level (none, point-mass, j2, full).")
  boolean levels;

  @Option(names = "--out", defaultValue = "eigenzeit-out/campaign", description = "Output folder (default ${DEFAULT-VALUE}).")
  Path out;

  @Option(names = "--threads", defaultValue = "-1", description = "Worker threads, 1 .. 1024 (default: all cores).")
  int threads;

  @Option(names = "--seed-from", defaultValue = "-1", paramLabel = "K",
      description = "Run only seeds K .. K+N-1 (a shard; needs --seed-count), 0 .. 9999.")
  long seedFrom;

  @Option(names = "--seed-count", defaultValue = "-1", paramLabel = "N", description = "Seeds in the shard, 1 .. 10000.")
  long seedCount;

  @Option(names = "--json", description = "Print the campaign's summary.json instead of the table.")
  boolean json;

  @Override
  public Integer call() throws IOException {
    Options.check(seeds == 0 || (seeds >= 1 && seeds <= 10_000), "--seeds", Integer.toString(seeds), "1 .. 10000");
    Options.check(threads == -1 || (threads >= 1 && threads <= 1024), "--threads", Integer.toString(threads), "1 .. 1024");
    final boolean noShard = seedFrom == -1 && seedCount == -1;
    final boolean shard = seedFrom >= 0 && seedFrom <= 9999 && seedCount >= 1 && seedCount <= 10_000;
    Options.check(noShard || shard, "--seed-from/--seed-count", seedFrom + "/" + seedCount,
        "both together, --seed-from 0 .. 9999 and --seed-count 1 .. 10000");
    final CampaignPlan plan = CampaignPlan.ofFiles("Eigenzeit campaign", files, seeds, levels);
    return runAndReport(spec.commandLine().getOut(), plan, out, threads, json, seedFrom, seedCount);
  }

  static int runAndReport(PrintWriter pw, CampaignPlan plan, Path out, int threads, boolean json, long seedFrom,
      long seedCount) throws IOException {
    Files.createDirectories(out);
    final boolean shard = seedCount > 0;
    final List<RunSpec> runs = shard ? plan.shard(seedFrom, seedCount) : plan.runs();
    CampaignOutput.writePlan(out, plan, shard ? seedFrom : 0, shard ? seedCount : -1);
    final LocalRunner.Counts c = LocalRunner.run(runs, out, Math.max(threads, 0), json ? null : System.err);
    if (shard) {
      pw.printf(Locale.ROOT, "Shard: seeds %d .. %d, %d runs (%d reused, %d re-run after a change) in %s%n", seedFrom,
          seedFrom + seedCount - 1, runs.size(), c.reused(), c.stale(), out);
      pw.println("Assemble the shards with: eigenzeit merge --out FOLDER SHARD-FOLDER...");
      pw.flush();
      return 0;
    }
    final List<RunResult> results = CampaignOutput.finish(out, plan, Provenance.of(plan, Provenance.dateNow()));
    printResults(pw, results, out, json, c);
    return 0;
  }

  static void printResults(PrintWriter pw, List<RunResult> results, Path out, boolean json, LocalRunner.Counts c)
      throws IOException {
    if (json) {
      pw.print(Files.readString(out.resolve("summary.json"), StandardCharsets.UTF_8));
    } else {
      if (c != null) {
        pw.printf(Locale.ROOT, "%d runs: %d ran (%d of them re-run after a change of inputs or code), %d reused%n",
            c.ran() + c.reused(), c.ran(), c.stale(), c.reused());
      }
      pw.printf(Locale.ROOT, "%-28s %-10s %5s %10s %12s %12s %10s%n", "scenario", "level", "seed", "settle s",
          "RMS err ns", "max err ns", "faults");
      for (RunResult r : results) {
        pw.printf(Locale.ROOT, "%-28s %-10s %5d %10.0f %12.3f %12.3f %10d%n", r.scenario(), r.modelLevel(), r.seed(),
            r.settleTimeS(), r.rmsTimeErrorNs(), r.maxAbsTimeErrorNs(),
            r.faults().values().stream().mapToInt(Integer::intValue).sum());
      }
      pw.println("Report: " + out.resolve("report.html"));
      pw.println(Caution.TEXT);
    }
    pw.flush();
  }
}
