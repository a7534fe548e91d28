package org.eigenzeit.ground.pipeline;

import org.eigenzeit.ground.loop.ClosedLoop;
import org.eigenzeit.ground.loop.RunRecord;
import org.eigenzeit.ground.scenario.Scenario;

/**
 * One closed-loop run, one way through: setup ({@link RunSetup}: scenario to the core's
 * configuration, tables and truth models), the loop ({@link ClosedLoop}: cycles only), the summary
 * ({@link RunSummary}). A pure function of (scenario, seed).
 */
public final class Pipeline {
  private Pipeline() {}

  /**
   * The result and the time series of a run.
   *
   * @param result the summary
   * @param timeSeriesCsv the decimated time series as CSV text (columns in docs/campaigns.md)
   */
  public record Output(RunResult result, String timeSeriesCsv) {}

  /**
   * Runs one scenario with one seed.
   *
   * @param sc the scenario
   * @param seed the seed
   * @return the summary and the time series
   */
  public static Output run(Scenario sc, long seed) {
    return run(sc, seed, false);
  }

  /**
   * Runs one scenario with one seed, optionally labelled as a model-level comparison run.
   *
   * @param sc the scenario
   * @param seed the seed
   * @param comparison true to label the run "name@level"
   * @return the summary and the time series
   */
  public static Output run(Scenario sc, long seed, boolean comparison) {
    final RunSetup.Prepared p = RunSetup.prepare(sc, seed);
    final RunRecord rec = ClosedLoop.run(p.plan());
    final String label = comparison ? sc.name() + "@" + sc.model().level() : sc.name();
    return new Output(RunSummary.of(sc, label, seed, rec, p.thirdBodies()), rec.series().toCsv());
  }
}
