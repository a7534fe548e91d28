package org.eigenzeit.ground.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/** Runs the command line as a user would and returns {exit code, standard output, standard error}. */
final class CliRunner {
  private CliRunner() {}

  static String[] run(String... args) {
    final CommandLine cl = Main.commandLine();
    final StringWriter out = new StringWriter();
    final StringWriter err = new StringWriter();
    cl.setOut(new PrintWriter(out));
    cl.setErr(new PrintWriter(err));
    final int code = cl.execute(args);
    return new String[] {Integer.toString(code), out.toString(), err.toString()};
  }
}
