package org.eigenzeit.verification.evidence;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * What the package shows beside the requirements: the seeded-fault table of {@code
 * scripts/fault-check.sh}, the check of the figures tagged in the docs, and the mutants PIT left
 * alive in onboard-core and ground-sim, each with its reason ({@link Survivors}).
 *
 * @param faults rows of fault-check.csv (fault, breaks, file, module, tests, verdict, detail); null when the fault
 *     check did not run
 * @param docs the tagged figures and their verdicts
 * @param docWarnings untagged accuracy figures (heuristic)
 * @param core onboard-core's PIT counts and survivors (empty when PIT did not run)
 * @param ground ground-sim's PIT counts and survivors (readers and budget analysis; empty when PIT did not run)
 * @param unusedRules rules of verification/survivor-reasons.csv that explain no survivor of the reports read
 */
public record Extras(List<List<String>> faults, List<DocsFigures.Check> docs, List<DocsFigures.Warning> docWarnings,
    Survivors core, Survivors ground, List<Survivors.Rule> unusedRules) {

  /** Nothing extra. */
  public static final Extras NONE = new Extras(null, List.of(), List.of(), new Survivors("onboard-core", Map.of(), List.of()),
      new Survivors("ground-sim", Map.of(), List.of()), List.of());

  /** The reasons file, relative to the project root. */
  public static final String REASONS = "verification/survivor-reasons.csv";

  /** Copies the lists. */
  public Extras {
    faults = faults == null ? null : List.copyOf(faults);
    docs = List.copyOf(docs);
    docWarnings = List.copyOf(docWarnings);
    unusedRules = List.copyOf(unusedRules);
  }

  /**
   * Reads the fault-check CSV, the docs, the survivor reasons and both modules' PIT reports.
   *
   * @param root the project root
   * @param faultCsv the fault-check CSV, or null
   * @param measured the measurements (for the docs check)
   * @return the extras
   * @throws IOException when a file exists but cannot be read, or the reasons file is malformed
   */
  public static Extras read(Path root, Path faultCsv, Map<String, TestReports.Measurement> measured) throws IOException {
    List<List<String>> faults = null;
    if (faultCsv != null && Files.isRegularFile(faultCsv)) {
      final List<List<String>> rows = csv(Files.readString(faultCsv, StandardCharsets.UTF_8));
      faults = rows.subList(1, rows.size());
    }
    final List<Survivors.Rule> rules = Survivors.readRules(root.resolve(REASONS));
    final Survivors core = Survivors.read(root, "onboard-core", rules);
    final Survivors ground = Survivors.read(root, "ground-sim", rules);
    final List<Survivors.Rule> unused = new ArrayList<>();
    if (core.total() > 0) {
      unused.addAll(core.unusedRules(rules));
    }
    if (ground.total() > 0) {
      unused.addAll(ground.unusedRules(rules));
    }
    return new Extras(faults, DocsFigures.checkAll(root, measured), DocsFigures.untagged(root), core, ground, unused);
  }

  /**
   * Adds {@code report.faults_not_caught}, {@code report.faults_total}, {@code report.docs_figures_failed},
   * {@code report.ground_mutation_score} and {@code report.survivors_without_reason} where known.
   *
   * @param into the test results
   */
  public void addTo(TestReports into) {
    if (faults != null) {
      final long notCaught = faults.stream().filter(r -> !"CAUGHT".equals(r.get(5))).count();
      into.put(new TestReports.Measurement("report.faults_not_caught", notCaught, "scripts/fault-check.sh", ""));
      into.put(new TestReports.Measurement("report.faults_total", faults.size(), "scripts/fault-check.sh", ""));
    }
    into.put(new TestReports.Measurement("report.docs_figures_failed", docs.stream().filter(c -> !c.ok()).count(), "DocsFigures",
        ""));
    if (ground.total() > 0) {
      into.put(new TestReports.Measurement("report.ground_mutation_score", (double) ground.detected() / ground.total(), "PIT", ""));
    }
    if (core.total() > 0 && ground.total() > 0) {
      into.put(new TestReports.Measurement("report.survivors_without_reason", core.withoutReason() + ground.withoutReason(),
          REASONS, ""));
    }
  }

  /** A small CSV reader (RFC 4180 quoting), enough for the files this project writes. */
  static List<List<String>> csv(String text) {
    final List<List<String>> rows = new ArrayList<>();
    List<String> row = new ArrayList<>();
    final StringBuilder cell = new StringBuilder();
    boolean quoted = false;
    for (int i = 0; i < text.length(); i++) {
      final char c = text.charAt(i);
      if (quoted) {
        if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
          cell.append('"');
          i++;
        } else if (c == '"') {
          quoted = false;
        } else {
          cell.append(c);
        }
      } else if (c == '"') {
        quoted = true;
      } else if (c == ',') {
        row.add(cell.toString());
        cell.setLength(0);
      } else if (c == '\n') {
        row.add(cell.toString());
        cell.setLength(0);
        rows.add(row);
        row = new ArrayList<>();
      } else if (c != '\r') {
        cell.append(c);
      }
    }
    if (cell.length() > 0 || !row.isEmpty()) {
      row.add(cell.toString());
      rows.add(row);
    }
    return rows;
  }
}
