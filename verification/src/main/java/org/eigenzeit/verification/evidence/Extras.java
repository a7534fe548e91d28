package org.eigenzeit.verification.evidence;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import javax.xml.parsers.ParserConfigurationException;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.SAXException;

/**
 * What the package shows beside the requirements: the seeded-fault table of {@code
 * scripts/fault-check.sh}, the check of the figures tagged in the docs, and the PIT report of
 * ground-sim (score and survivors).
 *
 * @param faults rows of fault-check.csv (fault, breaks, file, module, tests, verdict, detail); null when the fault
 *     check did not run
 * @param docs the tagged figures and their verdicts
 * @param docWarnings untagged accuracy figures (heuristic)
 * @param groundMutations ground-sim mutation counts by PIT status (empty when PIT did not run)
 * @param groundSurvivors surviving ground-sim mutants: class, method, line, mutator, description
 */
public record Extras(List<List<String>> faults, List<DocsFigures.Check> docs, List<DocsFigures.Warning> docWarnings,
    Map<String, Integer> groundMutations, List<List<String>> groundSurvivors) {

  /** Nothing extra. */
  public static final Extras NONE = new Extras(null, List.of(), List.of(), Map.of(), List.of());

  /** Copies the lists. */
  public Extras {
    faults = faults == null ? null : List.copyOf(faults);
    docs = List.copyOf(docs);
    docWarnings = List.copyOf(docWarnings);
    groundMutations = java.util.Collections.unmodifiableMap(new TreeMap<>(groundMutations));
    groundSurvivors = List.copyOf(groundSurvivors);
  }

  /**
   * Reads the fault-check CSV, the docs and ground-sim's PIT report.
   *
   * @param root the project root
   * @param faultCsv the fault-check CSV, or null
   * @param measured the measurements (for the docs check)
   * @return the extras
   * @throws IOException when a file exists but cannot be read
   */
  public static Extras read(Path root, Path faultCsv, Map<String, TestReports.Measurement> measured) throws IOException {
    List<List<String>> faults = null;
    if (faultCsv != null && Files.isRegularFile(faultCsv)) {
      final List<List<String>> rows = csv(Files.readString(faultCsv, StandardCharsets.UTF_8));
      faults = rows.subList(1, rows.size());
    }
    final Map<String, Integer> counts = new TreeMap<>();
    final List<List<String>> survivors = new ArrayList<>();
    final Path xml = root.resolve("ground-sim").resolve("target").resolve("pit-reports").resolve("mutations.xml");
    if (Files.isRegularFile(xml)) {
      try (InputStream in = Files.newInputStream(xml)) {
        final NodeList list = TestReports.builder().parse(in).getElementsByTagName("mutation");
        for (int i = 0; i < list.getLength(); i++) {
          final Element e = (Element) list.item(i);
          final String status = e.getAttribute("status");
          counts.merge(status, 1, Integer::sum);
          if ("SURVIVED".equals(status) || "NO_COVERAGE".equals(status)) {
            survivors.add(List.of(text(e, "mutatedClass"), text(e, "mutatedMethod"), text(e, "lineNumber"),
                shortMutator(text(e, "mutator")), text(e, "description"), status));
          }
        }
      } catch (SAXException | ParserConfigurationException e) {
        throw new IOException(xml + ": " + e.getMessage(), e);
      }
    }
    survivors.sort((a, b) -> String.join(" ", a).compareTo(String.join(" ", b)));
    return new Extras(faults, DocsFigures.checkAll(root, measured), DocsFigures.untagged(root), counts, survivors);
  }

  private static String text(Element e, String tag) {
    final NodeList n = e.getElementsByTagName(tag);
    return n.getLength() == 0 ? "" : n.item(0).getTextContent().strip();
  }

  private static String shortMutator(String m) {
    return m.substring(m.lastIndexOf('.') + 1);
  }

  /**
   * Adds {@code report.faults_not_caught}, {@code report.faults_total}, {@code report.docs_figures_failed}
   * and {@code report.ground_mutation_score} where known.
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
    final int total = groundMutations.values().stream().mapToInt(Integer::intValue).sum();
    if (total > 0) {
      into.put(new TestReports.Measurement("report.ground_mutation_score", (double) groundDetected() / total, "PIT", ""));
    }
  }

  /**
   * Ground-sim mutants detected (killed, timed out, memory or run error).
   *
   * @return the count
   */
  public int groundDetected() {
    return groundMutations.entrySet().stream().filter(e -> !"SURVIVED".equals(e.getKey()) && !"NO_COVERAGE".equals(e.getKey()))
        .mapToInt(Map.Entry::getValue).sum();
  }

  /**
   * Ground-sim mutants in all.
   *
   * @return the count
   */
  public int groundTotal() {
    return groundMutations.values().stream().mapToInt(Integer::intValue).sum();
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
