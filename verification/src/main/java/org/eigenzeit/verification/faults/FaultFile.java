package org.eigenzeit.verification.faults;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Reads and checks the seeded-fault list ({@code verification/faults.yaml}; format in its header)
 * and renders it as the Markdown table of docs/verification.md.
 */
public final class FaultFile {
  /** Line before the generated table in docs/verification.md. */
  public static final String DOCS_BEGIN = "<!-- seeded-faults:begin (generated from verification/faults.yaml; "
      + "scripts/fault-check.sh --write-docs) -->";
  /** Line after the generated table. */
  public static final String DOCS_END = "<!-- seeded-faults:end -->";

  private static final String[] FIELDS = {"id", "breaks", "file", "original", "replacement", "module", "tests", "source"};

  private FaultFile() {}

  /**
   * Reads the faults.
   *
   * @param file the YAML file
   * @return the faults in file order
   * @throws IOException when the file cannot be read or breaks the format (the message names the
   *     fault and the field)
   */
  public static List<Fault> read(Path file) throws IOException {
    final JsonNode root = new ObjectMapper(new YAMLFactory()).readTree(Files.readString(file, StandardCharsets.UTF_8));
    final JsonNode list = root == null ? null : root.get("faults");
    if (list == null || !list.isArray() || list.isEmpty()) {
      throw new IOException(file + ": no 'faults' list");
    }
    final List<Fault> out = new ArrayList<>();
    final Set<String> ids = new HashSet<>();
    int index = 0;
    for (JsonNode n : list) {
      index++;
      final String[] v = new String[FIELDS.length];
      for (int i = 0; i < FIELDS.length; i++) {
        final JsonNode f = n.get(FIELDS[i]);
        final String where = file.getFileName() + ", fault " + (i == 0 ? "#" + index : v[0]);
        if (f == null || !f.isValueNode() || f.asText().isBlank()) {
          throw new IOException(where + ": missing or empty '" + FIELDS[i] + "'");
        }
        v[i] = f.asText();
      }
      if (!ids.add(v[0])) {
        throw new IOException(file.getFileName() + ": duplicate fault id " + v[0]);
      }
      if (v[3].equals(v[4])) {
        throw new IOException(file.getFileName() + ", fault " + v[0] + ": replacement equals the original");
      }
      out.add(new Fault(v[0].strip(), v[1].strip(), v[2].strip(), v[3], v[4], v[5].strip(), v[6].strip(), v[7].strip()));
    }
    return out;
  }

  /**
   * How often the fault's original snippet occurs in its file below a root.
   *
   * @param root the project root
   * @param f the fault
   * @return the number of occurrences, -1 when the file does not exist
   * @throws IOException when the file cannot be read
   */
  public static int occurrences(Path root, Fault f) throws IOException {
    final Path p = root.resolve(f.file());
    if (!Files.isRegularFile(p)) {
      return -1;
    }
    final String text = Files.readString(p, StandardCharsets.UTF_8);
    int count = 0;
    for (int i = text.indexOf(f.original()); i >= 0; i = text.indexOf(f.original(), i + 1)) {
      count++;
    }
    return count;
  }

  /**
   * Why a fault is stale (its snippet missing or ambiguous), or null when it applies.
   *
   * @param root the project root
   * @param f the fault
   * @return the reason or null
   * @throws IOException when the file cannot be read
   */
  public static String staleReason(Path root, Fault f) throws IOException {
    final int n = occurrences(root, f);
    if (n < 0) {
      return "file " + f.file() + " not found";
    }
    if (n == 0) {
      return "original snippet not found in " + f.file();
    }
    return n > 1 ? "original snippet occurs " + n + " times in " + f.file() + " (ambiguous)" : null;
  }

  /**
   * The Markdown table of docs/verification.md, between {@link #DOCS_BEGIN} and {@link #DOCS_END}.
   *
   * @param faults the faults
   * @return the table, one line per fault, ending with a newline
   */
  public static String markdownTable(List<Fault> faults) {
    final StringBuilder b = new StringBuilder("| fault | what it breaks | file | caught by (module: -Dtest=) | outside value checked |\n");
    b.append("|---|---|---|---|---|\n");
    for (Fault f : faults) {
      b.append("| ").append(f.id()).append(" | ").append(md(f.breaks())).append(" | `")
          .append(f.file().substring(f.file().lastIndexOf('/') + 1)).append("` | ").append(f.module()).append(": `")
          .append(md(f.tests())).append("` | ").append(md(f.source())).append(" |\n");
    }
    return b.toString();
  }

  /**
   * The docs file with its generated table replaced by the current one.
   *
   * @param docs the docs text
   * @param faults the faults
   * @return the new text
   * @throws IOException when the markers are missing
   */
  public static String withTable(String docs, List<Fault> faults) throws IOException {
    final int b = docs.indexOf(DOCS_BEGIN);
    final int e = docs.indexOf(DOCS_END);
    if (b < 0 || e < b) {
      throw new IOException("docs: markers " + DOCS_BEGIN + " ... " + DOCS_END + " not found");
    }
    return docs.substring(0, b + DOCS_BEGIN.length()) + "\n" + markdownTable(faults) + docs.substring(e);
  }

  private static String md(String s) {
    return s.replace("|", "\\|").replace("\n", " ");
  }
}
