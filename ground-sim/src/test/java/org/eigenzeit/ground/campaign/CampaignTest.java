package org.eigenzeit.ground.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.eigenzeit.ground.pipeline.Pipeline;
import org.eigenzeit.ground.pipeline.RunResult;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Campaigns: runs are pure functions of (scenario, seed); stored runs are reused only under an
 * equal key (same canonical scenario, code and seed) and re-run after a change; two scenarios of
 * one name are refused naming both files; shards merged give the bytes of a single run; the loop
 * tracks a MEO orbit to nanoseconds and loses the periodic term without the model.
 */
class CampaignTest {
  static final Instant DATE = Instant.parse("2026-11-01T00:00:00Z");

  static String meoYaml(String name, double hours, double sigmaNs) {
    return "name: " + name + "\nspan_h: " + hours + "\nseeds: 2\noutput_every_s: 60\ninitial_time_error_ns: 20\n"
        + "orbit:\n  sma_km: 26561.75\n  ecc: 0.01\n  inc_deg: 55\n"
        + "oscillator:\n  preset: rubidium\nmeasurements:\n  source: 1\n  sigma_ns: " + sigmaNs + "\n  every_s: 10\n"
        + "servo:\n  time_constant_track_s: 1000\n";
  }

  static Scenario meo(double hours) {
    return ScenarioReader.parse("test.yaml", meoYaml("test-meo", hours, 1), Path.of("."));
  }

  static CampaignPlan plan(Scenario s, boolean levels) {
    return CampaignPlan.of("t", List.of(new CampaignPlan.Entry(s, "test.yaml", false, 0, levels)), 0, false);
  }

  /** Every file of a folder, relative name and bytes, in name order. */
  static List<String> tree(Path dir) throws IOException {
    final List<String> out = new ArrayList<>();
    try (Stream<Path> s = Files.walk(dir)) {
      for (Path p : s.filter(Files::isRegularFile).sorted().toList()) {
        out.add(dir.relativize(p) + " " + Scenario.sha256Hex(Files.readAllBytes(p)));
      }
    }
    return out;
  }

  @Test
  void runsArePureFunctionsOfScenarioAndSeed() {
    final Scenario s = meo(2);
    final RunResult a = Pipeline.run(s, 1).result();
    final RunResult b = Pipeline.run(s, 1).result();
    final RunResult c = Pipeline.run(s, 2).result();
    assertEquals(a, b);
    assertTrue(a.rmsTimeErrorNs() != c.rmsTimeErrorNs());
  }

