package org.eigenzeit.ground.fuzz;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.eigenzeit.ground.cli.Main;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFiles;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.ground.trajectory.ExternalTrajectory;
import org.eigenzeit.ground.trajectory.OemFile;
import org.eigenzeit.ground.trajectory.RinexNavFile;
import org.eigenzeit.ground.trajectory.Sp3File;
import picocli.CommandLine;

/**
 * What each corpus directory feeds its cases to, as a user's input would go: the reader, then
 * (for orbit files) the trajectory built from it with its plausibility checks. To add a reader,
 * add its directory under {@code src/test/resources/fuzz/} and one entry here.
 */
final class FuzzTargets {
  /** How a case ended. */
  record Outcome(boolean refused, boolean crashed, String message) {
    static Outcome accepted() {
      return new Outcome(false, false, "");
    }
  }

  /** A target: reads one case file. */
  interface Target {
    Outcome run(Path file) throws IOException;
  }

  private FuzzTargets() {}

  static Map<String, Target> all() {
    final Map<String, Target> m = new LinkedHashMap<>();
    m.put("sp3", f -> file(() -> {
      final Sp3File sp3 = Sp3File.read(f);
      if (sp3.timeSystemCode() == Sp3File.TimeSystem.GPS) {
        for (String id : sp3.satelliteIds()) {
          ExternalTrajectory.fromSp3(sp3, id, -66.25);
        }
      }
    }));
    m.put("oem", f -> file(() -> ExternalTrajectory.fromOem(OemFile.read(f), -66.25)));
    m.put("rinex-nav", f -> file(() -> RinexNavFile.read(f)));
    m.put("epochs", f -> file(() -> {
      final String[] p = TextFiles.readAsciiLines(f).get(0).split("\t", -1);
      Epochs.toTt(String.valueOf(f.getFileName()), 1, p[0], p.length > 1 ? p[1] : "");
    }));
    for (String c : new String[] {"cli-budget", "cli-demo", "cli-campaign", "cli-reference-speed", "cli-eigenzeit"}) {
      m.put(c, FuzzTargets::commandLine);
    }
    return m;
  }

  /** A reader call that either returns, refuses with an InputException, or crashes. */
  private interface Body {
    void run() throws IOException;
  }

  private static Outcome file(Body b) {
    try {
      b.run();
      return Outcome.accepted();
    } catch (InputException e) {
      return new Outcome(true, false, e.getMessage());
    } catch (IOException | RuntimeException e) {
      return new Outcome(true, true, e.toString());
    }
  }

  /** Runs the command line with the case's arguments (one per line; ${dir} and ${tmp} replaced). */
  private static Outcome commandLine(Path file) throws IOException {
    final Path tmp = Files.createTempDirectory("fuzz-cli");
    final List<String> args = new ArrayList<>();
    for (String a : Files.readAllLines(file, StandardCharsets.UTF_8)) {
      args.add(a.replace("${dir}", file.getParent().toString()).replace("${tmp}", tmp.toString()));
    }
    final CommandLine cl = Main.commandLine();
    final StringWriter out = new StringWriter();
    final StringWriter err = new StringWriter();
    cl.setOut(new PrintWriter(out));
    cl.setErr(new PrintWriter(err));
    final int code = cl.execute(args.toArray(new String[0]));
    final String e = err.toString();
    final boolean trace = e.contains("\tat ") || e.contains("Exception") || code == Main.EXIT_INTERNAL;
    return new Outcome(code != 0, trace, code + ": " + e.lines().findFirst().orElse(""));
  }
}
