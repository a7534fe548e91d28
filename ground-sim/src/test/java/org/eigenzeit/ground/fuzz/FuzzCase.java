package org.eigenzeit.ground.fuzz;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * One case of the fuzz corpus: a line of a directory's {@code cases.tsv}, tab-separated:
 * {@code file, verdict, expect, what}. The verdict is {@code ACCEPT} (a valid control that must be
 * read) or {@code REFUSE} (must be refused); for REFUSE, {@code expect} is the fragment the first
 * line of the refusal must start with ({@code file:line:} for files) or contain ({@code --option}
 * for the command line), for ACCEPT it is {@code -}. Lines starting with {@code #} are comments.
 *
 * @param dir the case's directory (reader or command)
 * @param file the case file's name in it
 * @param refuse true for REFUSE
 * @param expect the expected fragment (empty for ACCEPT)
 * @param what a short description
 */
public record FuzzCase(Path dir, String file, boolean refuse, String expect, String what) {
  /** The manifest's name in each directory. */
  public static final String MANIFEST = "cases.tsv";

  /**
   * Reads a directory's manifest.
   *
   * @param dir the directory
   * @return its cases, in manifest order
   * @throws IOException when unreadable
   * @throws IllegalArgumentException when a line is malformed
   */
  public static List<FuzzCase> read(Path dir) throws IOException {
    final List<FuzzCase> out = new ArrayList<>();
    int n = 0;
    for (String line : Files.readAllLines(dir.resolve(MANIFEST), StandardCharsets.UTF_8)) {
      n++;
      if (line.isBlank() || line.startsWith("#")) {
        continue;
      }
      final String[] f = line.split("\t", -1);
      if (f.length != 4 || !(f[1].equals("ACCEPT") || f[1].equals("REFUSE"))
          || (f[1].equals("REFUSE") == f[2].equals("-")) || f[2].isEmpty()) {
        throw new IllegalArgumentException(dir.resolve(MANIFEST) + ":" + n + ": expected file<TAB>ACCEPT|REFUSE<TAB>"
            + "expected fragment (- for ACCEPT)<TAB>description");
      }
      out.add(new FuzzCase(dir, f[0], f[1].equals("REFUSE"), f[1].equals("REFUSE") ? f[2] : "", f[3]));
    }
    return out;
  }

  /**
   * The manifest line of this case.
   *
   * @return the tab-separated line
   */
  public String manifestLine() {
    return file + "\t" + (refuse ? "REFUSE" : "ACCEPT") + "\t" + (refuse ? expect : "-") + "\t" + what;
  }

  /** @return the case file */
  public Path path() {
    return dir.resolve(file);
  }
}
