package org.eigenzeit.ground.scenario;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The committed malformed-scenario corpus ({@code src/test/resources/scenario-corpus/}, written by
 * {@link ScenarioCorpus}; regenerate with {@code mvn -pl ground-sim test -Dtest=ScenarioCorpusTest
 * -Deigenzeit.corpus.write=true}): every case gets its expected verdict, every refusal names the
 * file and line and contains its fragment, and no library or JVM text reaches the message.
 */
class ScenarioCorpusTest {
  private static final Path DIR = Path.of("src/test/resources/scenario-corpus");
  private static final Pattern LOCATED = Pattern.compile("^[0-9]{3}-[A-Za-z0-9._-]+\\.yaml:[0-9]+: .+, found .+, allowed .+");
  private static final String[] LIBRARY_TEXT = {"Exception", "[Source", "fasterxml", "snakeyaml", "org.yaml", "java.",
    "\tat ", "Jackson"};

  @Test
  void committedCorpusIsTheGeneratorsOutput() throws IOException {
    final List<ScenarioCorpus.Case> cases = ScenarioCorpus.cases();
    final StringBuilder index = new StringBuilder("# file\tverdict\tmessage fragment (written by ScenarioCorpus)\n");
    for (ScenarioCorpus.Case c : cases) {
      index.append(c.file()).append('\t').append(c.verdict()).append('\t').append(c.fragment()).append('\n');
    }
    if (Boolean.getBoolean("eigenzeit.corpus.write")) {
      Files.createDirectories(DIR);
      try (var s = Files.list(DIR)) {
        for (Path p : s.toList()) {
          Files.delete(p);
        }
      }
      for (ScenarioCorpus.Case c : cases) {
        Files.write(DIR.resolve(c.file()), c.bytes());
      }
      Files.writeString(DIR.resolve("index.tsv"), index, StandardCharsets.UTF_8);
    }
    assertEquals(index.toString(), Files.readString(DIR.resolve("index.tsv"), StandardCharsets.UTF_8),
        "regenerate the corpus (see the class comment)");
    for (ScenarioCorpus.Case c : cases) {
      assertArrayEquals(c.bytes(), Files.readAllBytes(DIR.resolve(c.file())), c.file());
    }
    try (var s = Files.list(DIR)) {
      assertEquals(cases.size() + 1, s.count(), "no stray files in the corpus folder");
    }
  }

  @Test
  void everyCaseGetsItsVerdictWithALocatedMessage() throws IOException {
    int refused = 0;
    int accepted = 0;
    int silent = 0;
    int crashed = 0;
    final List<String> problems = new ArrayList<>();
    final List<String> lines = Files.readAllLines(DIR.resolve("index.tsv"), StandardCharsets.UTF_8);
    for (String line : lines.subList(1, lines.size())) {
      final String[] f = line.split("\t", -1);
      final byte[] bytes = Files.readAllBytes(DIR.resolve(f[0]));
      try {
        ScenarioReader.parse(f[0], bytes, DIR);
        if (f[1].equals("refuse")) {
          silent++;
          problems.add(f[0] + ": silently accepted");
        } else {
          accepted++;
        }
      } catch (ScenarioException e) {
        final String m = e.getMessage();
        if (f[1].equals("accept")) {
          problems.add(f[0] + ": refused a valid file: " + m);
        } else if (!LOCATED.matcher(m).matches() || !m.contains(f[2])) {
          problems.add(f[0] + ": message lacks 'file:line: ... found ..., allowed ...' or '" + f[2] + "': " + m);
        } else {
          for (String lib : LIBRARY_TEXT) {
            if (m.contains(lib)) {
              problems.add(f[0] + ": library text '" + lib + "' in: " + m);
            }
          }
          refused++;
        }
      } catch (RuntimeException e) {
        crashed++;
        problems.add(f[0] + ": crashed with " + e);
      }
    }
    System.out.println("evidence: scenario_corpus.cases = " + (lines.size() - 1));
    System.out.println("evidence: scenario_corpus.refused_with_location = " + refused);
    System.out.println("evidence: scenario_corpus.valid_accepted = " + accepted);
    System.out.println("evidence: scenario_corpus.silently_accepted = " + silent);
    System.out.println("evidence: scenario_corpus.crashed = " + crashed);
    assertTrue(problems.isEmpty(), String.join("\n", problems));
    assertTrue(lines.size() - 1 >= 100, "at least 100 cases");
  }
}
