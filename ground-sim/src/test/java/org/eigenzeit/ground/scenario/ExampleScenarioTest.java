package org.eigenzeit.ground.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The README's first-hour scenario (docs/examples/first-scenario.yaml) goes through the strict
 * reader a campaign uses, so an edit of the reader or of the file that breaks it fails here, and
 * the README still names it.
 */
final class ExampleScenarioTest {
  private static final Path EXAMPLE = Path.of("..", "docs", "examples", "first-scenario.yaml");

  @Test
  void theFirstHourScenarioIsReadAsWritten() throws IOException {
    final Scenario sc = ScenarioReader.read(EXAMPLE);
    assertEquals("first-scenario", sc.name());
    assertEquals(2, sc.timing().seeds());
    assertEquals(6.0 * 3600, sc.timing().spanS());
    final String readme = Files.readString(Path.of("..", "README.md"), StandardCharsets.UTF_8);
    assertTrue(readme.contains("docs/examples/first-scenario.yaml"), "README no longer names the example");
  }
}
