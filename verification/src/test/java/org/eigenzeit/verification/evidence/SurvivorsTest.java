package org.eigenzeit.verification.evidence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Survivor reasons: the rules file refused line by line, matching, and unexplained survivors counted. */
class SurvivorsTest {
  private static final String XML = """
      <?xml version="1.0" encoding="UTF-8"?>
      <mutations>
      <mutation detected='true' status='KILLED'><sourceFile>A.java</sourceFile><mutatedClass>org.x.core.Alpha</mutatedClass>\
      <mutatedMethod>run</mutatedMethod><lineNumber>3</lineNumber>\
      <mutator>org.pitest.mutationtest.engine.gregor.mutators.MathMutator</mutator><description>d</description></mutation>
      <mutation detected='false' status='SURVIVED'><sourceFile>A.java</sourceFile><mutatedClass>org.x.core.Alpha</mutatedClass>\
      <mutatedMethod>check</mutatedMethod><lineNumber>7</lineNumber>\
      <mutator>org.pitest.mutationtest.engine.gregor.mutators.ConditionalsBoundaryMutator</mutator><description>changed conditional boundary</description></mutation>
      <mutation detected='false' status='NO_COVERAGE'><sourceFile>B.java</sourceFile><mutatedClass>org.x.core.Beta$Inner</mutatedClass>\
      <mutatedMethod>size</mutatedMethod><lineNumber>9</lineNumber>\
      <mutator>org.pitest.mutationtest.engine.gregor.mutators.returns.PrimitiveReturnsMutator</mutator><description>replaced int return with 0</description></mutation>
      <mutation detected='true' status='TIMED_OUT'><sourceFile>B.java</sourceFile><mutatedClass>org.x.core.Beta</mutatedClass>\
      <mutatedMethod>loop</mutatedMethod><lineNumber>12</lineNumber>\
      <mutator>org.pitest.mutationtest.engine.gregor.mutators.IncrementsMutator</mutator><description>d</description></mutation>
      </mutations>
      """;

  private static Path project(Path dir, String rules) throws IOException {
    final Path pit = dir.resolve("onboard-core/target/pit-reports");
    Files.createDirectories(pit);
    Files.writeString(pit.resolve("mutations.xml"), XML, StandardCharsets.UTF_8);
    Files.createDirectories(dir.resolve("verification"));
    Files.writeString(dir.resolve(Extras.REASONS), rules, StandardCharsets.UTF_8);
    return dir;
  }

  @Test
  void everySurvivorGetsTheFirstMatchingReasonOrIsCountedAsUnexplained(@TempDir Path dir) throws IOException {
    final Path root = project(dir, """
        # module,class,method,mutator,reason
        onboard-core,Alpha,check,ConditionalsBoundaryMutator,"equivalent: real-valued threshold, no input on it"
        onboard-core,org.x.core.*,*,*,"catch-all for the package, must not shadow the rule above"
        onboard-core,Gamma,*,*,a rule for a class that has no survivor at all
        """);
    final List<Survivors.Rule> rules = Survivors.readRules(root.resolve(Extras.REASONS));
    final Survivors s = Survivors.read(root, "onboard-core", rules);
    assertEquals(4, s.total());
    assertEquals(2, s.detected(), "KILLED and TIMED_OUT count as detected");
    assertEquals(2, s.rows().size());
    assertEquals("equivalent: real-valued threshold, no input on it", s.rows().get(0).get(6));
    // Beta$Inner is matched by the package rule through its outer class.
    assertEquals("catch-all for the package, must not shadow the rule above", s.rows().get(1).get(6));
    assertEquals(0, s.withoutReason());
    assertEquals(List.of(4), s.unusedRules(rules).stream().map(Survivors.Rule::line).toList());

    final List<Survivors.Rule> narrow = Survivors.readRules(project(dir, """
        onboard-core,Alpha,check,MathMutator,a rule for another mutator of the same method
        ground-sim,Beta,*,*,a rule of another module for a class of the same name
        """).resolve(Extras.REASONS));
    final Survivors none = Survivors.read(root, "onboard-core", narrow);
    assertEquals(2, none.withoutReason());
    assertTrue(none.rows().stream().allMatch(r -> Survivors.NO_REASON.equals(r.get(6))));
  }

  @Test
  void missingReportGivesNothingAndExtrasCountsOnlyWhenBothModulesRan(@TempDir Path dir) throws IOException {
    final Path root = project(dir, "");
    final Survivors ground = Survivors.read(root, "ground-sim", List.of());
    assertEquals(0, ground.total());
    final Extras e = Extras.read(root, null, java.util.Map.of());
    final TestReports reports = TestReports.read(root);
    e.addTo(reports);
    assertTrue(reports.measurements().get("report.survivors_without_reason") == null,
        "with one module's report missing the count would claim a whole answer");
  }

  @Test
  void malformedRulesAreRefusedWithFileAndLine(@TempDir Path dir) throws IOException {
    final String[][] bad = {
        {"onboard-core,Alpha,check,MathMutator", "expected 5 fields"},
        {"flight-sw,Alpha,check,MathMutator,a reason that is long enough", "unknown module"},
        {"onboard-core,,check,MathMutator,a reason that is long enough", "field 2 is empty"},
        {"onboard-core,Alpha, check,MathMutator,a reason that is long enough", "field 3 is empty or has surrounding blanks"},
        {"onboard-core,Alpha,check,MathMutator,too short", "reason too short"},
    };
    for (String[] b : bad) {
      final Path f = dir.resolve("r.csv");
      Files.writeString(f, "# header\n\n" + b[0] + "\n", StandardCharsets.UTF_8);
      final IOException ex = assertThrows(IOException.class, () -> Survivors.readRules(f), b[0]);
      assertTrue(ex.getMessage().startsWith(f + ":3: "), ex.getMessage());
      assertTrue(ex.getMessage().contains(b[1]), ex.getMessage());
    }
  }

  @Test
  void theProjectsReasonsFileIsValid() throws IOException {
    final Path file = Path.of("..").resolve(Extras.REASONS);
    assertTrue(Files.isRegularFile(file), file.toAbsolutePath().toString());
    final List<Survivors.Rule> rules = Survivors.readRules(file);
    assertTrue(rules.size() > 10, "rules: " + rules.size());
  }
}
