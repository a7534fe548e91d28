package org.eigenzeit.verification.evidence;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * Checks the tagged figures of README.md and docs/*.md against the evidence of the last build
 * (the Surefire reports and the JaCoCo report below the root) and lists untagged accuracy figures
 * as warnings. Exit status 1 when a tagged figure fails. {@code scripts/test-all.sh} runs it
 * after {@code mvn verify}.
 */
@Command(name = "docs-check", mixinStandardHelpOptions = true,
    description = "Checks the figures tagged in the docs against the evidence of the last build.")
public final class DocsCheck implements Callable<Integer> {
  @Option(names = "--root", description = "project root (default: current directory)")
  private Path root = Path.of(".");

  @Option(names = "--warnings", description = "also print the untagged accuracy figures (heuristic)")
  private boolean warnings;

  /**
   * Entry point.
   *
   * @param args command-line arguments
   */
  public static void main(String[] args) {
    System.exit(new CommandLine(new DocsCheck()).execute(args));
  }

  @Override
  public Integer call() throws Exception {
    final TestReports tests = TestReports.read(root);
    CoreReports.read(root).addTo(tests);
    final List<DocsFigures.Check> checks = DocsFigures.checkAll(root, tests.measurements());
    int failed = 0;
    for (DocsFigures.Check c : checks) {
      if (!c.ok()) {
        failed++;
      }
      System.out.printf("docs-check: %-15s %s:%d %s%s  %s%n", c.verdict(), c.tag().file(), c.tag().line(), c.tag().figure(),
          c.tag().unit().isEmpty() ? "" : " " + c.tag().unit(), c.detail());
    }
    final List<DocsFigures.Warning> untagged = DocsFigures.untagged(root);
    if (warnings) {
      untagged.forEach(w -> System.out.printf("docs-check: untagged %s:%d %s  | %s%n", w.file(), w.line(), w.figure(), w.text()));
    }
    System.out.printf("docs-check: %d tagged figures, %d fail; %d untagged figures that look like accuracy claims%s%n",
        checks.size(), failed, untagged.size(), warnings ? "" : " (--warnings lists them)");
    return failed == 0 ? 0 : 1;
  }
}
