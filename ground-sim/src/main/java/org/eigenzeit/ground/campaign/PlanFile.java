package org.eigenzeit.ground.campaign;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.scenario.ScenarioReader;

/**
 * {@code plan.json} of a campaign folder: the plan (each scenario's canonical form, origin, seeds,
 * model-level comparison) and, for a shard, its seed range. The merge step rebuilds the campaign
 * from it.
 *
 * @param format "eigenzeit-plan-1"
 * @param title the report's title
 * @param entries the scenarios
 * @param seedFrom first seed of a shard (0 for a whole campaign)
 * @param seedCount seeds of a shard (-1 for a whole campaign)
 */
public record PlanFile(String format, String title, List<PlanEntry> entries, long seedFrom, long seedCount) {
  static final String FORMAT = "eigenzeit-plan-1";

  /**
   * One scenario of the plan.
   *
   * @param origin where it came from
   * @param builtIn a built-in demo mission
   * @param seeds its seeds
   * @param levels with the model-level comparison
   * @param canonicalYaml its canonical form
   */
  public record PlanEntry(String origin, boolean builtIn, int seeds, boolean levels, String canonicalYaml) {}

  /** Immutable copy. */
  public PlanFile {
    entries = List.copyOf(entries);
  }

  /** @return true when this folder holds one shard of a campaign */
  public boolean holdsShard() {
    return seedCount >= 0;
  }

  static PlanFile of(CampaignPlan plan, long seedFrom, long seedCount) {
    final List<PlanEntry> l = new ArrayList<>();
    for (CampaignPlan.Entry e : plan.entries()) {
      l.add(new PlanEntry(e.origin(), e.builtIn(), e.seeds(), e.levels(), e.scenario().canonicalYaml()));
    }
    return new PlanFile(FORMAT, plan.title(), l, seedFrom, seedCount);
  }

  /**
   * The campaign plan (each canonical form read again with every check).
   *
   * @return the plan
   */
  public CampaignPlan plan() {
    final List<CampaignPlan.Entry> l = new ArrayList<>();
    for (PlanEntry e : entries) {
      l.add(new CampaignPlan.Entry(ScenarioReader.parse(e.origin(), e.canonicalYaml(), Path.of(".")), e.origin(),
          e.builtIn(), e.seeds(), e.levels()));
    }
    return new CampaignPlan(title, l);
  }

  void write(Path out) throws IOException {
    Json.writeAtomically(out.resolve("plan.json"), Json.write(this));
  }

  /**
   * Reads a folder's plan.json.
   *
   * @param dir a campaign or shard folder
   * @return the plan file
   * @throws IOException when missing or not a plan
   */
  public static PlanFile read(Path dir) throws IOException {
    final Path f = dir.resolve("plan.json");
    if (!Files.isRegularFile(f)) {
      throw new IOException(dir + ": no plan.json (not the output folder of 'eigenzeit campaign')");
    }
    final PlanFile p;
    try {
      p = Json.read(Files.readString(f, StandardCharsets.UTF_8), PlanFile.class);
    } catch (IOException e) {
      throw new IOException(f + ": not a campaign plan written by eigenzeit", e);
    }
    if (!FORMAT.equals(p.format())) {
      throw new IOException(f + ": format '" + p.format() + "', expected " + FORMAT);
    }
    return p;
  }
}
