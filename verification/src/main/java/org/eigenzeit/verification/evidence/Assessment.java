package org.eigenzeit.verification.evidence;

import java.util.ArrayList;
import java.util.List;

/**
 * The verdict on one requirement.
 *
 * @param requirement the requirement
 * @param value the judged value (the largest of its metrics), NaN when not measured
 * @param evidence the measurements behind the value, in metric order (missing ones left out)
 * @param missing metrics no test reported
 * @param testsNotPassed verifying test classes that did not run or did not pass
 * @param verdict PASS, FAIL or NOT MEASURED
 */
public record Assessment(Requirement requirement, double value, List<TestReports.Measurement> evidence,
    List<String> missing, List<String> testsNotPassed, String verdict) {

  /** Verdict when the value meets the criterion and every verifying test passed. */
  public static final String PASS = "PASS";
  /** Verdict when the value misses the criterion or a verifying test failed. */
  public static final String FAIL = "FAIL";
  /** Verdict when a metric was not reported or a verifying test did not run. */
  public static final String NOT_MEASURED = "NOT MEASURED";

  /** Copies the lists. */
  public Assessment {
    evidence = List.copyOf(evidence);
    missing = List.copyOf(missing);
    testsNotPassed = List.copyOf(testsNotPassed);
  }

  /**
   * Judges a requirement.
   *
   * @param r the requirement
   * @param results the test results and report scores
   * @return the assessment
   */
  public static Assessment of(Requirement r, TestReports results) {
    final List<TestReports.Measurement> ev = new ArrayList<>();
    final List<String> missing = new ArrayList<>();
    double value = Double.NEGATIVE_INFINITY;
    for (String key : r.metrics()) {
      final TestReports.Measurement m = results.measurements().get(key);
      if (m == null) {
        missing.add(key);
      } else {
        ev.add(m);
        value = Double.isNaN(m.value()) || Double.isNaN(value) ? Double.NaN : Math.max(value, m.value());
      }
    }
    if (!missing.isEmpty()) {
      value = Double.NaN;
    }
    final List<String> notPassed = new ArrayList<>();
    boolean notRun = false;
    for (String test : r.verifiedBy()) {
      final TestReports.ClassResult c = results.classes().get(test);
      if (c == null || c.tests() - c.skipped() == 0) {
        notPassed.add(test + " (not run)");
        notRun = true;
      } else if (!c.passed()) {
        notPassed.add(test + " (" + c.failures() + " failed, " + c.errors() + " errors)");
      }
    }
    final String verdict;
    if (!missing.isEmpty() || notRun) {
      verdict = NOT_MEASURED;
    } else if (notPassed.isEmpty() && r.criterion().accepts(value)) {
      verdict = PASS;
    } else {
      verdict = FAIL;
    }
    return new Assessment(r, value, ev, missing, notPassed, verdict);
  }
}
