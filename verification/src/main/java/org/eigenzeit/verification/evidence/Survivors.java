package org.eigenzeit.verification.evidence;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import javax.xml.parsers.ParserConfigurationException;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.SAXException;

/**
 * The mutants PIT left alive in one module, each with the reason a reviewer reads beside it.
 *
 * <p>Reasons come from {@code verification/survivor-reasons.csv}: one rule per line, {@code
 * module,class,method,mutator,reason}, where class is a simple name, a fully qualified name (a
 * nested class with its {@code $} name, or its outer class for all of them) or a package ending in {@code .*}, and method and mutator are exact names or {@code *}. The first rule
 * that matches a survivor gives its reason; a survivor no rule matches is reported as {@link
 * #NO_REASON} and counted ({@code report.survivors_without_reason}), so a new survivor cannot hide
 * in the package. The rules file is validated in full: a malformed line is refused with its line
 * number.
 *
 * @param module the Maven module (onboard-core or ground-sim)
 * @param counts mutations by PIT status; empty when PIT did not run on the module
 * @param rows survivors: class, method, line, mutator, description, status, reason (sorted)
 */
public record Survivors(String module, Map<String, Integer> counts, List<List<String>> rows) {
  /** The reason shown for a survivor no rule explains. */
  public static final String NO_REASON = "no reason recorded";

  /** The modules PIT runs on. */
  static final Set<String> MODULES = Set.of("onboard-core", "ground-sim");

  /** Copies. */
  public Survivors {
    counts = java.util.Collections.unmodifiableMap(new TreeMap<>(counts));
    rows = List.copyOf(rows);
  }

  /**
   * One rule of the reasons file.
   *
   * @param line line number in the file
   * @param module module
   * @param cls class pattern
   * @param method method or *
   * @param mutator short mutator name or *
   * @param reason the reason
   */
  public record Rule(int line, String module, String cls, String method, String mutator, String reason) {
    boolean matches(String mod, String mutatedClass, String mutatedMethod, String shortMutator) {
      return module.equals(mod) && classMatches(mutatedClass) && ("*".equals(method) || method.equals(mutatedMethod))
          && ("*".equals(mutator) || mutator.equals(shortMutator));
    }

    private boolean classMatches(String fqcn) {
      final String outer = fqcn.contains("$") ? fqcn.substring(0, fqcn.indexOf('$')) : fqcn;
      if (cls.endsWith(".*")) {
        return outer.startsWith(cls.substring(0, cls.length() - 1));
      }
      return cls.equals(fqcn) || fqcn.endsWith("." + cls) || cls.equals(outer) || outer.endsWith("." + cls);
    }
  }

  /**
   * Reads and validates the reasons file.
   *
   * @param file the file; a missing file gives no rules
   * @return the rules in file order
   * @throws IOException when a line is malformed (message names file and line) or the file cannot be read
   */
  public static List<Rule> readRules(Path file) throws IOException {
    final List<Rule> rules = new ArrayList<>();
    if (!Files.isRegularFile(file)) {
      return rules;
    }
    final List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
    for (int i = 0; i < lines.size(); i++) {
      final String text = lines.get(i);
      if (text.isBlank() || text.startsWith("#")) {
        continue;
      }
      final List<List<String>> parsed = Extras.csv(text);
      final List<String> f = parsed.isEmpty() ? List.of() : parsed.get(0);
      final String where = file + ":" + (i + 1) + ": ";
      if (f.size() != 5) {
        throw new IOException(where + "expected 5 fields (module,class,method,mutator,reason), found " + f.size());
      }
      if (!MODULES.contains(f.get(0))) {
        throw new IOException(where + "unknown module '" + f.get(0) + "' (expected one of " + new java.util.TreeSet<>(MODULES) + ")");
      }
      for (int k = 1; k < 5; k++) {
        if (f.get(k).isBlank() || !f.get(k).equals(f.get(k).strip())) {
          throw new IOException(where + "field " + (k + 1) + " is empty or has surrounding blanks");
        }
      }
      if (f.get(4).length() < 20) {
        throw new IOException(where + "reason too short to tell a reviewer anything: '" + f.get(4) + "'");
      }
      rules.add(new Rule(i + 1, f.get(0), f.get(1), f.get(2), f.get(3), f.get(4)));
    }
    return rules;
  }

