package org.eigenzeit.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;

/** {@code eigenzeit epoch} and {@code eigenzeit cuc} as a user runs them. */
class TimeCommandsTest {
  private static String[] run(String... args) {
    return CliRunner.run(args);
  }

  private static JsonNode json(String... args) throws Exception {
    final String[] r = run(args);
    assertEquals("0", r[0], r[2]);
    return new ObjectMapper().readTree(r[1]);
  }

  private static String scale(JsonNode j, String name) {
    for (JsonNode s : j.get("scales")) {
      if (s.get("scale").asText().equals(name)) {
        return s.get("labels").asText();
      }
    }
    throw new AssertionError("no " + name);
  }

  @Test
  void utcInsideTheLeapSecondOf2016() throws Exception {
    // IERS Bulletin C 52: 2016-12-31T23:59:60 UTC = 2017-01-01T00:00:36 TAI; TT = TAI + 32.184 s.
    final JsonNode j = json("epoch", "2016-12-31T23:59:60.5", "--from", "UTC", "--to", "UTC,TAI,TT,GPS", "--json");
    assertEquals("2016-12-31T23:59:60.500000000", scale(j, "UTC"));
    assertEquals("2017-01-01T00:00:36.500000000", scale(j, "TAI"));
    assertEquals("2017-01-01T00:01:08.684000000", scale(j, "TT"));
    assertEquals("2017-01-01T00:00:17.500000000", scale(j, "GPS"));
    assertTrue(j.get("utcInLeapSecond").asBoolean());
    assertTrue(j.get("caution").asText().startsWith("CAUTION"));
  }

  @Test
  void anEventAtTheMoonInEveryScale() throws Exception {
    final JsonNode j = json("epoch", "2026-10-01T00:00:00", "--from", "TT", "--at", "moon", "--json", "--decimals", "12");
    assertEquals("selenocentre", j.get("event").asText());
    assertEquals(11, j.get("scales").size());
    for (JsonNode s : j.get("scales")) {
      assertTrue(s.get("accuracy").asText().length() > 5, s.toString());
      assertTrue(s.get("relation").asText().length() > 5, s.toString());
    }
    // TL - TT is about 6.48e-10 (TT - T0), about 1.02 s in 2026 (TimeScaleRelationsTest pins it).
    assertTrue(scale(j, "TL").startsWith("2026-10-01T00:00:01.0"), scale(j, "TL"));
    final String[] table = run("epoch", "2026-10-01T00:00:00", "--from", "TT", "--at", "moon");
    assertTrue(table[1].contains("selenocentre") && table[1].contains("CAUTION") && table[1].contains("accuracy:"), table[1]);
  }

  @Test
  void optionsAreCheckedAndNamed() {
    assertRefused("--from", "allowed UTC, TAI", "epoch", "2026-10-01T00:00:00", "--from", "XYZ");
    assertRefused("--decimals", "allowed 0 to 12", "epoch", "2026-10-01T00:00:00", "--decimals", "13");
    assertRefused("--lunar-l", "not a decimal number", "epoch", "2026-10-01T00:00:00", "--lunar-l", "0x1p-35");
    assertRefused("--lunar-l", "out of range", "epoch", "2026-10-01T00:00:00", "--lunar-l", "2e-9");
    assertRefused("--tl0-s", "allowed -1 to 1", "epoch", "2026-10-01T00:00:00", "--tl0-s", "2");
    assertRefused("--at", "allowed earth or moon", "epoch", "2026-10-01T00:00:00", "--at", "mars");
    assertRefused("--to", "unknown time scale", "epoch", "2026-10-01T00:00:00", "--to", "TT,,TAI");
    assertRefused("EPOCH", "day of month", "epoch", "2026-02-30T00:00:00");
    assertRefused("TL", "1999-12-24 to 2040-01-25", "epoch", "2045-01-01T00:00:00", "--from", "TL");
    final String help = run("epoch", "--help")[1];
    assertTrue(help.contains("(default UTC)") && help.contains("(default 9)") && help.contains("-1 to 1"), help);
  }

  private static void assertRefused(String option, String what, String... args) {
    final String[] r = run(args);
    assertTrue(!"0".equals(r[0]) && r[2].contains(option) && r[2].contains(what), String.join(" ", args) + " -> " + r[2]);
  }

  @Test
  void cucLevel1CountsTaiSecondsFrom1958() throws Exception {
    // CCSDS 301.0-B-4 3.2: Level 1 counts TAI seconds from 1958-01-01; days counted by java.time.
    final long seconds = ChronoUnit.DAYS.between(LocalDate.of(1958, 1, 1), LocalDate.of(2026, 10, 1)) * 86_400L + 3_600L;
    final JsonNode j = json("cuc", "encode", "2026-10-01T01:00:00.5", "--from", "TAI", "--p-field", "1E", "--json");
    final String expected = String.format("1E%08X8000", seconds);
    assertEquals(expected, j.get("code").asText());
    assertEquals(4, j.get("coarseOctets").asInt());
    assertEquals(2, j.get("fineOctets").asInt());
    final JsonNode d = json("cuc", "decode", expected, "--p-field", "1E", "--json");
    assertEquals("2026-10-01T01:00:00.500000000", d.get("tai").asText());
    assertEquals("2026-10-01T00:59:23.500000000", d.get("utc").asText());
    // From UTC: the same instant (TAI - UTC = 37 s).
    assertEquals(expected, json("cuc", "encode", "2026-10-01T00:59:23.5", "--from", "UTC", "--p-field", "1E", "--json")
        .get("code").asText());
  }

  @Test
  void cucExtendedAndLevel2Layouts() throws Exception {
    // 7 coarse + 10 fine octets: P-field 0x9F 0x7C (the core's CucCodecTest pins it).
    final JsonNode j = json("cuc", "encode", "2026-10-01T00:00:00", "--p-field", "9F7C", "--json");
    assertEquals(2 + 7 + 10, HexFormat.of().parseHex(j.get("code").asText()).length);
    // Level 2, 1 coarse + 0 fine, agency epoch one minute before: code 0x20 then 60 = 0x3C.
    final JsonNode l2 = json("cuc", "encode", "2026-10-01T00:01:00", "--p-field", "20", "--agency-epoch",
        "2026-10-01T00:00:00", "--json");
    assertEquals("203C", l2.get("code").asText());
    assertEquals(2, l2.get("level").asInt());
    assertRefused("--agency-epoch", "missing", "cuc", "encode", "2026-10-01T00:01:00", "--p-field", "20");
    assertRefused("EPOCH", "does not fit", "cuc", "encode", "2026-10-01T00:10:00", "--p-field", "20", "--agency-epoch",
        "2026-10-01T00:00:00");
    assertRefused("--p-field", "time code ID 000", "cuc", "encode", "2026-10-01T00:00:00", "--p-field", "0E");
    assertRefused("--p-field", "adds no octets", "cuc", "encode", "2026-10-01T00:00:00", "--p-field", "9E00");
    assertRefused("--p-field", "reserved bit", "cuc", "encode", "2026-10-01T00:00:00", "--p-field", "9F7D");
    assertRefused("--p-field", "hex digits", "cuc", "encode", "2026-10-01T00:00:00", "--p-field", "1G");
    assertRefused("CODE", "the P-field names 7", "cuc", "decode", "1E00");
    assertRefused("--p-field", "expected 1A", "cuc", "decode", "1E0000000000", "--p-field", "1A");
    final String[] table = run("cuc", "decode", "1E7A2B3C4D8000");
    assertTrue(table[1].contains("TAI") && table[1].contains("CAUTION"), table[1]);
  }
}
