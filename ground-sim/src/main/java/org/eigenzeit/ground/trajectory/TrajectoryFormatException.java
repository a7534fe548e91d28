package org.eigenzeit.ground.trajectory;

import org.eigenzeit.ground.input.InputException;

/** A malformed trajectory file: the message names the file, the line number and what is wrong. */
public final class TrajectoryFormatException extends InputException {
  private static final long serialVersionUID = 1L;

  /**
   * Creates the exception.
   *
   * @param file file name
   * @param line 1-based line number
   * @param what what is wrong
   */
  public TrajectoryFormatException(String file, int line, String what) {
    super(file, line, what);
  }
}