  @Test
  void modelMattersAndTheLoopHoldsNanoseconds() {
    final Scenario s = meo(12);
    final RunResult full = Pipeline.run(s.withLevel("full"), 0).result();
    final RunResult none = Pipeline.run(s.withLevel("none"), 0).result();
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
  void thePolarMaserDemoShowsWhatEachTermDoes() throws IOException {
    final Scenario s;
    try (java.io.InputStream in = CampaignTest.class.getResourceAsStream("/org/eigenzeit/ground/demo/vellicorn-polar.yaml")) {
      s = ScenarioReader.parse("vellicorn-polar.yaml", in);
    }
    final java.util.Map<String, RunResult> r = new java.util.LinkedHashMap<>();
    for (String level : Scenario.LEVELS) {
      r.put(level, Pipeline.run(s.withLevel(level), 0).result());
      System.out.printf("vellicorn-polar %s: settled %.0f s, RMS %.3f ns%n", level, r.get(level).settleTimeS(),
          r.get(level).rmsTimeErrorNs());
    }
    final double gain = r.get("point-mass").rmsTimeErrorNs() / r.get("j2").rmsTimeErrorNs();
    System.out.printf("evidence: campaign.polar_j2_gain = %.3f%n", gain);
    // Through a 12 h coast in LEO the J2 term is worth nanoseconds: without it the loop is several times worse.
    assertTrue(gain > 3, "J2 gain " + gain);
    assertTrue(r.get("none").rmsTimeErrorNs() > 3 * r.get("full").rmsTimeErrorNs());
  }

  @Test
  void storedRunsAreReusedOnlyUnderAnEqualKey(@TempDir Path out) throws IOException {
    final Path yaml = out.resolve("meo.yaml");
    Files.writeString(yaml, meoYaml("test-meo", 0.5, 2), StandardCharsets.UTF_8);
    final CampaignPlan p1 = plan(ScenarioReader.read(yaml), false);
    final LocalRunner.Counts first = LocalRunner.run(p1.runs(), out, 2, null);
    assertEquals(2, first.ran());
    final Path marker = out.resolve(p1.runs().get(0).folder()).resolve("summary.json");
    final long stamp = Files.getLastModifiedTime(marker).toMillis();
    final LocalRunner.Counts again = LocalRunner.run(p1.runs(), out, 2, null);
    assertEquals(0, again.ran());
    assertEquals(2, again.reused());
    assertEquals(stamp, Files.getLastModifiedTime(marker).toMillis(), "finished runs are not run again");
    final RunResult before = RunStore.read(out, p1.runs().get(0), p1.runs().get(0).key(fp())).result();
    // The file is edited: sigma 2 -> 20 ns. Every run is run again with the new value.
    Files.writeString(yaml, meoYaml("test-meo", 0.5, 20), StandardCharsets.UTF_8);
    final CampaignPlan p2 = plan(ScenarioReader.read(yaml), false);
    final LocalRunner.Counts edited = LocalRunner.run(p2.runs(), out, 2, null);
    assertEquals(2, edited.ran());
    assertEquals(2, edited.stale());
    final RunResult after = RunStore.read(out, p2.runs().get(0), p2.runs().get(0).key(fp())).result();
    assertTrue(after.rmsTimeErrorNs() != before.rmsTimeErrorNs(), "the edited scenario's numbers are new");
    assertEquals(Pipeline.run(p2.runs().get(0).scenario(), 0).result(), after);
    assertThrows(IOException.class, () -> RunStore.read(out, p1.runs().get(0), p1.runs().get(0).key(fp())),
        "the old key no longer matches");
  }

  static String fp() {
    return CodeVersion.current().fingerprint();
  }

  @Test
  void twoScenariosOfOneNameAreRefusedNamingBothFiles() {
    final Scenario a = meo(1);
    final IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
        () -> CampaignPlan.of("t", List.of(new CampaignPlan.Entry(a, "dir-a/meo.yaml", false, 0, false),
            new CampaignPlan.Entry(a.withSpanH(2), "dir-b/meo.yaml", false, 0, false)), 0, false));
    assertTrue(e.getMessage().contains("dir-a/meo.yaml") && e.getMessage().contains("dir-b/meo.yaml"), e.getMessage());
  }

  @Test
  void shardsMergeIntoTheBytesOfASingleRun(@TempDir Path dir) throws IOException {
    final CampaignPlan p = CampaignPlan.of("t", List.of(new CampaignPlan.Entry(meo(0.5), "test.yaml", false, 3, true)),
        0, false);
    final Path single = dir.resolve("single");
    LocalRunner.run(p.runs(), single, 2, null);
    CampaignOutput.writePlan(single, p, 0, -1);
    CampaignOutput.finish(single, p, Provenance.of(p, DATE));
    final Path a = dir.resolve("shard-a");
    final Path b = dir.resolve("shard-b");
    CampaignOutput.writePlan(a, p, 0, 2);
    LocalRunner.run(p.shard(0, 2), a, 1, null);
    CampaignOutput.writePlan(b, p, 2, 5);
    LocalRunner.run(p.shard(2, 5), b, 1, null);
    assertEquals(3 + 4, p.runs().size());
    assertEquals(2 + 4, p.shard(0, 2).size(), "the model-level runs go with seed 0");
    final Path merged = dir.resolve("merged");
    Merge.merge(merged, List.of(b, a), DATE);
    assertEquals(tree(single), tree(merged));
    assertTrue(Files.readString(merged.resolve("summary.json")).contains("\"contentHash\""));
    final IOException hole = assertThrows(IOException.class, () -> Merge.merge(dir.resolve("m2"), List.of(b), DATE));
    assertTrue(hole.getMessage().contains("hole"), hole.getMessage());
    final IOException overlap = assertThrows(IOException.class, () -> Merge.merge(dir.resolve("m3"), List.of(a, a), DATE));
    assertTrue(overlap.getMessage().contains("overlap"), overlap.getMessage());
    assertArrayEquals(Files.readAllBytes(single.resolve("report.html")), Files.readAllBytes(merged.resolve("report.html")));
    final String report = Files.readString(single.resolve("report.html"));
    assertTrue(report.contains("scenario supplied by the user: test.yaml") && !report.contains("built-in demo mission:"),
        "a user's scenario is labelled as the user's");
    assertTrue(Files.readString(single.resolve("inputs/test-meo.yaml")).contains("sigma_ns: 1.0"));
  }
}
