package org.eigenzeit.ground.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.eigenzeit.ground.loop.ClosedLoop;
import org.eigenzeit.ground.loop.RunResult;
import org.eigenzeit.ground.report.HtmlReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Campaigns: each run is a pure function of (scenario, seed); finished runs are skipped when a
 * campaign resumes; the loop tracks a MEO orbit to nanoseconds and loses the periodic term
 * without the model; the report is written.
 */
class CampaignTest {
  static Scenario meo(double hours) throws IOException {
    final String yaml = "name: test-meo\nspan_h: " + hours + "\nseeds: 2\noutput_every_s: 60\ninitial_time_error_ns: 20\n"
        + "orbit:\n  sma_km: 26561.75\n  ecc: 0.01\n  inc_deg: 55\n"
        + "oscillator:\n  preset: rubidium\nmeasurements:\n  source: 1\n  sigma_ns: 1\n  every_s: 10\n"
        + "servo:\n  time_constant_track_s: 1000\n";
    return Scenario.parse("test.yaml", new ByteArrayInputStream(yaml.getBytes(StandardCharsets.UTF_8)));
  }

  @Test
  void runsArePureFunctionsOfScenarioAndSeed() throws IOException {
    final Scenario s = meo(2);
    final RunResult a = ClosedLoop.run(s, 1).result();
    final RunResult b = ClosedLoop.run(s, 1).result();
    final RunResult c = ClosedLoop.run(s, 2).result();
    assertEquals(a, b);
    assertTrue(a.rmsTimeErrorNs() != c.rmsTimeErrorNs());
  }

  @Test
  void modelMattersAndTheLoopHoldsNanoseconds() throws IOException {
    final Scenario s = meo(12);
    final RunResult full = ClosedLoop.run(s.atLevel("full"), 0).result();
    final RunResult none = ClosedLoop.run(s.atLevel("none"), 0).result();
    System.out.printf("MEO e = 0.01, rubidium, 1 ns every 10 s: RMS time error %.3f ns with the model, %.3f ns without%n",
        full.rmsTimeErrorNs(), none.rmsTimeErrorNs());
    System.out.printf("evidence: campaign.meo_loop_rms_ns = %.4f%n", full.rmsTimeErrorNs());
    System.out.printf("evidence: campaign.meo_model_gain = %.3f%n", none.rmsTimeErrorNs() / full.rmsTimeErrorNs());
    assertTrue(full.settleTimeS() >= 0 && full.rmsTimeErrorNs() < 2.0, "full " + full.rmsTimeErrorNs());
    assertTrue(none.rmsTimeErrorNs() > 3 * full.rmsTimeErrorNs(), "none " + none.rmsTimeErrorNs());
    // The true relativistic rate of a GPS-like orbit: about +4.46e-10 (IS-GPS-200; Kouba 2004).
    assertEquals(4.465e-10, full.trueRelativisticRate(), 0.01e-10);
    assertEquals(full.trueRelativisticRate(), full.modelRelativisticRate(), 1e-16);
  }

  @Test
  void resumesAndReports(@TempDir Path out) throws IOException {
    final Scenario s = meo(1);
    final List<Campaign.Job> jobs = Campaign.jobs(List.of(s), 0);
    assertEquals(2, jobs.size());
    final List<RunResult> first = Campaign.run(jobs, out, 2, null);
    final Path marker = Campaign.runDir(out, jobs.get(0)).resolve("summary.json");
    final long stamp = Files.getLastModifiedTime(marker).toMillis();
    final List<RunResult> again = Campaign.run(jobs, out, 2, null);
    assertEquals(first, again);
    assertEquals(stamp, Files.getLastModifiedTime(marker).toMillis(), "finished runs are not run again");
    final double[][] series = HtmlReport.readSeries(Campaign.runDir(out, jobs.get(0)).resolve("timeseries.csv"));
    assertEquals(61, series[0].length);
    final Path html = HtmlReport.write(out, List.of(new HtmlReport.RunData(first.get(0), series[0], series[1])), "t");
    assertTrue(Files.readString(html).contains("Caution"));
    assertTrue(Files.exists(out.resolve("plots").resolve("test-meo-adev.svg")));
  }
}
