package org.eigenzeit.bench.peer;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The reference against Orekit doing the same work (see {@link OrekitPeer}): one day of a LEO
 * (550 km sun-synchronous) and a GPS-like MEO orbit at EGM96 20x20 and 36x36 with DE405 Sun and
 * Moon, DP853 at 1e-13. Prints, per case, the thread CPU time per satellite-day of each side
 * (median of the timed runs after warm-up runs), the ratio ours/peer, the force evaluations, the
 * position difference of the two after one day, and each side's own integration error (against
 * itself at a tolerance ten times tighter).
 *
 * <p>Each side is timed in its own JVM (started here with the same class path and JVM options,
 * so a {@code taskset} pinning is inherited), so that neither side's code shapes the other's JIT
 * profile (both run the same Hipparchus integrator). Usage: {@code java -cp benchmarks.jar
 * org.eigenzeit.bench.peer.PeerRun [repeats]} (scripts/benchmarks.sh peer).
 */
public final class PeerRun {
  private static final double DAY = 86_400.0;
  private static final int WARMUPS = 3;
  private static final double WARMUP_CPU_S = 10.0;
  /** JVMs per side, alternating ours, peer, ours, peer (a load change then hits both sides). */
  private static final int ROUNDS = 2;

  private PeerRun() {}

  /** One orbit and degree. */
  record Case(String orbit, int degree) {
    OrbitSpec spec() {
      return orbit.equals("LEO")
          ? OrbitSpec.fromElements(CentralBody.EARTH, 6_928_137.0, 0.0012, 97.6, 30, 90, 0)
          : OrbitSpec.fromElements(CentralBody.EARTH, 26_560_000.0, 0.01, 55, 120, 40, 10);
    }
  }

  static final List<Case> CASES = List.of(new Case("LEO", 20), new Case("LEO", 36), new Case("MEO", 20),
      new Case("MEO", 36));

  /** The epoch of every case (inside the shipped DE405 span). */
  static final SplitTime T0 = Epochs.parse("2026-10-01T00:00:00", "TT");

  /** Our side: position after the span, and the evaluations. */
  static double[] ours(ReferenceConfig cfg, OrbitSpec o, long[] evals) {
    final ReferenceTrajectory tr = new ReferencePropagator(cfg).propagate(T0, o.position(), o.velocity(), DAY);
    final double[] r = new double[3];
    tr.state(DAY, r, new double[3]);
    evals[0] = tr.evaluations();
    return r;
  }

  /** The peer: position after the span, and the evaluations. */
  static double[] peer(ReferenceConfig cfg, OrbitSpec o, long[] evals) {
    return peer(new OrekitPeer(cfg), o, evals);
  }

  /**
   * The peer with its coefficient table already built (as ours keeps its EGM96 table loaded):
   * the timed part builds the propagator and its force models and propagates.
   */
  static double[] peer(OrekitPeer p, OrbitSpec o, long[] evals) {
    final double[] r = p.propagate(T0, o.position(), o.velocity(), DAY);
    evals[0] = p.lastEvaluations();
    return r;
  }

