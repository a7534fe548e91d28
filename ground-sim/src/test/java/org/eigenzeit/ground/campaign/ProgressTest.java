package org.eigenzeit.ground.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** Progress: a bar only on a terminal, one summary line elsewhere (times are given, not measured). */
final class ProgressTest {
  private static String drive(boolean terminal) {
    final ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    final Progress p = new Progress(new PrintStream(bytes, true, StandardCharsets.UTF_8), terminal);
    for (int done = 1; done <= 5; done++) {
      p.update(done, 5, 2, 1.5 * done);
    }
    p.finish(new LocalRunner.Counts(5, 2, 1, 7.5));
    return bytes.toString(StandardCharsets.UTF_8);
  }

  @Test
  void notATerminalGetsOneSummaryLineAndNoCarriageReturn() {
    final String log = drive(false);
    assertFalse(log.contains("\r"), log);
    assertEquals("campaign: 5 runs done (1 re-run after a change), 2 reused, in 7.5 s" + System.lineSeparator(), log);
  }

  @Test
  void aTerminalGetsTheBarRedrawnInPlaceThenTheSummary() {
    final String screen = drive(true);
    assertEquals(5, screen.chars().filter(c -> c == '\r').count(), screen);
    assertTrue(screen.contains("[" + "#".repeat(30) + "] 5/5 runs (2 reused)"), screen);
    assertTrue(screen.endsWith(System.lineSeparator() + "campaign: 5 runs done (1 re-run after a change), 2 reused, in 7.5 s"
        + System.lineSeparator()), screen);
  }

  @Test
  void theLauncherDecidesWhenItHasLookedAtStandardError() {
    final String before = System.getProperty(Progress.TERMINAL_PROPERTY);
    try {
      System.setProperty(Progress.TERMINAL_PROPERTY, "false");
      assertFalse(Progress.onStandardError().terminal());
      System.setProperty(Progress.TERMINAL_PROPERTY, "true");
      assertTrue(Progress.onStandardError().terminal());
    } finally {
      if (before == null) {
        System.clearProperty(Progress.TERMINAL_PROPERTY);
      } else {
        System.setProperty(Progress.TERMINAL_PROPERTY, before);
      }
    }
  }
}
