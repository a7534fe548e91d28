package org.eigenzeit.verification.evidence;

import java.util.Locale;

/** Number formatting shared by every output of the package (locale-independent, 4 digits). */
final class Numbers {
  private Numbers() {}

  /**
   * Formats a value with four significant digits: plain for moderate magnitudes, scientific
   * otherwise; integers print without a fraction.
   */
  static String format(double v) {
    if (Double.isNaN(v)) {
      return "not measured";
    }
    if (v == Math.rint(v) && Math.abs(v) < 1e9) {
      return String.format(Locale.ROOT, "%d", (long) v);
    }
    final double a = Math.abs(v);
    if (a >= 1e-3 && a < 1e5) {
      final String s = String.format(Locale.ROOT, "%.4g", v);
      return s.contains("e") ? s : stripZeros(s);
    }
    return String.format(Locale.ROOT, "%.3e", v);
  }

  private static String stripZeros(String s) {
    if (!s.contains(".")) {
      return s;
    }
    String t = s;
    while (t.endsWith("0")) {
      t = t.substring(0, t.length() - 1);
    }
    return t.endsWith(".") ? t.substring(0, t.length() - 1) : t;
  }
}
