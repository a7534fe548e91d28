package org.eigenzeit.ground.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** Scenario files: the demos parse; validation errors name the file, the key, the value and the range. */
class ScenarioTest {
  private static Scenario parse(String yaml) throws IOException {
    return Scenario.parse("test.yaml", new ByteArrayInputStream(yaml.getBytes(StandardCharsets.UTF_8)));
  }

  private static String error(String yaml) {
    return assertThrows(ScenarioException.class, () -> parse(yaml)).getMessage();
  }

  @Test
  void demoScenariosParse() throws IOException {
    for (String n : new String[] {"sorvelin-leo", "tamberlode-meo", "quendrisk-heo", "obrellan-geo", "marrowtide-lunar"}) {
      try (InputStream in = ScenarioTest.class.getResourceAsStream("/org/eigenzeit/ground/demo/" + n + ".yaml")) {
        final Scenario s = Scenario.parse(n + ".yaml", in);
        assertEquals(n, s.name());
        assertEquals(86_400, s.spanS(), 0);
      }
    }
  }

  @Test
  void minimalScenarioTakesDefaults() throws IOException {
    final Scenario s = parse("name: tiny\norbit:\n  sma_km: 7000\n");
    assertEquals("full", s.modelLevel());
    assertEquals(2, s.seeds());
    assertEquals(1, s.cycleS());
    assertEquals("rubidium (typical)", s.oscillator().name());
    assertEquals("tiny@j2", s.atLevel("j2").name());
  }

  @Test
  void errorsNameFileKeyValueAndRange() {
    assertEquals("test.yaml: key 'orbit.ecc' = 1.5 is outside the allowed range 0.0 .. 0.95",
        error("name: x\norbit:\n  sma_km: 7000\n  ecc: 1.5\n"));
    assertTrue(error("name: x\norbit:\n  sma_km: 7000\n  ecc: 0.5\n").contains("perigee"));
    assertTrue(error("name: x\n").contains("key 'orbit.sma_km' is required"));
    assertTrue(error("orbit:\n  sma_km: 7000\n").contains("key 'name' is required"));
    assertTrue(error("name: x\norbit:\n  sma_km: 7000\n  colour: red\n").contains("unknown key 'orbit.colour'"));
    assertTrue(error("name: x\norbit:\n  sma_km: seven\n").contains("'orbit.sma_km' = 'seven' is not a number"));
    assertTrue(error("name: x\norbit:\n  sma_km: 7000\nmodel:\n  level: magic\n").contains("'model.level' = 'magic'"));
    assertTrue(error("name: x\norbit:\n  sma_km: 7000\noscillator:\n  preset: sundial\n").contains("unknown oscillator preset"));
    assertTrue(error("name: x y\norbit:\n  sma_km: 7000\n").contains("key 'name'"));
    assertTrue(error("name: x\ncycle_s: 1.5\norbit:\n  sma_km: 7000\n").contains("whole number"));
    assertTrue(error("name: x\norbit:\n  body: mars\n  sma_km: 7000\n").contains("earth or moon"));
    assertTrue(error(": : :\n  - [").startsWith("test.yaml: not valid YAML"));
    assertTrue(error("- a\n- b\n").contains("must be a YAML mapping"));
    assertTrue(error("name: x\norbit: 5\n").contains("'orbit' must be a mapping"));
  }
}
