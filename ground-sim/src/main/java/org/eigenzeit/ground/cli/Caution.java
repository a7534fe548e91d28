package org.eigenzeit.ground.cli;

/** The caution printed with every result. */
final class Caution {
  static final String TEXT = "CAUTION: simulation results support the mission's own verification and do not "
      + "replace it; timing errors on navigation satellites endanger users; the applicable interface "
      + "specifications and standards govern.";

  private Caution() {}
}
