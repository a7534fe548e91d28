package org.eigenzeit.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The command line as a user runs it: help, budget (table and JSON), errors, demo output. */
class CommandLineTest {
  static String[] run(String... args) {
    final CommandLine cl = Main.commandLine();
    final StringWriter out = new StringWriter();
    final StringWriter err = new StringWriter();
    cl.setOut(new PrintWriter(out));
    cl.setErr(new PrintWriter(err));
    final int code = cl.execute(args);
    return new String[] {Integer.toString(code), out.toString(), err.toString()};
  }

  @Test
  void helpNamesEveryCommandAndTheCaution() {
    final String[] r = run("--help");
    assertEquals("0", r[0]);
    for (String c : new String[] {"budget", "demo", "reference-speed", "CAUTION"}) {
      assertTrue(r[1].contains(c), c);
    }
  }

  @Test
  void budgetJsonForAGpsLikeOrbit() throws Exception {
    // IS-GPS-200 / Kouba (2004): +38.6 us/day for a = 26561.75 km (plus the small J2 and tidal parts).
    final String[] r = run("budget", "--sma-km", "26561.75", "--ecc", "0.01", "--inc-deg", "55", "--span-h", "12", "--json");
    assertEquals("0", r[0], r[2]);
    final JsonNode j = new ObjectMapper().readTree(r[1]);
    assertEquals(38.6, j.get("referenceMeanRate").asDouble() * 86400e6, 0.2);
    assertTrue(Math.abs(j.get("coreMinusReferenceRate").asDouble()) < 1e-17);
    assertTrue(j.get("maxOffsetDifferenceS").asDouble() < 1e-12);
    // e = 0.01: periodic amplitude about 23 ns, peak to peak about 46 ns over one 12 h orbit.
    assertEquals(46e-9, j.get("referencePeriodicPeakToPeakS").asDouble(), 5e-9);
  }

  @Test
  void badInputsAreExplained() {
    final String[] none = run("budget");
    assertTrue(!"0".equals(none[0]) && none[2].contains("Missing required"), none[2]);
    final String[] low = run("budget", "--sma-km", "6000");
    assertTrue(!"0".equals(low[0]) && low[2].contains("perigee radius"), low[2]);
    final String[] body = run("budget", "--sma-km", "7000", "--body", "mars");
    assertTrue(!"0".equals(body[0]) && body[2].contains("earth or moon"), body[2]);
  }

  @Test
  void demoWritesItsSummary(@TempDir Path dir) throws Exception {
    final String[] r = run("demo", "--out", dir.toString(), "--span-h", "2");
    assertEquals("0", r[0], r[2]);
    final JsonNode j = new ObjectMapper().readTree(Files.readString(dir.resolve("budgets.json")));
    assertEquals(6, j.size());
    assertTrue(r[1].contains("marrowtide-lunar") && r[1].contains("vellicorn-polar") && r[1].contains("CAUTION"));
  }
}
