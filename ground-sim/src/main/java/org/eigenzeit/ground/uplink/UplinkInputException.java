package org.eigenzeit.ground.uplink;

/**
 * An input to an uplink image refused: the message names the file and the line or key, what is
 * wrong, what was found and what is allowed.
 */
public final class UplinkInputException extends IllegalArgumentException {
  private static final long serialVersionUID = 1L;

  /**
   * Creates the exception.
   *
   * @param message file:line or file: key, then what, found, allowed
   */
  public UplinkInputException(String message) {
    super(message);
  }
}
