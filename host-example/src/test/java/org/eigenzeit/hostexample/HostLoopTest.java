package org.eigenzeit.hostexample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The example host loop runs on the recorded pass, survives its faults and ends tracking. */
class HostLoopTest {
  @Test
  void recordedPassWithFaultsAndReset() throws IOException {
    final List<String> lines;
    try (BufferedReader r = new BufferedReader(new InputStreamReader(
        HostLoop.class.getResourceAsStream("recorded-pass.txt"), StandardCharsets.US_ASCII))) {
      lines = r.lines().toList();
    }
    final ByteArrayOutputStream buf = new ByteArrayOutputStream();
    assertEquals(0, HostLoop.run(lines, new PrintStream(buf, true, StandardCharsets.UTF_8)));
    final String out = buf.toString(StandardCharsets.UTF_8);
    System.out.print(out);
    assertTrue(out.contains("DEGRADED_BRIDGED"), "the orbit outage is bridged");
    assertTrue(out.contains("mode COAST"), "the timing outage is coasted");
    assertTrue(out.contains("RESET: save OK, restore OK"), "warm restart");
    assertFalse(out.contains("REFUSED"), "no cycle or stamp refused on the recorded pass");
    final Matcher end = Pattern.compile("host: end, mode (\\w+), time error (\\S+) ns, reset step (\\S+) s, "
        + "orbit faults (\\d+) \\(NOT_FINITE (\\d+)\\)").matcher(out);
    assertTrue(end.find(), out);
    assertEquals("TRACK", end.group(1));
    assertTrue(Math.abs(Double.parseDouble(end.group(2))) < 5.0, "time error " + end.group(2));
    assertTrue(Math.abs(Double.parseDouble(end.group(3))) < 1e-9, "reset step " + end.group(3));
    assertEquals("1", end.group(5), "the NaN sample is flagged once");
  }

  @Test
  void malformedInputNamesTheLine() {
    final IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
        () -> HostLoop.parse(List.of("start_tt 1", "O 0 1 2 x 4 5 6 1")));
    assertTrue(e.getMessage().startsWith("input line 2"), e.getMessage());
  }
}
