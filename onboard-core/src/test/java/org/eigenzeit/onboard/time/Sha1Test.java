package org.eigenzeit.onboard.time;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** SHA-1 against FIPS 180-4's published example and the JDK's MessageDigest. */
class Sha1Test {
  private static int[] digest(byte[] data) {
    final Sha1 sha = new Sha1();
    for (byte b : data) {
      sha.update(b);
    }
    final int[] out = new int[5];
    sha.finish(out);
    return out;
  }

  @Test
  void fipsExampleAbc() {
    // FIPS 180-4 / NIST example "abc": a9993e36 4706816a ba3e2571 7850c26c 9cd0d89d
    assertArrayEquals(new int[] {0xa9993e36, 0x4706816a, 0xba3e2571, 0x7850c26c, 0x9cd0d89d},
        digest("abc".getBytes(StandardCharsets.US_ASCII)));
  }

  @Test
  void agreesWithJdkMessageDigest() {
    qt().withExamples(200).withFixedSeed(7L).forAll(integers().between(0, 300)).checkAssert(len -> {
      final byte[] data = new byte[len];
      new Random(len).nextBytes(data);
      final byte[] ref;
      try {
        ref = MessageDigest.getInstance("SHA-1").digest(data);
      } catch (Exception e) {
        throw new IllegalStateException(e);
      }
      final int[] words = new int[5];
      for (int i = 0; i < 5; i++) {
        words[i] = ((ref[4 * i] & 0xFF) << 24) | ((ref[4 * i + 1] & 0xFF) << 16)
            | ((ref[4 * i + 2] & 0xFF) << 8) | (ref[4 * i + 3] & 0xFF);
      }
      assertArrayEquals(words, digest(data));
    });
  }
}
