package org.eigenzeit.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

/** {@code eigenzeit budget --body moon}: against TL and TT, for an orbit and for a surface site. */
class LunarBudgetCommandTest {
  private static String[] run(String... args) {
    return CliRunner.run(args);
  }

  @Test
  void aLunarOrbitIsReportedAgainstTlAndTt() throws Exception {
    final String[] r = run("budget", "--body", "moon", "--sma-km", "1838", "--ecc", "0.01", "--inc-deg", "90",
        "--span-h", "2", "--json");
    assertEquals("0", r[0], r[2]);
    final JsonNode j = new ObjectMapper().readTree(r[1]);
    final JsonNode tt = j.get("againstTt");
    // Against TT the orbiter gains about 6.48e-10 more than against TL (TL - TT's drift).
    assertEquals(6.48e-10, tt.get("referenceMeanRate").asDouble() - j.get("referenceMeanRate").asDouble(), 0.01e-10);
    assertTrue(tt.get("tableMaxErrorS").asDouble() <= tt.get("tableAccuracyS").asDouble() + 2e-13);
    assertTrue(j.get("caution").asText().startsWith("CAUTION"));
    final String[] table = run("budget", "--body", "moon", "--sma-km", "1838", "--span-h", "1");
    assertTrue(table[1].contains("against TT") && table[1].contains("lunar table") && table[1].contains("CAUTION"), table[1]);
  }

  @Test
  void aSurfaceClockIsReportedAgainstTlAndTt() throws Exception {
    final String[] r = run("budget", "--body", "moon", "--surface-site", "0,0,0", "--span-h", "6", "--step-s", "600", "--json");
    assertEquals("0", r[0], r[2]);
    final JsonNode j = new ObjectMapper().readTree(r[1]);
    // Over 6 h the anomalistic-month term of TL - TT (0.47 us) moves the mean rate by up to
    // 2 pi 0.47 us / 27.55 d = 0.107 us/day about its monthly mean (56.02 us/day, LunarBudgetTest).
    assertEquals(56.02, j.get("secondsPerDayTt").asDouble() * 1e6, 0.12);
    assertTrue(Math.abs(j.get("meanRateTl").asDouble()) < 1e-14);
    final String[] table = run("budget", "--body", "moon", "--surface-site", "10,20,100", "--span-h", "2", "--step-s", "600");
    assertTrue(table[1].contains("against TL") && table[1].contains("not run for a surface clock"), table[1]);
    final String[] earth = run("budget", "--surface-site", "0,0,0");
    assertTrue(!"0".equals(earth[0]) && earth[2].contains("--surface-site") && earth[2].contains("--body moon"), earth[2]);
    final String[] lat = run("budget", "--body", "moon", "--surface-site", "95,0,0");
    assertTrue(!"0".equals(lat[0]) && lat[2].contains("--surface-site") && lat[2].contains("allowed -90 to 90"), lat[2]);
    final String[] nan = run("budget", "--body", "moon", "--surface-site", "NaN,0,0");
    assertTrue(!"0".equals(nan[0]) && nan[2].contains("not a decimal number"), nan[2]);
  }
}
