package org.eigenzeit.verification;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.eigenzeit.ground.budget.BudgetAnalysis;
import org.eigenzeit.ground.budget.BudgetResult;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The full onboard model against the ground reference along the same true trajectory, one day,
 * over the orbit envelope (LEO from 300 km, MEO, GEO, HEO up to e = 0.8, inclinations 0-180 deg,
 * lunar orbits). Search: a coarse grid per class, then a local refinement around the worst point
 * (random perturbations, keep the worse), beyond random sampling. Bounds (issue requirement):
 * |mean y difference| <= 1e-17 everywhere; accumulated offset difference <= 1 ps/day for MEO and
 * GEO, <= 10 ps/day for LEO, HEO and lunar. The worst case per class is printed, not only pass/fail.
 */
class EnvelopeErrorBoundProperties {
  private static final int REFINEMENTS = 8;
  private static final SplitTime T0 = Epochs.parse("2026-10-01T00:00:00", "TT");

  /** One orbit class: body, bound, grid of (a km, e, i deg) and the allowed region. */
  private record OrbitClass(String name, CentralBody body, double boundPs, double[][] grid, double minA, double maxA,
      double maxE, double minPerigeeKm) {}

  private static BudgetResult evaluate(OrbitClass c, double aKm, double e, double incDeg, double raan) {
    final OrbitSpec o = OrbitSpec.fromElements(c.body(), aKm * 1e3, e, incDeg, raan, 37.0, 11.0);
    return BudgetAnalysis.analyse(c.name(), o, T0, 86_400, 10.0, 0);
  }

  /**
   * Pins: the worst cases found (fixed seed, so the search is deterministic) may not grow beyond
   * 10x their measured values, or the requirement where that is tighter: {ps per day, |mean dy|}.
   * Measured 2026-12-02 (docs/verification.md): LEO 0.0077 ps / 8.8e-20, MEO 0.074 / 8.5e-19,
   * GEO 0.147 / 1.2e-18, HEO 0.528 / 6.1e-18, lunar 0.486 / 5.6e-18.
   */
  private static final java.util.Map<String, double[]> PINS = java.util.Map.of("LEO", new double[] {0.076, 8.8e-19},
      "MEO", new double[] {0.73, 8.5e-18}, "GEO", new double[] {1.0, 1e-17}, "HEO", new double[] {5.2, 1e-17},
      "lunar", new double[] {4.8, 1e-17});

  private static double score(BudgetResult r, double boundPs) {
    return Math.max(Math.abs(r.coreMinusReferenceRate()) / 1e-17, r.maxOffsetDifferenceS() * 1e12 / boundPs);
  }

  @Test
  void worstCasePerOrbitClassWithinBounds() {
    final List<OrbitClass> classes = List.of(
        new OrbitClass("LEO", CentralBody.EARTH, 10, new double[][] {{6678.137, 0.0, 51.6}, {6678.137, 0.001, 97.8},
            {7178.137, 0.002, 0.0}, {6978.137, 0.0, 140.0}, {6778.137, 0.001, 180.0}}, 6678.137, 8378.137, 0.05, 300),
        new OrbitClass("MEO", CentralBody.EARTH, 1, new double[][] {{26561.75, 0.01, 55.0}, {29600.0, 0.0, 56.0},
            {20000.0, 0.05, 120.0}, {23222.0, 0.0, 0.0}}, 12000, 32000, 0.05, 2000),
        new OrbitClass("GEO", CentralBody.EARTH, 1, new double[][] {{42164.17, 0.0, 0.0}, {42164.17, 0.0005, 5.0}},
            42000, 42300, 0.001, 30000),
        new OrbitClass("HEO", CentralBody.EARTH, 10, new double[][] {{26600.0, 0.74, 63.4}, {33400.0, 0.8, 63.4},
            {24400.0, 0.72, 28.0}, {26600.0, 0.74, 116.6}}, 20000, 45000, 0.8, 300),
        new OrbitClass("lunar", CentralBody.MOON, 10, new double[][] {{1838.0, 0.01, 90.0}, {1800.0, 0.02, 30.0},
            {5000.0, 0.5, 50.0}, {1900.0, 0.0, 180.0}}, 1790, 8000, 0.6, 50));
    final StringBuilder table = new StringBuilder("worst cases found (full model vs reference, one day):\n");
    final List<String> failures = new ArrayList<>();
    final SplittableRandom rnd = new SplittableRandom(20261202L);
    for (OrbitClass c : classes) {
      double[] worst = null;
      BudgetResult worstR = null;
      double worstScore = -1;
      int evaluations = 0;
      for (double[] g : c.grid()) {
        final BudgetResult r = evaluate(c, g[0], g[1], g[2], 0.0);
        evaluations++;
        if (score(r, c.boundPs()) > worstScore) {
          worstScore = score(r, c.boundPs());
          worst = new double[] {g[0], g[1], g[2], 0.0};
          worstR = r;
        }
      }
      for (int k = 0; k < REFINEMENTS; k++) { // refinement: perturb the worst point, keep the worse
        final double a = clamp(worst[0] * (1 + 0.05 * (rnd.nextDouble() - 0.5)), c.minA(), c.maxA());
        double e = clamp(worst[1] + 0.02 * (rnd.nextDouble() - 0.5), 0, c.maxE());
        final double rMin = (c.body().referenceRadiusM() / 1e3) + c.minPerigeeKm();
        e = Math.min(e, 1 - rMin / a);
        final double inc = clamp(worst[2] + 20 * (rnd.nextDouble() - 0.5), 0, 180);
        final double raan = rnd.nextDouble() * 360;
        final BudgetResult r = evaluate(c, a, Math.max(0, e), inc, raan);
        evaluations++;
        if (score(r, c.boundPs()) > worstScore) {
          worstScore = score(r, c.boundPs());
          worst = new double[] {a, Math.max(0, e), inc, raan};
          worstR = r;
        }
      }
      table.append(String.format(Locale.ROOT, "  %-5s a %9.1f km e %.4f i %6.1f deg raan %5.1f: mean dy %9.2e, "
          + "max offset difference %7.3f ps/day (bound %2.0f ps), %d orbits searched%n", c.name(), worst[0], worst[1],
          worst[2], worst[3], worstR.coreMinusReferenceRate(), worstR.maxOffsetDifferenceS() * 1e12, c.boundPs(),
          evaluations));
      final String key = c.name().toLowerCase(Locale.ROOT);
      final double[] pin = PINS.get(c.name());
      table.append(String.format(Locale.ROOT, "evidence: envelope.%s.worst_ps_per_day = %.4e bound %.2e%n", key,
          worstR.maxOffsetDifferenceS() * 1e12, pin[0]));
      table.append(String.format(Locale.ROOT, "evidence: envelope.%s.worst_abs_dy = %.3e bound %.1e%n", key,
          Math.abs(worstR.coreMinusReferenceRate()), pin[1]));
      if (worstR.maxOffsetDifferenceS() * 1e12 > pin[0] || Math.abs(worstR.coreMinusReferenceRate()) > pin[1]) {
        failures.add(c.name() + " beyond its pin " + java.util.Arrays.toString(pin));
      }
      table.append(String.format(Locale.ROOT, "evidence: envelope.%s.orbits_searched = %d%n", key, evaluations));
      if (worstScore > 1) {
        failures.add(c.name());
      }
    }
    System.out.print(table);
    assertTrue(failures.isEmpty(), "bounds exceeded in " + failures + "\n" + table);
  }

  private static double clamp(double v, double lo, double hi) {
    return Math.max(lo, Math.min(hi, v));
  }
}
