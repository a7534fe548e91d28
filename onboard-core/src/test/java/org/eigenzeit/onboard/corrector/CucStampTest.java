package org.eigenzeit.onboard.corrector;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.CucCodec;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The corrector's CUC time stamp is the corrected time in TAI, counted from 1958-01-01T00:00:00
 * TAI (CCSDS 301.0-B-4 section 3.2, Level 1), read here octet by octet without the codec.
 */
class CucStampTest {
  /** TAI seconds from 1958-01-01T00:00 to 2000-01-01T12:00: 15 340 days (42 years, 10 leap days) and 12 h. */
  private static final long SECONDS_1958_TO_J2000 = 15_340L * 86_400L + 43_200L;
  /** TT - TAI (IAU 1991 Resolution A4; IERS Conventions 2010 chapter 10). */
  private static final double TT_MINUS_TAI_S = 32.184;

  @Test
  void theStampIsTheCorrectedTimeInTai() {
    final ClockCorrector c = RestoreIdentityTest.flown(ModelConfig.builder().level(ModelLevel.J2).tides(true)
        .energyToleranceRel(2e-3).build());
    final CucCodec codec = CucCodec.level1(4, 3);
    final byte[] out = new byte[1 + 4 + 3 + 2];
    final SplitTime raw = new SplitTime();
    final SplitTime corrected = new SplitTime();
    for (double f : new double[] {0.0, 0.25, 0.8125}) {
      assertEquals(Status.OK, raw.set(850_000_600L, f));
      c.correctedTime(raw, corrected);
      assertTrue(Math.abs(corrected.secondsSince(raw)) > 1e-9, "the correction is not zero, so a stamp of the raw "
          + "reading would be told apart: " + corrected.secondsSince(raw));
      assertEquals(Status.OK, c.stampCuc(raw, codec, out, 2));
      assertEquals(0x1F, out[2] & 0xFF, "P-field: Level 1 TAI, 4 coarse, 3 fine octets");
      long coarse = 0;
      for (int i = 0; i < 4; i++) {
        coarse = (coarse << 8) | (out[3 + i] & 0xFF);
      }
      double fine = 0;
      for (int i = 2; i >= 0; i--) {
        fine = (fine + (out[7 + i] & 0xFF)) / 256.0;
      }
      final double stampSinceJ2000 = (coarse - SECONDS_1958_TO_J2000) + fine;
      final double expected = corrected.wholeSeconds() - TT_MINUS_TAI_S + corrected.fractionS();
      assertEquals(expected, stampSinceJ2000, Math.scalb(1.0, -24) + 1e-6, "fraction " + f);
    }
    assertEquals(Status.BUFFER_TOO_SMALL, c.stampCuc(raw, codec, out, 3), "the codec's status is passed on");
  }
}
