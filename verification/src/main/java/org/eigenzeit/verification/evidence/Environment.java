package org.eigenzeit.verification.evidence;

import java.util.LinkedHashMap;
import java.util.Map;

/** The environment the package records: JDK, OS, commit, and the values the script passes. */
final class Environment {
  private Environment() {}

  /**
   * The environment entries in a fixed order.
   *
   * @param commit commit id (or "unknown")
   * @param extra further entries from the command line (e.g. the Maven version), in given order
   * @return name to value
   */
  static Map<String, String> collect(String commit, Map<String, String> extra) {
    final Map<String, String> env = new LinkedHashMap<>();
    env.put("commit", commit);
    env.put("JDK", System.getProperty("java.vendor") + " " + System.getProperty("java.runtime.version"));
    env.put("JVM", System.getProperty("java.vm.name") + " " + System.getProperty("java.vm.version"));
    env.put("OS", System.getProperty("os.name") + " " + System.getProperty("os.version") + " "
        + System.getProperty("os.arch"));
    env.put("processors", Integer.toString(Runtime.getRuntime().availableProcessors()));
    env.putAll(extra);
    return env;
  }
}
