package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.zip.CRC32C;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.gravity.GravityTable;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.table.TableStatus;
import org.eigenzeit.onboard.time.LeapImages;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.tracker.ProperTimeTracker;
import org.junit.jupiter.api.Test;

/** Every table the host's one object owns: reachable, validated, effective only when activated, reported. */
class CorrectorTablesTest {
  private static final ModelConfig CONFIG = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(8).tides(false)
      .build();

  private static byte[] image(GravityField f) {
    final byte[] b = new byte[GravityTable.imageBytesFor(f.degree())];
    assertEquals(Status.OK, GravityTable.encode(f, b, 0));
    return b;
  }

  private static int crc(byte[] image) {
    final CRC32C c = new CRC32C();
    c.update(image, 0, image.length - 4);
    return (int) c.getValue();
  }

  /** EGM96 to degree 8 with C20 moved by 1e-8 (an invented field for the test). */
  private static GravityField changed() {
    final GravityField egm = GravityField.egm96(8);
    final GravityField.Builder b = GravityField.builder(egm.gmM3PerS2(), egm.radiusM(), 8);
    for (int n = 2; n <= 8; n++) {
      for (int m = 0; m <= n; m++) {
        b.set(n, m, egm.c(n, m) + (n == 2 && m == 0 ? 1e-8 : 0.0), egm.s(n, m));
      }
    }
    return b.build();
  }

  private static double rateAfterCycle(ClockCorrector c, long t) {
    final OrbitSample s = new OrbitSample();
    final SplitTime raw = SplitTime.of(850_000_000L + t, 0.0);
    final double a = 7.0e6;
    final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (a * a * a));
    s.set(raw, OrbitSample.FRAME_INERTIAL, a * Math.cos(n * t), 0, a * Math.sin(n * t), -n * a * Math.sin(n * t), 0,
        n * a * Math.cos(n * t), true);
    assertEquals(Status.NOT_READY, c.cycle(raw, s, null), "no servo table: the servo waits");
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    return hk.modelRate();
  }

  @Test
  void gravityFieldTakesEffectOnlyWhenActivatedAndIsAlwaysReported() {
    final ClockCorrector c = new ClockCorrector(CONFIG, true, false);
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    final TableStatus g = hk.table(TableId.GRAVITY);
    assertTrue(g.active());
    assertEquals(crc(image(GravityField.egm96(8))), g.activeCrc(), "the configured field is the first image");
    assertEquals(1, g.loads());
    assertEquals(1, g.activations());
    final double before = rateAfterCycle(c, 0);
    final byte[] next = image(changed());
    assertEquals(Status.OK, c.loadTable(TableId.GRAVITY, next, 0, next.length));
    final ClockCorrector reference = new ClockCorrector(CONFIG, true, false);
    assertEquals(before, rateAfterCycle(reference, 0), 0.0);
    assertEquals(rateAfterCycle(reference, 1), rateAfterCycle(c, 1), 0.0, "staged, not active: the model is unchanged");
    assertEquals(Status.OK, c.activateTable(TableId.GRAVITY));
    final double after = rateAfterCycle(c, 2);
    assertNotEquals(rateAfterCycle(reference, 2), after, "activated: the model uses the new field");
    final ProperTimeTracker direct = new ProperTimeTracker(CONFIG.toBuilder().field(changed()).build());
    final OrbitSample s = new OrbitSample();
    final double a = 7.0e6;
    final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (a * a * a));
    s.set(SplitTime.of(850_000_002L, 0.0), OrbitSample.FRAME_INERTIAL, a * Math.cos(n * 2), 0, a * Math.sin(n * 2),
        -n * a * Math.sin(n * 2), 0, n * a * Math.cos(n * 2), true);
    assertEquals(Status.OK, direct.step(SplitTime.of(850_000_002L, 0.0), s));
    assertEquals(direct.fractionalFrequency(), after, 0.0, "the uplinked field gives the same bits as a configured one");
    c.housekeeping(hk);
    assertEquals(crc(next), hk.table(TableId.GRAVITY).activeCrc());
    assertEquals(2, hk.table(TableId.GRAVITY).activations());
  }

  @Test
  void lowerLevelsHoldNoFieldAndRefuseOne() {
    final ClockCorrector c = new ClockCorrector(ModelConfig.builder().level(ModelLevel.J2).build(), true, false);
    final byte[] img = image(GravityField.egm96(4));
    assertEquals(Status.CAPACITY_EXCEEDED, c.loadTable(TableId.GRAVITY, img, 0, img.length));
    final TableStatus s = new TableStatus();
    assertEquals(Status.OK, c.tableStatus(TableId.GRAVITY, s));
    assertFalse(s.active());
    assertEquals(1, s.formatFailures());
  }

  @Test
  void leapTableIsReachableFromTheHostObject() {
    final ClockCorrector c = new ClockCorrector(CONFIG, true, false);
    final SplitTime utc = SplitTime.of(850_000_000L, 0.0);
    final SplitTime tai = new SplitTime();
    assertEquals(Status.NOT_READY, c.leapSeconds().utcToTai(utc, tai));
    final byte[] img = LeapImages.real();
    assertEquals(Status.OK, c.loadTable(TableId.LEAP_SECONDS, img, 0, img.length));
    assertEquals(Status.OK, c.activateTable(TableId.LEAP_SECONDS));
    assertEquals(Status.OK, c.leapSeconds().utcToTai(utc, tai));
    assertEquals(37.0, tai.secondsSince(utc), 0.0, "TAI - UTC in 2026 (IERS Bulletin C)");
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertEquals(crc(img), hk.table(TableId.LEAP_SECONDS).activeCrc());
  }

  @Test
  void aConfiguredFieldOfAnotherBodyIsRefusedAtConstruction() {
    final GravityField egm = GravityField.egm96(4);
    final GravityField wrong = GravityField.builder(egm.gmM3PerS2() * 1.05, egm.radiusM(), 4).set(2, 0, egm.c(2, 0), 0)
        .build();
    org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
        () -> new ClockCorrector(ModelConfig.builder().degree(4).field(wrong).build(), true, false));
  }

  @Test
  void unknownTablesAreRefusedWithoutAnException() {
    final ClockCorrector c = new ClockCorrector(CONFIG, true, false);
    final byte[] img = LeapImages.real();
    assertEquals(Status.OUT_OF_RANGE, c.loadTable(TableId.COUNT, img, 0, img.length));
    assertEquals(Status.OUT_OF_RANGE, c.loadTable(-1, img, 0, img.length));
    assertEquals(Status.OUT_OF_RANGE, c.activateTable(TableId.COUNT));
    assertEquals(Status.OUT_OF_RANGE, c.activateTable(-1));
    assertEquals(Status.OUT_OF_RANGE, c.tableStatus(-1, new TableStatus()));
    assertEquals(Status.OUT_OF_RANGE, c.tableStatus(TableId.COUNT, new TableStatus()));
    final Housekeeping hk = new Housekeeping();
    c.housekeeping(hk);
    assertEquals(0, hk.table(TableId.COUNT).loads());
    assertEquals(Status.NOT_READY, hk.lastOrbitStatus(), "no orbit offered yet");
    assertEquals("UNKNOWN", TableId.name(TableId.COUNT));
    assertEquals("GRAVITY", TableId.name(TableId.GRAVITY));
  }
}
