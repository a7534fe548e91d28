package org.eigenzeit.ground.gnss;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.GZIPInputStream;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFiles;

/** Reading product files as ASCII lines, plain or gzip-compressed (name ending in ".gz"). */
public final class GnssFiles {
  /** Largest decompressed size accepted, bytes (a day of 1 Hz multi-GNSS clocks is far below). */
  static final int MAX_BYTES = 512 * 1024 * 1024;

  private GnssFiles() {}

  /**
   * The lines of a file; ".gz" files are decompressed first. Messages name the file without
   * ".gz" so that line numbers refer to the text.
   *
   * @param path the file
   * @return the lines
   * @throws InputException when missing, unreadable, not gzip although named so, or not ASCII
   */
  public static List<String> lines(Path path) {
    final String name = String.valueOf(path.getFileName());
    if (!name.endsWith(".gz")) {
      return TextFiles.readAsciiLines(path);
    }
    final byte[] packed;
    try {
      packed = Files.readAllBytes(path);
    } catch (NoSuchFileException e) {
      throw new InputException(String.valueOf(path), 0, "no such file");
    } catch (IOException e) {
      throw new InputException(String.valueOf(path), 0, "cannot be read (" + e.getClass().getSimpleName() + ")");
    }
    final String text = name.substring(0, name.length() - 3);
    try (InputStream in = new GZIPInputStream(new ByteArrayInputStream(packed))) {
      final byte[] bytes = in.readNBytes(MAX_BYTES + 1);
      if (bytes.length > MAX_BYTES) {
        throw new InputException(name, 0, "decompressed size above " + MAX_BYTES + " bytes");
      }
      return TextFiles.asciiLines(text, bytes);
    } catch (IOException e) {
      throw new InputException(name, 0, "not a readable gzip file (" + e.getClass().getSimpleName() + ")");
    }
  }

  /**
   * The file name as messages use it (without ".gz").
   *
   * @param path the file
   * @return the name
   */
  public static String displayName(Path path) {
    final String name = String.valueOf(path.getFileName());
    return name.endsWith(".gz") ? name.substring(0, name.length() - 3) : name;
  }
}
