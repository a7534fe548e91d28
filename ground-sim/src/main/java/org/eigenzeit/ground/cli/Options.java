package org.eigenzeit.ground.cli;

/** Range checks of command-line options: the message names the option, the value and the range. */
final class Options {
  private Options() {}

  /**
   * Refuses an option value.
   *
   * @param ok the check's outcome
   * @param option the option's name
   * @param found the value given
   * @param allowed the allowed values
   * @throws IllegalArgumentException when {@code ok} is false
   */
  static void check(boolean ok, String option, String found, String allowed) {
    if (!ok) {
      throw new IllegalArgumentException(option + ": out of range, found " + found + ", allowed " + allowed);
    }
  }
}