  /**
   * Reads a module's PIT report and gives each survivor (SURVIVED or NO_COVERAGE) its reason.
   *
   * @param root the project root
   * @param module the module
   * @param rules the rules
   * @return the counts and survivors (both empty when the report is missing)
   * @throws IOException when the report exists but cannot be read or parsed
   */
  public static Survivors read(Path root, String module, List<Rule> rules) throws IOException {
    final Map<String, Integer> counts = new TreeMap<>();
    final List<List<String>> rows = new ArrayList<>();
    final Path xml = root.resolve(module).resolve("target").resolve("pit-reports").resolve("mutations.xml");
    if (Files.isRegularFile(xml)) {
      try (InputStream in = Files.newInputStream(xml)) {
        final NodeList list = TestReports.builder().parse(in).getElementsByTagName("mutation");
        for (int i = 0; i < list.getLength(); i++) {
          final Element e = (Element) list.item(i);
          final String status = e.getAttribute("status");
          counts.merge(status, 1, Integer::sum);
          if ("SURVIVED".equals(status) || "NO_COVERAGE".equals(status)) {
            final String cls = text(e, "mutatedClass");
            final String method = text(e, "mutatedMethod");
            final String mutator = shortMutator(text(e, "mutator"));
            rows.add(List.of(cls, method, text(e, "lineNumber"), mutator, text(e, "description"), status,
                reason(rules, module, cls, method, mutator)));
          }
        }
      } catch (SAXException | ParserConfigurationException e) {
        throw new IOException(xml + ": " + e.getMessage(), e);
      }
    }
    rows.sort((a, b) -> String.join(" ", a).compareTo(String.join(" ", b)));
    return new Survivors(module, counts, rows);
  }

  static String reason(List<Rule> rules, String module, String cls, String method, String mutator) {
    for (Rule r : rules) {
      if (r.matches(module, cls, method, mutator)) {
        return r.reason();
      }
    }
    return NO_REASON;
  }

  private static String text(Element e, String tag) {
    final NodeList n = e.getElementsByTagName(tag);
    return n.getLength() == 0 ? "" : n.item(0).getTextContent().strip();
  }

  private static String shortMutator(String m) {
    return m.substring(m.lastIndexOf('.') + 1);
  }

  /**
   * Mutants in all.
   *
   * @return the count
   */
  public int total() {
    return counts.values().stream().mapToInt(Integer::intValue).sum();
  }

  /**
   * Mutants detected (killed, timed out, memory or run error).
   *
   * @return the count
   */
  public int detected() {
    return detected(counts);
  }

  /**
   * Mutants PIT counts as detected in a count by status: every status but SURVIVED and NO_COVERAGE.
   *
   * @param counts mutations by PIT status
   * @return the count
   */
  static int detected(Map<String, Integer> counts) {
    return counts.entrySet().stream().filter(e -> !"SURVIVED".equals(e.getKey()) && !"NO_COVERAGE".equals(e.getKey()))
        .mapToInt(Map.Entry::getValue).sum();
  }

  /**
   * Survivors no rule explains.
   *
   * @return the count
   */
  public long withoutReason() {
    return rows.stream().filter(r -> NO_REASON.equals(r.get(6))).count();
  }

  /**
   * Rules of this module that explain no survivor of this report (listed for review: the code or the tests changed).
   *
   * @param rules all rules
   * @return the unused rules of this module
   */
  public List<Rule> unusedRules(List<Rule> rules) {
    final List<Rule> out = new ArrayList<>();
    for (Rule r : rules) {
      if (r.module().equals(module) && rows.stream().noneMatch(row -> r.reason().equals(row.get(6))
          && r.matches(module, row.get(0), row.get(1), row.get(3)))) {
        out.add(r);
      }
    }
    return out;
  }
}
