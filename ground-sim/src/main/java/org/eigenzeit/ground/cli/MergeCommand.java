package org.eigenzeit.ground.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.campaign.Merge;
import org.eigenzeit.ground.campaign.Provenance;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code eigenzeit merge}: assembles the shards of a campaign. */
@Command(name = "merge", mixinStandardHelpOptions = true,
    header = "Assembles the shards of one campaign into one folder.",
    description = {"Assembles the shard folders of one campaign (each written by 'eigenzeit campaign --seed-from K "
        + "--seed-count N') into one campaign folder: summary.json, inputs, plots and report.html, byte-identical "
        + "to a single run's. The shards must share the plan and the code, and their seed ranges must cover every "
        + "seed exactly once.",
      "",
      "Example:",
      "  eigenzeit merge --out out/all out/shard-0 out/shard-1"},
    sortOptions = false)
final class MergeCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Parameters(arity = "1..*", paramLabel = "SHARD", description = "Shard folders, one or more (required), each written by campaign --seed-from K --seed-count N.")
  List<Path> shards;

  @Option(names = "--out", required = true, paramLabel = "DIR", description = "The merged campaign folder (required).")
  Path out;

  @Option(names = "--json", description = "Print the merged summary.json instead of the table.")
  boolean json;

  @Override
  public Integer call() throws IOException {
    final var results = Merge.merge(out, shards, Provenance.dateNow());
    CampaignCommand.printResults(spec.commandLine().getOut(), results, out, json, null);
    return 0;
  }
}
