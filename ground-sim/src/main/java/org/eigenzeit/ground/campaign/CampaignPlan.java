package org.eigenzeit.ground.campaign;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.eigenzeit.ground.scenario.Scenario;

/**
 * What a campaign runs, in a fixed order: for each scenario its seeds 0 .. n-1, then (for the
 * scenarios chosen for it) seed 0 at every model level. Every runner and the merge step use this
 * order, so their outputs are byte-identical.
 *
 * @param title the report's title
 * @param entries the scenarios with their origins and options
 */
public record CampaignPlan(String title, List<Entry> entries) {

  /**
   * One scenario of a campaign.
   *
   * @param scenario the resolved scenario
   * @param origin where it came from (a path, or "built-in demo NAME.yaml")
   * @param builtIn true for the built-in demo missions (invented), false for the user's
   * @param seeds its number of seeds
   * @param levels true to add seed 0 at every model level
   */
  public record Entry(Scenario scenario, String origin, boolean builtIn, int seeds, boolean levels) {}

  /**
   * Checks the plan: two scenarios may not share a name (their runs would share folders).
   *
   * @throws IllegalArgumentException naming both origins
   */
  public CampaignPlan {
    entries = List.copyOf(entries);
    final Map<String, String> seen = new LinkedHashMap<>();
    for (Entry e : entries) {
      final String before = seen.putIfAbsent(e.scenario().name(), e.origin());
      if (before != null) {
        throw new IllegalArgumentException("two scenarios are named '" + e.scenario().name() + "': " + before + " and "
            + e.origin() + "; give each scenario its own name");
      }
      if (e.seeds() < 1) {
        throw new IllegalArgumentException(e.origin() + ": a campaign needs at least one seed per scenario");
      }
    }
  }

  /**
   * Builds a plan.
   *
   * @param title the report's title
   * @param scenarios scenarios with origins (an entry's seeds: 0 for its file's own)
   * @param seedsOverride seeds for all (0: each scenario's own)
   * @param levels add the model-level comparison for every scenario
   * @return the plan
   */
  public static CampaignPlan of(String title, List<Entry> scenarios, int seedsOverride, boolean levels) {
    final List<Entry> out = new ArrayList<>();
    for (Entry e : scenarios) {
      out.add(new Entry(e.scenario(), e.origin(), e.builtIn(),
          seedsOverride > 0 ? seedsOverride : e.seeds() > 0 ? e.seeds() : e.scenario().timing().seeds(),
          e.levels() || levels));
    }
    return new CampaignPlan(title, out);
  }

  /**
   * A plan of scenario files supplied by the user.
   *
   * @param title the report's title
   * @param files the scenario files
   * @param seedsOverride seeds for all (0: each file's own)
   * @param levels add the model-level comparison for every scenario
   * @return the plan
   * @throws java.io.IOException when a file cannot be read
   */
  public static CampaignPlan ofFiles(String title, List<java.nio.file.Path> files, int seedsOverride, boolean levels)
      throws java.io.IOException {
    final List<Entry> entries = new ArrayList<>();
    for (java.nio.file.Path f : files) {
      if (!java.nio.file.Files.isRegularFile(f)) {
        throw new IllegalArgumentException(f + ": no such scenario file");
      }
      entries.add(new Entry(org.eigenzeit.ground.scenario.ScenarioReader.read(f), f.toString(), false, 0, false));
    }
    return of(title, entries, seedsOverride, levels);
  }

  /** @return every run in campaign order */
  public List<RunSpec> runs() {
    final List<RunSpec> runs = new ArrayList<>();
    for (Entry e : entries) {
      for (long k = 0; k < e.seeds(); k++) {
        runs.add(new RunSpec(e.scenario(), k, false));
      }
    }
    for (Entry e : entries) {
      if (e.levels()) {
        for (String l : Scenario.LEVELS) {
          runs.add(new RunSpec(e.scenario().withLevel(l), 0, true));
        }
      }
    }
    return runs;
  }

  /**
   * The runs of one shard: seeds {@code from} .. {@code from + count - 1} of every scenario, and the
   * model-level comparison runs (seed 0) in the shard that holds seed 0.
   *
   * @param from first seed
   * @param count number of seeds
   * @return the shard's runs in campaign order
   */
  public List<RunSpec> shard(long from, long count) {
    final List<RunSpec> out = new ArrayList<>();
    for (RunSpec r : runs()) {
      if (r.seed() >= from && r.seed() < from + count) {
        out.add(r);
      }
    }
    return out;
  }
}
