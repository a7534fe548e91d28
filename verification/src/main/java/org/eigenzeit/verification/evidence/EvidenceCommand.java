package org.eigenzeit.verification.evidence;

import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * Command line of the evidence package. Reads the reports a build left behind; it runs no test
 * itself ({@code scripts/evidence.sh} runs the build, PIT and then this command).
 */
@Command(name = "evidence-package", mixinStandardHelpOptions = true,
    description = "Writes the review package from the requirements file and the reports of a build.")
public final class EvidenceCommand implements Callable<Integer> {
  @Option(names = "--root", description = "project root (default: current directory)")
  private Path root = Path.of(".");

  @Option(names = "--requirements", description = "requirements file (default: verification/requirements.yaml)")
  private Path requirements;

  @Option(names = "--out", description = "package directory (default: target/evidence)")
  private Path out;

  @Option(names = "--commit", description = "commit the build was made from (default: unknown)")
  private String commit = "unknown";

  @Option(names = "--env", description = "an extra environment entry NAME=VALUE (repeatable)")
  private List<String> env = new ArrayList<>();

  @Option(names = "--generated-at", description = "generation time to print (default: now, UTC, to the second)")
  private String generatedAt;

  @Option(names = "--faults", description = "fault-check.csv of scripts/fault-check.sh to include")
  private Path faults;

  @Option(names = "--allow-failures", description = "exit 0 even when a requirement is not met")
  private boolean allowFailures;

  /**
   * Entry point.
   *
   * @param args command-line arguments
   */
  public static void main(String[] args) {
    System.exit(new CommandLine(new EvidenceCommand()).execute(args));
  }

  @Override
  public Integer call() throws Exception {
    final Path req = requirements != null ? requirements : root.resolve("verification").resolve("requirements.yaml");
    final Path dir = out != null ? out : root.resolve("target").resolve("evidence");
    final List<Requirement> reqs = RequirementsFile.read(req);
    final TestReports tests = TestReports.read(root);
    final CoreReports core = CoreReports.read(root);
    core.addTo(tests);
    final Extras extras = Extras.read(root, faults, tests.measurements());
    extras.addTo(tests);
    final List<Assessment> results = new ArrayList<>();
    reqs.forEach(r -> results.add(Assessment.of(r, tests)));
    final Map<String, String> extra = new LinkedHashMap<>();
    for (String e : env) {
      final int eq = e.indexOf('=');
      if (eq <= 0) {
        throw new CommandLine.ParameterException(new CommandLine(this), "--env needs NAME=VALUE, got '" + e + "'");
      }
      extra.put(e.substring(0, eq), e.substring(eq + 1));
    }
    final String when = generatedAt != null ? generatedAt : Instant.now().truncatedTo(ChronoUnit.SECONDS).toString();
    final PackageWriter w = new PackageWriter(results, tests, core, Environment.collect(commit, extra),
        Inputs.checksums(root, req), when, extras);
    w.write(dir);
    for (Assessment a : results) {
      System.out.printf("%-10s %-13s %12s  %s%n", a.requirement().id(), a.verdict(), Numbers.format(a.value()),
          a.requirement().criterion().describe());
    }
    System.out.printf("evidence package: %d requirements, %d pass, %d fail, %d not measured -> %s%n", results.size(),
        w.count(Assessment.PASS), w.count(Assessment.FAIL), w.count(Assessment.NOT_MEASURED),
        dir.resolve("index.html"));
    return allowFailures || w.count(Assessment.PASS) == results.size() ? 0 : 1;
  }
}
