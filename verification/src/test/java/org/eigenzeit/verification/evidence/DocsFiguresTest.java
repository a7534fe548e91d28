package org.eigenzeit.verification.evidence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The docs-figure check: tags, the rounding rule, the bound rule and the untagged-figure heuristic. */
class DocsFiguresTest {
  private static Map<String, TestReports.Measurement> measured(String key, double value, double bound) {
    return Map.of(key, new TestReports.Measurement(key, value, "p.SomeTest", "m", bound));
  }

  private static DocsFigures.Check one(String markdown, Map<String, TestReports.Measurement> m) throws IOException {
    final List<DocsFigures.Tag> tags = DocsFigures.tags("x.md", markdown);
    assertEquals(1, tags.size(), tags.toString());
    return DocsFigures.check(tags.get(0), m);
  }

  @Test
  void agreementToTheDigitsWritten() throws IOException {
    final Map<String, TestReports.Measurement> m = measured("k", 2.313e-19, 2e-18);
    assertEquals("OK", one("error 2.3e-19 s<!-- ev: k --> over a year", m).verdict());
    assertEquals("OK", one("error 2e-19<!-- ev: k -->", m).verdict()); // one digit written: 2.313 rounds to 2
    assertEquals("MISMATCH", one("error 2.4e-19 s<!-- ev: k -->", m).verdict()); // a tag that disagrees fails
    assertEquals("MISMATCH", one("error 2.31e-19 s<!-- ev: k -->", measured("k", 2.316e-19, 2e-18)).verdict());
    assertEquals("OK", one("0.0295 arcsec<!-- ev: k -->", measured("k", 0.02954, 0.05)).verdict()); // half up: 0.0295|4
    assertEquals("OK", one("0.030 arcsec<!-- ev: k -->", measured("k", 0.02954, 0.05)).verdict());
    assertEquals("MISMATCH", one("0.03 arcsec<!-- ev: k -->", measured("k", 0.0249, 0.05)).verdict());
    assertEquals("OK", one("\u22121.2e-18<!-- ev: k -->", measured("k", -1.21e-18, -1e-17)).verdict()); // Unicode minus
    assertEquals("OK", one("1.2e-18<!-- ev: k abs -->", measured("k", -1.21e-18, 1e-17)).verdict());
    assertEquals("OK", one("98.9 %<!-- ev: k *100 -->", measured("k", 0.9888, 0.99)).verdict());
    assertEquals("OK", one("83 876 ps<!-- ev: k -->", measured("k", 83876.2, 9e4)).verdict()); // digit groups
    assertEquals("NOT MEASURED", one("1 s<!-- ev: other -->", m).verdict());
  }

  @Test
  void theAssertedBoundMustBePrintedAndWithinTenTimesTheValue() throws IOException {
    assertEquals("NO BOUND", one("2.3e-19 s<!-- ev: k -->", measured("k", 2.3e-19, Double.NaN)).verdict());
    final DocsFigures.Check loose = one("2.0e-20 s<!-- ev: k -->", measured("k", 2.0e-20, 1e-14));
    assertEquals("BOUND TOO LOOSE", loose.verdict());
    assertTrue(loose.detail().contains("500000 times"), loose.detail());
    assertEquals("OK", one("2.0e-20 s<!-- ev: k -->", measured("k", 2.0e-20, 2e-19)).verdict());
    // "exactly 0" asserted at 1e-9 is not pinned; asserted at 0 it is.
    assertEquals("BOUND TOO LOOSE", one("step 0 s<!-- ev: k -->", measured("k", 0.0, 1e-9)).verdict());
    assertEquals("OK", one("step 0 s<!-- ev: k -->", measured("k", 0.0, 0.0)).verdict());
  }

  @Test
  void aTagThatFollowsNoFigureIsRefused() {
    final IOException e = assertThrows(IOException.class, () -> DocsFigures.tags("x.md", "line\nsee below <!-- ev: k -->\n"));
    assertTrue(e.getMessage().startsWith("x.md:2: an evidence tag follows no figure"), e.getMessage());
  }

  @Test
  void untaggedAccuracyClaimsAreListedCodeBlocksSkipped(@TempDir Path root) throws IOException {
    Files.createDirectories(root.resolve("docs"));
    Files.writeString(root.resolve("README.md"), "The worst error is 0.5 ps per day.\nIt has 3 modules.\n"
        + "```\nworst 7 ns\n```\nagrees within 2.3e-19 s<!-- ev: k --> and 4 ns, not `within 5 ns`\n");
    final List<DocsFigures.Warning> w = DocsFigures.untagged(root);
    assertEquals(2, w.size(), w.toString());
    assertEquals("0.5 ps", w.get(0).figure());
    assertEquals(1, w.get(0).line());
    assertEquals("4 ns", w.get(1).figure());
    assertEquals(6, w.get(1).line());
  }
}
