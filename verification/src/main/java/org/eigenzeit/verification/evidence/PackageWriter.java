package org.eigenzeit.verification.evidence;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * Writes the review package: {@code index.html} (self-contained, plots embedded), {@code
 * evidence.md}, {@code requirements.csv}, {@code traceability.csv}, {@code measurements.csv},
 * {@code faults.csv} (seeded faults, when the fault check ran), {@code docs-figures.csv} (figures
 * tagged in the docs), {@code core-survivors.csv} and {@code ground-survivors.csv} (when PIT ran; each survivor with its reason), {@code
 * environment.txt}, {@code inputs.sha256} and {@code plots/*.png|svg}. Every output is a
 * function of its inputs only, except the one "generated" line of the HTML and Markdown files.
 */
public final class PackageWriter {
  /** The caution every output carries. */
  static final String CAUTION = "This package records what the Eigenzeit tests measured on one build. It is "
      + "evidence for a review, not a qualification: a timing payload on a navigation satellite must be verified "
      + "by the mission against its own requirements and the applicable standards (e.g. IS-GPS-200, IERS "
      + "Conventions 2010, ECSS-E-ST-40C / ECSS-Q-ST-80C) before any time it produces is used.";

  private final List<Assessment> results;
  private final Map<String, TestReports.ClassResult> classes;
  private final Map<String, TestReports.Measurement> measured;
  private final CoreReports core;
  private final Map<String, String> environment;
  private final Map<String, String> checksums;
  private final String generated;
  private final List<String> envOrder;
  private final Extras extras;

  /**
   * Collects what the package shows.
   *
   * @param results verdicts in requirements-file order
   * @param tests the test results
   * @param core the coverage and mutation reports
   * @param environment environment entries
   * @param checksums input checksums
   * @param generated the generation time (the only line allowed to differ between two runs)
   * @param extras seeded faults, docs figures and the ground-sim mutation report
   */
  public PackageWriter(List<Assessment> results, TestReports tests, CoreReports core, Map<String, String> environment,
      Map<String, String> checksums, String generated, Extras extras) {
    this.extras = extras;
    this.results = List.copyOf(results);
    this.classes = new TreeMap<>(tests.classes());
    this.measured = new TreeMap<>(tests.measurements());
    this.core = core;
    this.environment = Map.copyOf(environment);
    this.envOrder = List.copyOf(environment.keySet());
    this.checksums = new TreeMap<>(checksums);
    this.generated = generated;
  }

  /**
   * Counts verdicts.
   *
   * @param verdict PASS, FAIL or NOT MEASURED
   * @return how many requirements have it
   */
  public long count(String verdict) {
    return results.stream().filter(a -> a.verdict().equals(verdict)).count();
  }

  /**
   * Writes every file of the package into the directory.
   *
   * @param out the package directory (created)
   * @throws IOException on a write failure
   */
  public void write(Path out) throws IOException {
    Files.createDirectories(out);
    final Path plots = out.resolve("plots");
    final byte[] margins = Plots.margins(results, plots);
    final List<String> classes = new ArrayList<>();
    final List<double[]> env = new ArrayList<>();
    for (Assessment a : results) {
      for (TestReports.Measurement m : a.evidence()) {
        if (m.key().startsWith("envelope.") && m.key().endsWith(".worst_ps_per_day") && a.requirement().metrics().size() == 1) {
          final String cls = m.key().substring("envelope.".length(), m.key().indexOf(".worst_ps_per_day"));
          classes.add("lunar".equals(cls) ? cls : cls.toUpperCase(Locale.ROOT));
          env.add(new double[] {m.value(), a.requirement().criterion().threshold()});
        }
      }
    }
    final byte[] envelope = classes.isEmpty() ? null : Plots.envelope(classes, env.stream().mapToDouble(d -> d[0]).toArray(),
        env.stream().mapToDouble(d -> d[1]).toArray(), plots);
    final byte[] coverage = core.branchesByPackage().isEmpty() ? null : Plots.coverage(core.branchesByPackage(), plots);
    write(out.resolve("requirements.csv"), requirementsCsv());
    write(out.resolve("traceability.csv"), traceabilityCsv());
    write(out.resolve("measurements.csv"), measurementsCsv());
    if (extras.faults() != null) {
      write(out.resolve("faults.csv"), rowsCsv("fault,breaks,file,module,tests,verdict,detail", extras.faults()));
    }
    final List<List<String>> docRows = new ArrayList<>();
    for (DocsFigures.Check c : extras.docs()) {
      docRows.add(List.of(c.tag().file(), Integer.toString(c.tag().line()), c.tag().figure(), c.tag().unit(), c.tag().key(),
          Numbers.format(c.measured()), Double.isNaN(c.bound()) ? "" : Numbers.format(c.bound()), c.verdict(), c.detail()));
    }
    write(out.resolve("docs-figures.csv"), rowsCsv("file,line,figure,unit,key,measured,bound,verdict,detail", docRows));
    for (Survivors sv : List.of(extras.core(), extras.ground())) {
      if (sv.total() > 0) {
        write(out.resolve(("onboard-core".equals(sv.module()) ? "core" : "ground") + "-survivors.csv"),
            rowsCsv("class,method,line,mutator,description,status,reason", sv.rows()));
      }
    }
    final StringBuilder envText = new StringBuilder();
    envOrder.forEach(k -> envText.append(k).append(": ").append(environment.get(k)).append('\n'));
    write(out.resolve("environment.txt"), envText.toString());
    final StringBuilder sums = new StringBuilder();
    checksums.forEach((p, h) -> sums.append(h).append("  ").append(p).append('\n'));
    write(out.resolve("inputs.sha256"), sums.toString());
    write(out.resolve("evidence.md"), markdown(envelope != null, coverage != null));
    write(out.resolve("index.html"), html(margins, envelope, coverage));
  }

  private static void write(Path p, String s) throws IOException {
    Files.writeString(p, s, StandardCharsets.UTF_8);
  }

  // ---------------------------------------------------------------------------------------------
  // CSV

  private static String csv(String s) {
    return s.contains(",") || s.contains("\"") || s.contains("\n") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
  }

  private String requirementsCsv() {
    final StringBuilder b = new StringBuilder(
        "id,title,method,metrics,measured,criterion,margin,asserted_bound,bound_ratio,unit,verdict,source,text\n");
    for (Assessment a : results) {
      final Requirement r = a.requirement();
      b.append(String.join(",", csv(r.id()), csv(r.title()), csv(r.method()), csv(String.join(" ", r.metrics())),
          csv(Numbers.format(a.value())), csv(r.criterion().describe()), csv(margin(a)), csv(boundText(a)),
          csv(boundRatio(a)), csv(r.unit()), csv(a.verdict()), csv(r.source()), csv(r.text()))).append('\n');
    }
    return b.toString();
  }

  /** The bound the test asserts on the judged value (the measurement that gave it), NaN when none was printed. */
  static double assertedBound(Assessment a) {
    for (TestReports.Measurement m : a.evidence()) {
      if (Double.compare(m.value(), a.value()) == 0) {
        return m.bound();
      }
    }
    return Double.NaN;
  }

  private static String margin(Assessment a) {
    return Double.isNaN(a.value()) ? "" : Numbers.format(a.requirement().criterion().margin(a.value()));
  }

  private static String boundText(Assessment a) {
    final double b = assertedBound(a);
    return Double.isNaN(b) ? "not printed" : Numbers.format(b);
  }

  /** The asserted bound over the measured value: how far the test's own bound is from what it measured. */
  private static String boundRatio(Assessment a) {
    final double b = assertedBound(a);
    if (Double.isNaN(b) || Double.isNaN(a.value())) {
      return "";
    }
    return a.value() == 0 ? (b == 0 ? "1" : "inf") : Numbers.format(Math.abs(b / a.value()));
  }

  private static String rowsCsv(String header, List<List<String>> rows) {
    final StringBuilder b = new StringBuilder(header).append('\n');
    rows.forEach(r -> b.append(String.join(",", r.stream().map(PackageWriter::csv).toList())).append('\n'));
    return b.toString();
  }

  private String traceabilityCsv() {
    final StringBuilder b = new StringBuilder("requirement,method,verified_by,tests_run,failures,errors,skipped,evidence_key,evidence_from\n");
    for (Assessment a : results) {
      final Requirement r = a.requirement();
      final List<String> sources = new ArrayList<>(r.verifiedBy());
      if (sources.isEmpty()) {
        sources.add("");
      }
      for (String t : sources) {
        final TestReports.ClassResult c = t.isEmpty() ? null : classes.get(t);
        for (String key : r.metrics()) {
          final TestReports.Measurement m = measured.get(key);
          b.append(String.join(",", csv(r.id()), r.methodLetter(), csv(t), c == null ? "" : Integer.toString(c.tests()),
              c == null ? "" : Integer.toString(c.failures()), c == null ? "" : Integer.toString(c.errors()),
              c == null ? "" : Integer.toString(c.skipped()), csv(key), csv(m == null ? "" : origin(m)))).append('\n');
        }
      }
    }
    return b.toString();
  }

  private String measurementsCsv() {
    final StringBuilder b = new StringBuilder("key,value,bound,test_class,test_method\n");
    measured.values().forEach(m -> b.append(String.join(",", csv(m.key()), csv(Double.toString(m.value())),
        m.hasBound() ? csv(Double.toString(m.bound())) : "", csv(m.testClass()), csv(m.testMethod()))).append('\n'));
    return b.toString();
  }

  private static String origin(TestReports.Measurement m) {
    return m.testMethod().isEmpty() ? m.testClass() : m.testClass() + "#" + m.testMethod();
  }

  private static String shortName(String cls) {
    return cls.substring(cls.lastIndexOf('.') + 1);
  }

  // ---------------------------------------------------------------------------------------------
  // Markdown

  private String summaryLine() {
    return String.format(Locale.ROOT, "%d requirements: %d pass, %d fail, %d not measured.", results.size(),
        count(Assessment.PASS), count(Assessment.FAIL), count(Assessment.NOT_MEASURED));
  }

  private String markdown(boolean envelopePlot, boolean coveragePlot) {
    final StringBuilder b = new StringBuilder();
    b.append("# Eigenzeit verification evidence\n\n");
    b.append("> **Caution.** ").append(CAUTION).append("\n\n");
    b.append("Generated: ").append(generated).append("  \n");
    b.append("Commit: ").append(environment.getOrDefault("commit", "unknown")).append("\n\n");
    b.append("**").append(summaryLine()).append("**\n\n");
    b.append("## Requirements and results\n\n");
    b.append("| ID | Requirement | Method | Measured | Criterion | Margin | Asserted bound | Bound / measured | Unit | Verdict |\n")
        .append("|---|---|---|---|---|---|---|---|---|---|\n");
    for (Assessment a : results) {
      final Requirement r = a.requirement();
      b.append("| ").append(r.id()).append(" | ").append(md(r.title())).append(" | ").append(r.method()).append(" | ")
          .append(Numbers.format(a.value())).append(" | ").append(md(r.criterion().describe())).append(" | ")
          .append(margin(a)).append(" | ").append(boundText(a)).append(" | ").append(boundRatio(a)).append(" | ")
          .append(md(r.unit())).append(" | ").append(a.verdict()).append(" |\n");
    }
    b.append("\n## Traceability matrix\n\n");
    b.append("| ID | Method | Verified by | Tests run / failed | Evidence (key ← test) |\n|---|---|---|---|---|\n");
    for (Assessment a : results) {
      b.append("| ").append(a.requirement().id()).append(" | ").append(a.requirement().methodLetter()).append(" | ")
          .append(md(verifiers(a.requirement(), ", "))).append(" | ").append(runs(a.requirement(), ", ")).append(" | ")
          .append(md(evidence(a, "; "))).append(" |\n");
    }
    b.append("\n## Outside sources of the checks\n\n| ID | Source |\n|---|---|\n");
    results.forEach(a -> b.append("| ").append(a.requirement().id()).append(" | ").append(md(a.requirement().source()))
        .append(" |\n"));
    b.append("\n## Requirement texts\n\n");
    results.forEach(a -> b.append("- **").append(a.requirement().id()).append("** ").append(md(a.requirement().text()))
        .append(problems(a).isEmpty() ? "" : " *(" + md(problems(a)) + ")*").append('\n'));
    b.append("\n## Coverage and mutation scores of onboard-core\n\n").append(scoresText("\n- ", "- ")).append("\n\n");
    for (String[] section : extraSections()) {
      b.append("## ").append(section[0]).append("\n\n").append(section[1]).append("\n\n");
      final List<List<String>> rows = extraRows(section[0]);
      if (!rows.isEmpty()) {
        b.append("| ").append(String.join(" | ", rows.get(0))).append(" |\n|")
            .append("---|".repeat(rows.get(0).size())).append('\n');
        rows.subList(1, rows.size()).forEach(r -> b.append("| ")
            .append(String.join(" | ", r.stream().map(PackageWriter::md).toList())).append(" |\n"));
        b.append('\n');
      }
    }
    b.append("## Plots\n\n![margins](plots/margins.png)\n");
    if (envelopePlot) {
      b.append("\n![envelope](plots/envelope.png)\n");
    }
    if (coveragePlot) {
      b.append("\n![coverage](plots/coverage.png)\n");
    }
    b.append("\n## Environment\n\n");
    envOrder.forEach(k -> b.append("- ").append(k).append(": ").append(md(environment.get(k))).append('\n'));
    b.append("\n## Inputs (SHA-256)\n\n```\n");
    checksums.forEach((p, h) -> b.append(h).append("  ").append(p).append('\n'));
    b.append("```\n\n").append(howToRead()).append('\n');
    return b.toString();
  }

  private static String md(String s) {
    return s.replace("|", "\\|");
  }

  private static String verdictClass(String cell) {
    if ("CAUGHT".equals(cell) || "OK".equals(cell)) {
      return " class=\"PASS\"";
    }
    return List.of("NOT CAUGHT", "STALE", "NO TESTS", "BASELINE FAILS", "MISMATCH", "NO BOUND", "BOUND TOO LOOSE",
        "NOT MEASURED").contains(cell) ? " class=\"FAIL\"" : "";
  }

  /** Titles and introductions of the sections after the scores: seeded faults, docs figures, ground-sim PIT. */
  private List<String[]> extraSections() {
    final List<String[]> out = new ArrayList<>();
    final List<List<String>> f = extras.faults();
    out.add(new String[] {"Seeded faults", f == null
        ? "The seeded-fault check did not run (scripts/fault-check.sh; EIGENZEIT_SKIP_FAULTS skips it)."
        : String.format(Locale.ROOT, "%d deliberate faults (verification/faults.yaml), each applied alone to a scratch copy; "
            + "%d caught by the tests named to catch them (scripts/fault-check.sh).", f.size(),
            f.stream().filter(r -> "CAUGHT".equals(r.get(5))).count())});
    final long docFails = extras.docs().stream().filter(c -> !c.ok()).count();
    out.add(new String[] {"Figures in the docs", String.format(Locale.ROOT, "%d figures in README.md and docs/ are tagged "
        + "with the evidence key that pins them; %d fail (value disagrees with the digits written, no bound printed, or the "
        + "test's bound is looser than 10x the measured value). %d untagged numbers with units read like accuracy claims "
        + "(a heuristic list for review, not a failure).", extras.docs().size(), docFails, extras.docWarnings().size())});
    out.add(new String[] {"Mutation survivors of onboard-core", survivorsIntro(extras.core(), "the whole module")});
    out.add(new String[] {"Mutation survivors of ground-sim", survivorsIntro(extras.ground(),
        "the readers of external input and the budget analysis (the classes of ground-sim's PIT configuration)")});
    if (!extras.unusedRules().isEmpty()) {
      out.add(new String[] {"Survivor reasons that matched nothing", String.format(Locale.ROOT, "%d rules of %s explain no "
          + "survivor of these reports (the code or its tests changed since the rule was written; review and remove them).",
          extras.unusedRules().size(), Extras.REASONS)});
    }
    return out;
  }

  private static String survivorsIntro(Survivors sv, String scope) {
    if (sv.total() == 0) {
      return "PIT did not run on " + sv.module() + " (scripts/evidence.sh runs it unless EIGENZEIT_SKIP_PIT is set).";
    }
    return String.format(Locale.ROOT, "PIT on %s (%s): %d mutants, detected %d (%.1f %%), survived %d, without coverage %d; "
        + "%d survivors have no reason recorded in %s. Each survivor with its reason:", sv.module(), scope, sv.total(),
        sv.detected(), 100.0 * sv.detected() / sv.total(), sv.counts().getOrDefault("SURVIVED", 0),
        sv.counts().getOrDefault("NO_COVERAGE", 0), sv.withoutReason(), Extras.REASONS);
  }

  /** Header row then data rows of an extra section (empty when there is nothing to list). */
  private List<List<String>> extraRows(String title) {
    final List<List<String>> rows = new ArrayList<>();
    if (title.startsWith("Seeded") && extras.faults() != null) {
      rows.add(List.of("fault", "breaks", "caught by", "verdict", "detail"));
      extras.faults().forEach(r -> rows.add(List.of(r.get(0), r.get(1), r.get(3) + ": " + r.get(4), r.get(5), r.get(6))));
    } else if (title.startsWith("Figures")) {
      rows.add(List.of("where", "figure", "key", "verdict", "detail"));
      extras.docs().forEach(c -> rows.add(List.of(c.tag().file() + ":" + c.tag().line(),
          c.tag().figure() + (c.tag().unit().isEmpty() ? "" : " " + c.tag().unit()), c.tag().key(), c.verdict(), c.detail())));
      extras.docWarnings().forEach(w -> rows.add(List.of(w.file() + ":" + w.line(), w.figure(), "", "untagged", w.text())));
    } else if (title.startsWith("Mutation survivors")) {
      final Survivors sv = title.endsWith("onboard-core") ? extras.core() : extras.ground();
      rows.add(List.of("class", "method", "line", "mutator", "description", "status", "reason"));
      sv.rows().forEach(r -> rows.add(List.of(shortName(r.get(0)), r.get(1), r.get(2), r.get(3), r.get(4), r.get(5), r.get(6))));
    } else if (title.startsWith("Survivor reasons")) {
      rows.add(List.of("line", "module", "class", "method", "mutator", "reason"));
      extras.unusedRules().forEach(r -> rows.add(List.of(Integer.toString(r.line()), r.module(), r.cls(), r.method(),
          r.mutator(), r.reason())));
    }
    return rows.size() > 1 ? rows : List.of();
  }

  private String verifiers(Requirement r, String sep) {
    return r.verifiedBy().isEmpty() ? "(report of onboard-core)" : String.join(sep,
        r.verifiedBy().stream().map(PackageWriter::shortName).toList());
  }

  private String runs(Requirement r, String sep) {
    final List<String> out = new ArrayList<>();
    for (String t : r.verifiedBy()) {
      final TestReports.ClassResult c = classes.get(t);
      out.add(c == null ? "not run" : (c.tests() - c.skipped()) + " / " + (c.failures() + c.errors()));
    }
    return out.isEmpty() ? "-" : String.join(sep, out);
  }

  private static String evidence(Assessment a, String sep) {
    final List<String> out = new ArrayList<>();
    for (TestReports.Measurement m : a.evidence()) {
      out.add(m.key() + " = " + Numbers.format(m.value()) + " ← " + shortName(m.testClass())
          + (m.testMethod().isEmpty() ? "" : "#" + m.testMethod()));
    }
    a.missing().forEach(k -> out.add(k + ": not reported"));
    return String.join(sep, out);
  }

  private static String problems(Assessment a) {
    final List<String> p = new ArrayList<>();
    if (!a.missing().isEmpty()) {
      p.add("not reported: " + String.join(", ", a.missing()));
    }
    if (!a.testsNotPassed().isEmpty()) {
      p.add("tests not passed: " + String.join(", ", a.testsNotPassed()));
    }
    return String.join("; ", p);
  }

  private String scoresText(String sep, String first) {
    final StringBuilder b = new StringBuilder(first);
    if (core.lines() != null) {
      b.append(String.format(Locale.ROOT, "lines %d of %d (%.1f %%)", core.lines().covered(), core.lines().total(),
          100.0 * core.lines().covered() / core.lines().total()));
      b.append(sep).append(String.format(Locale.ROOT, "branches %d of %d (%.1f %%)", core.branches().covered(),
          core.branches().total(), 100.0 * core.branches().covered() / core.branches().total()));
    } else {
      b.append("JaCoCo report missing (onboard-core/target/site/jacoco/jacoco.csv)");
    }
    if (core.mutationTotal() > 0) {
      // Killed and timed out are shown together: a slow mutant can time out in one run and be
      // killed in the next (measured: 1 of 2658 moved between two runs of one commit).
      b.append(sep).append(String.format(Locale.ROOT,
          "mutations %d: detected %d (%.1f %%, killed or timed out), survived %d, without coverage %d",
          core.mutationTotal(), core.mutationDetected(), 100.0 * core.mutationDetected() / core.mutationTotal(),
          core.mutations().getOrDefault("SURVIVED", 0), core.mutations().getOrDefault("NO_COVERAGE", 0)));
    } else {
      b.append(sep).append("PIT report missing (onboard-core/target/pit-reports/mutations.xml)");
    }
    return b.toString();
  }

  private static String howToRead() {
    return "## How to read this package\n\n"
        + "Each requirement names a metric (an evidence key printed by a test, or a score from the reports of "
        + "onboard-core), a criterion with a number, the outside source of the expected value, and the test "
        + "classes that verify it. PASS: every verifying test class ran and passed and the measured value meets "
        + "the criterion. FAIL: a verifying test failed or the value misses the criterion. NOT MEASURED: a "
        + "metric was not reported or a verifying test did not run. Where a requirement lists several metrics "
        + "the largest value is judged. The margin factor is how many times the criterion could tighten before "
        + "the requirement fails. The asserted bound is the bound the verifying test itself asserts on the value "
        + "(printed as 'evidence: key = value bound B'); bound / measured says how tight that test is (at most 10 for "
        + "a figure quoted in the docs). Method letters: T test, A analysis, I inspection, R review of design. "
        + "docs/verification.md describes the approach; requirements.csv, traceability.csv and measurements.csv "
        + "hold the same content for tools.";
  }

  // ---------------------------------------------------------------------------------------------
  // HTML

  private static String h(String s) {
    return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
  }

  private static String img(byte[] png, String alt) {
    return "<img alt=\"" + h(alt) + "\" src=\"data:image/png;base64," + Base64.getEncoder().encodeToString(png) + "\">";
  }

  private String html(byte[] margins, byte[] envelope, byte[] coverage) {
    final StringBuilder b = new StringBuilder();
    b.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n<title>Eigenzeit verification evidence</title>\n")
        .append("<style>body{font-family:sans-serif;margin:2em;max-width:1200px;color:#222}")
        .append("table{border-collapse:collapse;margin:1em 0;font-size:0.9em}td,th{border:1px solid #bbb;padding:3px 6px;vertical-align:top}")
        .append("th{background:#eee}.PASS{background:#c8e6c9}.FAIL{background:#ffcdd2}.NOT{background:#e0e0e0}")
        .append(".caution{border:2px solid #c62828;padding:0.6em;background:#fff3f3}img{max-width:100%}")
        .append("code{font-size:0.9em}td.num,td.id{text-align:right;white-space:nowrap}td.id{text-align:left}</style></head><body>\n");
    b.append("<h1>Eigenzeit verification evidence</h1>\n");
    b.append("<p class=\"caution\"><b>Caution.</b> ").append(h(CAUTION)).append("</p>\n");
    b.append("<p>Generated: ").append(h(generated)).append("<br>Commit: <code>")
        .append(h(environment.getOrDefault("commit", "unknown"))).append("</code></p>\n");
    b.append("<p><b>").append(h(summaryLine())).append("</b></p>\n");
    b.append("<p>Contents: <a href=\"#results\">requirements and results</a> · <a href=\"#plots\">plots</a> · ")
        .append("<a href=\"#traceability\">traceability matrix</a> · <a href=\"#sources\">outside sources</a> · ")
        .append("<a href=\"#scores\">coverage and mutation scores</a> · <a href=\"#faults\">seeded faults</a> · ")
        .append("<a href=\"#docs\">docs figures</a> · <a href=\"#core-pit\">core survivors</a> · <a href=\"#ground-pit\">ground-sim survivors</a> · ")
        .append("<a href=\"#environment\">environment</a> · ")
        .append("<a href=\"#inputs\">inputs</a> · <a href=\"#reading\">how to read</a></p>\n");
    b.append("<h2 id=\"results\">Requirements and results</h2>\n<table><tr><th>ID</th><th>Requirement</th><th>Method</th>")
        .append("<th>Measured</th><th>Criterion</th><th>Margin</th><th>Asserted bound</th><th>Bound / measured</th>")
        .append("<th>Unit</th><th>Verdict</th></tr>\n");
    for (Assessment a : results) {
      final Requirement r = a.requirement();
      b.append("<tr><td class=\"id\">").append(h(r.id())).append("</td><td><b>").append(h(r.title())).append("</b><br>")
          .append(h(r.text()));
      if (!problems(a).isEmpty()) {
        b.append("<br><i>").append(h(problems(a))).append("</i>");
      }
      b.append("</td><td>").append(h(r.method())).append("</td><td class=\"num\">").append(h(Numbers.format(a.value())))
          .append("</td><td class=\"num\">").append(h(r.criterion().describe())).append("</td><td class=\"num\">")
          .append(h(margin(a))).append("</td><td class=\"num\">").append(h(boundText(a))).append("</td><td class=\"num\">")
          .append(h(boundRatio(a))).append("</td><td>").append(h(r.unit()))
          .append("</td><td class=\"").append(a.verdict().startsWith("NOT") ? "NOT" : a.verdict()).append("\">").append(h(a.verdict()))
          .append("</td></tr>\n");
    }
    b.append("</table>\n<h2 id=\"plots\">Plots</h2>\n<p>").append(img(margins, "margin factor per requirement")).append("</p>\n");
    if (envelope != null) {
      b.append("<p>").append(img(envelope, "worst error per orbit class")).append("</p>\n");
    }
    b.append("<h2 id=\"traceability\">Traceability matrix</h2>\n<table><tr><th>ID</th><th>Method</th><th>Verified by</th>")
        .append("<th>Tests run / failed</th><th>Evidence (key = value ← test)</th></tr>\n");
    for (Assessment a : results) {
      b.append("<tr><td class=\"id\">").append(h(a.requirement().id())).append("</td><td>").append(a.requirement().methodLetter())
          .append("</td><td>").append(h(verifiers(a.requirement(), ", "))).append("</td><td>")
          .append(h(runs(a.requirement(), ", "))).append("</td><td><code>").append(h(evidence(a, "; ")))
          .append("</code></td></tr>\n");
    }
    b.append("</table>\n<h3>Test classes and the requirements they verify</h3>\n<table><tr><th>Test class</th>")
        .append("<th>Module</th><th>Run / failed</th><th>Requirements</th></tr>\n");
    final Map<String, List<String>> reverse = new TreeMap<>();
    results.forEach(a -> a.requirement().verifiedBy().forEach(t ->
        reverse.computeIfAbsent(t, k -> new ArrayList<>()).add(a.requirement().id())));
    reverse.forEach((t, ids) -> {
      final TestReports.ClassResult c = classes.get(t);
      b.append("<tr><td><code>").append(h(t)).append("</code></td><td>").append(c == null ? "" : h(c.module()))
          .append("</td><td>").append(c == null ? "not run" : (c.tests() - c.skipped()) + " / " + (c.failures() + c.errors()))
          .append("</td><td>").append(h(String.join(", ", ids))).append("</td></tr>\n");
    });
    b.append("</table>\n<h2 id=\"sources\">Outside sources of the checks</h2>\n<table><tr><th>ID</th><th>Source</th></tr>\n");
    results.forEach(a -> b.append("<tr><td class=\"id\">").append(h(a.requirement().id())).append("</td><td>")
        .append(h(a.requirement().source())).append("</td></tr>\n"));
    b.append("</table>\n<h2 id=\"scores\">Coverage and mutation scores of onboard-core</h2>\n<ul><li>")
        .append(h(scoresText("\u0000", "")).replace("\u0000", "</li><li>")).append("</li></ul>\n");
    if (coverage != null) {
      b.append("<p>").append(img(coverage, "branch coverage per package")).append("</p>\n");
    }
    final String[] ids = {"faults", "docs", "core-pit", "ground-pit", "stale-reasons"};
    final List<String[]> sections = extraSections();
    for (int i = 0; i < sections.size(); i++) {
      b.append("<h2 id=\"").append(ids[i]).append("\">").append(h(sections.get(i)[0])).append("</h2>\n<p>")
          .append(h(sections.get(i)[1])).append("</p>\n");
      final List<List<String>> rows = extraRows(sections.get(i)[0]);
      if (!rows.isEmpty()) {
        b.append("<table><tr>");
        rows.get(0).forEach(c -> b.append("<th>").append(h(c)).append("</th>"));
        b.append("</tr>\n");
        for (List<String> r : rows.subList(1, rows.size())) {
          b.append("<tr>");
          r.forEach(c -> b.append("<td").append(verdictClass(c)).append(">").append(h(c)).append("</td>"));
          b.append("</tr>\n");
        }
        b.append("</table>\n");
      }
    }
    b.append("<h2 id=\"environment\">Environment</h2>\n<table>\n");
    envOrder.forEach(k -> b.append("<tr><th>").append(h(k)).append("</th><td><code>").append(h(environment.get(k)))
        .append("</code></td></tr>\n"));
    b.append("</table>\n<h2 id=\"inputs\">Inputs (SHA-256)</h2>\n<table><tr><th>File</th><th>SHA-256</th></tr>\n");
    checksums.forEach((p, s) -> b.append("<tr><td><code>").append(h(p)).append("</code></td><td><code>").append(s)
        .append("</code></td></tr>\n"));
    b.append("</table>\n");
    final String read = howToRead();
    b.append("<h2 id=\"reading\">How to read this package</h2>\n<p>").append(h(read.substring(read.indexOf("\n\n") + 2)))
        .append("</p>\n</body></html>\n");
    return b.toString();
  }
}
