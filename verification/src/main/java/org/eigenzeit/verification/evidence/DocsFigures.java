package org.eigenzeit.verification.evidence;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Figures in README.md and docs/*.md pinned to evidence keys (docs/verification.md, "Figures in
 * the docs"). A figure is tagged with an HTML comment right after it, invisible when rendered:
 *
 * <pre>
 *   2.3e-19 s<!-- ev: core.year_of_sums_error_s -->        the figure before the tag, unit allowed between
 *   98.9 %<!-- ev: report.core_line_coverage *100 -->       "*k": the docs show the value times k
 *   −6.1e-18<!-- ev: envelope.heo.worst_abs_dy abs -->     "abs": magnitudes are compared
 * </pre>
 *
 * <p>Checks: (a) the figure agrees with the measured value to the significant digits written
 * (the measured value as the test printed it, times k, rounded half up to as many significant
 * digits as the figure shows, must equal it; trailing zeros of a plain integer count as written digits); (b) the test
 * printed the bound it asserts ({@code evidence: <key> = <value> bound <B>}) and that bound is no
 * looser than 10 times the measured value (an exact zero must have a zero bound). Untagged numbers
 * with a unit, on lines that read like an accuracy claim, are listed as warnings for the lead: a
 * heuristic, never a failure. Fenced code blocks and inline code spans are skipped.
 */
public final class DocsFigures {
  /** The bound may be at most this many times the measured value. */
  public static final double MAX_BOUND_RATIO = 10.0;

  private static final String NUMBER = "[-+\u2212]?\\d[\\d\u2009\u202f ]*(?:\\.\\d+)?(?:[eE][-+\u2212]?\\d+)?";
  private static final Pattern TAG = Pattern.compile("(" + NUMBER + ")\\s?([^\\s<\\d|]{0,12})?\\s?<!--\\s*ev:\\s*"
      + "([A-Za-z0-9_.\\-]+)((?:\\s+(?:abs|\\*[0-9.eE+\\-]+))*)\\s*-->");
  private static final Pattern ANY_TAG = Pattern.compile("<!--\\s*ev:[^>]*-->");
  private static final Pattern UNIT_NUMBER = Pattern.compile("(?<![\\w.\\-])(" + NUMBER + ")\\s?"
      + "(ps/day|ns/day|µs/day|us/day|ps|ns|µs|us|fs|ms|s|mm|cm|km|m/s|m|%|arcsec|mas|µas|deg|°)(?![\\w/])");
  private static final Pattern CLAIM = Pattern.compile(
      "(?i)\\b(accura|error|within|bound|below|worst|agree|differ|drift|rms|less than|at most|residual|margin)");

  private DocsFigures() {}

  /**
   * One tagged figure.
   *
   * @param file the docs file, relative to the root
   * @param line line number, from 1
   * @param figure the figure as written (digits only, without the unit)
   * @param unit the unit written between the figure and the tag (may be empty)
   * @param key the evidence key
   * @param scale the docs show the value times this
   * @param abs the docs show the magnitude
   */
  public record Tag(String file, int line, String figure, String unit, String key, double scale, boolean abs) {}

  /**
   * The verdict on one tagged figure.
   *
   * @param tag the figure
   * @param measured the measured value (times the scale), NaN when not reported
   * @param bound the bound the test printed (times the scale), NaN when none
   * @param verdict OK, MISMATCH, NOT MEASURED, NO BOUND or BOUND TOO LOOSE
   * @param detail what was compared
   */
  public record Check(Tag tag, double measured, double bound, String verdict, String detail) {
    /**
     * Whether the figure passed.
     *
     * @return true for OK
     */
    public boolean ok() {
      return "OK".equals(verdict);
    }
  }

  /**
   * A possibly unpinned accuracy figure.
   *
   * @param file docs file
   * @param line line number
   * @param figure number and unit as written
   * @param text the line, shortened
   */
  public record Warning(String file, int line, String figure, String text) {}

  /**
   * The docs files checked: README.md and docs/*.md, sorted.
   *
   * @param root the project root
   * @return the files
   * @throws IOException when the folder cannot be listed
   */
  public static List<Path> docsFiles(Path root) throws IOException {
    final List<Path> out = new ArrayList<>();
    if (Files.isRegularFile(root.resolve("README.md"))) {
      out.add(root.resolve("README.md"));
    }
    final Path docs = root.resolve("docs");
    if (Files.isDirectory(docs)) {
      try (Stream<Path> s = Files.list(docs)) {
        s.filter(p -> String.valueOf(p.getFileName()).endsWith(".md")).sorted().forEach(out::add);
      }
    }
    return out;
  }

  /**
   * Tags of one text.
   *
   * @param file the name to report
   * @param text the Markdown
   * @return the tags in order
   * @throws IOException when a tag cannot be bound to a figure
   */
  public static List<Tag> tags(String file, String text) throws IOException {
    final List<Tag> out = new ArrayList<>();
    final String[] lines = text.split("\n", -1);
    for (int i = 0; i < lines.length; i++) {
      final Matcher any = ANY_TAG.matcher(lines[i]);
      int bound = 0;
      final Matcher m = TAG.matcher(lines[i]);
      while (m.find()) {
        bound++;
        double scale = 1.0;
        boolean abs = false;
        for (String opt : m.group(4).trim().split("\\s+")) {
          if ("abs".equals(opt)) {
            abs = true;
          } else if (opt.startsWith("*")) {
            scale = Double.parseDouble(opt.substring(1));
          }
        }
        out.add(new Tag(file, i + 1, m.group(1).trim(), m.group(2) == null ? "" : m.group(2), m.group(3), scale, abs));
      }
      int all = 0;
      while (any.find()) {
        all++;
      }
      if (all != bound) {
        throw new IOException(file + ":" + (i + 1) + ": an evidence tag follows no figure (write it right after "
            + "the number and its unit): " + lines[i].strip());
      }
    }
    return out;
  }

