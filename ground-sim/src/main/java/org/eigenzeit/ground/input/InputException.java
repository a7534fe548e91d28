package org.eigenzeit.ground.input;

/**
 * Input from outside that is refused. The message always starts with where the input came from:
 * {@code file:line: } for files, {@code file: key: } for keyed documents, {@code --option: } for
 * command-line values; then what is wrong, what was found and what is allowed.
 */
public class InputException extends IllegalArgumentException {
  private static final long serialVersionUID = 1L;

  private final String source;
  private final int line;

  /**
   * Creates the exception for a line of a file.
   *
   * @param source file name (or other source name)
   * @param line 1-based line number (0 or less when no line applies)
   * @param what what is wrong, what was found, what is allowed
   */
  public InputException(String source, int line, String what) {
    super(line > 0 ? source + ":" + line + ": " + what : source + ": " + what);
    this.source = source;
    this.line = line;
  }

  /**
   * Returns the source name.
   *
   * @return the source name
   */
  public String source() {
    return source;
  }

  /**
   * Returns the 1-based line number, or 0 when none applies.
   *
   * @return the line number
   */
  public int line() {
    return Math.max(0, line);
  }
}
