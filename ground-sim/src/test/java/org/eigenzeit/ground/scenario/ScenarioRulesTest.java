package org.eigenzeit.ground.scenario;

import static org.eigenzeit.ground.scenario.ScenarioTest.error;
import static org.eigenzeit.ground.scenario.ScenarioTest.parse;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Scenario rules that tie one key to another: defaults derived from other values, and refusals of
 * combinations that cannot hold. Each expected value is worked out here from the rule the scenario
 * reference states (docs/scenarios.md) and from outside facts named beside it.
 */
class ScenarioRulesTest {
  private static final String EARTH = "name: x\nspan_h: 1\norbit:\n  sma_km: 7000\n";
  private static final String MOON = "name: m\nspan_h: 3\norbit:\n  body: moon\n  sma_km: 1838\n  ecc: 0.01\n";

  @Test
  void defaultUt1MinusTtFollowsTheLeapSecondsAtTheEpoch() {
    // UT1 - TT defaults to -(32.184 s + (TAI - UTC)) with UT1 - UTC taken as 0. TAI - UTC was 36 s
    // until the leap second at the end of 2016-12-31 and 37 s after it (IERS Bulletin C 52).
    // TT 2017-01-01T00:00:30 is UTC 2016-12-31T23:59:21.816 (TT - TAI = 32.184 s, TAI - UTC = 36 s):
    // still before the leap, so 36 s applies although the TT date is already 2017.
    assertEquals(-68.184, parse("name: x\nspan_h: 1\nepoch: \"2017-01-01T00:00:30\"\norbit:\n  sma_km: 7000\n")
        .timing().ut1MinusTtS(), 1e-12);
    assertEquals(-69.184, parse("name: x\nspan_h: 1\nepoch: \"2017-01-01T00:02:00\"\norbit:\n  sma_km: 7000\n")
        .timing().ut1MinusTtS(), 1e-12);
    assertEquals(-68.184, parse("name: x\nspan_h: 1\ntime_scale: UTC\nepoch: \"2016-12-31T23:59:30\"\norbit:\n"
        + "  sma_km: 7000\n").timing().ut1MinusTtS(), 1e-12);
    assertEquals(-69.184, parse("name: x\nspan_h: 1\ntime_scale: UTC\nepoch: \"2017-01-01T00:00:10\"\norbit:\n"
        + "  sma_km: 7000\n").timing().ut1MinusTtS(), 1e-12);
    assertEquals(-68.5, parse(EARTH + "ut1_minus_tt_s: -68.5\n").timing().ut1MinusTtS(), 0.0);
  }

  @Test
  void theLunarTableCoversTheRunWithAnHourEachSide() {
    final Scenario s = parse(MOON);
    assertEquals(new Scenario.LunarTable(-1, 5, "none"), s.lunarTable(), "from 1 h before the start to 1 h after the end");
    assertEquals(new Scenario.LunarTable(0.5, 3.5, "crc"),
        parse(MOON + "lunar_table:\n  start_h: 0.5\n  damage: crc\n").lunarTable(), "span from start_h to 1 h after the end");
    assertEquals(null, parse(EARTH).lunarTable());
    assertEquals("test.yaml:8: lunar_table.spam: unknown key, found 'spam', allowed damage, span_h, start_h",
        error(MOON + "lunar_table:\n  spam: 1\n"));
    // a refusal of a whole section names the section's first line
    assertTrue(error(EARTH + "lunar_table:\n  start_h: 0\n").startsWith("test.yaml:6: lunar_table: a lunar time table for "
        + "an Earth orbit, found orbit.body earth"), error(EARTH + "lunar_table:\n  start_h: 0\n"));
  }

