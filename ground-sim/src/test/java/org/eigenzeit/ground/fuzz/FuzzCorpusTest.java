package org.eigenzeit.ground.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Runs the committed fuzz corpus ({@code src/test/resources/fuzz/}, see its README.md): every case
 * of every directory is fed to its target ({@link FuzzTargets}), and judged against its manifest.
 * The corpus passes with no silent acceptance (a REFUSE case read without a word), no stack trace
 * (an exception other than a refusal, or exit code 4), no unnamed refusal (the message does not
 * start with the expected {@code file:line:} or does not name the expected option) and no false
 * refusal (an ACCEPT control refused).
 */
class FuzzCorpusTest {
  static Path corpus() {
    try {
      return Path.of(FuzzCorpusTest.class.getResource("/fuzz").toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  /** Whether a refusal names what the manifest expects. */
  static boolean named(FuzzCase c, String message) {
    if (c.dir().getFileName().toString().startsWith("cli-")) {
      return message.contains(c.expect());
    }
    return message.startsWith(c.expect()) && message.matches("(?s)[^:]+:\\d+: .*");
  }

  @Test
  void everyCaseGetsItsVerdict() throws IOException {
    final Map<String, FuzzTargets.Target> targets = FuzzTargets.all();
    final List<Path> dirs;
    try (Stream<Path> s = Files.list(corpus())) {
      dirs = s.filter(d -> Files.isRegularFile(d.resolve(FuzzCase.MANIFEST))).sorted().toList();
    }
    final List<String> failures = new ArrayList<>();
    final Map<String, int[]> perDir = new TreeMap<>();
    int cases = 0;
    int silent = 0;
    int traces = 0;
    int unnamed = 0;
    int falseRefusals = 0;
    int refusals = 0;
    for (Path dir : dirs) {
      final String name = dir.getFileName().toString();
      final FuzzTargets.Target target = targets.get(name);
      assertTrue(target != null, "no target registered in FuzzTargets for corpus directory " + name);
      final int[] counts = perDir.computeIfAbsent(name, k -> new int[2]);
      for (FuzzCase c : FuzzCase.read(dir)) {
        assertTrue(Files.isRegularFile(c.path()), "manifest names a missing file: " + c.path());
        final FuzzTargets.Outcome o = target.run(c.path());
        cases++;
        counts[c.refuse() ? 1 : 0]++;
        final String id = name + "/" + c.file() + " (" + c.what() + "): ";
        if (o.crashed()) {
          traces++;
          failures.add(id + "CRASH " + o.message());
        } else if (c.refuse() && !o.refused()) {
          silent++;
          failures.add(id + "SILENTLY ACCEPTED");
        } else if (!c.refuse() && o.refused()) {
          falseRefusals++;
          failures.add(id + "FALSELY REFUSED: " + o.message());
        } else if (c.refuse()) {
          refusals++;
          if (!named(c, o.message())) {
            unnamed++;
            failures.add(id + "refused without naming '" + c.expect() + "': " + o.message());
          }
        }
      }
    }
    perDir.forEach((k, v) -> System.out.printf("fuzz corpus %-20s %4d cases (%d ACCEPT controls, %d REFUSE)%n", k,
        v[0] + v[1], v[0], v[1]));
    failures.forEach(System.out::println);
    System.out.println("evidence: fuzz.ground.cases = " + cases);
    System.out.println("evidence: fuzz.ground.refusals = " + refusals);
    System.out.println("evidence: fuzz.ground.silent_acceptances = " + silent);
    System.out.println("evidence: fuzz.ground.stack_traces = " + traces);
    System.out.println("evidence: fuzz.ground.unnamed = " + unnamed);
    System.out.println("evidence: fuzz.ground.false_refusals = " + falseRefusals);
    assertEquals(List.of(), failures);
    assertTrue(cases >= 500, "corpus has " + cases + " cases, the issue asks for at least 500");
  }
}
