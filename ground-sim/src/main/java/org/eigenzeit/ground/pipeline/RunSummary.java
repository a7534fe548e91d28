package org.eigenzeit.ground.pipeline;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.eigenzeit.ground.loop.RunRecord;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.stats.Stability;

/** The summary step: a run's {@link RunResult} from what the loop recorded. */
public final class RunSummary {
  private RunSummary() {}

  /**
   * Summarises a run.
   *
   * @param sc the scenario
   * @param runName the run's scenario label ("name", or "name@level" in a model-level comparison)
   * @param seed the seed
   * @param rec what the loop recorded
   * @param thirdBodies the truth's Sun and Moon source
   * @return the summary
   */
  public static RunResult of(Scenario sc, String runName, long seed, RunRecord rec, String thirdBodies) {
    final double[] errorS = rec.errorS();
    final int cycle = rec.cycleS();
    final double settle = rec.firstTrackS();
    final int from = settle >= 0 ? (int) (settle / cycle) : 0;
    double max = 0;
    double sum2 = 0;
    double maxAll = 0;
    for (int k = 0; k < errorS.length; k++) {
      maxAll = Math.max(maxAll, Math.abs(errorS[k]));
      if (k >= from) {
        max = Math.max(max, Math.abs(errorS[k]));
        sum2 += errorS[k] * errorS[k];
      }
    }
    final int n = errorS.length - from;
    final double[] settled = Arrays.copyOfRange(errorS, from, errorS.length);
    final int lag = Math.max(1, 100 / cycle);
    double f2 = 0;
    int fn = 0;
    for (int k = lag; k < settled.length; k++) {
      final double f = (settled[k] - settled[k - lag]) / (lag * cycle);
      f2 += f * f;
      fn++;
    }
    final List<RunResult.StabilityPoint> stab = new ArrayList<>();
    for (int m : Stability.decadeFactors(settled.length, cycle)) {
      stab.add(new RunResult.StabilityPoint(m * cycle, Stability.adev(settled, cycle, m), Stability.tdev(settled, cycle, m),
          sc.oscillator().expectedAdev(m * cycle)));
    }
    final double span = rec.spanS();
    return new RunResult(runName, seed, sc.model().level(), sc.oscillator().name(), span, settle, max * 1e9,
        n > 0 ? Math.sqrt(sum2 / n) * 1e9 : Double.NaN, maxAll * 1e9, fn > 0 ? Math.sqrt(f2 / fn) : Double.NaN, stab,
        rec.timeInModeS(), rec.faults(), rec.trueOffsetEndS() / span, rec.modelOffsetEndS() / span, thirdBodies);
  }
}
