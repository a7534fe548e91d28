package org.eigenzeit.ground.cli;

import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.budget.BudgetAnalysis;
import org.eigenzeit.ground.budget.BudgetResult;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.ground.campaign.CampaignPlan;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.ScenarioReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code eigenzeit demo}: the built-in demo missions. */
@Command(name = "demo", mixinStandardHelpOptions = true,
    header = "Runs the invented demo missions, writes a report.",
    description = {"Runs the built-in demo missions (invented: a LEO smallsat with a quartz oscillator, a MEO "
        + "navigation satellite with a rubidium clock, an eccentric orbit with a passive maser, a GEO time-transfer "
        + "payload, a lunar orbiter and a polar LEO maser clock coasting through a 12 h gap): the relativistic budget "
        + "of each orbit (onboard core against ground reference), then the closed loop for --seeds seeds each, the "
        + "MEO and the polar missions at every model level, each judged against its (invented) timing budget; "
        + "writes budgets.json, the campaign files and report.html into --out."},
    sortOptions = false)
final class DemoCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Option(names = "--out", paramLabel = "DIR", defaultValue = "eigenzeit-out/demo", description = "Output folder (default ${DEFAULT-VALUE}).")
  Path out;

  @Option(names = "--span-h", defaultValue = "24", paramLabel = "HOURS",
      description = "Span of each budget and closed-loop run, hours, 0.1 to 240; a shorter span drops outages that would "
          + "start after the end and cuts the budgets' deadlines (default ${DEFAULT-VALUE}).")
  double spanH;

  @Option(names = "--json", description = "Print the JSON summaries instead of the tables.")
  boolean json;

  @Option(names = "--no-loop", description = "Only the budgets, no closed loop.")
  boolean noLoop;

  @Option(names = "--seeds", defaultValue = "2", paramLabel = "N",
      description = "Closed-loop seeds per mission, 1 to 100 (default ${DEFAULT-VALUE}).")
  int seeds;

  @Override
  public Integer call() throws Exception {
    final PrintWriter pw = spec.commandLine().getOut();
    OptionChecks.range(spec.commandLine(), "--span-h", spanH, 0.1, 240);
    OptionChecks.range(spec.commandLine(), "--seeds", seeds, 1, 100);
    Files.createDirectories(out);
    final SplitTime t0 = Epochs.parse("2026-10-01T00:00:00", "TT");
    final List<BudgetResult> results = new ArrayList<>();
    for (DemoScenarios.Demo d : DemoScenarios.all()) {
      final BudgetResult r = BudgetAnalysis.analyse(d.name(), d.orbit(), t0, spanH * 3600, 10.0, 0);
      results.add(r);
      if (!json) {
        pw.println(d.story());
        BudgetCommand.printTable(pw, r);
        pw.println();
        pw.flush();
      }
    }
    final String text = BudgetCommand.mapper().writeValueAsString(results);
    Files.writeString(out.resolve("budgets.json"), text, StandardCharsets.UTF_8);
    if (json) {
      pw.println(text);
    } else {
      pw.println("Wrote " + out.resolve("budgets.json"));
    }
    pw.flush();
    if (noLoop) {
      if (!json) {
        pw.println(Caution.TEXT);
      }
      return 0;
    }
    final List<CampaignPlan.Entry> entries = new ArrayList<>();
    for (DemoScenarios.Demo d : DemoScenarios.all()) {
      try (InputStream in = DemoCommand.class.getResourceAsStream("/org/eigenzeit/ground/demo/" + d.name() + ".yaml")) {
        final Scenario s = ScenarioReader.parse(d.name() + ".yaml", in);
        entries.add(new CampaignPlan.Entry(spanH < 24 ? s.shortenedTo(spanH) : s, "built-in demo " + d.name() + ".yaml",
            true, 0, d.levels()));
      }
    }
    if (!json) {
      pw.println();
      pw.println("Closed loop: " + entries.size() + " missions x " + seeds + " seeds, and "
          + String.join(", ", DemoScenarios.levelMissions()) + " at every model level");
      pw.flush();
    }
    final CampaignPlan plan = CampaignPlan.of("Eigenzeit demo missions", entries, seeds, false);
    return CampaignCommand.runAndReport(pw, plan, out, -1, json, -1, -1);
  }
}
