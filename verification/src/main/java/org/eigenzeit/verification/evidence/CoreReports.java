package org.eigenzeit.verification.evidence;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Coverage (JaCoCo CSV) and mutation (PIT XML) scores of onboard-core.
 *
 * @param lines covered and total lines; null when the report is missing
 * @param branches covered and total branches; null when missing
 * @param branchesByPackage covered and total branches per package (short name), as {covered, total}
 * @param mutations mutation counts by PIT status; empty when the report is missing
 */
public record CoreReports(Count lines, Count branches, Map<String, int[]> branchesByPackage,
    Map<String, Integer> mutations) {

  /**
   * Covered and total items.
   *
   * @param covered items covered
   * @param total items in all
   */
  public record Count(int covered, int total) {}

  /** Copies the maps. */
  public CoreReports {
    branchesByPackage = java.util.Collections.unmodifiableMap(new TreeMap<>(branchesByPackage));
    mutations = java.util.Collections.unmodifiableMap(new TreeMap<>(mutations));
  }

  /**
   * Reads the reports below {@code onboard-core/target}.
   *
   * @param root the project root
   * @return the scores (fields empty where a report is missing)
   * @throws IOException when a report exists but cannot be read
   */
  public static CoreReports read(Path root) throws IOException {
    final Path target = root.resolve("onboard-core").resolve("target");
    Count lines = null;
    Count branches = null;
    final Map<String, int[]> byPackage = new TreeMap<>();
    final Path csv = target.resolve("site").resolve("jacoco").resolve("jacoco.csv");
    if (Files.isRegularFile(csv)) {
      final int[] l = new int[2];
      final int[] b = new int[2];
      final List<String> rows = Files.readAllLines(csv);
      for (String row : rows.subList(1, rows.size())) {
        final String[] f = row.split(",", -1);
        if (f.length < 9) {
          throw new IOException(csv + ": short row '" + row + "'");
        }
        final int bMissed = Integer.parseInt(f[5]);
        final int bCovered = Integer.parseInt(f[6]);
        l[0] += Integer.parseInt(f[8]);
        l[1] += Integer.parseInt(f[7]) + Integer.parseInt(f[8]);
        b[0] += bCovered;
        b[1] += bMissed + bCovered;
        final String pkg = f[1].substring(f[1].lastIndexOf('.') + 1);
        final int[] p = byPackage.computeIfAbsent(pkg, k -> new int[2]);
        p[0] += bCovered;
        p[1] += bMissed + bCovered;
      }
      lines = new Count(l[0], l[1]);
      branches = new Count(b[0], b[1]);
    }
    final Map<String, Integer> mutations = Survivors.read(root, "onboard-core", List.of()).counts();
    return new CoreReports(lines, branches, byPackage, mutations);
  }

  /**
   * Mutations in all.
   *
   * @return the count
   */
  public int mutationTotal() {
    return mutations.values().stream().mapToInt(Integer::intValue).sum();
  }

  /**
   * Mutations PIT counts as detected: killed, timed out, memory error, run error.
   *
   * @return the count
   */
  public int mutationDetected() {
    return Survivors.detected(mutations);
  }

  /**
   * Adds the scores as measurements {@code report.core_line_coverage}, {@code
   * report.core_branch_coverage}, {@code report.core_mutation_score} (fractions).
   *
   * @param into the test results to add to
   */
  public void addTo(TestReports into) {
    if (lines != null && lines.total() > 0) {
      into.put(new TestReports.Measurement("report.core_line_coverage", (double) lines.covered() / lines.total(),
          "JaCoCo", ""));
    }
    if (branches != null && branches.total() > 0) {
      into.put(new TestReports.Measurement("report.core_branch_coverage",
          (double) branches.covered() / branches.total(), "JaCoCo", ""));
    }
    if (mutationTotal() > 0) {
      into.put(new TestReports.Measurement("report.core_mutation_score", (double) mutationDetected() / mutationTotal(),
          "PIT", ""));
    }
  }
}
