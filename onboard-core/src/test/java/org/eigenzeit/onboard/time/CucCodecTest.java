package org.eigenzeit.onboard.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import org.eigenzeit.onboard.status.Status;
import org.junit.jupiter.api.Test;

/**
 * CCSDS Unsegmented Time Code. P-field layout per CCSDS 301.0-B-4 section 3.2.2 (bit positions
 * from memory, consistent with the standard's description of the extension flag, the time code
 * identification 001/010, the coarse-octet count minus one and the fine-octet count, and the
 * second octet's additional counts).
 */
class CucCodecTest {
  @Test
  void pFieldOfLevel1FourCoarseTwoFine() {
    // 0 | 001 | 11 | 10 -> 0x1E: the common "4+2" layout of Level 1.
    final CucCodec codec = CucCodec.level1(4, 2);
    final byte[] out = new byte[7];
    assertEquals(Status.OK, codec.encode(SplitTime.of(0, 0.0), out, 0));
    assertEquals(0x1E, out[0] & 0xFF);
    assertEquals(7, codec.codeOctets());
  }

  @Test
  void pFieldOfLevel2OneCoarseNoFine() {
    // 0 | 010 | 00 | 00 -> 0x20
    final CucCodec codec = CucCodec.level2(1, 0, 0L);
    final byte[] out = new byte[2];
    assertEquals(Status.OK, codec.encode(SplitTime.of(200, 0.0), out, 0));
    assertEquals(0x20, out[0] & 0xFF);
    assertEquals(200, out[1] & 0xFF);
  }

  @Test
  void extendedPFieldForSevenCoarseTenFine() {
    // octet 1: 1 | 001 | 11 | 11 -> 0x9F; octet 2: 0 | 11 | 111 | 00 -> 0x7C
    final CucCodec codec = CucCodec.level1(7, 10);
    final byte[] out = new byte[CucCodec.MAX_CODE_OCTETS];
    assertEquals(Status.OK, codec.encode(SplitTime.of(0, 0.5), out, 0));
    assertEquals(0x9F, out[0] & 0xFF);
    assertEquals(0x7C, out[1] & 0xFF);
    assertEquals(19, codec.codeOctets());
    assertEquals(0x80, out[2 + 7] & 0xFF); // fraction 0.5 -> first fine octet 0x80
  }

  @Test
  void epochOf1958AndJ2000() {
    // J2000.0 (TAI labels) is 15340.5 days after 1958-01-01T00:00 TAI: 1325419200 s = 0x4F000AC0... check bytes.
    final CucCodec codec = CucCodec.level1(4, 0);
    final byte[] out = new byte[5];
    assertEquals(Status.OK, codec.encode(SplitTime.of(0, 0.0), out, 0));
    final long coarse = ((out[1] & 0xFFL) << 24) | ((out[2] & 0xFFL) << 16) | ((out[3] & 0xFFL) << 8) | (out[4] & 0xFFL);
    assertEquals(15340.5 * 86400.0, (double) coarse, 0.0);
  }

  @Test
  void roundTripWithinFineResolution() {
    final double[] worst = new double[1];
    qt().withExamples(5000).withFixedSeed(42L)
        .forAll(integers().between(4, 7), integers().between(0, 10),
            longs().between(-1_325_419_200L, 2_000_000_000L), doubles().between(0.0, 0.999999999))
        .checkAssert((coarse, fine, whole, frac) -> {
          final CucCodec codec = CucCodec.level1(coarse, fine);
          final byte[] buf = new byte[CucCodec.MAX_CODE_OCTETS + 3];
          final SplitTime t = SplitTime.of(whole, frac);
          assertEquals(Status.OK, codec.encode(t, buf, 3));
          final SplitTime back = new SplitTime();
          assertEquals(Status.OK, codec.decode(buf, 3, back));
          final double err = t.secondsSince(back);
          final double resolution = Math.max(Math.pow(256.0, -fine), 0x1p-52);
          worst[0] = Math.max(worst[0], Math.abs(err) / resolution);
          assertTrue(err >= -1e-15 && err < resolution, "err " + err + " res " + resolution);
        });
    System.out.printf("CUC round trip, 5000 codes: worst error %.3f of the fine resolution%n", worst[0]);
    System.out.printf("evidence: time.cuc_roundtrip_lsb = %.4f%n", worst[0]);
  }

  @Test
  void faultsAreReportedNotThrown() {
    final CucCodec codec = CucCodec.level1(1, 0);
    final byte[] out = new byte[2];
    assertEquals(Status.OVERFLOW, codec.encode(SplitTime.of(0, 0.0), out, 0)); // 1958 + 42 y > 255 s
    assertEquals(Status.OVERFLOW, codec.encode(SplitTime.of(-1_325_419_201L, 0.0), out, 0));
    assertEquals(Status.BUFFER_TOO_SMALL, codec.encode(SplitTime.of(0, 0.0), out, 1));
    final SplitTime t = new SplitTime();
    assertEquals(Status.BUFFER_TOO_SMALL, codec.decode(out, 2, t));
    assertEquals(Status.BUFFER_TOO_SMALL, codec.decode(new byte[] {0x10}, 0, t));
    assertEquals(Status.MALFORMED, codec.decode(new byte[] {0x20, 0}, 0, t)); // Level 2 id
    assertEquals(Status.MALFORMED, codec.decode(new byte[] {0x1E, 0, 0, 0, 0, 0, 0}, 0, t));
    final CucCodec ext = CucCodec.level1(5, 0);
    assertEquals(Status.MALFORMED, ext.decode(new byte[] {(byte) 0x9C, (byte) 0x21, 0, 0, 0, 0, 0}, 0, t));
    assertEquals(Status.MALFORMED, ext.decode(new byte[] {(byte) 0x9C, (byte) 0xA0, 0, 0, 0, 0, 0}, 0, t));
    assertEquals(Status.BUFFER_TOO_SMALL, ext.decode(new byte[] {(byte) 0x9C}, 0, t));
    assertThrows(IllegalArgumentException.class, () -> CucCodec.level1(0, 0));
    assertThrows(IllegalArgumentException.class, () -> CucCodec.level1(8, 0));
    assertThrows(IllegalArgumentException.class, () -> CucCodec.level2(4, 11, 0));
  }

  @Test
  void aCodeCutShortIsRefusedWhateverItsFineOctets() {
    // A 4+2 code (7 octets) one, two and six octets short: refused, never read past the buffer.
    final CucCodec codec = CucCodec.level1(4, 2);
    final byte[] full = new byte[7];
    assertEquals(Status.OK, codec.encode(SplitTime.of(123_456, 0.75), full, 0));
    final SplitTime t = SplitTime.of(1, 0.0);
    for (int cut = 1; cut <= 6; cut++) {
      assertEquals(Status.BUFFER_TOO_SMALL, codec.decode(java.util.Arrays.copyOf(full, 7 - cut), 0, t), "cut " + cut);
      assertEquals(1L, t.wholeSeconds(), "unchanged on a fault");
    }
    assertEquals(Status.OK, codec.decode(full, 0, t));
    assertEquals(123_456L, t.wholeSeconds());
    assertEquals(0.75, t.fractionS(), 0.0);
  }
}
