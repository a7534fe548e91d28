package org.eigenzeit.ground.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** Entry point of the {@code eigenzeit} command. */
@Command(name = "eigenzeit", mixinStandardHelpOptions = true, version = "eigenzeit 0.1.0",
    description = {
      "Relativistic clock corrections for satellites: the onboard core checked against a",
      "high-fidelity ground reference.",
      "",
      "CAUTION: timing errors on navigation satellites endanger users. These results support the",
      "mission's own verification and do not replace it; the applicable interface specifications",
      "and standards govern."},
    subcommands = {DemoCommand.class, BudgetCommand.class, GnssTermsCommand.class, CampaignCommand.class, MergeCommand.class,
        ReferenceSpeedCommand.class, EpochCommand.class, CucCommand.class, TableImageCommand.class,
        CommandLine.HelpCommand.class})
public final class Main implements Runnable {
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
   * The configured command line (also used by tests).
   *
   * @return the command line
   */
  public static CommandLine commandLine() {
    return new CommandLine(new Main()).setCaseInsensitiveEnumValuesAllowed(true)
        .setExecutionExceptionHandler((ex, cl, parsed) -> {
          if (ex instanceof IllegalArgumentException || ex instanceof java.io.IOException
              || ex instanceof java.io.UncheckedIOException) {
            cl.getErr().println("eigenzeit " + cl.getCommandName() + ": " + ex.getMessage());
            cl.getErr().flush();
            return 1;
          }
          throw ex;
        });
  }

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }
}
