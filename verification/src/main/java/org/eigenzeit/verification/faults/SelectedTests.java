package org.eigenzeit.verification.faults;

import static org.junit.platform.engine.discovery.DiscoverySelectors.selectClass;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.platform.engine.FilterResult;
import org.junit.platform.engine.support.descriptor.MethodSource;
import org.junit.platform.launcher.Launcher;
import org.junit.platform.launcher.LauncherDiscoveryRequest;
import org.junit.platform.launcher.PostDiscoveryFilter;
import org.junit.platform.launcher.core.LauncherDiscoveryRequestBuilder;
import org.junit.platform.launcher.core.LauncherFactory;
import org.junit.platform.launcher.listeners.SummaryGeneratingListener;
import org.junit.platform.launcher.listeners.TestExecutionSummary;

/**
 * Runs selected JUnit tests in this JVM and reports by exit status: 0 all passed, 1 some failed,
 * 3 no test matched. Arguments: {@code fully.qualified.Class} or {@code fully.qualified.Class#m1+m2}.
 * The fault harness forks one JVM per fault with this class as the main class.
 */
public final class SelectedTests {
  /** Exit status when a selected test failed. */
  static final int FAILED = 1;
  /** Exit status when no test matched the selectors. */
  static final int NOTHING_RAN = 3;

  private SelectedTests() {}

  /**
   * Entry point.
   *
   * @param args the selectors
   */
  public static void main(String[] args) {
    System.exit(run(args));
  }

  static int run(String... args) {
    final List<org.junit.platform.engine.DiscoverySelector> selectors = new ArrayList<>();
    final Set<String> methods = new HashSet<>();
    final Set<String> wholeClasses = new HashSet<>();
    for (String a : args) {
      final int hash = a.indexOf('#');
      final String cls = hash < 0 ? a : a.substring(0, hash);
      selectors.add(selectClass(cls));
      if (hash < 0) {
        wholeClasses.add(cls);
      } else {
        for (String m : a.substring(hash + 1).split("\\+")) {
          methods.add(cls + "#" + m);
        }
      }
    }
    final PostDiscoveryFilter byMethod = d -> {
      if (d.getSource().isPresent() && d.getSource().get() instanceof MethodSource ms) {
        final boolean keep = wholeClasses.contains(ms.getClassName())
            || methods.contains(ms.getClassName() + "#" + ms.getMethodName());
        return keep ? FilterResult.included("selected") : FilterResult.excluded("not selected");
      }
      return FilterResult.included("container");
    };
    final LauncherDiscoveryRequest request = LauncherDiscoveryRequestBuilder.request().selectors(selectors)
        .filters(byMethod).build();
    final Launcher launcher = LauncherFactory.create();
    final SummaryGeneratingListener listener = new SummaryGeneratingListener();
    launcher.execute(request, listener);
    final TestExecutionSummary s = listener.getSummary();
    final PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
    out.printf("selected tests: %d run, %d failed%n", s.getTestsStartedCount(), s.getTotalFailureCount());
    for (TestExecutionSummary.Failure f : s.getFailures()) {
      final String msg = String.valueOf(f.getException().getMessage()).replaceAll("\\s+", " ");
      out.printf("failure: %s: %s: %s%n", f.getTestIdentifier().getDisplayName(), f.getException().getClass().getSimpleName(),
          msg.length() > 160 ? msg.substring(0, 160) + "..." : msg);
    }
    out.flush();
    if (s.getTestsStartedCount() == 0) {
      return NOTHING_RAN;
    }
    return s.getTotalFailureCount() > 0 ? FAILED : 0;
  }

}
