package org.eigenzeit.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.eigenzeit.ground.campaign.CampaignOutput;
import org.eigenzeit.ground.campaign.CampaignPlan;
import org.eigenzeit.ground.campaign.LocalRunner;
import org.eigenzeit.ground.campaign.Provenance;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same campaign through Spark (local[2]: two executor threads, tasks serialised as on a
 * cluster) and through the local runner gives byte-identical files: every run's summary and time
 * series, the campaign's summary.json, the resolved inputs, the plots and the report.
 */
class SparkCampaignTest {
  static final Instant DATE = Instant.parse("2026-11-01T00:00:00Z");

  static Scenario scenario(String name, String orbit) {
    return ScenarioReader.parse(name + ".yaml", "name: " + name + "\nspan_h: 0.5\nseeds: 2\noutput_every_s: 30\n"
        + "initial_time_error_ns: 50\norbit:\n" + orbit + "oscillator:\n  preset: rubidium\nmeasurements:\n  source: 1\n"
        + "  sigma_ns: 1\n  every_s: 10\nbudget:\n  max_abs_time_error_ns: 20\n  settle_within_s: 900\n", Path.of("."));
  }

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
  void sparkAndLocalRunnersWriteTheSameBytes(@TempDir Path dir) throws IOException {
    final CampaignPlan plan = CampaignPlan.of("t", List.of(
        new CampaignPlan.Entry(scenario("spark-meo", "  sma_km: 26561.75\n  ecc: 0.01\n  inc_deg: 55\n"), "a.yaml", false,
            0, true),
        new CampaignPlan.Entry(scenario("spark-leo", "  sma_km: 6928\n  ecc: 0.001\n  inc_deg: 97\n"), "b.yaml", false, 0,
            false)), 0, false);
    final Path local = dir.resolve("local");
    CampaignOutput.writePlan(local, plan, 0, -1);
    LocalRunner.run(plan.runs(), local, 2, null);
    CampaignOutput.finish(local, plan, Provenance.of(plan, DATE));
    final Path spark = dir.resolve("spark");
    final SparkConf conf = new SparkConf().setMaster("local[2]").setAppName("eigenzeit-test")
        .set("spark.driver.bindAddress", "127.0.0.1").set("spark.driver.host", "127.0.0.1").set("spark.ui.enabled", "false");
    final SparkRunner.Outcome o;
    try (JavaSparkContext sc = new JavaSparkContext(conf)) {
      o = SparkRunner.run(sc, plan, spark, DATE, 0);
      assertEquals(0, SparkRunner.runTasks(sc, plan.runs(), spark, 0), "a second pass finds every run current");
    }
    assertEquals(plan.runs().size(), o.ran());
    final List<String> a = tree(local);
    final List<String> b = tree(spark);
    System.out.println("evidence: spark.files_compared = " + a.size());
    assertTrue(a.size() > 20, "runs, inputs, plots and report are compared");
    assertEquals(a, b);
  }
}
