package org.eigenzeit.verification.evidence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The package writer on a small made-up build (invented reports, not physics): verdicts, the
 * traceability from requirement to test, determinism, and refusal of a broken requirements file.
 */
class EvidencePackageTest {
  private static final String REQS = """
      requirements:
        - {id: R-1, title: bound, text: t, method: test, metric: a.x, criterion: {op: "<=", value: 1.0e-3},
           unit: s, source: s1, verified-by: [p.GoodTest]}
        - {id: R-2, title: count, text: t, method: analysis, metric: [a.y, a.z], criterion: {op: ">=", value: 10},
           unit: n, source: s2, verified-by: [p.GoodTest]}
        - {id: R-3, title: within, text: t, method: inspection, metric: a.w, criterion: {op: within, value: 23, tolerance: 0.5},
           unit: ns, source: s3, verified-by: [p.BadTest]}
        - {id: R-4, title: missing, text: t, method: review of design, metric: a.none, criterion: {op: "<", value: 1},
           unit: s, source: s4, verified-by: [p.GoodTest]}
        - {id: R-5, title: branches, text: t, method: analysis, metric: report.core_branch_coverage,
           criterion: {op: ">=", value: 0.9}, unit: fraction, source: JaCoCo, verified-by: []}
        - {id: R-6, title: mutations, text: t, method: analysis, metric: report.core_mutation_score,
           criterion: {op: ">=", value: 0.85}, unit: fraction, source: PIT, verified-by: []}
      """;

  private static void project(Path root) throws IOException {
    Files.writeString(root.resolve("requirements.yaml"), REQS);
    final Path sf = Files.createDirectories(root.resolve("mod-a/target/surefire-reports"));
    Files.writeString(sf.resolve("TEST-p.GoodTest.xml"), """
        <?xml version="1.0" encoding="UTF-8"?>
        <testsuite name="p.GoodTest" time="1.234" tests="2" errors="0" skipped="0" failures="0">
          <testcase name="one" classname="p.GoodTest" time="0.5"><system-out><![CDATA[noise
        evidence: a.x = 4.0e-4 bound 1.0e-3
        evidence: a.y = 12
        ]]></system-out></testcase>
          <testcase name="two" classname="p.GoodTest" time="0.7"><system-out><![CDATA[evidence: a.z = 31
        ]]></system-out></testcase>
        </testsuite>
        """);
    Files.writeString(sf.resolve("TEST-p.BadTest.xml"), """
        <?xml version="1.0" encoding="UTF-8"?>
        <testsuite name="p.BadTest" time="0.1" tests="1" errors="0" skipped="0" failures="1">
          <testcase name="w" classname="p.BadTest" time="0.1"><system-out><![CDATA[evidence: a.w = 23.2
        ]]></system-out><failure message="boom"/></testcase>
        </testsuite>
        """);
    final Path jacoco = Files.createDirectories(root.resolve("onboard-core/target/site/jacoco"));
    Files.writeString(jacoco.resolve("jacoco.csv"), "GROUP,PACKAGE,CLASS,INSTRUCTION_MISSED,INSTRUCTION_COVERED,"
        + "BRANCH_MISSED,BRANCH_COVERED,LINE_MISSED,LINE_COVERED,COMPLEXITY_MISSED,COMPLEXITY_COVERED,METHOD_MISSED,"
        + "METHOD_COVERED\ng,org.x.alpha,A,0,10,1,9,1,19,0,1,0,1\ng,org.x.beta,B,0,10,0,10,0,20,0,1,0,1\n");
    final Path pit = Files.createDirectories(root.resolve("onboard-core/target/pit-reports"));
    Files.writeString(pit.resolve("mutations.xml"), "<?xml version=\"1.0\"?><mutations>"
        + "<mutation status='KILLED'/><mutation status='KILLED'/><mutation status='TIMED_OUT'/>"
        + "<mutation status='SURVIVED'/></mutations>");
    Files.writeString(root.resolve("README.md"), "Loses 4.0e-4 s<!-- ev: a.x --> a day.\n");
    Files.createDirectories(root.resolve("docs"));
    Files.writeString(root.resolve("docs/x.md"), "| a | 5.0e-4 s<!-- ev: a.x --> |\nthe error is within 3 ns of it\n");
    Files.writeString(root.resolve("faults.csv"), "fault,breaks,file,module,tests,verdict,detail\n"
        + "F-1,\"sign, flipped\",m/A.java,mod-a,GoodTest,CAUGHT,\"1 run, 1 failed\"\n"
        + "F-2,drift dropped,m/B.java,mod-a,GoodTest#two,NOT CAUGHT,the tests passed\n");
    Files.createDirectories(root.resolve("mod-a/src/main/resources"));
    Files.writeString(root.resolve("mod-a/src/main/resources/data.txt"), "abc");
  }

  private static int run(Path root, Path out) {
    return new CommandLine(new EvidenceCommand()).execute("--root", root.toString(), "--requirements",
        root.resolve("requirements.yaml").toString(), "--out", out.toString(), "--commit", "abc123",
        "--faults", root.resolve("faults.csv").toString(),
        "--generated-at", "2026-12-02T00:00:00Z");
  }

