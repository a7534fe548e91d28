package org.eigenzeit.onboard.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.status.Status;
import org.junit.jupiter.api.Test;

/** The servo table's layout and content rules through the uplink mechanism. */
class ServoParametersTest {
  private final ServoParameters p = new ServoParameters();
  private final UplinkTable uplink = new UplinkTable(p);
  private final TableStatus status = new TableStatus();

  static byte[] encoded(double[] v) {
    final byte[] b = new byte[ServoParameters.TABLE_BYTES];
    assertEquals(Status.OK, ServoParameters.encode(v, b, 0));
    return b;
  }

  @Test
  void loadValidateActivate() {
    assertFalse(p.isActive());
    assertEquals(Status.NOT_READY, uplink.activate());
    final byte[] b = encoded(ServoParameters.typicalRubidium());
    assertEquals(236, b.length, "8 header + 28 doubles + 4 CRC bytes");
    assertEquals(Status.OK, uplink.load(b, 0, b.length));
    assertFalse(p.isActive(), "validated, not yet active");
    assertEquals(Status.OK, uplink.activate());
    assertTrue(p.isActive());
    assertEquals(3000.0, p.get(ServoParameters.F_TIME_CONSTANT_TRACK_S), 0);
    assertEquals(1, p.activations());
    assertEquals(Status.NOT_READY, uplink.activate()); // nothing staged any more
  }

  @Test
  void refusedTablesNeverReplaceTheActiveOne() {
    final byte[] good = encoded(ServoParameters.typicalRubidium());
    assertEquals(Status.OK, uplink.load(good, 0, good.length));
    assertEquals(Status.OK, uplink.activate());
    final double[] bad = ServoParameters.typicalRubidium();
    bad[ServoParameters.F_GATE_SIGMA] = 1000;
    final byte[] range = encoded(bad);
    assertEquals(Status.OUT_OF_RANGE, uplink.load(range, 0, range.length));
    assertEquals(ServoParameters.F_GATE_SIGMA, uplink.lastFailedItem());
    final double[] incons = ServoParameters.typicalRubidium();
    incons[ServoParameters.F_TRACK_EXIT_S] = incons[ServoParameters.F_TRACK_ENTER_S];
    final byte[] hyst = encoded(incons);
    assertEquals(Status.OUT_OF_RANGE, uplink.load(hyst, 0, hyst.length));
    assertEquals(ServoParameters.FIELD_COUNT, uplink.lastFailedItem(), "a rule across fields");
    final double[] nan = ServoParameters.typicalRubidium();
    nan[ServoParameters.F_SIGMA_SOURCE0] = Double.NaN;
    final byte[] nanTable = encoded(nan);
    assertEquals(Status.NOT_FINITE, uplink.load(nanTable, 0, nanTable.length));
    assertEquals(ServoParameters.F_SIGMA_SOURCE0, uplink.lastFailedItem());
    final double[] coast = ServoParameters.typicalRubidium();
    coast[ServoParameters.F_COAST_MAX_S] = coast[ServoParameters.F_COAST_AFTER_S] * 0.5;
    final byte[] coastTable = encoded(coast);
    assertEquals(Status.OUT_OF_RANGE, uplink.load(coastTable, 0, coastTable.length));
    final double[] tc = ServoParameters.typicalRubidium();
    tc[ServoParameters.F_TIME_CONSTANT_ACQUIRE_S] = tc[ServoParameters.F_TIME_CONSTANT_TRACK_S] * 2;
    final byte[] tcTable = encoded(tc);
    assertEquals(Status.OUT_OF_RANGE, uplink.load(tcTable, 0, tcTable.length));
    assertEquals(Status.NOT_READY, uplink.activate());
    assertEquals(1000.0, ServoParameters.max(ServoParameters.F_PHASE_JUMP_COUNT), 0.0);
    assertEquals(2.0, ServoParameters.min(ServoParameters.F_GATE_SIGMA), 0.0);
    assertEquals("gate_sigma", ServoParameters.fieldName(ServoParameters.F_GATE_SIGMA));
    assertEquals(3000.0, p.get(ServoParameters.F_TIME_CONSTANT_TRACK_S), 0);
    uplink.status(status);
    assertEquals(6, status.loads());
    assertEquals(5, status.rangeFailures());
    assertEquals(1, status.activations());
    assertTrue(status.active());
  }

  @Test
  void encoderRefusesWrongInput() {
    assertEquals(Status.BUFFER_TOO_SMALL, ServoParameters.encode(new double[3], new byte[300], 0));
    assertEquals(Status.BUFFER_TOO_SMALL, ServoParameters.encode(ServoParameters.typicalRubidium(), new byte[300], -1));
    assertEquals(Status.BUFFER_TOO_SMALL,
        ServoParameters.encode(ServoParameters.typicalRubidium(), new byte[ServoParameters.TABLE_BYTES], 1));
    final byte[] good = encoded(ServoParameters.typicalRubidium());
    final byte[] count = good.clone();
    count[7] ^= 0x01; // header count 29
    assertEquals(Status.MALFORMED, uplink.load(count, 0, count.length));
  }
}
