package org.eigenzeit.onboard.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32C;
import org.eigenzeit.onboard.status.Status;
import org.junit.jupiter.api.Test;

/** The servo table: CRC-32C with its published check value, load, validate, activate. */
class ServoParametersTest {
  @Test
  void crc32cPublishedCheckValue() {
    // CRC-32C (Castagnoli), RFC 3720 appendix B.4 / CRC catalogue: "123456789" -> 0xE3069283.
    final CRC32C c = new CRC32C();
    c.update("123456789".getBytes(StandardCharsets.US_ASCII));
    assertEquals(0xE3069283L, c.getValue());
  }

  static byte[] encoded(double[] v) {
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(v, b, 0));
    return b;
  }

  @Test
  void loadValidateActivate() {
    final ServoParameters p = new ServoParameters();
    assertFalse(p.isActive());
    assertEquals(Status.NOT_READY, p.activate());
    final byte[] b = encoded(ServoParameters.typicalRubidium());
    assertEquals(Status.OK, p.load(b, 0, b.length));
    assertFalse(p.isActive());
    assertEquals(Status.OK, p.activate());
    assertTrue(p.isActive());
    assertEquals(3000.0, p.get(ServoParameters.F_TIME_CONSTANT_TRACK_S), 0);
    assertEquals(1, p.activations());
    assertEquals(Status.NOT_READY, p.activate()); // nothing staged any more
  }

  @Test
  void corruptedOrOutOfRangeTablesNeverReplaceTheActiveOne() {
    final ServoParameters p = new ServoParameters();
    final byte[] good = encoded(ServoParameters.typicalRubidium());
    p.load(good, 0, good.length);
    p.activate();
    final byte[] flipped = good.clone();
    flipped[40] ^= 0x01;
    assertEquals(Status.CHECKSUM_MISMATCH, p.load(flipped, 0, flipped.length));
    assertEquals(1, p.crcFailures());
    final double[] bad = ServoParameters.typicalRubidium();
    bad[ServoParameters.F_GATE_SIGMA] = 1000;
    final byte[] range = encoded(bad);
    assertEquals(Status.OUT_OF_RANGE, p.load(range, 0, range.length));
    assertEquals(ServoParameters.F_GATE_SIGMA, p.lastFailedField());
    final double[] incons = ServoParameters.typicalRubidium();
    incons[ServoParameters.F_TRACK_EXIT_S] = incons[ServoParameters.F_TRACK_ENTER_S];
    final byte[] hyst = encoded(incons);
    assertEquals(Status.OUT_OF_RANGE, p.load(hyst, 0, hyst.length));
    assertEquals(ServoParameters.FIELD_COUNT, p.lastFailedField());
    final double[] nan = ServoParameters.typicalRubidium();
    nan[ServoParameters.F_SIGMA_SOURCE0] = Double.NaN;
    final byte[] nanTable = encoded(nan);
    assertEquals(Status.OUT_OF_RANGE, p.load(nanTable, 0, nanTable.length));
    final byte[] magic = good.clone();
    magic[0] = 0;
    assertEquals(Status.MALFORMED, p.load(magic, 0, magic.length));
    assertEquals(Status.BUFFER_TOO_SMALL, p.load(good, 0, good.length - 1));
    assertEquals(Status.BUFFER_TOO_SMALL, p.load(good, 1, good.length));
    assertEquals(Status.NOT_READY, p.activate());
    assertEquals(3000.0, p.get(ServoParameters.F_TIME_CONSTANT_TRACK_S), 0);
    assertEquals(1, p.activations());
    assertEquals(3, p.rangeFailures());
    assertEquals(Status.BUFFER_TOO_SMALL, p.lastLoadStatus());
    assertEquals(8, p.loads());
    assertEquals(Status.BUFFER_TOO_SMALL, ServoParameters.encode(new double[3], new byte[300], 0));
  }

  @Test
  void everyConsistencyRuleAndLayoutCheckRefuses() {
    final ServoParameters p = new ServoParameters();
    final double[] coast = ServoParameters.typicalRubidium();
    coast[ServoParameters.F_COAST_MAX_S] = coast[ServoParameters.F_COAST_AFTER_S] * 0.5;
    final byte[] coastTable = encoded(coast);
    assertEquals(Status.OUT_OF_RANGE, p.load(coastTable, 0, coastTable.length));
    assertEquals(ServoParameters.FIELD_COUNT, p.lastFailedField());
    final double[] tc = ServoParameters.typicalRubidium();
    tc[ServoParameters.F_TIME_CONSTANT_ACQUIRE_S] = tc[ServoParameters.F_TIME_CONSTANT_TRACK_S] * 2;
    final byte[] tcTable = encoded(tc);
    final int st = p.load(tcTable, 0, tcTable.length);
    assertEquals(Status.OUT_OF_RANGE, st);
    assertEquals(ServoParameters.FIELD_COUNT, p.lastFailedField());
    final byte[] good = encoded(ServoParameters.typicalRubidium());
    final byte[] version = good.clone();
    version[5] ^= 0x01; // layout word: version << 16 | field count
    assertEquals(Status.MALFORMED, p.load(version, 0, version.length));
    assertEquals(Status.BUFFER_TOO_SMALL, p.load(good, -1, good.length));
    assertEquals(Status.BUFFER_TOO_SMALL, ServoParameters.encode(ServoParameters.typicalRubidium(), new byte[300], -1));
    assertEquals(Status.BUFFER_TOO_SMALL,
        ServoParameters.encode(ServoParameters.typicalRubidium(), new byte[ServoParameters.TABLE_BYTES], 1));
    assertEquals(Status.NOT_READY, p.activate());
  }
}
