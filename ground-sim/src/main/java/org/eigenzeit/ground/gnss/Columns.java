package org.eigenzeit.ground.gnss;

/** Fixed-column access to text lines (1-based inclusive columns, as the format documents number them). */
final class Columns {
  private Columns() {}

  /**
   * Columns {@code from..to} of a line, padded with blanks where the line is shorter (trailing
   * blanks are often stripped from real files).
   *
   * @param line the line
   * @param from first column, 1-based
   * @param to last column, 1-based, inclusive
   * @return the text, exactly {@code to - from + 1} characters
   */
  static String of(String line, int from, int to) {
    final StringBuilder b = new StringBuilder(to - from + 1);
    for (int c = from; c <= to; c++) {
      b.append(c <= line.length() ? line.charAt(c - 1) : ' ');
    }
    return b.toString();
  }

  /**
   * Whether columns {@code from..} to the end of the line are blank.
   *
   * @param line the line
   * @param from first column, 1-based
   * @return true when nothing but blanks follows
   */
  static boolean blankFrom(String line, int from) {
    return from > line.length() || line.substring(from - 1).isBlank();
  }
}
