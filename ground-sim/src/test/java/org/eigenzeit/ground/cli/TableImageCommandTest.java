package org.eigenzeit.ground.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** {@code eigenzeit table-image} as a user runs it. */
class TableImageCommandTest {
  @TempDir
  Path dir;

  private static String[] run(String... args) {
    final CommandLine cl = Main.commandLine();
    final StringWriter out = new StringWriter();
    final StringWriter err = new StringWriter();
    cl.setOut(new PrintWriter(out));
    cl.setErr(new PrintWriter(err));
    final int code = cl.execute(args);
    return new String[] {Integer.toString(code), out.toString(), err.toString()};
  }

  @Test
  void writesTheServoImageOfASpecification() throws Exception {
    final Path spec = dir.resolve("servo.yaml");
    Files.writeString(spec, "table: servo\nbase: typical-rubidium\n");
    final Path out = dir.resolve("img/servo.img");
    final String[] r = run("table-image", spec.toString(), "--out", out.toString());
    assertEquals("0", r[0], r[2]);
    final byte[] expected = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(ServoParameters.typicalRubidium(), expected, 0));
    assertArrayEquals(expected, Files.readAllBytes(out));
    assertTrue(r[1].startsWith("table SERVO: 236 bytes, CRC-32C ") && r[1].contains("CAUTION"), r[1]);
  }

  @Test
  void writesTheServoImageOfAScenario() throws Exception {
    final Path scenario = dir.resolve("mission.yaml");
    Files.writeString(scenario, "name: table-test\norbit:\n  sma_km: 7000\n");
    final Path out = dir.resolve("servo.img");
    final String[] r = run("table-image", "--scenario", scenario.toString(), "--out", out.toString());
    assertEquals("0", r[0], r[1] + r[2]);
    assertEquals(ServoParameters.TABLE_BYTES, Files.size(out));
  }

  @Test
  void writesTheLunarTimeTableFittedAlongDe405() throws Exception {
    final Path spec = dir.resolve("lunar.yaml");
    Files.writeString(spec, "table: lunar-time\nstart_tt: 2026-10-01T00:00:00\nspan_days: 7\ntable_id: 42\n");
    final Path out = dir.resolve("lunar.img");
    final String[] r = run("table-image", spec.toString(), "--out", out.toString());
    assertEquals("0", r[0], r[2]);
    assertTrue(r[1].startsWith("table LUNAR_TIME: ") && r[1].contains("stated accuracy") && r[1].contains("CAUTION"), r[1]);
    final byte[] framed = Files.readAllBytes(out);
    // The uplink frame: 8-byte header, the table, CRC-32C over all before it (big-endian).
    final java.util.zip.CRC32C crc = new java.util.zip.CRC32C();
    crc.update(framed, 0, framed.length - 4);
    assertEquals((int) crc.getValue(), java.nio.ByteBuffer.wrap(framed, framed.length - 4, 4).getInt());
    final org.eigenzeit.onboard.table.UplinkTable uplink = new org.eigenzeit.onboard.table.UplinkTable(
        new org.eigenzeit.onboard.lunartime.LunarTimeLayout());
    assertEquals(Status.OK, uplink.load(framed, 0, framed.length), "the core's uplink mechanism accepts the file");
    final byte[] ezlt = java.util.Arrays.copyOfRange(framed, 8, framed.length - 4);
    final org.eigenzeit.onboard.lunartime.LunarTimeTable table = new org.eigenzeit.onboard.lunartime.LunarTimeTable();
    assertEquals(Status.OK, table.load(ezlt, 0, ezlt.length));
    assertEquals(42L, table.tableId());
    // Outside the table: the ground's numerical TL - TT along DE405 at the Moon's centre.
    final org.eigenzeit.ground.timescale.TimeScaleConverter conv = org.eigenzeit.ground.timescale.TimeScaleConverter
        .shipped(org.eigenzeit.ground.timescale.LunarTimeDefinition.DEFAULT);
    final org.eigenzeit.onboard.lunartime.LunarTimeOffset o = new org.eigenzeit.onboard.lunartime.LunarTimeOffset();
    final double[] zero = new double[3];
    final long start = 844_128_000L - 43_200L; // 2026-10-01T00:00:00 TT, s since J2000.0
    double worst = 0;
    for (double t = 0; t <= 7 * 86_400; t += 3_607) {
      final org.eigenzeit.onboard.time.SplitTime tt = org.eigenzeit.onboard.time.SplitTime.of(start, 0.0);
      assertEquals(Status.OK, tt.addSeconds(t));
      assertEquals(Status.OK, table.evaluate(tt, zero, zero, o));
      final double ground = conv.convert(org.eigenzeit.ground.timescale.TimeScale.TT, tt, false,
          org.eigenzeit.ground.timescale.Centre.MOON).labels().get(org.eigenzeit.ground.timescale.TimeScale.TL).secondsSince(tt);
      worst = Math.max(worst, Math.abs(o.centreTlMinusTtS() - ground));
    }
    assertTrue(worst <= 1e-12, "table written by the command against the ground relation: " + worst);
    final org.eigenzeit.onboard.time.SplitTime after = org.eigenzeit.onboard.time.SplitTime.of(start + 7 * 86_400 + 1, 0.0);
    assertEquals(Status.OUT_OF_RANGE, table.evaluate(after, zero, zero, o), "the span ends where the spec says");

    final String[][] bad = {
        {"start_tt: 2045-01-01T00:00:00\nspan_days: 7", "key 'start_tt'"},
        {"start_tt: 2026-10-01T00:00:00\nspan_days: 65", "key 'span_days'"},
        {"start_tt: 2026-10-01T00:00:00", "key 'span_days'"},
        {"start_tt: 2026-13-01T00:00:00\nspan_days: 7", "start_tt"},
        {"start_tt: 2026-10-01T00:00:00\nspan_days: 7\ntarget_ps: 0.01", "key 'target_ps'"},
        {"start_tt: 2026-10-01T00:00:00\nspan_days: 7\nlunar_l: -1", "key 'lunar_l'"},
        {"start_tt: 2026-10-01T00:00:00\nspan_days: 7\ntable_id: 1.5", "key 'table_id'"},
        {"start_tt: 2026-10-01T00:00:00\nspan_days: 7\nsegments: 2", "key 'segments'"},
    };
    for (String[] b : bad) {
      Files.writeString(spec, "table: lunar-time\n" + b[0] + "\n");
      final Path none = dir.resolve("refused.img");
      final String[] f = run("table-image", spec.toString(), "--out", none.toString());
      assertEquals("1", f[0], b[0] + ": " + f[1] + f[2]);
      assertTrue(f[2].contains(spec.toString()) && f[2].contains(b[1]), b[0] + ": " + f[2]);
      assertFalse(Files.exists(none), b[0]);
    }
  }

  @Test
  void refusesWithTheFileAndKeyAndWritesNothing() throws Exception {
    final Path spec = dir.resolve("bad.yaml");
    Files.writeString(spec, "table: servo\nbase: typical-rubidium\nfields:\n  steer_max: 1\n");
    final Path out = dir.resolve("bad.img");
    final String[] r = run("table-image", spec.toString(), "--out", out.toString());
    assertEquals("1", r[0]);
    assertTrue(r[2].startsWith("eigenzeit table-image: " + spec + ": key 'fields.steer_max': found 1.0, allowed"),
        r[2]);
    assertFalse(Files.exists(out));
    assertEquals("2", run("table-image", "--out", out.toString())[0], "neither a specification nor a scenario: a usage error");
    assertTrue(run("table-image", dir.resolve("none.yaml").toString(), "--out", out.toString())[2]
        .contains("no such file"));
  }
}