  @Test
  void verdictsTraceabilityAndScores(@TempDir Path root) throws IOException {
    project(root);
    final Path out = root.resolve("pkg");
    assertEquals(1, run(root, out), "exit status 1 when a requirement is not met");
    final String csv = Files.readString(out.resolve("requirements.csv"));
    // measured, criterion, margin (criterion over measured), the bound the test asserts, bound over measured
    assertTrue(csv.contains("R-1,bound,test,a.x,4.000e-04,<= 0.001,2.5,0.001,2.5,s,PASS"), csv);
    assertTrue(csv.contains("R-2,count,analysis,a.y a.z,31,>= 10,3.1,not printed,,n,PASS"), csv); // the larger of 12 and 31
    assertTrue(csv.contains("R-3,within,inspection,a.w,23.2,23 ± 0.5,2.5,not printed,,ns,FAIL"), csv); // test failed
    assertTrue(csv.contains("R-4,missing,review of design,a.none,not measured,< 1,,not printed,,s,NOT MEASURED"), csv);
    assertTrue(csv.contains("R-5,branches,analysis,report.core_branch_coverage,0.95,>= 0.9,1.056,not printed,,fraction,PASS"),
        csv);
    assertTrue(csv.contains("R-6,mutations,analysis,report.core_mutation_score,0.75,>= 0.85,0.8824,not printed,,fraction,FAIL"),
        csv);
    assertTrue(Files.readString(out.resolve("measurements.csv")).contains("a.x,4.0E-4,0.001,p.GoodTest,one"));
    // The fake PIT report's one survivor has no rule in the (absent) reasons file: listed and flagged.
    assertTrue(Files.readString(out.resolve("core-survivors.csv")).contains(",SURVIVED," + Survivors.NO_REASON),
        "core survivors");
    final String faults = Files.readString(out.resolve("faults.csv"));
    assertTrue(faults.contains("F-1,\"sign, flipped\",m/A.java,mod-a,GoodTest,CAUGHT,\"1 run, 1 failed\""), faults);
    final String docs = Files.readString(out.resolve("docs-figures.csv"));
    assertTrue(docs.contains("README.md,1,4.0e-4,s,a.x,4.000e-04,0.001,OK,"), docs);
    assertTrue(docs.contains("docs/x.md,1,5.0e-4,s,a.x,4.000e-04,0.001,MISMATCH,"), docs);
    final String trace = Files.readString(out.resolve("traceability.csv"));
    assertTrue(trace.contains("R-2,A,p.GoodTest,2,0,0,0,a.z,p.GoodTest#two"), trace);
    assertTrue(trace.contains("R-3,I,p.BadTest,1,1,0,0,a.w,p.BadTest#w"), trace);
    final String html = Files.readString(out.resolve("index.html"));
    assertTrue(html.contains("6 requirements: 3 pass, 2 fail, 1 not measured."), html);
    assertTrue(html.contains("Caution") && html.contains("data:image/png;base64,"));
    assertTrue(html.contains("2 deliberate faults (verification/faults.yaml), each applied alone to a scratch copy; 1 caught"),
        html);
    assertTrue(html.contains("<td class=\"FAIL\">NOT CAUGHT</td>") && html.contains("<td class=\"FAIL\">MISMATCH</td>"), html);
    assertTrue(html.contains("2 figures in README.md and docs/ are tagged with the evidence key that pins them; 1 fail"), html);
    assertTrue(html.contains("1 untagged numbers with units read like accuracy claims"), html);
    assertTrue(html.contains("<th>Asserted bound</th><th>Bound / measured</th>"), html);
    assertTrue(Files.readString(out.resolve("evidence.md")).contains("| R-4 | missing | review of design | not measured"));
    assertTrue(Files.readString(out.resolve("inputs.sha256")).contains(
        "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad  mod-a/src/main/resources/data.txt"),
        "SHA-256 of 'abc' (FIPS 180-4 example)");
    assertTrue(Files.readString(out.resolve("environment.txt")).startsWith("commit: abc123\nJDK: "));
    for (String p : List.of("margins", "envelope", "coverage")) {
      if (!"envelope".equals(p)) {
        assertTrue(Files.size(out.resolve("plots/" + p + ".png")) > 1000, p);
        assertTrue(Files.readString(out.resolve("plots/" + p + ".svg")).contains("<svg"), p);
      }
    }
  }

  @Test
  void samePackageFromTheSameReports(@TempDir Path root) throws IOException {
    project(root);
    run(root, root.resolve("one"));
    run(root, root.resolve("two"));
    final List<Path> files;
    try (Stream<Path> w = Files.walk(root.resolve("one"))) {
      files = w.filter(Files::isRegularFile).sorted().toList();
    }
    assertEquals(14, files.size(), files.toString()); // with core-survivors.csv: the fake PIT report has a survivor
    for (Path f : files) {
      final Path g = root.resolve("two").resolve(root.resolve("one").relativize(f));
      assertTrue(java.util.Arrays.equals(Files.readAllBytes(f), Files.readAllBytes(g)), "differs: " + f);
    }
  }

  @Test
  void brokenRequirementsAreRefusedWithTheirPlace(@TempDir Path root) throws IOException {
    final Path f = root.resolve("r.yaml");
    Files.writeString(f, REQS.replace("method: analysis, metric: [a.y", "method: guess, metric: [a.y"),
        StandardCharsets.UTF_8);
    final IOException e = assertThrows(IOException.class, () -> RequirementsFile.read(f));
    assertTrue(e.getMessage().contains("R-2") && e.getMessage().contains("guess"), e.getMessage());
    Files.writeString(f, REQS.replace("id: R-2", "id: R-1"));
    assertTrue(assertThrows(IOException.class, () -> RequirementsFile.read(f)).getMessage().contains("duplicate id R-1"));
    Files.writeString(f, REQS.replace("tolerance: 0.5", "tol: 0.5"));
    assertTrue(assertThrows(IOException.class, () -> RequirementsFile.read(f)).getMessage().contains("tolerance"));
  }
}
