package org.eigenzeit.ground.scenario;

/**
 * A scenario that fails validation. The message reads {@code file:line: key: what, found X,
 * allowed Y}; it never carries a library's or the JVM's text.
 */
public final class ScenarioException extends IllegalArgumentException {
  private static final long serialVersionUID = 1L;

  /** The file named in the message. */
  private final String file;
  /** The 1-based line named in the message. */
  private final int line;
  /** The dotted key named in the message ("" for the document as a whole). */
  private final String key;

  /**
   * Creates the exception.
   *
   * @param file the file
   * @param line 1-based line
   * @param key dotted key, or "" for the document
   * @param what what is wrong
   * @param found what was found
   * @param allowed what is allowed
   */
  public ScenarioException(String file, int line, String key, String what, String found, String allowed) {
    super(file + ":" + line + ": " + (key.isEmpty() ? "" : key + ": ") + what + ", found " + found + ", allowed "
        + allowed);
    this.file = file;
    this.line = line;
    this.key = key;
  }

  /** @return the file named in the message */
  public String file() {
    return file;
  }

  /** @return the 1-based line named in the message */
  public int line() {
    return line;
  }

  /** @return the dotted key named in the message ("" for the document) */
  public String key() {
    return key;
  }
}
