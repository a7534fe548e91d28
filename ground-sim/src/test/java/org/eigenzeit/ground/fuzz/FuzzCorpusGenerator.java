package org.eigenzeit.ground.fuzz;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;
import org.eigenzeit.ground.trajectory.Fixtures;

/**
 * Writes the fuzz corpus of the ground readers and the command line: systematic corruptions of
 * valid files derived from real data ({@link Fixtures}: the IGS final orbit and broadcast file of
 * 2010-07-01, and OEMs of the real orbit of GPS G05), each with the verdict it must get and, for a
 * refusal, the {@code file:line:} or option it must name. Deterministic: the same code writes the
 * same bytes ({@link FuzzCorpusGeneratorTest} checks the committed corpus against it).
 *
 * <p>Regenerate with {@code scripts/fuzz-corpus.sh}. The directories listed in {@link #OWNED} are
 * rewritten completely; other directories (other readers' cases) are left alone.
 */
final class FuzzCorpusGenerator {
  /** The directories this generator writes. */
  static final List<String> OWNED = List.of("sp3", "oem", "rinex-nav", "epochs", "cli-budget", "cli-demo",
      "cli-campaign", "cli-reference-speed", "cli-eigenzeit");

  private FuzzCorpusGenerator() {}

  /** One directory's cases and files, in the order they are made. */
  static final class Dir {
    final String name;
    final String ext;
    final List<FuzzCase> cases = new ArrayList<>();
    final Map<String, byte[]> files = new LinkedHashMap<>();
    private int n;

    Dir(String name, String ext) {
      this.name = name;
      this.ext = ext;
    }

    private String next(String slug) {
      n++;
      return String.format(Locale.ROOT, "%04d-%s.%s", n, slug, ext);
    }

    void accept(String slug, List<String> lines, String what) {
      acceptBytes(slug, bytes(lines), what);
    }

    void acceptBytes(String slug, byte[] content, String what) {
      final String f = next(slug);
      files.put(f, content);
      cases.add(new FuzzCase(Path.of(name), f, false, "", what));
    }

    void refuse(String slug, List<String> lines, int line, String what) {
      refuseBytes(slug, bytes(lines), line, what);
    }

    void refuseBytes(String slug, byte[] content, int line, String what) {
      final String f = next(slug);
      files.put(f, content);
      cases.add(new FuzzCase(Path.of(name), f, true, f + ":" + line + ":", what));
    }

    void cli(String slug, String expect, String what, String... args) {
      final String f = next(slug);
      files.put(f, args.length == 0 ? new byte[0]
          : (String.join("\n", Arrays.asList(args)) + "\n").getBytes(StandardCharsets.UTF_8));
      cases.add(new FuzzCase(Path.of(name), f, expect != null, expect == null ? "" : expect, what));
    }

    void extra(String file, String content) {
      files.put(file, content.getBytes(StandardCharsets.UTF_8));
    }

    byte[] manifest() {
      final StringBuilder b = new StringBuilder();
      b.append("# Fuzz cases of ").append(name).append(", written by FuzzCorpusGenerator (do not edit by hand).\n");
      b.append("# file\tverdict\texpected fragment\twhat\n");
      for (FuzzCase c : cases) {
        b.append(c.manifestLine()).append('\n');
      }
      return b.toString().getBytes(StandardCharsets.UTF_8);
    }
  }

  static byte[] bytes(List<String> lines) {
    return (String.join("\n", lines) + "\n").getBytes(StandardCharsets.ISO_8859_1);
  }

  /** Overwrites columns (1-based) of a line (1-based) of a copy. */
  static List<String> cols(List<String> base, int lineNo, int column, String text) {
    return Fixtures.overwrite(base, lineNo, column, text);
  }

  static List<String> set(List<String> base, int lineNo, String text) {
    final List<String> l = new ArrayList<>(base);
    l.set(lineNo - 1, text);
    return l;
  }

  static List<String> insert(List<String> base, int lineNo, String text) {
    final List<String> l = new ArrayList<>(base);
    l.add(lineNo - 1, text);
    return l;
  }

  static List<String> remove(List<String> base, int lineNo) {
    final List<String> l = new ArrayList<>(base);
    l.remove(lineNo - 1);
    return l;
  }

  /** The lines with one byte inserted at a line and column (1-based), as bytes. */
  static byte[] withByte(List<String> base, int lineNo, int column, int value) {
    final byte[] b = bytes(base);
    int offset = 0;
    for (int k = 0; k < lineNo - 1; k++) {
      offset += base.get(k).length() + 1;
    }
    offset += column - 1;
    final byte[] out = new byte[b.length + 1];
    System.arraycopy(b, 0, out, 0, offset);
    out[offset] = (byte) value;
    System.arraycopy(b, offset, out, offset + 1, b.length - offset);
    return out;
  }

  static byte[] crlf(List<String> base) {
    return (String.join("\r\n", base) + "\r\n").getBytes(StandardCharsets.US_ASCII);
  }

  /**
   * Makes every owned directory.
   *
   * @return the directories by name
   */
  static Map<String, Dir> generate() {
    final Map<String, Dir> m = new LinkedHashMap<>();
    m.put("sp3", FuzzSp3Cases.make());
    m.put("oem", FuzzOemCases.make());
    m.put("rinex-nav", FuzzRinexCases.make());
    m.put("epochs", FuzzCliCases.epochs());
    for (Dir d : FuzzCliCases.commands()) {
      m.put(d.name, d);
    }
    return m;
  }

  /**
   * Writes the owned directories under a root, replacing their contents.
   *
   * @param root the corpus root (src/test/resources/fuzz)
   * @throws IOException when a file cannot be written
   */
  static void write(Path root) throws IOException {
    for (Dir d : generate().values()) {
      final Path dir = root.resolve(d.name);
      if (Files.isDirectory(dir)) {
        try (Stream<Path> s = Files.list(dir)) {
          for (Path p : s.toList()) {
            Files.delete(p);
          }
        }
      }
      Files.createDirectories(dir);
      for (Map.Entry<String, byte[]> f : d.files.entrySet()) {
        Files.write(dir.resolve(f.getKey()), f.getValue());
      }
      Files.write(dir.resolve(FuzzCase.MANIFEST), d.manifest());
    }
  }

  /** Real-data bases, shared by the case makers. */
  static final class Bases {
    private Bases() {}

    static List<String> sp3() {
      return Fixtures.sp3Trimmed(12, List.of("G02", "G05", "G07"));
    }

    static List<String> oem(String frame) {
      return Fixtures.oem(frame, 24);
    }

    static List<String> rinex() {
      return Fixtures.rinexTrimmed(6);
    }
  }
}
