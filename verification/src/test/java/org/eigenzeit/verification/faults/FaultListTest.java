package org.eigenzeit.verification.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The seeded-fault list in every build (the slow check that each fault is caught is
 * scripts/fault-check.sh): every fault still applies (its snippet occurs exactly once, so a
 * refactor that moves the code fails here, naming the fault, instead of letting the fault pass
 * silently), every catching test class exists, the table in docs/verification.md is the one
 * generated from the list, and the reader refuses broken entries.
 */
class FaultListTest {
  private static final Path ROOT = Path.of("..").toAbsolutePath().normalize();
  private static final Path FAULTS = ROOT.resolve("verification").resolve("faults.yaml");

  @Test
  void everyFaultAppliesExactlyOnceAndNamesExistingTests() throws IOException {
    final List<Fault> faults = FaultFile.read(FAULTS);
    final List<String> problems = new ArrayList<>();
    for (Fault f : faults) {
      final String stale = FaultFile.staleReason(ROOT, f);
      if (stale != null) {
        problems.add(f.id() + " STALE: " + stale);
      }
      for (String part : f.selectorParts()) {
        final String cls = part.contains("#") ? part.substring(0, part.indexOf('#')) : part;
        try (var walk = Files.walk(ROOT.resolve(f.module()).resolve("src/test/java"))) {
          if (walk.noneMatch(p -> p.getFileName().toString().equals(cls + ".java"))) {
            problems.add(f.id() + ": no test class " + cls + " in " + f.module());
          }
        }
      }
    }
    System.out.printf("evidence: faults.listed = %d%n", faults.size());
    assertTrue(problems.isEmpty(), String.join("\n", problems));
    assertTrue(faults.size() >= 20, "at least 20 seeded faults: " + faults.size());
  }

  @Test
  void docsTableIsGeneratedFromTheList() throws IOException {
    final Path docs = ROOT.resolve("docs").resolve("verification.md");
    final String text = Files.readString(docs, StandardCharsets.UTF_8);
    final String expected = FaultFile.withTable(text, FaultFile.read(FAULTS));
    assertEquals(expected, text, "docs/verification.md's seeded-fault table is out of date: run scripts/fault-check.sh --write-docs");
  }

  @Test
  void brokenOrStaleEntriesAreRefusedByName(@TempDir Path dir) throws IOException {
    Files.createDirectories(dir.resolve("m/src"));
    Files.writeString(dir.resolve("m/src/A.java"), "int x = 1; int y = 1;\n");
    final String entry = "  - {id: X-01, breaks: b, file: m/src/A.java, original: 'int x = 1;', replacement: 'int x = 2;',"
        + " module: m, tests: ATest, source: s}\n";
    final Path f = dir.resolve("faults.yaml");
    Files.writeString(f, "faults:\n" + entry);
    final Fault ok = FaultFile.read(f).get(0);
    assertNull(FaultFile.staleReason(dir, ok));
    assertEquals("m", ok.fileModule());
    final Fault ambiguous = new Fault("X-02", "b", "m/src/A.java", " = 1;", "= 2;", "m", "ATest", "s");
    assertTrue(FaultFile.staleReason(dir, ambiguous).contains("2 times"));
    final Fault missing = new Fault("X-03", "b", "m/src/A.java", "int z", "int w", "m", "ATest", "s");
    assertTrue(FaultFile.staleReason(dir, missing).contains("not found"));
    assertTrue(FaultFile.staleReason(dir, new Fault("X-04", "b", "m/B.java", "a", "b", "m", "T", "s")).contains("not found"));
    Files.writeString(f, "faults:\n" + entry + entry);
    assertTrue(assertThrows(IOException.class, () -> FaultFile.read(f)).getMessage().contains("duplicate fault id X-01"));
    Files.writeString(f, "faults:\n" + entry.replace(" source: s", " sauce: s"));
    assertTrue(assertThrows(IOException.class, () -> FaultFile.read(f)).getMessage().contains("X-01: missing or empty 'source'"));
    Files.writeString(f, "faults:\n" + entry.replace("'int x = 2;'", "'int x = 1;'"));
    assertTrue(assertThrows(IOException.class, () -> FaultFile.read(f)).getMessage().contains("replacement equals"));
  }
}
