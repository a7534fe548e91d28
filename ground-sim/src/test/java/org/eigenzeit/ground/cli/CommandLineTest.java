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

  /** Runs a command that must be refused: exit code, the fragment, and no Java or library text. */
  private static String refused(int code, String fragment, String... args) {
    final String[] r = run(args);
    assertEquals(Integer.toString(code), r[0], String.join(" ", args) + " -> " + r[2]);
    assertTrue(r[2].contains(fragment), String.join(" ", args) + " -> " + r[2]);
    for (String internal : new String[] {"Exception", "\tat ", "java.", "picocli", "=<", "Error:"}) {
      assertTrue(!r[2].contains(internal), "internal text '" + internal + "' in: " + r[2]);
    }
    return r[2].lines().findFirst().orElse("");
  }

  @Test
  void theDocumentedStateFormWorks() throws Exception {
    // Circular LEO: v = sqrt(GM/r) = 7.546 km/s at r = 7000 km (common practice).
    final String[] r = run("budget", "--state-km", "7000,0,0,0,7.546,0", "--span-h", "1", "--step-s", "60", "--json");
    assertEquals("0", r[0], r[2]);
    assertEquals(3600.0, new ObjectMapper().readTree(r[1]).get("spanS").asDouble(), 0.0);
    final String[] off = run("budget", "--sma-km", "7000", "--span-h", "1", "--step-s", "60", "--core-tides", "off",
        "--json");
    assertEquals("0", off[0], off[2]);
    assertEquals(0.0, new ObjectMapper().readTree(off[1]).get("components").get("tidalCore").asDouble(), 0.0);
    final String[] moon = run("budget", "--body", "moon", "--sma-km", "1838", "--span-h", "1", "--step-s", "60");
    assertEquals("0", moon[0], moon[2]);
  }

  @Test
  void everyOutOfRangeOptionIsRefusedWithItsOwnMessage() {
    final java.util.Set<String> messages = new java.util.HashSet<>();
    messages.add(refused(2, "--seeds: out of range, found -3, allowed 1 to 10000", "campaign", "--seeds", "-3", "x.yaml"));
    messages.add(refused(2, "--threads: out of range, found 0, allowed 1 to 256", "campaign", "--threads", "0", "x.yaml"));
    messages.add(refused(2, "--inc-deg: out of range, found 400, allowed 0 to 180", "budget", "--sma-km", "7000",
        "--inc-deg", "400"));
    messages.add(refused(2, "--ecc: out of range, found 1.2, allowed 0 to 0.99", "budget", "--sma-km", "7000", "--ecc",
        "1.2"));
    assertEquals(4, messages.size(), messages.toString());
    refused(2, "--raan-deg: out of range, found 361", "budget", "--sma-km", "7000", "--raan-deg", "361");
    refused(2, "--argp-deg: out of range", "budget", "--sma-km", "7000", "--argp-deg", "-400");
    refused(2, "--anomaly-deg: out of range", "budget", "--sma-km", "7000", "--anomaly-deg", "1e3");
    refused(2, "--span-h: out of range, found 0, allowed 0.1 to 240", "budget", "--sma-km", "7000", "--span-h", "0");
    refused(2, "--span-h: out of range, found 1000", "budget", "--sma-km", "7000", "--span-h", "1000");
    refused(2, "--step-s: out of range, found 0.5, allowed 1 to 600", "budget", "--sma-km", "7000", "--step-s", "0.5");
    refused(2, "--step-s: 600 s is longer than --span-h 0.1 h", "budget", "--sma-km", "7000", "--step-s", "600",
        "--span-h", "0.1");
    refused(2, "--degree: out of range, found 1, allowed 2 to 36", "budget", "--sma-km", "7000", "--degree", "1");
    refused(2, "--degree: out of range, found 40", "budget", "--sma-km", "7000", "--degree", "40");
    refused(2, "--degree: applies to --core-level harmonics only", "budget", "--sma-km", "7000", "--degree", "8",
        "--core-level", "j2");
    refused(2, "--sma-km: out of range, found 6000, allowed above 6348.14 up to 2000000 for the Earth", "budget",
        "--sma-km", "6000");
    refused(2, "--ecc: perigee radius a(1-e) = 3500 km with --sma-km 7000", "budget", "--sma-km", "7000", "--ecc", "0.5");
    refused(2, "--seeds: out of range, found 0, allowed 1 to 100", "demo", "--seeds", "0");
    refused(2, "--span-h: out of range, found 0, allowed 0.1 to 240", "demo", "--span-h", "0");
    refused(2, "--repeats: out of range, found 0, allowed 1 to 100", "reference-speed", "--repeats", "0");
  }

  @Test
  void valuesAreParsedStrictlyAndChoicesNamed() {
    refused(2, "--sma-km: not a finite decimal number, found 'NaN'", "budget", "--sma-km", "NaN");
    refused(2, "--sma-km: not a finite decimal number, found '0x1p12'", "budget", "--sma-km", "0x1p12");
    refused(2, "--ecc: not a finite decimal number, found 'Infinity'", "budget", "--sma-km", "7000", "--ecc", "Infinity");
    refused(2, "--sma-km: not a finite decimal number, found '1e400'", "budget", "--sma-km", "1e400");
    refused(2, "--seeds: not a whole number, found '1.9'", "campaign", "--seeds", "1.9", "x.yaml");
    refused(2, "--state-km: not a finite decimal number, found 'NaN'", "budget", "--state-km", "7000,0,0,0,NaN,0");
    refused(2, "--state-km: found 5 numbers, allowed 6", "budget", "--state-km", "7000,0,0,0,7.5");
    refused(2, "--state-km: position inside the Earth, found radius 3000.000 km", "budget", "--state-km",
        "3000,0,0,0,7.5,0");
    refused(2, "--state-km: speed 300000 km/s is not below the speed of light", "budget", "--state-km",
        "7000,0,0,0,300000,0");
    refused(2, "--state-km: speed above escape speed", "budget", "--state-km", "7000,0,0,0,12,0");
    refused(2, "--core-level: harmonics is not available for --body moon (the onboard core has no lunar field beyond "
        + "J2), allowed point-mass or j2", "budget", "--body", "moon", "--sma-km", "1838", "--core-level", "harmonics");
    refused(2, "--core-tides: found 'maybe', allowed on, off, true, false", "budget", "--sma-km", "7000", "--core-tides",
        "maybe");
    refused(2, "--core-level: found 'full', allowed point-mass, j2, harmonics", "budget", "--sma-km", "7000",
        "--core-level", "full");
    refused(2, "--body: found 'mars', allowed earth, moon", "budget", "--sma-km", "7000", "--body", "mars");
    refused(2, "--time-scale: found 'TCB', allowed tt, tai, gps, utc", "budget", "--sma-km", "7000", "--time-scale",
        "TCB");
    refused(2, "--epoch: month: out of range, found 13, allowed 1 to 12", "budget", "--sma-km", "7000", "--epoch",
        "2026-13-01T00:00:00");
    refused(2, "--epoch: 1990-01-01T00:00:00 with --span-h 24 leaves the shipped DE405 span", "budget", "--sma-km",
        "7000", "--epoch", "1990-01-01T00:00:00");
    refused(2, "--epoch: UTC epoch '2030-01-01T00:00:00' at or after the expiry", "budget", "--sma-km", "7000",
        "--epoch", "2030-01-01T00:00:00", "--time-scale", "UTC");
  }

  @Test
  void parseErrorsAreInOurWords() {
    refused(2, "missing the orbit: give --sma-km", "budget");
    refused(2, "give the orbit either as Keplerian elements", "budget", "--sma-km", "7000", "--state-km",
        "7000,0,0,0,7.5,0");
    refused(2, "an option was given more than once", "budget", "--sma-km", "7000", "--ecc", "0.1", "--ecc", "0.2");
    refused(2, "--span-h: given more than once, allowed once", "budget", "--sma-km", "7000", "--span-h", "1", "--span-h", "2");
    refused(2, "unknown option '--foo'", "budget", "--sma-km", "7000", "--foo");
    refused(2, "unexpected argument 'frobnicate'", "frobnicate");
    refused(2, "SCENARIO.yaml: no such file 'nowhere.yaml'", "campaign", "nowhere.yaml");
    refused(2, "--out: not a valid path", "demo", "--out", "a" + (char) 0 + "b");
    final String[] none = run();
    assertEquals("2", none[0]);
    assertTrue(none[2].contains("no command given") && none[2].contains("budget") && none[2].contains("Exit codes"),
        none[2]);
  }

  @Test
  void runtimeErrorsEndWithTheirDocumentedCode(@TempDir Path dir) throws Exception {
    final Path yaml = dir.resolve("bad.yaml");
    Files.writeString(yaml, "name: bad\nfrobnicate: 1\n");
    refused(1, "bad.yaml", "campaign", yaml.toString());
    // A file refused while the campaign runs: its file and line, exit code 1.
    final java.util.List<String> sp3 = new java.util.ArrayList<>(org.eigenzeit.ground.trajectory.Fixtures.sp3Lines());
    sp3.set(23, sp3.get(23).substring(0, 4) + "           NaN" + sp3.get(23).substring(18));
    Files.write(dir.resolve("broken.sp3"), sp3);
    final Path ext = dir.resolve("ext.yaml");
    Files.writeString(ext, "name: broken-sp3\norbit:\n  trajectory:\n    format: sp3\n    file: broken.sp3\n"
        + "    satellite: G05\n");
    refused(1, "broken.sp3:24: x (km, columns 5-18): not a decimal number", "campaign", "--out",
        dir.resolve("out").toString(), ext.toString());
    final Path file = dir.resolve("plain");
    Files.writeString(file, "x");
    refused(3, "cannot be read or written", "demo", "--no-loop", "--span-h", "0.1", "--out",
        file.resolve("sub").toString());
    final CommandLine cl = Main.commandLine();
    final StringWriter err = new StringWriter();
    cl.setErr(new PrintWriter(err));
    assertEquals(Main.EXIT_INTERNAL, Main.executionError(new IllegalStateException("boom"), cl, null));
    assertTrue(err.toString().startsWith("eigenzeit: internal error (IllegalStateException); this is a defect"),
        err.toString());
    assertTrue(!err.toString().contains("boom") && !err.toString().contains("\tat "), err.toString());
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
