package org.eigenzeit.ground.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.campaign.Campaign;
import org.eigenzeit.ground.campaign.Scenario;
import org.eigenzeit.ground.loop.RunResult;
import org.eigenzeit.ground.report.HtmlReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code eigenzeit campaign}: closed-loop runs of scenario files, many seeds, with a report. */
@Command(name = "campaign", mixinStandardHelpOptions = true,
    description = {"Runs closed-loop scenarios (YAML files, see docs/campaigns.md) for many Monte-Carlo seeds,",
      "in parallel on all cores, resumable (finished runs are skipped), and writes per-run CSV and",
      "JSON, a campaign summary.json, plots (PNG and SVG) and report.html into --out.",
      "",
      "Example: eigenzeit campaign my-mission.yaml --seeds 20 --out out/my-mission"},
    sortOptions = false)
final class CampaignCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Parameters(arity = "1..*", paramLabel = "SCENARIO.yaml", description = "Scenario files.")
  List<Path> files;

  @Option(names = "--seeds", paramLabel = "N",
      description = "Seeds per scenario, 1 to 100000 (default: each file's own 'seeds').")
  Integer seeds;

  @Option(names = "--levels", description = "Also run seed 0 of each scenario at every model level (none, point-mass, j2, full).")
  boolean levels;

  @Option(names = "--out", defaultValue = "eigenzeit-out/campaign", description = "Output folder (default ${DEFAULT-VALUE}).")
  Path out;

  @Option(names = "--threads", paramLabel = "N", description = "Worker threads, 1 to 256 (default: all cores).")
  Integer threads;

  @Option(names = "--json", description = "Print the campaign summary as JSON instead of the table.")
  boolean json;

  @Override
  public Integer call() throws IOException {
    final int seedCount = seeds == null ? 0 : OptionChecks.range(spec.commandLine(), "--seeds", seeds, 1, 100_000);
    final int threadCount = threads == null ? 0 : OptionChecks.range(spec.commandLine(), "--threads", threads, 1, 256);
    final List<Scenario> scenarios = new ArrayList<>();
    for (Path f : files) {
      if (!Files.isRegularFile(f)) {
        throw new picocli.CommandLine.ParameterException(spec.commandLine(), "SCENARIO.yaml: no such file '" + f
            + "', allowed existing scenario files");
      }
      scenarios.add(Scenario.read(f));
    }
    return runAndReport(spec.commandLine().getOut(), scenarios, seedCount, levels, out, threadCount, json,
        "Eigenzeit campaign", null);
  }

  static int runAndReport(PrintWriter pw, List<Scenario> scenarios, int seeds, boolean levels, Path out, int threads,
      boolean json, String title, Scenario levelScenario) throws IOException {
    final List<Campaign.Job> jobs = new ArrayList<>(Campaign.jobs(scenarios, seeds));
    for (Scenario s : scenarios) {
      if (levels || s == levelScenario) {
        for (String l : List.of("none", "point-mass", "j2", "full")) {
          jobs.add(new Campaign.Job(s.atLevel(l), 0));
        }
      }
    }
    final List<RunResult> results = Campaign.run(jobs, out, threads, json ? null : System.err);
    final List<HtmlReport.RunData> data = new ArrayList<>();
    for (int i = 0; i < jobs.size(); i++) {
      final double[][] series = HtmlReport.readSeries(Campaign.runDir(out, jobs.get(i)).resolve("timeseries.csv"));
      data.add(new HtmlReport.RunData(results.get(i), series[0], series[1]));
    }
    final Path report = HtmlReport.write(out, data, title);
    if (json) {
      pw.println(Files.readString(out.resolve("summary.json")));
    } else {
      pw.printf(Locale.ROOT, "%-28s %-10s %5s %10s %12s %12s %10s%n", "scenario", "level", "seed", "settle s",
          "RMS err ns", "max err ns", "faults");
      for (RunResult r : results) {
        pw.printf(Locale.ROOT, "%-28s %-10s %5d %10.0f %12.3f %12.3f %10d%n", r.scenario(), r.modelLevel(), r.seed(),
            r.settleTimeS(), r.rmsTimeErrorNs(), r.maxAbsTimeErrorNs(),
            r.faults().values().stream().mapToInt(Integer::intValue).sum());
      }
      pw.println("Report: " + report);
      pw.println(Caution.TEXT);
    }
    pw.flush();
    return 0;
  }
}
