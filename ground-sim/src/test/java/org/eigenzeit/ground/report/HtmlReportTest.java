package org.eigenzeit.ground.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.eigenzeit.ground.pipeline.RunResult;
import org.junit.jupiter.api.Test;

/** The model-level explanation says whether each step matters, with the rate error the core leaves. */
class HtmlReportTest {
  static HtmlReport.RunData level(String level, double rms, double modelRate) {
    final RunResult r = new RunResult("s@" + level, 0, level, "o", 86_400, 0, 10, 0, 1, rms, 1, 1e-12, List.of(), Map.of(),
        Map.of(), 4.465e-10, modelRate, "t", new RunResult.Verdict("no budget", Double.NaN, List.of()), null);
    return new HtmlReport.RunData(r, new double[] {0}, new double[] {0});
  }

  @Test
  void levelsSayWhetherATermMatters() {
    final String text = HtmlReport.explainLevels(List.of(level("none", 10, 4.465e-10), level("point-mass", 1, 4.465e-10),
        level("j2", 0.99, 4.465e-10), level("full", 0.99, 4.465e-10)));
    // At level none the core applies no rate: it leaves the whole 4.465e-10 x 86400 s = 38.6 us.
    assertTrue(text.contains("none &rarr; point-mass</b>: matters here") && text.contains("3.86e+04 to 0.00 ns"), text);
    assertTrue(text.contains("j2 &rarr; full</b>: does not matter here"), text);
  }
}
