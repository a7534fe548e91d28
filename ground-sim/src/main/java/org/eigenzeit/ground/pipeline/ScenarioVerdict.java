package org.eigenzeit.ground.pipeline;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.eigenzeit.ground.scenario.TimingBudget;

/**
 * A scenario's verdict across its seeds: for each budget figure the worst case and the
 * nearest-rank percentile (the smallest value with at least P % of the seeds at or below it;
 * common practice), and the verdict "pass" when every figure's percentile is within the budget.
 *
 * @param scenario scenario name
 * @param seeds number of seeds judged
 * @param percentile the budget's percentile P
 * @param status "pass", "fail" or "no budget"
 * @param seedsPassing seeds whose own verdict is "pass"
 * @param figures each budget figure across the seeds
 */
public record ScenarioVerdict(String scenario, int seeds, double percentile, String status, int seedsPassing,
    List<Figure> figures) {

  /** Immutable copy. */
  public ScenarioVerdict {
    figures = List.copyOf(figures);
  }

  /**
   * One budget figure across seeds.
   *
   * @param name the figure
   * @param unit its unit
   * @param budget the budget's limit
   * @param atPercentile the nearest-rank percentile across seeds
   * @param worst the worst seed's value
   * @param percentileWithin the percentile within the budget
   * @param worstWithin the worst case within the budget
   */
  public record Figure(String name, String unit, double budget, double atPercentile, double worst,
      boolean percentileWithin, boolean worstWithin) {}

  /**
   * Judges a scenario's runs (its seeds at its own level; comparison runs excluded by the caller).
   *
   * @param scenario scenario name
   * @param budget its budget
   * @param runs its runs
   * @return the verdict
   */
  public static ScenarioVerdict of(String scenario, TimingBudget budget, List<RunResult> runs) {
    if (!budget.stated() || runs.isEmpty()) {
      return new ScenarioVerdict(scenario, runs.size(), budget.percentile(), "no budget", 0, List.of());
    }
    final List<Figure> figures = new ArrayList<>();
    final double[] settle = new double[runs.size()];
    final double[] rms = new double[runs.size()];
    final double[] adev = new double[runs.size()];
    final double[] max = new double[runs.size()];
    int passing = 0;
    for (int i = 0; i < runs.size(); i++) {
      final RunResult r = runs.get(i);
      final boolean settled = r.settleTimeS() >= 0;
      settle[i] = settled ? r.settleTimeS() : Double.POSITIVE_INFINITY;
      rms[i] = settled ? r.rmsTimeErrorNs() : Double.POSITIVE_INFINITY;
      max[i] = settled ? r.maxAbsTimeErrorNs() : Double.POSITIVE_INFINITY;
      adev[i] = Double.isNaN(r.verdict().adevAtBudgetTau()) ? Double.POSITIVE_INFINITY : r.verdict().adevAtBudgetTau();
      passing += "pass".equals(r.verdict().status()) ? 1 : 0;
    }
    final double p = budget.percentile();
    figures.add(figure("settling time within the band", "s", budget.settleWithinS(), settle, p));
    figures.add(figure("max |time error| after settling", "ns", budget.maxAbsTimeErrorNs(), max, p));
    if (budget.hasRms()) {
      figures.add(figure("RMS time error after settling", "ns", budget.rmsTimeErrorNs(), rms, p));
    }
    if (budget.hasAdev()) {
      figures.add(figure("ADEV at " + (long) budget.adevTauS() + " s", "", budget.adevMax(), adev, p));
    }
    boolean ok = true;
    for (Figure f : figures) {
      ok &= f.percentileWithin();
    }
    return new ScenarioVerdict(scenario, runs.size(), p, ok ? "pass" : "fail", passing, figures);
  }

  private static Figure figure(String name, String unit, double limit, double[] values, double p) {
    final double atP = nearestRank(values, p);
    double worst = values[0];
    for (double x : values) {
      worst = Math.max(worst, x);
    }
    return new Figure(name, unit, limit, atP, worst, atP <= limit, worst <= limit);
  }

  /**
   * The nearest-rank percentile of values.
   *
   * @param values the values
   * @param p the percentile, 0 .. 100
   * @return the smallest value with at least p % of the values at or below it
   */
  public static double nearestRank(double[] values, double p) {
    final double[] v = values.clone();
    Arrays.sort(v);
    final int rank = (int) Math.ceil(p / 100.0 * v.length);
    return v[Math.max(0, Math.min(v.length, rank) - 1)];
  }
}
