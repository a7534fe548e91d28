package org.eigenzeit.ground.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.time.SplitTime;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code eigenzeit reference-speed}: satellite-days of reference per CPU-second. */
@Command(name = "reference-speed", mixinStandardHelpOptions = true,
    header = "Measures the ground reference's speed.",
    description = {"Measures the ground reference's speed: satellite-days per CPU-second (thread CPU time, median "
        + "of --repeats runs after one warm-up) for LEO and MEO at degree 8, 20 and 36, with DE405 Sun and Moon and "
        + "the proper-time state."})
final class ReferenceSpeedCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Option(names = "--repeats", defaultValue = "5", paramLabel = "N",
      description = "Timed runs per case, 1 to 100 (default ${DEFAULT-VALUE}).")
  int repeats;

  @Option(names = "--json", description = "Print JSON (a list of {orbit, degree, cpuSecondsPerSatelliteDay, "
      + "satelliteDaysPerCpuSecond, forceEvaluations}) instead of the table.")
  boolean json;

  /** One measured case. */
  record Case(String orbit, int degree, double cpuSecondsPerSatelliteDay, double satelliteDaysPerCpuSecond,
      long forceEvaluations) {}

  @Override
  public Integer call() {
    final PrintWriter out = spec.commandLine().getOut();
    OptionChecks.range(spec.commandLine(), "--repeats", repeats, 1, 100);
    final ThreadMXBean bean = ManagementFactory.getThreadMXBean();
    final SplitTime t0 = Epochs.parse("2026-10-01T00:00:00", "TT");
    final java.util.List<Case> cases = new java.util.ArrayList<>();
    if (!json) {
      out.println("orbit  degree  CPU-s per satellite-day  satellite-days per CPU-s  force evaluations");
    }
    for (String orbit : new String[] {"LEO", "MEO"}) {
      final OrbitSpec o = orbit.equals("LEO")
          ? OrbitSpec.fromElements(CentralBody.EARTH, 6_928_137.0, 0.0012, 97.6, 30, 90, 0)
          : OrbitSpec.fromElements(CentralBody.EARTH, 27_900_000.0, 0.01, 56, 120, 40, 10);
      for (int degree : new int[] {8, 20, 36}) {
        final ReferencePropagator p = new ReferencePropagator(ReferenceConfig.earth(degree));
        p.propagate(t0, o.position(), o.velocity(), 86_400);
        final double[] cpu = new double[Math.max(1, repeats)];
        long evals = 0;
        for (int k = 0; k < cpu.length; k++) {
          final long c0 = bean.getCurrentThreadCpuTime();
          final ReferenceTrajectory tr = p.propagate(t0, o.position(), o.velocity(), 86_400);
          cpu[k] = (bean.getCurrentThreadCpuTime() - c0) / 1e9;
          evals = tr.evaluations();
        }
        Arrays.sort(cpu);
        final double median = cpu[cpu.length / 2];
        cases.add(new Case(orbit, degree, median, 1 / median, evals));
        if (!json) {
          out.printf(Locale.ROOT, "%-6s %6d %24.4f %25.1f %18d%n", orbit, degree, median, 1 / median, evals);
          out.flush();
        }
      }
    }
    if (json) {
      try {
        out.println(BudgetCommand.mapper().writeValueAsString(cases));
      } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
        throw new IllegalStateException(e);
      }
    }
    out.flush();
    return 0;
  }
}
