package org.eigenzeit.ground.campaign;

import java.io.Serializable;
import java.nio.file.Path;
import org.eigenzeit.ground.pipeline.Pipeline;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.ScenarioReader;

/**
 * One run as a task any engine can execute: plain text in (the scenario's canonical form, the
 * seed, the comparison flag, the expected hashes), plain text out (the run's summary.json and
 * timeseries.csv). The local runner and the Spark runner both call {@link #execute}, so a run's
 * files are the same bytes whoever runs it.
 *
 * @param canonicalYaml the scenario's canonical form
 * @param seed the seed
 * @param comparison true for a model-level comparison run
 * @param scenarioHash SHA-256 the canonical form must have
 * @param codeFingerprint the fingerprint the executing code must have
 */
public record RunTask(String canonicalYaml, long seed, boolean comparison, String scenarioHash, String codeFingerprint)
    implements Serializable {
  private static final long serialVersionUID = 1L;

  /**
   * The task of a run.
   *
   * @param spec the run
   * @param codeFingerprint the driver's code fingerprint
   * @return the task
   */
  public static RunTask of(RunSpec spec, String codeFingerprint) {
    return new RunTask(spec.scenario().canonicalYaml(), spec.seed(), spec.comparison(), spec.scenario().contentHash(),
        codeFingerprint);
  }

  /**
   * A task's output.
   *
   * @param folder the run's folder below the campaign folder
   * @param summaryJson the text of summary.json
   * @param timeSeriesCsv the text of timeseries.csv
   */
  public record Output(String folder, String summaryJson, String timeSeriesCsv) implements Serializable {
    private static final long serialVersionUID = 1L;
  }

  /**
   * Runs the task.
   *
   * @return the run's files
   * @throws IllegalStateException when the executing code or the scenario text differ from the driver's
   */
  public Output execute() {
    final String fp = CodeVersion.current().fingerprint();
    if (!fp.equals(codeFingerprint)) {
      throw new IllegalStateException("the executing code (fingerprint " + fp + ") is not the driver's ("
          + codeFingerprint + "): ship the same job jar to every executor");
    }
    final Scenario sc = ScenarioReader.parse("canonical scenario", canonicalYaml, Path.of("."));
    if (!sc.contentHash().equals(scenarioHash)) {
      throw new IllegalStateException("the scenario " + sc.name() + " did not read back to the same canonical form");
    }
    return execute(new RunSpec(sc, seed, comparison), fp);
  }

  /**
   * Runs a run and writes its files' text.
   *
   * @param spec the run
   * @param codeFingerprint the code's fingerprint
   * @return the run's files
   */
  static Output execute(RunSpec spec, String codeFingerprint) {
    final Pipeline.Output o = Pipeline.run(spec.scenario(), spec.seed(), spec.comparison());
    final StoredRun stored = new StoredRun(spec.key(codeFingerprint), spec.scenario().contentHash(), codeFingerprint,
        o.result());
    return new Output(spec.folder(), Json.write(stored), o.timeSeriesCsv());
  }
}
