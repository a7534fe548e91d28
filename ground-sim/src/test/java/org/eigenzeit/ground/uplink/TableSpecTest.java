package org.eigenzeit.ground.uplink;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eigenzeit.onboard.corrector.ClockCorrector;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.gravity.GravityTable;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Table specifications in YAML to uplink images: each image loads into the core; each fault names its key. */
class TableSpecTest {
  @TempDir
  Path dir;

  private Path write(String name, String text) throws IOException {
    final Path p = dir.resolve(name);
    Files.writeString(p, text, StandardCharsets.UTF_8);
    return p;
  }

  private String refused(String yaml) throws IOException {
    final Path p = write("spec.yaml", yaml);
    return assertThrows(UplinkInputException.class, () -> TableSpec.read(p)).getMessage();
  }

  private static void loads(TableSpec.Image image, ModelConfig config) {
    final ClockCorrector c = new ClockCorrector(config, true, false);
    final byte[] b = image.bytes();
    assertEquals(Status.OK, c.loadTable(image.tableId(), b, 0, b.length));
    assertEquals(Status.OK, c.activateTable(image.tableId()));
    // the CRC the command prints for the operator is the one the core reports for the active table
    // and the one the frame carries in its last four bytes
    final org.eigenzeit.onboard.table.TableStatus st = new org.eigenzeit.onboard.table.TableStatus();
    assertEquals(Status.OK, c.tableStatus(image.tableId(), st));
    assertEquals(st.activeCrc(), image.crc());
    final java.util.zip.CRC32C independent = new java.util.zip.CRC32C();
    independent.update(b, 0, b.length - 4);
    assertEquals((int) independent.getValue(), image.crc());
    assertTrue(image.crc() != 0);
  }