  @Test
  void servoDefaultsScaleWithTheMeasurements() {
    // track_enter_ns = max(50, 5 sigma), track_exit_ns = max(1000, 100 sigma), coast_after_s = max(60, 3 every_s)
    final ServoSettings small = parse(EARTH).servo();
    assertEquals(50, small.trackEnterNs());
    assertEquals(1000, small.trackExitNs());
    assertEquals(60, small.coastAfterS());
    final ServoSettings large = parse(EARTH + "measurements:\n  sigma_ns: 20\n  every_s: 60\n").servo();
    assertEquals(100, large.trackEnterNs(), 1e-9);
    assertEquals(2000, large.trackExitNs(), 1e-9);
    assertEquals(180, large.coastAfterS(), 1e-9);
    assertEquals(100, parse(EARTH + "servo:\n  time_constant_track_s: 3000\n").servo().timeConstantAcquireS());
    assertEquals(40, parse(EARTH + "servo:\n  time_constant_track_s: 40\n").servo().timeConstantAcquireS());
    assertEquals(40, parse(EARTH + "servo:\n  time_constant_track_s: 40\n  time_constant_acquire_s: 40\n").servo()
        .timeConstantAcquireS(), "acquisition equal to tracking is allowed");
    assertTrue(error(EARTH + "servo:\n  time_constant_track_s: 40\n  time_constant_acquire_s: 41\n")
        .startsWith("test.yaml:7: servo.time_constant_acquire_s: the acquisition time constant exceeds the tracking one"));
    assertTrue(error(EARTH + "servo:\n  coast_after_s: 7200\n  coast_max_h: 1.9\n")
        .startsWith("test.yaml:7: servo.coast_max_h: the longest coast is shorter than the wait before coasting"));
    assertEquals(2, parse(EARTH + "servo:\n  coast_after_s: 7200\n  coast_max_h: 2\n").servo().coastMaxH(),
        "a longest coast equal to the wait is allowed");
  }

  @Test
  void outagesMustLieInTheRunAndHaveALength() {
    assertEquals(1800.0, parse(EARTH + "measurements:\n  outage_start_h: 0.5\n  outage_length_h: 0.25\n")
        .measurements().outageStartS());
    assertEquals(900.0, parse(EARTH + "measurements:\n  outage_start_h: 0.5\n  outage_length_h: 0.25\n")
        .measurements().outageLengthS());
    assertEquals(0.0, parse(EARTH + "measurements:\n  outage_start_h: 0\n  outage_length_h: 0.25\n")
        .measurements().outageStartS(), "an outage may start with the run");
    assertTrue(error(EARTH + "measurements:\n  outage_start_h: 1\n  outage_length_h: 0.25\n")
        .startsWith("test.yaml:6: measurements.outage_start_h: the outage starts after the run ends, found 1 h"));
    assertTrue(error(EARTH + "measurements:\n  outage_start_h: -0.5\n")
        .startsWith("test.yaml:6: measurements.outage_start_h: not a start time, found -0.5"));
    assertTrue(error(EARTH + "measurements:\n  outage_start_h: 0.5\n")
        .startsWith("test.yaml:6: measurements.outage_length_h: an outage needs a length"));
    assertTrue(error(EARTH + "measurements:\n  outage_length_h: 2\n")
        .startsWith("test.yaml:6: measurements.outage_length_h: an outage length without a start, found 2 h"));
    assertEquals(2e-9, parse(EARTH + "measurements:\n  sigma_ns: 2\n").measurements().sigmaS(), 1e-24);
  }

  @Test
  void thePerigeeMustClearTheBody() {
    // Earth: the core's smallest orbit radius is the equatorial radius less 30 km, 6348.1363 km
    assertEquals("test.yaml:5: orbit.ecc: the perigee is below the body's surface, found perigee radius 6300 km from "
        + "sma_km = 7000 and ecc = 0.1, allowed a perigee radius of at least 6348 km",
        error(EARTH + "  ecc: 0.1\n"));
    assertEquals(0.09, parse(EARTH + "  ecc: 0.09\n").orbit().elements().ecc(), "perigee 6370 km");
  }

  @Test
  void textIsLimitedTo400Characters() {
    assertEquals(400, parse(EARTH + "description: " + "d".repeat(400) + "\n").description().length());
    assertTrue(error(EARTH + "description: " + "d".repeat(401) + "\n")
        .startsWith("test.yaml:5: description: text too long, found 401 characters, allowed up to 400"));
  }

  @Test
  void anExternalTrajectoryTakesOnlyItsOwnKeys() {
    assertTrue(error("name: x\nspan_h: 1\norbit:\n  trajectory:\n    format: oem\n    flie: a.oem\n")
        .startsWith("test.yaml:6: orbit.trajectory.flie: unknown key, found 'flie'"));
  }
}
