package org.eigenzeit.onboard.arch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The redesign's size rule for the onboard core (the redesign issue's acceptance): no main source
 * file above {@value #MAX_CODE_LINES} code lines (lines that are neither blank nor comment), and no
 * member body (method, constructor, initialiser or nested type at class level) above {@value
 * #MAX_MEMBER_LINES} lines from its opening to its closing brace. Counted from the source so that
 * Javadoc, which carries each model's equation and source, does not count against a component.
 */
class ComponentSizeTest {
  static final int MAX_CODE_LINES = 300;
  static final int MAX_MEMBER_LINES = 60;
  private static final Path MAIN = Paths.get("src", "main", "java");

  /** Code lines and the longest member body of one source text. */
  static int[] measure(List<String> lines) {
    int code = 0;
    int depth = 0;
    int start = 0;
    int longest = 0;
    boolean inComment = false;
    for (int i = 0; i < lines.size(); i++) {
      final String line = lines.get(i).replaceAll("\"(\\\\.|[^\"\\\\])*\"", "\"\"")
          .replaceAll("'(\\\\.|[^'\\\\])'", "''");
      final StringBuilder text = new StringBuilder();
      int j = 0;
      while (j < line.length()) {
        if (inComment) {
          final int end = line.indexOf("*/", j);
          if (end < 0) {
            break;
          }
          inComment = false;
          j = end + 2;
        } else if (line.startsWith("//", j)) {
          break;
        } else if (line.startsWith("/*", j)) {
          inComment = true;
          j += 2;
        } else {
          text.append(line.charAt(j++));
        }
      }
      if (!text.toString().isBlank()) {
        code++;
      }
      for (int k = 0; k < text.length(); k++) {
        final char ch = text.charAt(k);
        if (ch == '{' && ++depth == 2) {
          start = i;
        } else if (ch == '}' && depth-- == 2) {
          longest = Math.max(longest, i - start + 1);
        }
      }
    }
    return new int[] {code, longest};
  }

  @Test
  void theCounterSeesCodeAndMembers() {
    // A hand-counted sample: 6 code lines (the comment lines and the blank line do not count),
    // one member of 4 lines from its opening to its closing brace; braces in strings are ignored.
    final List<String> sample = List.of("/** Doc. */", "final class A {", "  // note", "",
        "  void f() {", "    String s = \"}{\";", "    /* { */ g();", "  }", "}");
    final int[] m = measure(sample);
    assertEquals(6, m[0], "code lines");
    assertEquals(4, m[1], "longest member");
  }

  @Test
  void noCoreSourceFileOrMemberIsAboveTheLimits() throws IOException {
    final List<String> over = new ArrayList<>();
    int files = 0;
    int largest = 0;
    int longest = 0;
    try (Stream<Path> paths = Files.walk(MAIN)) {
      for (Path p : (Iterable<Path>) paths.filter(q -> q.toString().endsWith(".java"))::iterator) {
        final int[] m = measure(Files.readAllLines(p, StandardCharsets.UTF_8));
        files++;
        largest = Math.max(largest, m[0]);
        longest = Math.max(longest, m[1]);
        if (m[0] > MAX_CODE_LINES || m[1] > MAX_MEMBER_LINES) {
          over.add(MAIN.relativize(p) + ": " + m[0] + " code lines, longest member " + m[1]);
        }
      }
    }
    System.out.printf("evidence: core.largest_file_code_lines = %d bound %d%n", largest, MAX_CODE_LINES);
    System.out.printf("evidence: core.longest_member_lines = %d bound %d%n", longest, MAX_MEMBER_LINES);
    assertTrue(files > 40, "source files found: " + files);
    assertTrue(over.isEmpty(), "above the size rule: " + over);
  }
}
