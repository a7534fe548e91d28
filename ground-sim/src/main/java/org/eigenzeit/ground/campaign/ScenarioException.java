package org.eigenzeit.ground.campaign;

/** A scenario that fails validation; the message names the file, the key, the value and the range. */
public final class ScenarioException extends IllegalArgumentException {
  private static final long serialVersionUID = 1L;

  /**
   * Creates the exception.
   *
   * @param message the full message
   */
  public ScenarioException(String message) {
    super(message);
  }
}
