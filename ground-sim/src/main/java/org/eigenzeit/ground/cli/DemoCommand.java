package org.eigenzeit.ground.cli;

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
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code eigenzeit demo}: the built-in demo missions. */
@Command(name = "demo", mixinStandardHelpOptions = true,
    description = {"Runs the built-in demo missions (invented: a LEO smallsat, a MEO navigation",
      "satellite, an eccentric orbit, a GEO payload and a lunar orbiter): the relativistic budget of",
      "each orbit from the onboard core and from the ground reference, written to --out."},
    sortOptions = false)
final class DemoCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Option(names = "--out", defaultValue = "eigenzeit-out/demo", description = "Output folder (default ${DEFAULT-VALUE}).")
  Path out;

  @Option(names = "--span-h", defaultValue = "24", description = "Span of each budget, hours (default ${DEFAULT-VALUE}).")
  double spanH;

  @Option(names = "--json", description = "Print the JSON summary instead of the tables.")
  boolean json;

  @Override
  public Integer call() throws Exception {
    final PrintWriter pw = spec.commandLine().getOut();
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
      pw.println(Caution.TEXT);
    }
    pw.flush();
    return 0;
  }
}
