package org.eigenzeit.ground.uplink;

import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import org.eigenzeit.onboard.gravity.GravityField;

/**
 * A text file of fully normalised gravity coefficients, one pair per line: {@code n m C_nm S_nm}
 * (further columns such as the standard deviations are ignored; {@code #} starts a comment), as
 * the EGM96 table shipped with the core and the usual model distributions write them. Every
 * (n, m) with 2 &lt;= n &lt;= the requested degree must appear exactly once; lines above the degree
 * are skipped. Each refusal names {@code file:line}, what is wrong, what was found and what is
 * allowed; numbers are decimal (no NaN, infinities, hexadecimal or overflowing values).
 */
public final class CoefficientFile {
  private static final String DECIMAL = "[+-]?(\\d+\\.?\\d*|\\.\\d+)([eEdD][+-]?\\d{1,3})?";

  private CoefficientFile() {}

  /**
   * Reads a coefficient file into a field.
   *
   * @param file name for messages
   * @param text the file's bytes (ASCII)
   * @param gmM3PerS2 GM of the field
   * @param radiusM reference radius
   * @param degree largest degree to keep, 2 to 90
   * @return the field
   * @throws UplinkInputException at the first refusal
   */
  public static GravityField read(String file, byte[] text, double gmM3PerS2, double radiusM, int degree) {
    final GravityField.Builder b;
    try {
      b = GravityField.builder(gmM3PerS2, radiusM, degree);
    } catch (IllegalArgumentException e) {
      throw new UplinkInputException(file + ": " + e.getMessage());
    }
    final Map<Integer, Integer> seen = new HashMap<>();
    final String[] lines = new String(text, StandardCharsets.US_ASCII).split("\n", -1);
    for (int k = 0; k < lines.length; k++) {
      final int n = k + 1;
      final String l = lines[k].replace("\r", "");
      for (int i = 0; i < l.length(); i++) {
        if (l.charAt(i) > 126 || (l.charAt(i) < 32 && l.charAt(i) != '\t')) {
          throw new UplinkInputException(file + ":" + n + ": character " + (int) l.charAt(i) + ", allowed ASCII text");
        }
      }
      final int hash = l.indexOf('#');
      final String data = (hash >= 0 ? l.substring(0, hash) : l).trim();
      if (data.isEmpty()) {
        continue;
      }
      final String[] f = data.split("\\s+");
      if (f.length < 4 || !f[0].matches("\\d{1,2}") || !f[1].matches("\\d{1,2}")) {
        throw new UplinkInputException(file + ":" + n + ": '" + data + "', allowed: n m C S (n, m whole numbers)");
      }
      final int deg = Integer.parseInt(f[0]);
      final int ord = Integer.parseInt(f[1]);
      if (deg > degree) {
        continue;
      }
      final double c = number(file, n, f[2], "C");
      final double s = number(file, n, f[3], "S");
      final Integer before = seen.put(deg * 100 + ord, n);
      if (before != null) {
        throw new UplinkInputException(file + ":" + n + ": coefficient (" + deg + ", " + ord + ") again, found at line "
            + before + " already, allowed once");
      }
      try {
        b.set(deg, ord, c, s);
      } catch (IllegalArgumentException e) {
        throw new UplinkInputException(file + ":" + n + ": " + e.getMessage());
      }
    }
    for (int deg = 2; deg <= degree; deg++) {
      for (int ord = 0; ord <= deg; ord++) {
        if (!seen.containsKey(deg * 100 + ord)) {
          throw new UplinkInputException(file + ":" + lines.length + ": coefficient (" + deg + ", " + ord
              + ") missing, allowed a file with every coefficient to degree " + degree);
        }
      }
    }
    return b.build();
  }

  private static double number(String file, int line, String text, String what) {
    final String t = text.replace('D', 'e').replace('d', 'e');
    final double v = t.matches(DECIMAL) ? Double.parseDouble(t) : Double.NaN;
    if (!Double.isFinite(v)) {
      throw new UplinkInputException(file + ":" + line + ": " + what + " '" + text + "', allowed a finite decimal number");
    }
    return v;
  }
}
