package org.eigenzeit.bench.ops;

import java.lang.instrument.Instrumentation;

/**
 * The Java agent: {@code java -javaagent:benchmarks.jar[=prefix] ...} rewrites every class whose
 * internal name starts with the prefix (default {@code org/eigenzeit/onboard/}) as it is loaded
 * ({@link OpCountTransformer}). Named in the jar's manifest as Premain-Class.
 */
public final class OpCountAgent {
  /** Whether the agent was installed in this JVM. */
  static volatile boolean installed;

  private OpCountAgent() {}

  /**
   * Installs the transformer.
   *
   * @param args the internal-name prefix, or null for the onboard core
   * @param inst the JVM's instrumentation
   */
  public static void premain(String args, Instrumentation inst) {
    inst.addTransformer(new OpCountTransformer(args == null || args.isEmpty() ? "org/eigenzeit/onboard/" : args));
    installed = true;
  }
}
