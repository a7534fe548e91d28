package org.eigenzeit.ground.campaign;

import java.util.List;
import org.eigenzeit.ground.pipeline.RunResult;
import org.eigenzeit.ground.pipeline.ScenarioVerdict;

/**
 * The campaign's {@code summary.json}.
 *
 * @param format "eigenzeit-campaign-1"
 * @param caution the caution every output carries
 * @param provenance where the results come from
 * @param verdicts each scenario's verdict across its seeds against its timing budget
 * @param runs every run's summary in campaign order
 */
public record CampaignSummary(String format, String caution, Provenance provenance, List<ScenarioVerdict> verdicts,
    List<RunResult> runs) {
  /** The caution. */
  public static final String CAUTION = "Simulation results support the mission's own verification and do not replace it; "
      + "timing errors on navigation satellites endanger users; the applicable interface specifications and standards "
      + "govern.";

  /** Immutable copy. */
  public CampaignSummary {
    verdicts = List.copyOf(verdicts);
    runs = List.copyOf(runs);
  }
}
