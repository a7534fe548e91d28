package org.eigenzeit.verification.evidence;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;
import org.xml.sax.SAXException;

/**
 * The results of one build's tests, read from the Surefire XML reports of every module: per test
 * class the counts, and every measured value a test printed as {@code evidence: <key> = <value>}.
 * Durations are ignored on purpose (they differ between runs; the package must not).
 */
public final class TestReports {
  /** {@code evidence: <key> = <value>}, optionally followed by {@code bound <B>} (the bound the test asserts). */
  private static final Pattern LINE = Pattern.compile(
      "^evidence: ([A-Za-z0-9_.\\-]+) = (\\S+)(?:\\s+bound\\s+(\\S+))?\\s*$", Pattern.MULTILINE);

  /**
   * Counts of one test class.
   *
   * @param module the module whose reports held it
   * @param tests test cases run
   * @param failures failed assertions
   * @param errors unexpected exceptions
   * @param skipped skipped cases
   */
  public record ClassResult(String module, int tests, int failures, int errors, int skipped) {
    /**
     * Whether the class ran and passed.
     *
     * @return true when at least one case ran and none failed
     */
    public boolean passed() {
      return tests - skipped > 0 && failures == 0 && errors == 0;
    }
  }

  /**
   * One measured value.
   *
   * @param key evidence key
   * @param value the value
   * @param testClass the class that printed it
   * @param testMethod the method (empty when printed outside a test method)
   * @param bound the bound the test asserts on the value, NaN when it printed none
   */
  public record Measurement(String key, double value, String testClass, String testMethod, double bound) {
    /**
     * A measurement without a printed bound.
     *
     * @param key evidence key
     * @param value the value
     * @param testClass the class that printed it
     * @param testMethod the method
     */
    public Measurement(String key, double value, String testClass, String testMethod) {
      this(key, value, testClass, testMethod, Double.NaN);
    }

    /**
     * Whether the test printed the bound it asserts.
     *
     * @return true when a bound is known
     */
    public boolean hasBound() {
      return !Double.isNaN(bound);
    }
  }

  private final Map<String, ClassResult> classes = new TreeMap<>();
  private final Map<String, Measurement> measurements = new TreeMap<>();

  /**
   * Reads {@code <module>/target/surefire-reports/TEST-*.xml} for every module below the root.
   *
   * @param root the project root
   * @return the results
   * @throws IOException when a report cannot be read or parsed
   */
  public static TestReports read(Path root) throws IOException {
    final TestReports r = new TestReports();
    final List<Path> reports = new ArrayList<>();
    try (Stream<Path> modules = Files.list(root)) {
      for (Path m : modules.sorted().toList()) {
        final Path dir = m.resolve("target").resolve("surefire-reports");
        if (Files.isDirectory(dir)) {
          try (Stream<Path> files = Files.list(dir)) {
            files.filter(p -> String.valueOf(p.getFileName()).matches("TEST-.*\\.xml")).sorted().forEach(reports::add);
          }
        }
      }
    }
    for (Path p : reports) {
      r.add(root.relativize(p).getName(0).toString(), p);
    }
    return r;
  }

  private void add(String module, Path report) throws IOException {
    final Document doc;
    try (InputStream in = Files.newInputStream(report)) {
      doc = builder().parse(in);
    } catch (SAXException | ParserConfigurationException e) {
      throw new IOException(report + ": " + e.getMessage(), e);
    }
    final Element suite = doc.getDocumentElement();
    final String name = suite.getAttribute("name");
    classes.put(name, new ClassResult(module, integer(suite, "tests"), integer(suite, "failures"),
        integer(suite, "errors"), integer(suite, "skipped")));
    final NodeList children = suite.getChildNodes();
    for (int i = 0; i < children.getLength(); i++) {
      final Node n = children.item(i);
      if (n instanceof Element e) {
        if ("testcase".equals(e.getTagName())) {
          final NodeList outs = e.getElementsByTagName("system-out");
          for (int k = 0; k < outs.getLength(); k++) {
            scan(outs.item(k).getTextContent(), name, e.getAttribute("name"));
          }
        } else if ("system-out".equals(e.getTagName())) {
          scan(e.getTextContent(), name, "");
        }
      }
    }
  }

  private void scan(String text, String testClass, String method) {
    final Matcher m = LINE.matcher(text);
    while (m.find()) {
      final Measurement meas = new Measurement(m.group(1), parse(m.group(2)), testClass, method,
          m.group(3) == null ? Double.NaN : parse(m.group(3)));
      // A key printed twice keeps its worst (largest) value: the criteria bound worst cases.
      measurements.merge(meas.key(), meas, (a, b) -> b.value() > a.value() || Double.isNaN(b.value()) ? b : a);
    }
  }

  private static double parse(String s) {
    try {
      return Double.parseDouble(s);
    } catch (NumberFormatException e) {
      return Double.NaN;
    }
  }

  /** A parser for the build's own XML reports: no DOCTYPE, no external entities. */
  static DocumentBuilder builder() throws ParserConfigurationException {
    final DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
    f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
    f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
    f.setExpandEntityReferences(false);
    return f.newDocumentBuilder();
  }

  private static int integer(Element e, String attribute) {
    final String s = e.getAttribute(attribute);
    return s.isEmpty() ? 0 : Integer.parseInt(s);
  }

  /**
   * Results per test class, sorted by name.
   *
   * @return an unmodifiable view
   */
  public Map<String, ClassResult> classes() {
    return java.util.Collections.unmodifiableMap(classes);
  }

  /**
   * Measured values by key, sorted.
   *
   * @return an unmodifiable view
   */
  public Map<String, Measurement> measurements() {
    return java.util.Collections.unmodifiableMap(measurements);
  }

  /**
   * Adds a value from outside the test reports (coverage, mutation score).
   *
   * @param m the measurement
   */
  public void put(Measurement m) {
    measurements.put(m.key(), m);
  }
}
