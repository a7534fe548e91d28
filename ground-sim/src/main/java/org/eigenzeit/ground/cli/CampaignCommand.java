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
import org.eigenzeit.ground.campaign.Progress;
import org.eigenzeit.ground.campaign.Provenance;
import org.eigenzeit.ground.campaign.RunSpec;
import org.eigenzeit.ground.pipeline.RunResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code eigenzeit campaign}: closed-loop runs of scenario files, many seeds, with a report. */
@Command(name = "campaign", mixinStandardHelpOptions = true,
    header = "Closed-loop runs of scenario files, many seeds.",
    description = {"Runs closed-loop scenarios (YAML files, see docs/campaigns.md) for many Monte-Carlo seeds, in "
        + "parallel on this machine's cores, and writes per-run CSV and JSON, a campaign summary.json with "
        + "provenance, the resolved inputs, plots (PNG and SVG) and report.html into --out. A run already stored "
        + "with the same inputs, code and seed is reused; a changed input runs again. With --seed-from/--seed-count "
        + "it runs one shard of the seeds (any batch system can run the shards); 'eigenzeit merge' then assembles "
        + "them. Progress goes to standard error: a progress bar on a terminal, one summary line otherwise.",
      "",
      "Ephemeris: a run uses the JPL DE405 Sun and Moon when it lies within 1999-12-24 to 2040-01-25, else the "
          + "onboard core's low-precision series (Montenbruck and Gill 2000, section 3.3.2); it never refuses a "
          + "date for that reason (unlike 'eigenzeit budget').",
      "",
      "Example:",
      "  eigenzeit campaign my-mission.yaml --seeds 20 --out out/my-mission"},
    sortOptions = false)
final class CampaignCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Parameters(arity = "1..*", paramLabel = "SCENARIO.yaml", description = "Scenario files, one or more (required); format in docs/campaigns.md.")
  List<Path> files;

  @Option(names = "--seeds", paramLabel = "N",
      description = "Seeds per scenario, 1 to 10000 (default: each file's own 'seeds').")
  Integer seeds;

  @Option(names = "--levels", description = "Also run seed 0 of each scenario at every model level (none, point-mass, j2, full).")
  boolean levels;

  @Option(names = "--out", paramLabel = "DIR", defaultValue = "eigenzeit-out/campaign", description = "Output folder (default ${DEFAULT-VALUE}).")
  Path out;

  @Option(names = "--threads", paramLabel = "N", description = "Worker threads, 1 to 256 (default: all cores).")
  Integer threads;

  @Option(names = "--seed-from", paramLabel = "K",
      description = "Run only seeds K to K+N-1 (a shard; needs --seed-count), 0 to 9999; writes the runs and "
          + "plan.json, no report (default: the whole campaign).")
  Integer seedFrom;

  @Option(names = "--seed-count", paramLabel = "N", description = "Seeds in the shard, 1 to 10000 (with --seed-from; default: the whole campaign).")
  Integer seedCount;

  @Option(names = "--json", description = "Print the campaign's summary.json instead of the table.")
  boolean json;

  @Override
  public Integer call() throws IOException {
    final CommandLine cl = spec.commandLine();
    final int seedsGiven = seeds == null ? 0 : OptionChecks.range(cl, "--seeds", seeds, 1, 10_000);
    final int threadCount = threads == null ? -1 : OptionChecks.range(cl, "--threads", threads, 1, 256);
    if ((seedFrom == null) != (seedCount == null)) {
      throw new CommandLine.ParameterException(cl, "--seed-from and --seed-count: give both or neither, found only "
          + (seedFrom == null ? "--seed-count" : "--seed-from"));
    }
    final long from = seedFrom == null ? -1 : OptionChecks.range(cl, "--seed-from", seedFrom, 0, 9999);
    final long count = seedCount == null ? -1 : OptionChecks.range(cl, "--seed-count", seedCount, 1, 10_000);
    for (Path f : files) {
      if (!Files.isRegularFile(f)) {
        throw new CommandLine.ParameterException(cl, "SCENARIO.yaml: no such file '" + f
            + "', allowed existing scenario files");
      }
    }
    final CampaignPlan plan = CampaignPlan.ofFiles("Eigenzeit campaign", files, seedsGiven, levels);
    return runAndReport(cl.getOut(), plan, out, threadCount, json, from, count);
  }

  static int runAndReport(PrintWriter pw, CampaignPlan plan, Path out, int threads, boolean json, long seedFrom,
      long seedCount) throws IOException {
    Files.createDirectories(out);
    final boolean shard = seedCount > 0;
    final List<RunSpec> runs = shard ? plan.shard(seedFrom, seedCount) : plan.runs();
    CampaignOutput.writePlan(out, plan, shard ? seedFrom : 0, shard ? seedCount : -1);
    final LocalRunner.Counts c = LocalRunner.run(runs, out, Math.max(threads, 0), json ? null : Progress.onStandardError());
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
