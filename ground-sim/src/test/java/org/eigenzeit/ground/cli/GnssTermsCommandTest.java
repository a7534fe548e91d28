package org.eigenzeit.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.eigenzeit.ground.gnss.GnssFixtures;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code gnss-terms} and {@code budget --trajectory} as a user runs them, on the real fixture days. */
class GnssTermsCommandTest {
  private static String[] run(String... args) {
    return CommandLineTest.run(args);
  }

  private static String file(String day, String name) {
    return GnssFixtures.day(day).resolve(name).toString();
  }

  @Test
  void aRealDayEndToEnd(@TempDir Path dir) throws Exception {
    final String[] r = run("gnss-terms", "--sp3", file("2010-07-01", "igs15904.sp3.gz"), "--nav",
        file("2010-07-01", "brdc1820.10n.gz"), "--clock", file("2010-07-01", "igs15904.clk.gz"), "--out", dir.toString());
    assertEquals("0", r[0], r[2]);
    System.out.println(r[1]);
    assertTrue(r[1].contains("G25") && r[1].contains("EXCLUDED: all 13 broadcast records rejected: 13 x unhealthy"));
    assertTrue(r[1].contains("brdc1820.10n:937 G01 2010-07-01T06:00:00.000: filed under the wrong satellite"));
    assertTrue(r[1].contains("week 1590, 345600 s of week") && r[1].contains("CAUTION"));
    final JsonNode j = new ObjectMapper().readTree(Files.readString(dir.resolve("summary.json")));
    assertTrue(j.get("caution").asText().startsWith("CAUTION"));
    assertEquals(1590, j.get("firstGpsWeek").asInt());
    assertEquals(345_600.0, j.get("firstGpsSecondsOfWeek").asDouble());
    assertEquals("GPS", j.get("orbitTimeSystem").asText());
    assertEquals(32, j.get("satellites").size());
    assertEquals(27, j.get("rejectedRecords").size());
    final List<String> epochs = Files.readAllLines(dir.resolve("epochs.csv"), StandardCharsets.UTF_8);
    assertTrue(epochs.get(0).startsWith("satellite,gps_time,gps_week,gps_seconds_of_week,orbit_source,orbit_term_ns"));
    assertEquals(1 + 32 * 87, epochs.size());
    assertEquals(422, Files.readAllLines(dir.resolve("records.csv"), StandardCharsets.UTF_8).size());
    for (String p : new String[] {"periodic-term", "difference", "j2-term"}) {
      assertTrue(Files.size(dir.resolve("plots").resolve(p + ".png")) > 1000, p);
      assertTrue(Files.exists(dir.resolve("plots").resolve(p + ".svg")), p);
    }
  }

  @Test
  void anOrbitEstimateAgainstThePreciseOrbit(@TempDir Path dir) throws Exception {
    final String[] r = run("gnss-terms", "--sp3", file("2011-04-01", "igs16295.sp3.gz"), "--estimate-orbit",
        file("2011-04-01", "igu16295_00.sp3.gz"), "--out", dir.toString(), "--json");
    assertEquals("0", r[0], r[2]);
    final JsonNode j = new ObjectMapper().readTree(r[1]);
    assertEquals(List.of("cod", "emr", "esa", "gfz", "grg", "jpl", "mit", "ngs", "sio").toString(),
        j.get("analysisCentres").toString().replace("\"", "").replace(",", ", "));
    final JsonNode est = j.get("estimate");
    assertEquals(32, est.size());
    assertTrue(est.get(1).get("predictedEpochs").asInt() > 0);
    assertTrue(Files.exists(dir.resolve("estimate.csv")));
  }

  @Test
  void wrongInputsAreExplained(@TempDir Path dir) throws Exception {
    final String[] none = run("gnss-terms", "--out", dir.toString());
    assertTrue("2".equals(none[0]) && none[2].contains("give --sp3 FILE, --nav FILE, or both"), none[2]);
    final Path bad = dir.resolve("bad.10n");
    final List<String> lines = GnssFixtures.lines("2010-07-01", "brdc1820.10n.gz");
    lines.set(9, lines.get(9).substring(0, 3) + "   0.9000000000Q+02" + lines.get(9).substring(22));
    Files.write(bad, lines, StandardCharsets.US_ASCII);
    final String[] b = run("gnss-terms", "--nav", bad.toString(), "--out", dir.toString());
    assertEquals("1", b[0]);
    assertTrue(b[2].contains("bad.10n:10: IODE (columns 4-22): not a decimal number"), b[2]);
    final String[] missing = run("gnss-terms", "--sp3", dir.resolve("nowhere.sp3").toString(), "--out", dir.toString());
    assertTrue("1".equals(missing[0]) && missing[2].contains("nowhere.sp3: no such file"), missing[2]);
    final String[] est = run("gnss-terms", "--nav", bad.toString(), "--estimate-orbit", bad.toString());
    assertTrue("2".equals(est[0]) && est[2].contains("--estimate-orbit needs --sp3"), est[2]);
  }

  @Test
  void budgetAlongATrajectoryFile() throws Exception {
    final String sp3 = file("2010-07-01", "igs15904.sp3.gz");
    final String[] r = run("budget", "--trajectory", sp3, "--satellite", "G05", "--span-h", "6", "--json");
    assertEquals("0", r[0], r[2]);
    final JsonNode j = new ObjectMapper().readTree(r[1]);
    assertEquals("igs15904.sp3 G05", j.get("label").asText());
    assertEquals(6 * 3600.0, j.get("spanS").asDouble());
    assertEquals(38.6, j.get("referenceSecularRate").asDouble() * 86_400e6, 0.1);
    final String[] noSat = run("budget", "--trajectory", sp3);
    assertTrue("1".equals(noSat[0]) && noSat[2].contains("--satellite: an SP3 trajectory needs a satellite"), noSat[2]);
    final String[] epoch = run("budget", "--trajectory", sp3, "--satellite", "G05", "--epoch", "2010-07-01T00:00:00");
    assertTrue("2".equals(epoch[0]) && epoch[2].contains("takes its epoch and frame from the file"), epoch[2]);
    final String[] table = run("budget", "--sma-km", "26561.75", "--ecc", "0.01", "--span-h", "2");
    assertTrue(table[1].contains("secular rate (smooth part)") && table[1].contains("end offset / span (mean y)"), table[1]);
  }
}
