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
