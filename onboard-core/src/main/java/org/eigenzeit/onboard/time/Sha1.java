package org.eigenzeit.onboard.time;

/**
 * SHA-1 message digest, allocation-free after construction, for checking the {@code #h} line of
 * the IERS/NIST leap-second file (which is how that file's publishers protect it; SHA-1 serves here
 * as an integrity check against corruption, not as a security measure).
 *
 * <p>Algorithm: NIST FIPS 180-4, "Secure Hash Standard", section 6.1. Tests check the published
 * example "abc" and agreement with the JDK's {@code MessageDigest}.
 *
 * <p>Mutable, not thread-safe: one owner.
 */
final class Sha1 {
  private final int[] w = new int[80];
  private final int[] h = new int[5];
  private final byte[] block = new byte[64];
  private int blockLength;
  private long totalBytes;

  Sha1() {
    reset();
  }

  /** Starts a new digest. */
  void reset() {
    h[0] = 0x67452301;
    h[1] = 0xEFCDAB89;
    h[2] = 0x98BADCFE;
    h[3] = 0x10325476;
    h[4] = 0xC3D2E1F0;
    blockLength = 0;
    totalBytes = 0;
  }

  /**
   * Feeds one byte.
   *
   * @param b the byte
   */
  void update(byte b) {
    block[blockLength++] = b;
    totalBytes++;
    if (blockLength == 64) {
      compress();
      blockLength = 0;
    }
  }

  /**
   * Finishes the digest (FIPS 180-4 section 5.1.1 padding) and writes five 32-bit words.
   *
   * @param out receives the five digest words
   */
  void finish(int[] out) {
    final long bitLength = totalBytes * 8;
    block[blockLength++] = (byte) 0x80;
    if (blockLength > 56) {
      while (blockLength < 64) {
        block[blockLength++] = 0;
      }
      compress();
      blockLength = 0;
    }
    while (blockLength < 56) {
      block[blockLength++] = 0;
    }
    for (int i = 7; i >= 0; i--) {
      block[blockLength++] = (byte) (bitLength >>> (8 * i));
    }
    compress();
    System.arraycopy(h, 0, out, 0, 5);
    reset();
  }

  private void compress() {
    for (int t = 0; t < 16; t++) {
      w[t] = ((block[4 * t] & 0xFF) << 24) | ((block[4 * t + 1] & 0xFF) << 16)
          | ((block[4 * t + 2] & 0xFF) << 8) | (block[4 * t + 3] & 0xFF);
    }
    for (int t = 16; t < 80; t++) {
      w[t] = Integer.rotateLeft(w[t - 3] ^ w[t - 8] ^ w[t - 14] ^ w[t - 16], 1);
    }
    int a = h[0];
    int b = h[1];
    int c = h[2];
    int d = h[3];
    int e = h[4];
    for (int t = 0; t < 80; t++) {
      final int f;
      final int k;
      if (t < 20) {
        f = (b & c) | (~b & d);
        k = 0x5A827999;
      } else if (t < 40) {
        f = b ^ c ^ d;
        k = 0x6ED9EBA1;
      } else if (t < 60) {
        f = (b & c) | (b & d) | (c & d);
        k = 0x8F1BBCDC;
      } else {
        f = b ^ c ^ d;
        k = 0xCA62C1D6;
      }
      final int temp = Integer.rotateLeft(a, 5) + f + e + k + w[t];
      e = d;
      d = c;
      c = Integer.rotateLeft(b, 30);
      b = a;
      a = temp;
    }
    h[0] += a;
    h[1] += b;
    h[2] += c;
    h[3] += d;
    h[4] += e;
  }
}
