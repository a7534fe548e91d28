package org.eigenzeit.ground.pipeline;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.loop.RunRecord;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.TimingBudget;
import org.eigenzeit.ground.stats.Stability;

/**
 * The summary step: a run's {@link RunResult} from what the loop recorded. Settling is defined by
 * the error itself: the run has settled at the time after which |time error| stays within the
 * settling band to the end (the budget's max |time error|, else the servo's track-exit threshold),
 * so a transient after a mode change counts only while it leaves the band.
 */
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
    final TimingBudget budget = sc.budget();
    final double bandNs = budget.stated() ? budget.maxAbsTimeErrorNs() : sc.servo().trackExitNs();
    final int from = settledFrom(errorS, bandNs * 1e-9);
    final double settle = from < 0 ? -1 : (double) from * cycle;
    final int start = Math.max(from, 0);
    double max = 0;
    double sum2 = 0;
    double maxAll = 0;
    for (int k = 0; k < errorS.length; k++) {
      maxAll = Math.max(maxAll, Math.abs(errorS[k]));
      if (k >= start) {
        max = Math.max(max, Math.abs(errorS[k]));
        sum2 += errorS[k] * errorS[k];
      }
    }
    final int n = errorS.length - start;
    final double[] settled = Arrays.copyOfRange(errorS, start, errorS.length);
    final int lag = Math.max(1, 100 / cycle);
    double f2 = 0;
    int fn = 0;
    for (int k = lag; k < settled.length; k++) {
      final double f = (settled[k] - settled[k - lag]) / (lag * cycle);
      f2 += f * f;
      fn++;
    }
    final List<RunResult.StabilityPoint> stab = new ArrayList<>();
    for (int m = 1; m <= settled.length / 5; m *= 2) {
      final double intervals = Math.max(1, (settled.length - 1) / m - 1);
      final double adev = Stability.adev(settled, cycle, m);
      final double tdev = Stability.tdev(settled, cycle, m);
      stab.add(new RunResult.StabilityPoint(m * cycle, adev, adev / Math.sqrt(intervals), tdev,
          tdev / Math.sqrt(intervals), sc.oscillator().expectedAdev(m * cycle)));
    }
    final double rms = n > 0 ? Math.sqrt(sum2 / n) * 1e9 : Double.NaN;
    final double span = rec.spanS();
    return new RunResult(runName, seed, sc.model().level(), sc.oscillator().name(), span, settle, bandNs,
        rec.firstTrackS(), max * 1e9, rms, maxAll * 1e9, fn > 0 ? Math.sqrt(f2 / fn) : Double.NaN, stab,
        rec.timeInModeS(), rec.faults(), rec.trueOffsetEndS() / span, rec.modelOffsetEndS() / span, thirdBodies,
        verdict(budget, settle, rms, settled, cycle), rec.lunar());
  }

  /**
   * The first index from which |e| stays within the band to the end.
   *
   * @param e the time error, s
   * @param band the band, s
   * @return the index, or -1 when the last value is outside the band
   */
  static int settledFrom(double[] e, double band) {
    for (int k = e.length - 1; k >= 0; k--) {
      if (!(Math.abs(e[k]) <= band)) {
        return k == e.length - 1 ? -1 : k + 1;
      }
    }
    return 0;
  }

  private static RunResult.Verdict verdict(TimingBudget b, double settle, double rms, double[] settled, int cycle) {
    if (!b.stated()) {
      return new RunResult.Verdict("no budget", Double.NaN, List.of());
    }
    final List<String> reasons = new ArrayList<>();
    if (settle < 0) {
      reasons.add(String.format(Locale.ROOT, "never settles within %s ns", num(b.maxAbsTimeErrorNs())));
    } else if (settle > b.settleWithinS()) {
      reasons.add(String.format(Locale.ROOT, "settles within %s ns at %.0f s, after the %.0f s allowed",
          num(b.maxAbsTimeErrorNs()), settle, b.settleWithinS()));
    }
    if (b.hasRms() && settle >= 0 && !(rms <= b.rmsTimeErrorNs())) {
      reasons.add(String.format(Locale.ROOT, "RMS after settling %.3g ns above %s ns", rms, num(b.rmsTimeErrorNs())));
    }
    double adev = Double.NaN;
    if (b.hasAdev()) {
      final int m = (int) Math.round(b.adevTauS() / cycle);
      adev = settle >= 0 ? Stability.adev(settled, cycle, Math.max(1, m)) : Double.NaN;
      if (!(adev <= b.adevMax())) {
        reasons.add(String.format(Locale.ROOT, "ADEV at %.0f s %s above %s", b.adevTauS(),
            Double.isNaN(adev) ? "not measurable" : String.format(Locale.ROOT, "%.3g", adev), num(b.adevMax())));
      }
    }
    return new RunResult.Verdict(reasons.isEmpty() ? "pass" : "fail", adev, reasons);
  }

  static String num(double v) {
    return String.format(Locale.ROOT, "%.4g", v).replaceAll("\\.?0+$", "").replaceAll("\\.?0+e", "e");
  }
}
