package org.eigenzeit.verification.evidence;

import java.util.List;
import java.util.Locale;

/**
 * One requirement of the requirements file.
 *
 * @param id unique identifier, e.g. EZ-ENV-01
 * @param title short title
 * @param text the requirement as stated
 * @param method verification method: test, analysis, inspection or review of design
 * @param metrics evidence keys; the largest of their values is judged
 * @param criterion the acceptance criterion
 * @param unit unit of the measured value
 * @param source the outside source of the expected value
 * @param verifiedBy test classes that must have run and passed
 */
public record Requirement(String id, String title, String text, String method, List<String> metrics,
    Criterion criterion, String unit, String source, List<String> verifiedBy) {

  /** The verification methods a requirement may name. */
  public static final List<String> METHODS = List.of("test", "analysis", "inspection", "review of design");

  /** Copies the lists. */
  public Requirement {
    metrics = List.copyOf(metrics);
    verifiedBy = List.copyOf(verifiedBy);
  }

  /**
   * An acceptance criterion: {@code value op threshold}, or {@code |value - threshold| <=
   * tolerance} for "within".
   *
   * @param op one of {@code <=, <, >=, >, within}
   * @param threshold the number the measured value is compared with
   * @param tolerance the half-width for "within" (0 otherwise)
   */
  public record Criterion(String op, double threshold, double tolerance) {
    /** Operators understood. */
    public static final List<String> OPS = List.of("<=", "<", ">=", ">", "within");

    /**
     * Whether a measured value meets the criterion (a non-finite value never does).
     *
     * @param value the measured value
     * @return true when the criterion holds
     */
    public boolean accepts(double value) {
      if (!Double.isFinite(value)) {
        return false;
      }
      return switch (op) {
        case "<=" -> value <= threshold;
        case "<" -> value < threshold;
        case ">=" -> value >= threshold;
        case ">" -> value > threshold;
        case "within" -> Math.abs(value - threshold) <= tolerance;
        default -> false;
      };
    }

    /**
     * Margin factor: how many times the criterion could tighten before failing (1 at the limit,
     * below 1 when failed; capped at 1e6, the cap also standing for an exact zero).
     *
     * @param value the measured value
     * @return the margin factor
     */
    public double margin(double value) {
      final double m = switch (op) {
        case "<=", "<" -> threshold / Math.abs(value);
        case ">=", ">" -> value / threshold;
        case "within" -> tolerance / Math.abs(value - threshold);
        default -> Double.NaN;
      };
      return Double.isNaN(m) ? 1e6 : Math.min(m, 1e6);
    }

    /**
     * The criterion as text, e.g. {@code <= 1e-17} or {@code 23 +- 0.5}.
     *
     * @return the text
     */
    public String describe() {
      return "within".equals(op) ? Numbers.format(threshold) + " ± " + Numbers.format(tolerance)
          : op + " " + Numbers.format(threshold);
    }
  }

  /**
   * The verification method in upper case for the traceability matrix, e.g. {@code T} for test.
   *
   * @return one letter: T, A, I or R
   */
  public String methodLetter() {
    return method.startsWith("review") ? "R" : method.substring(0, 1).toUpperCase(Locale.ROOT);
  }
}
