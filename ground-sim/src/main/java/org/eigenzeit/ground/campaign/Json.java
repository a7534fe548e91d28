package org.eigenzeit.ground.campaign;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** The one JSON configuration of campaign files (indented, records in component order), and atomic writes. */
public final class Json {
  private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  private Json() {}

  /**
   * Writes a value as indented JSON text with a final newline.
   *
   * @param value a record, list or map
   * @return the text
   */
  public static String write(Object value) {
    try {
      return MAPPER.writeValueAsString(value) + "\n";
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("cannot write " + value.getClass().getSimpleName() + " as JSON", e);
    }
  }

  /**
   * Reads JSON text into a type.
   *
   * @param <T> the type
   * @param text the text
   * @param type the type
   * @return the value
   * @throws IOException when the text does not hold one
   */
  public static <T> T read(String text, Class<T> type) throws IOException {
    return MAPPER.readValue(text, type);
  }

  /**
   * Writes a file through a temporary file and a rename, so a reader never sees half a file.
   *
   * @param file the file
   * @param text its text
   * @throws IOException on a write failure
   */
  public static void writeAtomically(Path file, String text) throws IOException {
    final Path abs = file.toAbsolutePath();
    final Path dir = abs.getParent();
    final Path name = abs.getFileName();
    if (dir == null || name == null) {
      throw new IOException(file + ": not a file path");
    }
    Files.createDirectories(dir);
    final Path tmp = dir.resolve(name + ".tmp");
    Files.writeString(tmp, text, StandardCharsets.UTF_8);
    Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
  }
}
