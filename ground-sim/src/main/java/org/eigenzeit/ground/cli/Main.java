package org.eigenzeit.ground.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.trajectory.ExternalTrajectory;
import org.hipparchus.exception.MathRuntimeException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * Entry point of the {@code eigenzeit} command. Every error ends in one line on standard error
 * that names the command and the option, file or key at fault, never a stack trace or a library's
 * own text, and in one of the exit codes below (documented in docs/cli.md).
 */
@Command(name = "eigenzeit", mixinStandardHelpOptions = true, version = "eigenzeit 0.1.0",
    description = {
      "Relativistic clock corrections for satellites: the onboard core checked against a high-fidelity ground "
          + "reference. Every command has --help; docs/cli.md describes them all.",
      "",
      "CAUTION: timing errors on navigation satellites endanger users. These results support the mission's own "
          + "verification and do not replace it; the applicable interface specifications and standards govern.",
      "",
      "Exit codes: 0 done; 1 input refused (file, scenario or orbit); 2 usage error (command or option); 3 a file "
          + "or folder could not be read or written; 4 internal error (please report)."},
    subcommands = {DemoCommand.class, BudgetCommand.class, GnssTermsCommand.class, CampaignCommand.class, MergeCommand.class,
        ReferenceSpeedCommand.class, EpochCommand.class, CucCommand.class, TableImageCommand.class,
        CommandLine.HelpCommand.class})
public final class Main implements Callable<Integer> {
  /** Exit code: done. */
  public static final int EXIT_OK = 0;
  /** Exit code: an input (file, scenario, orbit) was refused. */
  public static final int EXIT_INPUT = 1;
  /** Exit code: usage error (unknown command or option, option value missing or out of range). */
  public static final int EXIT_USAGE = 2;
  /** Exit code: a file or folder could not be read or written. */
  public static final int EXIT_IO = 3;
  /** Exit code: internal error, a defect of Eigenzeit. */
  public static final int EXIT_INTERNAL = 4;

  @CommandLine.Spec
  CommandLine.Model.CommandSpec spec;

  /**
   * Runs the command line.
   *
   * @param args arguments
   */
  public static void main(String[] args) {
    System.exit(commandLine().execute(args));
  }

  /**
   * The configured command line (also used by tests): strict number parsing for every option,
   * errors reported by {@link #parameterError} and {@link #executionError}.
   *
   * @return the command line
   */
  public static CommandLine commandLine() {
    final CommandLine cl = new CommandLine(new Main()).setCaseInsensitiveEnumValuesAllowed(true)
        .setParameterExceptionHandler(Main::parameterError)
        .setExecutionExceptionHandler(Main::executionError);
    final CommandLine.ITypeConverter<Double> decimal = Main::decimal;
    final CommandLine.ITypeConverter<Integer> whole = Main::whole;
    cl.registerConverter(Double.class, decimal).registerConverter(Double.TYPE, decimal)
        .registerConverter(Integer.class, whole).registerConverter(Integer.TYPE, whole)
        .registerConverter(java.nio.file.Path.class, Main::path);
    // The help wraps at the terminal's width (80 columns when it cannot be told, as in a log).
    cl.setUsageHelpWidth(80).setUsageHelpAutoWidth(true);
    return cl;
  }

  private static Double decimal(String text) {
    try {
      return TextFields.decimal("", 0, "", text);
    } catch (InputException e) {
      throw new CommandLine.TypeConversionException("not a finite decimal number, found '" + text
          + "', allowed digits with an optional sign, point and exponent");
    }
  }

  private static Integer whole(String text) {
    try {
      return TextFields.integer("", 0, "", text, Integer.MIN_VALUE, Integer.MAX_VALUE);
    } catch (InputException e) {
      throw new CommandLine.TypeConversionException("not a whole number, found '" + text + "'");
    }
  }

  private static java.nio.file.Path path(String text) {
    try {
      return java.nio.file.Path.of(text);
    } catch (java.nio.file.InvalidPathException e) {
      throw new CommandLine.TypeConversionException("not a valid path, found '"
          + text.replace(String.valueOf((char) 0), "\\0") + "'");
    }
  }

  /** {@code eigenzeit} without a command: the usage, on standard error, and the usage exit code. */
  @Override
  public Integer call() {
    final PrintWriter err = spec.commandLine().getErr();
    err.println("eigenzeit: no command given; the commands are listed below.");
    spec.commandLine().usage(err);
    err.flush();
    return EXIT_USAGE;
  }

  private static String prefix(CommandLine cl) {
    return cl.getCommandSpec().qualifiedName() + ": ";
  }

  /**
   * Reports a usage error (picocli's parse errors and the commands' own option checks), in our
   * words: the option first, then what is wrong.
   *
   * @param ex the error
   * @param args the arguments
   * @return {@link #EXIT_USAGE}
   */
  static int parameterError(CommandLine.ParameterException ex, String[] args) {
    final CommandLine cl = ex.getCommandLine();
    final PrintWriter err = cl.getErr();
    err.println(prefix(cl) + describe(ex));
    err.println("Run '" + cl.getCommandSpec().qualifiedName() + " --help' for the options, their ranges and defaults.");
    err.flush();
    return EXIT_USAGE;
  }

