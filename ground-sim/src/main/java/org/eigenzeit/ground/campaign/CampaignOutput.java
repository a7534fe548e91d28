package org.eigenzeit.ground.campaign;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.pipeline.RunResult;
import org.eigenzeit.ground.report.HtmlReport;

/**
 * The campaign's outputs once every run is stored: {@code inputs/NAME.yaml} (each scenario's
 * resolved inputs), {@code summary.json} (provenance and every run) and {@code report.html} with
 * {@code plots/}. Every runner and the merge step end here, so equal runs give equal bytes.
 */
public final class CampaignOutput {
  private CampaignOutput() {}

  /**
   * Writes the plan file of a campaign (or of a shard) before its runs start.
   *
   * @param out the folder
   * @param plan the campaign
   * @param seedFrom first seed of a shard (0 for a whole campaign)
   * @param seedCount seeds of a shard (-1 for a whole campaign)
   * @throws IOException on a write failure
   */
  public static void writePlan(Path out, CampaignPlan plan, long seedFrom, long seedCount) throws IOException {
    PlanFile.of(plan, seedFrom, seedCount).write(out);
  }

  /**
   * Assembles the outputs from the stored runs.
   *
   * @param out the campaign folder
   * @param plan the campaign
   * @param provenance its provenance
   * @return every run's summary in campaign order
   * @throws IOException when a run is missing or stale, or on a write failure
   */
  public static List<RunResult> finish(Path out, CampaignPlan plan, Provenance provenance)
      throws IOException {
    final List<RunResult> results = new ArrayList<>();
    final List<HtmlReport.RunData> data = new ArrayList<>();
    for (RunSpec spec : plan.runs()) {
      final RunResult r = RunStore.read(out, spec, spec.key(provenance.codeFingerprint())).result();
      results.add(r);
      final double[][] series = HtmlReport.readSeries(out.resolve(spec.folder()).resolve("timeseries.csv"));
      data.add(new HtmlReport.RunData(r, series[0], series[1]));
    }
    for (CampaignPlan.Entry e : plan.entries()) {
      Json.writeAtomically(out.resolve("inputs").resolve(e.scenario().name() + ".yaml"), e.scenario().canonicalYaml());
    }
    PlanFile.of(plan, 0, -1).write(out);
    Json.writeAtomically(out.resolve("summary.json"),
        Json.write(new CampaignSummary("eigenzeit-campaign-1", CampaignSummary.CAUTION, provenance, results)));
    HtmlReport.write(out, data, plan.title());
    return results;
  }
}
