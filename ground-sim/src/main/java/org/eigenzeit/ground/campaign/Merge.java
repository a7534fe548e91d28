package org.eigenzeit.ground.campaign;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.pipeline.RunResult;

/**
 * Merges the shards of a campaign (each made with {@code --seed-from/--seed-count}, on any batch
 * system) into one campaign folder whose files are byte-identical to a single run's: the shards
 * must hold the same plan and code, their seed ranges must not overlap and must cover every seed,
 * and every run must be finished and current.
 */
public final class Merge {
  private Merge() {}

  /**
   * Merges shard folders.
   *
   * @param out the merged campaign folder
   * @param shards the shard folders
   * @param date the merged outputs' date (see {@link Provenance#dateNow()})
   * @return every run's summary in campaign order
   * @throws IOException when the shards do not make one campaign
   */
  public static List<RunResult> merge(Path out, List<Path> shards, java.time.Instant date)
      throws IOException {
    if (shards.isEmpty()) {
      throw new IOException("merge needs at least one shard folder");
    }
    final PlanFile first = PlanFile.read(shards.get(0));
    final List<long[]> ranges = new ArrayList<>();
    for (Path s : shards) {
      final PlanFile p = PlanFile.read(s);
      if (!p.entries().equals(first.entries()) || !p.title().equals(first.title())) {
        throw new IOException(s + ": its plan (scenarios, seeds or levels) differs from " + shards.get(0)
            + "'s; shards of one campaign share one plan");
      }
      final long from = p.holdsShard() ? p.seedFrom() : 0;
      final long to = p.holdsShard() ? p.seedFrom() + p.seedCount() : Long.MAX_VALUE;
      for (int i = 0; i < ranges.size(); i++) {
        if (from < ranges.get(i)[1] && ranges.get(i)[0] < to) {
          throw new IOException(s + ": its seeds " + from + " .. " + (to - 1) + " overlap those of " + shards.get(i));
        }
      }
      ranges.add(new long[] {from, to});
    }
    final CampaignPlan plan = first.plan();
    final String fp = CodeVersion.current().fingerprint();
    for (RunSpec spec : plan.runs()) {
      Path from = null;
      for (int i = 0; i < shards.size(); i++) {
        if (spec.seed() >= ranges.get(i)[0] && spec.seed() < ranges.get(i)[1]) {
          from = shards.get(i);
        }
      }
      if (from == null) {
        throw new IOException("no shard holds seed " + spec.seed() + " of " + spec.runName()
            + ": the shards' seed ranges leave a hole");
      }
      RunStore.read(from, spec, spec.key(fp));
      if (!from.toAbsolutePath().normalize().equals(out.toAbsolutePath().normalize())) {
        final Path dst = out.resolve(spec.folder());
        Files.createDirectories(dst);
        for (String f : List.of("timeseries.csv", "summary.json")) {
          Files.copy(from.resolve(spec.folder()).resolve(f), dst.resolve(f), StandardCopyOption.REPLACE_EXISTING);
        }
      }
    }
    return CampaignOutput.finish(out, plan, Provenance.of(plan, date));
  }
}