  private static String describe(CommandLine.ParameterException ex) {
    if (ex.getCause() instanceof CommandLine.TypeConversionException t && ex.getArgSpec() != null) {
      return name(ex.getArgSpec()) + ": " + t.getMessage();
    }
    if (ex instanceof CommandLine.MissingParameterException m) {
      final StringBuilder b = new StringBuilder();
      for (CommandLine.Model.ArgSpec a : m.getMissing()) {
        b.append(b.length() == 0 ? "" : ", ").append(name(a));
      }
      if (b.toString().contains("--state-km") || b.toString().contains("--sma-km")) {
        return "missing the orbit: give --sma-km (with --ecc, --inc-deg and the other elements), --state-km, "
            + "--trajectory or (with --body moon) --surface-site";
      }
      return "missing " + (b.length() == 0 ? "a value" : b) + " (required)";
    }
    if (ex instanceof CommandLine.UnmatchedArgumentException u) {
      final String first = u.getUnmatched().isEmpty() ? "" : u.getUnmatched().get(0);
      final String hint = u.getSuggestions().isEmpty() ? "" : "; did you mean " + String.join(" or ", u.getSuggestions())
          + "?";
      return (first.startsWith("-") ? "unknown option '" : "unexpected argument '") + first + "'" + hint;
    }
    if (ex instanceof CommandLine.OverwrittenOptionException o) {
      return name(o.getOverwritten()) + ": given more than once, allowed once";
    }
    if (ex instanceof CommandLine.MutuallyExclusiveArgsException) {
      return "give the orbit either as Keplerian elements (--sma-km and the other element options) or as "
          + "--state-km, --trajectory or --surface-site, one of them only";
    }
    final String m = String.valueOf(ex.getMessage());
    if (m.contains("expected only one match")) {
      return "an option was given more than once (or the orbit twice), allowed each option once";
    }
    return m.replaceAll("=<[^>]*>", "").replaceFirst("^Error: ", "");
  }

  private static String name(CommandLine.Model.ArgSpec a) {
    if (a instanceof CommandLine.Model.OptionSpec o) {
      return o.longestName();
    }
    return a.paramLabel();
  }

  /**
   * Reports an error raised while a command ran.
   *
   * @param ex the error
   * @param cl the command that ran
   * @param parsed the parse result
   * @return the exit code
   */
  static int executionError(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
    if (ex instanceof CommandLine.ParameterException p) {
      return parameterError(p, new String[0]);
    }
    final Throwable t = unwrap(ex);
    final PrintWriter err = cl.getErr();
    final int code;
    if (t instanceof IllegalArgumentException) {
      // Input refusals: InputException (file:line) and ScenarioException (file:line: key) extend it,
      // and the ground models refuse an argument (an epoch outside the ephemeris, a lunar option out
      // of range, a shard that does not match its plan) with it, naming the argument.
      err.println(prefix(cl) + t.getMessage());
      code = EXIT_INPUT;
    } else if (t instanceof MathRuntimeException m) {
      err.println(prefix(cl) + ExternalTrajectory.integrationFailure("the orbit given", 0, m).getMessage());
      code = EXIT_INPUT;
    } else if (t instanceof JsonProcessingException j) {
      err.println(prefix(cl) + "a JSON or YAML document could not be read or written"
          + (j.getLocation() == null ? "" : String.format(Locale.ROOT, " at line %d, column %d",
              j.getLocation().getLineNr(), j.getLocation().getColumnNr())) + ": " + j.getOriginalMessage());
      code = EXIT_INPUT;
    } else if (t instanceof IOException io) {
      err.println(prefix(cl) + io(io));
      code = EXIT_IO;
    } else {
      err.println(prefix(cl) + "internal error (" + t.getClass().getSimpleName() + "); this is a defect of Eigenzeit, "
          + "please report it with the command line" + (System.getenv("EIGENZEIT_DEBUG") == null
              ? " (set EIGENZEIT_DEBUG=1 for details)" : ""));
      if (System.getenv("EIGENZEIT_DEBUG") != null) {
        t.printStackTrace(err);
      }
      code = EXIT_INTERNAL;
    }
    err.flush();
    return code;
  }

  private static Throwable unwrap(Throwable ex) {
    Throwable t = ex;
    for (int k = 0; k < 10; k++) {
      final Throwable c = t.getCause();
      final boolean wrapper = t instanceof UncheckedIOException || t.getClass() == RuntimeException.class
          || t instanceof java.util.concurrent.ExecutionException || t instanceof java.util.concurrent.CompletionException
          || (t.getClass() == IOException.class && c != null && !(c instanceof IOException && c == t));
      if (c == null || !wrapper) {
        break;
      }
      t = c;
    }
    return t;
  }

  private static String io(IOException e) {
    if (e instanceof NoSuchFileException f) {
      return f.getFile() + ": no such file or folder";
    }
    if (e instanceof AccessDeniedException f) {
      return f.getFile() + ": permission denied";
    }
    if (e instanceof FileSystemException f) {
      return f.getFile() + ": cannot be read or written" + (f.getReason() == null ? "" : " (" + f.getReason() + ")");
    }
    return "a file could not be read or written (" + e.getClass().getSimpleName() + ")";
  }
}
