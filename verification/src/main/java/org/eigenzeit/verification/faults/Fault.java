package org.eigenzeit.verification.faults;

import java.util.List;

/**
 * One seeded fault: a deliberate change to the code and the tests that must fail because of it.
 *
 * @param id short unique identifier, e.g. {@code SUM-01}
 * @param breaks what the fault breaks, in one line
 * @param file the changed file, relative to the project root
 * @param original the exact snippet the fault replaces (must occur exactly once in the file)
 * @param replacement the snippet put in its place (the fault must still compile)
 * @param module the Maven module whose tests catch the fault
 * @param tests the catching tests as a Surefire {@code -Dtest=} selector: {@code Class},
 *     {@code Class#method} or {@code Class#m1+m2}, several separated by commas
 * @param source the outside value the catching test checks against
 */
public record Fault(String id, String breaks, String file, String original, String replacement, String module,
    String tests, String source) {

  /**
   * The module that holds the changed file (the first path element).
   *
   * @return the module directory name
   */
  public String fileModule() {
    final int slash = file.indexOf('/');
    return slash < 0 ? "" : file.substring(0, slash);
  }

  /**
   * The selector split into its parts, e.g. {@code [A#x+y, B]}.
   *
   * @return the parts
   */
  public List<String> selectorParts() {
    return List.of(tests.split("\\s*,\\s*"));
  }

  /**
   * The Maven command that runs the catching tests alone.
   *
   * @return the command
   */
  public String mavenCommand() {
    return "mvn -pl " + module + " -am test -Dtest='" + tests + "' -Dsurefire.failIfNoSpecifiedTests=false";
  }
}
