package org.eigenzeit.ground.input;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads text files that must be plain ASCII (SP3, RINEX, CCSDS OEM, leap-second lists): any
 * other byte, or a control character other than tab, carriage return and line feed, is refused
 * with the file, the line and the column, instead of a decoder's message without a place.
 */
public final class TextFiles {
  private TextFiles() {}

  /**
   * Reads a file's lines (line feed or carriage return + line feed).
   *
   * @param path the file
   * @return the lines, without terminators
   * @throws InputException when the file cannot be read or holds a byte that is not printable ASCII
   */
  public static List<String> readAsciiLines(Path path) {
    final String name = String.valueOf(path.getFileName());
    final byte[] bytes;
    try {
      bytes = Files.readAllBytes(path);
    } catch (NoSuchFileException e) {
      throw new InputException(String.valueOf(path), 0, "no such file");
    } catch (IOException e) {
      throw new InputException(String.valueOf(path), 0, "cannot be read (" + e.getClass().getSimpleName() + ")");
    }
    return asciiLines(name, bytes);
  }

  /**
   * The first line at or after an index that is not blank: what a reader refuses after a format's
   * end marker (an SP3 file's EOF line).
   *
   * @param lines the file's lines
   * @param from the index to start at (0-based)
   * @return the 0-based index of the first non-blank line, or -1 when none follows
   */
  public static int firstNonBlank(List<String> lines, int from) {
    for (int k = Math.max(0, from); k < lines.size(); k++) {
      if (!lines.get(k).isBlank()) {
        return k;
      }
    }
    return -1;
  }

  /**
   * Splits bytes into ASCII lines.
   *
   * @param name source name for messages
   * @param bytes the content
   * @return the lines, without terminators (a final line feed does not start an empty line)
   * @throws InputException at the first byte that is not printable ASCII, tab, CR or LF
   */
  public static List<String> asciiLines(String name, byte[] bytes) {
    final List<String> lines = new ArrayList<>();
    final StringBuilder line = new StringBuilder(128);
    int lineNo = 1;
    int column = 1;
    for (int i = 0; i < bytes.length; i++) {
      final int b = bytes[i] & 0xFF;
      if (b == '\n') {
        final int end = line.length();
        if (end > 0 && line.charAt(end - 1) == '\r') {
          line.setLength(end - 1);
        }
        lines.add(line.toString());
        line.setLength(0);
        lineNo++;
        column = 1;
        continue;
      }
      if (!(b == '\t' || b == '\r' || (b >= 0x20 && b <= 0x7E))) {
        throw new InputException(name, lineNo, String.format(Locale.ROOT,
            "column %d: byte 0x%02X is not printable ASCII, allowed ASCII text only", column, b));
      }
      line.append((char) b);
      column++;
    }
    if (line.length() > 0) {
      lines.add(line.toString());
    }
    return lines;
  }
}
