package org.eigenzeit.ground.cli;

import java.util.List;
import java.util.Locale;
import picocli.CommandLine;
import picocli.CommandLine.ParameterException;

/**
 * Range checks of command-line option values: each refusal names the option, what was found and
 * what is allowed ({@code --seeds: out of range, found -3, allowed 1 to 10000}), and ends as a
 * usage error (exit code 2).
 */
final class OptionChecks {
  private OptionChecks() {}

  static double range(CommandLine cl, String option, double value, double min, double max) {
    if (!(value >= min && value <= max)) {
      throw new ParameterException(cl, option + ": out of range, found " + format(value) + ", allowed " + format(min)
          + " to " + format(max));
    }
    return value;
  }

  static int range(CommandLine cl, String option, int value, int min, int max) {
    if (value < min || value > max) {
      throw new ParameterException(cl, option + ": out of range, found " + value + ", allowed " + min + " to " + max);
    }
    return value;
  }

  static String oneOf(CommandLine cl, String option, String value, List<String> allowed) {
    final String v = value.toLowerCase(Locale.ROOT);
    if (!allowed.contains(v)) {
      throw new ParameterException(cl, option + ": found '" + value + "', allowed " + String.join(", ", allowed));
    }
    return v;
  }

  static String format(double v) {
    if (Double.compare(v, Math.rint(v)) == 0 && Math.abs(v) < 1e15) {
      return Long.toString((long) v);
    }
    return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "");
  }
}
