package org.eigenzeit.ground.campaign;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.eigenzeit.ground.pipeline.RunResult;
import org.eigenzeit.ground.pipeline.ScenarioVerdict;
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
  public static List<RunResult> finish(Path out, CampaignPlan plan, Provenance provenance) throws IOException {
    final List<RunResult> results = new ArrayList<>();
    final Map<String, List<HtmlReport.RunData>> main = new LinkedHashMap<>();
    final Map<String, List<HtmlReport.RunData>> levels = new LinkedHashMap<>();
    for (RunSpec spec : plan.runs()) {
      final RunResult r = RunStore.read(out, spec, spec.key(provenance.codeFingerprint())).result();
      results.add(r);
      final double[][] series = HtmlReport.readSeries(out.resolve(spec.folder()).resolve("timeseries.csv"));
      (spec.comparison() ? levels : main).computeIfAbsent(spec.scenario().name(), k -> new ArrayList<>())
          .add(new HtmlReport.RunData(r, series[0], series[1]));
    }
    final List<ScenarioVerdict> verdicts = new ArrayList<>();
    final List<HtmlReport.Section> sections = new ArrayList<>();
    for (CampaignPlan.Entry e : plan.entries()) {
      final String name = e.scenario().name();
      Json.writeAtomically(out.resolve("inputs").resolve(name + ".yaml"), e.scenario().canonicalYaml());
      final List<HtmlReport.RunData> runs = main.getOrDefault(name, List.of());
      final List<RunResult> rs = new ArrayList<>();
      for (HtmlReport.RunData d : runs) {
        rs.add(d.result());
      }
      final ScenarioVerdict v = ScenarioVerdict.of(name, e.scenario().budget(), rs);
      verdicts.add(v);
      sections.add(new HtmlReport.Section(e.scenario(), e.origin(), e.builtIn(), v, runs,
          levels.getOrDefault(name, List.of())));
    }
    PlanFile.of(plan, 0, -1).write(out);
    Json.writeAtomically(out.resolve("summary.json"), Json.write(new CampaignSummary("eigenzeit-campaign-1",
        CampaignSummary.CAUTION, provenance, verdicts, results)));
    HtmlReport.write(out, new HtmlReport.Input(plan.title(), rows(provenance), sections));
    return results;
  }

  private static List<String[]> rows(Provenance p) {
    final List<String[]> rows = new ArrayList<>();
    rows.add(new String[] {"program", p.tool()});
    rows.add(new String[] {"code version", p.codeVersion()});
    rows.add(new String[] {"code fingerprint (SHA-256 of code and data)", p.codeFingerprint()});
    rows.add(new String[] {"Java runtime", p.javaRuntime()});
    rows.add(new String[] {"outputs assembled", p.date()});
    for (Provenance.ScenarioSource s : p.scenarios()) {
      rows.add(new String[] {"scenario " + s.name(), s.kind() + "; " + s.origin() + "; SHA-256 " + s.contentHash() + "; "
          + s.resolvedCopy()});
    }
    for (Map.Entry<String, String> d : p.data().entrySet()) {
      rows.add(new String[] {"data " + d.getKey(), "SHA-256 " + d.getValue()});
    }
    return rows;
  }
}