  @Test
  void servoFromBaseAndFields() throws IOException {
    final TableSpec.Image image = TableSpec.read(write("servo.yaml",
        "table: servo\nbase: typical-rubidium\nfields:\n  gate_sigma: 5\n  time_constant_track_s: 2000\n"));
    final double[] v = ServoParameters.typicalRubidium();
    v[ServoParameters.F_GATE_SIGMA] = 5;
    v[ServoParameters.F_TIME_CONSTANT_TRACK_S] = 2000;
    final byte[] expected = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(v, expected, 0));
    assertArrayEquals(expected, image.bytes());
    assertEquals(TableId.SERVO, image.tableId());
    loads(image, ModelConfig.builder().level(ModelLevel.J2).build());
  }

  @Test
  void servoFaultsNameTheirKey() throws IOException {
    String m = refused("table: servo\nbase: typical-rubidium\nfields:\n  gate_sigma: 1000\n");
    assertTrue(m.endsWith("spec.yaml: key 'fields.gate_sigma': found 1000.0, allowed 2.0 .. 100.0"), m);
    m = refused("table: servo\nfields:\n  gate_sigma: 6\n");
    assertTrue(m.contains("key 'fields.sigma_white_fm': found nothing"), m);
    m = refused("table: servo\nbase: typical-rubidium\nfields:\n  gate_sigmaa: 6\n");
    assertTrue(m.contains("key 'fields.gate_sigmaa': found an unknown field"), m);
    m = refused("table: servo\nbase: typical-rubidium\nfields:\n  gate_sigma: 6\n  gate_sigma: 7\n");
    assertTrue(m.contains("not valid YAML") && m.contains("gate_sigma"), "duplicate key: " + m);
    m = refused("table: servo\nbase: typical-rubidium\n---\ntable: gravity\n");
    assertTrue(m.contains("2 YAML documents, allowed exactly one"), m);
    m = refused("table: servo\nbase: typical-rubidium\nfields:\n  gate_sigma: .nan\n");
    assertTrue(m.contains("spec.yaml:4: not valid YAML"), m);
    m = refused("table: servo\nbase: typical-rubidium\nfields:\n  gate_sigma: \"NaN\"\n");
    assertTrue(m.contains("key 'fields.gate_sigma': found \"NaN\", allowed a finite decimal number"), m);
    m = refused("table: servo\nbase: typical-rubidium\nfields:\n  gate_sigma: 1e400\n");
    assertTrue(m.contains("key 'fields.gate_sigma'") && m.contains("a finite decimal number"), "overflow: " + m);
    m = refused("table: servo\nbase: typical-rubidium\nfields:\n  track_exit_s: 1e-8\n");
    assertTrue(m.contains("thresholds that contradict each other"), m);
    m = refused("table: servo\nbase: other\n");
    assertTrue(m.contains("key 'base': found 'other', allowed typical-rubidium"), m);
    m = refused("table: clock\n");
    assertTrue(m.contains("key 'table': found 'clock', allowed servo, gravity, leap-seconds or lunar-time"), m);
    m = refused("table: lunar-time\nstart_tt: 2026-10-01T00:00:00\nspan_days: 7\n");
    assertTrue(m.contains("key 'table': found 'lunar-time'") && m.contains("command line's table-image"), m);
    m = refused("table: servo\nbase: typical-rubidium\nextra: 1\n");
    assertTrue(m.contains("key 'extra': found an unknown key"), m);
    m = refused("- table\n");
    assertTrue(m.contains("must be a YAML mapping"), m);
  }

  @Test
  void gravityFromTheShippedFieldAndFromAFile() throws IOException {
    final TableSpec.Image shipped = TableSpec.read(write("g.yaml",
        "table: gravity\ncoefficients: shipped-egm96\ndegree: 8\n"));
    final byte[] expected = new byte[GravityTable.imageBytesFor(8)];
    assertEquals(Status.OK, GravityTable.encode(GravityField.egm96(8), expected, 0));
    assertArrayEquals(expected, shipped.bytes());
    loads(shipped, ModelConfig.builder().level(ModelLevel.HARMONICS).degree(8).build());
    write("j2.txt", "# invented J2-only field for the test\n2 0 -4.84165371736E-04 0.0\n2 1 0 0\n2 2 0 0\n3 0 9 9\n");
    final TableSpec.Image file = TableSpec.read(write("g2.yaml", "table: gravity\ncoefficients: j2.txt\ndegree: 2\n"
        + "gm_m3_per_s2: 3.986004415e14\nradius_m: 6378136.3\n"));
    loads(file, ModelConfig.builder().level(ModelLevel.HARMONICS).degree(2).build());
    write("gap.txt", "2 0 -4.8e-4 0\n2 2 0 0\n");
    String m = refused("table: gravity\ncoefficients: gap.txt\ndegree: 2\ngm_m3_per_s2: 3.986004415e14\nradius_m: 6378136.3\n");
    assertTrue(m.contains("gap.txt:3: coefficient (2, 1) missing"), m);
    write("nan.txt", "2 0 NaN 0\n2 1 0 0\n2 2 0 0\n");
    m = refused("table: gravity\ncoefficients: nan.txt\ndegree: 2\ngm_m3_per_s2: 3.986004415e14\nradius_m: 6378136.3\n");
    assertTrue(m.contains("nan.txt:1: C 'NaN', allowed a finite decimal number"), m);
    write("dup.txt", "2 0 -4.8e-4 0\n2 1 0 0\n2 1 0 0\n2 2 0 0\n");
    m = refused("table: gravity\ncoefficients: dup.txt\ndegree: 2\ngm_m3_per_s2: 3.986004415e14\nradius_m: 6378136.3\n");
    assertTrue(m.contains("dup.txt:3: coefficient (2, 1) again, found at line 2 already"), m);
    m = refused("table: gravity\ncoefficients: j2.txt\ndegree: 2\ngm_m3_per_s2: 4.9e12\nradius_m: 1738000\n");
    assertTrue(m.contains("key 'gm_m3_per_s2'") && m.contains("within 1 % of the Earth's"), "a lunar field: " + m);
    m = refused("table: gravity\ncoefficients: shipped-egm96\ndegree: 8.5\n");
    assertTrue(m.contains("key 'degree': found 8.5, allowed a whole number 2 .. 90"), m);
  }

  @Test
  void leapSecondsFromTheList() throws IOException {
    write("leap-seconds.list", LeapSecondsListTest.real());
    final TableSpec.Image image = TableSpec.read(write("l.yaml", "table: leap-seconds\nlist: leap-seconds.list\n"));
    assertEquals(TableId.LEAP_SECONDS, image.tableId());
    loads(image, ModelConfig.builder().level(ModelLevel.J2).build());
    refusedWith("table: leap-seconds\nlist: leap-seconds.list\nexpires: 2030-01-01\n", "expires");
  }

  private void refusedWith(String yaml, String fragment) throws IOException {
    final String m = refused(yaml);
    assertTrue(m.contains(fragment), m);
  }

  @Test
  void eachTableTakesOnlyItsOwnKeys() throws IOException {
    refusedWith("table: gravity\ncoefficients: shipped-egm96\ndegree: 8\ndegre: 9\n", "degre");
    // the shipped EGM96 ends at degree 36 and carries its own GM and radius
    refusedWith("table: gravity\ncoefficients: shipped-egm96\ndegree: 37\n", "shipped-egm96 with degree 37");
    refusedWith("table: gravity\ncoefficients: shipped-egm96\ndegree: 8\nradius_m: 6378136.3\n",
        "shipped-egm96 with degree 8 or its own GM/radius");
    assertEquals(TableId.GRAVITY, TableSpec.read(write("g36.yaml", "table: gravity\ncoefficients: shipped-egm96\n"
        + "degree: 36\n")).tableId());
  }
}