  /**
   * The figure as a number: Unicode minus and digit-group spaces allowed.
   *
   * @param figure as written
   * @return the value
   */
  static BigDecimal value(String figure) {
    return new BigDecimal(figure.replace('\u2212', '-').replaceAll("[\u2009\u202f ]", ""));
  }

  /**
   * Checks one tag against the measurements.
   *
   * @param t the tag
   * @param measured measurements by key
   * @return the verdict
   */
  public static Check check(Tag t, Map<String, TestReports.Measurement> measured) {
    final TestReports.Measurement m = measured.get(t.key());
    if (m == null || !Double.isFinite(m.value())) {
      return new Check(t, Double.NaN, Double.NaN, "NOT MEASURED", "no test printed evidence: " + t.key());
    }
    final double v = (t.abs() ? Math.abs(m.value()) : m.value()) * t.scale();
    final double b = m.bound() * t.scale();
    final BigDecimal written = t.abs() ? value(t.figure()).abs() : value(t.figure());
    final int digits = Math.max(1, written.precision());
    // The value as the test printed it (shortest decimal of the double), rounded half up.
    final BigDecimal rounded = BigDecimal.valueOf(v).round(new MathContext(digits, RoundingMode.HALF_UP));
    final String from = t.key() + " = " + Numbers.format(v) + " (" + m.testClass().substring(m.testClass().lastIndexOf('.') + 1)
        + (m.testMethod().isEmpty() ? "" : "#" + m.testMethod()) + ")";
    if (rounded.compareTo(written) != 0) {
      return new Check(t, v, b, "MISMATCH", "docs say " + t.figure() + ", measured " + from + " rounds to "
          + rounded.stripTrailingZeros().toString());
    }
    if (!m.hasBound()) {
      return new Check(t, v, b, "NO BOUND", from + ": the test prints no bound (evidence: <key> = <value> bound <B>)");
    }
    final double ratio = v == 0 ? (b == 0 ? 1.0 : Double.POSITIVE_INFINITY) : Math.abs(b / v);
    if (ratio > MAX_BOUND_RATIO) {
      return new Check(t, v, b, "BOUND TOO LOOSE", String.format(Locale.ROOT, "%s: the test asserts %s, %s times the measured "
          + "value (at most %.0f allowed)", from, Numbers.format(b), Double.isInfinite(ratio) ? "infinitely many" : Numbers.format(ratio),
          MAX_BOUND_RATIO));
    }
    return new Check(t, v, b, "OK", from + ", bound " + Numbers.format(b));
  }

  /**
   * Tags and checks of every docs file.
   *
   * @param root the project root
   * @param measured measurements by key
   * @return the checks in file and line order
   * @throws IOException when a file cannot be read or a tag is misplaced
   */
  public static List<Check> checkAll(Path root, Map<String, TestReports.Measurement> measured) throws IOException {
    final List<Check> out = new ArrayList<>();
    for (Path p : docsFiles(root)) {
      for (Tag t : tags(root.relativize(p).toString().replace('\\', '/'), withoutCode(Files.readString(p, StandardCharsets.UTF_8)))) {
        out.add(check(t, measured));
      }
    }
    return out;
  }

  /**
   * Untagged numbers with a unit on lines that read like accuracy claims (heuristic).
   *
   * @param root the project root
   * @return the warnings in file and line order
   * @throws IOException when a file cannot be read
   */
  public static List<Warning> untagged(Path root) throws IOException {
    final List<Warning> out = new ArrayList<>();
    for (Path p : docsFiles(root)) {
      final String name = root.relativize(p).toString().replace('\\', '/');
      final String[] lines = withoutCode(Files.readString(p, StandardCharsets.UTF_8)).split("\n", -1);
      for (int i = 0; i < lines.length; i++) {
        if (!CLAIM.matcher(lines[i]).find()) {
          continue;
        }
        final String untaggedText = TAG.matcher(lines[i]).replaceAll(" ");
        final Matcher m = UNIT_NUMBER.matcher(untaggedText);
        while (m.find()) {
          final String t = lines[i].strip();
          out.add(new Warning(name, i + 1, m.group(1).trim() + " " + m.group(2), t.length() > 100 ? t.substring(0, 100) + "..." : t));
        }
      }
    }
    return out;
  }

  private static final Pattern INLINE_CODE = Pattern.compile("`[^`\n]*`");

  /** The text with fenced code blocks and inline code spans blanked (line numbers kept). */
  static String withoutCode(String text) {
    final String[] lines = text.split("\n", -1);
    boolean code = false;
    for (int i = 0; i < lines.length; i++) {
      final boolean fence = lines[i].strip().startsWith("```");
      if (fence || code) {
        lines[i] = "";
      } else {
        lines[i] = INLINE_CODE.matcher(lines[i]).replaceAll(mr -> " ".repeat(mr.group().length()));
      }
      if (fence) {
        code = !code;
      }
    }
    return String.join("\n", lines);
  }
}
