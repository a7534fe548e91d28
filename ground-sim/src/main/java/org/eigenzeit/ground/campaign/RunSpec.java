package org.eigenzeit.ground.campaign;

import java.nio.charset.StandardCharsets;
import org.eigenzeit.ground.scenario.Scenario;

/**
 * One run of a campaign: a scenario, a seed, and whether it is a model-level comparison run.
 *
 * @param scenario the resolved scenario (at the run's model level)
 * @param seed the Monte-Carlo seed
 * @param comparison true for a run of the model-level comparison (labelled "name@level")
 */
public record RunSpec(Scenario scenario, long seed, boolean comparison) {
  /** @return the run's label: the scenario name, with "@level" for a comparison run */
  public String runName() {
    return comparison ? scenario.name() + "@" + scenario.model().level() : scenario.name();
  }

  /** @return the run's folder below the campaign folder, with '/' separators */
  public String folder() {
    return "runs/" + runName() + "/seed-" + seed;
  }

  /**
   * The run key: SHA-256 of the scenario's canonical content hash, the code fingerprint, the run's
   * label and the seed. A stored run is reused only when its key is equal.
   *
   * @param codeFingerprint {@link CodeVersion#fingerprint()}
   * @return 64 hex digits
   */
  public String key(String codeFingerprint) {
    final String text = "eigenzeit-run-1\n" + scenario.contentHash() + "\n" + codeFingerprint + "\n" + runName() + "\n"
        + seed + "\n";
    return Scenario.sha256Hex(text.getBytes(StandardCharsets.UTF_8));
  }
}