  static double distance(double[] a, double[] b) {
    return Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1]) + (a[2] - b[2]) * (a[2] - b[2]));
  }

  /**
   * Runs the comparison, or (with {@code --side ours|peer}) times one side in this JVM.
   *
   * @param args {@code [repeats]} or {@code --side ours|peer [repeats]}
   * @throws IOException when a child JVM cannot be started or read
   * @throws InterruptedException when interrupted while waiting for a child JVM
   */
  public static void main(String[] args) throws IOException, InterruptedException {
    if (args.length >= 2 && args[0].equals("--side")) {
      final int repeats = args.length > 2 ? Integer.parseInt(args[2]) : 7;
      timeSide(args[1], repeats);
      return;
    }
    final int repeats = args.length > 0 ? Integer.parseInt(args[0]) : 7;
    final Map<String, List<Double>> timing = new HashMap<>();
    final Map<String, String> evaluations = new HashMap<>();
    for (int round = 0; round < ROUNDS; round++) {
      for (String side : new String[] {"ours", "peer"}) {
        for (String line : child(side, repeats)) {
          final String[] f = line.split(" ");
          final String key = f[1] + " " + f[2] + " " + side;
          evaluations.put(key, f[4]);
          for (int i = 5; i < f.length; i++) {
            timing.computeIfAbsent(key, k -> new ArrayList<>()).add(Double.parseDouble(f[i]));
          }
        }
      }
    }
    final StringBuilder out = new StringBuilder();
    out.append(String.format(Locale.ROOT, "%nReference vs Orekit %s, same work (one day, DE405 Sun and Moon, DP853 "
        + "at 1e-13; CPU time = thread CPU time, median of %d runs: %d JVMs per side, alternating, %d runs each after a "
        + "warm-up of at least %d rounds of all cases and %.0f CPU-s)%n%n", orekitVersion(), ROUNDS * repeats,
        ROUNDS, repeats, WARMUPS, WARMUP_CPU_S));
    out.append("| orbit | degree | ours CPU-s per satellite-day | Orekit CPU-s per satellite-day | ratio ours/peer "
        + "| force evaluations ours / peer | position difference after 1 day (m) | own error ours / peer (m) |\n");
    out.append("|---|---|---|---|---|---|---|---|\n");
    for (Case c : CASES) {
      final ReferenceConfig cfg = ReferenceConfig.earth(c.degree());
      final ReferenceConfig tight = cfg.withIntegrator(ReferenceConfig.IntegratorKind.DORMAND_PRINCE_853, 1e-14);
      final OrbitSpec o = c.spec();
      final long[] e = new long[1];
      final double[] a = ours(cfg, o, e);
      final double[] b = peer(cfg, o, e);
      final double ownOurs = distance(a, ours(tight, o, e));
      final double ownPeer = distance(b, peer(tight, o, e));
      final String ko = c.orbit() + " " + c.degree() + " ours";
      final String kp = c.orbit() + " " + c.degree() + " peer";
      final double[] to = sorted(timing.get(ko));
      final double[] tp = sorted(timing.get(kp));
      final double cpuOurs = to[to.length / 2];
      final double cpuPeer = tp[tp.length / 2];
      out.append(String.format(Locale.ROOT, "| %s | %d | %.4f (%.4f-%.4f) | %.4f (%.4f-%.4f) | %.2f | %s / %s | %.2e "
          + "| %.1e / %.1e |%n", c.orbit(), c.degree(), cpuOurs, to[0], to[to.length - 1], cpuPeer, tp[0],
          tp[tp.length - 1], cpuOurs / cpuPeer, evaluations.get(ko), evaluations.get(kp), distance(a, b), ownOurs, ownPeer));
    }
    out.append("\nIn brackets: the fastest and slowest timed run. Own error: the difference to the same side at\n"
        + "tolerance 1e-14.\n");
    System.out.print(out);
  }

  /**
   * Times one side for every case in this JVM; prints one line per case. Warm-up first: every
   * case {@value #WARMUPS} times round-robin and then more rounds until the side has run for
   * {@value #WARMUP_CPU_S} CPU-seconds (the JIT compiles the library's large code paths late; a
   * short warm-up left the first case about twice as slow per evaluation as the others).
   */
  private static void timeSide(String side, int repeats) {
    final ThreadMXBean bean = ManagementFactory.getThreadMXBean();
    final List<ReferenceConfig> cfgs = new ArrayList<>();
    final List<OrekitPeer> peers = new ArrayList<>();
    for (Case c : CASES) {
      cfgs.add(ReferenceConfig.earth(c.degree()));
      peers.add(side.equals("ours") ? null : new OrekitPeer(cfgs.get(cfgs.size() - 1)));
    }
    final long[] e = new long[1];
    final long start = bean.getCurrentThreadCpuTime();
    for (int round = 0; round < WARMUPS || bean.getCurrentThreadCpuTime() - start < WARMUP_CPU_S * 1e9; round++) {
      for (int i = 0; i < CASES.size(); i++) {
        runOnce(side, cfgs.get(i), peers.get(i), CASES.get(i).spec(), e);
      }
    }
    for (int i = 0; i < CASES.size(); i++) {
      final Case c = CASES.get(i);
      final OrbitSpec o = c.spec();
      final double[] cpu = new double[Math.max(1, repeats)];
      for (int k = 0; k < cpu.length; k++) {
        final long c0 = bean.getCurrentThreadCpuTime();
        runOnce(side, cfgs.get(i), peers.get(i), o, e);
        cpu[k] = (bean.getCurrentThreadCpuTime() - c0) / 1e9;
      }
      final StringBuilder times = new StringBuilder();
      for (double x : cpu) {
        times.append(String.format(Locale.ROOT, " %.5f", x));
      }
      System.out.printf(Locale.ROOT, "timing: %s %d %s %d%s%n", c.orbit(), c.degree(), side, e[0], times);
      System.out.flush();
    }
  }

  private static void runOnce(String side, ReferenceConfig cfg, OrekitPeer orekit, OrbitSpec o, long[] e) {
    if (side.equals("ours")) {
      ours(cfg, o, e);
    } else {
      peer(orekit, o, e);
    }
  }

  private static double[] sorted(List<Double> xs) {
    final double[] a = xs.stream().mapToDouble(Double::doubleValue).toArray();
    Arrays.sort(a);
    return a;
  }

  private static List<String> child(String side, int repeats) throws IOException, InterruptedException {
    final List<String> cmd = new ArrayList<>();
    cmd.add(System.getProperty("java.home") + "/bin/java");
    cmd.addAll(ManagementFactory.getRuntimeMXBean().getInputArguments());
    cmd.add("-cp");
    cmd.add(System.getProperty("java.class.path"));
    cmd.add(PeerRun.class.getName());
    cmd.add("--side");
    cmd.add(side);
    cmd.add(Integer.toString(repeats));
    final Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
    final List<String> lines = new ArrayList<>();
    try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
      String line;
      while ((line = r.readLine()) != null) {
        System.out.println("  [" + side + "] " + line);
        if (line.startsWith("timing: ")) {
          lines.add(line);
        }
      }
    }
    if (p.waitFor() != 0 || lines.size() != CASES.size()) {
      throw new IllegalStateException("the " + side + " timing run failed (exit " + p.exitValue() + ")");
    }
    return lines;
  }

  private static String orekitVersion() {
    final Package p = org.orekit.propagation.numerical.NumericalPropagator.class.getPackage();
    final String v = p == null ? null : p.getImplementationVersion();
    return v == null ? "(version not in the manifest)" : v;
  }
}
