package org.eigenzeit.ground.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * Scenario files: the demos parse; the canonical form reads back to the same scenario and its
 * hash follows every value; refusals read {@code file:line: key: what, found X, allowed Y}. The
 * malformed-file corpus is in {@link ScenarioCorpusTest}.
 */
class ScenarioTest {
  static final String[] DEMOS = {"sorvelin-leo", "tamberlode-meo", "quendrisk-heo", "obrellan-geo", "marrowtide-lunar",
    "vellicorn-polar"};

  static Scenario parse(String yaml) {
    return ScenarioReader.parse("test.yaml", yaml.getBytes(StandardCharsets.UTF_8), Path.of("."));
  }

  static String error(String yaml) {
    return assertThrows(ScenarioException.class, () -> parse(yaml)).getMessage();
  }

  static Scenario demo(String n) throws IOException {
    try (InputStream in = ScenarioTest.class.getResourceAsStream("/org/eigenzeit/ground/demo/" + n + ".yaml")) {
      return ScenarioReader.parse(n + ".yaml", in);
    }
  }

  @Test
  void demoScenariosParseAndReadBackFromTheirCanonicalForm() throws IOException {
    for (String n : DEMOS) {
      final Scenario s = demo(n);
      assertEquals(n, s.name());
      assertEquals(86_400, s.timing().spanS(), 0);
      final Scenario again = ScenarioReader.parse("canonical", s.canonicalYaml(), Path.of("."));
      assertEquals(s.canonicalYaml(), again.canonicalYaml());
      assertEquals(s.contentHash(), again.contentHash());
      assertEquals(s, again, n + ": the canonical form reads back to an equal scenario");
    }
  }

  @Test
  void theHashFollowsEveryValueAndNotTheLayout() {
    final Scenario a = parse("name: x\norbit:\n  sma_km: 7000\nmeasurements:\n  sigma_ns: 2\n");
    final Scenario reordered = parse("measurements:\n  sigma_ns: 2.0\norbit:\n  sma_km: 7.0e3\nname: x   # comment\n");
    assertEquals(a.contentHash(), reordered.contentHash(), "order, comments and number spelling do not matter");
    final Scenario b = parse("name: x\norbit:\n  sma_km: 7000\nmeasurements:\n  sigma_ns: 20\n");
    assertNotEquals(a.contentHash(), b.contentHash(), "sigma 2 -> 20 ns changes the hash");
    assertNotEquals(a.contentHash(), a.withLevel("j2").contentHash());
    assertEquals("j2", a.withLevel("j2").model().level());
  }

  @Test
  void minimalScenarioTakesDefaults() {
    final Scenario s = parse("name: tiny\norbit:\n  sma_km: 7000\n");
    assertEquals("full", s.model().level());
    assertEquals(2, s.timing().seeds());
    assertEquals(1, s.timing().cycleS());
    assertEquals("rubidium (typical)", s.oscillator().name());
    assertTrue(!s.budget().stated());
  }

  @Test
  void oscillatorOverridesDoNotClaimThePreset() {
    final Scenario s = parse("name: x\norbit:\n  sma_km: 7000\noscillator:\n  preset: quartz\n  white_fm_adev_1s: 1.0e-12\n");
    assertEquals("user-defined (quartz preset with white_fm_adev_1s changed)", s.oscillator().name());
    final Scenario same = parse("name: x\norbit:\n  sma_km: 7000\noscillator:\n  preset: quartz\n  white_fm_adev_1s: 3.0e-13\n");
    assertEquals("quartz (typical OCXO)", same.oscillator().name(), "a value equal to the preset's is the preset");
  }

  @Test
  void errorsNameFileLineKeyFoundAndAllowed() {
    assertEquals("test.yaml:4: orbit.ecc: out of range, found 1.5, allowed 0 .. 0.95",
        error("name: x\norbit:\n  sma_km: 7000\n  ecc: 1.5\n"));
    assertEquals("test.yaml:1: seeds: not a whole number, found '1.9', allowed a whole number 1 .. 10000",
        error("seeds: 1.9\nname: x\norbit:\n  sma_km: 7000\n"));
    assertEquals("test.yaml:3: orbit.sma_km: duplicate key (first at line 2), found a second 'sma_km', allowed each key "
        + "once per section", error("orbit:\n  sma_km: 7000\n  sma_km: 8000\nname: x\n"));
    assertEquals("test.yaml:5: servo.track_exit_ns: the track-exit threshold must exceed the track-enter threshold, "
        + "found 40 ns with track_enter_ns = 50 ns, allowed more than track_enter_ns",
        error("name: x\norbit:\n  sma_km: 7000\nservo:\n  track_exit_ns: 40\n  track_enter_ns: 50\n"));
  }
}
