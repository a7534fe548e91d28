package org.eigenzeit.ground.fuzz;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The committed corpus is what {@link FuzzCorpusGenerator} writes, byte for byte, so it cannot
 * drift from its generator. With {@code -Dfuzz.write=<corpus folder>} (see
 * {@code scripts/fuzz-corpus.sh}) the test writes the corpus there instead.
 */
class FuzzCorpusGeneratorTest {
  @Test
  void committedCorpusIsTheGeneratorsOutput() throws IOException {
    final String target = System.getProperty("fuzz.write");
    if (target != null) {
      FuzzCorpusGenerator.write(Path.of(target));
      System.out.println("fuzz corpus written to " + Path.of(target).toAbsolutePath());
      return;
    }
    final Path committed = committedCorpus();
    final Map<String, FuzzCorpusGenerator.Dir> dirs = FuzzCorpusGenerator.generate();
    assertEquals(FuzzCorpusGenerator.OWNED, List.copyOf(dirs.keySet()));
    for (FuzzCorpusGenerator.Dir d : dirs.values()) {
      final Path dir = committed.resolve(d.name);
      final TreeSet<String> expected = new TreeSet<>(d.files.keySet());
      expected.add(FuzzCase.MANIFEST);
      final TreeSet<String> found = new TreeSet<>();
      try (Stream<Path> s = Files.list(dir)) {
        s.forEach(p -> found.add(p.getFileName().toString()));
      }
      assertEquals(expected, found, "files of " + d.name + " (regenerate with scripts/fuzz-corpus.sh)");
      for (Map.Entry<String, byte[]> f : d.files.entrySet()) {
        assertArrayEquals(f.getValue(), Files.readAllBytes(dir.resolve(f.getKey())), d.name + "/" + f.getKey());
      }
      assertArrayEquals(d.manifest(), Files.readAllBytes(dir.resolve(FuzzCase.MANIFEST)), d.name + "/cases.tsv");
    }
  }

  /** The corpus in the source tree (the test runs in the module folder). */
  private static Path committedCorpus() {
    final Path p = Path.of("src/test/resources/fuzz");
    assertTrue(Files.isDirectory(p), "run from the ground-sim folder: " + p.toAbsolutePath());
    return p;
  }
}
